namespace DescentOps.Rules.Text;

/// <summary>What kind of problem a diagnostic reports; stable so that tests and tools can match on it.</summary>
public enum DiagnosticCode
{
    // Syntax (parser).
    UnexpectedToken,
    InvalidNumber,
    InvalidName,
    DuplicateItem,
    MissingItem,
    NestingTooDeep,

    // Meaning (checker), errors.
    DuplicateRule,
    UnknownRule,
    UnknownPoint,
    WrongPointKind,
    UnknownCommand,
    UnknownArgument,
    MissingArgument,
    ArgumentOutOfRange,
    UnknownUnit,
    MissingUnit,
    UnitMismatch,
    ThresholdOutsideRange,
    InvalidBand,
    ImpossibleDiscreteValue,
    NonPositiveDuration,
    ActuatorConflict,
    PlacementNotAllowed,
    TrueStateOnly,
    UnknownProcedure,
    GroundOnly,
    UnknownLander,

    // Meaning (checker), warnings: the rule set runs, but a rule can never act.
    ContradictoryBounds,
    NeverEnabled,
    UnusedExclusion,
}
