namespace DescentOps.Physics.Power;

/// <summary>
/// Load shedding by priority. Loads are served in priority order (ties by name, ordinal, so the answer never depends
/// on list order); a load that does not fit in what is left is shed, and smaller loads further down the list may
/// still run, because keeping a beacon dark to honour a heater that cannot run anyway helps no one.
/// </summary>
public static class LoadShedding
{
    private const string Model = "the load shedding rule";

    /// <summary>Allocates the available power; the supplied power never exceeds it.</summary>
    public static LoadAllocation Allocate(double availablePowerW, IReadOnlyCollection<PoweredLoad> loads)
    {
        ArgumentNullException.ThrowIfNull(loads);
        ValidRange.RequireNonNegative(availablePowerW, nameof(availablePowerW), "W", Model);
        var running = new List<PoweredLoad>();
        var shed = new List<PoweredLoad>();
        // Summing what is admitted, rather than subtracting from the budget, keeps the guarantee exact in floating
        // point: the sum of the running loads, added in this order, never exceeds the available power.
        var used = 0.0;
        foreach (var load in loads.OrderBy(l => l.Priority).ThenBy(l => l.Name, StringComparer.Ordinal))
        {
            ValidRange.RequireNonNegative(load.PowerW, nameof(load.PowerW), "W", Model);
            if (used + load.PowerW <= availablePowerW)
            {
                running.Add(load);
                used += load.PowerW;
            }
            else
            {
                shed.Add(load);
            }
        }

        return new LoadAllocation(running, shed, used, availablePowerW - used);
    }
}
