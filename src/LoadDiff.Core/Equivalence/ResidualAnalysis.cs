using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>The residual, substitute − original, and where it acts.</summary>
/// <param name="System">ΔR and ΔM about the reference point.</param>
/// <param name="WorstMomentNorm">The largest |ΔM_Q| over the corners Q of the box (force × length).</param>
/// <param name="WorstCorner">The corner where it occurs (the reference point when there is no geometry).</param>
/// <param name="Wrench">The residual's own wrench: its central axis is where the missing force acts.</param>
public sealed record ResidualAnalysis(ForceCoupleSystem System, double WorstMomentNorm, Vector3 WorstCorner, WrenchAnalysis Wrench)
{
    /// <summary>|ΔR|.</summary>
    public double ForceNorm => System.Force.Length;

    /// <summary>|ΔM| about the reference point.</summary>
    public double MomentNorm => System.Moment.Length;
}
