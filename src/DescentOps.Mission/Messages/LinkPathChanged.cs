namespace DescentOps.Mission.Messages;

/// <summary>
/// The link tells the probe which path now carries its frames (<see cref="Tether.LinkPaths"/>), as the probe's
/// transceivers would sense it: light on the fibre, or a relay answering; sent only when it changes.
/// </summary>
public sealed record LinkPathChanged(string Path);
