namespace DescentOps.Physics.Descent;

/// <summary>Steady close-contact melting at the head: speed, melt-film thickness and the film's superheat above T_m.</summary>
public readonly record struct CloseContactSolution(double VelocityMPerS, double FilmThicknessM, double FilmSuperheatK);
