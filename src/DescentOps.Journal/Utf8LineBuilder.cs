using System.Buffers;
using System.Globalization;
using System.Text;

namespace DescentOps.Journal;

/// <summary>
/// A growable byte buffer with just the JSON spellings the journal needs. Written by hand rather than with
/// <c>Utf8JsonWriter</c> for two reasons: every byte of the format is then decided here, so the output cannot
/// change with the runtime's escaping rules, and an event costs a few block copies instead of the general
/// writer's per-token bookkeeping (measured at about a third of the encoding time).
/// </summary>
internal sealed class Utf8LineBuilder
{
    // Characters that can be copied as they are: printable ASCII except the quote and the backslash. Anything
    // else (controls, non-ASCII, surrogates) takes the slow path, which escapes or transcodes it.
    private static readonly SearchValues<char> PlainAscii = SearchValues.Create(
        " !#$%&'()*+,-./0123456789:;<=>?@ABCDEFGHIJKLMNOPQRSTUVWXYZ[]^_`abcdefghijklmnopqrstuvwxyz{|}~");

    private byte[] _bytes;

    public Utf8LineBuilder(int initialCapacity)
    {
        _bytes = new byte[initialCapacity];
    }

    public int Length { get; private set; }

    public ReadOnlySpan<byte> Written => _bytes.AsSpan(0, Length);

    public void Clear() => Length = 0;

    public void Append(ReadOnlySpan<byte> utf8)
    {
        utf8.CopyTo(Reserve(utf8.Length));
        Length += utf8.Length;
    }

    public void Append(byte value)
    {
        Reserve(1)[0] = value;
        Length++;
    }

    public void AppendInteger(long value)
    {
        // long.MinValue is 20 characters with its sign.
        var destination = Reserve(20);
        value.TryFormat(destination, out var written, default, CultureInfo.InvariantCulture);
        Length += written;
    }

    public void AppendBoolean(bool value) => Append(value ? "true"u8 : "false"u8);

    /// <summary>
    /// Shortest round-trip spelling ("R", invariant culture), with ".0" added when that spelling has neither a
    /// point nor an exponent: a reader can then tell a double from an integer by its text alone, so field kinds
    /// survive the round trip, and -0.0 keeps its sign as "-0.0". NaN and the infinities, which JSON cannot
    /// spell as numbers, become the strings "NaN", "Infinity" and "-Infinity".
    /// </summary>
    public void AppendDouble(double value)
    {
        if (!double.IsFinite(value))
        {
            Append(double.IsNaN(value) ? "\"NaN\""u8 : value > 0 ? "\"Infinity\""u8 : "\"-Infinity\""u8);
            return;
        }

        // The longest shortest-round-trip double is 24 characters ("-2.2250738585072014E-308"); 32 leaves room for ".0".
        var destination = Reserve(32);
        value.TryFormat(destination, out var written, "R", CultureInfo.InvariantCulture);
        if (destination[..written].IndexOfAny((byte)'.', (byte)'E') < 0)
        {
            destination[written++] = (byte)'.';
            destination[written++] = (byte)'0';
        }

        Length += written;
    }

    /// <summary>
    /// Simulated seconds from microsecond ticks, spelled exactly as <see cref="AppendDouble"/> would spell
    /// ticks / 10^6 but without the general double formatter, which is the largest single cost of an event.
    /// </summary>
    /// <remarks>
    /// For ticks / 10^6 below 2^33 s the double's spacing is under 10^-6, so the only decimal with at most six
    /// fraction digits that rounds to that double is the exact one: its trimmed digits are the shortest
    /// round-trip spelling. From 0.001 s up the runtime writes that spelling without an exponent. Outside that
    /// range (the first millisecond, beyond about 272 years, before the epoch) the general path is used.
    /// </remarks>
    public void AppendMicrosecondsAsSeconds(long ticks)
    {
        const long ticksPerSecond = 1_000_000;
        const long fastFrom = 1_000;
        const long fastBelow = (1L << 33) * ticksPerSecond;
        if (ticks < fastFrom || ticks >= fastBelow)
        {
            AppendDouble(ticks / (double)ticksPerSecond);
            return;
        }

        AppendInteger(ticks / ticksPerSecond);
        var fraction = (int)(ticks % ticksPerSecond);
        Append((byte)'.');
        if (fraction == 0)
        {
            Append((byte)'0');
            return;
        }

        // Six digits with leading zeros, then the trailing zeros dropped: 500000 -> ".5", 1 -> ".000001".
        var digits = Reserve(6);
        for (var i = 5; i >= 0; i--)
        {
            digits[i] = (byte)('0' + (fraction % 10));
            fraction /= 10;
        }

        Length += digits[..6].TrimEnd((byte)'0').Length;
    }

    /// <summary>
    /// A JSON string: quote, backslash and control characters escaped, everything else as plain UTF-8 (so
    /// scenario text and non-ASCII names stay readable). A lone surrogate is refused rather than replaced,
    /// because the journal must fail loudly instead of recording a value other than the one the run produced.
    /// </summary>
    /// <exception cref="ArgumentException">The text contains a lone surrogate.</exception>
    public void AppendString(string text)
    {
        var chars = text.AsSpan();
        Append((byte)'"');
        while (!chars.IsEmpty)
        {
            var plain = chars.IndexOfAnyExcept(PlainAscii);
            var run = plain < 0 ? chars.Length : plain;
            if (run > 0)
            {
                // Printable ASCII: one byte per character.
                Ascii.FromUtf16(chars[..run], Reserve(run), out _);
                Length += run;
                chars = chars[run..];
                continue;
            }

            var used = AppendSpecial(chars);
            if (used == 0)
            {
                throw new ArgumentException($"The text contains a lone surrogate (U+{(int)chars[0]:X4}); it has no UTF-8 form.", nameof(text));
            }

            chars = chars[used..];
        }

        Append((byte)'"');
    }

    /// <summary>
    /// Appends the first character (or surrogate pair) of <paramref name="chars"/>; returns how many it used, or 0 for a
    /// lone surrogate (nothing appended).
    /// </summary>
    private int AppendSpecial(ReadOnlySpan<char> chars)
    {
        var c = chars[0];
        switch (c)
        {
            case '"': Append("\\\""u8); return 1;
            case '\\': Append("\\\\"u8); return 1;
            case '\n': Append("\\n"u8); return 1;
            case '\r': Append("\\r"u8); return 1;
            case '\t': Append("\\t"u8); return 1;
            case '\b': Append("\\b"u8); return 1;
            case '\f': Append("\\f"u8); return 1;
        }

        if (c < ' ')
        {
            Append("\\u00"u8);
            Append((byte)"0123456789abcdef"[c >> 4]);
            Append((byte)"0123456789abcdef"[c & 0xF]);
            return 1;
        }

        if (Rune.DecodeFromUtf16(chars, out var rune, out var used) != OperationStatus.Done)
        {
            return 0;
        }

        Length += rune.EncodeToUtf8(Reserve(rune.Utf8SequenceLength));
        return used;
    }

    private Span<byte> Reserve(int count)
    {
        if (_bytes.Length - Length < count)
        {
            Array.Resize(ref _bytes, Math.Max(_bytes.Length * 2, Length + count));
        }

        return _bytes.AsSpan(Length);
    }
}
