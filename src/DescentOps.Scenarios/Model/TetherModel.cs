namespace DescentOps.Scenarios.Model;

/// <summary>
/// The fibre tether spooled on the probe: length available, the speed light travels in it, its optical budget, and the
/// frames the probe holds while no path home is up (<see cref="BufferFrames"/>, also the surface end's command queue).
/// </summary>
public sealed record TetherModel(double LengthM, double SignalSpeedMPerS, FibreOpticsModel? Optics = null, int BufferFrames = 0)
{
    /// <summary>The optical budget in force: the scenario's, or the defaults.</summary>
    public FibreOpticsModel OpticsOrDefault => Optics ?? FibreOpticsModel.Default;
}
