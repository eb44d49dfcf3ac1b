using DescentOps.Scenarios.Format;
using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>
/// Reads one fault of a scenario or a branch change file: its cross-field rules first, each broken one a located
/// error, then the closed <see cref="FaultModel"/> (a start and an effect) when none is broken.
/// </summary>
internal static class FaultReader
{
    /// <summary>The fault at <paramref name="path"/>, or null once its errors are in <paramref name="errors"/>.</summary>
    public static FaultModel? Read(BoundSection section, string path, List<ScenarioError> errors)
    {
        var before = errors.Count;
        Check(section, path, errors);
        if (errors.Count > before) return null;
        return new FaultModel(section.Text("name"), Start(section), Effect(section), section.OptionalQuantity("duration"))
        {
            DetectedBy = Campaign.CampaignSections.RuleNames(section.OptionalText("detected_by")),
        };
    }

    /// <summary>"relay-2" or "2" is relay number 2; 0 marks a name that does not parse (reported by <see cref="Check"/>).</summary>
    public static int? RelayNumber(BoundSection fault)
    {
        if (fault.OptionalText("relay") is not { } text) return null;
        var digits = text.StartsWith("relay-", StringComparison.Ordinal) ? text["relay-".Length..] : text;
        return int.TryParse(digits, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out var n) && n >= 1 ? n : 0;
    }

    /// <summary>The fault's kind from its word; the format tree admits only these words.</summary>
    public static FaultKind KindOf(BoundSection fault) => fault.Text("kind") switch
    {
        "power_dip" => FaultKind.PowerDip,
        "tether_break" => FaultKind.TetherBreak,
        "station_failure" => FaultKind.StationFailure,
        "sensor_stuck" => FaultKind.SensorStuck,
        "sensor_bias" => FaultKind.SensorBias,
        "sensor_dropout" => FaultKind.SensorDropout,
        "sensor_noise" => FaultKind.SensorNoise,
        "heater_segment_failure" => FaultKind.HeaterSegmentFailure,
        "tilt_kick" => FaultKind.TiltKick,
        "station_upset" => FaultKind.StationUpset,
        "vehicle_loss" => FaultKind.VehicleLoss,
        "relay_failure" => FaultKind.RelayFailure,
        "spool_jam" => FaultKind.SpoolJam,
        "clogged_nozzle" => FaultKind.CloggedNozzle,
        var word => throw new InvalidOperationException($"Fault kind '{word}' passed validation but has no model."),
    };

    private static FaultStart Start(BoundSection f) =>
        f.OptionalQuantity("at") is { } at ? new FaultStart.AtTime(at)
        : f.OptionalQuantity("at_depth") is { } depth ? new FaultStart.AtDepth(depth)
        : f.OptionalText("when") is { } when ? new FaultStart.OnCondition(when, f.LocationOf("when"))
        : new FaultStart.AtRandom(f.OptionalQuantity("mean_interval")!.Value, f.OptionalQuantity("not_before") ?? 0.0, (int)(f.OptionalInteger("occurrences") ?? 1));

    private static FaultEffect Effect(BoundSection f)
    {
        var remaining = f.OptionalNumber("remaining_fraction") ?? 0.0;
        return KindOf(f) switch
        {
            FaultKind.PowerDip => new FaultEffect.PowerDip(remaining),
            FaultKind.HeaterSegmentFailure => new FaultEffect.HeaterSegmentFailure(remaining),
            FaultKind.CloggedNozzle => new FaultEffect.CloggedNozzle(remaining),
            FaultKind.TiltKick => new FaultEffect.TiltKick(f.OptionalQuantity("angle")!.Value),
            FaultKind.TetherBreak => new FaultEffect.TetherBreak(),
            FaultKind.SpoolJam => new FaultEffect.SpoolJam(),
            FaultKind.RelayFailure => new FaultEffect.RelayFailure(RelayNumber(f)!.Value),
            FaultKind.StationFailure => new FaultEffect.StationFailure(),
            FaultKind.StationUpset => new FaultEffect.StationUpset(),
            FaultKind.VehicleLoss => new FaultEffect.VehicleLoss(f.OptionalText("vehicle")!, Cause(f)!.Value, remaining),
            FaultKind.SensorStuck => new FaultEffect.SensorStuck(f.OptionalText("point")!, SensorValue(f)),
            FaultKind.SensorBias => new FaultEffect.SensorBias(f.OptionalText("point")!, SensorValue(f)!.Value),
            FaultKind.SensorNoise => new FaultEffect.SensorNoise(f.OptionalText("point")!, SensorValue(f)!.Value),
            FaultKind.SensorDropout => new FaultEffect.SensorDropout(f.OptionalText("point")!),
            var kind => throw new InvalidOperationException($"Fault kind {kind} has no effect."),
        };
    }

    private static VehicleLossCause? Cause(BoundSection f) => f.OptionalText("cause") switch
    {
        "battery" => VehicleLossCause.Battery,
        "entrapment" => VehicleLossCause.Entrapment,
        "out_of_range" => VehicleLossCause.OutOfRange,
        _ => null,
    };

