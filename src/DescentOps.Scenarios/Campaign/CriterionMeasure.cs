using DescentOps.Scenarios.Format;

namespace DescentOps.Scenarios.Campaign;

/// <summary>A run measure a criterion may compare: its name in criteria, and the quantity kind of its threshold (null: a plain count).</summary>
public sealed record CriterionMeasure(string Name, QuantityKind? Kind, string Meaning)
{
    public static IReadOnlyList<CriterionMeasure> All { get; } =
    [
        new("breakthrough", QuantityKind.Duration, "time from the start to breakthrough (a run that never breaks through fails any criterion on it)"),
        new("final_depth", QuantityKind.Length, "the head's depth when the run ended"),
        new("energy_used", QuantityKind.Energy, "energy the probe used"),
        new("frames_lost", null, "telemetry frames lost on the way home"),
        new("frames_held", null, "most frames held at once in the probe's and relays' buffers"),
        new("time_stopped", QuantityKind.Duration, "total time the probe stood still (stopped or frozen in) before reaching the ocean"),
        new("longest_stop", QuantityKind.Duration, "the longest single stop"),
        new("time_frozen", QuantityKind.Duration, "total time the probe was held frozen in"),
        new("time_blind", QuantityKind.Duration, "total time the ground received no frame for more than three telemetry intervals"),
        new("vehicles_lost", null, "vehicles lost"),
        new("faults_unrecovered", null, "faults with a recovery measure that did not recover"),
    ];

    public static CriterionMeasure? Find(string name) => All.FirstOrDefault(m => m.Name == name);
}
