using CsCheck;
using LoadDiff.Core.Distribution;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Distribution;

public class LoadDistributorTests
{
    // Points in general position: the first three span a triangle of area ≥ 0.5, so the equations are well
    // conditioned (near-collinear sets are tested separately, on both sides of the rank threshold).
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

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Distribute_seededPointsWeightsAndLoads_matchTheOptimalityConditionSolvedInFractions(bool couples)
    {
        // Reference: MinimumNormReference, F_i = w_i (λ + μ × (r_i − c)) and C_i = w_i ℓ² μ fitted to the six equilibrium
        // equations by exact Gaussian elimination (the Lagrange condition of the weighted minimum norm; no MathNet).
        // Coordinates, weights and loads are quarters, so every input is an exact double; seeded cases.
        var random = new Random(20261202);
        double Quarter(int lo, int hi) => random.Next(lo * 4, (hi * 4) + 1) / 4.0;
        for (int trial = 0; trial < 60; trial++)
        {
            int n = random.Next(3, 8);
            Vector3[] at;
            do
            {
                at = [.. Enumerable.Range(0, n).Select(_ => V(Quarter(-5, 5), Quarter(-5, 5), Quarter(-5, 5)))];
            }
            while (Vector3.Cross(at[1] - at[0], at[2] - at[0]).Length < 1);
            SupportPoint[] pts = [.. at.Select((p, i) => new SupportPoint("p" + i, p, random.Next(1, 21) / 4.0))];
            Vector3 force = V(Quarter(-40, 40), Quarter(-40, 40), Quarter(-40, 40));
            Vector3 moment = V(Quarter(-90, 90), Quarter(-90, 90), Quarter(-90, 90));
            var d = new LoadDistributor(pts, couples);
            var result = d.Distribute(new ForceCoupleSystem(force, moment, V(0, 0, 0)), force.Length, moment.Length + (force.Length * 10));

            var reference = MinimumNormReference.Solve([.. pts.Select(p => (p.At, p.Weight))], couples, force, moment);
            Assert.Equal(6, reference.Rank);
            Assert.True(result.Feasible, $"trial {trial}");
            Assert.Equal(6, result.Rank);
            // A feasible result reports nothing uncarried, exactly (its residual is rounding, not a part left out).
            Assert.Equal(Vector3.Zero, result.UncarriedForce);
            Assert.Equal(Vector3.Zero, result.UncarriedMoment);
            double scale = reference.Forces.Max(f => f.ToVector3().Length) + (reference.Couples.Max(c => c.ToVector3().Length) / d.LengthScale);
            for (int i = 0; i < n; i++)
            {
                Close.Absolute(reference.Forces[i].ToVector3(), result.Forces[i], 1e-10 * scale);
                Close.Absolute(reference.Couples[i].ToVector3(), result.Couples[i], 1e-10 * scale * d.LengthScale);
            }
            AssertExactEquilibrium(pts, result, force, moment, 1e-12 * scale, 1e-12 * scale * d.LengthScale);
        }
    }

    // Σ F_i − R and Σ r_i × F_i + Σ C_i − M_O of the doubles written, summed exactly (dyadic rationals); only the final
    // residual is rounded, for the comparison.
    private static void AssertExactEquilibrium(SupportPoint[] pts, LoadDiff.Core.Distribution.Distribution result, Vector3 force, Vector3 moment,
        double forceAllowed, double momentAllowed)
    {
        var forces = pts.Select((p, i) => (p.At, result.Forces[i])).ToList();
        ExactVector sumF = ExactVector.Resultant(forces) - ExactVector.From(force);
        ExactVector sumM = ExactVector.MomentAbout(V(0, 0, 0), forces) - ExactVector.From(moment);
        foreach (Vector3 c in result.Couples)
        {
            sumM += ExactVector.From(c);
        }
        double dF = Math.Sqrt(sumF.LengthSquared.ToDouble()), dM = Math.Sqrt(sumM.LengthSquared.ToDouble());
        Assert.True(dF <= forceAllowed, $"|ΣF − R| = {dF:R}, allowed {forceAllowed:R}");
        Assert.True(dM <= momentAllowed, $"|ΣM − M| = {dM:R}, allowed {momentAllowed:R}");
    }

