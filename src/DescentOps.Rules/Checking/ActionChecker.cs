using DescentOps.Rules.Catalogue;
using DescentOps.Rules.Compiled;
using DescentOps.Rules.Syntax;
using DescentOps.Rules.Text;
using DescentOps.Rules.Units;

namespace DescentOps.Rules.Checking;

/// <summary>A rule's actions: sends against the catalogue's commands and their arguments, waits, and the rules and procedures named.</summary>
internal sealed class ActionChecker
{
    private readonly TelemetryCatalogue _catalogue;
    private readonly DiagnosticList _diagnostics;
    private readonly QuantityChecker _quantities;
    private readonly RuleNames _names;

    public ActionChecker(TelemetryCatalogue catalogue, DiagnosticList diagnostics, QuantityChecker quantities, RuleNames names)
    {
        _catalogue = catalogue;
        _diagnostics = diagnostics;
        _quantities = quantities;
        _names = names;
    }

    internal List<CompiledAction>? Check(IReadOnlyList<ActionSyntax> actions)
    {
        var compiled = new List<CompiledAction>();
        var failed = false;
        foreach (var action in actions)
        {
            CompiledAction? step = action switch
            {
                SendSyntax send => CheckSend(send),
                WaitSyntax wait => _quantities.TryDuration(wait.Duration, "a wait", allowZero: false) is { } duration ? new WaitAction(duration) : null,
                EnableSyntax enable => _names.Known(enable.Rule) ? new EnableAction(enable.Rule.Text) : null,
                DisableSyntax disable => _names.Known(disable.Rule) ? new DisableAction(disable.Rule.Text) : null,
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
        _diagnostics.Error(DiagnosticCode.UnknownProcedure, name.Location, $"unknown procedure '{name.Text}'; {known}");
        return false;
    }

    internal SendAction? CheckSend(SendSyntax send)
    {
        var spec = _catalogue.FindCommand(send.Target.Text, send.Command.Text);
        if (spec is null)
        {
            if (_catalogue.HasTarget(send.Target.Text))
            {
                _diagnostics.Error(DiagnosticCode.UnknownCommand, send.Command.Location,
                    $"'{send.Target.Text}' has no command '{send.Command.Text}'; it accepts {string.Join(", ", _catalogue.CommandsOf(send.Target.Text))}");
            }
            else if (_catalogue.UnknownLanderOf(send.Target.Text) is { } lander)
            {
                _diagnostics.Error(DiagnosticCode.UnknownLander, send.Target.Location, $"unknown lander '{lander}' in '{send.Target.Text}'; the landers are {string.Join(", ", _catalogue.Landers.Order(StringComparer.Ordinal))}");
            }
            else
            {
                _diagnostics.Error(DiagnosticCode.UnknownCommand, send.Target.Location, $"unknown command target '{send.Target.Text}'");
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
                _diagnostics.Error(DiagnosticCode.UnknownArgument, argument.Name.Location,
                    $"'{spec.Name}' has no argument '{argument.Name.Text}'{(spec.Arguments.Count == 0 ? "; it takes none" : $"; it takes {string.Join(", ", spec.Arguments.Select(a => a.Name))}")}");
                failed = true;
                continue;
            }

            if (!given.Add(argumentSpec.Name))
            {
                _diagnostics.Error(DiagnosticCode.DuplicateItem, argument.Name.Location, $"argument '{argumentSpec.Name}' is given twice");
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
            _diagnostics.Error(DiagnosticCode.MissingArgument, send.Command.Location, $"'{spec.Name}' needs argument '{missing.Name}'");
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
                if (_quantities.TryQuantity(quantity, QuantityDimension.Of(quantitySpec.Dimension), isDifference: false, $"argument '{spec.Name}'") is not { } si)
                {
                    return null;
                }

                if (si < quantitySpec.MinimumSi || si > quantitySpec.MaximumSi)
                {
                    _diagnostics.Error(DiagnosticCode.ArgumentOutOfRange, quantity.Location,
                        $"argument '{spec.Name}' = {quantity} is outside its range ({QuantityChecker.Si(quantitySpec.MinimumSi, quantitySpec.Dimension)} to {QuantityChecker.Si(quantitySpec.MaximumSi, quantitySpec.Dimension)})");
                    return null;
                }

                return new CommandArgument(spec.Name, si, null);
            }

            case WordArgumentSpec wordSpec when argument.Word is { } word:
                if (!wordSpec.Values.Contains(word.Text, StringComparer.Ordinal))
                {
                    _diagnostics.Error(DiagnosticCode.ArgumentOutOfRange, word.Location, $"argument '{spec.Name}' is one of {string.Join(", ", wordSpec.Values)}, not '{word.Text}'");
                    return null;
                }

                return new CommandArgument(spec.Name, null, word.Text);

            case WordArgumentSpec wordSpec:
                _diagnostics.Error(DiagnosticCode.UnitMismatch, argument.Location, $"argument '{spec.Name}' is a word ({string.Join(", ", wordSpec.Values)}), not a quantity");
                return null;

            case QuantityArgumentSpec quantitySpec:
                _diagnostics.Error(DiagnosticCode.UnitMismatch, argument.Location, $"argument '{spec.Name}' is a {quantitySpec.Dimension.ToString().ToLowerInvariant()}, not a word");
                return null;

            default:
                return null;
        }
    }
}
