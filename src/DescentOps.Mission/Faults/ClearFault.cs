namespace DescentOps.Mission.Faults;

/// <summary>Ends an active fault now, by its name, before its own duration is over.</summary>
public sealed record ClearFault(string Name);
