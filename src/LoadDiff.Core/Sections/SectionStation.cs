using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Sections;

/// <summary>The cut-side systems of both load sets at one station, each about the cut point.</summary>
/// <param name="S">Station (length units along the axis from its origin).</param>
/// <param name="Original">Cut-side force V and moment M of the original.</param>
/// <param name="Substitute">Cut-side force V and moment M of the substitute.</param>
public sealed record SectionStation(double S, ForceCoupleSystem Original, ForceCoupleSystem Substitute)
{
    /// <summary>|V_substitute − V_original| (force units).</summary>
    public double ForceDeviation => (Substitute.Force - Original.Force).Length;

    /// <summary>|M_substitute − M_original| about the cut point (force × length).</summary>
    public double MomentDeviation => (Substitute.Moment - Original.Moment).Length;
}
