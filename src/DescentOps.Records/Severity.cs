namespace DescentOps.Records;

/// <summary>How much an event matters to an operator, lowest first.</summary>
public enum Severity
{
    Debug = 0,
    Info = 1,
    Notice = 2,
    Warning = 3,
    Alarm = 4,
    Critical = 5,
}
