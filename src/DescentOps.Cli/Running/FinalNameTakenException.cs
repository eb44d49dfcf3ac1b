using DescentOps.Mission.Running;

namespace DescentOps.Cli.Running;

/// <summary>
/// The run finished, but its final log name was taken meanwhile and may not be replaced; the whole log is under
/// <see cref="PartialPath"/>.
/// </summary>
public sealed class FinalNameTakenException(MissionSummary summary, string partialPath, string finalPath, Exception inner)
    : IOException($"{finalPath} appeared while the run went on (another run?); it was not replaced, and this run's whole log is {partialPath}.", inner)
{
    public MissionSummary Summary { get; } = summary;

    public string PartialPath { get; } = partialPath;

    public string FinalPath { get; } = finalPath;
}
