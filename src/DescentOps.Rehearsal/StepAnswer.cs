using System.Text.Json.Nodes;
using DescentOps.Mission.Messages;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// A person's answer to a procedure step at the console: which procedure and step, confirm or skip, and who answers.
/// <see cref="Check"/> refuses a malformed body naming the field; whether the step waits for an answer is the ground's
/// to judge when the answer arrives (it may have moved on), and it logs an answer it ignores.
/// </summary>
public static class StepAnswer
{
    public const int MaxNameLength = 80;

    public const string Confirm = "confirm";
    public const string Skip = "skip";

    /// <summary>Null and the canonical body when the answer is well formed, else the error naming the field.</summary>
    public static string? Check(JsonObject body, Scenario scenario, out string canonical)
    {
        canonical = "";
        if (Text(body, "procedure", 100) is not { } procedure) return "procedure: give the procedure's name";
        if (scenario.Procedures.FirstOrDefault(p => p.Name == procedure) is not { } model) return $"procedure: the scenario has no procedure '{procedure}'";
        if (Text(body, "step", 100) is not { } step) return "step: give the step's name";
        if (model.Steps.FirstOrDefault(s => s.Name == step) is not { } stepModel) return $"step: procedure '{procedure}' has no step '{step}'";
        if (!stepModel.Confirm) return $"step: step '{step}' does not ask for confirmation";
        if (Text(body, "answer", 10) is not (Confirm or Skip) and var answer) return $"answer: '{answer}' is neither '{Confirm}' nor '{Skip}'";
        if (Text(body, "by", MaxNameLength) is not { } by) return $"by: give who answers (1 to {MaxNameLength} characters)";
        canonical = new JsonObject { ["procedure"] = procedure, ["step"] = step, ["answer"] = body["answer"]!.GetValue<string>(), ["by"] = by }.ToJsonString();
        return null;
    }

    /// <summary>The ground's message for a checked input.</summary>
    public static ProcedureStepAnswer Parse(OperatorInput input)
    {
        var o = JsonNode.Parse(input.Body)!.AsObject();
        return new ProcedureStepAnswer(o["procedure"]!.GetValue<string>(), o["step"]!.GetValue<string>(), o["answer"]!.GetValue<string>() == Confirm, o["by"]!.GetValue<string>(), input.Number);
    }

    private static string? Text(JsonObject body, string field, int maxLength) =>
        body[field] is JsonValue v && v.TryGetValue<string>(out var text) && text.Trim().Length is > 0 and var n && n <= maxLength ? text.Trim() : null;
}
