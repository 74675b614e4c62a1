using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>
/// What rounding alone can produce in a comparison of two reductions (unit conversion of the inputs, moving the point):
/// <see cref="WrenchAnalysis.RoundingThreshold"/> times the gross force, and times the gross moment about the box of both
/// systems' loaded geometry including the size of its coordinates. This is not an engineering tolerance: it is the floor
/// below which a residual means nothing, the one definition every renderer asks for when it prints a residual as zero.
/// </summary>
/// <param name="Force">Force noise (force units).</param>
/// <param name="Moment">Moment noise at any point of the box (force × length); it does not depend on the reference point.</param>
public sealed record RoundingNoise(double Force, double Moment)
{
    /// <summary>No noise (nothing to compare).</summary>
    public static RoundingNoise None { get; } = new(0, 0);

    /// <summary>The noise of comparing <paramref name="a"/> with <paramref name="b"/> over the box of both.</summary>
    public static RoundingNoise Of(LoadReduction a, LoadReduction b)
    {
        Guard.NotNull(a);
        Guard.NotNull(b);
        Box? box = Box.Union(a.Bounds, b.Bounds);
        double reach = 0;
        if (box is not null)
        {
            // coordinates are rounded relative to their size from the origin; corners lie within a diagonal of the loads
            reach = box.Diagonal + Math.Max(box.Min.Length, box.Max.Length);
        }
        double force = Math.Max(a.GrossForce, b.GrossForce);
        double moment = Math.Max(a.GrossCouple + (a.GrossForce * reach), b.GrossCouple + (b.GrossForce * reach));
        return new RoundingNoise(WrenchAnalysis.RoundingThreshold * force, WrenchAnalysis.RoundingThreshold * moment);
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
