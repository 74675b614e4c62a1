using System.Numerics;

namespace LoadDiff.Core.Tests.Support;

/// <summary>
/// An exact dyadic rational m·2^e (BigInteger m). Every finite double is one, and the set is closed under
/// +, − and ×, which is all the reference computations need; nothing is ever rounded.
/// </summary>
public readonly struct ExactRational : IComparable<ExactRational>
{
    private readonly BigInteger _mantissa;
    private readonly int _exponent;

    private ExactRational(BigInteger mantissa, int exponent)
    {
        _mantissa = mantissa;
        _exponent = mantissa.IsZero ? 0 : exponent;
    }

    public static ExactRational Zero => default;

    public int Sign => _mantissa.Sign;

    /// <summary>The exact value of a finite double, read from its bits.</summary>
    public static ExactRational FromDouble(double value)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException("Only finite doubles have an exact rational value.", nameof(value));
        }
        long bits = BitConverter.DoubleToInt64Bits(value);
        bool negative = bits < 0;
        int biased = (int)((bits >> 52) & 0x7FF);
        long fraction = bits & ((1L << 52) - 1);
        long mantissa = biased == 0 ? fraction : fraction | (1L << 52);
        int exponent = biased == 0 ? -1074 : biased - 1075;
        var m = new BigInteger(mantissa);
        return new ExactRational(negative ? -m : m, exponent);
    }

    public static ExactRational operator +(ExactRational a, ExactRational b)
    {
        if (a._mantissa.IsZero)
        {
            return b;
        }
        if (b._mantissa.IsZero)
        {
            return a;
        }
        int e = Math.Min(a._exponent, b._exponent);
        return new ExactRational((a._mantissa << (a._exponent - e)) + (b._mantissa << (b._exponent - e)), e);
    }

    public static ExactRational operator -(ExactRational a) => new(-a._mantissa, a._exponent);

    public static ExactRational operator -(ExactRational a, ExactRational b) => a + (-b);

    public static ExactRational operator *(ExactRational a, ExactRational b) =>
        new(a._mantissa * b._mantissa, a._exponent + b._exponent);

    public static bool operator ==(ExactRational a, ExactRational b) => a.CompareTo(b) == 0;

    public static bool operator !=(ExactRational a, ExactRational b) => a.CompareTo(b) != 0;

    public static bool operator <(ExactRational a, ExactRational b) => a.CompareTo(b) < 0;

    public static bool operator >(ExactRational a, ExactRational b) => a.CompareTo(b) > 0;

    public static bool operator <=(ExactRational a, ExactRational b) => a.CompareTo(b) <= 0;

    public static bool operator >=(ExactRational a, ExactRational b) => a.CompareTo(b) >= 0;

    public ExactRational Abs() => new(BigInteger.Abs(_mantissa), _exponent);

    public int CompareTo(ExactRational other) => (this - other).Sign;

    public override bool Equals(object? obj) => obj is ExactRational r && CompareTo(r) == 0;

    public override int GetHashCode() => ToDouble().GetHashCode();

    /// <summary>An approximation for messages only (never used in a comparison).</summary>
    public double ToDouble()
    {
        if (_mantissa.IsZero)
        {
            return 0;
        }
        long bits = (long)BigInteger.Abs(_mantissa).GetBitLength();
        int drop = (int)Math.Max(0, bits - 62);
        double m = (double)(_mantissa >> drop);
        return Math.ScaleB(m, _exponent + drop);
    }

    public override string ToString() => ToDouble().ToString("R", System.Globalization.CultureInfo.InvariantCulture);
}
