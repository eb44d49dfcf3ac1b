using static DescentOps.Scenarios.Format.QuantityKind;

namespace DescentOps.Scenarios.Format;

/// <summary>
/// The optional <c>procedures</c> section: the ground team's operating procedures, lists of steps that send a
/// telecommand, wait for a condition within a time, check values and go to another step on success or failure.
/// </summary>
public static class ProceduresFormat
{
    private const double Year = 365.25 * 86_400;

    /// <summary>The goto word that ends a procedure as done.</summary>
    public const string Done = "done";

    /// <summary>The goto word that ends a procedure as aborted.</summary>
    public const string Abort = "abort";

    private static SectionField Step { get; } = new("step", "One step: send (optional), then wait for a condition within a time, then check expected values.",
    [
        new TextField("name", "Step identifier within the procedure (lowercase letters, digits, '-'); 'done' and 'abort' are goto words.", IsIdentifier: true),
        new TextField("send", "A telecommand the ground sends when the step starts, as a rule's send writes it without 'send': 'probe.wall set_power(power = 14 kW)'.", Required: false),
        new TextField("wait_for", "A condition in the rule language on the frames the ground receives after the step started, e.g. 'probe.regime is Melting for 2 samples'; the step goes on when it holds.", Required: false),
        new QuantityField("within", "How long after the step started the ground waits for 'wait_for' (or, without it, for the first frame to check 'expect' on); past it the step is late.", Duration, 0, 1000 * Year, Required: false, MinExclusive: true),
        new TextField("expect", "A condition in the rule language checked on the frame that ended the wait (or on the first frame after the step started): the step passes if it holds, fails if not.", Required: false),
        new TextField("on_pass", "The step to go to when this one passes: a step name, 'done' or 'abort' (default: the next step, 'done' after the last).", Required: false),
        new TextField("on_fail", "The step to go to when this one fails or is late: a step name, 'done' or 'abort' (default: 'abort').", Required: false),
        new ChoiceField("confirm", "true: a person at the rehearsal console confirms the step before its command goes (or skips it, going on as if it passed); in a run without a console the team confirms at once (default false).", ["true", "false"], Required: false),
    ]);

    public static ListField Section { get; } = new("procedures",
        "Operating procedures the ground team runs with the real delays (it sees frames one downlink late; its telecommands arrive one uplink later). A ground rule starts one with 'start NAME', or it starts at 'start_at'.",
        new SectionField("procedure", "One procedure.",
        [
            new TextField("name", "Procedure identifier (lowercase letters, digits, '-'), as a rule's 'start' names it.", IsIdentifier: true),
            new QuantityField("start_at", "Simulated time at which the ground starts the procedure (omit: started only by a rule).", Duration, 0, 1000 * Year, Required: false),
            new ListField("steps", "The steps, run from the first.", Step, 1, 100),
        ]), 0, 100, Required: false);
}
