using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>Reads the <c>procedures</c> section as written; its meaning is checked against the mission when the run is assembled.</summary>
internal static class ProceduresReader
{
    public static IReadOnlyList<ProcedureModel> Read(BoundSection root) =>
    [
        .. root.List("procedures").Select((p, i) => new ProcedureModel(
            p.Text("name"),
            p.OptionalQuantity("start_at"),
            [.. p.List("steps").Select((s, k) => new ProcedureStepModel(
                s.Text("name"),
                s.OptionalText("send"),
                s.OptionalText("wait_for"),
                s.OptionalQuantity("within"),
                s.OptionalText("expect"),
                s.OptionalText("on_pass"),
                s.OptionalText("on_fail"),
                $"procedures[{i}].steps[{k}]") { Confirm = s.OptionalText("confirm") == "true" })],
            $"procedures[{i}]")),
    ];
}
