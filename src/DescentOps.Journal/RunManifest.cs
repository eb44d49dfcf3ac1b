using System.Security.Cryptography;
using System.Text;
using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>
/// What a run was made from: enough to rerun it and to check that a rerun used the same inputs. The full
/// scenario source travels with the log so that a journal stays meaningful after the scenario file changes.
/// </summary>
public sealed record RunManifest(
    string ToolVersion,
    string ScenarioName,
    string ScenarioText,
    long Seed,
    double UntilSeconds,
    string RandomAlgorithm)
{
    /// <summary>Further named values a caller wants on the manifest line (host options, feature flags...).</summary>
    public IReadOnlyList<RecordField> Extra { get; init; } = [];

    /// <summary>
    /// Lowercase hex SHA-256 of the UTF-8 bytes of <see cref="ScenarioText"/>: a short handle for "same
    /// scenario" that can be compared without reading the text. Computed on every call rather than cached,
    /// so that a <c>with</c> expression can never carry a stale digest and record equality stays value equality.
    /// </summary>
    public string ScenarioSha256 => Convert.ToHexStringLower(SHA256.HashData(Encoding.UTF8.GetBytes(ScenarioText)));
}
