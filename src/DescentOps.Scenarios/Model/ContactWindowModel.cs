namespace DescentOps.Scenarios.Model;

/// <summary>One window of the contact plan: <see cref="Lander"/> may use a channel from <see cref="FromS"/> to <see cref="ToS"/> (seconds of run time, or of each period when the plan repeats).</summary>
public sealed record ContactWindowModel(string Lander, double FromS, double ToS);
