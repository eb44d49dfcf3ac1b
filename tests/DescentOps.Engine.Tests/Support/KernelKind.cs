namespace DescentOps.Engine.Tests.Support;

/// <summary>Which kernel a theory runs its model through; both must give the same journal.</summary>
public enum KernelKind
{
    Sequential,
    Actor,
}
