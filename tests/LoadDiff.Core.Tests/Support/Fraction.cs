using System.Numerics;

namespace LoadDiff.Core.Tests.Support;

/// <summary>
/// An exact rational p/q (BigInteger, q &gt; 0, in lowest terms) with division, for reference solutions of small
/// linear systems computed in the test (Gaussian elimination without a single rounding).
/// </summary>
public readonly struct Fraction : IEquatable<Fraction>
{
    private readonly BigInteger _num;
    private readonly BigInteger _den;

    private Fraction(BigInteger num, BigInteger den)
    {
        if (den.IsZero)
        {
            throw new DivideByZeroException();
        }
        if (den.Sign < 0)
        {
            num = -num;
            den = -den;
        }
        BigInteger g = BigInteger.GreatestCommonDivisor(num, den);
        _num = g.IsOne || g.IsZero ? num : num / g;
        _den = g.IsOne || g.IsZero ? den : den / g;
    }

    public static Fraction Zero => new(0, 1);

    public static Fraction One => new(1, 1);

    public bool IsZero => _num.IsZero;

    public static Fraction Of(long num, long den = 1) => new(num, den);

    /// <summary>The exact value of a finite double, read from its bits.</summary>
    public static Fraction FromDouble(double value)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException("Only finite doubles have an exact rational value.", nameof(value));
        }
        long bits = BitConverter.DoubleToInt64Bits(value);
        int biased = (int)((bits >> 52) & 0x7FF);
        long fraction = bits & ((1L << 52) - 1);
        var m = new BigInteger(biased == 0 ? fraction : fraction | (1L << 52));
        int e = biased == 0 ? -1074 : biased - 1075;
        if (bits < 0)
        {
            m = -m;
        }
        return e >= 0 ? new(m << e, 1) : new(m, BigInteger.One << -e);
    }

    public static Fraction operator +(Fraction a, Fraction b) => new((a.N * b.D) + (b.N * a.D), a.D * b.D);

    public static Fraction operator -(Fraction a) => new(-a.N, a.D);

    public static Fraction operator -(Fraction a, Fraction b) => a + (-b);

    public static Fraction operator *(Fraction a, Fraction b) => new(a.N * b.N, a.D * b.D);

    public static Fraction operator /(Fraction a, Fraction b) => new(a.N * b.D, a.D * b.N);

    public static bool operator ==(Fraction a, Fraction b) => a.Equals(b);

    public static bool operator !=(Fraction a, Fraction b) => !a.Equals(b);

    // default(Fraction) has a zero denominator: read it as 0/1.
    private BigInteger N => _num;

    private BigInteger D => _den.IsZero ? BigInteger.One : _den;

    public bool Equals(Fraction other) => N * other.D == other.N * D;

    public override bool Equals(object? obj) => obj is Fraction f && Equals(f);

    public override int GetHashCode() => ToDouble().GetHashCode();

    /// <summary>The nearest double, or close to it (for comparisons with a tolerance and for messages).</summary>
    public double ToDouble()
    {
        if (N.IsZero)
        {
            return 0;
        }
        // Scale the quotient to 64 significant bits before converting.
        long shift = 64 - (long)(BigInteger.Abs(N).GetBitLength() - D.GetBitLength());
        BigInteger q = shift >= 0 ? (N << (int)shift) / D : N / (D << (int)-shift);
        return Math.ScaleB((double)q, (int)-shift);
    }

    public override string ToString() => $"{N}/{D} (≈ {ToDouble().ToString("R", System.Globalization.CultureInfo.InvariantCulture)})";
}
