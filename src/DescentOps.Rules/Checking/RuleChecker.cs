using System.Globalization;
using DescentOps.Primitives.Identity;
using DescentOps.Primitives.Time;
using DescentOps.Primitives.Units;
using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using DescentOps.Rules.Units;

namespace DescentOps.Rules.Checking;

/// <summary>
/// Checks a parsed rule set against the mission's catalogue and, when nothing is wrong, compiles it to SI.
/// Never throws: every problem is a located diagnostic.
/// </summary>
public sealed class RuleChecker
{
    /// <summary>The longest duration a rule may name: far beyond any mission, far inside the tick range.</summary>
    public const double MaxDurationS = 1.0e10;

    private readonly TelemetryCatalogue _catalogue;

    /// <summary>Where the rule whose condition is being checked runs (null outside a rule).</summary>
    private Placement? _placement;
    private readonly List<RuleDiagnostic> _diagnostics = [];
    private readonly HashSet<string> _ruleNames = new(StringComparer.Ordinal);
    private readonly HashSet<string> _rulesWithErrors;

    private RuleChecker(TelemetryCatalogue catalogue, IEnumerable<string> rulesWithErrors)
    {
        _catalogue = catalogue;
        _rulesWithErrors = new HashSet<string>(rulesWithErrors, StringComparer.Ordinal);
    }

    /// <summary>Parses and checks in one step; syntax errors come first in place order with the others.</summary>
    public static RuleCheckResult CheckSource(RuleSource source, TelemetryCatalogue catalogue)
    {
        var parsed = RuleParser.Parse(source);
        return Check(parsed, catalogue);
    }

    /// <summary>
    /// Checks one telecommand written alone ("probe.wall set_power(power = 3 kW)") against the catalogue, as a rule's
    /// send is checked: target, command, arguments, units and ranges. The command is null exactly when there are errors.
    /// </summary>
    public static (CommandAction? Command, IReadOnlyList<RuleDiagnostic> Errors) CheckCommand(RuleSource source, TelemetryCatalogue catalogue)
    {
        var (send, syntaxErrors) = RuleParser.ParseCommand(source);
        if (send is null) return (null, syntaxErrors);
        var checker = new RuleChecker(catalogue, []);
        var compiled = checker.CheckSend(send);
        var errors = checker._diagnostics.Where(d => d.Severity == DiagnosticSeverity.Error).ToArray();
        return (errors.Length == 0 ? compiled?.Command : null, errors);
    }

    public static RuleCheckResult Check(ParseResult parsed, TelemetryCatalogue catalogue)
    {
        var checker = new RuleChecker(catalogue, parsed.RuleSet.RulesWithErrors);
        checker._diagnostics.AddRange(parsed.Errors);
        var compiled = checker.CheckRuleSet(parsed.RuleSet);

        var ordered = checker._diagnostics
            .OrderBy(d => d.Location.Line)
            .ThenBy(d => d.Location.Column)
            .ThenBy(d => d.Code)
            .ThenBy(d => d.Message, StringComparer.Ordinal)
            .ToArray();
        var errors = ordered.Where(d => d.Severity == DiagnosticSeverity.Error).ToArray();
        var warnings = ordered.Where(d => d.Severity == DiagnosticSeverity.Warning).ToArray();
        return new RuleCheckResult(errors, warnings, errors.Length == 0 ? compiled : null);
    }

    private CompiledRuleSet CheckRuleSet(RuleSetSyntax tree)
    {
        foreach (var rule in tree.Rules)
        {
            if (!_ruleNames.Add(rule.Name.Text) || _rulesWithErrors.Contains(rule.Name.Text))
            {
                Error(DiagnosticCode.DuplicateRule, rule.Name.Location, $"a rule named '{rule.Name.Text}' is already defined");
            }
        }

        var compiledRules = new List<CompiledRule>();
        foreach (var rule in tree.Rules)
        {
            if (CheckRule(rule, tree) is { } compiled)
            {
                compiledRules.Add(compiled);
            }
        }

        var exclusions = tree.Exclusions.Select(CheckExclusion).OfType<CompiledExclusion>().ToArray();
        CheckActuatorConflicts(tree);
        WarnAboutUnusedExclusions(tree);
        WarnAboutRulesThatCannotAct(tree, compiledRules);
        return new CompiledRuleSet(tree.Autonomy, compiledRules, exclusions);
    }

