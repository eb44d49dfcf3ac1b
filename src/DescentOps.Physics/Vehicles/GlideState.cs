namespace DescentOps.Physics.Vehicles;

/// <summary>A steady wings-level glide: angle of attack, glide path angle below (dive) or above (climb) horizontal, speeds.</summary>
public sealed record GlideState(double AngleOfAttackRad, double GlidePathAngleRad, double SpeedMPerS, double HorizontalSpeedMPerS, double VerticalSpeedMPerS);
