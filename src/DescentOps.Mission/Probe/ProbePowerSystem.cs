using DescentOps.Physics.Power;
using DescentOps.Scenarios.Model;

namespace DescentOps.Mission.Probe;

/// <summary>
/// The probe's power system as a scenario describes it, turned into the Physics models: the source's output at a
/// time, the turbine's output in the ocean, the battery, and the bus loads for the demands of the moment. Pure: the
/// probe component keeps the state and calls this.
/// </summary>
public sealed class ProbePowerSystem
{
    /// <summary>
    /// Pack voltage used to turn bus power into cell current: 28 V, a usual spacecraft bus (common practice, no
    /// source). State of charge and every energy figure are independent of it; only coulomb counts would change.
    /// </summary>
    public const double NominalVoltageV = 28.0;

    /// <summary>
    /// An emptied battery rejoins the bus once recharged to this share, 10 % (a rule of thumb of ours, no source): a bus
    /// controller with hysteresis, so a battery at the edge does not switch a heater on and off every few seconds.
    /// </summary>
    public const double ReconnectStateOfCharge = 0.10;

    private readonly PowerModel _power;
    private readonly ProbeModel _probe;

    public ProbePowerSystem(PowerModel power, ProbeModel probe)
    {
        _power = power;
        _probe = probe;
        Battery = power.Battery is { } b
            ? new BusBattery(
                BatteryParameters.LithiumIon(b.CapacityJ / NominalVoltageV) with { CoulombicEfficiency = b.ChargeEfficiency },
                NominalVoltageV,
                b.DischargeEfficiency,
                b.MaxDischargePowerW,
                b.MaxChargePowerW,
                b.CellTemperatureK)
            : null;
        HeadLoad = power.Loads.Single(l => l.Role == BusLoadRole.HeadHeater).Name;
        WallLoad = power.Loads.Single(l => l.Role == BusLoadRole.WallHeater).Name;
        JetsLoad = power.Loads.SingleOrDefault(l => l.Role == BusLoadRole.Jets)?.Name;
    }

    public BusBattery? Battery { get; }

    public double InitialStateOfCharge => _power.Battery?.InitialStateOfCharge ?? 0.0;

    /// <summary>Name of the head heater's load on the bus.</summary>
    public string HeadLoad { get; }

    /// <summary>Name of the wall heater's load on the bus.</summary>
    public string WallLoad { get; }

    /// <summary>Name of the jets' load (heat and pump) on the bus; null for a probe without jets.</summary>
    public string? JetsLoad { get; }

    public IEnumerable<BusLoadModel> LoadModels => _power.Loads;

    public PowerSourceKind SourceKind => _power.Source;

    /// <summary>Electric output of the source <paramref name="elapsedS"/> into the run, before any dip.</summary>
    public double SourcePowerW(double elapsedS) => _power.Source switch
    {
        PowerSourceKind.Radioisotope => Radioisotope(elapsedS).ElectricPowerW,
        _ => _power.ElectricPowerW,
    };

    /// <summary>Heat the source releases (the radioisotope's decay heat, or the core heat behind the fission output).</summary>
    public double SourceThermalPowerW(double elapsedS) => _power.Source switch
    {
        PowerSourceKind.Radioisotope => Radioisotope(elapsedS).ThermalPowerW,
        _ => FissionSource.AtElectricOutput(_power.ElectricPowerW, _power.ConversionEfficiency).ThermalPowerW,
    };

    /// <summary>
    /// The source's waste heat by destination <paramref name="elapsedS"/> into the run (<see cref="WasteHeatPath"/>): it
    /// flows whatever the bus does, so a dip in electric power leaves it flowing.
    /// </summary>
    public WasteHeatSplit WasteHeat(double elapsedS) =>
        WasteHeatPath.Split(SourceThermalPowerW(elapsedS), SourcePowerW(elapsedS), _power.WasteHeatToHead, _power.WasteHeatToWall);

    /// <summary>True when some waste heat reaches the head or the wall.</summary>
    public bool HeatsProbe => _power.WasteHeatToHead + _power.WasteHeatToWall > 0;

    /// <summary>The turbine's output: only in the ocean, where the current passes the rotor.</summary>
    public double HarvestPowerW(bool inOcean) =>
        inOcean && _power.Turbine is { } t ? TurbinePowerW(t, t.CurrentSpeedMPerS) : 0.0;

    /// <summary>Most the bus could ever offer: the source when new, the battery's limit and the turbine's rated output.</summary>
    public double MaxAvailablePowerW() =>
        SourcePowerW(0.0) + (_power.Battery?.MaxDischargePowerW ?? 0.0) + (_power.Turbine is { } t ? TurbinePowerW(t, t.RatedSpeedMPerS) : 0.0);

    private RadioisotopeOutput Radioisotope(double elapsedS) =>
        RadioisotopeHeatSource.Output(_power.ThermalPowerW, _power.ConversionEfficiency, _power.DegradationPerYear, _power.FuelAgeS + elapsedS);

    private static double TurbinePowerW(TurbineModel turbine, double currentSpeedMPerS) =>
        CurrentTurbine.ElectricPowerW(currentSpeedMPerS, turbine.WaterDensityKgPerM3, Math.PI * turbine.RotorDiameterM * turbine.RotorDiameterM / 4, turbine.PowerCoefficient, turbine.DrivetrainEfficiency, turbine.CutInSpeedMPerS, turbine.RatedSpeedMPerS);

    /// <summary>
    /// The loads that ask for power now; a load switched off by telecommand does not ask. Docked vehicles' chargers
    /// come last of all (one priority below the least important scenario load): the probe's own descent goes first.
    /// </summary>
    public IReadOnlyList<PoweredLoad> Loads(double headDemandW, double wallDemandW, IReadOnlySet<string> switchedOff, IReadOnlyDictionary<string, double>? dockDemandsW = null, double jetsDemandW = 0.0) =>
    [
        .. _power.Loads.Where(l => !switchedOff.Contains(l.Name)).Select(l => new PoweredLoad(l.Name, l.Priority, l.Role switch
        {
            BusLoadRole.HeadHeater => headDemandW,
            BusLoadRole.WallHeater => wallDemandW,
            BusLoadRole.Electronics => _probe.ElectronicsPowerW,
            BusLoadRole.Jets => jetsDemandW,
            _ => l.PowerW,
        })),
        .. (dockDemandsW ?? new Dictionary<string, double>()).Select(d => new PoweredLoad(DockLoadName(d.Key), DockPriority, d.Value)),
    ];

    /// <summary>Priority of a docked vehicle's charger: after every load of the scenario's bus.</summary>
    public int DockPriority => _power.Loads.Max(l => l.Priority) + 1;

    /// <summary>The bus name of a docked vehicle's charger.</summary>
    public static string DockLoadName(string vehicle) => "dock-" + vehicle;

    /// <summary>Allocates the bus: the source scaled by the power dips in force, the turbine, the battery unless locked out.</summary>
    public BusAllocation Allocate(double elapsedS, double dipFraction, bool inOcean, double stateOfCharge, bool batteryLockedOut, IReadOnlyList<PoweredLoad> loads) =>
        PowerBus.Allocate(SourcePowerW(elapsedS) * dipFraction, HarvestPowerW(inOcean), stateOfCharge, Battery, loads, !batteryLockedOut);
}
