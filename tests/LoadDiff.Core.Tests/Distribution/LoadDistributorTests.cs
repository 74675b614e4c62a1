using CsCheck;
using LoadDiff.Core.Distribution;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using MathNet.Numerics.LinearAlgebra;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Distribution;

public class LoadDistributorTests
{
    // Points in general position: the first three span a triangle of area ≥ 0.5, so the equations are well
    // conditioned (near-collinear sets are a separate, tested case, and there any two rank thresholds disagree).
    private static Gen<Vector3[]> GeneralPosition(double range, int min, int max) =>
        Systems.Vec(-range, range).Array[min, max].Where(p => Vector3.Cross(p[1] - p[0], p[2] - p[0]).Length >= 1);

    private static SupportPoint P(string id, double x, double y, double z, double w = 1) => new(id, V(x, y, z), w);

    private static LoadDiff.Core.Distribution.Distribution Distribute(LoadDistributor d, LoadReduction r) =>
        d.Distribute(r.System, r.GrossForce, r.MomentScale(d.Centroid));

    [Fact]
    public void Distribute_fourBoltsOnASquareUnderEccentricShear_elasticMethodForces90_14And55_90kN()
    {
        // AISC Manual Part 7 and Salmon, Johnson & Malhas, Steel Structures, 5th ed., eccentric shear, elastic method
        // (section details from memory): four bolts on a 100 × 100 mm square, 100 kN parallel to one side at 200 mm from
        // the centroid. J = Σr² = 20 000 mm²; direct 25 kN plus torsional M·y/J, M·x/J = 50 kN each way gives
        // √(75² + 50²) = 90.14 kN on the two bolts nearer the load and √(25² + 50²) = 55.90 kN on the other two.
        SupportPoint[] bolts = [P("b1", -50, -50, 0), P("b2", 50, -50, 0), P("b3", 50, 50, 0), P("b4", -50, 50, 0)];
        var d = new LoadDistributor(bolts, allowCouples: false);
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("P", V(200, 0, 0), V(0, -100, 0)));
        var result = Distribute(d, load);

