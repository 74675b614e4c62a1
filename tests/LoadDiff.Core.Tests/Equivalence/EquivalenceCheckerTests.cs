using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

public partial class EquivalenceCheckerTests
{
    private static readonly ToleranceSpec Tight = ToleranceSpec.Create(1e-9, 0, 0);

    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static LoadReduction Reduce(Vector3 point, params LoadItem[] items)
    {
        var acc = new ReductionAccumulator();
        foreach (LoadItem i in items)
        {
            acc.Add(i);
        }
        return acc.ResultAt(point);
    }

    private static CaseComparison Check(ToleranceSpec tol, Vector3 point, LoadItem[] original, LoadItem[] substitute) =>
        EquivalenceChecker.Compare("case", EntryKind.Case, Reduce(point, original), Reduce(point, substitute), tol);

    [Fact]
    public void Compare_uniform_line_load_and_its_resultant_at_mid_length_passes()
    {
        // AISC Manual, Beam Diagrams and Formulas, case 1 (table number from memory): uniform w over l has resultant wl at l/2.
        double w = 12.5, l = 8;
        var line = new LineLoad("w", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w), V(0, 0, -w));
        var single = new PointForce("R", V(l / 2, 0, 0), V(0, 0, -w * l));
        CaseComparison c = Check(Tight, V(0, 0, 0), [line], [single]);
        Assert.True(c.Equivalent);
        Assert.Equal(0, c.Residual!.ForceNorm, 12);
    }

    [Fact]
    public void Compare_triangular_load_and_its_resultant_at_two_thirds_passes_and_at_mid_length_fails()
    {
        // AISC Manual case 2: load increasing uniformly to one end, total W: R1 = W/3, R2 = 2W/3,
        // so the resultant acts at 2l/3 from the light end.
        double w = 30, l = 9, total = w * l / 2;
        var tri = new LineLoad("tri", V(0, 0, 0), V(l, 0, 0), V(0, 0, 0), V(0, 0, -w));
        var right = new PointForce("R", V(2 * l / 3, 0, 0), V(0, 0, -total));
        var wrong = new PointForce("R", V(l / 2, 0, 0), V(0, 0, -total));
        Assert.True(Check(Tight, V(0, 0, 0), [tri], [right]).Equivalent);
        CaseComparison bad = Check(ToleranceSpec.Default, V(0, 0, 0), [tri], [wrong]);
        Assert.False(bad.Equivalent);
        Assert.True(bad.ForcePasses);
        Assert.False(bad.MomentPasses);
        // The residual is a pure couple of W·(2l/3 − l/2) = W·l/6 about y.
        Assert.Equal(SystemKind.Couple, bad.Residual!.Wrench.Kind);
        Assert.Equal(total * l / 6, bad.Residual.MomentNorm, 9);
    }

    [Fact]
    public void Compare_hydrostatic_wall_pressure_and_its_resultant_at_one_third_height_passes()
    {
        // Munson, Young, Okiishi & Huebsch, Fundamentals of Fluid Mechanics, 6th ed.: on a vertical rectangular
        // wall of width b and water depth h, F = γ b h²/2 acting h/3 above the base.
        double gamma = 9.81, b = 5, h = 3;
        var wall = new AreaLoad("wall", [V(0, 0, 0), V(0, b, 0), V(0, b, h), V(0, 0, h)], 0, V(1, 0, 0), V(0, 0, -gamma), V(0, 0, h));
        var resultant = new PointForce("F", V(0, b / 2, h / 3), V(gamma * b * h * h / 2, 0, 0));
        CaseComparison c = Check(Tight, V(0, 0, 0), [wall], [resultant]);
        Assert.True(c.Equivalent, c.ToString());
    }

    [Fact]
    public void Compare_parallel_forces_and_their_single_resultant_at_the_centre_of_the_forces_passes()
    {
        // Centre of parallel forces x̄ = Σ F_i x_i / Σ F_i, ȳ likewise (Meriam & Kraige, resultants; section from memory).
        (double X, double Y, double F)[] f = [(1, 2, 10), (4, -1, 25), (-2, 3, 5), (6, 6, 40)];
        double sum = f.Sum(x => x.F);
        double cx = f.Sum(x => x.F * x.X) / sum, cy = f.Sum(x => x.F * x.Y) / sum;
        LoadItem[] original = f.Select((x, i) => (LoadItem)new PointForce("p" + i, V(x.X, x.Y, 0), V(0, 0, -x.F))).ToArray();
        var single = new PointForce("R", V(cx, cy, 0), V(0, 0, -sum));
        Assert.True(Check(Tight, V(0, 0, 0), original, [single]).Equivalent);
        Assert.False(Check(Tight, V(0, 0, 0), original, [new PointForce("R", V(cx + 0.01, cy, 0), V(0, 0, -sum))]).Equivalent);
    }

    [Fact]
    public void Compare_coplanar_system_and_the_single_force_on_the_line_d_cross_R_equals_M_passes()
    {
        // Coplanar forces in the x-y plane reduce to one force R on the line where d × R = M_O
        // (any statics text, e.g. Meriam & Kraige, resultants — section from memory).
        // By hand: F1 = (3, 4) at (0, 0); F2 = (−1, 2) at (2, 1); F3 = (2, −1) at (−1, 3).
        // R = (4, 5); M_O,z = Σ (x F_y − y F_x) = 0 + (2·2 − 1·(−1)) + ((−1)(−1) − 3·2) = 5 − 5 = 0 … choose a 4th to make it non-zero:
        // F4 = (0, 3) at (4, 0): M_z += 12, so R = (4, 8), M_z = 12. On the x axis d = (x, 0, 0): x·R_y = M_z → x = 1.5.
        LoadItem[] original =
        [
            new PointForce("f1", V(0, 0, 0), V(3, 4, 0)),
            new PointForce("f2", V(2, 1, 0), V(-1, 2, 0)),
            new PointForce("f3", V(-1, 3, 0), V(2, -1, 0)),
            new PointForce("f4", V(4, 0, 0), V(0, 3, 0)),
        ];
        var single = new PointForce("R", V(1.5, 0, 0), V(4, 8, 0));
        CaseComparison c = Check(Tight, V(0, 0, 0), original, [single]);
        Assert.True(c.Equivalent, c.ToString());
        Assert.Equal(12, c.Original!.Moment.Z, 12);
    }

    [Theory]
    [InlineData(0.999, true)]
    [InlineData(1.001, false)]
    public void Compare_force_residual_against_the_absolute_force_tolerance(double fraction, bool expected)
    {
        // Exact arithmetic: |ΔR| = fraction × F with F = 2; the box is a single point, so the moment residual is 0.
        var tol = ToleranceSpec.Create(0, 2, 0);
        CaseComparison c = Check(tol, V(0, 0, 0), [new PointForce("a", V(1, 1, 1), V(0, 0, -100))],
            [new PointForce("a", V(1, 1, 1), V(0, 0, -100 - (2 * fraction)))]);
        Assert.Equal(expected, c.Equivalent);
        Assert.False(c.Tolerance!.ForceGovernedByRelative);
    }

    [Theory]
    [InlineData(0.999, true)]
    [InlineData(1.001, false)]
    public void Compare_couple_residual_against_the_absolute_moment_tolerance(double fraction, bool expected)
    {
        var tol = ToleranceSpec.Create(0, 0, 5);
        CaseComparison c = Check(tol, V(0, 0, 0), [new FreeCouple("c", V(0, 0, 40))], [new FreeCouple("c", V(0, 0, 40 + (5 * fraction)))]);
        Assert.Equal(expected, c.Equivalent);
        Assert.Equal(SystemKind.Couple, c.Residual!.Wrench.Kind);
    }

    [Theory]
    [InlineData(0.999, true)]
    [InlineData(1.001, false)]
    public void Compare_force_residual_against_the_relative_tolerance_of_the_gross_force(double fraction, bool expected)
    {
        // G_F = 60 + 40 = 100, rel = 1e-3 → allowed |ΔR| = 0.1. The box is the segment x ∈ [0, 10], D = 10, so
        // G_M = G_F·D = 1000 and the moment allowance is 1. The residual 0.1·fraction acts at x = 10; about the far corner
        // x = 0 its moment is 10 × 0.1·fraction = fraction: both parts pass at 0.999 and both fail at 1.001.
        CaseComparison c = Check(ToleranceSpec.Default, V(0, 0, 0),
            [new PointForce("a", V(0, 0, 0), V(0, 0, -60)), new PointForce("b", V(10, 0, 0), V(0, 0, -40))],
            [new PointForce("a", V(0, 0, 0), V(0, 0, -60)), new PointForce("b", V(10, 0, 0), V(0, 0, -40 - (0.1 * fraction)))]);
        Assert.Equal(expected, c.ForcePasses);
        Assert.True(c.Tolerance!.ForceGovernedByRelative);
        Assert.Equal(0.1, c.Tolerance.Force, 15);
        Assert.Equal(1, c.Tolerance.Moment, 14);
        Close.Relative(fraction, c.Residual!.WorstMomentNorm, 1e-12);
        Assert.Equal(0, c.Residual.WorstCorner.X);
        Assert.Equal(expected, c.MomentPasses);
        Assert.Equal(expected, c.Equivalent);
    }

    [Fact]
    public void Compare_force_residual_within_tolerance_whose_moment_at_the_far_corner_is_not_fails()
    {
        // Forces along a 100 m span; the substitute is 0.5 short at x = 100. About x = 100 the residual moment is 0,
        // but at the far corner x = 0 it is 100 × 0.5 = 50 > M = 5 (exact arithmetic).
        var tol = ToleranceSpec.Create(0, 1, 5);
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 0, -50)), new PointForce("b", V(100, 0, 0), V(0, 0, -50))];
        LoadItem[] substitute = [new PointForce("a", V(0, 0, 0), V(0, 0, -50)), new PointForce("b", V(100, 0, 0), V(0, 0, -49.5))];
        CaseComparison c = Check(tol, V(100, 0, 0), original, substitute);
        Assert.True(c.ForcePasses);
        Assert.Equal(0, c.Residual!.MomentNorm, 12);
        Assert.False(c.MomentPasses);
        Assert.Equal(50, c.Residual.WorstMomentNorm, 10);
        Assert.Equal(0, c.Residual.WorstCorner.X);
        Assert.False(c.Equivalent);
        // The residual's own axis is the line of the missing force: through x = 100, vertical.
        Assert.Equal(100, c.Residual.Wrench.AxisPoint!.Value.X, 9);
    }

    [Fact]
    public void Compare_verdict_does_not_depend_on_the_reference_point_inside_the_box()
    {
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 0, -50)), new PointForce("b", V(100, 0, 0), V(0, 0, -50))];
        LoadItem[] substitute = [new PointForce("a", V(0, 0, 0), V(0, 0, -50)), new PointForce("b", V(100, 0, 0), V(0, 0, -49.5))];
        var tol = ToleranceSpec.Create(0, 1, 5);
        double[] worst = new[] { 0.0, 37, 100 }.Select(x => Check(tol, V(x, 0, 0), original, substitute).Residual!.WorstMomentNorm).ToArray();
        Assert.All(worst, w => Assert.Equal(50, w, 10));
    }

    [Fact]
    public void Compare_coordinates_offset_by_a_million_metres_give_the_same_residual()
    {
        // Exact arithmetic on the unshifted model: uniform 3 kN/m over 6 m is 18 kN with moment 54 kN·m about its start
        // (the SPEC §2 trapezoid formula), and so are 10 kN at 1 m plus 8 kN at 5.5 m (10 + 8 = 18, 10 + 44 = 54).
        // Offsets between 5·10⁵ and 10⁶ m with three decimals: o, o + 1, o + 3, o + 5.5 and o + 6 are exact doubles
        // (same binade, multiples of its ulp), so each shifted pair is exactly equivalent: the exact residual is zero.
        LoadItem[] Original(Vector3 s) => [new LineLoad("w", s, s + V(6, 0, 0), V(0, 0, -3), V(0, 0, -3))];
        LoadItem[] Substitute(Vector3 s) => [new PointForce("a", s + V(1, 0, 0), V(0, 0, -10)), new PointForce("b", s + V(5.5, 0, 0), V(0, 0, -8))];
        Assert.True(Check(Tight, V(3, 0, 0), Original(V(0, 0, 0)), Substitute(V(0, 0, 0))).Equivalent);

        var random = new Random(20261202);
        double naiveWorst = 0;
        for (int i = 0; i < 64; i++)
        {
            double x = Math.Round(5e5 + (random.NextDouble() * 5e5), 3);
            Vector3 o = V(x, -2e6, 1e6);
            Assert.True(x + 6 - x == 6 && x + 5.5 - x == 5.5, "offset not exact");
            CaseComparison far = Check(Tight, o + V(3, 0, 0), Original(o), Substitute(o));
            Assert.True(far.Equivalent);
            // G_M = G_F·D = 18 × 6 = 108 kN·m; the code's residual stays within 4·10⁻¹⁶ of it, a few units in the last place.
            Assert.Equal(108, far.Tolerance!.GrossMoment, 12);
            double bound = 4e-16 * far.Tolerance.GrossMoment;
            Assert.True(far.Residual!.WorstMomentNorm <= bound, $"offset {x}: {far.Residual.WorstMomentNorm:R}");
            Assert.Equal(0, far.Residual.ForceNorm);

            // The textbook method in plain doubles: M_y about the origin (r × F, |r| ≈ 10⁶ m), then moved to
            // p = o + 3 by adding p_x·R_z; the substitute's minus the original's is the naive residual.
            double p = x + 3;
            double originalNaive = ((18 * x) + 54) - (18 * p);
            double substituteNaive = ((10 * (x + 1)) + (8 * (x + 5.5))) - (18 * p);
            naiveWorst = Math.Max(naiveWorst, Math.Abs(substituteNaive - originalNaive));
        }
        // Naive arithmetic misses the bound by orders of magnitude for some of these offsets: the test tells them apart.
        Assert.True(naiveWorst > 1000 * 4e-16 * 108, naiveWorst.ToString("R"));
    }

    [Fact]
    public void Combination_with_EN_1990_factors_sums_the_factored_cases()
    {
        // EN 1990:2002 expression (6.10), Table A1.2(B): γG,sup = 1.35, γQ = 1.50.
        var dead = new ReductionAccumulator();
        dead.Add(new PointForce("g", V(2, 0, 0), V(0, 0, -100)));
        var live = new ReductionAccumulator();
        live.Add(new PointForce("q", V(5, 0, 0), V(0, 0, -40)));
        var combination = new LoadCombination("uls", [new("dead", 1.35), new("live", 1.5)]);
        var cases = new Dictionary<string, ReductionAccumulator> { ["dead"] = dead, ["live"] = live };
        LoadReduction r = combination.Combine(cases, out IReadOnlyList<string> missing).ResultAt(V(0, 0, 0));
        Assert.Empty(missing);
        Assert.Equal(-(1.35 * 100) - (1.5 * 40), r.Force.Z, 12);
        Assert.Equal((1.35 * 100 * 2) + (1.5 * 40 * 5), r.Moment.Y, 12);
    }

    [Fact]
    public void Missing_case_fails_and_says_which_file_has_it()
    {
        LoadReduction r = Reduce(V(0, 0, 0), new PointForce("a", V(0, 0, 0), V(0, 0, -1)));
        CaseComparison onlyOriginal = EquivalenceChecker.Missing("snow", EntryKind.Case, r, null);
        CaseComparison onlySubstitute = EquivalenceChecker.Missing("snow", EntryKind.Case, null, r);
        Assert.False(onlyOriginal.Equivalent);
        Assert.Equal(OnlyIn.Original, onlyOriginal.Presence);
        Assert.Equal(OnlyIn.Substitute, onlySubstitute.Presence);
    }

    [Fact]
    public void Create_rejects_negative_and_non_finite_tolerances()
    {
        Assert.Throws<ArgumentException>(() => ToleranceSpec.Create(-1e-3, 0, 0));
        Assert.Throws<ArgumentException>(() => ToleranceSpec.Create(double.NaN, 0, 0));
        Assert.Throws<ArgumentException>(() => ToleranceSpec.Create(1e-3, double.PositiveInfinity, 0));
    }
}
