using DescentOps.Scenarios.Model;

namespace DescentOps.Scenarios.Loading;

/// <summary>The acoustics section: the vehicles' acoustic link, with its defaults.</summary>
internal static class AcousticsReader
{
    internal static AcousticsModel? Read(BoundSection? a) => a is null ? null : new AcousticsModel(
        a.Quantity("frequency"),
        a.Number("source_level"),
        a.Number("noise_level"),
        a.Quantity("bandwidth"),
        a.Number("detection_threshold"),
        a.OptionalNumber("spreading") ?? ScenarioLoader.DefaultSpreadingExponent,
        a.OptionalQuantity("ocean_temperature"),
        a.OptionalNumber("ph") ?? ScenarioLoader.DefaultPH,
        a.OptionalText("absorption") == "ainslie_mccolm" ? AbsorptionFormula.AinslieMcColm : AbsorptionFormula.FrancoisGarrison,
        a.OptionalQuantity("message_interval") ?? ScenarioLoader.DefaultMessageIntervalS);
}
