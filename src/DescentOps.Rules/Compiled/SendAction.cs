namespace DescentOps.Rules.Compiled;

/// <summary>Send a telecommand.</summary>
public sealed record SendAction(CommandAction Command) : CompiledAction;
