namespace DescentOps.Reports.Plotting;

/// <summary>
/// One line on a plot: a numeric data field of one event kind against simulated time. Plots are data, not
/// code, so that a new telemetry point needs one more definition and nothing else.
/// </summary>
/// <param name="Kind">The event kind that carries the field (e.g. <c>probe.telemetry</c>).</param>
/// <param name="Field">The data field (e.g. <c>depth_m</c>); integer and double fields both plot.</param>
/// <param name="Label">The legend text; ignored when <paramref name="PerSource"/>, where each source names its line.</param>
/// <param name="Scale">Multiplies every value, to show SI fields in operator units (W to kW, J to MWh).</param>
/// <param name="PerSource">One line per source component (each vehicle its own battery line) instead of one line.</param>
/// <param name="PerLander">In a run with landers, one line per lander (by the records' <c>lander</c> field), labelled
/// "label (lander)"; a run without landers draws its one line as before.</param>
public sealed record SeriesDefinition(string Kind, string Field, string Label, double Scale = 1.0, bool PerSource = false, bool PerLander = false);
