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
    /// <summary>The allowed largest |ΔM|: <see cref="RelativeTolerance"/> × <see cref="PeakMoment"/> (force × length).</summary>
    public double AllowedMoment => RelativeTolerance * PeakMoment;

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
            comparison.MaxMomentDeviation, comparison.MaxMomentDeviationAt);
    }

    /// <inheritdoc/>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"{Name}: {(Passes ? "PASS" : "FAIL")}, largest |ΔM| {MaxMomentDeviation:R} at s = {MaxMomentDeviationAt:R}, allowed {AllowedMoment:R}");
}
