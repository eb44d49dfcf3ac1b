namespace DescentOps.Cli.Files;

/// <summary>An output the command will not write (it exists, or it is an input); exit code <see cref="ExitCode.OutputRefused"/>.</summary>
public sealed class OutputRefusedException(string message) : Exception(message);
