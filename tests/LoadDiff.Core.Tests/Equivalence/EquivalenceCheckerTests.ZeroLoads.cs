using CsCheck;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// Items of zero magnitude are no loaded geometry (SPEC §4): a zero nodal force far away in either file must not
/// widen the box, D or the allowance. Expected verdicts and numbers are computed in the test in exact rational
/// arithmetic from the formulas of SPEC §2 and §4.
/// </summary>
public partial class EquivalenceCheckerTests
{
    private sealed record Force(Vector3 At, Vector3 Value);

    // a² + b² + c² = d² (Pythagorean quadruples): a force k·(a, b, c) with a dyadic k has |F| = k·d exactly in doubles,
    // so G_F = Σ|F| is an exact rational and the code's Vector3.Length has no rounding to hide behind.
    private static readonly (int A, int B, int C, int D)[] Quadruples =
        [(1, 2, 2, 3), (2, 3, 6, 7), (1, 4, 8, 9), (4, 4, 7, 9), (2, 6, 9, 11), (6, 6, 7, 11), (2, 10, 11, 15)];

    private static readonly Gen<Vector3> DyadicForce = Gen.Select(Gen.Int[0, Quadruples.Length - 1], Gen.Int[0, 5], Gen.Int[0, 7], Gen.Int[1, 64],
        (q, permutation, signs, scale) =>
        {
            (int a, int b, int c, _) = Quadruples[q];
            int[] v = permutation switch
            {
                0 => [a, b, c],
                1 => [a, c, b],
                2 => [b, a, c],
                3 => [b, c, a],
                4 => [c, a, b],
                _ => [c, b, a],
            };
            double k = scale / 4.0;
            return V((signs & 1) == 0 ? v[0] * k : -v[0] * k, (signs & 2) == 0 ? v[1] * k : -v[1] * k, (signs & 4) == 0 ? v[2] * k : -v[2] * k);
        });

    // multiples of 1/8 m within ±20 m
    private static readonly Gen<Vector3> DyadicPoint =
        Gen.Select(Gen.Int[-160, 160], Gen.Int[-160, 160], Gen.Int[-160, 160], (x, y, z) => V(x / 8.0, y / 8.0, z / 8.0));

    private static readonly Gen<Force[]> DyadicSystem = Gen.Select(DyadicPoint, DyadicForce, (at, f) => new Force(at, f)).Array[2, 8];

    private static LoadItem[] Items(IEnumerable<Force> forces) => [.. forces.Select((f, i) => (LoadItem)new PointForce("f" + i, f.At, f.Value))];

    private static (Vector3 Min, Vector3 Max) LoadedBox(IEnumerable<Force> forces)
    {
        Force[] loaded = [.. forces.Where(f => !f.Value.IsZero)];
        return (loaded.Select(f => f.At).Aggregate(Vector3.Min), loaded.Select(f => f.At).Aggregate(Vector3.Max));
    }

    /// <summary>What SPEC §4 says about two point-force systems with rel = 1e-3 and no absolute tolerances, exactly.</summary>
    private sealed record ExactRule(ExactRational GrossForce, ExactRational DiagonalSquared, ExactRational AllowanceSquared,
        ExactRational ForceResidualSquared, ExactRational WorstSquared)
    {
        public bool Passes => ForceResidualSquared <= X(1e-3) * X(1e-3) * GrossForce * GrossForce && WorstSquared <= AllowanceSquared;

        public static ExactRule Of(Force[] original, Force[] substitute)
        {
            (Vector3 Min, Vector3 Max) o = LoadedBox(original);
            (Vector3 Min, Vector3 Max) u = LoadedBox([.. original, .. substitute]);
            ExactRational gf = original.Aggregate(ExactRational.Zero, (s, f) => s + X(f.Value.Length)); // exact: |F| = k·d
            ExactRational d2 = (ExactVector.From(o.Max) - ExactVector.From(o.Min)).LengthSquared;
            ExactRational allowance2 = X(1e-3) * X(1e-3) * gf * gf * d2; // (rel·G_M)², G_M = G_F·D (no couples)
            (Vector3, Vector3)[] a = [.. original.Select(f => (f.At, f.Value))], b = [.. substitute.Select(f => (f.At, f.Value))];
            ExactRational dr2 = (ExactVector.Resultant(b) - ExactVector.Resultant(a)).LengthSquared;
            ExactRational worst2 = new Box(u.Min, u.Max).Corners
                .Select(q => (ExactVector.MomentAbout(q, b) - ExactVector.MomentAbout(q, a)).LengthSquared)
                .Max();
            return new ExactRule(gf, d2, allowance2, dr2, worst2);
        }
    }

    private static readonly Vector3[] FarZeroPoints = [V(3000, 30, 0), V(1e6, 30, 0), V(-2999.875, 1e6, -1e6)];

