namespace DescentOps.Rehearsal;

/// <summary>
/// What the session has told its watchers, in order, as JSON objects: each item is for the team (and so also for the
/// supervisor) or for the supervisor alone. Bounded: the oldest items go once <see cref="Capacity"/> is reached, and a
/// watcher that fell that far behind starts again from the oldest kept.
/// </summary>
public sealed class SessionFeed
{
    public const int Capacity = 50_000;

    private readonly List<(bool TeamSees, string Json)> _items = [];
    private long _dropped;

    /// <summary>The number after the last item.</summary>
    public long End => _dropped + _items.Count;

    public void Add(bool teamSees, string json)
    {
        if (_items.Count == Capacity)
        {
            _items.RemoveRange(0, Capacity / 10);
            _dropped += Capacity / 10;
        }

        _items.Add((teamSees, json));
    }

    /// <summary>Items from number <paramref name="cursor"/> on that the audience may see, at most <paramref name="max"/>; returns the next cursor.</summary>
    public long Since(long cursor, bool supervisor, int max, List<string> into)
    {
        var index = (int)Math.Max(0, cursor - _dropped);
        while (index < _items.Count && into.Count < max)
        {
            var (teamSees, json) = _items[index++];
            if (supervisor || teamSees) into.Add(json);
        }

        return _dropped + index;
    }
}
