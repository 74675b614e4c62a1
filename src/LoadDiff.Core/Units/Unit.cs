namespace LoadDiff.Core.Units;

/// <summary>A named unit and its exact factor to the SI base unit of its quantity (NIST SP 811, Appendix B.8).</summary>
/// <param name="Symbol">The symbol as written in load files and output, for example <c>kN</c>.</param>
/// <param name="ToSi">How many SI units (N, m or kg) one of this unit is.</param>
public sealed record Unit(string Symbol, double ToSi)
{
    /// <summary>The factor that converts a value in this unit to <paramref name="target"/> (1 exactly when they are the same unit).</summary>
    public double FactorTo(Unit target)
    {
        Guard.NotNull(target);
        return ReferenceEquals(this, target) || Symbol == target.Symbol ? 1.0 : ToSi / target.ToSi;
    }

    /// <inheritdoc/>
    public override string ToString() => Symbol;
}
