namespace DescentOps.Physics.Descent;

/// <summary>How the head removes ice at a given depth and power.</summary>
public enum DescentRegimeKind
{
    /// <summary>Near an airless surface, before the hole is sealed: ice leaves as vapour.</summary>
    Sublimating,

    /// <summary>Close-contact melting with a liquid film under the head.</summary>
    Melting,

    /// <summary>Head and wall power cannot hold the probe's surface at the melting point: no progress.</summary>
    Stalled,
}