    private CompiledRule? CheckRule(RuleSyntax rule, RuleSetSyntax tree)
    {
        if (rule.Placement == Placement.Board && tree.Autonomy is AutonomyLevel.E1 or AutonomyLevel.E2)
        {
            Error(DiagnosticCode.PlacementNotAllowed, rule.Location,
                $"rule '{rule.Name.Text}' runs on board, which needs event-based autonomy (E3 or E4), but this rule set declares {tree.Autonomy} at line {tree.AutonomyLocation.Line}");
        }

        var cooldown = SimDuration.Zero;
        if (rule.Cooldown is { } cooldownSyntax && TryDuration(cooldownSyntax, "a cooldown", allowZero: true) is { } checkedCooldown)
        {
            cooldown = checkedCooldown;
        }

        _placement = rule.Placement;
        var condition = rule.Condition is null ? null : CheckCondition(rule.Condition);
        _placement = null;
        var actions = CheckActions(rule.Actions);
        if (rule.Placement == Placement.Board)
        {
            // The ground team runs procedures; flight software has no one to run them.
            foreach (var start in rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<StartSyntax>())
            {
                Error(DiagnosticCode.PlacementNotAllowed, start.Location, $"rule '{rule.Name.Text}' runs on board and cannot start procedure '{start.Procedure.Text}': procedures are run by the ground team; start it from a ground rule");
            }
        }

        var escalations = new List<CompiledEscalation>();
        foreach (var escalation in rule.Escalations)
        {
            var after = TryDuration(escalation.After, "an escalation delay", allowZero: false);
            var steps = CheckActions(escalation.Actions);
            if (after is { } delay && steps is not null)
            {
                escalations.Add(new CompiledEscalation(delay, steps));
            }
        }

        if (condition is null || actions is null || rule.Placement is not { } placement || rule.Severity is not { } severity)
        {
            return null;
        }

        return new CompiledRule(rule.Name.Text, placement, severity, rule.Priority, cooldown, !rule.StartsDisabled, condition, actions, escalations, rule.Location);
    }

    private CompiledCondition? CheckCondition(ConditionSyntax condition)
    {
        switch (condition)
        {
            case LimitCheckSyntax limit:
            {
                var spec = NumericPoint(limit.Point);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(limit.Threshold, QuantityDimension.Of(spec.Dimension), isDifference: false, $"point '{spec.Name}'");
                if (threshold is null)
                {
                    return null;
                }

                CheckPhysicalRange(spec, limit.Threshold.Lower, threshold.Kind == Comparison.Below ? threshold.UpperSi : threshold.LowerSi);
                if (limit.Threshold.Upper is { } upper)
                {
                    CheckPhysicalRange(spec, upper, threshold.UpperSi);
                }

                return new LimitCondition(spec.Name, threshold);
            }

            case StateCheckSyntax state:
            {
                var spec = _catalogue.FindPoint(state.Point.Text);
                if (spec is null)
                {
                    UnknownPoint(state.Point);
                    return null;
                }

                if (!Readable(spec, state.Point))
                {
                    return null;
                }

                if (spec is not DiscretePointSpec discrete)
                {
                    Error(DiagnosticCode.WrongPointKind, state.Point.Location, $"point '{spec.Name}' is numeric; compare it with above, below, inside or outside, not 'is'");
                    return null;
                }

                if (!discrete.Values.Contains(state.Value.Text, StringComparer.Ordinal))
                {
                    Error(DiagnosticCode.ImpossibleDiscreteValue, state.Value.Location,
                        $"point '{spec.Name}' is never '{state.Value.Text}': its states are {string.Join(", ", discrete.Values)}");
                    return null;
                }

                return new StateCondition(spec.Name, state.Value.Text, state.Negated);
            }

            case RateCheckSyntax rate:
            {
                var spec = NumericPoint(rate.Point);
                var window = TryDuration(rate.Window, "a rate window", allowZero: false);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(rate.Threshold, QuantityDimension.Of(spec.Dimension).Rate, isDifference: true, $"the rate of point '{spec.Name}'");
                return threshold is null || window is null ? null : new RateCondition(spec.Name, window.Value, threshold);
            }

            case StepCheckSyntax step:
            {
                var spec = NumericPoint(step.Point);
                if (spec is null)
                {
                    return null;
                }

                var threshold = CheckThreshold(step.Threshold, QuantityDimension.Of(spec.Dimension), isDifference: true, $"a step of point '{spec.Name}'");
                return threshold is null ? null : new StepCondition(spec.Name, threshold);
            }

            case AllOfSyntax all:
            {
                var operands = all.Operands.Select(CheckCondition).ToArray();
                return operands.Any(o => o is null) ? null : new AllOfCondition(operands!);
            }

            case AnyOfSyntax any:
            {
                var operands = any.Operands.Select(CheckCondition).ToArray();
                return operands.Any(o => o is null) ? null : new AnyOfCondition(operands!);
            }

            case NotSyntax not:
                return CheckCondition(not.Operand) is { } negated ? new NotCondition(negated) : null;

            case HoldsForDurationSyntax forDuration:
            {
                var operand = CheckCondition(forDuration.Operand);
                var duration = TryDuration(forDuration.Duration, "a persistence duration", allowZero: false);
                return operand is null || duration is null ? null : new HoldsForDurationCondition(operand, duration.Value);
            }

            case HoldsForSamplesSyntax forSamples:
                return CheckCondition(forSamples.Operand) is { } counted ? new HoldsForSamplesCondition(counted, forSamples.Count) : null;

            case TimeSinceSyntax since:
            {
                var happened = CheckCondition(since.Event);
                var duration = TryDuration(since.Duration, "a time since an event", allowZero: true);
                return happened is null || duration is null ? null : new TimeSinceCondition(happened, since.Comparison, duration.Value);
            }

            case LatchedSyntax latched:
                return CheckCondition(latched.Operand) is { } latch ? new LatchedCondition(latch) : null;

            default:
                return null;
        }
    }

