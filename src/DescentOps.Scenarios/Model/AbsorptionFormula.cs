namespace DescentOps.Scenarios.Model;

/// <summary>Which published seawater absorption formula the acoustic link uses.</summary>
public enum AbsorptionFormula
{
    FrancoisGarrison,
    AinslieMcColm,
}
