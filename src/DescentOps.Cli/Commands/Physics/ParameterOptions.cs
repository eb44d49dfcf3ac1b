using System.Collections;
using System.CommandLine;

namespace DescentOps.Cli.Commands.Physics;

/// <summary>
/// Which option feeds which physics parameter, so that a model's refusal names the option the user typed. It is built
/// from the option objects themselves, never from their names typed again: an option renamed where it is declared is
/// renamed in its error messages too.
/// </summary>
internal sealed class ParameterOptions : IEnumerable<KeyValuePair<string, string>>
{
    private readonly Dictionary<string, string> _optionByParameter = new(StringComparer.Ordinal);

    public void Add(string parameter, QuantityOption option) => Feed(parameter, option.Name);

    public void Add(string parameter, SalinityOption option) => Feed(parameter, option.Name);

    public void Add(string parameter, DoseRateOption option) => Feed(parameter, option.Name);

    public void Add(string parameter, LevelOption option) => Feed(parameter, option.Name);

    public void Add(string parameter, Option option) => Feed(parameter, option.Name);

    /// <summary>The option that feeds <paramref name="parameter"/>, if one does.</summary>
    public bool TryGetOption(string parameter, out string option) => _optionByParameter.TryGetValue(parameter, out option!);

    public IEnumerator<KeyValuePair<string, string>> GetEnumerator() => _optionByParameter.GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();

    private void Feed(string parameter, string option)
    {
        ArgumentException.ThrowIfNullOrEmpty(parameter);
        if (!_optionByParameter.TryAdd(parameter, option))
        {
            throw new ArgumentException($"The parameter '{parameter}' is fed by {_optionByParameter[parameter]} already; it cannot also be fed by {option}.", nameof(parameter));
        }
    }
}