    private NumericPointSpec? NumericPoint(NameSyntax point)
    {
        var spec = _catalogue.FindPoint(point.Text);
        if (spec is null)
        {
            UnknownPoint(point);
            return null;
        }

        if (spec is not NumericPointSpec numeric)
        {
            Error(DiagnosticCode.WrongPointKind, point.Location, $"point '{spec.Name}' is discrete; test it with 'is', not with a threshold");
            return null;
        }

        return Readable(spec, point) ? numeric : null;
    }

    private bool Readable(TelemetryPointSpec spec, NameSyntax point)
    {
        if (spec.GroundOnly && (_placement != Placement.Ground || _catalogue.ReadsTrueState))
        {
            Error(DiagnosticCode.GroundOnly, point.Location, $"'{spec.Name}' is what the ground knows of the station: only ground rules and procedures may read it, not a rule on board or a fault's 'when'");
            return false;
        }

        if (!spec.TrueStateOnly || _catalogue.ReadsTrueState) return true;
        Error(DiagnosticCode.TrueStateOnly, point.Location, $"'{spec.Name}' is true state that no sensor reports: only a fault's 'when' may read it, not a rule");
        return false;
    }

    private void UnknownPoint(NameSyntax point) =>
        Error(DiagnosticCode.UnknownPoint, point.Location, $"unknown telemetry point '{point.Text}'");

    private Threshold? CheckThreshold(ThresholdSyntax threshold, QuantityDimension dimension, bool isDifference, string what)
    {
        var lower = TryQuantity(threshold.Lower, dimension, isDifference, what);
        if (threshold.Upper is null)
        {
            return lower is not { } value ? null
                : threshold.Kind == Comparison.Above ? Threshold.Above(value) : Threshold.Below(value);
        }

        var upper = TryQuantity(threshold.Upper, dimension, isDifference, what);
        if (lower is not { } low || upper is not { } high)
        {
            return null;
        }

        if (low > high)
        {
            Error(DiagnosticCode.InvalidBand, threshold.Lower.Location, $"the band {threshold.Lower} to {threshold.Upper} runs backwards: write the lower end first");
            return null;
        }

        return new Threshold(threshold.Kind, low, high);
    }

