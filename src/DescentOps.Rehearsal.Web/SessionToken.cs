using System.Security.Cryptography;
using System.Text;
using Microsoft.AspNetCore.Http;

namespace DescentOps.Rehearsal.Web;

/// <summary>
/// The secret a session's pages and API require: 32 random bytes in hex, taken from the <c>token</c> query parameter,
/// the <c>X-Session-Token</c> header or the session cookie the first page sets, and compared in constant time.
/// </summary>
public sealed class SessionToken
{
    public const string CookieName = "descentops-session";
    public const string HeaderName = "X-Session-Token";

    private readonly byte[] _bytes;

    public SessionToken()
    {
        Value = Convert.ToHexStringLower(RandomNumberGenerator.GetBytes(32));
        _bytes = Encoding.ASCII.GetBytes(Value);
    }

    public string Value { get; }

    public bool Admits(HttpRequest request)
    {
        string? offered = request.Query["token"].FirstOrDefault() ?? request.Headers[HeaderName].FirstOrDefault() ?? request.Cookies[CookieName];
        if (offered is null || offered.Length != Value.Length) return false;
        return CryptographicOperations.FixedTimeEquals(Encoding.ASCII.GetBytes(offered), _bytes);
    }
}
