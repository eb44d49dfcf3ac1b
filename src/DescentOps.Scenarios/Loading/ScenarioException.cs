namespace DescentOps.Scenarios.Loading;

/// <summary>A scenario that cannot be used, with every problem found, in file order.</summary>
public sealed class ScenarioException : Exception
{
    public ScenarioException(IReadOnlyList<ScenarioError> errors)
        : base(string.Join(Environment.NewLine, errors.Select(e => e.ToString())))
    {
        Errors = errors;
    }

    public IReadOnlyList<ScenarioError> Errors { get; }
}
