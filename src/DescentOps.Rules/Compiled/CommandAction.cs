using DescentOps.Primitives.Identity;

namespace DescentOps.Rules.Compiled;

/// <summary>A telecommand to send, as data: target component, command name, arguments in SI.</summary>
public sealed record CommandAction(ComponentId Target, string Command, IReadOnlyList<CommandArgument> Arguments)
{
    public override string ToString() => $"{Target} {Command}({string.Join(", ", Arguments)})";
}
