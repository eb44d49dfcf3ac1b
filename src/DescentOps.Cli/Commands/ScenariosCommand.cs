using System.CommandLine;
using DescentOps.Cli.Files;
using DescentOps.Scenarios;
using DescentOps.Scenarios.Loading;

namespace DescentOps.Cli.Commands;

/// <summary>
/// <c>descentops scenarios list|show NAME|copy NAME PATH</c>: the scenarios compiled into the tool, to read or to
/// start a scenario of one's own from.
/// </summary>
public static class ScenariosCommand
{
    public static Command Create()
    {
        var list = new Command("list", "List the built-in scenarios with what each rehearses.");
        list.SetAction(_ =>
        {
            foreach (var name in BuiltInScenarios.Names)
            {
                var scenario = ScenarioLoader.LoadText(BuiltInScenarios.Text(name), "builtin:" + name);
                Console.Out.WriteLine($"{Short(name),-36}{scenario.Description}");
            }

            return (int)ExitCode.Ok;
        });

        var showName = Name();
        var show = new Command("show", "Print a built-in scenario's text.") { showName };
        show.SetAction(parse =>
        {
            Console.Out.Write(BuiltInScenarios.Text(Resolve(parse.GetValue(showName)!)));
            return (int)ExitCode.Ok;
        });

        var copyName = Name();
        var copyPath = new Argument<string>("PATH") { Description = "The file to write." };
        var force = CommonOptions.Force();
        var copy = new Command("copy", "Copy a built-in scenario to a file, to edit and run as your own.") { copyName, copyPath, force };
        copy.SetAction(parse =>
        {
            var name = Resolve(parse.GetValue(copyName)!);
            var path = OutputPaths.Claim(parse.GetValue(copyPath)!, parse.GetValue(force));
            var directory = Path.GetDirectoryName(path);
            if (!string.IsNullOrEmpty(directory)) Directory.CreateDirectory(directory);
            File.WriteAllText(path, BuiltInScenarios.Text(name));
            Console.Out.WriteLine($"copied {Short(name)} to {path}");
            return (int)ExitCode.Ok;
        });

        return new Command("scenarios", "The built-in scenarios: list them, show one, copy one to a file.") { list, show, copy };
    }

    private static Argument<string> Name() => new("NAME") { Description = "A built-in scenario's name (with or without .yaml); see 'descentops scenarios list'." };

    private static string Short(string name) => name.EndsWith(".yaml", StringComparison.Ordinal) ? name[..^".yaml".Length] : name;

    private static string Resolve(string argument) =>
        ScenarioSource.BuiltInName(argument)
        ?? throw new UsageException($"no built-in scenario '{argument}'; built in: {string.Join(", ", BuiltInScenarios.Names.Select(Short))}.");
}