    [Fact]
    public void Distribute_fourBoltsOnASquareWithCouples_theCouplesTakeHalfTheTwist()
    {
        // Hand derivation (closed form of F_i = w_i(λ + μ × d_i), C_i = w_i ℓ² μ for this layout): the bolt square of the
        // test above, w = 1, d_i = (±50, ±50, 0) mm, ℓ² = 5000 mm². Σd_i = 0, so λ = R/4 = (0, −25, 0) kN. The twist about the
        // centroid is M_z = 200 × (−100) = −20 000 kN·mm; Σ d_i × (μ × d_i) = Σ|d_i|² μ = 20 000 μ (μ along z) and the
        // couples add Σ ℓ² μ = 20 000 μ, so μ_z = −0.5 and F_i = (0, −25, 0) − 0.5 ẑ × d_i = (0.5 d_y, −25 − 0.5 d_x, 0):
        // b1 (−25, 0), b2 (−25, −50), b3 (25, −50), b4 (25, 0) kN, each couple ℓ² μ = −2500 kN·mm about z. Without couples
        // μ_z = −1 (the elastic method above). A couple weighted 1/w instead of 1/(w ℓ²) would take almost all of the twist.
        SupportPoint[] bolts = [P("b1", -50, -50, 0), P("b2", 50, -50, 0), P("b3", 50, 50, 0), P("b4", -50, 50, 0)];
        var d = new LoadDistributor(bolts, allowCouples: true);
        Assert.Equal(Math.Sqrt(5000), d.LengthScale);
        var result = Distribute(d, Reduce.About(V(0, 0, 0), new PointForce("P", V(200, 0, 0), V(0, -100, 0))));
        Assert.True(result.Feasible);
        Assert.Equal(6, result.Rank);
        Vector3[] expected = [V(-25, 0, 0), V(-25, -50, 0), V(25, -50, 0), V(25, 0, 0)];
        for (int i = 0; i < 4; i++)
        {
            Close.Absolute(expected[i], result.Forces[i], 1e-12 * 100);
            Close.Absolute(V(0, 0, -2500), result.Couples[i], 1e-12 * 20000);
            // The in-plane load leaves no force out of the plane and no couple about an in-plane axis (SVD noise dropped).
            Assert.Equal(0, result.Forces[i].Z);
            Assert.Equal(0, result.Couples[i].X);
            Assert.Equal(0, result.Couples[i].Y);
        }
    }

