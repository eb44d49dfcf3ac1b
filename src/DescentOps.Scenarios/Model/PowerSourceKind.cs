namespace DescentOps.Scenarios.Model;

/// <summary>Where the probe's electric power comes from.</summary>
public enum PowerSourceKind
{
    /// <summary>Decay heat of Pu-238 turned into electricity; falls with the isotope and the converter's ageing.</summary>
    Radioisotope,

    /// <summary>A small reactor run at a set electric output.</summary>
    Fission,
}
