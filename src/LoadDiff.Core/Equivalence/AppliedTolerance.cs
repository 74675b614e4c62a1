namespace LoadDiff.Core.Equivalence;

/// <summary>The tolerances applied to one case, every part of the rule that produced them, and which part governed.</summary>
/// <param name="Force">Allowed |ΔR| = max(F, rel·G_F, rounding noise) (force units).</param>
/// <param name="Moment">Allowed |ΔM| at any corner of the box = max(M, rel·G_M, rounding noise) (force × length).</param>
/// <param name="ForceGovernedBy">The part of the rule that set <paramref name="Force"/>.</param>
/// <param name="MomentGovernedBy">The part of the rule that set <paramref name="Moment"/>.</param>
/// <param name="GrossForce">G_F of the original (force units).</param>
/// <param name="GrossMoment">G_M = Σ|C| + G_F·D of the original (force × length).</param>
/// <param name="Diagonal">D (length units): the diagonal of the box of the original's loaded geometry, or the length stated.</param>
/// <param name="DiagonalStated">True when D was stated by the user (<c>--length</c>) instead of taken from the box.</param>
/// <param name="Noise">The rounding noise of the two reductions, the floor of both allowances.</param>
public sealed record AppliedTolerance(
    double Force, double Moment, AllowanceSource ForceGovernedBy, AllowanceSource MomentGovernedBy,
    double GrossForce, double GrossMoment, double Diagonal, bool DiagonalStated, RoundingNoise Noise)
{
    /// <summary>True when rel·G_F set the force allowance.</summary>
    public bool ForceGovernedByRelative => ForceGovernedBy == AllowanceSource.Relative;

    /// <summary>True when rel·G_M set the moment allowance.</summary>
    public bool MomentGovernedByRelative => MomentGovernedBy == AllowanceSource.Relative;

    /// <inheritdoc/>
    public override string ToString() => string.Create(System.Globalization.CultureInfo.InvariantCulture,
        $"allowed |ΔR| {Force:R} ({ForceGovernedBy}), |ΔM| {Moment:R} ({MomentGovernedBy}); G_F {GrossForce:R}, G_M {GrossMoment:R}, D {Diagonal:R}{(DiagonalStated ? " (stated)" : "")}");

    /// <summary>The larger of the three parts, and which one it was (ties go to the user's parts, absolute first).</summary>
    internal static (double Value, AllowanceSource Source) Govern(double absolute, double relative, double rounding)
    {
        if (absolute >= relative && absolute >= rounding)
        {
            return (absolute, AllowanceSource.Absolute);
        }
        return relative >= rounding ? (relative, AllowanceSource.Relative) : (rounding, AllowanceSource.Rounding);
    }
}