    /// <summary>The zero force placed in the original, the substitute or both, first (where it would take the anchor) or last.</summary>
    private static IEnumerable<(Force[] Original, Force[] Substitute, string Where)> WithZeroForces(Force[] original, Force[] substitute)
    {
        yield return (original, substitute, "none");
        foreach (Vector3 far in FarZeroPoints)
        {
            var zero = new Force(far, Vector3.Zero);
            yield return ([zero, .. original], substitute, $"original, first, {far}");
            yield return ([.. original, zero], substitute, $"original, last, {far}");
            yield return (original, [zero, .. substitute], $"substitute, first, {far}");
            yield return (original, [.. substitute, zero], $"substitute, last, {far}");
            yield return ([zero, .. original], [.. substitute, zero], $"both, {far}");
        }
    }

    private static CaseComparison CheckForces(Force[] original, Force[] substitute)
    {
        LoadItem[] a = Items(original), b = Items(substitute);
        Vector3 centroid = Reduce(Vector3.Zero, a).Centroid!.Value;
        return Check(ToleranceSpec.Default, centroid, a, b);
    }

    private static void AssertLoadedBoxAndAnchor(Force[] forces, LoadReduction r)
    {
        (Vector3 min, Vector3 max) = LoadedBox(forces);
        Assert.Equal(new Box(min, max), r.Bounds);
        Assert.Equal(forces.First(f => !f.Value.IsZero).At, r.Sums.Anchor);
    }

    [Fact]
    public void Compare_misplacedForce_failsWithOrWithoutAZeroForceFarAwayInEitherFile()
    {
        Gen.Select(DyadicSystem.Where(f => (LoadedBox(f).Max - LoadedBox(f).Min).Length >= 1), Gen.Int[0, 7]).SampleSeeded((original, pick) =>
        {
            // Misplace force k by δ ⊥ F_k: ΔR = 0, ΔM = δ × F_k everywhere. |δ| is sized (in doubles) for about three
            // times the allowance 1e-3·G_F·D; the margin itself is then asserted exactly.
            int k = pick % original.Length;
            Force f = original[k];
            Vector3 u = V(f.Value.Y, -f.Value.X, 0);
            double gf = original.Sum(x => x.Value.Length), d = (LoadedBox(original).Max - LoadedBox(original).Min).Length;
            double s = Math.Ceiling(3e-3 * gf * d / (u.Length * f.Value.Length) * 64) / 64;
            Force[] substitute = [.. original.Select((x, i) => i == k ? x with { At = x.At + (u * s) } : x)];

            ExactRule rule = ExactRule.Of(original, substitute);
            Assert.True(rule.WorstSquared >= X(2.25) * rule.AllowanceSquared, "the misplacement must fail by a clear margin (1.5×)");
            Assert.False(rule.Passes);
            foreach ((Force[] a, Force[] b, string where) in WithZeroForces(original, substitute))
            {
                CaseComparison c = CheckForces(a, b);
                Assert.False(c.Equivalent, $"zero force: {where}");
                Assert.False(c.MomentPasses, where);
                Assert.Equal(rule.GrossForce, X(c.Tolerance!.GrossForce));
                Exact.NormRelative(rule.DiagonalSquared, c.Tolerance.Diagonal, 1e-15);
                Exact.NormRelative(rule.WorstSquared, c.Residual!.WorstMomentNorm, 1e-12);
                AssertLoadedBoxAndAnchor(a, c.Original!);
                AssertLoadedBoxAndAnchor(b, c.Substitute!);
            }
        }, iter: 60);
    }

    [Fact]
    public void Compare_forcesRecombinedExactly_passWithOrWithoutAZeroForceFarAwayInEitherFile()
    {
        Gen.Select(DyadicSystem, Gen.Int[0, 7]).SampleSeeded((original, pick) =>
        {
            // The substitute is the original with each force split into its three components at the same point (and the
            // order reversed): R and M are exactly the same (SPEC §2, linearity of Σ and ×).
            Force[] substitute = [.. original.Reverse().SelectMany(f => new[]
            {
                new Force(f.At, V(f.Value.X, 0, 0)), new Force(f.At, V(0, f.Value.Y, 0)), new Force(f.At, V(0, 0, f.Value.Z)),
            })];
            ExactRule rule = ExactRule.Of(original, substitute);
            Assert.Equal(ExactRational.Zero, rule.WorstSquared);
            Assert.Equal(ExactRational.Zero, rule.ForceResidualSquared);
            foreach ((Force[] a, Force[] b, string where) in WithZeroForces(original, substitute))
            {
                CaseComparison c = CheckForces(a, b);
                Assert.True(c.Equivalent, $"zero force: {where}; {c.Residual}");
                Assert.Equal(rule.GrossForce, X(c.Tolerance!.GrossForce));
                AssertLoadedBoxAndAnchor(a, c.Original!);
                AssertLoadedBoxAndAnchor(b, c.Substitute!);
            }
        }, iter: 60);
    }

