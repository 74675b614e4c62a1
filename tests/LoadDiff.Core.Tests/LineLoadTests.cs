using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public partial class LineLoadTests
{
    [Fact]
    public void ContributionAbout_trapezoid220To890Over6m_resultant3330AtTrapezoidCentroid()
    {
        // Singer, Engineering Mechanics, Prob. 238: 220 → 890 N/m over 6 m gives R = 3330 N at x̄ = 3.603603… m
        // (the book rounds to 3.6 m). Centroid of a trapezoid, x̄ = L(w1+2w2)/(3(w1+w2)) from the w1 end
        // (Hibbeler, Engineering Mechanics: Statics, distributed loadings — section number from memory).
        double w1 = 220, w2 = 890, l = 6;
        double r = (w1 + w2) * l / 2;
        double xBar = l * (w1 + (2 * w2)) / (3 * (w1 + w2));
        Assert.Equal(3330, r);
        Close.Relative(3.6036036036036036, xBar, 1e-15);

        var load = new LineLoad("w", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w1), V(0, 0, -w2));
        LoadReduction red = Reduce.About(V(0, 0, 0), load);

        Close.Relative(V(0, 0, -r), red.Force, 1e-12);
        // Moment about the start point: (x̄, 0, 0) × (0, 0, −R) = (0, R·x̄, 0).
        Close.Relative(V(0, r * xBar, 0), red.Moment, 1e-12);
        Close.Relative(xBar, red.Moment.Y / -red.Force.Z, 1e-12);
    }

    [Fact]
    public void ContributionAbout_triangularLoadOnSimpleBeam_reactionsThirdAndTwoThirds()
    {
        // AISC Steel Construction Manual, Beam Diagrams and Formulas, Case 2 (table number from memory):
        // load increasing uniformly to one end, total W = wl/2 at 2l/3 from the light end; R1 = W/3, R2 = 2W/3.
        double w = 5, l = 8, total = w * l / 2;
        var load = new LineLoad("tri", V(0, 0, 0), V(l, 0, 0), V(0, 0, 0), V(0, 0, -w));

        LoadReduction atLight = Reduce.About(V(0, 0, 0), load);
        LoadReduction atHeavy = Reduce.About(V(l, 0, 0), load);

        Close.Relative(V(0, 0, -total), atLight.Force, 1e-12);
        Close.Relative(2 * l / 3, atLight.Moment.Y / total, 1e-12);
        // Moment equilibrium of the beam: R2·l balances the load's moment about the light-end support, and vice versa.
        double r2 = atLight.Moment.Y / l, r1 = -atHeavy.Moment.Y / l;
        Close.Relative(2 * total / 3, r2, 1e-12);
        Close.Relative(total / 3, r1, 1e-12);
    }

    [Fact]
    public void ContributionAbout_triangularLoadCutAtLOverRoot3_maximumMoment2WlOver9Root3()
    {
        // AISC Manual, Beam Diagrams and Formulas, Case 2 (table number from memory): M_max = 2Wl/(9√3) at x = l/√3.
        double w = 5, l = 8, total = w * l / 2;
        double x = l / Math.Sqrt(3);
        var left = new LineLoad("tri-left", V(0, 0, 0), V(x, 0, 0), V(0, 0, 0), V(0, 0, -w * x / l));
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(0, 0, 0), V(0, 0, total / 3)); // R1 = W/3, same source
        acc.Add(left);
        LoadReduction cut = acc.ResultAt(V(x, 0, 0));
        Close.Relative(2 * total * l / (9 * Math.Sqrt(3)), Math.Abs(cut.Moment.Y), 1e-12);
        Close.Relative(0.128300 * total * l, Math.Abs(cut.Moment.Y), 1e-6);
    }

    [Fact]
    public void ContributionAbout_uniformCantileverCut_momentWxSquaredOverTwo()
    {
        // AISC Manual, Beam Diagrams and Formulas, Case 19 (table number from memory): cut moment w·x²/2 at x from the free end.
        double w = 3, x = 2.5;
        var load = new LineLoad("u", V(0, 0, 0), V(x, 0, 0), V(0, 0, -w), V(0, 0, -w));
        LoadReduction cut = Reduce.About(V(x, 0, 0), load);
        Close.Relative(V(0, 0, -w * x), cut.Force, 1e-12);
        Close.Relative(w * x * x / 2, Math.Abs(cut.Moment.Y), 1e-12);
    }

    [Fact]
    public void ContributionAbout_intensityChangesSign_grossIsHandIntegralOfAbsoluteValue()
    {
        // w_z goes from −2 to +6 over L = 4: zero at t = 1/4; ∫|w| = 4·(2·¼/2 + 6·¾/2) = 10; ∫w = 4·(−2+6)/2 = 8.
        var load = new LineLoad("s", V(1, 2, 3), V(5, 2, 3), V(0, 0, -2), V(0, 0, 6));
        Contribution c = load.ContributionAbout(V(1, 2, 3));
        Close.Relative(V(0, 0, 8), c.Force, 1e-14);
        Close.Relative(10, c.GrossForce, 1e-14);
        // First moment of |w| about the start, x along the span: |w| = 2 − 2x on [0, 1] and 2x − 2 on [1, 4];
        // ∫₀¹ (2 − 2x)x dx = 1/3 and ∫₁⁴ (2x − 2)x dx = 2(63/3 − 15/2) = 27.
        Close.Relative(V(27 + (1.0 / 3), 0, 0), c.GrossFirstMoment, 1e-14);
    }

    [Theory]
    [InlineData(1, 0, -3, -2, 4, 1)]       // the closest approach to zero intensity lies inside the span
    [InlineData(0, 0, -10, 1, 0, -6)]      // intensity shrinks towards the end, never near zero
    [InlineData(0, 0, -4, 0, 3, -9)]       // intensity grows, not parallel
    [InlineData(1, 0, 0, -1, 0.2, 0)]      // passes close to zero intensity mid-span
    public void ContributionAbout_nonParallelIntensities_matchesSimpsonReference(double w1x, double w1y, double w1z, double w2x, double w2y, double w2z)
    {
        // Reference: composite Simpson rule with 20 000 panels, an independent numerical method. Its error for
        // these smooth integrands is far below the 1e-9 relative tolerance used here.
        Vector3 a = V(2, -1, 0.5), b = V(5, 3, -1.5), w1 = V(w1x, w1y, w1z), w2 = V(w2x, w2y, w2z);
        var load = new LineLoad("n", a, b, w1, w2);
        Vector3 p = V(-1, 0.5, 2);
        Contribution c = load.ContributionAbout(p);
        Simpson(a, b, w1, w2, p, out Vector3 force, out Vector3 moment, out double gross, out Vector3 grossFirst);
        Close.Relative(force, c.Force, 1e-9);
        Close.Relative(moment, c.Moment, 1e-9);
        Close.Relative(gross, c.GrossForce, 1e-9);
        Close.Relative(grossFirst, c.GrossFirstMoment, 1e-9);
    }

    [Theory]
    [InlineData(1e-2)]
    [InlineData(1e-4)]
    [InlineData(1e-6)]
    [InlineData(1e-8)]
    [InlineData(1e-10)]
    public void ContributionAbout_nearlyUniformWithSmallSkew_grossMatchesSimpsonReference(double skew)
    {
        // A uniform 10 N/m downward load whose end intensity has a small extra component that is not parallel to
        // the load (for example rounding in an exported file). The gross force and its centroid must stay accurate.
        Vector3 a = V(0, 0, 0), b = V(6, 0, 0), w1 = V(0, 0, -10), w2 = V(skew * 10, skew * 7, -10 - (skew * 4));
        var load = new LineLoad("k", a, b, w1, w2);
        Contribution c = load.ContributionAbout(a);
        Simpson(a, b, w1, w2, a, out _, out _, out double gross, out Vector3 grossFirst);
        Close.Relative(gross, c.GrossForce, 1e-9);
        Close.Relative(grossFirst, c.GrossFirstMoment, 1e-9);
    }

    [Fact]
    public void ContributionAbout_splitAtInteriorPoint_sameResultantMomentAndGross()
    {
        Gen<Vector3> v = Gen.Select(Gen.Double[-10, 10], Gen.Double[-10, 10], Gen.Double[-10, 10], Vector3.Create);
        Gen.Select(v, v, v, v, v, Gen.Double[0.05, 0.95]).SampleSeeded((a, b, w1, w2, p, t) =>
        {
            if ((b - a).Length < 0.1)
            {
                return;
            }
            Vector3 x = a + ((b - a) * t);
            Vector3 wx = w1 + ((w2 - w1) * t);
            Contribution whole = new LineLoad("w", a, b, w1, w2).ContributionAbout(p);
            Contribution first = new LineLoad("w1", a, x, w1, wx).ContributionAbout(p);
            Contribution second = new LineLoad("w2", x, b, wx, w2).ContributionAbout(p);
            double reach = Math.Max((a - p).Length, (b - p).Length);
            double scale = whole.GrossForce;
            Close.Absolute(whole.Force, first.Force + second.Force, 1e-12 * scale);
            Close.Absolute(whole.Moment, first.Moment + second.Moment, 1e-12 * scale * reach);
            Close.Absolute(whole.GrossForce, first.GrossForce + second.GrossForce, 1e-12 * scale);
            Close.Absolute(whole.GrossFirstMoment, first.GrossFirstMoment + second.GrossFirstMoment, 1e-11 * scale * reach);
        }, iter: 500);
    }

    [Fact]
    public void Equals_contract_holds()
    {
        var a = new LineLoad("w", V(0, 0, 0), V(1, 0, 0), V(0, 0, -1), V(0, 0, -2));
        EqualityContract.Check<LoadItem>(a, a with { }, a with { EndIntensity = V(0, 0, -3) }, (x, y) => x == y, (x, y) => x != y);
    }

    private static void Simpson(Vector3 a, Vector3 b, Vector3 w1, Vector3 w2, Vector3 p,
        out Vector3 force, out Vector3 moment, out double gross, out Vector3 grossFirst)
    {
        const int panels = 20000;
        double l = (b - a).Length;
        double fx = 0, fy = 0, fz = 0, mx = 0, my = 0, mz = 0, g = 0, gx = 0, gy = 0, gz = 0;
        for (int i = 0; i <= panels; i++)
        {
            double t = (double)i / panels;
            double weight = i == 0 || i == panels ? 1 : i % 2 == 1 ? 4 : 2;
            double rx = a.X + (t * (b.X - a.X)) - p.X, ry = a.Y + (t * (b.Y - a.Y)) - p.Y, rz = a.Z + (t * (b.Z - a.Z)) - p.Z;
            double wx = w1.X + (t * (w2.X - w1.X)), wy = w1.Y + (t * (w2.Y - w1.Y)), wz = w1.Z + (t * (w2.Z - w1.Z));
            double n = Math.Sqrt((wx * wx) + (wy * wy) + (wz * wz));
            fx += weight * wx;
            fy += weight * wy;
            fz += weight * wz;
            mx += weight * ((ry * wz) - (rz * wy));
            my += weight * ((rz * wx) - (rx * wz));
            mz += weight * ((rx * wy) - (ry * wx));
            g += weight * n;
            gx += weight * n * rx;
            gy += weight * n * ry;
            gz += weight * n * rz;
        }
        double h = l / panels / 3;
        force = V(fx * h, fy * h, fz * h);
        moment = V(mx * h, my * h, mz * h);
        gross = g * h;
        grossFirst = V(gx * h, gy * h, gz * h);
    }
}
