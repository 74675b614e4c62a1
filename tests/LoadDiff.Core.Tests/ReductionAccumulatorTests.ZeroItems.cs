using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

/// <summary>
/// Items of zero magnitude are counted and nothing more (SPEC §4: "an item of zero magnitude … widens no box, here or
/// anywhere else"): no box, no anchor, no direction, on every path into the accumulator, the column kernel included.
/// Expected values are small dyadic numbers worked by hand or summed exactly in the test.
/// </summary>
public partial class ReductionAccumulatorTests
{
    private static readonly (Vector3 At, Vector3 Force)[] Loaded =
    [
        (Vector3.Create(0, 0, 0), Vector3.Create(0, 0, -10)),
        (Vector3.Create(2, 0, 0), Vector3.Create(0, 0, -20)),
        (Vector3.Create(0, 3, 0), Vector3.Create(0, 0, -4)),
        (Vector3.Create(4, 4, 1), Vector3.Create(0, 0, -0.5)),
        (Vector3.Create(-1, 0, 2), Vector3.Create(0, 0, -8)),
    ];

    private static (Vector3 At, Vector3 Force) ZeroAt(double x, double y, double z) => (Vector3.Create(x, y, z), Vector3.Zero);

    private static void AssertSameAsLoadedOnly(LoadReduction r, long count)
    {
        // By hand from Loaded: R = (0, 0, −42.5); box (−1,0,0)…(4,4,2); G_F = 42.5; all forces vertical (parallel).
        Assert.Equal(count, r.ItemCount);
        Assert.Equal(Vector3.Create(0, 0, -42.5), r.Force);
        Assert.Equal(new Box(Vector3.Create(-1, 0, 0), Vector3.Create(4, 4, 2)), r.Bounds);
        Assert.Equal(42.5, r.GrossForce);
        Assert.True(r.AllForcesParallel);
        // M about the reference point, exactly (SPEC §2)
        Exact.WithinUlps(ExactVector.MomentAbout(r.ReferencePoint, Loaded), r.Moment, 0);
    }

    [Fact]
    public void Add_zeroForceLineAreaTriangleAndCoupleFarAway_countedOnly()
    {
        var acc = new ReductionAccumulator();
        acc.Add(new PointForce("z", Vector3.Create(3000, 30, 0), Vector3.Zero));
        acc.Add(new LineLoad("w", Vector3.Create(72, 30, 0), Vector3.Create(3000, 30, 0), Vector3.Zero, Vector3.Zero));
        acc.Add(new AreaLoad("a", [Vector3.Create(1e6, 0, 0), Vector3.Create(1e6 + 10, 0, 0), Vector3.Create(1e6, 10, 0)], 0, null, Vector3.Zero, Vector3.Create(1e6, 0, 0)));
        acc.Add(new MeshTriangle("t", Vector3.Create(0, 1e6, 0), Vector3.Create(10, 1e6, 0), Vector3.Create(0, 1e6, 10), 0, 0, 0, null));
        acc.AddTriangle(Vector3.Create(0, 0, 1e6), Vector3.Create(10, 0, 1e6), Vector3.Create(0, 10, 1e6), 0, 0, 0, null);
        acc.AddPointForce(Vector3.Create(-3000, 0, 0), Vector3.Zero);
        acc.Add(new FreeCouple("c", Vector3.Zero));
        Assert.Null(acc.Anchor);
        Assert.Equal(7, acc.Count);
        LoadReduction empty = acc.ResultAt(Vector3.Zero);
        Assert.Null(empty.Bounds);
        Assert.Null(empty.Centroid);
        Assert.False(empty.AllForcesParallel);

        foreach ((Vector3 at, Vector3 f) in Loaded)
        {
            acc.AddPointForce(at, f);
        }
        Assert.Equal(Vector3.Create(0, 0, 0), acc.Anchor);
        AssertSameAsLoadedOnly(acc.ResultAt(Vector3.Create(1, 1, 1)), 12);
    }