    private void CheckPhysicalRange(NumericPointSpec spec, QuantitySyntax written, double valueSi)
    {
        if (valueSi < spec.MinimumSi || valueSi > spec.MaximumSi)
        {
            Error(DiagnosticCode.ThresholdOutsideRange, written.Location,
                $"{written} is outside the physical range of point '{spec.Name}' ({Si(spec.MinimumSi, spec.Dimension)} to {Si(spec.MaximumSi, spec.Dimension)})");
        }
    }

    private double? TryQuantity(QuantitySyntax quantity, QuantityDimension expected, bool isDifference, string what)
    {
        var dimensionless = expected.Normalized == QuantityDimension.Of(PhysicalDimension.Dimensionless);
        if (!quantity.HasUnit)
        {
            if (dimensionless)
            {
                return quantity.Number;
            }

            Error(DiagnosticCode.MissingUnit, quantity.Location, $"{what} is a {expected}: give a unit, e.g. '{quantity} {UnitTable.Example(expected)}'");
            return null;
        }

        if (!UnitTable.TryResolve(quantity.Unit, out var unit))
        {
            Error(DiagnosticCode.UnknownUnit, quantity.UnitLocation, $"unknown unit '{quantity.Unit}'");
            return null;
        }

        if (!unit.Dimension.SameAs(expected))
        {
            Error(DiagnosticCode.UnitMismatch, quantity.Location, $"{what} is a {expected.Normalized}, but {quantity} is a {unit.Dimension.Normalized}");
            return null;
        }

        var si = unit.ToSi(quantity.Number, isDifference);
        if (!double.IsFinite(si))
        {
            Error(DiagnosticCode.InvalidNumber, quantity.Location, $"{quantity} is too large");
            return null;
        }

        return si;
    }

    private SimDuration? TryDuration(QuantitySyntax quantity, string what, bool allowZero)
    {
        if (TryQuantity(quantity, QuantityDimension.Of(PhysicalDimension.Duration), isDifference: true, what) is not { } seconds)
        {
            return null;
        }

        if (Math.Abs(seconds) > MaxDurationS)
        {
            Error(DiagnosticCode.InvalidNumber, quantity.Location, $"{what} of {quantity} is longer than the {Si(MaxDurationS)} s a rule may name");
            return null;
        }

        var duration = SimDuration.FromSeconds(seconds);
        if (duration < SimDuration.Zero || (!allowZero && duration == SimDuration.Zero))
        {
            Error(DiagnosticCode.NonPositiveDuration, quantity.Location, $"{what} must be {(allowZero ? "zero or more" : "longer than zero")} (at least 1 µs), found {quantity}");
            return null;
        }

        return duration;
    }

    private List<CompiledAction>? CheckActions(IReadOnlyList<ActionSyntax> actions)
    {
        var compiled = new List<CompiledAction>();
        var failed = false;
        foreach (var action in actions)
        {
            CompiledAction? step = action switch
            {
                SendSyntax send => CheckSend(send),
                WaitSyntax wait => TryDuration(wait.Duration, "a wait", allowZero: false) is { } duration ? new WaitAction(duration) : null,
                EnableSyntax enable => KnownRule(enable.Rule) ? new EnableAction(enable.Rule.Text) : null,
                DisableSyntax disable => KnownRule(disable.Rule) ? new DisableAction(disable.Rule.Text) : null,
                StartSyntax start => KnownProcedure(start.Procedure) ? new StartProcedureAction(start.Procedure.Text) : null,
                _ => null,
            };
            if (step is null)
            {
                failed = true;
            }
            else
            {
                compiled.Add(step);
            }
        }

        return failed ? null : compiled;
    }

    private bool KnownProcedure(NameSyntax name)
    {
        if (_catalogue.Procedures.Contains(name.Text)) return true;
        var known = _catalogue.Procedures.Count == 0 ? "the mission has no procedures" : $"the mission's procedures are {string.Join(", ", _catalogue.Procedures.Order(StringComparer.Ordinal))}";
        Error(DiagnosticCode.UnknownProcedure, name.Location, $"unknown procedure '{name.Text}'; {known}");
        return false;
    }

    private bool KnownRule(NameSyntax name)
    {
        if (_ruleNames.Contains(name.Text) || _rulesWithErrors.Contains(name.Text))
        {
            return true;
        }

        Error(DiagnosticCode.UnknownRule, name.Location, $"unknown rule '{name.Text}'");
        return false;
    }

