namespace LoadDiff.Core;

/// <summary>
/// A double-double number hi + lo with |lo| ≤ ulp(hi)/2, built from error-free transformations
/// (two-sum, FMA two-product). Used to accumulate resultants so that cancellation costs nothing.
/// </summary>
public readonly struct DoubleDouble : IEquatable<DoubleDouble>
{
    private readonly double _hi;
    private readonly double _lo;

    private DoubleDouble(double hi, double lo)
    {
        _hi = hi;
        _lo = lo;
    }

    /// <summary>Zero.</summary>
    public static DoubleDouble Zero => default;

    /// <summary>The leading part, the value rounded to double.</summary>
    public double Hi => _hi;

    /// <summary>The trailing correction.</summary>
    public double Lo => _lo;

    /// <summary>The value as a double (hi + lo rounded once).</summary>
    public double Value => _hi + _lo;

    /// <summary>Exact conversion from a double.</summary>
    public static DoubleDouble FromDouble(double value) => new(value, 0);

    /// <summary>The exact sum a + b as a double-double.</summary>
    public static DoubleDouble TwoSum(double a, double b)
    {
        double s = a + b;
        double bb = s - a;
        double err = (a - (s - bb)) + (b - bb);
        return new DoubleDouble(s, err);
    }

    /// <summary>The exact product a·b as a double-double (FMA).</summary>
    public static DoubleDouble TwoProduct(double a, double b)
    {
        double p = a * b;
        return new DoubleDouble(p, Math.FusedMultiplyAdd(a, b, -p));
    }

    /// <summary>Sum of a double-double and a double.</summary>
    public static DoubleDouble Add(DoubleDouble a, double b)
    {
        DoubleDouble s = TwoSum(a._hi, b);
        return QuickTwoSum(s._hi, s._lo + a._lo);
    }

    /// <summary>Sum of two double-doubles (the accurate variant).</summary>
    public static DoubleDouble Add(DoubleDouble a, DoubleDouble b)
    {
        DoubleDouble s = TwoSum(a._hi, b._hi);
        DoubleDouble t = TwoSum(a._lo, b._lo);
        DoubleDouble u = QuickTwoSum(s._hi, s._lo + t._hi);
        return QuickTwoSum(u._hi, u._lo + t._lo);
    }

    /// <summary>Product of a double-double and a double.</summary>
    public static DoubleDouble Multiply(DoubleDouble a, double b)
    {
        DoubleDouble p = TwoProduct(a._hi, b);
        return QuickTwoSum(p._hi, Math.FusedMultiplyAdd(a._lo, b, p._lo));
    }

    /// <summary>Product of two double-doubles (relative error about 2⁻¹⁰⁴).</summary>
    public static DoubleDouble Multiply(DoubleDouble a, DoubleDouble b)
    {
        DoubleDouble p = TwoProduct(a._hi, b._hi);
        double lo = Math.FusedMultiplyAdd(a._hi, b._lo, Math.FusedMultiplyAdd(a._lo, b._hi, p._lo));
        return QuickTwoSum(p._hi, lo);
    }

    /// <summary>The exact difference a − b as a double-double.</summary>
    public static DoubleDouble Difference(double a, double b) => TwoSum(a, -b);

    /// <summary>Difference of two double-doubles.</summary>
    public static DoubleDouble Subtract(DoubleDouble a, DoubleDouble b) => Add(a, Negate(b));

    /// <summary>The opposite value.</summary>
    public static DoubleDouble Negate(DoubleDouble a) => new(-a._hi, -a._lo);

    /// <summary>Sum operator.</summary>
    public static DoubleDouble operator +(DoubleDouble a, DoubleDouble b) => Add(a, b);

    /// <summary>Sum operator.</summary>
    public static DoubleDouble operator +(DoubleDouble a, double b) => Add(a, b);

    /// <summary>Product operator.</summary>
    public static DoubleDouble operator *(DoubleDouble a, double b) => Multiply(a, b);

    /// <summary>Product operator.</summary>
    public static DoubleDouble operator *(DoubleDouble a, DoubleDouble b) => Multiply(a, b);

    /// <summary>Difference operator.</summary>
    public static DoubleDouble operator -(DoubleDouble a, DoubleDouble b) => Subtract(a, b);

    /// <summary>Negation operator.</summary>
    public static DoubleDouble operator -(DoubleDouble a) => Negate(a);

    /// <summary>Exact equality of both parts.</summary>
    public static bool operator ==(DoubleDouble a, DoubleDouble b) => a.Equals(b);

    /// <summary>Exact inequality.</summary>
    public static bool operator !=(DoubleDouble a, DoubleDouble b) => !a.Equals(b);

    /// <inheritdoc/>
    public bool Equals(DoubleDouble other) => _hi == other._hi && _lo == other._lo;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => obj is DoubleDouble d && Equals(d);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(_hi, _lo);

    /// <inheritdoc/>
    public override string ToString() =>
        _hi.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + " + "
        + _lo.ToString("R", System.Globalization.CultureInfo.InvariantCulture);

    private static DoubleDouble QuickTwoSum(double a, double b)
    {
        double s = a + b;
        return new DoubleDouble(s, b - (s - a));
    }
}
