using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Sections;

/// <summary>
/// The section-cut profiles of an original and a substitute along one axis, and their largest deviations:
/// absolute as the norm of the vector difference, relative as that divided by the original's largest norm along the axis.
/// </summary>
/// <param name="Axis">The cut axis.</param>
/// <param name="Stations">Stations in ascending order.</param>
/// <param name="BoundariesIncluded">False when there were too many item boundaries to add them all as stations.</param>
/// <param name="OriginalExcludedCouple">Sum of the original's free couples, which have no position and are left out.</param>
/// <param name="SubstituteExcludedCouple">Sum of the substitute's free couples, left out likewise.</param>
public sealed record SectionComparison(
    SectionAxis Axis, IReadOnlyList<SectionStation> Stations, bool BoundariesIncluded,
    Vector3 OriginalExcludedCouple, Vector3 SubstituteExcludedCouple)
{
    /// <summary>Largest |ΔV| over the stations (force units).</summary>
    public double MaxForceDeviation => Stations.Count == 0 ? 0 : Stations.Max(x => x.ForceDeviation);

    /// <summary>The station of <see cref="MaxForceDeviation"/> (the first, if several tie).</summary>
    public double MaxForceDeviationAt => ArgMax(x => x.ForceDeviation);

    /// <summary>Largest |ΔM| over the stations (force × length).</summary>
    public double MaxMomentDeviation => Stations.Count == 0 ? 0 : Stations.Max(x => x.MomentDeviation);

    /// <summary>The station of <see cref="MaxMomentDeviation"/>.</summary>
    public double MaxMomentDeviationAt => ArgMax(x => x.MomentDeviation);

    /// <summary>
    /// The lowest and highest station of the original's own loaded geometry (for a combination, the loaded items of its
    /// cases with a non-zero factor; items of zero magnitude and free couples have no place in it), or null when it has
    /// none. <see cref="Compare(SectionAxis, IReadOnlyList{double}, bool, IEnumerable{WeightedItems}, IEnumerable{WeightedItems})"/>
    /// sets it; a comparison built otherwise has none.
    /// </summary>
    public (double Min, double Max)? OriginalExtent { get; init; }

    /// <summary>
    /// The original's largest |M| at the stations within <see cref="OriginalExtent"/> (0 when it has none). Beyond its
    /// last load a free body's cut moment keeps growing with the distance (|V|·Δs), so stations there say nothing about
    /// the size of the original's internal effects; <see cref="SectionGateCase"/> takes its allowance from this peak.
    /// </summary>
    public double OriginalPeakMomentOverExtent
    {
        get
        {
            if (OriginalExtent is not { } e)
            {
                return 0;
            }
            double peak = 0;
            foreach (SectionStation x in Stations)
            {
                if (x.S >= e.Min && x.S <= e.Max)
                {
                    peak = Math.Max(peak, x.Original.Moment.Length);
                }
            }
            return peak;
        }
    }

    /// <summary>The original's largest |V| along the axis.</summary>
    public double OriginalPeakForce => Stations.Count == 0 ? 0 : Stations.Max(x => x.Original.Force.Length);

    /// <summary>The original's largest |M| at any station (see <see cref="OriginalPeakMomentOverExtent"/> for the gate's peak).</summary>
    public double OriginalPeakMoment => Stations.Count == 0 ? 0 : Stations.Max(x => x.Original.Moment.Length);

    /// <summary><see cref="MaxForceDeviation"/> / <see cref="OriginalPeakForce"/>; null when the original has no cut force anywhere.</summary>
    public double? MaxForceDeviationRelative => OriginalPeakForce > 0 ? MaxForceDeviation / OriginalPeakForce : null;

    /// <summary><see cref="MaxMomentDeviation"/> / <see cref="OriginalPeakMoment"/>; null when the original has no cut moment anywhere.</summary>
    public double? MaxMomentDeviationRelative => OriginalPeakMoment > 0 ? MaxMomentDeviation / OriginalPeakMoment : null;

    /// <summary>
    /// Compares two load sets (each a factored sum of cases) at the given stations, and records the original's own
    /// extent (<see cref="OriginalExtent"/>).
    /// </summary>
    public static SectionComparison Compare(
        SectionAxis axis, IReadOnlyList<double> stations, bool boundariesIncluded,
        IEnumerable<WeightedItems> original, IEnumerable<WeightedItems> substitute)
    {
        Guard.NotNull(original);
        WeightedItems[] originalGroups = [.. original];
        IReadOnlyList<ForceCoupleSystem> a = SectionProfile.Compute(axis, stations, originalGroups, out Vector3 ca);
        IReadOnlyList<ForceCoupleSystem> b = SectionProfile.Compute(axis, stations, substitute, out Vector3 cb);
        var list = new SectionStation[stations.Count];
        for (int i = 0; i < list.Length; i++)
        {
            list[i] = new SectionStation(stations[i], a[i], b[i]);
        }
        return new SectionComparison(axis, list, boundariesIncluded, ca, cb) { OriginalExtent = SectionProfile.Extent(axis, originalGroups) };
    }

    /// <summary>
    /// Compares over the whole extent of both load sets' loaded geometry (or the given range), with <paramref name="count"/>
    /// even stations plus every boundary of a loaded item; items of zero magnitude and cases with factor 0 extend nothing.
    /// The ends of the original's own extent are always stations when they lie in the range.
    /// </summary>
    /// <exception cref="ArgumentException">Neither set has loaded located geometry and no range was given.</exception>
    public static SectionComparison Compare(
        SectionAxis axis, double? from, double? to, int count,
        IReadOnlyList<WeightedItems> original, IReadOnlyList<WeightedItems> substitute)
    {
        Guard.NotNull(original);
        Guard.NotNull(substitute);
        IEnumerable<LoadItem> all = SectionProfile.ItemsOfFactoredCases(original.Concat(substitute));
        (double Min, double Max)? extent = SectionProfile.Extent(axis, all);
        double lo = from ?? extent?.Min ?? throw new ArgumentException("Neither load set has located loads to cut.", nameof(original));
        double hi = to ?? extent?.Max ?? lo;
        IReadOnlyList<double> stations = SectionProfile.Stations(axis, lo, hi, count, all, out bool boundaries);
        if (!boundaries && SectionProfile.Extent(axis, original) is { } own)
        {
            // Too many boundaries to add them all: the gate's peak still needs the ends of the original's loads.
            var set = new SortedSet<double>(stations);
            foreach (double end in (double[])[own.Min, own.Max])
            {
                if (end >= lo && end <= hi)
                {
                    set.Add(end);
                }
            }
            stations = [.. set];
        }
        return Compare(axis, stations, boundaries, original, substitute);
    }

    private double ArgMax(Func<SectionStation, double> f)
    {
        double best = -1, at = 0;
        foreach (SectionStation x in Stations)
        {
            double v = f(x);
            if (v > best)
            {
                best = v;
                at = x.S;
            }
        }
        return at;
    }

    /// <inheritdoc/>
    public override string ToString() => $"sections along {Axis}: {Stations.Count} stations";
}
