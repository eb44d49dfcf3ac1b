namespace DescentOps.Mission.Procedures;

/// <summary>A procedure that passed its checks: its steps, run from the first, and when the ground starts it by itself.</summary>
public sealed record CompiledProcedure(string Name, double? StartAtS, IReadOnlyList<CompiledStep> Steps, string FieldPath)
{
    public int IndexOf(string step)
    {
        for (var i = 0; i < Steps.Count; i++)
        {
            if (Steps[i].Name == step) return i;
        }

        return -1;
    }
}
