namespace DescentOps.Physics.Shell;

/// <summary>
/// A convecting layer under the conductive lid: nearly isothermal at <see cref="TemperatureK"/> from
/// <see cref="TopDepthM"/> down to a basal boundary layer <see cref="BasalBoundaryM"/> thick, across which the ice warms
/// linearly to the melting point at the base. Published interiors run at 250–265 K (McKinnon 1999, Geophys. Res. Lett.
/// 26, 951, from memory); the isothermal core and the linear basal layer are MODEL choices of ours.
/// </summary>
public sealed record ConvectiveLayer(double TopDepthM, double TemperatureK, double BasalBoundaryM);
