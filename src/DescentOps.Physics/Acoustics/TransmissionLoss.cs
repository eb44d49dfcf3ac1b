namespace DescentOps.Physics.Acoustics;

/// <summary>Geometric spreading plus absorption, dB re 1 m.</summary>
public static class TransmissionLoss
{
    private const string Model = "the spreading-plus-absorption transmission loss";

    /// <summary>
    /// k·10·log10(r / 1 m) + α·r: k = 2 spherical, 1 cylindrical, 1.5 the usual compromise for a channel bounded by
    /// an ice ceiling and a seabed or thermocline.
    /// </summary>
    public static double PowerLawDb(double rangeM, double spreadingExponent, double absorptionDbPerKm)
    {
        ValidRange.Require(rangeM, 1.0, double.MaxValue, nameof(rangeM), "m", Model);
        ValidRange.Require(spreadingExponent, 1.0, 2.0, nameof(spreadingExponent), "(spreading exponent)", Model);
        ValidRange.RequireNonNegative(absorptionDbPerKm, nameof(absorptionDbPerKm), "dB/km", Model);
        return (spreadingExponent * 10.0 * Math.Log10(rangeM)) + (absorptionDbPerKm * rangeM / 1e3);
    }

    /// <summary>Spherical out to the channel's trapping range r0, cylindrical beyond it.</summary>
    public static double SphericalThenCylindricalDb(double rangeM, double transitionRangeM, double absorptionDbPerKm)
    {
        ValidRange.Require(transitionRangeM, 1.0, double.MaxValue, nameof(transitionRangeM), "m", Model);
        if (rangeM <= transitionRangeM) return PowerLawDb(rangeM, 2.0, absorptionDbPerKm);
        ValidRange.RequireNonNegative(absorptionDbPerKm, nameof(absorptionDbPerKm), "dB/km", Model);
        return (20.0 * Math.Log10(transitionRangeM)) + (10.0 * Math.Log10(rangeM / transitionRangeM)) + (absorptionDbPerKm * rangeM / 1e3);
    }
}
