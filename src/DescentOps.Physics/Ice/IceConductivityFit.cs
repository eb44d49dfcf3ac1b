namespace DescentOps.Physics.Ice;

/// <summary>
/// Published fits of the thermal conductivity of pure polycrystalline ice Ih against temperature. They differ by
/// about ±15 % from each other (at 100 K and at 273 K), which is the honest uncertainty of "pure ice" conductivity.
/// </summary>
public enum IceConductivityFit
{
    /// <summary>k = 632/T + 0.38 − 0.00197 T (Andersson and Inaba 2005, Phys. Chem. Chem. Phys. 7, 1441; coefficients from memory). The default.</summary>
    AnderssonInaba2005,

    /// <summary>k = 567/T (Klinger 1980, Science 209, 271; from memory).</summary>
    Klinger1980,

    /// <summary>k = 651/T (Petrenko and Whitworth 1999, Physics of Ice; from memory); the closed-form a/T used for shells.</summary>
    PetrenkoWhitworth1999,

    /// <summary>k = 9.828 exp(−0.0057 T) (Yen 1981, CRREL Report 81-10, eq. 33; also Cuffey and Paterson 2010), stated for 60–273 K.</summary>
    Yen1981,
}