    private SendAction? CheckSend(SendSyntax send)
    {
        var spec = _catalogue.FindCommand(send.Target.Text, send.Command.Text);
        if (spec is null)
        {
            if (_catalogue.HasTarget(send.Target.Text))
            {
                Error(DiagnosticCode.UnknownCommand, send.Command.Location,
                    $"'{send.Target.Text}' has no command '{send.Command.Text}'; it accepts {string.Join(", ", _catalogue.CommandsOf(send.Target.Text))}");
            }
            else
            {
                Error(DiagnosticCode.UnknownCommand, send.Target.Location, $"unknown command target '{send.Target.Text}'");
            }

            return null;
        }

        var arguments = new List<CommandArgument>();
        var failed = false;
        var given = new HashSet<string>(StringComparer.Ordinal);
        foreach (var argument in send.Arguments)
        {
            var argumentSpec = spec.Arguments.FirstOrDefault(a => a.Name == argument.Name.Text);
            if (argumentSpec is null)
            {
                Error(DiagnosticCode.UnknownArgument, argument.Name.Location,
                    $"'{spec.Name}' has no argument '{argument.Name.Text}'{(spec.Arguments.Count == 0 ? "; it takes none" : $"; it takes {string.Join(", ", spec.Arguments.Select(a => a.Name))}")}");
                failed = true;
                continue;
            }

            if (!given.Add(argumentSpec.Name))
            {
                Error(DiagnosticCode.DuplicateItem, argument.Name.Location, $"argument '{argumentSpec.Name}' is given twice");
                failed = true;
                continue;
            }

            if (CheckArgument(argument, argumentSpec) is { } checkedArgument)
            {
                arguments.Add(checkedArgument);
            }
            else
            {
                failed = true;
            }
        }

        foreach (var missing in spec.Arguments.Where(a => !given.Contains(a.Name)))
        {
            Error(DiagnosticCode.MissingArgument, send.Command.Location, $"'{spec.Name}' needs argument '{missing.Name}'");
            failed = true;
        }

        if (failed)
        {
            return null;
        }

        // Arguments go out in the catalogue's order, so two spellings of one command are the same data.
        var ordered = spec.Arguments.Select(a => arguments.First(x => x.Name == a.Name)).ToArray();
        return new SendAction(new CommandAction(spec.Target, spec.Name, ordered));
    }

    private CommandArgument? CheckArgument(ArgumentSyntax argument, ArgumentSpec spec)
    {
        switch (spec)
        {
            case QuantityArgumentSpec quantitySpec when argument.Quantity is { } quantity:
            {
                if (TryQuantity(quantity, QuantityDimension.Of(quantitySpec.Dimension), isDifference: false, $"argument '{spec.Name}'") is not { } si)
                {
                    return null;
                }

                if (si < quantitySpec.MinimumSi || si > quantitySpec.MaximumSi)
                {
                    Error(DiagnosticCode.ArgumentOutOfRange, quantity.Location,
                        $"argument '{spec.Name}' = {quantity} is outside its range ({Si(quantitySpec.MinimumSi, quantitySpec.Dimension)} to {Si(quantitySpec.MaximumSi, quantitySpec.Dimension)})");
                    return null;
                }

                return new CommandArgument(spec.Name, si, null);
            }

            case WordArgumentSpec wordSpec when argument.Word is { } word:
                if (!wordSpec.Values.Contains(word.Text, StringComparer.Ordinal))
                {
                    Error(DiagnosticCode.ArgumentOutOfRange, word.Location, $"argument '{spec.Name}' is one of {string.Join(", ", wordSpec.Values)}, not '{word.Text}'");
                    return null;
                }

                return new CommandArgument(spec.Name, null, word.Text);

            case WordArgumentSpec wordSpec:
                Error(DiagnosticCode.UnitMismatch, argument.Location, $"argument '{spec.Name}' is a word ({string.Join(", ", wordSpec.Values)}), not a quantity");
                return null;

            case QuantityArgumentSpec quantitySpec:
                Error(DiagnosticCode.UnitMismatch, argument.Location, $"argument '{spec.Name}' is a {quantitySpec.Dimension.ToString().ToLowerInvariant()}, not a word");
                return null;

            default:
                return null;
        }
    }

