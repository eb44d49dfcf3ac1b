using System.CommandLine;
using DescentOps.Scenarios.Format;

namespace DescentOps.Cli.Commands;

/// <summary><c>descentops schema</c>: prints the JSON Schema of the scenario format.</summary>
public static class SchemaCommand
{
    public static Command Create()
    {
        var command = new Command("schema", "Print the JSON Schema of scenario files (the copy in shared/ is the same text).");
        command.SetAction(_ =>
        {
            Console.Out.Write(ScenarioJsonSchema.Generate());
            return (int)ExitCode.Ok;
        });
        return command;
    }
}
