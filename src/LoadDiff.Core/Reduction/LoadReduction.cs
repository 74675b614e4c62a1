namespace LoadDiff.Core.Reduction;

/// <summary>The reduction of one load case or combination to a force-couple system, with its gross magnitudes.</summary>
/// <param name="System">Resultant force and moment about the reference point.</param>
/// <param name="GrossForce">G_F = Σ|F_i| (∫|w| for distributed loads), force units.</param>
/// <param name="GrossCouple">Σ|C_j| of free couples, force × length.</param>
/// <param name="Centroid">Load centroid Σ|F_i| r_i / Σ|F_i|; null when there are no forces.</param>
/// <param name="Bounds">Bounding box of the loaded geometry (items whose gross magnitude is not zero); null when there is
/// none (couples only, zero loads only, or empty).</param>
/// <param name="AllForcesParallel">True when every force has the same line direction (a parallel system).</param>
/// <param name="ItemCount">Number of items reduced.</param>
public sealed record LoadReduction(
    ForceCoupleSystem System, double GrossForce, double GrossCouple, Vector3? Centroid, Box? Bounds,
    bool AllForcesParallel, long ItemCount)
{
    private readonly ResultantSums? _sums;

    /// <summary>
    /// The accumulated double-double sums behind <see cref="System"/> (about the accumulator's anchor); for a reduction
    /// made by hand, the system's own doubles. Verdicts compare moments from these, never from a moved <see cref="System"/>.
    /// </summary>
    public ResultantSums Sums
    {
        get => _sums ?? ResultantSums.From(System);
        init => _sums = value;
    }

    /// <summary>The reference point of <see cref="System"/>.</summary>
    public Vector3 ReferencePoint => System.ReferencePoint;

    /// <summary>Resultant force R.</summary>
    public Vector3 Force => System.Force;

    /// <summary>Resultant moment about the reference point.</summary>
    public Vector3 Moment => System.Moment;

    /// <summary>Gross moment G_M = Σ|C_j| + G_F·D, with D the diagonal of the bounding box.</summary>
    public double GrossMoment => GrossCouple + (GrossForce * (Bounds?.Diagonal ?? 0));

    /// <summary>The same reduction about another point.</summary>
    public LoadReduction At(Vector3 point) => this with { System = System.MoveTo(point) };

    /// <summary>The wrench analysis of this reduction, with rounding thresholds scaled to its gross magnitudes.</summary>
    public WrenchAnalysis Wrench() => WrenchAnalysis.Analyse(System, GrossForce, MomentScale(ReferencePoint), AllForcesParallel);

    /// <summary>
    /// The size of moment that rounding could produce about <paramref name="point"/>: Σ|C| plus G_F times the
    /// largest distance from the point to the geometry.
    /// </summary>
    public double MomentScale(Vector3 point)
    {
        double reach = 0;
        if (Bounds is { } b)
        {
            foreach (Vector3 c in b.Corners)
            {
                reach = Math.Max(reach, (c - point).Length);
            }
        }
        return GrossCouple + (GrossForce * reach);
    }

    /// <summary>The size of coordinates involved: the largest distance of the geometry's box corners and the reference point from the origin, or the box diagonal.</summary>
    public double LengthScale
    {
        get
        {
            double s = ReferencePoint.Length;
            if (Bounds is { } b)
            {
                s = Math.Max(s, Math.Max(b.Diagonal, Math.Max(b.Min.Length, b.Max.Length)));
            }
            return s;
        }
    }

    /// <inheritdoc/>
    public override string ToString() => $"{System} ({ItemCount} items)";
}
