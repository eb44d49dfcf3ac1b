namespace DescentOps.Physics.Acoustics;

/// <summary>The sonar equation evaluated at one range; positive margin means messages get through.</summary>
public sealed record AcousticLinkBudget(double RangeM, double TransmissionLossDb, double NoiseLevelDb, double SignalToNoiseDb, double MarginDb)
{
    /// <summary>True when the modem's threshold is met.</summary>
    public bool LinkUp => MarginDb >= 0.0;
}