    [Fact]
    public void Add_zeroItemsAfterLoadedOnes_changeNothingButTheCount()
    {
        var acc = new ReductionAccumulator();
        foreach ((Vector3 at, Vector3 f) in Loaded)
        {
            acc.Add(new PointForce("f", at, f));
        }
        // a horizontal zero force would also break "parallel" if its direction were tracked; a zero-intensity line has none
        acc.Add(new LineLoad("w", Vector3.Create(72, 30, 0), Vector3.Create(3000, 30, 0), Vector3.Zero, Vector3.Zero));
        acc.AddTriangle(Vector3.Create(0, 0, 1e6), Vector3.Create(10, 0, 1e6), Vector3.Create(0, 10, 1e6), 0, 0, 0, Vector3.UnitX);
        acc.Add(new AreaLoad("a", [Vector3.Create(3000, 0, 0), Vector3.Create(3010, 0, 0), Vector3.Create(3000, 10, 0)], 0, Vector3.UnitX, Vector3.Zero, Vector3.Zero));
        AssertSameAsLoadedOnly(acc.ResultAt(Vector3.Create(-2, 5, 0.5)), Loaded.Length + 3);
    }

    [Fact]
    public void Add_loadedAreaWithZeroPressureAtItsOrigin_isLoadedGeometry()
    {
        // p = 0 at the origin but a gradient: p(x) = 2x on the unit square at x ∈ [0, 1]: ∫|p| dA = 1 (by hand), so it is
        // loaded and its box counts. (Zero magnitude means ∫|p| = 0, not p0 = 0.)
        var area = new AreaLoad("a", [Vector3.Create(0, 0, 0), Vector3.Create(1, 0, 0), Vector3.Create(1, 1, 0), Vector3.Create(0, 1, 0)],
            0, null, Vector3.Create(2, 0, 0), Vector3.Zero);
        Assert.True(area.IsLoaded);
        var acc = new ReductionAccumulator();
        acc.Add(area);
        LoadReduction r = acc.ResultAt(Vector3.Zero);
        Assert.Equal(new Box(Vector3.Create(0, 0, 0), Vector3.Create(1, 1, 0)), r.Bounds);
        Assert.Equal(1, r.GrossForce, 14);
    }

    // ---- the column kernel ---------------------------------------------------------------------------------------

    private static double[][] ColumnsOf(IEnumerable<(Vector3 At, Vector3 Force)> rows) => Columns([.. rows]);

    public static TheoryData<string> ZeroRowLayouts => new() { "mixed", "first", "tail", "first five, then mixed" };

    private static (Vector3 At, Vector3 Force)[] Layout(string layout) => layout switch
    {
        // zeros between loaded rows, in the group of four and in the padded tail
        "mixed" => [Loaded[0], ZeroAt(3000, 30, 0), Loaded[1], Loaded[2], ZeroAt(1e6, 30, 0), Loaded[3], ZeroAt(72, 30, 0), Loaded[4]],
        // the first rows zero: the anchor and the direction must come from the first loaded row
        "first" => [ZeroAt(3000, 30, 0), ZeroAt(1e6, 0, 0), .. Loaded],
        "tail" => [.. Loaded, ZeroAt(3000, 30, 0), ZeroAt(1e6, 30, 0)],
        _ => [ZeroAt(3000, 30, 0), ZeroAt(1e6, 0, 0), ZeroAt(-1e6, 0, 0), ZeroAt(0, 3000, 0), ZeroAt(0, 0, 3000),
            Loaded[0], Loaded[1], ZeroAt(72, 30, 0), Loaded[2], Loaded[3], Loaded[4]],
    };

    [Theory]
    [MemberData(nameof(ZeroRowLayouts))]
    public void AddPointForces_zeroRows_sameBoundsAnchorAndResultAsWithoutThem(string layout)
    {
        (Vector3 At, Vector3 Force)[] rows = Layout(layout);
        var acc = new ReductionAccumulator();
        double[][] c = ColumnsOf(rows);
        Assert.True(AddColumns(acc, c));
        Assert.Equal(Loaded[0].At, acc.Anchor);
        AssertSameAsLoadedOnly(acc.ResultAt(Vector3.Create(3, -1, 2)), rows.Length);
        // |F| per row as Vector3.Length gives it: 0 for the zero rows
        Assert.Equal(rows.Select(r => r.Force.Length), c[6].Take(rows.Length));
    }

