using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests;

public partial class ReductionAccumulatorTests
{
    private static double[][] Columns(params (Vector3 At, Vector3 Force)[] rows)
    {
        var c = new double[7][];
        for (int k = 0; k < 7; k++)
        {
            c[k] = new double[rows.Length];
        }
        for (int i = 0; i < rows.Length; i++)
        {
            (c[0][i], c[1][i], c[2][i]) = (rows[i].At.X, rows[i].At.Y, rows[i].At.Z);
            (c[3][i], c[4][i], c[5][i]) = (rows[i].Force.X, rows[i].Force.Y, rows[i].Force.Z);
        }
        return c;
    }

    private static bool AddColumns(ReductionAccumulator acc, double[][] c) =>
        acc.AddPointForces(c[0], c[1], c[2], c[3], c[4], c[5], c[6]);

    [Fact]
    public void AddPointForces_dyadicForces_exactResultantMomentBoundsAndCount()
    {
        // Small integers and halves: every product and sum is exact, so R, M about the anchor and the box are
        // known exactly by hand. Seven rows: one group of four lanes and a padded tail of three.
        var c = Columns(
            (Vector3.Create(0, 0, 0), Vector3.Create(0, 0, -10)),
            (Vector3.Create(2, 0, 0), Vector3.Create(0, 0, -20)),
            (Vector3.Create(0, 3, 0), Vector3.Create(1, 0, 0)),
            (Vector3.Create(4, 4, 1), Vector3.Create(0, 0.5, 0)),
            (Vector3.Create(-1, 0, 2), Vector3.Create(0, 0, -4)),
            (Vector3.Create(1, 1, 1), Vector3.Create(0, 0, 0)),
            (Vector3.Create(0, -2, 0), Vector3.Create(0, 0, 8)));
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, c));
        LoadReduction r = acc.ResultAt(Vector3.Zero);
        Assert.Equal(7, r.ItemCount);
        Assert.Equal(Vector3.Create(1, 0.5, -26), r.Force);
        // M = Σ r × F, row by row: (0,0,0); (0,40,0); (0,0,−3); (−0.5,0,2); (0,−4,0); 0; (−16,0,0)
        Assert.Equal(Vector3.Create(-16.5, 36, -1), r.Moment);
        Assert.Equal(Vector3.Create(-1, -2, 0), r.Bounds!.Min);
        Assert.Equal(Vector3.Create(4, 4, 2), r.Bounds.Max);
        // G_F = 10 + 20 + 1 + 0.5 + 4 + 0 + 8
        Assert.Equal(43.5, r.GrossForce);
        Assert.False(r.AllForcesParallel);
        Assert.Equal(0.5, c[6][3]);
        Assert.Equal(0, c[6][5]);
    }

    [Fact]
    public void AddPointForces_forcesAllAlongOneLine_areParallel_andOneTiltedForceIsNot()
    {
        var rows = Enumerable.Range(0, 10).Select(i => (Vector3.Create(i, 2 * i, 0), Vector3.Create(0, 0, -1 - i))).ToArray();
        var parallel = new ReductionAccumulator();
        Assert.True(AddColumns(parallel, Columns(rows)));
        Assert.True(parallel.ResultAt(Vector3.Zero).AllForcesParallel);

        // a lateral part of 1e-6 of the force is far beyond the 1e-9 tolerance
        rows[6] = (rows[6].Item1, Vector3.Create(1e-6 * 7, 0, -7));
        var tilted = new ReductionAccumulator();
        Assert.True(AddColumns(tilted, Columns(rows)));
        Assert.False(tilted.ResultAt(Vector3.Zero).AllForcesParallel);
    }

    [Fact]
    public void AddPointForces_tinyForce_magnitudeWithoutUnderflow()
    {
        // (3, 4, 0)·2⁻⁵⁴⁰ has length 5·2⁻⁵⁴⁰ exactly (Pythagoras); its squares underflow to zero in double.
        double t = Math.ScaleB(1, -540);
        var c = Columns((Vector3.Create(1, 0, 0), Vector3.Create(3 * t, 4 * t, 0)));
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, c));
        Assert.Equal(5 * t, c[6][0]);
        Assert.Equal(5 * t, acc.ResultAt(Vector3.Zero).GrossForce);
    }

    [Fact]
    public void AddPointForces_overflowingMoment_refusedAndNothingAdded()
    {
        // 1e200 m × 1e200 N overflows the range of double (about 1.8e308)
        var c = Columns((Vector3.Create(0, 0, 0), Vector3.Create(0, 0, 1)), (Vector3.Create(1e200, 0, 0), Vector3.Create(0, 1e200, 0)));
        var acc = new ReductionAccumulator();
        Assert.False(AddColumns(acc, c));
        Assert.Equal(0, acc.Count);
        Assert.Null(acc.Anchor);
    }

    [Fact]
    public void AddPointForces_columnsOfDifferentLengths_refused()
    {
        var acc = new ReductionAccumulator();
        double[] three = [1, 2, 3], two = [1, 2];
        // each of the five columns after x, one at a time, and a magnitudes span shorter than the rows
        for (int k = 1; k < 6; k++)
        {
            double[][] c = [three, three, three, three, three, three];
            c[k] = two;
            Assert.Throws<ArgumentException>(() => acc.AddPointForces(c[0], c[1], c[2], c[3], c[4], c[5], new double[3]));
        }
        Assert.Throws<ArgumentException>(() => acc.AddPointForces(three, three, three, three, three, three, new double[2]));
        // a longer magnitudes span is allowed (a reused buffer)
        Assert.True(acc.AddPointForces(three, three, three, three, three, three, new double[4]));
        Assert.Equal(3, acc.Count);
        acc = new ReductionAccumulator();
        Assert.True(acc.AddPointForces([], [], [], [], [], [], []));
        Assert.Equal(0, acc.Count);
    }

    [Fact]
    public void AddPointForces_afterAnchoredItems_movesTheirMomentsLikeOneAtATime()
    {
        // The anchor is set by the first item before the columns arrive; the result about another point must
        // follow M_P = Σ (r_i − P) × F_i, here in small integers (exact).
        var acc = new ReductionAccumulator();
        acc.AddPointForce(Vector3.Create(5, 0, 0), Vector3.Create(0, 0, -2));
        Assert.True(AddColumns(acc, Columns((Vector3.Create(0, 1, 0), Vector3.Create(3, 0, 0)), (Vector3.Create(1, 1, 1), Vector3.Create(0, -1, 0)))));
        LoadReduction r = acc.ResultAt(Vector3.Create(1, 0, 0));
        // about (1,0,0): (4,0,0)×(0,0,−2) = (0,8,0); (−1,1,0)×(3,0,0) = (0,0,−3); (0,1,1)×(0,−1,0) = (1,0,0)
        Assert.Equal(Vector3.Create(1, 8, -3), r.Moment);
        Assert.Equal(Vector3.Create(3, -1, -2), r.Force);
        Assert.Equal(3, r.ItemCount);
    }
}
