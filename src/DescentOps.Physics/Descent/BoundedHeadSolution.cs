namespace DescentOps.Physics.Descent;

/// <summary>The head's close-contact solution and the power that boils film water instead of melting ice (0 below boiling).</summary>
public readonly record struct BoundedHeadSolution(CloseContactSolution Film, double BoilOffW)
{
    /// <summary>True when the film is held at the boiling point.</summary>
    public bool Boiling => BoilOffW > 0;
}
