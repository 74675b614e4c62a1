using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

/// <summary>What every load kind tells the reduction besides its integrals: kind, geometry, direction, text.</summary>
public class LoadItemTests
{
    private static readonly Vector3 Down = V(0, 0, -1);

    [Fact]
    public void Kind_eachItem_namesItsOwnKind()
    {
        Assert.Equal(LoadKind.Force, new PointForce("p", V(0, 0, 0), Down).Kind);
        Assert.Equal(LoadKind.Couple, new FreeCouple("c", V(0, 0, 1)).Kind);
        Assert.Equal(LoadKind.Line, new LineLoad("w", V(0, 0, 0), V(1, 0, 0), Down, Down).Kind);
        Assert.Equal(LoadKind.Area, new AreaLoad("a", [V(0, 0, 0), V(1, 0, 0), V(0, 1, 0)], 1, null, V(0, 0, 0), V(0, 0, 0)).Kind);
        Assert.Equal(LoadKind.Mass, new PointMass("m", V(0, 0, 0), 1, Down).Kind);
        Assert.Equal(LoadKind.MeshTriangle, new MeshTriangle("t", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 1, 1, 1, null).Kind);
    }

    [Fact]
    public void VisitGeometry_eachItem_visitsItsDefiningPointsInOrder()
    {
        static List<Vector3> Points(LoadItem item)
        {
            var seen = new List<Vector3>();
            item.VisitGeometry(seen.Add);
            return seen;
        }
        Assert.Equal([V(1, 2, 3)], Points(new PointForce("p", V(1, 2, 3), Down)));
        Assert.Equal([V(1, 2, 3)], Points(new PointMass("m", V(1, 2, 3), 5, Down)));
        Assert.Empty(Points(new FreeCouple("c", V(0, 0, 1))));
        Assert.Equal([V(1, 0, 0), V(4, 0, 0)], Points(new LineLoad("w", V(1, 0, 0), V(4, 0, 0), Down, Down)));
        Assert.Equal([V(0, 0, 0), V(2, 0, 0), V(2, 1, 0), V(0, 1, 0)],
            Points(new AreaLoad("a", [V(0, 0, 0), V(2, 0, 0), V(2, 1, 0), V(0, 1, 0)], 1, null, V(0, 0, 0), V(0, 0, 0))));
        Assert.Equal([V(0, 0, 0), V(3, 0, 0), V(0, 3, 0)], Points(new MeshTriangle("t", V(0, 0, 0), V(3, 0, 0), V(0, 3, 0), 1, 1, 1, null)));
    }

    [Fact]
    public void IsLoaded_zeroAndNonZeroMagnitudes_followTheGrossMagnitude()
    {
        // LoadItem.IsLoaded: an item is loaded exactly when its gross magnitude (Σ|F|, ∫|w| or |C|) is not zero.
        Assert.True(new FreeCouple("c", V(0, 0, 1)).IsLoaded);
        Assert.False(new FreeCouple("c", V(0, 0, 0)).IsLoaded);
        Assert.True(new PointMass("m", V(1, 1, 1), 2, Down).IsLoaded);
        Assert.False(new PointMass("m", V(1, 1, 1), 0, Down).IsLoaded);
        Assert.True(new LineLoad("w", V(0, 0, 0), V(1, 0, 0), V(0, 0, 0), Down).IsLoaded);
        Assert.False(new LineLoad("w", V(0, 0, 0), V(1, 0, 0), V(0, 0, 0), V(0, 0, 0)).IsLoaded);
        Assert.True(new MeshTriangle("t", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 0, 0, -1, null).IsLoaded);
        Assert.False(new MeshTriangle("t", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 0, 0, 0, null).IsLoaded);
        Assert.True(new PointForce("p", V(0, 0, 0), Down).IsLoaded);
        Assert.False(new PointForce("p", V(0, 0, 0), V(0, 0, 0)).IsLoaded);
    }

    [Fact]
    public void PointMass_weightTimesGravity_forceAndMomentOfMG()
    {
        // SPEC §2: a mass's force is m·g. 1200 kg under g_n = 9.80665 m/s² (3rd CGPM) at (2, 3, 0):
        // F = (0, 0, −11767.98) N; about (1, 1, 0): (1, 2, 0) × F = (2·Fz, −1·Fz, 0) = (−23535.96, 11767.98, 0).
        var m = new PointMass("m", V(2, 3, 0), 1200, V(0, 0, -9.80665));
        Assert.Equal(V(0, 0, -1200 * 9.80665), m.Weight);
        Contribution c = m.ContributionAbout(V(1, 1, 0));
        Close.Relative(V(0, 0, -11767.98), c.Force, 1e-15);
        Close.Relative(V(-23535.96, 11767.98, 0), c.Moment, 1e-15);
        Close.Relative(11767.98, c.GrossForce, 1e-15);
        Close.Relative(V(11767.98, 2 * 11767.98, 0), c.GrossFirstMoment, 1e-15);
        Assert.Equal(0, c.GrossCouple);
    }

