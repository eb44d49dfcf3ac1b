using System.Runtime.InteropServices;

namespace DescentOps.Cli.Terminal;

/// <summary>
/// Ctrl-C and SIGTERM for commands that can stop cleanly: the first signal asks the work to stop (the run checks it
/// at its next progress point, a fraction of a second away) so the command can say what it leaves behind; a second
/// signal ends the process at once. Commands that do not watch for it keep the default: they end at the signal.
/// </summary>
public sealed class Interruption : IDisposable
{
    private readonly CancellationTokenSource _requested = new();
    private readonly PosixSignalRegistration[] _registrations;

    private Interruption()
    {
        _registrations =
        [
            PosixSignalRegistration.Create(PosixSignal.SIGINT, OnSignal),
            PosixSignalRegistration.Create(PosixSignal.SIGTERM, OnSignal),
        ];
    }

    public bool Requested => _requested.IsCancellationRequested;

    public CancellationToken Token => _requested.Token;

    /// <summary>Watches for Ctrl-C and SIGTERM until disposed.</summary>
    public static Interruption Watch() => new();

    /// <summary>Throws <see cref="OperationCanceledException"/> once a signal came; called from the run's progress points.</summary>
    public void ThrowIfRequested() => _requested.Token.ThrowIfCancellationRequested();

    public void Dispose()
    {
        foreach (var registration in _registrations) registration.Dispose();
        _requested.Dispose();
    }

    private void OnSignal(PosixSignalContext context)
    {
        if (_requested.IsCancellationRequested) return; // the second signal: let the default end the process
        context.Cancel = true;
        _requested.Cancel();
    }
}
