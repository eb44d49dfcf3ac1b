using System.Globalization;
using System.Net;

namespace DescentOps.Cluster;

/// <summary>A <c>HOST:PORT</c> given to <c>--listen</c> or <c>--join</c> (an IPv6 address in brackets: <c>[::1]:4053</c>).</summary>
public sealed record NodeAddress(string Host, int Port)
{
    public const int DefaultPort = 4053;

    /// <summary>The address a campaign node listens on when <c>--listen</c> names none.</summary>
    public static NodeAddress DefaultListen { get; } = new("127.0.0.1", DefaultPort);

    /// <summary>True for a loopback address or <c>localhost</c>: nothing off this machine can reach it.</summary>
    public bool IsLoopback =>
        string.Equals(Host, "localhost", StringComparison.OrdinalIgnoreCase) || (IPAddress.TryParse(Host, out var ip) && IPAddress.IsLoopback(ip));

    /// <summary>Parses <c>HOST:PORT</c>; the error names the option.</summary>
    public static NodeAddress Parse(string text, string option)
    {
        var colon = text.LastIndexOf(':');
        if (colon <= 0 || colon == text.Length - 1) throw new FormatException($"{option}: '{text}' is not HOST:PORT (for example 127.0.0.1:{DefaultPort})");
        var host = text[..colon];
        if (host.StartsWith('[') && host.EndsWith(']')) host = host[1..^1];
        else if (host.Contains(':', StringComparison.Ordinal)) throw new FormatException($"{option}: write an IPv6 address in brackets, as [::1]:{DefaultPort}");
        if (!int.TryParse(text[(colon + 1)..], NumberStyles.None, CultureInfo.InvariantCulture, out var port) || port > 65535)
        {
            throw new FormatException($"{option}: '{text[(colon + 1)..]}' is not a port (0 to 65535)");
        }

        if (host.Length == 0 || host.Length > 253 || host.Any(c => char.IsWhiteSpace(c) || char.IsControl(c)))
        {
            throw new FormatException($"{option}: '{host}' is not a host name or address");
        }

        return new NodeAddress(host, port);
    }

    public override string ToString() => Host.Contains(':', StringComparison.Ordinal) ? $"[{Host}]:{Port}" : $"{Host}:{Port}";
}
