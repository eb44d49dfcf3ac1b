namespace DescentOps.Physics.Links;

/// <summary>Power budget of the tether's optical link, evaluated once per simulation frame as the payout changes.</summary>
public static class FibreLinkBudget
{
    private const string Model = "the fibre link budget";

    /// <summary>Received power P_tx − losses and margin P_rx − S_rx − penalty; up when the margin meets the requirement.</summary>
    public static FibreLinkBudgetResult Evaluate(FibreLink link)
    {
        ArgumentNullException.ThrowIfNull(link);
        ValidRange.RequireNonNegative(link.LengthM, nameof(link.LengthM), "m", Model);
        ValidRange.RequireNonNegative(link.AttenuationDbPerKm, nameof(link.AttenuationDbPerKm), "dB/km", Model);
        ValidRange.Require(link.SpliceCount, 0, int.MaxValue, nameof(link.SpliceCount), "(count)", Model);
        ValidRange.Require(link.ConnectorCount, 0, int.MaxValue, nameof(link.ConnectorCount), "(count)", Model);
        foreach (var (value, name) in new[]
                 {
                     (link.SpliceLossDb, nameof(link.SpliceLossDb)), (link.ConnectorLossDb, nameof(link.ConnectorLossDb)),
                     (link.BendLossDb, nameof(link.BendLossDb)), (link.PackLossDb, nameof(link.PackLossDb)),
                     (link.RotaryJointLossDb, nameof(link.RotaryJointLossDb)), (link.AgeingAllowanceDb, nameof(link.AgeingAllowanceDb)),
                     (link.PenaltyDb, nameof(link.PenaltyDb)),
                 })
        {
            // A negative loss would be a gain no passive element gives; it always means a sign slip upstream.
            ValidRange.RequireNonNegative(value, name, "dB", Model);
        }

        var loss = (link.AttenuationDbPerKm * link.LengthM / 1e3) + (link.SpliceCount * link.SpliceLossDb)
            + (link.ConnectorCount * link.ConnectorLossDb) + link.BendLossDb + link.PackLossDb + link.RotaryJointLossDb + link.AgeingAllowanceDb;
        var received = link.TransmitPowerDbm - loss;
        var margin = received - link.ReceiverSensitivityDbm - link.PenaltyDb;
        return new FibreLinkBudgetResult(loss, received, margin, margin >= link.RequiredMarginDb);
    }
}