    [Fact]
    public void Distribute_outputAlwaysPassesTheEquivalenceCheck()
    {
        Gen.Select(Systems.System, GeneralPosition(8, 3, 9), Gen.Bool, Gen.Double[0.1, 10].Array[9]).SampleSeeded((items, at, couples, weights) =>
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
    public void Distribute_collinearPointsAndALoadInTheirPlane_feasibleThoughRank5WithTheHandValues()
    {
        // A beam on three supports (statically indeterminate): a vertical load on the line needs no torsion, so rank 5
        // suffices. Hand derivation: F_i = w_i (a + b x_i) (the optimality condition; the reference point only shifts a),
        // with equal weights Σw = 3, Σx = 7, Σx² = 29: 3a + 7b = −12 (ΣF), 7a + 29b = −36 (Σ x F = 3 × −12),
        // determinant 38, a = −48/19, b = −12/19, so F = −48/19, −72/19, −108/19.
        SupportPoint[] line = [P("a", 0, 0, 0), P("b", 2, 0, 0), P("c", 5, 0, 0)];
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("F", V(3, 0, 0), V(0, 0, -12)));
        var result = Distribute(new LoadDistributor(line, allowCouples: false), load);
        Assert.True(result.Feasible);
        Assert.Equal(5, result.Rank);
        Close.Relative(V(0, 0, -48.0 / 19), result.Forces[0], 1e-13);
        Close.Relative(V(0, 0, -72.0 / 19), result.Forces[1], 1e-13);
        Close.Relative(V(0, 0, -108.0 / 19), result.Forces[2], 1e-13);
    }

    [Fact]
    public void Distribute_stifferMiddleSupportOfThreeTakesMore_handValuesInSeventeenths()
    {
        // Statically indeterminate, so the weights decide the split. Supports at x = 0, 2, 5 with w = (1, 2, 1), −12 kN
        // at x = 3. Hand derivation: minimising ΣF_i²/w_i subject to ΣF_i = P and Σx_i F_i = P x_P gives F_i = w_i (a + b x_i).
        // Σw = 4, Σw x = 0 + 4 + 5 = 9, Σw x² = 0 + 8 + 25 = 33: 4a + 9b = −12 and 9a + 33b = −36, determinant
        // 132 − 81 = 51, a = (−12·33 + 36·9)/51 = −72/51 = −24/17, b = (4·(−36) + 9·12)/51 = −36/51 = −12/17.
        // F = a = −24/17, 2(a + 2b) = −96/17, a + 5b = −84/17; check: sum −204/17 = −12, Σ x F = (−192 − 420)/17 = −36.
        // Weights ignored would give −48/19, −72/19, −108/19 (test above); weights inverted (w = 1, ½, 1) −3.43 at x = 0.
        SupportPoint[] line = [P("a", 0, 0, 0, 1), P("b", 2, 0, 0, 2), P("c", 5, 0, 0, 1)];
        LoadReduction load = Reduce.About(V(0, 0, 0), new PointForce("F", V(3, 0, 0), V(0, 0, -12)));
        var result = Distribute(new LoadDistributor(line, allowCouples: false), load);
        Assert.True(result.Feasible);
        Assert.Equal(5, result.Rank);
        Close.Relative(V(0, 0, -24.0 / 17), result.Forces[0], 1e-13);
        Close.Relative(V(0, 0, -96.0 / 17), result.Forces[1], 1e-13);
        Close.Relative(V(0, 0, -84.0 / 17), result.Forces[2], 1e-13);
        Assert.All(result.Couples, c => Assert.True(c.IsZero));

        // The same from the fraction solve, which also finds the rank (5: nothing twists about the line).
        var reference = MinimumNormReference.Solve([.. line.Select(p => (p.At, p.Weight))], false, load.System.Force, load.System.Moment);
        Assert.Equal(5, reference.Rank);
        Assert.Equal(Fraction.Of(-96, 17), reference.Forces[1].Z);
    }

    [Fact]
    public void Distribute_indeterminatePlateOnFourUnequalSupportsWithAndWithoutCouples_matchesTheFractionSolve()
    {
        // Four supports, three different weights, a load with all six components: the fraction solve of the optimality
        // condition is the reference (MinimumNormReference). With couples the plain centroid and ℓ² = Σ|d_i|²/n enter the
        // couples' weight; this pins both.
        SupportPoint[] pts = [P("a", 0, 0, 0, 1), P("b", 4, 0, 0.5, 3), P("c", 4, 3, 0, 0.5), P("d", 0, 3, -0.25, 2)];
        Vector3 force = V(3, -2, -20), moment = V(7, -11, 5);
        foreach (bool couples in new[] { false, true })
        {
            var d = new LoadDistributor(pts, couples);
            var result = d.Distribute(new ForceCoupleSystem(force, moment, V(0, 0, 0)), force.Length, 100);
            var reference = MinimumNormReference.Solve([.. pts.Select(p => (p.At, p.Weight))], couples, force, moment);
            Assert.True(result.Feasible);
            for (int i = 0; i < pts.Length; i++)
            {
                Close.Absolute(reference.Forces[i].ToVector3(), result.Forces[i], 1e-12 * 20);
                Close.Absolute(reference.Couples[i].ToVector3(), result.Couples[i], 1e-12 * 20);
            }
            AssertExactEquilibrium(pts, result, force, moment, 1e-12 * 20, 1e-12 * 20 * 5);
        }
    }

    [Theory]
    [InlineData(1.1e-10, 6)]
    [InlineData(0.9e-10, 5)]
    public void Distribute_nearCollinearThinRectangle_rankChangesAtTheRankTolerance(double halfWidth, int rank)
    {
        // Closed form (w = 1): corners (±1, ±e, 0) have centroid 0 and Σd_i = 0, so A Aᵀ is block diagonal: 4·I for the
        // force rows and Σ(|d|² I − d dᵀ)/ℓ² = diag(4e², 4, 4 + 4e²)/(1 + e²) for the moment rows (ℓ² = 1 + e²). Hence
        // σ_max = 2 and σ_min = 2e/√(1 + e²): σ_min/σ_max = e/√(1 + e²) ≈ e, against RankTolerance = 1e-10.
        Assert.Equal(1e-10, LoadDistributor.RankTolerance);
        SupportPoint[] pts = [P("a", -1, -halfWidth, 0), P("b", -1, halfWidth, 0), P("c", 1, -halfWidth, 0), P("d", 1, halfWidth, 0)];
        var d = new LoadDistributor(pts, allowCouples: false);
        Assert.Equal(rank, d.Rank);

        // A vertical load of 10 at x = −0.4 needs no twist about the long axis and is carried either way. Hand values
        // (e → 0, equal weights): F_z = −P/4 − P x_P x_i/Σx² = −2.5 ∓ 1 (Σx² = 4), so −3.5 at x = −1 and −1.5 at x = 1.
        var vertical = d.Distribute(new ForceCoupleSystem(V(0, 0, -10), V(0, -4, 0), V(0, 0, 0)), 10, 40);
        Assert.True(vertical.Feasible);
        Close.Relative(-3.5, vertical.Forces[0].Z, 1e-6);
        Close.Relative(-3.5, vertical.Forces[1].Z, 1e-6);
        Close.Relative(-1.5, vertical.Forces[2].Z, 1e-6);
        Close.Relative(-1.5, vertical.Forces[3].Z, 1e-6);

        // A unit twist about the long axis: kept (rank 6), the rectangle carries it with F_z = ±1/(4e) at y = ±e (hand value);
        // dropped (rank 5), all of it is uncarried.
        var twist = d.Distribute(new ForceCoupleSystem(Vector3.Zero, V(1, 0, 0), V(0, 0, 0)), 0, 1);
        if (rank == 6)
        {
            Close.Relative(1 / (4 * halfWidth), twist.Forces[1].Z, 1e-4);
            Close.Relative(-1 / (4 * halfWidth), twist.Forces[0].Z, 1e-4);
        }
        else
        {
            Assert.False(twist.Feasible);
            Close.Absolute(V(1, 0, 0), twist.UncarriedMoment, 1e-9);
            Assert.All(twist.Forces, f => Assert.True(f.Length <= 1e-6, f.ToString()));
        }
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
