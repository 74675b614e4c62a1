namespace LoadDiff.Reports.Html;

/// <summary>
/// Keeps the <c>capacity</c> largest of a stream of values by a magnitude, in constant memory. Ties keep the
/// earlier value, so the selection does not depend on anything but the input order.
/// </summary>
internal sealed class TopList<T>
{
    private readonly int _capacity;
    private readonly PriorityQueue<(T Value, double Size, long Order), (double Size, long NegOrder)> _heap = new();
    private long _seen;

    public TopList(int capacity) => _capacity = capacity;

    /// <summary>How many values were offered.</summary>
    public long Seen => _seen;

    public void Offer(T value, double size)
    {
        long order = _seen++;
        if (_heap.Count < _capacity)
        {
            _heap.Enqueue((value, size, order), (size, -order));
            return;
        }
        _heap.TryPeek(out _, out var smallest);
        if (size > smallest.Size)
        {
            _heap.DequeueEnqueue((value, size, order), (size, -order));
        }
    }

    /// <summary>The kept values, largest first (then in input order).</summary>
    public IReadOnlyList<T> Largest() =>
        _heap.UnorderedItems.Select(e => e.Element).OrderByDescending(e => e.Size).ThenBy(e => e.Order).Select(e => e.Value).ToList();
}
