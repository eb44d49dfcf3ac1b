namespace DescentOps.Physics.Descent;

/// <summary>
/// The side balance of a moving probe (<see cref="SideBalance"/>).
/// </summary>
/// <param name="RequiredSideHeatW">Film heat plus the least (zoned) wall heater power that keeps the gap open along the whole body: max(film, Q_lat(ℓ) − K·w0).</param>
/// <param name="SideHeatSuppliedW">Film heat plus the wall heater power.</param>
/// <param name="RefreezeClosureM">Distance behind the head where refrozen water closes the gap (+∞ when it never does).</param>
/// <param name="Held">True when the closure lies within the body: the probe is frozen in while moving (a refreeze stall).</param>
/// <param name="ClearanceM">Mean water gap along the body (0 when held); the clearance the tilt model steers with.</param>
/// <param name="LateralLossW">Conduction into the ice along the whole body, Q_lat(ℓ).</param>
public sealed record SideBalanceSolution(
    double RequiredSideHeatW,
    double SideHeatSuppliedW,
    double RefreezeClosureM,
    bool Held,
    double ClearanceM,
    double LateralLossW);
