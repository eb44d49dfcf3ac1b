namespace DescentOps.Records.Kinds;

/// <summary>Record kinds of the journal written by one source. The tether and its fibre link.</summary>
public static class TetherRecords
{
    public const string Broken = "tether.broken";
    public const string LinkBudget = "tether.link_budget";
    public const string LinkDown = "tether.link_down";
    public const string LinkUp = "tether.link_up";
    public const string Payout = "tether.payout";
}
