using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Reduction;

/// <summary>
/// Accumulates load items one at a time into a force-couple system, in double-double arithmetic, with
/// moments taken about an anchor point near the loads (the first located item unless given) so that
/// coordinates far from the origin cost no accuracy. Memory is constant in the number of items.
/// </summary>
public sealed partial class ReductionAccumulator
{
    // Forces whose direction differs from the first by more than this (relative) make the system non-parallel.
    private const double ParallelTolerance = 1e-9;

    private readonly VectorSum _force = new();
    private readonly VectorSum _moment = new();
    private readonly VectorSum _grossFirst = new();
    private DoubleDouble _gross;
    private DoubleDouble _grossCouple;
    private Vector3 _min;
    private Vector3 _max;
    private bool _hasBounds;
    private Vector3 _direction;
    private bool _parallel = true;

    /// <summary>Creates an empty accumulator; moments are summed about <paramref name="anchor"/> when given.</summary>
    public ReductionAccumulator(Vector3? anchor = null)
    {
        Anchor = anchor;
    }

    /// <summary>The point moments are accumulated about, once known.</summary>
    public Vector3? Anchor { get; private set; }

    /// <summary>Number of items added (mesh triangles count one each).</summary>
    public long Count { get; private set; }

    /// <summary>Adds one item's exact contribution. An item that is not loaded (zero magnitude) is counted, nothing more.</summary>
    public void Add(LoadItem item)
    {
        Guard.NotNull(item);
        if (item is PointForce pf)
        {
            AddPointForce(pf.At, pf.Value);
            return;
        }
        Vector3? first = Anchor;
        if (first is null)
        {
            item.VisitGeometry(p => first ??= p);
        }
        Contribution c = item.ContributionAbout(first ?? Vector3.Zero);
        Count++;
        if (c.GrossForce == 0 && c.GrossCouple == 0)
        {
            // zero magnitude: no loaded geometry, so neither the anchor, the box nor the direction may take it
            return;
        }
        Anchor ??= first;
        _force.Add(c.Force);
        _moment.Add(c.Moment);
        _gross += c.GrossForce;
        _grossFirst.Add(c.GrossFirstMoment);
        _grossCouple += c.GrossCouple;
        if (c.GrossForce > 0)
        {
            item.VisitGeometry(Extend);
        }
        TrackDirection(item.ForceDirection, item);
    }

    /// <summary>Adds a concentrated force; the moment terms are formed exactly (FMA two-product). A zero force is counted only.</summary>
    public void AddPointForce(Vector3 at, Vector3 force)
    {
        Count++;
        if (force.IsZero)
        {
            return;
        }
        Anchor ??= at;
        Vector3 d = at - Anchor.Value;
        _force.Add(force);
        _moment.AddCross(d, force);
        double g = force.Length;
        _gross += g;
        _grossFirst.Add(d * g);
        Extend(at);
        TrackDirection(force, null);
    }

    /// <summary>Adds one pressure-map triangle (see <see cref="MeshTriangle"/>) without building an item; one of zero pressure is counted only.</summary>
    public void AddTriangle(Vector3 a, Vector3 b, Vector3 c, double pressureA, double pressureB, double pressureC, Vector3? direction)
    {
        Count++;
        Contribution k = MeshTriangle.Reduce(a, b, c, pressureA, pressureB, pressureC, direction, Anchor ?? a);
        if (k.GrossForce == 0)
        {
            return;
        }
        Anchor ??= a;
        _force.Add(k.Force);
        _moment.Add(k.Moment);
        _gross += k.GrossForce;
        _grossFirst.Add(k.GrossFirstMoment);
        Extend(a);
        Extend(b);
        Extend(c);
        TrackDirection(direction ?? Vector3.Cross(b - a, c - a), null);
    }

    /// <summary>Adds a free couple.</summary>
    public void AddCouple(Vector3 couple)
    {
        _moment.Add(couple);
        _grossCouple += couple.Length;
        Count++;
    }

    /// <summary>Adds <paramref name="factor"/> times another accumulator (load combinations, parallel merging).</summary>
    public void AddScaled(ReductionAccumulator other, double factor)
    {
        Guard.NotNull(other);
        Guard.Finite(factor);
        if (other.Count == 0)
        {
            return;
        }
        if (factor == 0)
        {
            // a case with factor 0 is no loaded geometry of the combination
            Count += other.Count;
            return;
        }
        Anchor ??= other.Anchor;
        _force.AddScaled(other._force, factor);
        _moment.AddScaled(other._moment, factor);
        double af = Math.Abs(factor);
        _gross += other._gross * af;
        _grossCouple += other._grossCouple * af;
        _grossFirst.AddScaled(other._grossFirst, af);
        if (other.Anchor is { } oa && Anchor is { } a && oa != a)
        {
            // M about a = M about oa + (oa − a) × R; the first moment of |F| moves the same way.
            VectorSum f = new();
            f.AddScaled(other._force, factor);
            _moment.AddCross(oa - a, f);
            _grossFirst.Add((oa - a) * (other._gross.Value * af));
        }
        if (other._hasBounds)
        {
            Extend(other._min);
            Extend(other._max);
        }
        if (!other._parallel)
        {
            _parallel = false;
        }
        else if (!other._direction.IsZero)
        {
            TrackDirection(other._direction, null);
        }
        Count += other.Count;
    }

    /// <summary>The reduction about <paramref name="point"/> (the moment transfer is done in double-double).</summary>
    public LoadReduction ResultAt(Vector3 point)
    {
        Vector3 anchor = Anchor ?? point;
        VectorSum moment = _moment.Clone();
        moment.AddCross(
            DoubleDouble.Difference(anchor.X, point.X), DoubleDouble.Difference(anchor.Y, point.Y), DoubleDouble.Difference(anchor.Z, point.Z), _force);
        double gross = _gross.Value;
        Vector3? centroid = gross > 0 ? anchor + (_grossFirst.Value / gross) : null;
        Box? box = _hasBounds ? new Box(_min, _max) : null;
        return new LoadReduction(
            new ForceCoupleSystem(_force.Value, moment.Value, point),
            gross, _grossCouple.Value, centroid, box, _parallel && !_direction.IsZero, Count)
        {
            Sums = new ResultantSums(_force.X, _force.Y, _force.Z, _moment.X, _moment.Y, _moment.Z, anchor),
        };
    }

    private void Extend(Vector3 p)
    {
        if (!_hasBounds)
        {
            _min = _max = p;
            _hasBounds = true;
            return;
        }
        _min = Vector3.Min(_min, p);
        _max = Vector3.Max(_max, p);
    }

    private void TrackDirection(Vector3 f, LoadItem? item)
    {
        if (!_parallel || f.IsZero)
        {
            return;
        }
        if (_direction.IsZero)
        {
            _direction = f.Normalize();
            if (item is not null && !item.IsParallelTo(_direction, ParallelTolerance))
            {
                _parallel = false;
            }
            return;
        }
        _parallel = item?.IsParallelTo(_direction, ParallelTolerance) ?? LoadItem.Parallel(f, _direction, ParallelTolerance);
    }
}
