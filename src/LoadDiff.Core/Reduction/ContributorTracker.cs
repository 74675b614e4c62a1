using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Reduction;

/// <summary>
/// Keeps the largest contributors of a case while items stream past: forces ranked by |F| and couples by |C|,
/// a few of each. Consecutive items with the same id (a mesh's triangles) are summed first. Memory is constant.
/// </summary>
public sealed class ContributorTracker
{
    private readonly int _capacity;
    private readonly List<Contributor> _forces = [];
    private readonly List<Contributor> _couples = [];
    private string? _pendingId;
    private LoadKind _pendingKind;
    private Vector3 _pendingForce;
    private Vector3 _pendingCouple;
    private Vector3 _pendingAnchor;
    private Vector3 _pendingFirst;
    private double _pendingGross;
    private long _pendingParts;

    /// <summary>Creates a tracker keeping <paramref name="capacity"/> forces and as many couples.</summary>
    public ContributorTracker(int capacity)
    {
        Guard.That(capacity > 0, "Capacity must be positive.", nameof(capacity));
        _capacity = capacity;
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
        _pendingFirst += c.GrossFirstMoment;
        _pendingGross += c.GrossForce;
        _pendingParts++;
    }

    /// <summary>Offers a contributor already summed elsewhere (a block of a file reduced in parallel).</summary>
    public void Offer(Contributor contributor)
    {
        Guard.NotNull(contributor);
        Flush();
        Insert(contributor.Kind == LoadKind.Couple ? _couples : _forces, contributor);
    }

    /// <summary>True when a contributor of this magnitude would be kept among the forces now.</summary>
    public bool WouldKeepForce(double magnitude) => _forces.Count < _capacity || magnitude > _forces[^1].Magnitude;

    /// <summary>The largest force contributors, largest first.</summary>
    public IReadOnlyList<Contributor> Forces
    {
        get
        {
            Flush();
            return _forces;
        }
    }

    /// <summary>The largest couples, largest first.</summary>
    public IReadOnlyList<Contributor> Couples
    {
        get
        {
            Flush();
            return _couples;
        }
    }

    private void Flush()
    {
        if (_pendingId is null)
        {
            return;
        }
        Vector3? centroid = _pendingGross > 0 ? _pendingAnchor + (_pendingFirst / _pendingGross) : null;
        var entry = new Contributor(_pendingId, _pendingKind, _pendingForce, _pendingCouple, centroid, _pendingParts);
        Insert(_pendingKind == LoadKind.Couple ? _couples : _forces, entry);
        _pendingId = null;
        _pendingForce = _pendingCouple = _pendingFirst = Vector3.Zero;
        _pendingGross = 0;
        _pendingParts = 0;
    }

    private void Insert(List<Contributor> list, Contributor entry)
    {
        if (list.Count == _capacity && entry.Magnitude <= list[^1].Magnitude)
        {
            return;
        }
        int i = list.FindIndex(x => entry.Magnitude > x.Magnitude);
        list.Insert(i < 0 ? list.Count : i, entry);
        if (list.Count > _capacity)
        {
            list.RemoveAt(list.Count - 1);
        }
    }
}
