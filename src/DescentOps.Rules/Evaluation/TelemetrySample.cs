using DescentOps.Primitives.Time;

namespace DescentOps.Rules.Evaluation;

/// <summary>One reading of a point at an instant; the value holds until the point's next sample.</summary>
public sealed record TelemetrySample(string Point, SimTime Time, TelemetryValue Value)
{
    /// <summary>How the reading was taken, when the source says (on board: "crossing" or "sample"); null for a frame's.</summary>
    public string? Origin { get; init; }

    public override string ToString() => $"{Point}={Value}@{Time}";
}
