namespace DescentOps.Reports.Export;

/// <summary>What a SQLite export wrote.</summary>
/// <param name="RunId">The run's row in <c>runs</c>.</param>
/// <param name="Replaced">The same run was in the database already and its rows were replaced.</param>
/// <param name="Events">Events exported.</param>
/// <param name="Fields">Data fields exported.</param>
/// <param name="TruncatedAtLine">Where the log is cut, or null.</param>
public sealed record SqliteExportResult(long RunId, bool Replaced, long Events, long Fields, long? TruncatedAtLine);
