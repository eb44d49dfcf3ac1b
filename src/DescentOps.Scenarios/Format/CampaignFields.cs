namespace DescentOps.Scenarios.Format;

/// <summary>
/// The scenario sections a campaign reads: uncertain inputs drawn per run and the mission criteria a run must meet.
/// Both are optional; a single run draws the inputs from its own seed and reports the criteria too.
/// </summary>
public static class CampaignFields
{
    public static ListField Uncertain { get; } = new(
        "uncertain",
        "Scenario values that are not known exactly: each run draws them from its own seeded stream, in the order given, and records what it drew.",
        new SectionField("input", "One uncertain value.",
        [
            new TextField("path", "The scenario field it replaces, e.g. 'shell.thickness', 'probe.head_power', 'faults[bus-trip].at', 'vehicles[minnow-1].speed', 'relays.drops[2].depth' (a list item by its name or its position from 1)."),
            new ChoiceField("distribution", "normal (mean, sd), lognormal (median, log_sd), uniform (low, high) or triangular (low, mode, high). Normal and lognormal are truncated to the field's valid range.", ["normal", "lognormal", "uniform", "triangular"]),
            new TextField("mean", "Normal: the mean, with the field's unit.", Required: false),
            new TextField("sd", "Normal: the standard deviation, with the field's unit.", Required: false),
            new TextField("median", "Lognormal: the median, with the field's unit.", Required: false),
            new NumberField("log_sd", "Lognormal: the standard deviation of the natural logarithm (a plain number).", 0, 10, Required: false),
            new TextField("low", "Uniform and triangular: the lower end, with the field's unit.", Required: false),
            new TextField("mode", "Triangular: the most likely value, with the field's unit.", Required: false),
            new TextField("high", "Uniform and triangular: the upper end, with the field's unit.", Required: false),
        ]),
        0,
        200,
        Required: false);

    public static ListField Criteria { get; } = new(
        "criteria",
        "Named pass/fail criteria over a whole run; a run succeeds when it completes and meets every one.",
        new SectionField("criterion", "One criterion.",
        [
            new TextField("name", "Criterion identifier (lowercase letters, digits, '-').", IsIdentifier: true),
            new TextField("require", "A run measure compared in the rule language's words: 'breakthrough below 150 d', 'frames_lost below 1', 'longest_stop below 12 h', 'vehicles_lost below 1', 'time_blind below 2 d', 'final_depth inside 2 km to 3 km'."),
            new TextField("lander", "Scenarios with landers: the lander whose figures the criterion judges (its name).", Required: false),
            new ChoiceField("landers", "Scenarios with landers: 'every' (each lander must meet it; the default when neither this nor 'lander' is given) or 'any' (at least one lander must).", ["every", "any"], Required: false),
        ]),
        0,
        100,
        Required: false);

    /// <summary>On a fault: the rules meant to detect it (beside any rule that reads a point the fault affects).</summary>
    public static TextField DetectedBy { get; } = new("detected_by", "Rules meant to detect this fault, comma-separated; their first firing after the fault began counts as its detection even when they read no point the fault affects.", Required: false);
}
