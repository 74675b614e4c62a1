using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>How a residual is read (SPEC §4, "Explaining the residual").</summary>
public enum ResidualReading
{
    /// <summary>No residual beyond the rounding noise of the two reductions.</summary>
    None,

    /// <summary>|ΔR| within its allowance, the original has a resultant: ΔM read as that resultant's line shifted.</summary>
    MisplacedResultant,

    /// <summary>|ΔR| within its allowance and the original's resultant is zero: a couple.</summary>
    Couple,

    /// <summary>|ΔR| beyond its allowance: a missing force along the residual's central axis (plus a couple about it).</summary>
    MissingForce,

    /// <summary>As <see cref="MissingForce"/>, but the axis lies farther from the box than its diagonal: force and couple at the box centre.</summary>
    MissingForceAtCentre,
}

/// <summary>
/// What the substitute lacks or has too much of, read against the tolerance. Vectors are what the substitute lacks
/// (original − substitute), so adding them to the substitute removes the residual.
/// </summary>
/// <param name="Reading">How the residual is read.</param>
/// <param name="Force">The missing force −ΔR (force units).</param>
/// <param name="Couple">The missing couple about <paramref name="Point"/>: the part not explained by the shift or the axis (force × length).</param>
/// <param name="Point">Where <paramref name="Couple"/> is stated: a point of the original's resultant line, of the residual's axis, or the box centre.</param>
/// <param name="Shift">For <see cref="ResidualReading.MisplacedResultant"/>: s = R × ΔM / |R|², how far the substitute's resultant line lies from the original's (length units).</param>
/// <param name="AxisDirection">For a missing force: the direction of its line; for a misplaced resultant: the direction of R.</param>
/// <param name="AxisDistance">For a missing force: how far its line passes from the box centre (length units).</param>
/// <param name="Suspects">Items that account for the residual within the tolerance (failing cases only).</param>
/// <param name="SearchBounded">True when not every item could be searched (large files: only the largest items are kept).</param>
public sealed record ResidualExplanation(
    ResidualReading Reading, Vector3 Force, Vector3 Couple, Vector3 Point, Vector3? Shift, Vector3? AxisDirection, double? AxisDistance,
    IReadOnlyList<SuspectItem> Suspects, bool SearchBounded)
{
    /// <inheritdoc/>
    public override string ToString() => $"{Reading}: missing force {Force}, couple {Couple} at {Point}; {Suspects.Count} suspect(s)";

    /// <summary>Reads the residual of a comparison of two present cases; <paramref name="candidates"/> are searched for suspects.</summary>
    public static ResidualExplanation For(CaseComparison c, IReadOnlyList<ResidualSuspects.Candidate> candidates, bool searchBounded)
    {
        Guard.NotNull(c);
        Guard.NotNull(candidates);
        ResidualAnalysis res = c.Residual ?? throw new ArgumentException("The comparison has no residual.", nameof(c));
        AppliedTolerance tol = c.Tolerance!;
        LoadReduction o = c.Original!, s = c.Substitute!;
        RoundingNoise noise = tol.Noise;
        Box? box = Box.Union(o.Bounds, s.Bounds);
        Vector3 centre = box?.Centre ?? c.Original!.ReferencePoint;
        double diagonal = box?.Diagonal ?? 0;
        IReadOnlyList<SuspectItem> suspects = ResidualSuspects.Find(res, tol, box, o.ReferencePoint, candidates);

        if (res.ForceNorm <= noise.Force && res.WorstMomentNorm <= noise.Moment)
        {
            return new ResidualExplanation(ResidualReading.None, Vector3.Zero, Vector3.Zero, centre, null, null, null, suspects, searchBounded);
        }
        if (res.ForceNorm <= tol.Force)
        {
            Vector3 r = o.Force;
            if (r.Length <= noise.Force)
            {
                ForceCoupleSystem atCentre = res.AtBoxCentre;
                return new ResidualExplanation(ResidualReading.Couple, -atCentre.Force, -atCentre.Moment, centre, null, null, null, suspects, searchBounded);
            }
            // ΔM about the point of the original's resultant line nearest the box centre: the substitute's line lies at s
            // from it with ΔM⊥ = s × R, so s = R × ΔM / |R|²; the part of ΔM along R is a couple no shift can make.
            // Through the unit direction u = R/|R|, not |R|², which underflows to 0 for a tiny but nonzero R.
            ForceCoupleSystem originalAtCentre = o.Sums.At(centre);
            double rn = r.Length;
            Vector3 u = r / rn;
            Vector3 onLine = centre + (Vector3.Cross(u, originalAtCentre.Moment) / rn);
            ForceCoupleSystem d = ResultantSums.Difference(o.Sums, s.Sums, onLine);
            Vector3 shift = Vector3.Cross(u, d.Moment) / rn;
            Vector3 along = u * Vector3.Dot(u, d.Moment);
            return new ResidualExplanation(ResidualReading.MisplacedResultant, -d.Force, -along, onLine, shift, u, null, suspects, searchBounded);
        }
        WrenchAnalysis w = res.Wrench;
        if (w.AxisPoint is { } axisPoint && w.AxisDirection is { } direction)
        {
            double distance = (axisPoint - centre).Length;
            if (distance - (diagonal / 2) <= diagonal)
            {
                return new ResidualExplanation(ResidualReading.MissingForce, -res.AtBoxCentre.Force, -w.MinimumCouple, axisPoint, null, -direction, distance, suspects, searchBounded);
            }
            return new ResidualExplanation(ResidualReading.MissingForceAtCentre, -res.AtBoxCentre.Force, -res.AtBoxCentre.Moment, centre, null, -direction, distance, suspects, searchBounded);
        }
        return new ResidualExplanation(ResidualReading.MissingForceAtCentre, -res.AtBoxCentre.Force, -res.AtBoxCentre.Moment, centre, null, null, null, suspects, searchBounded);
    }
}
