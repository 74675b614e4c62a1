using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>Compares two reductions of the same case with the tolerance rule of <see cref="ToleranceSpec"/>.</summary>
public static class EquivalenceChecker
{
    /// <summary>
    /// The verdict for one case present in both files. Both reductions must be about the same reference point.
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
        ForceCoupleSystem residual = substitute.System.Subtract(original.System);
        Box? box = Box.Union(original.Bounds, substitute.Bounds);
        double diagonal = box?.Diagonal ?? 0;

        double worst = residual.Moment.Length;
        Vector3 worstAt = p;
        if (box is not null)
        {
            worst = -1;
            foreach (Vector3 q in box.Corners)
            {
                double m = residual.MoveTo(q).Moment.Length;
                if (m > worst)
                {
                    worst = m;
                    worstAt = q;
                }
            }
        }

        double gf = original.GrossForce;
        double gm = original.GrossCouple + (gf * diagonal);
        double relF = tolerance.Relative * gf, relM = tolerance.Relative * gm;
        var applied = new AppliedTolerance(
            Math.Max(tolerance.Force, relF), Math.Max(tolerance.Moment, relM), relF > tolerance.Force, relM > tolerance.Moment, gf, gm, diagonal);

        // Rounding noise of both reductions decides what counts as a zero residual for the axis, not the verdict.
        double forceScale = Math.Max(original.GrossForce, substitute.GrossForce);
        double momentScale = Math.Max(original.MomentScale(p), substitute.MomentScale(p));
        WrenchAnalysis wrench = WrenchAnalysis.Analyse(residual, forceScale, momentScale, parallel: false);
        var analysis = new ResidualAnalysis(residual, worst, worstAt, wrench);
        bool pass = analysis.ForceNorm <= applied.Force && worst <= applied.Moment;
        return new CaseComparison(name, kind, original, substitute, analysis, applied, OnlyIn.Both, pass, notes ?? []);
    }

    /// <summary>A case found in one file only: reported, and it fails.</summary>
    public static CaseComparison Missing(string name, EntryKind kind, LoadReduction? original, LoadReduction? substitute, IReadOnlyList<string>? notes = null)
    {
        Guard.That((original is null) != (substitute is null), "Exactly one reduction must be given.", nameof(original));
        return new CaseComparison(name, kind, original, substitute, null, null,
            original is null ? OnlyIn.Substitute : OnlyIn.Original, false, notes ?? []);
    }
}