    [Fact]
    public void AddPointForces_allZeroBatch_countedOnly_thenTheNextBatchAnchorsAtItsFirstLoadedRow()
    {
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, ColumnsOf([ZeroAt(3000, 30, 0), ZeroAt(1e6, 0, 0), ZeroAt(1, 2, 3), ZeroAt(-5, 0, 0), ZeroAt(0, 0, 9)])));
        Assert.Null(acc.Anchor);
        Assert.Equal(5, acc.Count);
        LoadReduction none = acc.ResultAt(Vector3.Zero);
        Assert.Null(none.Bounds);
        Assert.Equal(Vector3.Zero, none.Force);
        Assert.Equal(0, none.GrossForce);
        Assert.False(none.AllForcesParallel);

        Assert.True(AddColumns(acc, ColumnsOf([ZeroAt(-3000, 0, 0), .. Loaded])));
        Assert.Equal(Loaded[0].At, acc.Anchor);
        AssertSameAsLoadedOnly(acc.ResultAt(Vector3.Create(0.5, 0.25, -1)), 5 + 1 + Loaded.Length);

        // and an all-zero batch after loaded rows changes nothing but the count
        Assert.True(AddColumns(acc, ColumnsOf([ZeroAt(1e6, 1e6, 1e6), ZeroAt(-1e6, 0, 0)])));
        AssertSameAsLoadedOnly(acc.ResultAt(Vector3.Create(0.5, 0.25, -1)), 5 + 1 + Loaded.Length + 2);
    }

    [Fact]
    public void AddPointForces_zeroRowsFarAwayFirst_resultDoesNotLoseTheDigitsOfAFarAnchor()
    {
        // Loaded rows near the origin with decimal coordinates (not dyadic). Were the anchor taken at the zero row at
        // 1e6 m, each lever arm r − anchor would be rounded to ulp(1e6) ≈ 1.2e-10 m in the kernel. The result must match
        // the exact moment of the loaded rows alone (SPEC §2) to a few ulp.
        (Vector3 At, Vector3 Force)[] loaded =
        [
            (Vector3.Create(0.1, 0.7, 0.3), Vector3.Create(1.1, -2.3, 0.7)),
            (Vector3.Create(-0.3, 0.2, 0.9), Vector3.Create(-0.6, 0.4, 3.3)),
            (Vector3.Create(0.55, -0.45, 0.05), Vector3.Create(2.2, 1.9, -0.1)),
        ];
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, ColumnsOf([ZeroAt(1e6 + 0.1, 1e6 + 0.7, 0.3), ZeroAt(-1e6, 3e5, 7), .. loaded])));
        Assert.Equal(loaded[0].At, acc.Anchor);
        LoadReduction r = acc.ResultAt(Vector3.Create(0.2, 0.1, 0));
        Exact.WithinUlps(ExactVector.MomentAbout(Vector3.Create(0.2, 0.1, 0), loaded), r.Moment, 2);
        Exact.WithinUlps(ExactVector.Resultant(loaded), r.Force, 1);
        Assert.Equal(new Box(Vector3.Create(-0.3, -0.45, 0.05), Vector3.Create(0.55, 0.7, 0.9)), r.Bounds);
    }

    [Fact]
    public void AddPointForces_zeroRowsFirst_directionFromTheFirstLoadedRow()
    {
        // Parallel system (all along (1, 2, 2)); the zero rows first have no direction of their own.
        (Vector3 At, Vector3 Force)[] rows =
        [
            ZeroAt(3000, 0, 0), ZeroAt(0, 3000, 0),
            (Vector3.Create(1, 0, 0), Vector3.Create(1, 2, 2)), (Vector3.Create(0, 1, 0), Vector3.Create(-2, -4, -4)),
            (Vector3.Create(0, 0, 1), Vector3.Create(0.5, 1, 1)),
        ];
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, ColumnsOf(rows)));
        LoadReduction r = acc.ResultAt(Vector3.Zero);
        Assert.True(r.AllForcesParallel);
        Assert.Equal(new Box(Vector3.Zero, Vector3.Create(1, 1, 1)), r.Bounds);
        // G_F = 3 + 6 + 1.5 (|(1, 2, 2)| = 3)
        Assert.Equal(10.5, r.GrossForce);
    }
}
