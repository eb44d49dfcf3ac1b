namespace DescentOps.Rules.Catalogue;

/// <summary>An argument that is one word from a fixed set ("on", "off").</summary>
public sealed record WordArgumentSpec(string Name, IReadOnlyList<string> Values) : ArgumentSpec(Name);
