using System.Text;
using Microsoft.Win32.SafeHandles;

namespace DescentOps.Cli.Output;

/// <summary>
/// Standard output for commands that print much (<c>events</c>): a writer that fails when the reader has gone
/// (<c>descentops events LOG | head</c>), so the command can stop reading the log instead of printing into a closed
/// pipe. The console stream of .NET ignores a broken pipe, which would read a year-long log to the end for nothing.
/// </summary>
public static class StandardOutput
{
    public static TextWriter Open()
    {
        if (OperatingSystem.IsWindows()) return Console.Out;
        Console.Out.Flush();

        var stream = new FileStream(new SafeFileHandle(1, ownsHandle: false), FileAccess.Write, bufferSize: 0);
        return new StreamWriter(stream, new UTF8Encoding(encoderShouldEmitUTF8Identifier: false), bufferSize: 64 * 1024) { AutoFlush = false };
    }

    /// <summary>Whether a write failed because the reader closed the pipe (EPIPE).</summary>
    public static bool IsClosedPipe(IOException exception)
    {
        ArgumentNullException.ThrowIfNull(exception);
        return exception.HResult == 32 || exception.Message.Contains("pipe", StringComparison.OrdinalIgnoreCase);
    }
}