    // An equipment frame on four legs (invented for this test): support reactions 20, 15, 12.5 and 17.5 kN downwards at
    // the corners of a 4 m × 2.5 m plan. The substitute puts the 15 kN leg 0.3 m out of place in x.
    // By hand (SPEC §4): G_F = 65, D = √(4² + 2.5²) = √22.25, allowance 1e-3·65·√22.25 ≈ 0.3066 kN·m;
    // ΔM = 0.3·15 = 4.5 kN·m about y at every point (a couple) → FAIL. A zero item at (72, 30, 0) would make the union
    // box's diagonal about 78 m (allowance ≈ 5.1 kN·m, a false pass) if zero items counted as geometry.
    private static LoadItem[] Frame(bool misplaced) =>
    [
        new PointForce("A", V(0, 0, 0), V(0, 0, -20)),
        new PointForce("B", V(misplaced ? 4.3 : 4, 0, 0), V(0, 0, -15)),
        new PointForce("C", V(4, 2.5, 0), V(0, 0, -12.5)),
        new PointForce("D", V(0, 2.5, 0), V(0, 0, -17.5)),
    ];

    public static TheoryData<string, bool, bool> FrameZeroItems => new()
    {
        { "none", false, true },
        { "force (72, 30, 0)", false, true },
        { "force (72, 30, 0)", true, false },
        { "force (3000, 30, 0)", false, true },
        { "force (3000, 30, 0)", true, true },
        { "line (72, 30, 0) → (3000, 30, 0), zero intensity", false, true },
        { "area at x = 3000, zero pressure", true, false },
        { "mesh triangle at x = 3000, zero pressure", false, true },
    };

    private static LoadItem ZeroItem(string which) => which switch
    {
        "force (72, 30, 0)" => new PointForce("Z", V(72, 30, 0), Vector3.Zero),
        "force (3000, 30, 0)" => new PointForce("Z", V(3000, 30, 0), Vector3.Zero),
        "line (72, 30, 0) → (3000, 30, 0), zero intensity" => new LineLoad("Z", V(72, 30, 0), V(3000, 30, 0), Vector3.Zero, Vector3.Zero),
        "area at x = 3000, zero pressure" =>
            new AreaLoad("Z", [V(3000, 0, 0), V(3010, 0, 0), V(3010, 10, 0), V(3000, 10, 0)], 0, null, Vector3.Zero, V(3000, 0, 0)),
        _ => new MeshTriangle("Z", V(3000, 0, 0), V(3010, 0, 0), V(3000, 10, 0), 0, 0, 0, null),
    };

    [Theory]
    [MemberData(nameof(FrameZeroItems))]
    public void Compare_frameWithOneLegOutOfPlace_failsWhateverZeroItemIsAdded(string zero, bool inOriginal, bool inSubstitute)
    {
        LoadItem[] original = Frame(misplaced: false), substitute = Frame(misplaced: true);
        if (zero != "none")
        {
            // first, where it would have taken the anchor
            original = inOriginal ? [ZeroItem(zero), .. original] : original;
            substitute = inSubstitute ? [ZeroItem(zero), .. substitute] : substitute;
        }
        CaseComparison c = Check(ToleranceSpec.Default, V(2, 1.25, 0), original, substitute);

        Assert.False(c.Equivalent, c.ToString());
        Assert.Equal(65, c.Tolerance!.GrossForce);
        Exact.NormRelative(X(22.25), c.Tolerance.Diagonal, 1e-15);
        Close.Relative(1e-3 * 65 * Math.Sqrt(22.25), c.Tolerance.Moment, 1e-15);
        // ΔM_y = 15·(4.3 − 4) with the doubles as written (≈ 4.5), the same at every corner
        Exact.Relative(X(15) * (X(4.3) - X(4)), c.Residual!.WorstMomentNorm, 1e-14);
        Assert.Equal(0, c.Residual.ForceNorm);
        Assert.Equal(new Box(V(0, 0, 0), V(4, 2.5, 0)), c.Original!.Bounds);
        Assert.Equal(new Box(V(0, 0, 0), V(4.3, 2.5, 0)), c.Substitute!.Bounds);
        Assert.Equal(V(0, 0, 0), c.Original.Sums.Anchor);
        Assert.Equal(V(0, 0, 0), c.Substitute.Sums.Anchor);

        // the frame as it should be passes, with the same zero items
        LoadItem[] right = [.. substitute.Select(i => i.Id == "B" ? new PointForce("B", V(4, 0, 0), V(0, 0, -15)) : i)];
        Assert.True(Check(ToleranceSpec.Default, V(2, 1.25, 0), original, right).Equivalent);
    }
}
