using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Reduction;

/// <summary>
/// Keeps the largest contributors of a case while items stream past: forces ranked by |F| and couples by |C|, up to a
/// capacity of each (a min-heap, so a large capacity costs log n per item). Consecutive items with the same id (a
/// mesh's triangles) are summed first. Memory is bounded by the capacity.
/// </summary>
public sealed class ContributorTracker
{
    private readonly int _capacity;
    private readonly PriorityQueue<Ranked, (double, long)> _forces = new();
    private readonly PriorityQueue<Ranked, (double, long)> _couples = new();
    private long _sequence;
    private string? _pendingId;
    private LoadKind _pendingKind;
    private Vector3 _pendingForce;
    private Vector3 _pendingCouple;
    private Vector3 _pendingMoment;
    private Vector3 _pendingAnchor;
    private Vector3 _pendingFirst;
    private double _pendingGross;
    private long _pendingParts;
    private bool _truncated;

    /// <summary>Creates a tracker keeping <paramref name="capacity"/> forces and as many couples.</summary>
    public ContributorTracker(int capacity)
    {
        Guard.That(capacity > 0, "Capacity must be positive.", nameof(capacity));
        _capacity = capacity;
    }

    /// <summary>True when a contributor was left out because the tracker was full.</summary>
    public bool Truncated
    {
        get
        {
            // the item still being summed may be the one left out
            Flush();
            return _truncated;
        }
    }

    /// <summary>Offers one item.</summary>
    public void Offer(LoadItem item)
    {
        Guard.NotNull(item);
        if (_pendingId is not null && (item.Id != _pendingId || item.Kind != _pendingKind))
        {
            Flush();
        }
        if (_pendingId is null)
        {
            _pendingId = item.Id;
            _pendingKind = item.Kind;
            _pendingAnchor = Vector3.Zero;
            bool located = false;
            item.VisitGeometry(p =>
            {
                if (!located)
                {
                    _pendingAnchor = p;
                    located = true;
                }
            });
        }
        Contribution c = item.ContributionAbout(_pendingAnchor);
        if (item.Kind == LoadKind.Couple)
        {
            _pendingCouple += c.Moment;
        }
        _pendingForce += c.Force;
        _pendingMoment += c.Moment;
        _pendingFirst += c.GrossFirstMoment;
        _pendingGross += c.GrossForce;
        _pendingParts++;
    }

    /// <summary>Offers a contributor already summed elsewhere (a block of a file reduced in parallel).</summary>
    public void Offer(Contributor contributor)
    {
        Guard.NotNull(contributor);
        Flush();
        Insert(contributor);
    }

    /// <summary>True when a contributor of this magnitude would be kept among the forces now.</summary>
    public bool WouldKeepForce(double magnitude) =>
        _forces.Count < _capacity || (_forces.TryPeek(out _, out (double Magnitude, long) least) && magnitude > least.Magnitude);

    /// <summary>The largest force contributors, largest first (equal ones in the order offered).</summary>
    public IReadOnlyList<Contributor> Forces
    {
        get
        {
            Flush();
            return Sorted(_forces);
        }
    }

    /// <summary>The largest couples, largest first.</summary>
    public IReadOnlyList<Contributor> Couples
    {
        get
        {
            Flush();
            return Sorted(_couples);
        }
    }

    private static List<Contributor> Sorted(PriorityQueue<Ranked, (double, long)> heap)
    {
        var list = heap.UnorderedItems.Select(e => e.Element).ToList();
        list.Sort((a, b) => a.Item.Magnitude != b.Item.Magnitude ? b.Item.Magnitude.CompareTo(a.Item.Magnitude) : a.Sequence.CompareTo(b.Sequence));
        return list.ConvertAll(r => r.Item);
    }

    private void Flush()
    {
        if (_pendingId is null)
        {
            return;
        }
        PriorityQueue<Ranked, (double, long)> heap = _pendingKind == LoadKind.Couple ? _couples : _forces;
        double magnitude = (_pendingKind == LoadKind.Couple ? _pendingCouple : _pendingForce).Length;
        if (heap.Count == _capacity && heap.TryPeek(out _, out (double Magnitude, long) least) && magnitude <= least.Magnitude)
        {
            // it would not be kept: build nothing
            _truncated = true;
            _pendingId = null;
            _pendingForce = _pendingCouple = _pendingMoment = _pendingFirst = Vector3.Zero;
            _pendingGross = 0;
            _pendingParts = 0;
            return;
        }
        Vector3? centroid = _pendingGross > 0 ? _pendingAnchor + (_pendingFirst / _pendingGross) : null;
        // the moment about the centroid: M_c = M_anchor + (anchor − c) × F
        Vector3 momentAtCentroid = centroid is { } c ? _pendingMoment + Vector3.Cross(_pendingAnchor - c, _pendingForce) : _pendingMoment;
        var entry = new Contributor(_pendingId, _pendingKind, _pendingForce, _pendingCouple, centroid, _pendingParts)
        {
            CentroidMoment = momentAtCentroid,
        };
        _pendingId = null;
        _pendingForce = _pendingCouple = _pendingMoment = _pendingFirst = Vector3.Zero;
        _pendingGross = 0;
        _pendingParts = 0;
        Insert(entry);
    }

    private void Insert(Contributor entry)
    {
        PriorityQueue<Ranked, (double, long)> heap = entry.Kind == LoadKind.Couple ? _couples : _forces;
        // the heap's least element is the smallest magnitude, and among equals the latest offered (kept last)
        var key = (entry.Magnitude, -_sequence);
        var ranked = new Ranked(entry, _sequence++);
        if (heap.Count < _capacity)
        {
            heap.Enqueue(ranked, key);
            return;
        }
        _truncated = true;
        if (heap.TryPeek(out _, out (double Magnitude, long) least) && entry.Magnitude > least.Magnitude)
        {
            heap.EnqueueDequeue(ranked, key);
        }
    }

    private readonly record struct Ranked(Contributor Item, long Sequence);
}
