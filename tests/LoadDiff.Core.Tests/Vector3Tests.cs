using System.Globalization;
using CsCheck;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public class Vector3Tests
{
    private static readonly Gen<double> AnyFinite = Gen.Long.Select(BitConverter.Int64BitsToDouble).Where(double.IsFinite);

    [Fact]
    public void Equals_contract_holds()
    {
        EqualityContract.Check(Vector3.Create(1, -2.5, 3e20), Vector3.Create(1, -2.5, 3e20), Vector3.Create(1, -2.5, 3.0000000000000004e20),
            (a, b) => a == b, (a, b) => a != b);
    }

    [Fact]
    public void Equals_zeroOfEitherSign_equalWithSameHash()
    {
        EqualityContract.Check(Vector3.Create(0, 0, 0), Vector3.Create(-0.0, -0.0, -0.0), Vector3.Create(0, 0, double.Epsilon),
            (a, b) => a == b, (a, b) => a != b);
    }

    [Theory]
    [InlineData(double.NaN, 0, 0)]
    [InlineData(0, double.PositiveInfinity, 0)]
    [InlineData(0, 0, double.NegativeInfinity)]
    public void Create_nonFiniteComponent_throwsArgumentException(double x, double y, double z)
    {
        Assert.Throws<ArgumentException>(() => Vector3.Create(x, y, z));
        Assert.False(Vector3.TryCreate(x, y, z, out _));
    }

    [Fact]
    public void Multiply_overflow_throwsInsteadOfInfinity()
    {
        Vector3 big = Vector3.Create(1e308, 0, 0);
        Assert.Throws<OverflowException>(() => big * 10);
        Assert.Throws<OverflowException>(() => big + big);
    }

    [Fact]
    public void Cross_unitVectors_rightHanded()
    {
        Assert.Equal(Vector3.UnitZ, Vector3.Cross(Vector3.UnitX, Vector3.UnitY));
        Assert.Equal(Vector3.UnitX, Vector3.Cross(Vector3.UnitY, Vector3.UnitZ));
        Assert.Equal(Vector3.UnitY, Vector3.Cross(Vector3.UnitZ, Vector3.UnitX));
    }

    [Fact]
    public void Cross_integerComponents_matchesExactDeterminant()
    {
        // Products of integers below 2^26 are exact in doubles, so the hand values are exact.
        Vector3 a = Vector3.Create(3, -7, 11), b = Vector3.Create(-2, 5, 13);
        Assert.Equal(Vector3.Create((-7 * 13) - (11 * 5), (11 * -2) - (3 * 13), (3 * 5) - (-7 * -2)), Vector3.Cross(a, b));
    }

    [Fact]
    public void Length_hugeComponents_noOverflow()
    {
        Vector3 v = Vector3.Create(3e200, 4e200, 0);
        Close.Relative(5e200, v.Length, 1e-15);
    }

    [Fact]
    public void ToString_anyCulture_invariantRoundTrippingText()
    {
        Vector3 v = Vector3.Create(1, -2.5, 3e20);
        Assert.Equal("(1, -2.5, 3E+20)", v.ToString());
        using (new CultureScope("de-DE"))
        {
            Assert.Equal("(1, -2.5, 3E+20)", v.ToString());
            Assert.Equal($"{v}", v.ToString());
        }
    }

    [Fact]
    public void ToString_germanFormatProvider_usesCommaDecimalAndSemicolonSeparator()
    {
        Vector3 v = Vector3.Create(1.5, -2, 0.125);
        string text = v.ToString("R", CultureInfo.GetCultureInfo("de-DE"));
        Assert.Equal("(1,5; -2; 0,125)", text);
        Assert.Equal(v, Parse(text, "; ", CultureInfo.GetCultureInfo("de-DE")));
    }

    [Fact]
    public void ToString_randomDoubles_roundTripsBitForBit()
    {
        Gen.Select(AnyFinite, AnyFinite, AnyFinite).SampleSeeded((x, y, z) =>
        {
            Vector3 v = Vector3.Create(x, y, z);
            Vector3 back = Parse(v.ToString(), ", ", CultureInfo.InvariantCulture);
            Assert.Equal(BitConverter.DoubleToInt64Bits(x), BitConverter.DoubleToInt64Bits(back.X));
            Assert.Equal(BitConverter.DoubleToInt64Bits(y), BitConverter.DoubleToInt64Bits(back.Y));
            Assert.Equal(BitConverter.DoubleToInt64Bits(z), BitConverter.DoubleToInt64Bits(back.Z));
        }, iter: 2000);
    }

    [Fact]
    public void ToString_extremeValuesUnderGermanCulture_roundTrip()
    {
        using var scope = new CultureScope("de-DE");
        foreach (double d in new[] { double.Epsilon, double.MaxValue, -double.MaxValue, 0.1, -0.0, 1e-310, 123456789.125 })
        {
            Vector3 v = Vector3.Create(d, -d, d / 3);
            Vector3 back = Parse(v.ToString(), ", ", CultureInfo.InvariantCulture);
            Assert.Equal(BitConverter.DoubleToInt64Bits(v.X), BitConverter.DoubleToInt64Bits(back.X));
            Assert.Equal(BitConverter.DoubleToInt64Bits(v.Y), BitConverter.DoubleToInt64Bits(back.Y));
            Assert.Equal(BitConverter.DoubleToInt64Bits(v.Z), BitConverter.DoubleToInt64Bits(back.Z));
        }
    }

    [Fact]
    public void Normalize_zeroVector_throwsInvalidOperation()
    {
        Assert.Throws<InvalidOperationException>(() => Vector3.Zero.Normalize());
    }

    [Fact]
    public void Indexer_outOfRange_throws()
    {
        Vector3 v = Vector3.Create(1, 2, 3);
        Assert.Equal(3, v[2]);
        Assert.Throws<ArgumentOutOfRangeException>(() => v[3]);
    }

    private static Vector3 Parse(string text, string separator, IFormatProvider provider)
    {
        Assert.StartsWith("(", text);
        Assert.EndsWith(")", text);
        string[] parts = text[1..^1].Split(separator);
        Assert.Equal(3, parts.Length);
        return Vector3.Create(
            double.Parse(parts[0], NumberStyles.Float, provider),
            double.Parse(parts[1], NumberStyles.Float, provider),
            double.Parse(parts[2], NumberStyles.Float, provider));
    }
}
