using System.Globalization;
using LoadDiff.Core.Model;

namespace LoadDiff.Core.Sections;

/// <summary>
/// The section-cut gate's verdict on one case or combination: it passes when the largest |ΔM(s)| over all stations is at
/// most <see cref="RelativeTolerance"/> × the original's peak |M(s)|, the peak taken over the original's own loaded extent
/// along the axis only. Stations beyond it are compared all the same (a substitute load misplaced out there still fails),
/// but they do not raise the allowance: past its last load a free body's cut moment grows without bound (|V|·Δs).
/// </summary>
/// <param name="Name">Case or combination name.</param>
/// <param name="Kind">Case or combination.</param>
/// <param name="RelativeTolerance">The allowed deviation as a fraction of <see cref="PeakMoment"/>.</param>
/// <param name="PeakMoment">The original's largest |M(s)| at the stations within <see cref="PeakExtent"/> (force × length).</param>
/// <param name="PeakExtent">The stations of the original's loaded geometry the peak was taken over (length units); null when it has none.</param>
/// <param name="MaxMomentDeviation">Largest |M_substitute(s) − M_original(s)| over all stations (force × length).</param>
/// <param name="MaxMomentDeviationAt">The station of <see cref="MaxMomentDeviation"/> (length units).</param>
public sealed record SectionGateCase(
    string Name, EntryKind Kind, double RelativeTolerance, double PeakMoment, (double Min, double Max)? PeakExtent,
    double MaxMomentDeviation, double MaxMomentDeviationAt)
{
    /// <summary>
    /// What rounding alone can make of a cut moment here (force × length): <see cref="Reduction.WrenchAnalysis.RoundingThreshold"/>
    /// times the original's largest cut force times the largest distance of a cut point from the origin plus the length of
    /// its extent, plus the threshold times its largest cut moment, all at the stations within the original's own extent. The allowance never falls below it, so two copies of one load set written in
    /// different units never fail on rounding (an original whose loads sit at one station has a peak of 0).
    /// </summary>
    public double RoundingFloor { get; init; }

    /// <summary>The allowed largest |ΔM|: <see cref="RelativeTolerance"/> × <see cref="PeakMoment"/>, at least <see cref="RoundingFloor"/> (force × length).</summary>
    public double AllowedMoment => Math.Max(RelativeTolerance * PeakMoment, RoundingFloor);

    /// <summary>True when <see cref="MaxMomentDeviation"/> does not exceed <see cref="AllowedMoment"/>.</summary>
    public bool Passes => MaxMomentDeviation <= AllowedMoment;

    /// <summary>The gate on one comparison, its peak over <see cref="SectionComparison.OriginalExtent"/>.</summary>
    /// <exception cref="ArgumentException">The tolerance is negative or not finite.</exception>
    public static SectionGateCase Evaluate(string name, EntryKind kind, SectionComparison comparison, double relativeTolerance)
    {
        Guard.NotNull(name);
        Guard.NotNull(comparison);
        Guard.That(double.IsFinite(relativeTolerance) && relativeTolerance >= 0,
            "The relative tolerance must be a finite number of at least 0.", nameof(relativeTolerance));
        return new SectionGateCase(name, kind, relativeTolerance, comparison.OriginalPeakMomentOverExtent, comparison.OriginalExtent,
            comparison.MaxMomentDeviation, comparison.MaxMomentDeviationAt)
        {
            RoundingFloor = Floor(comparison),
        };
    }

    // From the original alone, at the stations within its own loaded extent: a substitute load far along the axis
    // (however small) must not widen the floor the way it must not widen the peak.
    private static double Floor(SectionComparison comparison)
    {
        if (comparison.OriginalExtent is not { } extent)
        {
            return 0;
        }
        double force = 0, moment = 0, reach = 0;
        foreach (SectionStation x in comparison.Stations.Where(x => x.S >= extent.Min && x.S <= extent.Max))
        {
            force = Math.Max(force, x.Original.Force.Length);
            moment = Math.Max(moment, x.Original.Moment.Length);
            reach = Math.Max(reach, x.Original.ReferencePoint.Length);
        }
        return Reduction.WrenchAnalysis.RoundingThreshold * ((force * (reach + (extent.Max - extent.Min))) + moment);
    }

    /// <inheritdoc/>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{Name}: {(Passes ? "PASS" : "FAIL")}, largest |ΔM| {MaxMomentDeviation:R} at s = {MaxMomentDeviationAt:R}, allowed {AllowedMoment:R}");
}
