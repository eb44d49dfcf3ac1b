using System.Security.Cryptography;
using System.Text;

namespace DescentOps.Cluster;

/// <summary>
/// The shared secret a worker must hold before the campaign node gives it any work, when the node listens beyond
/// loopback. It never crosses the network: the node sends a fresh random nonce and the worker answers with
/// HMAC-SHA256(secret, nonce) (RFC 2104, FIPS 198-1), compared in constant time. It keeps strangers from taking or
/// forging runs; it does not encrypt the traffic (see README: Akka.Remote's TLS settings).
/// </summary>
public sealed class JoinSecret
{
    public const string EnvironmentVariable = "DESCENTOPS_CLUSTER_SECRET";

    /// <summary>Shortest secret accepted: 16 bytes, as a guess-resistant floor (common practice for shared keys, not a cited figure).</summary>
    public const int MinBytes = 16;

    private const int MaxBytes = 4096;

    private readonly byte[] _key;

    private JoinSecret(byte[] key) => _key = key;

    /// <summary>The secret from a file (its text, trailing line breaks removed) or else from the environment variable; null when neither is set.</summary>
    public static JoinSecret? Load(string? file, Func<string, string?> environment)
    {
        string? text;
        string source;
        if (file is not null)
        {
            if (!File.Exists(file)) throw new FormatException($"--secret-file: no such file {file}");
            if (new FileInfo(file).Length > MaxBytes) throw new FormatException($"--secret-file: {file} is longer than {MaxBytes} bytes; a secret is one line");
            text = File.ReadAllText(file).TrimEnd('\r', '\n');
            source = $"--secret-file {file}";
        }
        else
        {
            text = environment(EnvironmentVariable);
            source = EnvironmentVariable;
            if (string.IsNullOrEmpty(text)) return null;
        }

        var key = Encoding.UTF8.GetBytes(text);
        if (key.Length < MinBytes) throw new FormatException($"{source}: the secret has {key.Length} bytes; at least {MinBytes} are needed");
        if (key.Length > MaxBytes) throw new FormatException($"{source}: the secret is longer than {MaxBytes} bytes");
        return new JoinSecret(key);
    }

    public static JoinSecret FromText(string text) => new(Encoding.UTF8.GetBytes(text));

    public static string NewNonce() => Convert.ToHexString(RandomNumberGenerator.GetBytes(32));

    public string Prove(string nonce) => Convert.ToHexString(HMACSHA256.HashData(_key, Encoding.UTF8.GetBytes(nonce)));

    public bool Verify(string nonce, string mac)
    {
        var expected = Encoding.ASCII.GetBytes(Prove(nonce));
        var given = Encoding.ASCII.GetBytes(mac.Length > 128 ? "" : mac.ToUpperInvariant());
        return CryptographicOperations.FixedTimeEquals(expected, given);
    }
}
