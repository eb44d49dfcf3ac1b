namespace DescentOps.Primitives.Identity;

/// <summary>
/// The stable name of a simulated component ("probe", "tether", "vehicle-2"). It orders events that tie in
/// time and priority, and it seeds the component's random stream, so it must be the same in every process:
/// ordering is ordinal and the hash is FNV-1a, never the runtime's randomized string hash.
/// </summary>
/// <remarks>This type is an immutable value type.</remarks>
public readonly record struct ComponentId : IComparable<ComponentId>
{
    public ComponentId(string name)
    {
        if (string.IsNullOrWhiteSpace(name) || name.Any(char.IsWhiteSpace))
        {
            throw new ArgumentException($"A component id is a non-empty name without spaces; got '{name}'.", nameof(name));
        }

        Name = name;
    }

    public string Name { get; }

    /// <summary>64-bit FNV-1a over the UTF-16 code units of the name: stable across processes and platforms.</summary>
    public ulong StableHash
    {
        get
        {
            const ulong offsetBasis = 14695981039346656037UL;
            const ulong prime = 1099511628211UL;
            var hash = offsetBasis;
            foreach (var unit in Name)
            {
                // A hash wraps by design (arithmetic modulo 2^64).
                hash = unchecked((hash ^ (byte)unit) * prime);
                hash = unchecked((hash ^ (byte)(unit >> 8)) * prime);
            }

            return hash;
        }
    }

    public int CompareTo(ComponentId other) => string.CompareOrdinal(Name, other.Name);

    public static bool operator <(ComponentId a, ComponentId b) => a.CompareTo(b) < 0;
    public static bool operator >(ComponentId a, ComponentId b) => a.CompareTo(b) > 0;
    public static bool operator <=(ComponentId a, ComponentId b) => a.CompareTo(b) <= 0;
    public static bool operator >=(ComponentId a, ComponentId b) => a.CompareTo(b) >= 0;

    public override string ToString() => Name;
}