    private CompiledExclusion? CheckExclusion(ExclusionSyntax exclusion)
    {
        var failed = false;
        if (!_catalogue.HasTarget(exclusion.Target.Text))
        {
            Error(DiagnosticCode.UnknownCommand, exclusion.Target.Location, $"unknown command target '{exclusion.Target.Text}'");
            failed = true;
        }

        foreach (var rule in exclusion.Rules)
        {
            failed |= !KnownRule(rule);
        }

        return failed ? null : new CompiledExclusion(new ComponentId(exclusion.Target.Text), exclusion.Rules.Select(r => r.Text).Distinct(StringComparer.Ordinal).ToArray());
    }

    /// <summary>
    /// Rules that command one target at one priority conflict unless an 'exclusive' block on that target holds both.
    /// Each such group is reported once, naming its rules, in time near-linear in the rules and block members (a
    /// thousand rules on one actuator are one error, not half a million).
    /// </summary>
    private void CheckActuatorConflicts(RuleSetSyntax tree)
    {
        var commanders = new List<(RuleSyntax Rule, string Target, SourceLocation At)>();
        foreach (var rule in tree.Rules)
        {
            foreach (var send in AllSends(rule).GroupBy(s => s.Target.Text, StringComparer.Ordinal).Select(g => g.First()))
            {
                commanders.Add((rule, send.Target.Text, send.Target.Location));
            }
        }

        var blocksByTarget = tree.Exclusions
            .GroupBy(e => e.Target.Text, StringComparer.Ordinal)
            .ToDictionary(g => g.Key, g => g.Select(e => e.Rules.Select(r => r.Text).ToHashSet(StringComparer.Ordinal)).ToArray(), StringComparer.Ordinal);
        foreach (var group in commanders.GroupBy(c => (c.Target, c.Rule.Priority)))
        {
            // One entry per rule name: a rule that commands the target twice does not conflict with itself.
            var members = group.GroupBy(c => c.Rule.Name.Text, StringComparer.Ordinal).Select(g => g.First()).ToArray();
            if (members.Length < 2) continue;
            var blocks = blocksByTarget.GetValueOrDefault(group.Key.Target) ?? [];
            var conflicting = ConflictingMembers(members.Select(m => m.Rule.Name.Text).ToArray(), blocks);
            if (conflicting.Count == 0) continue;
            var listed = members.Where(m => conflicting.Contains(m.Rule.Name.Text)).ToArray();
            var names = string.Join(", ", listed.Take(8).Select(m => $"'{m.Rule.Name.Text}' (line {m.At.Line})"));
            var more = listed.Length > 8 ? $" and {listed.Length - 8} more" : "";
            var example = $"exclusive {group.Key.Target} ({string.Join(", ", listed.Take(3).Select(m => m.Rule.Name.Text))}{(listed.Length > 3 ? ", ..." : "")})";
            Error(DiagnosticCode.ActuatorConflict, listed[1].At,
                $"{listed.Length} rules command '{group.Key.Target}' at priority {group.Key.Priority} and may act at once: {names}{more}; give them different priorities or declare '{example}'");
        }
    }

    /// <summary>The members not excluded from every other member by some block that holds both.</summary>
    private static HashSet<string> ConflictingMembers(string[] members, HashSet<string>[] blocks)
    {
        var conflicting = new HashSet<string>(StringComparer.Ordinal);
        var memberSet = members.ToHashSet(StringComparer.Ordinal);
        // The usual cases in linear time: no block at all, or one block that holds the whole group.
        if (blocks.Any(b => memberSet.IsSubsetOf(b))) return conflicting;
        var blocksOf = new Dictionary<string, List<HashSet<string>>>(StringComparer.Ordinal);
        foreach (var block in blocks)
        {
            foreach (var name in block.Where(memberSet.Contains))
            {
                if (!blocksOf.TryGetValue(name, out var list)) blocksOf[name] = list = [];
                list.Add(block);
            }
        }

        foreach (var name in members)
        {
            if (!blocksOf.TryGetValue(name, out var own))
            {
                conflicting.Add(name);
                continue;
            }

            // Partners this rule is excluded from; stop as soon as they cover the group.
            var partners = new HashSet<string>(StringComparer.Ordinal);
            foreach (var block in own)
            {
                foreach (var other in block)
                {
                    if (memberSet.Contains(other)) partners.Add(other);
                }

                if (partners.Count == members.Length) break;
            }

            if (partners.Count < members.Length) conflicting.Add(name);
        }

        return conflicting;
    }

