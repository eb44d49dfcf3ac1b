namespace DescentOps.Cli.Commands.Physics;

/// <summary>Which seawater absorption formula <c>physics acoustic</c> uses.</summary>
internal enum AbsorptionFormula
{
    /// <summary>Ainslie and McColm (1998): the default, for its wide salinity range (5–50) under an uncertain ocean.</summary>
    AinslieMcColm,

    /// <summary>Francois and Garrison (1982): the reference, but only for salinity 30–35 and −2 to 22 °C.</summary>
    FrancoisGarrison,

    /// <summary>Thorp (1967): frequency only, a cross-check.</summary>
    Thorp,
}
