namespace DescentOps.Mission.Messages;

/// <summary>The link tells the probe how full the probe-end frame buffer is, so the next frame can report it.</summary>
public sealed record LinkBufferFill(double Fraction);
