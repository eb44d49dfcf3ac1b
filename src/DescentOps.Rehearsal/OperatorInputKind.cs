namespace DescentOps.Rehearsal;

/// <summary>What a person at the console did; the log writes it in lower case.</summary>
public enum OperatorInputKind
{
    /// <summary>A fault injected now, at a time or at a depth.</summary>
    Fault,

    /// <summary>An active fault ended by hand.</summary>
    Clear,

    /// <summary>A telecommand sent from the ground.</summary>
    Command,

    /// <summary>The pace changed, or the clock paused or resumed.</summary>
    Pace,

    /// <summary>A bookmark with a note.</summary>
    Mark,

    /// <summary>The session ended.</summary>
    End,

    /// <summary>A person confirmed or skipped a procedure's step that asked for it.</summary>
    Step,
}
