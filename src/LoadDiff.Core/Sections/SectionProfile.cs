using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Sections;

/// <summary>
/// Cut-side resultants along an axis: at each station s, the resultant force V(s) and moment M(s), about the cut
/// point origin + s·axis, of everything on the negative side of the cut. Items wholly on that side enter a running
/// double-double reduction once; only the items the cut passes through are clipped (<see cref="HalfSpaceClip"/>).
/// </summary>
public static class SectionProfile
{
    /// <summary>Most item boundaries added as stations; beyond this only the uniform stations are used.</summary>
    public const int MaxBoundaryStations = 10_000;

    /// <summary>
    /// The cut-side systems at the given stations (ascending), each about its own cut point, for a factored sum of cases.
    /// Free couples have no position: they are left out and summed in <paramref name="excludedCouple"/>.
    /// </summary>
    /// <exception cref="ArgumentException">The stations are not finite and ascending.</exception>
    public static IReadOnlyList<ForceCoupleSystem> Compute(
        SectionAxis axis, IReadOnlyList<double> stations, IEnumerable<WeightedItems> groups, out Vector3 excludedCouple)
    {
        Guard.NotNull(axis);
        Guard.NotNull(stations);
        Guard.NotNull(groups);
        for (int i = 0; i < stations.Count; i++)
        {
            Guard.That(double.IsFinite(stations[i]) && (i == 0 || stations[i] >= stations[i - 1]),
                "Stations must be finite and in ascending order.", nameof(stations));
        }
        var total = new ForceCoupleSystem[stations.Count];
        for (int i = 0; i < total.Length; i++)
        {
            total[i] = new ForceCoupleSystem(Vector3.Zero, Vector3.Zero, axis.PointAt(stations[i]));
        }
        excludedCouple = Vector3.Zero;
        foreach (WeightedItems g in groups)
        {
            ForceCoupleSystem[] one = ComputeOne(axis, stations, g.Items, out Vector3 couple);
            excludedCouple += couple * g.Factor;
            for (int i = 0; i < total.Length; i++)
            {
                total[i] += one[i] * g.Factor;
            }
        }
        return total;
    }

    /// <summary>
    /// Stations from <paramref name="from"/> to <paramref name="to"/>: <paramref name="count"/> evenly spaced ones,
    /// plus every boundary (vertex station) of a loaded item inside the range so the profile is exact where a load starts,
    /// ends or jumps; an item of zero magnitude (<see cref="LoadItem.IsLoaded"/> false) adds none.
    /// <paramref name="boundariesIncluded"/> is false when there were more than <see cref="MaxBoundaryStations"/>.
    /// </summary>
    /// <exception cref="ArgumentException">The range is not finite or reversed, or the count is below 2.</exception>
    public static IReadOnlyList<double> Stations(
        SectionAxis axis, double from, double to, int count, IEnumerable<LoadItem> items, out bool boundariesIncluded)
    {
        Guard.NotNull(axis);
        Guard.NotNull(items);
        Guard.That(double.IsFinite(from) && double.IsFinite(to) && from <= to, "The station range must be finite and ascending.", nameof(from));
        Guard.That(count >= 2, "At least two stations are needed.", nameof(count));
        var set = new SortedSet<double>();
        for (int i = 0; i < count; i++)
        {
            set.Add(i == count - 1 ? to : from + ((to - from) * i / (count - 1)));
        }
        var boundaries = new SortedSet<double>();
        boundariesIncluded = true;
        foreach (LoadItem item in items.Where(i => i.IsLoaded))
        {
            item.VisitGeometry(p =>
            {
                double s = axis.StationOf(p);
                if (s >= from && s <= to && boundaries.Count <= MaxBoundaryStations)
                {
                    boundaries.Add(s);
                }
            });
        }
        if (boundaries.Count > MaxBoundaryStations)
        {
            boundariesIncluded = false;
        }
        else
        {
            // An even station a few ulps from a boundary would show the load on the wrong side of a near-duplicate
            // station: the boundary replaces it. Boundaries never replace each other (a far load makes "near" large).
            double near = 1e-9 * Math.Max(to - from, Math.Max(Math.Abs(from), Math.Abs(to)));
            foreach (double b in boundaries)
            {
                set.RemoveWhere(x => !boundaries.Contains(x) && Math.Abs(x - b) <= near);
                set.Add(b);
            }
        }
        return [.. set];
    }

