using System.Globalization;

namespace LoadDiff.Core.Tests;

/// <summary>Vector3 at its edges: the scaled length, exact cross products, closeness, hashing and the messages of its refusals.</summary>
public class Vector3EdgeTests
{
    [Fact]
    public void TryCreate_acceptsFiniteComponentsAndRefusesTheRest()
    {
        Assert.True(Vector3.TryCreate(1, -2, 3, out Vector3 v));
        Assert.Equal(Vector3.Create(1, -2, 3), v);
        Assert.False(Vector3.TryCreate(1, double.NaN, 3, out Vector3 bad));
        Assert.Equal(default, bad);
        Assert.Contains("components", Assert.Throws<ArgumentException>(() => Vector3.Create(double.PositiveInfinity, 0, 0)).Message);
    }

    [Fact]
    public void Length_ofTinyAndHugeComponents_isTheScaledPythagoreanValue()
    {
        // 3-4-12-13 (Pythagorean quadruple) scaled where the sum of squares would underflow or overflow: exact results.
        Assert.Equal(13e-300, Vector3.Create(3e-300, 4e-300, 12e-300).Length, 1e-314);
        Assert.Equal(13e200, Vector3.Create(4e200, 3e200, 12e200).Length, 1e186);
        Assert.Equal(13e-300, Vector3.Create(-12e-300, 3e-300, -4e-300).Length, 1e-314);
        Assert.Equal(5e-320, Vector3.Create(0, 0, -5e-320).Length);
    }

    [Fact]
    public void Cross_keepsTheRoundingErrorOfTheSecondProduct()
    {
        // a = (1, p, 0), b = (p, 1, 0) with p = 1 + 2⁻²⁷: (a × b)_z = 1 − p² = −(2⁻²⁶ + 2⁻⁵⁴) exactly, a double; p² itself
        // rounds to 1 + 2⁻²⁶, so a cross product that dropped (or flipped) that rounding error would give −2⁻²⁶ (∓ 2⁻⁵⁴).
        double p = 1 + Math.Pow(2, -27);
        Vector3 c = Vector3.Cross(Vector3.Create(1, p, 0), Vector3.Create(p, 1, 0));
        Assert.Equal(-(Math.Pow(2, -26) + Math.Pow(2, -54)), c.Z);
    }

    [Fact]
    public void AreClose_isAbsolutePlusRelativeToTheLargerLength()
    {
        Vector3 a = Vector3.Create(1, 0, 0);
        Assert.True(Vector3.AreClose(a, Vector3.Create(1.0009, 0, 0), 0, 1e-3));   // 9e-4 ≤ 1e-3 × 1.0009
        Assert.False(Vector3.AreClose(a, Vector3.Create(1.0011, 0, 0), 0, 1e-3));  // 1.1e-3 > 1.0011e-3
        Assert.True(Vector3.AreClose(a, Vector3.Create(1, 0.5, 0), 0.5, 0));        // exactly at the absolute bound
        Assert.False(Vector3.AreClose(a, Vector3.Create(1, 0.5, 0), 0.25, 0.2));   // 0.5 > 0.25 + 0.2 × 1.118
        Assert.False(Vector3.AreClose(a, Vector3.Create(-1, 0, 0), 1, 0));          // |a − b| = 2, not |a + b| = 0
    }

    [Fact]
    public void Equal_vectors_have_equal_hashes_and_other_vectors_other_hashes()
    {
        Assert.Equal(Vector3.Create(0, 0, 0).GetHashCode(), Vector3.Create(-0.0, -0.0, -0.0).GetHashCode());
        int h = Vector3.Create(1, 2, 3).GetHashCode();
        // one component at a time (a collision here has odds of about 2⁻³²)
        Assert.NotEqual(h, Vector3.Create(7, 2, 3).GetHashCode());
        Assert.NotEqual(h, Vector3.Create(1, 7, 3).GetHashCode());
        Assert.NotEqual(h, Vector3.Create(1, 2, 7).GetHashCode());
    }

    [Fact]
    public void Text_roundTripsByDefault_andRefusalsSayWhy()
    {
        Vector3 v = Vector3.Create(0.1, -2.5, 3e20);
        Assert.Equal("(0.1, -2.5, 3E+20)", v.ToString());
        Assert.Equal("(0.1, -2.5, 3E+20)", v.ToString(null, null));
        Assert.Equal("(0.1; -2.5; 3E+20)".Replace("0.1", "0,1").Replace("-2.5", "-2,5"), v.ToString(null, CultureInfo.GetCultureInfo("de-DE")));
        Assert.Contains("0, 1 or 2", Assert.Throws<ArgumentOutOfRangeException>(() => v[3]).Message);
        Assert.Contains("zero vector", Assert.Throws<InvalidOperationException>(() => Vector3.Zero.Normalize()).Message);
        Assert.Contains("overflowed", Assert.Throws<OverflowException>(() => Vector3.Create(1e308, 0, 0) * 10).Message);
    }
}
