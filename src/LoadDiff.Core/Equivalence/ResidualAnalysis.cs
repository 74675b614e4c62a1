using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>The residual, substitute − original, and where it acts.</summary>
/// <param name="System">ΔR and ΔM about the reference point (formed from both systems' sums, rounded once).</param>
/// <param name="WorstMomentNorm">The largest |ΔM_Q| over the corners Q of the box of both systems' loaded geometry (force × length).</param>
/// <param name="WorstCorner">The corner where it occurs (the reference point when there is no geometry).</param>
/// <param name="Wrench">The residual's own wrench, analysed about <see cref="AtBoxCentre"/>'s point.</param>
/// <param name="AtBoxCentre">ΔR and ΔM about the centre of the box (the reference point when there is no geometry).</param>
public sealed record ResidualAnalysis(ForceCoupleSystem System, double WorstMomentNorm, Vector3 WorstCorner, WrenchAnalysis Wrench, ForceCoupleSystem AtBoxCentre)
{
    /// <inheritdoc/>
    public override string ToString() => string.Create(global::System.Globalization.CultureInfo.InvariantCulture,
        $"residual {System}; worst |ΔM| {WorstMomentNorm:R} at {WorstCorner}");

    /// <summary>|ΔR|.</summary>
    public double ForceNorm => System.Force.Length;

    /// <summary>|ΔM| about the reference point.</summary>
    public double MomentNorm => System.Moment.Length;
}
