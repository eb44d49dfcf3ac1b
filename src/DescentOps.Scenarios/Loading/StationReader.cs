using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The station section (radiation, link and radio, dwell, charging) and the rules that tie its parts together.</summary>
internal static class StationReader
{
    internal static StationModel Read(BoundSection station)
    {
        var radiation = station.OptionalSection("radiation");
        var link = station.OptionalSection("link");
        var radio = link?.OptionalSection("radio");
        var dwell = station.OptionalSection("dwell");
        var charging = station.OptionalSection("charging");
        return new StationModel(
            station.Text("name"),
            station.Quantity("forwarding_delay"),
            radiation is null ? null : new StationRadiationModel(
                radiation.Quantity("dose_rate"),
                radiation.OptionalQuantity("shielding") ?? 0.0,
                radiation.OptionalNumber("electron_share") ?? ScenarioLoader.DefaultElectronShare,
                radiation.OptionalQuantity("electron_length") ?? ScenarioLoader.DefaultElectronLengthM,
                radiation.OptionalQuantity("photon_length") ?? ScenarioLoader.DefaultPhotonLengthM,
                radiation.Text("failure_model") == "weibull" ? DoseFailureModel.Weibull : DoseFailureModel.Lognormal,
                radiation.Quantity("failure_dose"),
                radiation.Number("failure_spread")),
            link is null ? null : new StationLinkModel(
                link.Quantity("rotation_period"),
                link.OptionalQuantity("latitude") ?? 0.0,
                link.OptionalQuantity("home_declination") ?? 0.0,
                link.OptionalQuantity("elevation_mask") ?? 0.0,
                link.OptionalQuantity("start_hour_angle") ?? 0.0,
                link.OptionalQuantity("planet_radius"),
                link.OptionalQuantity("orbit_radius"),
                link.OptionalQuantity("planet_hour_angle") ?? 0.0,
                radio is null ? null : new StationRadioModel(
                    radio.Quantity("transmit_power"),
                    radio.Quantity("dish_diameter"),
                    radio.OptionalNumber("dish_efficiency") ?? ScenarioLoader.DefaultDishEfficiency,
                    radio.Quantity("ground_dish_diameter"),
                    radio.OptionalNumber("ground_dish_efficiency") ?? ScenarioLoader.DefaultGroundDishEfficiency,
                    radio.Quantity("frequency"),
                    radio.Quantity("system_noise_temperature"),
                    radio.Number("line_loss"),
                    radio.Number("required_eb_n0"),
                    radio.Number("margin"),
                    radio.Integer("frame_bits"))),
            dwell is null ? null : new SurfaceDwellModel(dwell.Quantity("duration"), dwell.Quantity("d_value")),
            charging is null ? null : new StationChargingModel(
                charging.Quantity("upset_interval"),
                charging.Quantity("recovery_time"),
                (charging.OptionalText("during_recovery") ?? "queue") == "queue"),
            station.OptionalInteger("frame_queue_capacity"),
            station.OptionalInteger("command_queue_capacity"))
        {
            SilenceTimeoutS = station.OptionalQuantity("silence_timeout") ?? StationModel.DefaultSilenceTimeoutS,
        };
    }

    /// <summary>The station's parts that depend on each other, or whose range depends on a choice.</summary>
    internal static void Check(StationModel station, BoundSection section, List<ScenarioError> errors)
    {
        if (station.Radiation is { } radiation)
        {
            var at = section.Section("radiation").LocationOf("failure_spread");
            if (radiation.FailureModel == DoseFailureModel.Weibull && radiation.FailureSpread < 0.1)
            {
                errors.Add(new ScenarioError(at, "station.radiation.failure_spread", $"a Weibull shape must be 0.1 to 50, not {radiation.FailureSpread.ToString(System.Globalization.CultureInfo.InvariantCulture)}"));
            }

            if (radiation.FailureModel == DoseFailureModel.Lognormal && radiation.FailureSpread > 5)
            {
                errors.Add(new ScenarioError(at, "station.radiation.failure_spread", $"a lognormal log standard deviation must be 0.001 to 5, not {radiation.FailureSpread.ToString(System.Globalization.CultureInfo.InvariantCulture)}"));
            }
        }

        if (station.Link is { } link)
        {
            var linkSection = section.Section("link");
            if ((link.PlanetRadiusM is null) != (link.OrbitRadiusM is null))
            {
                errors.Add(new ScenarioError(linkSection.Location, "station.link.orbit_radius", "give planet_radius and orbit_radius together, or neither"));
            }
            else if (link.PlanetRadiusM >= link.OrbitRadiusM)
            {
                errors.Add(new ScenarioError(linkSection.LocationOf("orbit_radius"), "station.link.orbit_radius", "the orbit must lie outside the planet (orbit_radius above planet_radius)"));
            }
        }

        if (station.Dwell is not null && station.Radiation is null)
        {
            errors.Add(new ScenarioError(section.Section("dwell").Location, "station.dwell", "a surface dwell sterilises by dose: give station.radiation with its dose_rate"));
        }
    }
}
