namespace DescentOps.Mission.Probe;

/// <summary>The probe's own timer: time for a telemetry frame, or the instant it reaches the ocean.</summary>
public sealed record ProbeStepDue
{
    public static ProbeStepDue Instance { get; } = new();

    private ProbeStepDue()
    {
    }
}