    private void WarnAboutUnusedExclusions(RuleSetSyntax tree)
    {
        var byName = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var rule in tree.Rules)
        {
            if (byName.ContainsKey(rule.Name.Text)) continue;
            byName[rule.Name.Text] = AllSends(rule).Select(s => s.Target.Text).ToHashSet(StringComparer.Ordinal);
        }

        foreach (var exclusion in tree.Exclusions)
        {
            foreach (var name in exclusion.Rules)
            {
                if (byName.TryGetValue(name.Text, out var targets) && !targets.Contains(exclusion.Target.Text))
                {
                    Warning(DiagnosticCode.UnusedExclusion, name.Location, $"rule '{name.Text}' never commands '{exclusion.Target.Text}'");
                }
            }
        }
    }

    private void WarnAboutRulesThatCannotAct(RuleSetSyntax tree, IReadOnlyList<CompiledRule> compiled)
    {
        var neverFires = new HashSet<string>(StringComparer.Ordinal);
        var conditionAt = new Dictionary<string, SourceLocation>(StringComparer.Ordinal);
        foreach (var syntax in tree.Rules)
        {
            if (syntax.Condition is { } condition) conditionAt.TryAdd(syntax.Name.Text, condition.Location);
        }

        foreach (var rule in compiled)
        {
            if (BoundsAnalysis.CanNeverHold(rule.Condition, _catalogue))
            {
                neverFires.Add(rule.Name);
                var at = conditionAt.GetValueOrDefault(rule.Name, rule.Location);
                Warning(DiagnosticCode.ContradictoryBounds, at, $"rule '{rule.Name}' can never fire: no telemetry satisfies its condition (bounds contradict each other or the physical range)");
            }
        }

        // A rule can become enabled only through a rule that can itself be enabled and can fire.
        var byName = new Dictionary<string, CompiledRule>(StringComparer.Ordinal);
        foreach (var rule in compiled) byName.TryAdd(rule.Name, rule);
        var enabled = compiled.Where(r => r.StartsEnabled).Select(r => r.Name).ToHashSet(StringComparer.Ordinal);
        var frontier = new Queue<string>(compiled.Where(r => r.StartsEnabled).Select(r => r.Name));
        while (frontier.Count > 0)
        {
            var name = frontier.Dequeue();
            // A rule with errors is not compiled: it cannot enable anything (and is reported already).
            if (!byName.TryGetValue(name, out var rule) || neverFires.Contains(rule.Name))
            {
                continue;
            }

            foreach (var enable in rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<EnableAction>())
            {
                if (enabled.Add(enable.Rule))
                {
                    frontier.Enqueue(enable.Rule);
                }
            }
        }

        foreach (var rule in compiled.Where(r => !enabled.Contains(r.Name)))
        {
            Warning(DiagnosticCode.NeverEnabled, rule.Location, $"rule '{rule.Name}' starts disabled and no rule that can fire enables it");
        }
    }

    private static IEnumerable<SendSyntax> AllSends(RuleSyntax rule) =>
        rule.Actions.Concat(rule.Escalations.SelectMany(e => e.Actions)).OfType<SendSyntax>();

    private static string Si(double value) => value.ToString("G6", CultureInfo.InvariantCulture);

    /// <summary>A value in SI with its SI unit, as a person reads it in a message: "3000 W", "0.000833 m/s".</summary>
    private static string Si(double value, PhysicalDimension dimension) =>
        UnitTable.SiSymbol(dimension) is { Length: > 0 } symbol ? Si(value) + " " + symbol : Si(value);

    private void Error(DiagnosticCode code, SourceLocation location, string message) =>
        _diagnostics.Add(new RuleDiagnostic(location, DiagnosticSeverity.Error, code, message));

    private void Warning(DiagnosticCode code, SourceLocation location, string message) =>
        _diagnostics.Add(new RuleDiagnostic(location, DiagnosticSeverity.Warning, code, message));
}
