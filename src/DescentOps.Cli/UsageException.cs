namespace DescentOps.Cli;

/// <summary>A command-line value that parses but makes no sense; reported with exit code <see cref="ExitCode.UsageError"/>.</summary>
public sealed class UsageException(string message) : Exception(message);
