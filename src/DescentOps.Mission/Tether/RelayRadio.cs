using DescentOps.Physics.Links;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Tether;

/// <summary>
/// The relays' radio through the shell: each hop's budget from <see cref="IceRadioLinkBudget"/>, with the absorption of
/// the warmest ice in the hop (its deeper end, since the shell warms with depth) from the MacGregor et al. (2007)
/// conductivity at the local temperature. Warmer ice conducts more, absorbs more, and so shortens the range.
/// </summary>
public sealed class RelayRadio
{
    /// <summary>Shortest hop evaluated: below a metre the far-field spreading law means nothing for a VHF antenna.</summary>
    public const double ShortestHopM = 1.0;

    /// <summary>Farthest range searched, 100 km: far beyond any shell a probe melts through.</summary>
    public const double RangeSearchLimitM = 1e5;

    private const double SpeedOfLightMPerS = Physics.PhysicalConstants.SpeedOfLightMPerS;
    private readonly Func<double, double> _temperatureAtDepthK;

    public RelayRadio(RelayPlanModel plan, Func<double, double> temperatureAtDepthK)
    {
        ArgumentNullException.ThrowIfNull(plan);
        _temperatureAtDepthK = temperatureAtDepthK;
        Parameters = ParametersNamed(plan.Conductivity);
        Link = new IceRadioLink(plan.TransmitPowerDbm, plan.AntennaGainDbi, plan.AntennaGainDbi, plan.FrequencyHz, plan.BandwidthHz,
            plan.NoiseFigureDb, plan.RequiredSnrDb, plan.RequiredMarginDb, plan.MiscLossDb, Parameters.RelativePermittivity);
    }

    public IceRadioLink Link { get; }

    public IceConductivityParameters Parameters { get; }

    /// <summary>Ice temperature at a depth, held inside the conductivity model's range (the base sits at the melting point).</summary>
    public double IceTemperatureK(double depthM) =>
        Math.Clamp(_temperatureAtDepthK(depthM), IceElectricalConductivity.MinimumTemperatureK, IceElectricalConductivity.MaximumTemperatureK);

    public double AttenuationDbPerM(double depthM) => IceRadioAttenuation.DbPerM(IceTemperatureK(depthM), Parameters, IceImpurities.None);

    /// <summary>Margin of the hop between two depths; non-negative means the hop closes.</summary>
    public double HopMarginDb(double upperDepthM, double lowerDepthM) =>
        IceRadioLinkBudget.MarginDb(Link, Math.Max(Math.Abs(lowerDepthM - upperDepthM), ShortestHopM), AttenuationDbPerM(Math.Max(upperDepthM, lowerDepthM)));

    /// <summary>Longest hop that closes when its deeper end is at <paramref name="depthM"/>.</summary>
    public double RangeM(double depthM) => IceRadioLinkBudget.MaximumSpacing(Link, AttenuationDbPerM(depthM), RangeSearchLimitM).SpacingM;

    /// <summary>Travel time over a distance in ice: the wave slows by √ε′.</summary>
    public double PropagationS(double distanceM) => distanceM * Math.Sqrt(Parameters.RelativePermittivity) / SpeedOfLightMPerS;

    public static IceConductivityParameters ParametersNamed(string word) => word switch
    {
        "m07-std" => IceConductivityParameters.MacGregor2007Standard,
        "m07-adj" => IceConductivityParameters.MacGregor2007Adjusted,
        "w97" => IceConductivityParameters.Wolff1997,
        _ => throw new ArgumentOutOfRangeException(nameof(word), word, "no such conductivity set"),
    };
}
