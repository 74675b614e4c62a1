using CsCheck;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public partial class DoubleDoubleTests
{
    // Doubles spread over many binades, both signs, so that neither the sum nor the product overflows or underflows.
    private static Gen<double> Spread(int maxExponent) =>
        Gen.Select(Gen.Double[1, 2], Gen.Int[-maxExponent, maxExponent], Gen.Bool,
            (m, e, negative) => (negative ? -1 : 1) * Math.ScaleB(m, e));

    private static ExactRational Exact(DoubleDouble d) => ExactRational.FromDouble(d.Hi) + ExactRational.FromDouble(d.Lo);

    private static ExactRational Exact(double d) => ExactRational.FromDouble(d);

    [Fact]
    public void TwoSum_randomDoubles_hiPlusLoIsExactSum()
    {
        Gen.Select(Spread(300), Spread(300)).SampleSeeded((a, b) =>
        {
            DoubleDouble s = DoubleDouble.TwoSum(a, b);
            Assert.Equal(Exact(a) + Exact(b), Exact(s));
            Assert.Equal(a + b, s.Hi);
        }, iter: 5000);
    }

    [Fact]
    public void TwoSum_nearlyCancellingDoubles_hiPlusLoIsExactSum()
    {
        Gen.Select(Spread(60), Gen.Int[1, 60]).SampleSeeded((a, k) =>
        {
            double b = -a * (1 + Math.ScaleB(1, -k));
            Assert.Equal(Exact(a) + Exact(b), Exact(DoubleDouble.TwoSum(a, b)));
        }, iter: 2000);
    }

    [Fact]
    public void TwoProduct_randomDoubles_hiPlusLoIsExactProduct()
    {
        Gen.Select(Spread(400), Spread(400)).SampleSeeded((a, b) =>
        {
            DoubleDouble p = DoubleDouble.TwoProduct(a, b);
            Assert.Equal(Exact(a) * Exact(b), Exact(p));
            Assert.Equal(a * b, p.Hi);
        }, iter: 5000);
    }

    [Fact]
    public void Add_doubleDoubles_errorBelowTwoToMinus100OfOperands()
    {
        Gen.Select(Spread(100), Spread(100), Spread(100), Spread(100)).SampleSeeded((a1, a2, b1, b2) =>
        {
            DoubleDouble a = DoubleDouble.TwoSum(a1, a2), b = DoubleDouble.TwoSum(b1, b2);
            ExactRational exact = Exact(a) + Exact(b);
            ExactRational error = (Exact(a + b) - exact).Abs();
            ExactRational bound = (Exact(a).Abs() + Exact(b).Abs()) * Exact(Math.ScaleB(1, -100));
            Assert.True(error <= bound, $"error {error} above {bound}");
        }, iter: 3000);
    }

    [Fact]
    public void Multiply_byDouble_errorBelowTwoToMinus100OfProduct()
    {
        Gen.Select(Spread(100), Spread(100), Spread(100)).SampleSeeded((a1, a2, b) =>
        {
            DoubleDouble a = DoubleDouble.TwoSum(a1, a2);
            ExactRational exact = Exact(a) * Exact(b);
            ExactRational error = (Exact(a * b) - exact).Abs();
            Assert.True(error <= exact.Abs() * Exact(Math.ScaleB(1, -100)), $"error {error} of {exact}");
        }, iter: 3000);
    }

    [Fact]
    public void Add_oneThenManyTinyThenMinusOne_keepsTheTinyPart()
    {
        // 2^-60 is far below half an ulp of 1, so plain doubles lose all of it; the exact answer is 1000·2^-60.
        DoubleDouble s = DoubleDouble.FromDouble(1);
        for (int i = 0; i < 1000; i++)
        {
            s += Math.ScaleB(1, -60);
        }
        s += -1.0;
        Assert.Equal(1000 * Math.ScaleB(1, -60), s.Value);
    }

    [Fact]
    public void Equals_contract_holds()
    {
        EqualityContract.Check(DoubleDouble.TwoSum(1, 1e-20), DoubleDouble.TwoSum(1e-20, 1), DoubleDouble.TwoSum(1, 2e-20),
            (a, b) => a == b, (a, b) => a != b);
        EqualityContract.Check(DoubleDouble.FromDouble(0), DoubleDouble.FromDouble(-0.0), DoubleDouble.FromDouble(double.Epsilon),
            (a, b) => a == b, (a, b) => a != b);
    }

    [Fact]
    public void ToString_germanCulture_invariant()
    {
        DoubleDouble d = DoubleDouble.TwoSum(1.5, Math.ScaleB(1, -60));
        using var scope = new CultureScope("de-DE");
        Assert.Equal("1.5 + 8.673617379884035E-19", d.ToString());
    }
}
