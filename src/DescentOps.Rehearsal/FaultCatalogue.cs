using System.Text.Json.Nodes;
using DescentOps.Scenarios.Model;

namespace DescentOps.Rehearsal;

/// <summary>
/// The fault kinds the supervisor may inject, each with the scenario fields it takes (README, "Faults and recovery
/// rules"): the supervisor's form is built from this list. A test holds it to <see cref="FaultKind"/>, so a new kind
/// cannot be left out.
/// </summary>
public static class FaultCatalogue
{
    public static IReadOnlyList<string> SensorPoints { get; } =
    [
        "probe.depth", "probe.velocity", "probe.ice_temperature", "probe.head_power", "probe.wall_power", "probe.energy_used",
        "probe.tilt", "probe.battery_soc", "probe.bus_power_available", "probe.buffer_fill", "probe.jet_power", "probe.hole_radius",
    ];

    /// <summary>Per kind: its word, what it does, and its fields (name, what to give, an example).</summary>
    public static IReadOnlyList<(FaultKind Kind, string Word, string Does, (string Field, string Means, string Example)[] Fields)> Kinds { get; } =
    [
        (FaultKind.PowerDip, "power_dip", "heater (or source) power falls to a share", [Duration, Fraction("0.3")]),
        (FaultKind.HeaterSegmentFailure, "heater_segment_failure", "one head half keeps a share of its power", [Duration, Fraction("0.2")]),
        (FaultKind.CloggedNozzle, "clogged_nozzle", "the hot-water jets keep a share of their heat at the hole's bottom", [Duration, Fraction("0.5")]),
        (FaultKind.TiltKick, "tilt_kick", "a sudden tilt", [("angle", "angle", "3 deg")]),
        (FaultKind.SensorStuck, "sensor_stuck", "a reading stuck at a value", [Point, ("value", "the stuck reading, in the unit of the point", "0.0001 m/s"), Duration]),
        (FaultKind.SensorBias, "sensor_bias", "a reading offset by a value", [Point, ("value", "the offset, in the unit of the point", "0.0002 m/s"), Duration]),
        (FaultKind.SensorNoise, "sensor_noise", "a reading scattered by normal noise", [Point, ("value", "standard deviation, in the unit of the point", "0.0001 m/s"), Duration]),
        (FaultKind.SensorDropout, "sensor_dropout", "a reading missing from the frames", [Point, Duration]),
        (FaultKind.TetherBreak, "tether_break", "the fibre parts for good", []),
        (FaultKind.SpoolJam, "spool_jam", "the spool jams and the fibre snaps", []),
        (FaultKind.RelayFailure, "relay_failure", "a dropped radio relay fails", [("relay", "relay name", "relay-1"), Duration]),
        (FaultKind.StationFailure, "station_failure", "the surface station fails", [Duration]),
        (FaultKind.StationUpset, "station_upset", "the station resets for its recovery time", [("duration", "recovery time", "2 h")]),
        (FaultKind.VehicleLoss, "vehicle_loss", "a vehicle is lost or held", [("vehicle", "vehicle name", ""), ("cause", "battery, entrapment or out_of_range", "battery"), Fraction("0.1"), Duration]),
    ];

    private static (string, string, string) Duration => ("duration", "how long (empty: for good)", "6 h");

    private static (string, string, string) Point => ("point", "telemetry point", "probe.velocity");

    private static (string, string, string) Fraction(string example) => ("remaining_fraction", "share left, 0 to 1", example);

    public static string Word(FaultKind kind) => Kinds.First(k => k.Kind == kind).Word;

    public static JsonArray Json() =>
    [
        .. Kinds.Select(k => (JsonNode)new JsonObject
        {
            ["kind"] = k.Word,
            ["does"] = k.Does,
            ["fields"] = new JsonArray([.. k.Fields.Select(f => (JsonNode)new JsonObject { ["field"] = f.Field, ["means"] = f.Means, ["example"] = f.Example })]),
        }),
    ];
}
