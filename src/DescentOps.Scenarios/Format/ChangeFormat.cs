namespace DescentOps.Scenarios.Format;

/// <summary>
/// The format of a branch change file: scenario-style YAML with the scenario's own fault entries and rules block.
/// </summary>
public static class ChangeFormat
{
    public static SectionField Root { get; } = new(
        "",
        "A change applied to a logged run's scenario when branching from an instant.",
        [
            new TextField("description", "What the branch tries, in a sentence.", Required: false),
            new ListField("add_faults", "Faults to add; each starts at or after the branch instant.",
                ((ListField)ScenarioFormat.Root.Find("faults")!).Item, 0, 1000, Required: false),
            new ListField("remove_faults", "Faults of the parent to leave out; each must start at or after the branch instant.",
                new SectionField("fault", "A fault of the parent, by name.", [new TextField("name", "The fault's name.", IsIdentifier: true)]), 0, 1000, Required: false),
            new TextField("rules", "A rules block replacing the parent's ('rules: |' then indented lines); it must not act before the instant.", Required: false),
            new ListField("add_telecommands", "Time-tagged telecommands to add, as in a scenario's telecommands; each at or after the branch instant.",
                ScenarioFormat.Telecommand with { Fields = [.. ScenarioFormat.Telecommand.Fields, BranchLander("telecommand")] }, 0, 1000, Required: false),
            new ListField("uplink_rules", "Rule sets the ground uplinks during the branch, each replacing the whole set in force: the ground's rules at its time, the on-board rules when the upload reaches the probe; each at or after the branch instant.",
                new SectionField("uplink", "One rule set uplinked at a time.",
                [
                    new QuantityField("at", "Simulated time after the start of the run when the ground sends it.", QuantityKind.Duration, 0, 1000 * 365.25 * 86_400),
                    new TextField("rules", "The rule set ('rules: |' then indented lines)."),
                    BranchLander("uplink"),
                ]), 0, 100, Required: false),
        ]);

    /// <summary>The lander an added telecommand or uplink is for: required when the parent has several, optional with one.</summary>
    private static TextField BranchLander(string what) =>
        new("lander", $"With landers: the lander this {what} is for (may be omitted when the parent scenario has one lander).", Required: false, IsIdentifier: true);
}