    /// <summary>A sensor fault's value in SI, in the unit kind of its point; NaN when it does not read as one (reported by <see cref="Check"/>).</summary>
    private static double? SensorValue(BoundSection fault)
    {
        if (fault.OptionalText("value") is not { } text) return null;
        var kind = fault.OptionalText("point") is { } point ? ProbeTelemetryPoints.KindOf(point) : null;
        if (kind is null) return double.NaN;
        return QuantityParser.TryParseSi(kind.Value, text, out var si, out _) ? si : double.NaN;
    }

    /// <summary>The cross-field rules of one fault, shared by scenarios, branch change files and the console.</summary>
    private static void Check(BoundSection section, string path, List<ScenarioError> errors)
    {
        var kind = KindOf(section);
        var duration = section.OptionalQuantity("duration");
        var relay = RelayNumber(section);
        var point = section.OptionalText("point");
        var value = SensorValue(section);
        var isRandom = section.OptionalQuantity("mean_interval") is not null;
        if (kind == FaultKind.PowerDip && duration is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.duration", "a power_dip needs a duration"));
        }

        if (kind is FaultKind.TetherBreak or FaultKind.SpoolJam && duration is not null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.duration", $"a broken fibre does not heal: a {section.Text("kind")} takes no duration"));
        }

        if ((kind == FaultKind.RelayFailure) != (relay is not null))
        {
            errors.Add(new ScenarioError(section.LocationOf("relay"), $"{path}.relay", kind == FaultKind.RelayFailure ? "a relay_failure names its relay" : $"'relay' belongs to a relay_failure, not to a {section.Text("kind")}"));
        }
        else if (relay == 0)
        {
            errors.Add(new ScenarioError(section.LocationOf("relay"), $"{path}.relay", $"'{section.OptionalText("relay")}' is not a relay: write its name ('relay-2') or its number ('2')"));
        }

        if (kind == FaultKind.StationUpset && duration is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.duration", "a station_upset needs its recovery time as the duration"));
        }

        var triggers = new[] { section.OptionalQuantity("at") is not null, section.OptionalQuantity("at_depth") is not null, section.OptionalText("when") is not null, isRandom }.Count(t => t);
        if (triggers != 1)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.at", "give exactly one trigger: 'at' (a time), 'at_depth' (a depth), 'when' (a condition) or 'mean_interval' (at random)"));
        }

        if (!isRandom && (section.OptionalQuantity("not_before") is not null || section.OptionalInteger("occurrences") is not null))
        {
            errors.Add(new ScenarioError(section.LocationOf(section.OptionalQuantity("not_before") is not null ? "not_before" : "occurrences"), $"{path}.mean_interval", "'not_before' and 'occurrences' belong to a random trigger ('mean_interval')"));
        }

        if ((section.OptionalInteger("occurrences") ?? 1) > 1 && duration is null)
        {
            errors.Add(new ScenarioError(section.LocationOf("occurrences"), $"{path}.occurrences", "a fault that stays happens once: give a duration for more than one occurrence"));
        }

        var isSensor = kind is FaultKind.SensorStuck or FaultKind.SensorBias or FaultKind.SensorDropout or FaultKind.SensorNoise;
        if (isSensor && point is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.point", $"a {section.Text("kind")} fault names the telemetry point that lies"));
        }

        if (!isSensor && (point is not null || section.OptionalText("value") is not null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.point", $"'point' and 'value' belong to sensor faults, not to a {section.Text("kind")}"));
        }

        if ((kind == FaultKind.TiltKick) != (section.OptionalQuantity("angle") is not null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.angle", kind == FaultKind.TiltKick ? "a tilt_kick needs its angle" : "'angle' belongs to a tilt_kick"));
        }

        if ((kind == FaultKind.VehicleLoss) != (section.OptionalText("vehicle") is not null && Cause(section) is not null))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.vehicle", kind == FaultKind.VehicleLoss
                ? "a vehicle_loss names its vehicle and its cause (battery, entrapment or out_of_range)"
                : "'vehicle' and 'cause' belong to a vehicle_loss"));
        }

        if (kind == FaultKind.SensorBias && value is null)
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.value", "a sensor_bias needs the offset as a value"));
        }

        if (kind == FaultKind.SensorNoise && (value is null || value <= 0))
        {
            errors.Add(new ScenarioError(section.Location, $"{path}.value", "a sensor_noise needs a positive standard deviation as its value"));
        }

        if (value is { } v && double.IsNaN(v) && point is not null)
        {
            var pointKind = ProbeTelemetryPoints.KindOf(point)!.Value;
            errors.Add(new ScenarioError(section.LocationOf("value"), $"{path}.value", $"'{section.OptionalText("value")}' is not a {pointKind.ToString().ToLowerInvariant()} (units: {pointKind.ExampleUnits()}), as point {point} needs"));
        }
    }
}
