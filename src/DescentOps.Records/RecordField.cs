using System.Globalization;

namespace DescentOps.Records;

/// <summary>
/// One named value of a journal record. A tagged value rather than <c>object</c> so that writing a record
/// boxes nothing and the formatter knows each value's JSON type without reflection.
/// </summary>
public readonly struct RecordField
{
    private RecordField(string name, RecordFieldKind kind, double number, long integer, string? text)
    {
        Name = name;
        Kind = kind;
        Number = number;
        Integer = integer;
        Text = text;
    }

    public string Name { get; }
    public RecordFieldKind Kind { get; }
    public double Number { get; }
    public long Integer { get; }
    public string? Text { get; }

    public static RecordField Of(string name, double value) => new(name, RecordFieldKind.Number, value, 0, null);
    public static RecordField Of(string name, long value) => new(name, RecordFieldKind.Integer, 0, value, null);
    public static RecordField Of(string name, int value) => new(name, RecordFieldKind.Integer, 0, value, null);
    public static RecordField Of(string name, bool value) => new(name, RecordFieldKind.Boolean, 0, value ? 1 : 0, null);
    public static RecordField Of(string name, string value) => new(name, RecordFieldKind.Text, 0, 0, value);

    public override string ToString() => Kind switch
    {
        RecordFieldKind.Number => Name + "=" + Number.ToString("R", CultureInfo.InvariantCulture),
        RecordFieldKind.Integer => Name + "=" + Integer.ToString(CultureInfo.InvariantCulture),
        RecordFieldKind.Boolean => $"{Name}={(Integer != 0 ? "true" : "false")}",
        _ => $"{Name}={Text}",
    };
}

public enum RecordFieldKind
{
    Number,
    Integer,
    Boolean,
    Text,
}
