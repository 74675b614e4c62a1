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

    /// <summary>The original's largest |V| along the axis.</summary>
    public double OriginalPeakForce => Stations.Count == 0 ? 0 : Stations.Max(x => x.Original.Force.Length);

    /// <summary>The original's largest |M| along the axis.</summary>
    public double OriginalPeakMoment => Stations.Count == 0 ? 0 : Stations.Max(x => x.Original.Moment.Length);

    /// <summary><see cref="MaxForceDeviation"/> / <see cref="OriginalPeakForce"/>; null when the original has no cut force anywhere.</summary>
    public double? MaxForceDeviationRelative => OriginalPeakForce > 0 ? MaxForceDeviation / OriginalPeakForce : null;

    /// <summary><see cref="MaxMomentDeviation"/> / <see cref="OriginalPeakMoment"/>; null when the original has no cut moment anywhere.</summary>
    public double? MaxMomentDeviationRelative => OriginalPeakMoment > 0 ? MaxMomentDeviation / OriginalPeakMoment : null;

    /// <summary>
    /// Compares two load sets (each a factored sum of cases) at the given stations.
    /// </summary>
    public static SectionComparison Compare(
        SectionAxis axis, IReadOnlyList<double> stations, bool boundariesIncluded,
        IEnumerable<WeightedItems> original, IEnumerable<WeightedItems> substitute)
    {
        IReadOnlyList<ForceCoupleSystem> a = SectionProfile.Compute(axis, stations, original, out Vector3 ca);
        IReadOnlyList<ForceCoupleSystem> b = SectionProfile.Compute(axis, stations, substitute, out Vector3 cb);
        var list = new SectionStation[stations.Count];
        for (int i = 0; i < list.Length; i++)
        {
            list[i] = new SectionStation(stations[i], a[i], b[i]);
        }
        return new SectionComparison(axis, list, boundariesIncluded, ca, cb);
    }

    /// <summary>
    /// Compares over the whole extent of both load sets' geometry (or the given range), with <paramref name="count"/>
    /// even stations plus every item boundary.
    /// </summary>
    /// <exception cref="ArgumentException">Neither set has located geometry and no range was given.</exception>
    public static SectionComparison Compare(
        SectionAxis axis, double? from, double? to, int count,
        IReadOnlyList<WeightedItems> original, IReadOnlyList<WeightedItems> substitute)
    {
        Guard.NotNull(original);
        Guard.NotNull(substitute);
        IEnumerable<LoadItem> all = original.Concat(substitute).SelectMany(g => g.Items);
        (double Min, double Max)? extent = SectionProfile.Extent(axis, all);
        double lo = from ?? extent?.Min ?? throw new ArgumentException("Neither load set has located loads to cut.", nameof(original));
        double hi = to ?? extent?.Max ?? lo;
        IReadOnlyList<double> stations = SectionProfile.Stations(axis, lo, hi, count, all, out bool boundaries);
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
