namespace DescentOps.Rules.Catalogue;

/// <summary>A named argument of a command; every declared argument must be given.</summary>
public abstract record ArgumentSpec(string Name);