    /// <summary>
    /// The lowest and highest station of the loaded located geometry (items with <see cref="LoadItem.IsLoaded"/>; a zero
    /// force or a line of zero intensity extends no range), or null when there is none.
    /// </summary>
    public static (double Min, double Max)? Extent(SectionAxis axis, IEnumerable<LoadItem> items)
    {
        Guard.NotNull(items);
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        foreach (LoadItem item in items.Where(i => i.IsLoaded))
        {
            if (HalfSpaceClip.StationRange(item, axis) is { } r)
            {
                min = Math.Min(min, r.Min);
                max = Math.Max(max, r.Max);
            }
        }
        return min <= max ? (min, max) : null;
    }

    /// <summary>
    /// <see cref="Extent(SectionAxis, IEnumerable{LoadItem})"/> of a factored sum of cases: a case with factor 0 is no load
    /// in it and extends nothing.
    /// </summary>
    public static (double Min, double Max)? Extent(SectionAxis axis, IEnumerable<WeightedItems> groups) =>
        Extent(axis, ItemsOfFactoredCases(groups));

    /// <summary>The items of the groups with a non-zero factor, loaded or not.</summary>
    internal static IEnumerable<LoadItem> ItemsOfFactoredCases(IEnumerable<WeightedItems> groups) =>
        Guard.NotNull(groups).Where(g => g.Factor != 0).SelectMany(g => g.Items);

    private static ForceCoupleSystem[] ComputeOne(SectionAxis axis, IReadOnlyList<double> stations, IReadOnlyList<LoadItem> items, out Vector3 couple)
    {
        var located = new List<(LoadItem Item, double Min, double Max)>(items.Count);
        var couples = new VectorSum();
        // An item of zero magnitude adds nothing at any cut; left out, it cannot widen the rounding reach either.
        foreach (LoadItem item in items.Where(i => i.IsLoaded))
        {
            if (item is FreeCouple c)
            {
                couples.Add(c.Value);
            }
            else if (HalfSpaceClip.StationRange(item, axis) is { } r)
            {
                // Geometry within rounding of a cut counts as on the cut, so a load that lies in the cut plane is on the
                // same side whether it comes whole or in pieces; clipping itself stays at s. The rounding of a station
                // grows with the point's distance from the axis origin, so each item's own reach sets its tolerance (a
                // shared one would let one load far away put every other load within metres "on the cut").
                double reach = 0;
                item.VisitGeometry(p => reach = Math.Max(reach, (p - axis.Origin).Length));
                located.Add((item, r.Min, r.Max - (1e-12 * reach)));
            }
        }
        couple = couples.Value;
        // Max is the item's highest station less its rounding: the item lies wholly behind every cut at or past it.
        var byMax = located.OrderBy(x => x.Max).ToArray();
        var byMin = located.OrderBy(x => x.Min).ToArray();
        var whole = new ReductionAccumulator();
        var cutThrough = new List<(LoadItem Item, double Min, double Max)>();
        int nextWhole = 0, nextStarted = 0;
        var result = new ForceCoupleSystem[stations.Count];
        for (int i = 0; i < stations.Count; i++)
        {
            double s = stations[i];
            Vector3 cut = axis.PointAt(s);
            while (nextWhole < byMax.Length && byMax[nextWhole].Max <= s)
            {
                whole.Add(byMax[nextWhole++].Item);
            }
            while (nextStarted < byMin.Length && byMin[nextStarted].Min < s)
            {
                cutThrough.Add(byMin[nextStarted++]);
            }
            cutThrough.RemoveAll(x => x.Max <= s);
            var part = new ReductionAccumulator();
            foreach (var x in cutThrough)
            {
                foreach (LoadItem piece in HalfSpaceClip.NegativeSide(x.Item, axis, s))
                {
                    part.Add(piece);
                }
            }
            result[i] = whole.ResultAt(cut).System + part.ResultAt(cut).System;
        }
        return result;
    }
}
