namespace DescentOps.Scenarios.Model;

/// <summary>
/// One consumer on the probe's bus. <see cref="Priority"/>: lower numbers are kept longer (0 = last to go).
/// <see cref="PowerW"/> is the scenario's figure for a <see cref="BusLoadRole.Fixed"/> load and 0 for the others,
/// whose demand the probe knows (heater set points, electronics power).
/// </summary>
public sealed record BusLoadModel(string Name, BusLoadRole Role, int Priority, double PowerW);
