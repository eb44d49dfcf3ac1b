using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The power section (source, battery, turbine, bus loads) and the rules that tie its fields together.</summary>
internal static class PowerReader
{
    internal static PowerModel Read(BoundSection power, bool hasJets)
    {
        var battery = power.OptionalSection("battery") is { } b
            ? new BatteryModel(
                b.Quantity("capacity"),
                b.Quantity("max_discharge_power"),
                b.OptionalQuantity("max_charge_power") ?? b.Quantity("max_discharge_power"),
                b.Number("charge_efficiency"),
                b.Number("discharge_efficiency"),
                b.OptionalNumber("initial_charge") ?? 1.0,
                b.OptionalQuantity("temperature") ?? ScenarioLoader.DefaultBatteryTemperatureK)
            : null;
        var turbine = power.OptionalSection("turbine") is { } t
            ? new TurbineModel(
                t.Quantity("rotor_diameter"),
                t.Number("power_coefficient"),
                t.Number("drivetrain_efficiency"),
                t.OptionalQuantity("cut_in_speed") ?? 0.0,
                t.Quantity("rated_speed"),
                t.Quantity("current_speed"),
                t.OptionalQuantity("water_density") ?? ScenarioLoader.DefaultWaterDensityKgPerM3)
            : null;
        var loads = power.List("loads");
        return new PowerModel(
            power.Text("source") == "fission" ? PowerSourceKind.Fission : PowerSourceKind.Radioisotope,
            power.OptionalQuantity("thermal_power") ?? 0.0,
            power.Number("conversion_efficiency"),
            power.OptionalNumber("degradation_per_year") ?? 0.0,
            power.OptionalQuantity("fuel_age") ?? 0.0,
            power.OptionalQuantity("electric_power") ?? 0.0,
            battery,
            loads.Count == 0 ? (hasJets ? [.. DefaultLoads, DefaultJetsLoad] : DefaultLoads) : [.. loads.Select(Load)],
            turbine)
        {
            WasteHeatToHead = power.OptionalSection("heat_path")?.Number("head") ?? 0.0,
            WasteHeatToWall = power.OptionalSection("heat_path")?.Number("wall") ?? 0.0,
        };
    }

    /// <summary>The bus a power section without loads gets: heat and electronics first, the wall heater shed first.</summary>
    private static readonly BusLoadModel[] DefaultLoads =
    [
        new("electronics", BusLoadRole.Electronics, 0, 0.0),
        new("head", BusLoadRole.HeadHeater, 0, 0.0),
        new("wall", BusLoadRole.WallHeater, 1, 0.0),
    ];

    /// <summary>The jets' load on a default bus: shed with the wall heater, before the head and the electronics.</summary>
    private static readonly BusLoadModel DefaultJetsLoad = new("jets", BusLoadRole.Jets, 1, 0.0);

    private static BusLoadModel Load(BoundSection load) => new(
        load.Text("name"),
        load.Text("role") switch
        {
            "head_heater" => BusLoadRole.HeadHeater,
            "wall_heater" => BusLoadRole.WallHeater,
            "electronics" => BusLoadRole.Electronics,
            "jets" => BusLoadRole.Jets,
            _ => BusLoadRole.Fixed,
        },
        (int)load.Integer("priority"),
        load.OptionalQuantity("power") ?? 0.0);

    /// <summary>The cross-field rules of the power section: the source's own fields, and a bus that has every heater.</summary>
    internal static void Check(PowerModel power, BoundSection section, bool hasJets, List<ScenarioError> errors)
    {
        var radioisotope = power.Source == PowerSourceKind.Radioisotope;
        if (radioisotope && section.OptionalQuantity("thermal_power") is null)
        {
            errors.Add(new ScenarioError(section.Location, "power.thermal_power", "a radioisotope source needs its thermal_power"));
        }

        if (!radioisotope && section.OptionalQuantity("electric_power") is null)
        {
            errors.Add(new ScenarioError(section.Location, "power.electric_power", "a fission source needs its electric_power"));
        }

        var foreign = radioisotope
            ? new[] { ("electric_power", section.OptionalQuantity("electric_power") is not null) }
            : [("thermal_power", section.OptionalQuantity("thermal_power") is not null), ("degradation_per_year", section.OptionalNumber("degradation_per_year") is not null), ("fuel_age", section.OptionalQuantity("fuel_age") is not null)];
        foreach (var (field, _) in foreign.Where(f => f.Item2))
        {
            errors.Add(new ScenarioError(section.LocationOf(field), $"power.{field}", $"'{field}' does not belong to a {(radioisotope ? "radioisotope" : "fission")} source"));
        }

        var loads = section.List("loads");
        for (var i = 0; i < loads.Count; i++)
        {
            var fixedLoad = power.Loads[i].Role == BusLoadRole.Fixed;
            if (fixedLoad != (loads[i].OptionalQuantity("power") is not null))
            {
                errors.Add(new ScenarioError(loads[i].Location, $"power.loads[{i}].power", fixedLoad
                    ? "a fixed load needs its power"
                    : "a heater or the electronics draws what the probe asks of it; 'power' belongs to fixed loads"));
            }
        }

        foreach (var role in new[] { BusLoadRole.HeadHeater, BusLoadRole.WallHeater, BusLoadRole.Electronics })
        {
            var count = power.Loads.Count(l => l.Role == role);
            if (count != 1)
            {
                var word = role switch { BusLoadRole.HeadHeater => "head_heater", BusLoadRole.WallHeater => "wall_heater", _ => "electronics" };
                errors.Add(new ScenarioError(section.LocationOf("loads"), "power.loads", $"the bus needs exactly one {word} load, found {count}"));
            }
        }

        var jetLoads = power.Loads.Count(l => l.Role == BusLoadRole.Jets);
        if (jetLoads != (hasJets ? 1 : 0))
        {
            errors.Add(new ScenarioError(section.LocationOf("loads"), "power.loads", hasJets
                ? $"a probe with jets needs exactly one jets load on its bus, found {jetLoads}"
                : "a jets load belongs to a probe with a probe.jets section"));
        }

        if (power.WasteHeatToHead + power.WasteHeatToWall > 1.0)
        {
            errors.Add(new ScenarioError(section.Section("heat_path").Location, "power.heat_path", "the head and wall shares of the waste heat add up to more than 1"));
        }

        if (power.Turbine is { } turbine && turbine.CutInSpeedMPerS > turbine.RatedSpeedMPerS)
        {
            errors.Add(new ScenarioError(section.Section("turbine").Location, "power.turbine.cut_in_speed", "the cut-in speed is above the rated speed"));
        }
    }
}
