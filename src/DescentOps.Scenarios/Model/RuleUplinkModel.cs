namespace DescentOps.Scenarios.Model;

/// <summary>
/// A rule set the ground uplinks at a time, replacing the whole rule set in force: the ground's rules from that
/// instant, the on-board rules when the upload reaches the probe.
/// </summary>
public sealed record RuleUplinkModel(double AtS, RulesSource Rules, string FieldPath);
