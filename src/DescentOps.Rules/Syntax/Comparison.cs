namespace DescentOps.Rules.Syntax;

/// <summary>How a value is compared with its threshold: strictly above, strictly below, inside a closed band, outside it.</summary>
public enum Comparison
{
    Above,
    Below,
    Inside,
    Outside,
}
