namespace LoadDiff.Core.Equivalence;

/// <summary>
/// The tolerance of an equivalence check: pass iff |ΔR| ≤ max(F, rel·G_F) and |ΔM_Q| ≤ max(M, rel·G_M) at every
/// corner Q of the bounding box of both systems' loaded geometry, with G_M = Σ|C| + G_F·D of the original and D the
/// diagonal of the box of the original's loaded geometry (or <see cref="Length"/>). Neither allowance falls below the
/// rounding noise of the two reductions.
/// </summary>
/// <param name="Relative">rel, a fraction of the gross magnitudes (default 1e-3: common practice, no published source).</param>
/// <param name="Force">F, an absolute force tolerance (force units); 0 when not given.</param>
/// <param name="Moment">M, an absolute moment tolerance (force × length); 0 when not given.</param>
/// <param name="Length">D stated by the user (length units), instead of the diagonal of the original's loaded box; null when not given.</param>
public sealed record ToleranceSpec(double Relative, double Force, double Moment, double? Length = null)
{
    /// <summary>The default relative tolerance, 1e-3 of the gross magnitudes (common practice, no published source).</summary>
    public const double DefaultRelative = 1e-3;

    /// <summary>rel = 1e-3, no absolute tolerances, D from the box.</summary>
    public static ToleranceSpec Default { get; } = new(DefaultRelative, 0, 0);

    /// <summary>Validates the numbers: finite and not negative.</summary>
    /// <exception cref="ArgumentException">A value is negative, NaN or infinite.</exception>
    public static ToleranceSpec Create(double relative, double force, double moment, double? length = null)
    {
        Guard.That(double.IsFinite(relative) && relative >= 0, "The relative tolerance must be a finite number ≥ 0.", nameof(relative));
        Guard.That(double.IsFinite(force) && force >= 0, "The force tolerance must be a finite number ≥ 0.", nameof(force));
        Guard.That(double.IsFinite(moment) && moment >= 0, "The moment tolerance must be a finite number ≥ 0.", nameof(moment));
        Guard.That(length is null || (double.IsFinite(length.Value) && length.Value >= 0), "The length D must be a finite number ≥ 0.", nameof(length));
        return new ToleranceSpec(relative, force, moment, length);
    }
}
