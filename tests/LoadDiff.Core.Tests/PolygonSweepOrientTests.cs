using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Tests.Support;
using LoadDiff.Tests.Support;

namespace LoadDiff.Core.Tests;

/// <summary>
/// The sweep's orientation predicate against exact rational arithmetic (ExactRational: the exact value of each
/// double, no rounding). Nearly collinear triples are where the rounded determinant has the wrong sign or is zero;
/// the predicate must agree with the exact sign at every scale, including where the products underflow.
/// </summary>
public class PolygonSweepOrientTests
{
    private static int Exact(PlanePoint a, PlanePoint b, PlanePoint c)
    {
        ExactRational au = ExactRational.FromDouble(a.U), av = ExactRational.FromDouble(a.V);
        ExactRational bu = ExactRational.FromDouble(b.U), bv = ExactRational.FromDouble(b.V);
        ExactRational cu = ExactRational.FromDouble(c.U), cv = ExactRational.FromDouble(c.V);
        return (((bu - au) * (cv - av)) - ((bv - av) * (cu - au))).Sign;
    }

    // c on the line a–b (up to rounding of the interpolation), then moved by up to a few units in the last place.
    private static readonly Gen<(PlanePoint, PlanePoint, PlanePoint)> NearlyCollinear =
        Gen.Select(Gen.Double[-1, 1], Gen.Double[-1, 1], Gen.Double[-1, 1], Gen.Double[-1, 1], Gen.Double[-2, 3], Gen.Int[-3, 3], Gen.Int[-3, 3])
            .Select(t =>
            {
                (double au, double av, double bu, double bv, double s, int du, int dv) = t;
                double cu = au + (s * (bu - au)), cv = av + (s * (bv - av));
                for (int i = 0; i < Math.Abs(du); i++)
                {
                    cu = du > 0 ? Math.BitIncrement(cu) : Math.BitDecrement(cu);
                }
                for (int i = 0; i < Math.Abs(dv); i++)
                {
                    cv = dv > 0 ? Math.BitIncrement(cv) : Math.BitDecrement(cv);
                }
                return (new PlanePoint(au, av), new PlanePoint(bu, bv), new PlanePoint(cu, cv));
            });

    [Theory]
    [InlineData(1.0)]
    [InlineData(1e150)] // products near 1e300
    [InlineData(1e-80)] // products near 1e-160, still normal
    [InlineData(1e-155)] // products near 1e-310: subnormal, so the rounded determinant and its error bound underflow
    public void Sign_of_nearly_collinear_triples_is_the_exact_sign_at_every_scale(double scale)
    {
        int wrongRounded = 0;
        NearlyCollinear.SampleSeeded((a, b, c) =>
        {
            PlanePoint A = Scale(a, scale), B = Scale(b, scale), C = Scale(c, scale);
            int exact = Exact(A, B, C);
            Assert.Equal(exact, PolygonSweep.Orient(A, B, C));
            double rounded = ((B.U - A.U) * (C.V - A.V)) - ((B.V - A.V) * (C.U - A.U));
            if (Math.Sign(rounded) != exact)
            {
                wrongRounded++;
            }
        }, iter: 4000, variant: scale.ToString("R", System.Globalization.CultureInfo.InvariantCulture));
        // The cases are hard ones: the plain rounded determinant gets a share of them wrong.
        Assert.InRange(wrongRounded, 40, 4000);
    }

    [Fact]
    public void Sign_of_random_triples_agrees_with_the_exact_sign()
    {
        Gen.Select(Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3], Gen.Double[-1e3, 1e3])
            .SampleSeeded((au, av, bu, bv, cu, cv) =>
            {
                PlanePoint a = new(au, av), b = new(bu, bv), c = new(cu, cv);
                Assert.Equal(Exact(a, b, c), PolygonSweep.Orient(a, b, c));
            }, iter: 2000);
    }

    [Fact]
    public void Subnormal_and_normal_coordinates_together_are_exact()
    {
        // 1e-320 is a subnormal k·2^-1074; (k, 2k)·2^-1074, (0, 0) and (1, 2) are exactly collinear, and moving the
        // last point by one unit in the last place turns the triple to either side (exact values, by hand).
        double t = 1e-320;
        PlanePoint o = new(0, 0), b = new(t, 2 * t);
        Assert.Equal(0, PolygonSweep.Orient(o, b, new PlanePoint(1, 2)));
        Assert.Equal(1, PolygonSweep.Orient(o, b, new PlanePoint(1, Math.BitIncrement(2.0))));
        Assert.Equal(-1, PolygonSweep.Orient(o, b, new PlanePoint(1, Math.BitDecrement(2.0))));
        Assert.Equal(-1, PolygonSweep.Orient(b, o, new PlanePoint(1, Math.BitIncrement(2.0))));
        Assert.Equal(1, PolygonSweep.Orient(new PlanePoint(-t, 0), new PlanePoint(t, 0), new PlanePoint(0, double.Epsilon)));
    }

    private static PlanePoint Scale(PlanePoint p, double s) => new(p.U * s, p.V * s);
}
