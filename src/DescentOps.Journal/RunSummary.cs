using DescentOps.Records;

namespace DescentOps.Journal;

/// <summary>How a run ended, written as the journal's last line.</summary>
/// <param name="OutcomeKind">The run outcome's kind name, kept as text so a reader needs no engine version.</param>
/// <param name="Reason">The human-readable cause.</param>
/// <param name="FinalTimeS">Simulated seconds at the end of the run.</param>
/// <param name="Data">End-of-run figures (final depth, energy used...), in the order they should be written.</param>
public sealed record RunSummary(string OutcomeKind, string Reason, double FinalTimeS, IReadOnlyList<RecordField> Data);
