using System.Globalization;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The rounding-noise floor, worked by hand from its definition (RoundingNoise, SPEC §4): 1e-12 times the smaller gross
/// force, and 1e-12 times the smaller Σ|C| + G_F·reach, reach = a system's own loaded box diagonal plus its largest
/// corner distance from the origin (the smaller, so that neither file can widen the floor). The 1e-12 is the project's rounding threshold (WrenchAnalysis.RoundingThreshold), not an
/// engineering tolerance. Every length below is a Pythagorean quadruple, so the numbers are exact.
/// </summary>
public class RoundingNoiseTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    // a: |(1,2,2)| = 3 at (−2,−3,−6) and |(2,3,6)| = 7 at (2,3,6): G_F = 10, box (−2,−3,−6)…(2,3,6).
    private static LoadReduction A(Vector3 couple) => Reduce.About(V(0, 0, 0),
        new PointForce("p", V(-2, -3, -6), V(1, 2, 2)), new PointForce("q", V(2, 3, 6), V(2, 3, 6)), new FreeCouple("c", couple));

    // b: |(2,6,9)| = 11 at (4,6,12): G_F = 11.
    private static LoadReduction B(Vector3 couple) => Reduce.About(V(0, 0, 0), new PointForce("r", V(4, 6, 12), V(2, 6, 9)), new FreeCouple("c", couple));

    // a's box (−2,−3,−6)…(2,3,6): diagonal |(4,6,12)| = 14, largest corner 7, reach 21; b's box is the point (4,6,12):
    // diagonal 0, |(4,6,12)| = 14, reach 14.

    [Fact]
    public void Of_twoReductions_theSmallerOfEachGoverns()
    {
        // a: Σ|C| = |(1,4,8)| = 9, 9 + 10·21 = 219; b: Σ|C| = |(1,2,2)| = 3, 3 + 11·14 = 157. Force: min(10, 11) = 10.
        RoundingNoise n = RoundingNoise.Of(A(V(1, 4, 8)), B(V(1, 2, 2)));
        Assert.Equal(1e-12 * 10, n.Force);
        Assert.Equal(1e-12 * 157, n.Moment);
    }

    [Fact]
    public void Of_twoReductions_aLargerCoupleWidensNothing_andTheOrderDoesNotMatter()
    {
        // a: Σ|C| = |(18,54,81)| = 99, 99 + 10·21 = 309 > b's 157, so b's 157 stays; the force noise is a's 10.
        RoundingNoise n = RoundingNoise.Of(A(V(18, 54, 81)), B(V(1, 2, 2)));
        Assert.Equal(1e-12 * 10, n.Force);
        Assert.Equal(1e-12 * 157, n.Moment);
        Assert.Equal(n, RoundingNoise.Of(B(V(1, 2, 2)), A(V(18, 54, 81))));
    }

    [Fact]
    public void Of_bothSystemsMirroredThroughTheOrigin_sameNoise()
    {
        // Negating every position: the union box becomes (−4,−6,−12)…(2,3,6); each system's own box keeps its diagonal
        // and its far corner's distance (a: 14 + 7, b: 0 + 14), so the noise is as before.
        static LoadItem Mirror(LoadItem i) => Systems.Map(i, v => -v, Vector3.Zero);
        LoadReduction a = Reduce.About(V(0, 0, 0), new PointForce("p", V(2, 3, 6), V(1, 2, 2)), new PointForce("q", V(-2, -3, -6), V(2, 3, 6)), new FreeCouple("c", V(1, 4, 8)));
        LoadReduction b = Reduce.About(V(0, 0, 0), Mirror(new PointForce("r", V(4, 6, 12), V(2, 6, 9))), new FreeCouple("c", V(1, 2, 2)));
        Assert.Equal(new Box(V(-4, -6, -12), V(2, 3, 6)), Box.Union(a.Bounds, b.Bounds));
        RoundingNoise n = RoundingNoise.Of(a, b);
        Assert.Equal(1e-12 * 10, n.Force);
        Assert.Equal(1e-12 * 157, n.Moment); // b: 3 + 11·14
    }

    [Fact]
    public void Of_boxOfOneSystemOnly_theCouplesOnlySystemGoverns()
    {
        // b alone has a box (3 + 11·14 = 157); a is couples only (no box): 9. The smaller, 9, in either order.
        LoadReduction couples = Reduce.About(V(0, 0, 0), new FreeCouple("c", V(1, 4, 8)));
        Assert.Equal(1e-12 * 9, RoundingNoise.Of(couples, B(V(1, 2, 2))).Moment);
        Assert.Equal(1e-12 * 9, RoundingNoise.Of(B(V(1, 2, 2)), couples).Moment);
        // neither has a box: reach 0, only the couples remain
        Assert.Equal(1e-12 * 9, RoundingNoise.Of(couples, couples).Moment);
        Assert.Equal(0, RoundingNoise.Of(couples, couples).Force);
    }

    [Fact]
    public void Of_oneReduction_aboutItsReferencePoint()
    {
        // a about the origin: corners (±2,±3,±6) all 7 away, MomentScale = 9 + 10·7 = 79; LengthScale = max(|P| = 0,
        // D = |(4,6,12)| = 14, 7) = 14, G_F·14 = 140 → 1.4e-10.
        LoadReduction a = A(V(1, 4, 8));
        Assert.Equal(new RoundingNoise(1e-12 * 10, 1e-12 * 140), RoundingNoise.Of(a));
        // about (−2,−3,−6): the far corner (2,3,6) is 14 away, MomentScale = 9 + 140 = 149 > LengthScale term 140
        Assert.Equal(new RoundingNoise(1e-12 * 10, 1e-12 * 149), RoundingNoise.Of(a.At(V(-2, -3, -6))));
    }

    [Fact]
    public void MomentAt_distance_addsForceNoiseTimesDistance()
    {
        var n = new RoundingNoise(1e-11, 2e-10);
        Assert.Equal(2e-10 + (1e-11 * 100), n.MomentAt(100));
        Assert.Equal(2e-10, n.MomentAt(0));
    }

    [Fact]
    public void IsForceNoise_atAndBeyondTheFloor()
    {
        var n = new RoundingNoise(1e-11, 2e-10);
        Assert.True(n.IsForceNoise(1e-11));
        Assert.True(n.IsForceNoise(-1e-11));
        Assert.True(n.IsForceNoise(0));
        Assert.False(n.IsForceNoise(Math.BitIncrement(1e-11)));
        Assert.False(n.IsForceNoise(-Math.BitIncrement(1e-11)));
    }

    [Fact]
    public void None_isZero()
    {
        Assert.Equal(0, RoundingNoise.None.Force);
        Assert.Equal(0, RoundingNoise.None.Moment);
    }

    [Fact]
    public void Of_nullArguments_refused()
    {
        LoadReduction a = A(V(1, 4, 8));
        Assert.Equal("a", Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(null!, a)).ParamName);
        Assert.Equal("b", Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(a, null!)).ParamName);
        Assert.Equal("r", Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(null!)).ParamName);
    }

    [Fact]
    public void ToString_germanCulture_invariantRoundTrip()
    {
        // STYLE: ToString() invariant and round-tripping ("R"), never the current culture
        var n = new RoundingNoise(1.5e-11, 2.25e-10);
        using var scope = new CultureScope("de-DE");
        string s = n.ToString();
        Assert.Contains(1.5e-11.ToString("R", CultureInfo.InvariantCulture), s, StringComparison.Ordinal);
        Assert.Contains(2.25e-10.ToString("R", CultureInfo.InvariantCulture), s, StringComparison.Ordinal);
        Assert.Contains("force", s, StringComparison.Ordinal);
        Assert.Contains("moment", s, StringComparison.Ordinal);
    }
}
