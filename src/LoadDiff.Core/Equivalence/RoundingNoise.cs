using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>
/// What rounding alone can produce in a comparison of two reductions (unit conversion of the inputs, moving the point):
/// <see cref="WrenchAnalysis.RoundingThreshold"/> times the gross force, and times Σ|C| + G_F·(D + the size of the
/// coordinates) of a system's own loaded box — the smaller of the two systems' values, so that neither file can widen it
/// (a tiny load far away, or a huge self-cancelling pair, in either file leaves the floor where the other puts it) and
/// the order of the files does not matter. This is not an engineering tolerance: it is the floor below which a residual
/// means nothing, the one definition every renderer asks for when it prints a residual as zero.
/// </summary>
public sealed record RoundingNoise(double Force, double Moment)
{
    /// <summary>No noise (nothing to compare).</summary>
    public static RoundingNoise None { get; } = new(0, 0);

    /// <summary>The noise of comparing <paramref name="a"/> with <paramref name="b"/>: the smaller of the two systems' own noise.</summary>
    public static RoundingNoise Of(LoadReduction a, LoadReduction b)
    {
        Guard.NotNull(a);
        Guard.NotNull(b);
        double force = Math.Min(a.GrossForce, b.GrossForce);
        double moment = Math.Min(MomentScale(a), MomentScale(b));
        return new RoundingNoise(WrenchAnalysis.RoundingThreshold * force, WrenchAnalysis.RoundingThreshold * moment);
    }

    // Σ|C| + G_F·(D + |farthest corner from the origin|) of the system's own loaded box: coordinates are rounded relative to
    // their size from the origin, and every point of the box lies within a diagonal of the loads.
    private static double MomentScale(LoadReduction r)
    {
        double reach = r.Bounds is { } box ? box.Diagonal + Math.Max(box.Min.Length, box.Max.Length) : 0;
        return r.GrossCouple + (r.GrossForce * reach);
    }

    /// <summary>The noise of one reduction's own numbers about its reference point (for printing R and M of one system).</summary>
    public static RoundingNoise Of(LoadReduction r)
    {
        Guard.NotNull(r);
        return new RoundingNoise(
            WrenchAnalysis.RoundingThreshold * r.GrossForce,
            WrenchAnalysis.RoundingThreshold * Math.Max(r.MomentScale(r.ReferencePoint), r.GrossForce * r.LengthScale));
    }

    /// <summary>The moment noise about a point outside the box: the moment noise plus the force noise times the distance.</summary>
    public double MomentAt(double distance) => Moment + (Force * distance);

    /// <summary>True when |<paramref name="force"/>| is within the force noise.</summary>
    public bool IsForceNoise(double force) => Math.Abs(force) <= Force;

    /// <inheritdoc/>
    public override string ToString() => string.Create(System.Globalization.CultureInfo.InvariantCulture, $"noise: force {Force:R}, moment {Moment:R}");
}
