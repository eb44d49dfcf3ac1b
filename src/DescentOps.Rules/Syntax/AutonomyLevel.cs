namespace DescentOps.Rules.Syntax;

/// <summary>
/// Execution autonomy of the mission's flight segment: E1 real-time ground control, E2 pre-planned time-tagged
/// operations on board, E3 event-based autonomous operations on board, E4 goal-oriented operations on board.
/// Rules that run on board are event-based, so they need E3 or more.
/// </summary>
public enum AutonomyLevel
{
    E1 = 1,
    E2 = 2,
    E3 = 3,
    E4 = 4,
}