        Assert.True(result.Feasible);
        Assert.Equal(6, result.Rank);
        double[] magnitudes = [.. result.Forces.Select(f => f.Length)];
        Assert.Equal(90.14, Math.Round(magnitudes[1], 2));
        Assert.Equal(90.14, Math.Round(magnitudes[2], 2));
        Assert.Equal(55.90, Math.Round(magnitudes[0], 2));
        Assert.Equal(55.90, Math.Round(magnitudes[3], 2));
        Close.Relative(Math.Sqrt((75 * 75) + (50 * 50)), magnitudes[1], 1e-12);
        Close.Relative(Math.Sqrt((25 * 25) + (50 * 50)), magnitudes[0], 1e-12);
        // The in-plane load leaves nothing out of the plane.
        Assert.All(result.Forces, f => Assert.Equal(0, f.Z));
    }

    [Fact]
    public void Distribute_randomPoints_matchesThePseudoInverseOfTheUnscaledEquationsAboutTheOrigin()
    {
        // Reference: MathNet's Matrix.PseudoInverse() on the equilibrium equations written about the origin, without the
        // centroid shift or row scaling (the minimum-norm solution of a consistent system does not depend on either).
        Gen.Select(GeneralPosition(5, 3, 7), Systems.Load, Systems.Load, Gen.Double[0.2, 5].Array[7]).Sample((at, force, moment, weights) =>
        {
            SupportPoint[] pts = [.. at.Select((p, i) => new SupportPoint("p" + i, p, weights[i]))];
            var d = new LoadDistributor(pts, allowCouples: false);
            var system = new ForceCoupleSystem(force, moment, V(0, 0, 0));
            var result = d.Distribute(system, force.Length, moment.Length + (force.Length * 10));

            int n = pts.Length;
            Matrix<double> a = Matrix<double>.Build.Dense(6, 3 * n);
            for (int i = 0; i < n; i++)
            {
                // x = √w·y, so the weighted minimum norm is the plain minimum norm in y.
                double s = Math.Sqrt(pts[i].Weight);
                Vector3 r = pts[i].At;
                for (int k = 0; k < 3; k++)
                {
                    a[k, (3 * i) + k] = s;
                }
                a[3, (3 * i) + 1] = -r.Z * s;
                a[3, (3 * i) + 2] = r.Y * s;
                a[4, (3 * i) + 0] = r.Z * s;
                a[4, (3 * i) + 2] = -r.X * s;
                a[5, (3 * i) + 0] = -r.Y * s;
                a[5, (3 * i) + 1] = r.X * s;
            }
            Vector<double> y = a.PseudoInverse() * Vector<double>.Build.DenseOfArray([force.X, force.Y, force.Z, moment.X, moment.Y, moment.Z]);
            double scale = result.Forces.Max(f => f.Length) + 1e-300;
            for (int i = 0; i < n; i++)
            {
                double s = Math.Sqrt(pts[i].Weight);
                Close.Absolute(V(y[3 * i] * s, y[(3 * i) + 1] * s, y[(3 * i) + 2] * s), result.Forces[i], 1e-9 * scale);
            }
        }, iter: 200);
    }

    [Fact]
    public void Distribute_outputAlwaysPassesTheEquivalenceCheck()
    {
        Gen.Select(Systems.System, GeneralPosition(8, 3, 9), Gen.Bool, Gen.Double[0.1, 10].Array[9]).Sample((items, at, couples, weights) =>
        {
            SupportPoint[] pts = [.. at.Select((p, i) => new SupportPoint("p" + i, p, weights[i]))];
            var d = new LoadDistributor(pts, couples);
            LoadReduction original = Reduce.About(d.Centroid, items);
            var result = Distribute(d, original);
            Assert.True(result.Feasible, $"rank {result.Rank}");
            var acc = new ReductionAccumulator();
            for (int i = 0; i < pts.Length; i++)
            {
                acc.Add(new PointForce(pts[i].Id, pts[i].At, result.Forces[i]));
                acc.Add(new FreeCouple(pts[i].Id + "-m", result.Couples[i]));
            }
            // The check's force tolerance is rel·G_F; with (next to) no forces in the original, only couples, that is
            // (next to) zero, while the cancelling forces that carry a couple leave a rounding residual of about
            // 1e-16·G_C/ℓ. The CLI says so and suggests --force-tol; here an absolute 1e-9·G_C/ℓ is given, far
            // below rel·G_F whenever the original has forces of any real size. Likewise for the moment: an original
            // whose forces all act at one point has G_M = 0 (and no rounding floor when that point is the origin),
            // while the distributed forces leave a rounding residual of about 1e-16·(G_F·ℓ + G_C); 1e-9 of that is given.
            var tolerance = ToleranceSpec.Create(ToleranceSpec.DefaultRelative, 1e-9 * original.GrossCouple / d.LengthScale,
                1e-9 * ((original.GrossForce * d.LengthScale) + original.GrossCouple));
            CaseComparison c = EquivalenceChecker.Compare("case", EntryKind.Case, original, acc.ResultAt(d.Centroid), tolerance);
            Assert.True(c.Equivalent, $"|ΔR| {c.Residual!.ForceNorm} allowed {c.Tolerance!.Force}; |ΔM| {c.Residual.WorstMomentNorm} allowed {c.Tolerance.Moment}");
            // Far tighter than the tolerance: equilibrium holds to rounding.
            Assert.True(c.Residual.ForceNorm <= 1e-9 * (original.GrossForce + (original.GrossCouple / d.LengthScale)));
        }, iter: 300);
    }

    [Fact]
    public void Distribute_collinearPointsAndAMomentAboutTheirLine_infeasibleRank5WithTheMissingMoment()
    {
        SupportPoint[] line = [P("a", 0, 0, 0), P("b", 2, 0, 0), P("c", 5, 0, 0)];
        // (0, 10, 0) at height 1 above the line: about the centroid (7/3, 0, 0) the moment is (−10, 0, −70/3);
        // forces on the x axis can give the z part but never the x part (torsion about their own line).
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("F", V(0, 0, 1), V(0, 10, 0)));
        var result = Distribute(new LoadDistributor(line, allowCouples: false), load);
        Assert.False(result.Feasible);
        Assert.Equal(5, result.Rank);
        Close.Absolute(V(-10, 0, 0), result.UncarriedMoment, 1e-12);
        Close.Absolute(Vector3.Zero, result.UncarriedForce, 1e-12);

        // With couples at the points the same load is carried.
        var withCouples = Distribute(new LoadDistributor(line, allowCouples: true), load);
        Assert.True(withCouples.Feasible);
        Assert.Equal(6, withCouples.Rank);
    }

    [Fact]
    public void Distribute_collinearPointsAndALoadInTheirPlane_feasibleThoughRank5()
    {
        // A simply supported beam on three points: a vertical load on the line needs no torsion, so rank 5 suffices.
        SupportPoint[] line = [P("a", 0, 0, 0), P("b", 2, 0, 0), P("c", 5, 0, 0)];
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("F", V(3, 0, 0), V(0, 0, -12)));
        var result = Distribute(new LoadDistributor(line, allowCouples: false), load);
        Assert.True(result.Feasible);
        Assert.Equal(5, result.Rank);
        Close.Relative(-12, result.Forces.Sum(f => f.Z), 1e-14);
    }

    [Fact]
    public void Distribute_stifferPointTakesMore_forcesInProportionToTheWeightsUnderACentralLoad()
    {
        // A load at the weighted centroid of two points: minimising ΣF²/w with ΣF = P and no moment gives F_i ∝ w_i.
        SupportPoint[] two = [P("a", 0, 0, 0, 1), P("b", 3, 0, 0, 2)];
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("F", V(2, 0, 0), V(0, 0, -9)));
        var result = Distribute(new LoadDistributor(two, allowCouples: false), load);
        Assert.True(result.Feasible);
        Close.Relative(-3, result.Forces[0].Z, 1e-13);
        Close.Relative(-6, result.Forces[1].Z, 1e-13);
    }

    [Fact]
    public void Distribute_singlePoint_carriesAForceThroughItButNotAMomentAboutIt()
    {
        SupportPoint[] one = [P("a", 1, 1, 0)];
        var d = new LoadDistributor(one, allowCouples: false);
        Assert.Equal(3, d.Rank);
        Assert.True(Distribute(d, Reduce.About(V(0, 0, 0), new PointForce("F", V(1, 1, 5), V(0, 0, -4)))).Feasible);
        Assert.False(Distribute(d, Reduce.About(V(0, 0, 0), new PointForce("F", V(2, 1, 0), V(0, 0, -4)))).Feasible);
    }
}
