using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;
using DescentOps.Scenarios.Model;

namespace DescentOps.Tests.Shared;

/// <summary>
/// A scenario's text for a test, changed by what it means rather than by free string replacement: <see cref="Set"/>
/// changes the value at a key path (<c>probe.radius</c>) inside the nested mappings, <see cref="Replace"/> changes text
/// that must occur exactly once, <see cref="AddSection"/> adds a top-level section before <c>run:</c>. Each edit fails
/// the test at once, naming the scenario and the anchor, when what it edits is missing or ambiguous, so a test can
/// never go on to check an unedited scenario. Comments and layout stay, so located errors keep their lines.
/// </summary>
internal sealed class TestScenario
{
    private TestScenario(string name, string text)
    {
        Name = name;
        Text = text.Replace("\r\n", "\n", StringComparison.Ordinal);
    }

    /// <summary>The file name the text is loaded under (errors and logs name it).</summary>
    public string Name { get; }

    /// <summary>The YAML text as edited so far.</summary>
    public string Text { get; }

    /// <summary>A built-in scenario by its file name (<c>default.yaml</c>, ...).</summary>
    public static TestScenario BuiltIn(string fileName) => new(fileName, BuiltInScenarios.Text(fileName));

    /// <summary>The default scenario.</summary>
    public static TestScenario Default => BuiltIn("default.yaml");

    /// <summary>Any text under a name.</summary>
    public static TestScenario Of(string text, string name) => new(name, text);

    /// <summary>The same text under another name.</summary>
    public TestScenario Named(string name) => new(name, Text);

    /// <summary>Replaces <paramref name="anchor"/>, which must occur exactly once.</summary>
    public TestScenario Replace(string anchor, string replacement)
    {
        var first = Text.IndexOf(anchor, StringComparison.Ordinal);
        if (first < 0) throw new TestScenarioException($"{Name}: '{Show(anchor)}' does not occur in the scenario");
        if (Text.IndexOf(anchor, first + 1, StringComparison.Ordinal) >= 0) throw new TestScenarioException($"{Name}: '{Show(anchor)}' occurs more than once; give a longer anchor");
        return new TestScenario(Name, string.Concat(Text.AsSpan(0, first), replacement, Text.AsSpan(first + anchor.Length)));
    }

    /// <summary>Inserts <paramref name="block"/> just before <paramref name="anchor"/>, which must occur exactly once.</summary>
    public TestScenario InsertBefore(string anchor, string block) => Replace(anchor, block + anchor);

    /// <summary>
    /// Sets the scalar at a dotted key path (<c>run.until</c>, <c>station.transmitter.power</c>) to
    /// <paramref name="value"/>, written as YAML source (<c>60 d</c>, <c>"x y"</c>). Each key is looked up inside the
    /// block of the one before it; a key that is missing, or a path that ends on a mapping, fails.
    /// </summary>
    public TestScenario Set(string path, string value)
    {
        var lines = Text.Split('\n');
        var (index, keyEnd) = Locate(lines, path);
        var line = lines[index];
        var rest = line[keyEnd..].TrimStart();
        if (rest.Length == 0 || rest.StartsWith('#')) throw new TestScenarioException($"{Name}: '{path}' is a mapping (line {index + 1}), not a value");
        if (rest.StartsWith('|') || rest.StartsWith('>')) throw new TestScenarioException($"{Name}: '{path}' is a block of text (line {index + 1}); use Replace");
        lines[index] = line[..keyEnd] + " " + value;
        return new TestScenario(Name, string.Join('\n', lines));
    }

    /// <summary>
    /// Adds a top-level section (YAML text starting with its key at column 0) just before the <c>run:</c> section, or at
    /// the end when there is none. A section the scenario already has is refused.
    /// </summary>
    public TestScenario AddSection(string block)
    {
        var key = block.TrimStart('\n').Split('\n')[0];
        var colon = key.IndexOf(':', StringComparison.Ordinal);
        if (colon <= 0 || char.IsWhiteSpace(key[0])) throw new TestScenarioException($"{Name}: a section starts with its key at column 0, not '{Show(key)}'");
        var name = key[..colon];
        var lines = Text.Split('\n');
        if (lines.Any(l => l.StartsWith(name + ":", StringComparison.Ordinal))) throw new TestScenarioException($"{Name}: the scenario already has a '{name}' section");
        var body = block.EndsWith('\n') ? block : block + "\n";
        var run = Array.FindIndex(lines, l => l.StartsWith("run:", StringComparison.Ordinal));
        if (run < 0) return new TestScenario(Name, Text.TrimEnd('\n') + "\n" + body);
        return new TestScenario(Name, string.Join('\n', lines[..run]) + "\n" + body + string.Join('\n', lines[run..]));
    }

    /// <summary>Loads the text with the scenario loader (errors located in <see cref="Name"/>).</summary>
    public Scenario Load() => ScenarioLoader.LoadText(Text, Name);

    /// <inheritdoc />
    public override string ToString() => Text;

    public static implicit operator string(TestScenario text) => text.Text;

    private (int Line, int KeyEnd) Locate(string[] lines, string path)
    {
        var keys = path.Split('.');
        int from = 0, to = lines.Length, parentIndent = -1, found = -1, keyEnd = 0;
        foreach (var key in keys)
        {
            found = -1;
            var childIndent = -1;
            for (var i = from; i < to; i++)
            {
                var indent = Indent(lines[i]);
                if (indent < 0) continue;
                if (indent <= parentIndent) { to = i; break; }
                if (childIndent < 0) childIndent = indent;
                if (indent != childIndent) continue;
                var text = lines[i].AsSpan(indent);
                if (text.StartsWith(key + ":", StringComparison.Ordinal))
                {
                    found = i;
                    keyEnd = indent + key.Length + 1;
                    break;
                }
            }

            if (found < 0) throw new TestScenarioException($"{Name}: no key '{key}' on the path '{path}'");
            parentIndent = Indent(lines[found]);
            from = found + 1;
            to = lines.Length;
        }

        return (found, keyEnd);
    }

    /// <summary>Columns of leading spaces, or −1 for a blank or comment-only line.</summary>
    private static int Indent(string line)
    {
        var n = 0;
        while (n < line.Length && line[n] == ' ') n++;
        return n == line.Length || line[n] == '#' ? -1 : n;
    }

    private static string Show(string text) => text.Replace("\n", "\\n", StringComparison.Ordinal);
}

/// <summary>An edit of a test scenario that does not apply: the test is wrong, not the tool.</summary>
internal sealed class TestScenarioException(string message) : Exception(message);
