using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>Compares two reductions of the same case with the tolerance rule of <see cref="ToleranceSpec"/>.</summary>
public static class EquivalenceChecker
{
    /// <summary>
    /// The verdict for one case present in both files. Both reductions must be about the same reference point, which
    /// only sets where the residual is stated: the verdict compares the moments at the corners of the box of both
    /// systems' loaded geometry, each formed from its system's own double-double sums, so it does not depend on the point.
    /// The gross magnitudes are the original's: the detailed load set is the reference.
    /// </summary>
    /// <exception cref="ArgumentException">The reductions are about different points.</exception>
    public static CaseComparison Compare(
        string name, EntryKind kind, LoadReduction original, LoadReduction substitute, ToleranceSpec tolerance, IReadOnlyList<string>? notes = null)
    {
        Guard.NotNull(original);
        Guard.NotNull(substitute);
        Guard.NotNull(tolerance);
        Guard.That(original.ReferencePoint == substitute.ReferencePoint, "Both reductions must be about the same point.", nameof(substitute));
        Vector3 p = original.ReferencePoint;
        ResultantSums a = original.Sums, b = substitute.Sums;
        Box? box = Box.Union(original.Bounds, substitute.Bounds);

        ForceCoupleSystem residual = ResultantSums.Difference(a, b, p);
        double worst = residual.Moment.Length;
        Vector3 worstAt = p;
        if (box is not null)
        {
            worst = -1;
            foreach (Vector3 q in box.Corners)
            {
                double m = ResultantSums.Difference(a, b, q).Moment.Length;
                if (m > worst)
                {
                    worst = m;
                    worstAt = q;
                }
            }
        }

        RoundingNoise noise = RoundingNoise.Of(original, substitute);
        double diagonal = tolerance.Length ?? original.Bounds?.Diagonal ?? 0;
        double gf = original.GrossForce;
        double gm = original.GrossCouple + (gf * diagonal);
        (double allowF, AllowanceSource byF) = AppliedTolerance.Govern(tolerance.Force, tolerance.Relative * gf, noise.Force);
        (double allowM, AllowanceSource byM) = AppliedTolerance.Govern(tolerance.Moment, tolerance.Relative * gm, noise.Moment);
        if (!double.IsFinite(allowF) || !double.IsFinite(allowM))
        {
            // An infinite allowance would pass any substitute: the check cannot be made in these units.
            throw new OverflowException($"the tolerance of '{name}' overflowed the range of double (G_F = {Text(gf)}, G_M = Σ|C| + G_F·D = {Text(gm)})");
        }
        var applied = new AppliedTolerance(allowF, allowM, byF, byM, gf, gm, diagonal, tolerance.Length is not null, noise);

        // The residual's own wrench is analysed about the box centre, near the loads, whatever the reference point.
        Vector3 centre = box?.Centre ?? p;
        ForceCoupleSystem atCentre = ResultantSums.Difference(a, b, centre);
        WrenchAnalysis wrench = WrenchAnalysis.Analyse(atCentre, noise.Force / WrenchAnalysis.RoundingThreshold, noise.Moment / WrenchAnalysis.RoundingThreshold, parallel: false);
        var analysis = new ResidualAnalysis(residual, worst, worstAt, wrench, atCentre);
        bool pass = analysis.ForceNorm <= applied.Force && worst <= applied.Moment;
        return new CaseComparison(name, kind, original, substitute, analysis, applied, OnlyIn.Both, pass, notes ?? []);
    }

    private static string Text(double x) => x.ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    /// <summary>A case found in one file only: reported, and it fails.</summary>
    public static CaseComparison Missing(string name, EntryKind kind, LoadReduction? original, LoadReduction? substitute, IReadOnlyList<string>? notes = null)
    {
        Guard.That((original is null) != (substitute is null), "Exactly one reduction must be given.", nameof(original));
        return new CaseComparison(name, kind, original, substitute, null, null,
            original is null ? OnlyIn.Substitute : OnlyIn.Original, false, notes ?? []);
    }
}
