namespace DescentOps.Mission.Messages;

/// <summary>The probe lets a relay go at its head depth, as a telecommand from <see cref="Origin"/> asked.</summary>
public sealed record DropRelay(double DepthM, string Origin);
