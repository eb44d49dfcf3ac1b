using DescentOps.Engine.Components;
using DescentOps.Engine.Running;

namespace DescentOps.Mission.Running;

/// <summary>
/// What a run has beyond the scenario's own components: components that take outside inputs (a rehearsal's operator
/// desk) and the inputs known up front (those a replay reads back from the log).
/// </summary>
public sealed record RunAdditions(IReadOnlyList<ISimComponent> Components, IReadOnlyList<ExternalInput> Inputs);
