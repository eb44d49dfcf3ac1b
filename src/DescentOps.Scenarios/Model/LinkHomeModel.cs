namespace DescentOps.Scenarios.Model;

/// <summary>
/// The link home the landers share: the ground listens to <see cref="Channels"/> stations at once. Under
/// <see cref="LinkPolicy.Priority"/> a free channel goes to the first lander in <see cref="Priority"/> with something
/// waiting; under <see cref="LinkPolicy.ContactPlan"/> each lander sends in its <see cref="Windows"/>, which repeat every
/// <see cref="RepeatS"/> when it is given. A frame holds a channel for its station's frame time on the air.
/// </summary>
public sealed record LinkHomeModel(int Channels, LinkPolicy Policy, IReadOnlyList<string> Priority, IReadOnlyList<ContactWindowModel> Windows, double? RepeatS)
{
    /// <summary>The link of a scenario with landers and no <c>link_home</c> section: one channel, by priority in the landers' order.</summary>
    public static LinkHomeModel Default(IReadOnlyList<string> landers) => new(1, LinkPolicy.Priority, landers, [], null);
}
