using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>A vehicles entry, propeller or glider, and the rules that tie its fields together.</summary>
internal static class VehicleReader
{
    /// <summary>A vehicle; a missing speed or propulsion power reads as 0 here and is refused by the consistency check.</summary>
    internal static VehicleModel Read(BoundSection v)
    {
        var glider = v.OptionalSection("glider");
        var hull = v.OptionalSection("hull");
        var current = v.OptionalSection("current");
        var navigation = v.OptionalSection("navigation");
        var dock = v.OptionalSection("dock");
        var graver = Physics.Vehicles.GliderCoefficients.Graver2005;
        var propeller = Physics.Vehicles.PropelledVehicle.Default;
        return new VehicleModel(
            v.Text("name"),
            v.Quantity("battery"),
            v.Number("reserve"),
            v.Quantity("hotel_power"),
            v.OptionalQuantity("propulsion_power") ?? 0.0,
            v.OptionalQuantity("speed") ?? 0.0,
            v.Quantity("profile_depth"),
            v.OptionalNumber("speed_variation") ?? 0.0,
            v.OptionalText("kind") == "glider" ? VehicleKind.Glider : VehicleKind.Propeller,
            v.OptionalText("task") switch
            {
                "ice_mapping" => VehicleTask.IceMapping,
                "seafloor_survey" => VehicleTask.SeafloorSurvey,
                "sampling" => VehicleTask.Sampling,
                _ => VehicleTask.WaterColumn,
            },
            v.OptionalQuantity("heading") ?? 0.0,
            v.OptionalQuantity("track_length") ?? VehicleModel.DefaultTrackLengthM,
            v.OptionalQuantity("sample_time") ?? VehicleModel.DefaultSampleTimeS,
            glider is null ? null : new GliderSettings(
                glider.Quantity("net_buoyancy"),
                glider.Quantity("glide_angle"),
                glider.OptionalNumber("lift_slope") ?? graver.LiftSlopeKgPerMRad,
                glider.OptionalNumber("drag_offset") ?? graver.DragOffsetKgPerM,
                glider.OptionalNumber("drag_quadratic") ?? graver.DragQuadraticKgPerMRad2,
                glider.OptionalNumber("pump_efficiency") ?? ScenarioLoader.DefaultPumpEfficiency),
            hull is null ? null : new HullSettings(
                hull.Quantity("diameter"),
                hull.OptionalNumber("drag_coefficient") ?? propeller.DragCoefficient,
                hull.OptionalNumber("propulsive_efficiency") ?? propeller.PropulsiveEfficiency),
            current is null ? null : new OceanCurrent(current.Quantity("speed"), current.Quantity("direction")),
            navigation is null ? null : new NavigationSettings(navigation.Number("error_per_distance"), navigation.OptionalNumber("random_walk") ?? 0.0),
            dock is null ? null : new DockSettings(dock.Number("return_at"), dock.Quantity("charging_power"), (int)(dock.OptionalInteger("sorties") ?? 1)),
            v.OptionalQuantity("max_out_of_range") ?? VehicleModel.DefaultMaxOutOfRangeS);
    }

    /// <summary>A propeller needs its speed and one source of power; a glider its trim, which must be one it can fly.</summary>
    internal static void Check(VehicleModel vehicle, BoundSection section, string path, List<ScenarioError> errors)
    {
        if (vehicle.Kind == VehicleKind.Propeller)
        {
            if (section.OptionalQuantity("speed") is null)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.speed", "a propeller vehicle needs its speed"));
            }

            if ((section.OptionalQuantity("propulsion_power") is null) == (vehicle.Hull is null))
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.propulsion_power", "a propeller vehicle takes either propulsion_power or a hull section, exactly one"));
            }

            if (vehicle.Glider is not null)
            {
                errors.Add(new ScenarioError(section.LocationOf("glider"), $"{path}.glider", "a glider section needs kind: glider"));
            }
        }
        else
        {
            if (vehicle.Glider is not { } glider)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.glider", "a glider needs its glider section (net_buoyancy, glide_angle)"));
                return;
            }

            if (section.OptionalQuantity("speed") is not null || section.OptionalQuantity("propulsion_power") is not null || vehicle.Hull is not null)
            {
                errors.Add(new ScenarioError(section.Location, $"{path}.speed", "a glider's speed follows from its buoyancy and trim: it takes no speed, propulsion_power or hull"));
            }

            var coefficients = new Physics.Vehicles.GliderCoefficients(0.0, glider.LiftSlopeKgPerMRad, glider.DragOffsetKgPerM, glider.DragQuadraticKgPerMRad2);
            Refused(section.LocationOf("glider"), $"{path}.glider.glide_angle", errors, () => Physics.Vehicles.SteadyGlide.AngleOfAttackRad(coefficients, glider.GlideAngleRad));
        }

        if (vehicle.Dock is { } dock && dock.ReturnAtFraction < vehicle.ReserveFraction)
        {
            errors.Add(new ScenarioError(section.LocationOf("dock"), $"{path}.dock.return_at", "return_at must not be below the reserve: the reserve is what the way home is paid from"));
        }
    }

    /// <summary>Runs a physics model on the scenario's values and turns its range refusal into a located error.</summary>
    private static void Refused(SourceLocation at, string path, List<ScenarioError> errors, Action model)
    {
        try
        {
            model();
        }
        catch (ArgumentOutOfRangeException exception)
        {
            errors.Add(new ScenarioError(at, path, exception.Message.Split(" (Parameter", StringSplitOptions.None)[0]));
        }
    }
}