    [Fact]
    public void FreeCouple_contribution_sameMomentAboutEveryPointAndItsNormAsGrossCouple()
    {
        // A couple's moment does not depend on the point (any statics text); |(0, 3, 4)| = 5.
        var c = new FreeCouple("c", V(0, 3, 4));
        foreach (Vector3 p in new[] { V(0, 0, 0), V(7, -2, 1e6) })
        {
            Contribution k = c.ContributionAbout(p);
            Assert.Equal(V(0, 0, 0), k.Force);
            Assert.Equal(V(0, 3, 4), k.Moment);
            Assert.Equal(0, k.GrossForce);
            Assert.Equal(V(0, 0, 0), k.GrossFirstMoment);
            Assert.Equal(5, k.GrossCouple);
        }
    }

    [Fact]
    public void AllForcesParallel_parallelItemsOfEveryKind_true()
    {
        // Every force below is along ±z: a downward point force, mass under −z gravity, a line load of ±z intensity,
        // a horizontal area and a horizontal mesh triangle (normal ±z) and a couple (no force at all).
        LoadReduction r = Reduce.About(V(0, 0, 0),
            new PointForce("p", V(0, 0, 0), V(0, 0, -3)),
            new PointMass("m", V(1, 0, 0), 2, V(0, 0, -9.80665)),
            new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 0, -2), V(0, 0, 6)),
            new AreaLoad("a", [V(0, 0, 0), V(1, 0, 0), V(0, 1, 0)], 1, null, V(0, 0, 0), V(0, 0, 0)),
            new MeshTriangle("t", V(0, 0, 1), V(0, 1, 1), V(1, 0, 1), 1, 2, 3, null),
            new FreeCouple("c", V(1, 0, 0)));
        Assert.True(r.AllForcesParallel);
    }

    [Theory]
    [MemberData(nameof(TiltedItems))]
    public void AllForcesParallel_oneItemOffTheVertical_false(LoadItem tilted)
    {
        // A downward point force first, then an item whose force is not along z.
        Assert.False(Reduce.About(V(0, 0, 0), new PointForce("p", V(0, 0, 0), V(0, 0, -3)), tilted).AllForcesParallel);
        // The same item alone: parallel unless the item's own forces differ in direction.
        Assert.True(Reduce.About(V(0, 0, 0), tilted).AllForcesParallel);
    }

    public static TheoryData<LoadItem> TiltedItems() => new()
    {
        new PointMass("m", V(1, 0, 0), 2, V(0, 1, -9.80665)),
        new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 1, -2), V(0, 2, -4)),
        new AreaLoad("a", [V(0, 0, 0), V(1, 0, 0), V(0, 0, 1)], 1, null, V(0, 0, 0), V(0, 0, 0)), // normal −y
        new AreaLoad("d", [V(0, 0, 0), V(1, 0, 0), V(0, 1, 0)], 1, V(1, 0, 0), V(0, 0, 0), V(0, 0, 0)), // given direction +x
        new MeshTriangle("t", V(0, 0, 0), V(1, 0, 0), V(0, 0, 1), 1, 2, 3, null),
        new MeshTriangle("u", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 1, 2, 3, V(1, 1, 0)),
    };

    [Fact]
    public void AllForcesParallel_lineLoadWhoseIntensityTurns_falseEvenAlone()
    {
        // w from −z to +x: the force per length changes direction along the span, so the item alone is not parallel.
        Assert.False(Reduce.About(V(0, 0, 0), new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 0, -2), V(3, 0, 0))).AllForcesParallel);
        Assert.False(Reduce.About(V(0, 0, 0), new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(3, 0, 0), V(0, 0, -2))).AllForcesParallel);
    }

    [Fact]
    public void ToString_eachItem_kindIdAndDefiningValues()
    {
        // Text for messages; numbers round-trip ("R", invariant culture).
        Assert.Equal("force p at (1, 2, 3): (0, 0, -1)", new PointForce("p", V(1, 2, 3), Down).ToString());
        Assert.Equal("couple c: (0, 3, 4)", new FreeCouple("c", V(0, 3, 4)).ToString());
        Assert.Equal("mass m at (1, 2, 3): 0.1", new PointMass("m", V(1, 2, 3), 0.1, Down).ToString());
        Assert.Equal("line w (0, 0, 0) → (4, 0, 0): (0, 0, -2) → (0, 0, 6)",
            new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 0, -2), V(0, 0, 6)).ToString());
        Assert.Equal("area a: 3 vertices, p = 1.5",
            new AreaLoad("a", [V(0, 0, 0), V(1, 0, 0), V(0, 1, 0)], 1.5, null, V(0, 0, 0), V(0, 0, 0)).ToString());
        Assert.Equal("mesh triangle t (0, 0, 0) (1, 0, 0) (0, 1, 0)",
            new MeshTriangle("t", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 1, 1, 1, null).ToString());
        using var scope = new CultureScope("de-DE");
        Assert.Equal("mass m at (1, 2, 3): 0.1", new PointMass("m", V(1, 2, 3), 0.1, Down).ToString());
        Assert.Equal("area a: 3 vertices, p = 1.5",
            new AreaLoad("a", [V(0, 0, 0), V(1, 0, 0), V(0, 1, 0)], 1.5, null, V(0, 0, 0), V(0, 0, 0)).ToString());
    }
}
