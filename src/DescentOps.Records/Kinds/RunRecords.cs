namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The run itself: the uncertain inputs it drew at its start.</summary>
public static class RunRecords
{
    public const string InputsDrawn = "run.inputs_drawn";
}
