using CsCheck;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

/// <summary>The double-double operations the corner moments are made of, against exact rational arithmetic.</summary>
public partial class DoubleDoubleTests
{
    [Fact]
    public void Difference_randomDoubles_hiPlusLoIsExactDifference()
    {
        Gen.Select(Spread(300), Spread(300)).SampleSeeded((a, b) =>
        {
            DoubleDouble d = DoubleDouble.Difference(a, b);
            Assert.Equal(Exact(a) - Exact(b), Exact(d));
            Assert.Equal(a - b, d.Hi);
        }, iter: 5000);
    }

    [Fact]
    public void Difference_siteCoordinateMinusAFarPoint_exact()
    {
        // 1e6 + 0.1 − (−1e12 + 0.3): the plain double difference rounds away the decimals; hi + lo keeps them all.
        double a = 1e6 + 0.1, b = -1e12 + 0.3;
        Assert.Equal(Exact(a) - Exact(b), Exact(DoubleDouble.Difference(a, b)));
        Assert.NotEqual(Exact(a) - Exact(b), Exact(a - b));
    }

    [Fact]
    public void Subtract_doubleDoubles_errorBelowTwoToMinus100OfOperands()
    {
        Gen.Select(Spread(100), Spread(100), Spread(100), Spread(100)).SampleSeeded((a1, a2, b1, b2) =>
        {
            DoubleDouble a = DoubleDouble.TwoSum(a1, a2), b = DoubleDouble.TwoSum(b1, b2);
            ExactRational exact = Exact(a) - Exact(b);
            ExactRational bound = (Exact(a).Abs() + Exact(b).Abs()) * Exact(Math.ScaleB(1, -100));
            Assert.True((Exact(DoubleDouble.Subtract(a, b)) - exact).Abs() <= bound);
            Assert.True((Exact(a - b) - exact).Abs() <= bound);
        }, iter: 3000);
    }

    [Fact]
    public void Subtract_equalDoubleDoubles_exactlyZero()
    {
        DoubleDouble a = DoubleDouble.TwoSum(1e12, 0.1);
        Assert.Equal(0, DoubleDouble.Subtract(a, a).Value);
        Assert.Equal(ExactRational.Zero, Exact(a - a));
    }

    [Fact]
    public void Multiply_doubleDoubles_errorBelowTwoToMinus100OfProduct()
    {
        Gen.Select(Spread(100), Spread(100), Spread(100), Spread(100)).SampleSeeded((a1, a2, b1, b2) =>
        {
            DoubleDouble a = DoubleDouble.TwoSum(a1, a2), b = DoubleDouble.TwoSum(b1, b2);
            ExactRational exact = Exact(a) * Exact(b);
            ExactRational bound = exact.Abs() * Exact(Math.ScaleB(1, -100));
            Assert.True((Exact(DoubleDouble.Multiply(a, b)) - exact).Abs() <= bound, $"{a} × {b}");
            Assert.True((Exact(a * b) - exact).Abs() <= bound);
        }, iter: 3000);
    }

    [Fact]
    public void Multiply_doubleDoubles_keepsTheLowParts()
    {
        // (1 + 2⁻⁶⁰)(1 + 2⁻⁷⁰) = 1 + 2⁻⁶⁰ + 2⁻⁷⁰ + 2⁻¹³⁰: the first three are exact in double-double; a product of the
        // high parts alone would give 1.
        DoubleDouble a = DoubleDouble.TwoSum(1, Math.ScaleB(1, -60)), b = DoubleDouble.TwoSum(1, Math.ScaleB(1, -70));
        ExactRational kept = Exact(1) + Exact(Math.ScaleB(1, -60)) + Exact(Math.ScaleB(1, -70));
        Assert.Equal(kept, Exact(DoubleDouble.Multiply(a, b)));
    }
}
