using System.CommandLine;
using System.Globalization;
using DescentOps.Cli.Output;
using DescentOps.Cli.Running;
using DescentOps.Cli.Terminal;
using DescentOps.Records;
using DescentOps.Journal.Comparison;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops diff LOG-A LOG-B</c>: what separates two runs.</summary>
public static class DiffCommand
{
    public static Command Create()
    {
        var aArgument = CommonOptions.Log("The first run's log.", "LOG-A");
        var bArgument = CommonOptions.Log("The second run's log.", "LOG-B");
        var jsonOption = CommonOptions.Json();
        var command = new Command("diff", "Compare two runs: first divergence, outcome and summary figures, and the events one has more of.") { aArgument, bArgument, jsonOption };
        command.SetAction(parse =>
        {
            var a = parse.GetValue(aArgument)!;
            var b = parse.GetValue(bArgument)!;
            // Both chains are checked first: an edited log must not "diff identical" or lend its numbers to a comparison.
            LogGate.Open(a);
            LogGate.Open(b);
            var progress = new ProgressLine("  diff ");
            var diff = progress.Around(() => JournalDiff.Compare(a, b, share => progress.Fraction(share, "of both logs read")));

            if (parse.GetValue(jsonOption)) WriteJson(diff, a, b);
            else Print(diff, a, b);
            return (int)(diff.Identical ? ExitCode.Ok : ExitCode.RunsDiffer);
        });
        return command;
    }

    private static void WriteJson(JournalDiff diff, string a, string b) => JsonOutput.Write(w =>
    {
        w.WriteString("a", a);
        w.WriteString("b", b);
        w.WriteBoolean("identical", diff.Identical);
        w.Divergence("first_divergence", diff.FirstEventDivergence);
        w.Text("outcome_a", diff.SummaryA?.Summary.OutcomeKind);
        w.Text("outcome_b", diff.SummaryB?.Summary.OutcomeKind);
        var fieldsA = diff.SummaryA?.Summary.Data ?? [];
        var fieldsB = diff.SummaryB?.Summary.Data ?? [];
        w.WriteStartArray("summary");
        foreach (var name in fieldsA.Select(f => f.Name).Union(fieldsB.Select(f => f.Name)))
        {
            w.WriteStartObject();
            w.WriteString("name", name);
            w.Field("a", Find(fieldsA, name));
            w.Field("b", Find(fieldsB, name));
            w.WriteBoolean("differs", Value(fieldsA, name) != Value(fieldsB, name));
            w.WriteEndObject();
        }

        w.WriteEndArray();
        w.WriteStartArray("count_differences");
        foreach (var (key, countA, countB) in diff.CountDifferences)
        {
            w.WriteStartObject();
            w.WriteString("key", key);
            w.WriteNumber("a", countA);
            w.WriteNumber("b", countB);
            w.WriteEndObject();
        }

        w.WriteEndArray();
    });

    private static RecordField? Find(IReadOnlyList<RecordField> fields, string name)
    {
        foreach (var field in fields)
        {
            if (field.Name == name) return field;
        }

        return null;
    }

    private static void Print(JournalDiff diff, string a, string b)
    {
        var c = CultureInfo.InvariantCulture;
        Console.Out.WriteLine($"A: {a}");
        Console.Out.WriteLine($"B: {b}");
        if (diff.Identical)
        {
            Console.Out.WriteLine("the runs are identical event for event");
            return;
        }

        if (diff.FirstEventDivergence is { } d)
        {
            var when = d.TimeA ?? d.TimeB ?? 0;
            Console.Out.WriteLine(string.Create(c, $"first divergence at line {d.Line}, simulated time {when:R} s ({when / 86400:F4} d):"));
            Console.Out.WriteLine($"  A: {d.LineA ?? "(A has no more events)"}");
            Console.Out.WriteLine($"  B: {d.LineB ?? "(B has no more events)"}");
        }
        else
        {
            Console.Out.WriteLine("the event streams agree; only the summary differs");
        }

        Console.Out.WriteLine();
        Console.Out.WriteLine($"  {"",-28}{"A",-24}{"B",-24}");
        Console.Out.WriteLine($"  {"outcome",-28}{diff.SummaryA?.Summary.OutcomeKind ?? "(truncated)",-24}{diff.SummaryB?.Summary.OutcomeKind ?? "(truncated)",-24}");
        var fieldsA = diff.SummaryA?.Summary.Data ?? [];
        var fieldsB = diff.SummaryB?.Summary.Data ?? [];
        foreach (var name in fieldsA.Select(f => f.Name).Union(fieldsB.Select(f => f.Name)))
        {
            var va = Value(fieldsA, name);
            var vb = Value(fieldsB, name);
            Console.Out.WriteLine($"  {name,-28}{va,-24}{vb,-24}{(va == vb ? "" : "differs")}");
        }

        if (diff.CountDifferences.Count > 0)
        {
            Console.Out.WriteLine();
            Console.Out.WriteLine("  events that one run has more of:");
            foreach (var (key, countA, countB) in diff.CountDifferences)
            {
                Console.Out.WriteLine($"  {key,-44}{countA,10}{countB,10}");
            }
        }
    }

    private static string Value(IReadOnlyList<RecordField> fields, string name)
    {
        foreach (var field in fields)
        {
            if (field.Name != name) continue;
            return field.Kind == RecordFieldKind.Number
                ? field.Number.ToString("G8", CultureInfo.InvariantCulture)
                : field.ToString()[(name.Length + 1)..];
        }

        return "-";
    }
}
