using LoadDiff.Core.Loads;
using LoadDiff.Core.Sections;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

// Expected values here are exact arithmetic by hand (derivations beside each case) and the side rule stated in
// HalfSpaceClip's remarks: a point or geometry exactly on the cut plane counts as on the negative side.
public class HalfSpaceClipTests
{
    private static readonly SectionAxis AlongX = SectionAxis.Create(Vector3.Zero, V(1, 0, 0));
    private static readonly SectionAxis AlongY = SectionAxis.Create(Vector3.Zero, V(0, 1, 0));

    [Fact]
    public void NegativeSide_nullItemOrAxisOrNaNStation_isRefused()
    {
        var f = new PointForce("f", V(0, 0, 0), V(0, 0, -1));
        Assert.Throws<ArgumentNullException>(() => HalfSpaceClip.NegativeSide(null!, AlongX, 0));
        Assert.Throws<ArgumentNullException>(() => HalfSpaceClip.NegativeSide(f, null!, 0));
        Assert.Throws<ArgumentException>(() => HalfSpaceClip.NegativeSide(f, AlongX, double.NaN));
    }

    [Fact]
    public void StationRange_nullItemOrAxis_isRefused_andAFreeCoupleHasNoRange()
    {
        Assert.Throws<ArgumentNullException>(() => HalfSpaceClip.StationRange(null!, AlongX));
        Assert.Throws<ArgumentNullException>(() => HalfSpaceClip.StationRange(new FreeCouple("c", V(0, 1, 0)), null!));
        // A free couple has no geometry (no position), so it has no station range.
        Assert.Null(HalfSpaceClip.StationRange(new FreeCouple("c", V(0, 1, 0)), AlongX));
    }

    [Fact]
    public void NegativeSide_pointMassBeforeOnAndBeyondTheCut_keptOnlyUpToAndAtTheStation()
    {
        var m = new PointMass("m", V(2, 0, 0), 10, V(0, 0, -9.81));
        Assert.Same(m, Assert.Single(HalfSpaceClip.NegativeSide(m, AlongX, 3)));
        // Exactly at the station: on the negative side by the side rule.
        Assert.Same(m, Assert.Single(HalfSpaceClip.NegativeSide(m, AlongX, 2)));
        Assert.Empty(HalfSpaceClip.NegativeSide(m, AlongX, 1));
    }

