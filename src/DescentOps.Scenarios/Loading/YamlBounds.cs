using YamlDotNet.Core;
using YamlDotNet.Core.Events;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Bounds a YAML text before it is built into a tree: its size, its nesting depth, and the number of nodes it
/// stands for once every alias is expanded (a few hundred bytes of aliases of aliases stand for billions of nodes).
/// Mapping keys must be plain scalars, as every key of the scenario format is. The walk reads the parser's events
/// one at a time without recursion, so no input can exhaust the stack or the memory here.
/// </summary>
public static class YamlBounds
{
    /// <summary>8 MiB: a hundred times the largest built-in scenario, and far below what a log manifest should carry.</summary>
    public const long MaxBytes = 8L * 1024 * 1024;

    /// <summary>Nesting of sections and lists; the format's deepest field is five levels down.</summary>
    public const int MaxDepth = 64;

    /// <summary>Nodes after alias expansion: a scenario with thousands of faults holds some tens of thousands.</summary>
    public const long MaxExpandedNodes = 1_000_000;

    public static void Check(string text, string sourceName)
    {
        if (text.Length > MaxBytes)
        {
            throw Refused(sourceName, Mark.Empty, $"the file holds {text.Length:N0} characters; a scenario may hold at most {MaxBytes:N0}");
        }

        var parser = new Parser(new StringReader(text));
        var frames = new Stack<Frame>();
        var anchorSizes = new Dictionary<string, long>(StringComparer.Ordinal);
        long total = 0;
        while (MoveNext(parser))
        {
            var current = parser.Current!;
            if (current is MappingEnd or SequenceEnd)
            {
                var done = frames.Pop();
                if (done.Anchor is { } closed) anchorSizes[closed] = total - done.StartTotal;
                continue;
            }

            if (current is not (NodeEvent or AnchorAlias)) continue;
            if (frames.TryPeek(out var parent) && parent.IsMapping)
            {
                if (parent.ExpectingKey && current is not Scalar)
                {
                    throw Refused(sourceName, current.Start, current is AnchorAlias
                        ? "an alias is not accepted as a key; keys are plain field names"
                        : "a section or list is not accepted as a key; keys are plain field names");
                }

                parent.ExpectingKey = !parent.ExpectingKey;
            }

            var start = total;
            total += current is AnchorAlias alias ? anchorSizes.GetValueOrDefault(alias.Value.Value, 1) : 1;
            if (total > MaxExpandedNodes)
            {
                throw Refused(sourceName, current.Start, $"the file stands for more than {MaxExpandedNodes:N0} values once its aliases are expanded");
            }

            if (current is not NodeEvent node) continue;
            var anchor = node.Anchor.IsEmpty ? null : node.Anchor.Value;
            switch (node)
            {
                case MappingStart or SequenceStart:
                    if (frames.Count >= MaxDepth)
                    {
                        throw Refused(sourceName, node.Start, $"sections and lists are nested more than {MaxDepth} deep");
                    }

                    frames.Push(new Frame(node is MappingStart, start, anchor));
                    break;
                case Scalar when anchor is not null:
                    anchorSizes[anchor] = 1;
                    break;
            }
        }
    }

    /// <summary>
    /// The YAML scanner throws a bare InvalidOperationException for some malformed flow collections; it is turned into
    /// a syntax error at the last good event, which the loader reports as it reports any other.
    /// </summary>
    private static bool MoveNext(Parser parser)
    {
        try
        {
            return parser.MoveNext();
        }
        catch (InvalidOperationException)
        {
            var mark = parser.Current?.End ?? Mark.Empty;
            throw new YamlException(mark, mark, "a flow collection ('[...]' or '{...}') is not closed or is malformed near here");
        }
    }

    private static ScenarioException Refused(string sourceName, Mark at, string message) =>
        new([new ScenarioError(new SourceLocation(sourceName, (int)Math.Max(1, at.Line), (int)Math.Max(1, at.Column)), "", message)]);

    private sealed class Frame(bool isMapping, long startTotal, string? anchor)
    {
        public bool IsMapping { get; } = isMapping;

        public long StartTotal { get; } = startTotal;

        public string? Anchor { get; } = anchor;

        public bool ExpectingKey { get; set; } = true;
    }
}
