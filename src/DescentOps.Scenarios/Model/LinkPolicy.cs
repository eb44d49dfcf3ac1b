namespace DescentOps.Scenarios.Model;

/// <summary>How the shared link home shares its channels among the landers.</summary>
public enum LinkPolicy
{
    /// <summary>Free channels go to the landers with something to send, in the order of <see cref="LinkHomeModel.Priority"/>.</summary>
    Priority,

    /// <summary>Each lander sends in its windows of the contact plan; a dead lander's windows go to the others by priority.</summary>
    ContactPlan,
}
