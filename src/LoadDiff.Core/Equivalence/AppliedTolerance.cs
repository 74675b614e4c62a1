namespace LoadDiff.Core.Equivalence;

/// <summary>The tolerances applied to one case, and which part of the rule governed each.</summary>
/// <param name="Force">Allowed |ΔR| (force units).</param>
/// <param name="Moment">Allowed |ΔM| at any corner of the box (force × length).</param>
/// <param name="ForceGovernedByRelative">True when rel·G_F exceeded the absolute force tolerance.</param>
/// <param name="MomentGovernedByRelative">True when rel·G_M exceeded the absolute moment tolerance.</param>
/// <param name="GrossForce">G_F of the original (force units).</param>
/// <param name="GrossMoment">G_M = Σ|C| + G_F·D of the original, with D the diagonal of the box of both systems.</param>
/// <param name="Diagonal">D, the diagonal of that box (length units).</param>
public sealed record AppliedTolerance(
    double Force, double Moment, bool ForceGovernedByRelative, bool MomentGovernedByRelative,
    double GrossForce, double GrossMoment, double Diagonal);
