namespace DescentOps.Reports.Export;

/// <summary>What a CSV export wrote.</summary>
public sealed record CsvExportResult(string EventsPath, string TelemetryPath, long Events, long TelemetryRows, long? TruncatedAtLine);
