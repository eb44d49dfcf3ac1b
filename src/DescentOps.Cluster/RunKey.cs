namespace DescentOps.Cluster;

/// <summary>A campaign run's identity: its variant and index. A result is stored once per key, whoever computed it.</summary>
public readonly record struct RunKey(string Variant, int Index)
{
    public override string ToString() => $"{Variant}#{Index}";
}
