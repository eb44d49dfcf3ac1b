namespace DescentOps.Cli;

/// <summary>A log that fails verification where integrity comes first; reported with <see cref="ExitCode.VerificationFailed"/>.</summary>
public sealed class LogIntegrityException(string message) : Exception(message);
