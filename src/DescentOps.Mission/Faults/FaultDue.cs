namespace DescentOps.Mission.Faults;

/// <summary>The injector's timer for the start (or, with <see cref="IsEnd"/>, the end) of fault number <see cref="Index"/>.</summary>
public sealed record FaultDue(int Index, bool IsEnd);
