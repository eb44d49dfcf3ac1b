using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;

namespace DescentOps.Engine.Running;

/// <summary>
/// A message from outside the simulation (a person at a console) delivered to a component at an instant. Inputs are
/// numbered in the order given and sent under the kernel's own input id, so a run given the same inputs up front
/// delivers them exactly as a run that received them one by one while it went.
/// </summary>
public sealed record ExternalInput(SimTime At, ComponentId Target, object Payload)
{
    /// <summary>The sender id of every input's event key.</summary>
    public static ComponentId SenderId { get; } = new("input");
}