    [Fact]
    public void NegativeSide_lineLoadEndingExactlyAtTheCut_isKeptWholeAsTheSameItem()
    {
        // From x = 0 to x = 4, cut at 4: the whole load is on the negative side and is returned as it is, not rebuilt.
        var w = new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 0, -1), V(0, 0, -3));
        Assert.Same(w, Assert.Single(HalfSpaceClip.NegativeSide(w, AlongX, 4)));
    }

    [Fact]
    public void NegativeSide_lineLoadStartingExactlyAtTheCut_leavesNothing()
    {
        var w = new LineLoad("w", V(4, 0, 0), V(8, 0, 0), V(0, 0, -1), V(0, 0, -3));
        Assert.Empty(HalfSpaceClip.NegativeSide(w, AlongX, 4));
    }

    [Fact]
    public void NegativeSide_cutWhoseOffsetVanishesInTheCoordinates_leavesNoZeroLengthPart()
    {
        // Axis origin at x = 10⁶, load from 10⁶ to 10⁶ + 1, cut at station 10⁻²⁰: the cut point 10⁶ + 10⁻²⁰ rounds to
        // 10⁶ (spacing of doubles there ≈ 1.2·10⁻¹⁰), so the kept part would have zero length and is dropped.
        var axis = SectionAxis.Create(V(1e6, 0, 0), V(1, 0, 0));
        var w = new LineLoad("w", V(1e6, 0, 0), V(1e6 + 1, 0, 0), V(0, 0, -1), V(0, 0, -1));
        Assert.Empty(HalfSpaceClip.NegativeSide(w, axis, 1e-20));
    }

    [Fact]
    public void NegativeSide_areaWhollyInsideTouchingOrBeyondTheCut_keptWholeOrDropped()
    {
        var square = new AreaLoad("sq", [V(0, 0, 0), V(2, 0, 0), V(2, 2, 0), V(0, 2, 0)], 1, V(0, 0, -1), Vector3.Zero, Vector3.Zero);
        Assert.Same(square, Assert.Single(HalfSpaceClip.NegativeSide(square, AlongX, 3)));
        // Highest station exactly at the cut: whole, and the same item (no clipping happened).
        Assert.Same(square, Assert.Single(HalfSpaceClip.NegativeSide(square, AlongX, 2)));
        Assert.Empty(HalfSpaceClip.NegativeSide(square, AlongX, -1));
    }

    [Fact]
    public void NegativeSide_triangleWhollyInsideTouchingOrBeyondTheCut_keptWholeOrDropped()
    {
        var t = new MeshTriangle("t", V(0, 0, 0), V(2, 0, 0), V(0, 2, 0), 1, 1, 1, null);
        Assert.Same(t, Assert.Single(HalfSpaceClip.NegativeSide(t, AlongX, 3)));
        Assert.Same(t, Assert.Single(HalfSpaceClip.NegativeSide(t, AlongX, 2)));
        Assert.Empty(HalfSpaceClip.NegativeSide(t, AlongX, -1));
    }

    [Fact]
    public void NegativeSide_diamondWithTwoVerticesOnTheCut_keepsExactlyThreeVerticesWithoutDoubles()
    {
        // Diamond P0 (0,0), P1 (1,−1), P2 (2,0), P3 (1,1), cut at x = 1. By hand (Sutherland–Hodgman, vertex on the
        // plane kept, intersection only on a strict crossing): edges P0→P1 keep P1, P1→P2 nothing, P2→P3 keep P3,
        // P3→P0 keep P0. Result [P1, P3, P0]: the triangle x ≤ 1 of the diamond, no vertex doubled.
        var diamond = new AreaLoad("d", [V(0, 0, 0), V(1, -1, 0), V(2, 0, 0), V(1, 1, 0)], 1, V(0, 0, -1), Vector3.Zero, Vector3.Zero);
        var part = Assert.IsType<AreaLoad>(Assert.Single(HalfSpaceClip.NegativeSide(diamond, AlongX, 1)));
        Assert.Equal([V(1, -1, 0), V(1, 1, 0), V(0, 0, 0)], part.Polygon.ToArray());
    }

    [Fact]
    public void NegativeSide_triangleCutIntoAQuadrilateral_fansIntoTwoTriangles()
    {
        // A (−1,0), B (1,−1), C (−1,2), cut at y = 1. By hand: edge A→B keeps B; B→C crosses at t = 2/3, X = (−1/3, 1);
        // C→A crosses at t = 1/2, Y = (−1, 1) exactly; A kept. Kept [B, X, Y, A], fanned from B: (B, X, Y), (B, Y, A),
        // both of non-zero area. Y = −B, so a fan test on sums instead of differences would see zero and drop one.
        var t = new MeshTriangle("t", V(-1, 0, 0), V(1, -1, 0), V(-1, 2, 0), 1, 1, 1, V(0, 0, -1));
        var parts = HalfSpaceClip.NegativeSide(t, AlongY, 1).Cast<MeshTriangle>().ToArray();
        Assert.Equal(2, parts.Length);
        Assert.Equal(V(1, -1, 0), parts[0].A);
        Assert.Equal(V(-1, 1, 0), parts[0].C);
        Assert.Equal(V(1, -1, 0), parts[1].A);
        Assert.Equal(V(-1, 1, 0), parts[1].B);
        Assert.Equal(V(-1, 0, 0), parts[1].C);
    }
}
