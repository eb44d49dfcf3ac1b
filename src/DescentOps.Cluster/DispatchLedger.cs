namespace DescentOps.Cluster;

/// <summary>
/// Who has which run and what is still to hand out: the campaign node's bookkeeping, free of actors and clocks. Runs are
/// handed out in the campaign's own order (index, then variant), one per free slot a worker asked for (work pulling); a
/// run handed back or left by a lost worker returns to its place in that order, so the earliest open runs go first. A
/// result is accepted once per key; any later one is a duplicate. Not thread-safe: one actor owns it.
/// </summary>
public sealed class DispatchLedger
{
    private readonly Dictionary<RunKey, int> _position = [];
    private readonly List<RunKey> _order;
    private readonly SortedSet<int> _pending = [];
    private readonly Dictionary<RunKey, string> _holder = [];
    private readonly Dictionary<string, HashSet<RunKey>> _held = new(StringComparer.Ordinal);
    private readonly Dictionary<string, int> _freeSlots = new(StringComparer.Ordinal);
    private readonly List<string> _workers = [];
    private readonly HashSet<RunKey> _done = [];
    private int _stopAt = int.MaxValue;
    private int _turn;

    /// <param name="work">The runs still to do, in the campaign's order; a key may appear once.</param>
    public DispatchLedger(IEnumerable<RunKey> work)
    {
        _order = [.. work];
        for (var i = 0; i < _order.Count; i++)
        {
            if (!_position.TryAdd(_order[i], i)) throw new ArgumentException($"run {_order[i]} is listed twice", nameof(work));
            _pending.Add(i);
        }
    }

    public int Workers => _workers.Count;

    public int InFlight => _holder.Count;

    public int Pending => _pending.Count;

    public int Done => _done.Count;

    /// <summary>True once every run below the stop index is done: nothing pending, nothing in flight that counts.</summary>
    public bool Finished => _pending.Count == 0 && _holder.Keys.All(k => k.Index >= _stopAt);

    public IReadOnlyCollection<RunKey> HeldBy(string worker) => _held.TryGetValue(worker, out var keys) ? keys : [];

    public int FreeSlotsOf(string worker) => _freeSlots.GetValueOrDefault(worker);

    public bool Knows(string worker) => _freeSlots.ContainsKey(worker);

    /// <summary>A worker joins with no free slot; it asks for work with <see cref="Ask"/>.</summary>
    public void AddWorker(string worker)
    {
        if (_freeSlots.TryAdd(worker, 0))
        {
            _workers.Add(worker);
            _held[worker] = [];
        }
    }

    /// <summary>A worker has this many more free slots.</summary>
    public void Ask(string worker, int slots)
    {
        if (slots < 0) throw new ArgumentOutOfRangeException(nameof(slots), slots, "a worker cannot ask for fewer than no runs");
        if (!_freeSlots.ContainsKey(worker)) throw new InvalidOperationException($"worker {worker} is not registered");
        _freeSlots[worker] += slots;
    }

    /// <summary>Pairs free slots with pending runs, earliest run first and workers in turn, and records who holds what.</summary>
    public IReadOnlyList<(string Worker, RunKey Run)> Dispatch()
    {
        var handed = new List<(string, RunKey)>();
        while (_pending.Count > 0 && _workers.Count > 0)
        {
            var worker = NextWithFreeSlot();
            if (worker is null) break;
            var at = _pending.Min;
            _pending.Remove(at);
            var key = _order[at];
            _freeSlots[worker]--;
            _holder[key] = worker;
            _held[worker].Add(key);
            handed.Add((worker, key));
        }

        return handed;
    }

    /// <summary>A result arrived for a run: accepted the first time, a duplicate after that, unknown for a key not in the campaign.</summary>
    public ResultVerdict Complete(RunKey key)
    {
        if (!_position.TryGetValue(key, out var at)) return ResultVerdict.Unknown;
        if (!_done.Add(key)) return ResultVerdict.Duplicate;
        _pending.Remove(at);
        if (_holder.Remove(key, out var worker)) _held[worker].Remove(key);
        return ResultVerdict.Accepted;
    }

    /// <summary>A worker gives back runs it will not finish (it is stopping); those not yet done go back to their place.</summary>
    public IReadOnlyList<RunKey> HandBack(string worker, IEnumerable<RunKey> keys)
    {
        var back = new List<RunKey>();
        if (!_held.TryGetValue(worker, out var held)) return back;
        foreach (var key in keys)
        {
            if (!held.Remove(key)) continue;
            _holder.Remove(key);
            if (_done.Contains(key)) continue;
            _pending.Add(_position[key]);
            back.Add(key);
        }

        return back;
    }

    /// <summary>A worker is gone (left, or downed after it became unreachable): every run it held goes back to its place.</summary>
    public IReadOnlyList<RunKey> RemoveWorker(string worker)
    {
        if (!_freeSlots.Remove(worker)) return [];
        var back = HandBack(worker, [.. _held[worker]]);
        _held.Remove(worker);
        var i = _workers.IndexOf(worker);
        _workers.RemoveAt(i);
        if (i < _turn) _turn--;
        if (_turn >= _workers.Count) _turn = 0;
        return back;
    }

    /// <summary>Runs at or beyond this index are no longer handed out (a precision stop); their results may still arrive.</summary>
    public void StopAt(int index)
    {
        _stopAt = Math.Min(_stopAt, index);
        _pending.RemoveWhere(at => _order[at].Index >= _stopAt);
    }

    private string? NextWithFreeSlot()
    {
        for (var k = 0; k < _workers.Count; k++)
        {
            var worker = _workers[(_turn + k) % _workers.Count];
            if (_freeSlots[worker] > 0)
            {
                _turn = (_turn + k + 1) % _workers.Count;
                return worker;
            }
        }

        return null;
    }
}
