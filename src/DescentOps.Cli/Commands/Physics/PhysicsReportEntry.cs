namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// One line of a physics answer: its JSON name, the label and unit a person reads, and exactly one of a number,
/// a text, a flag or a nested report.
/// </summary>
internal sealed record PhysicsReportEntry(string JsonName, string Label, string Unit, double? Number, string? Text, bool? Flag, PhysicsReport? Section);
