using DescentOps.Primitives.Identity;

namespace DescentOps.Rules.Compiled;

/// <summary>
/// Start a procedure of the ground team. It travels with the firing's commands as <see cref="Command"/>
/// ("procedure start(name=...)"), which the ground takes for itself instead of sending it up.
/// </summary>
public sealed record StartProcedureAction(string Procedure) : CompiledAction
{
    /// <summary>The pseudo-target of the start command: the ground's procedure desk, never a component of the vehicle.</summary>
    public static ComponentId Target { get; } = new("procedure");

    public const string CommandName = "start";

    public CommandAction Command => new(Target, CommandName, [new CommandArgument("name", null, Procedure)]);

    /// <summary>The procedure a command starts, or null when it is not a start command.</summary>
    public static string? ProcedureOf(CommandAction command) =>
        command.Target == Target && command.Command == CommandName && command.Arguments is [{ Word: { } name }] ? name : null;
}
