using System.CommandLine;
using DescentOps.Mission.Running;

namespace DescentOps.Cli;

/// <summary>The options several commands share, under one name and one short alias everywhere.</summary>
public static class CommonOptions
{
    /// <summary><c>--output</c>/<c>-o</c> (and <c>--log</c>, its older name): where the command writes its file.</summary>
    public static Option<string?> Output(string description) =>
        new("--output", "-o", "--log") { Description = description, HelpName = "PATH" };

    /// <summary><c>--force</c>/<c>-f</c>: replace an existing output (never an input).</summary>
    public static Option<bool> Force() =>
        new("--force", "-f") { Description = "Replace the output if it exists (an input is never replaced)." };

    /// <summary><c>--json</c>: one JSON object on stdout instead of the table.</summary>
    public static Option<bool> Json() =>
        new("--json") { Description = "Print one JSON object on stdout (snake_case names, SI values, null for a missing value) instead of text." };

    /// <summary>A log argument, named <c>LOG</c> unless a command takes two.</summary>
    public static Argument<string> Log(string description, string name = "LOG") => new(name) { Description = description };

    /// <summary><c>--kernel</c>/<c>-k</c>: which kernel runs the mission; actors unless asked otherwise.</summary>
    public static Option<KernelChoice> Kernel(string description) =>
        new("--kernel", "-k") { Description = description, DefaultValueFactory = _ => KernelChoice.Actors, HelpName = "actors|sequential" };
}
