namespace DescentOps.Rules.Compiled;

/// <summary>A checked condition with every number in SI; the evaluator builds its monitors from it.</summary>
public abstract record CompiledCondition
{
    /// <summary>The telemetry points the condition reads, each once, in order of first mention.</summary>
    public abstract IEnumerable<string> Points { get; }
}
