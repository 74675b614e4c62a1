using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Reduction;

/// <summary>
/// The gross measures a reduction reports beside R and M — the load centroid (the default reference point), G_F, G_M
/// and the length scale — for factored sums of accumulators with different anchors and for the column path, each
/// against hand arithmetic (the definitions of SPEC §4: G_F = Σ|F|, G_M = Σ|C| + G_F·D, centroid Σ|F_i| r_i / Σ|F_i|).
/// </summary>
public class GrossMeasuresTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    [Fact]
    public void Combination_of_cases_with_different_anchors_weights_the_centroid_by_the_absolute_factored_magnitudes()
    {
        // dead: 100 kN at (2, 0, 0) and 50 kN at (6, 0, 0) (anchor (2, 0, 0)); live: 40 kN at (10, 3, 0) and a free
        // couple of 5 kN·m (anchor (10, 3, 0)). The combination 1.35·dead − 1.5·live weights the points by |factor|·|F|:
        // 135, 67.5 and 60, total 262.5. Centroid x = (135·2 + 67.5·6 + 60·10) / 262.5 = 1275 / 262.5 = 34/7,
        // y = 60·3 / 262.5 = 24/35. G_couple = 1.5·5 = 7.5; the box runs from (2, 0, 0) to (10, 3, 0), D = √73.
        var dead = new ReductionAccumulator();
        dead.AddPointForce(V(2, 0, 0), V(0, 0, -100));
        dead.AddPointForce(V(6, 0, 0), V(0, 0, -50));
        var live = new ReductionAccumulator();
        live.AddPointForce(V(10, 3, 0), V(0, 0, -40));
        live.AddCouple(V(0, 0, 5));
        var combination = new ReductionAccumulator();
        combination.AddScaled(dead, 1.35);
        combination.AddScaled(live, -1.5);
        LoadReduction r = combination.ResultAt(V(0, 0, 0));

        Close.Relative(262.5, r.GrossForce, 1e-15);
        Close.Relative(7.5, r.GrossCouple, 1e-15);
        Close.Relative(34.0 / 7, r.Centroid!.Value.X, 1e-15);
        Close.Relative(24.0 / 35, r.Centroid.Value.Y, 1e-15);
        Assert.Equal(0, r.Centroid.Value.Z);
        Close.Relative(7.5 + (262.5 * Math.Sqrt(73)), r.GrossMoment, 1e-15);
        // R_z = −135 − 67.5 + 60 = −142.5; M_y about the origin = Σ −x·F_z = 270 + 405 − 600 = 75 (factors applied)
        Close.Relative(-142.5, r.Force.Z, 1e-15);
        Close.Relative(75, r.Moment.Y, 1e-15);
        Close.Relative(-7.5, r.Moment.Z, 1e-15);
    }

    [Fact]
    public void Column_path_centroid_is_the_magnitude_weighted_mean_of_the_rows()
    {
        // Five rows (one batch of four lanes and a tail) with exact norms 5, 2, 10, 3 and 7, total 27.
        double[] x = [0, 3, -1, 2, 6], y = [1, 0, 2, -2, 4], z = [0, 1, 0, 3, -1];
        double[] fx = [3, 0, 0, 1, -2], fy = [4, 0, 6, 2, -3], fz = [0, -2, 8, 2, -6];
        double[] norms = [5, 2, 10, 3, 7];
        var acc = new ReductionAccumulator();
        var magnitudes = new double[5];
        Assert.True(acc.AddPointForces(x, y, z, fx, fy, fz, magnitudes));
        Assert.Equal(norms, magnitudes);
        LoadReduction r = acc.ResultAt(V(0, 0, 0));

        // Σ|F|·x = 0 + 6 − 10 + 6 + 42 = 44; Σ|F|·y = 5 + 0 + 20 − 6 + 28 = 47; Σ|F|·z = 0 + 2 + 0 + 9 − 7 = 4
        Close.Relative(27, r.GrossForce, 1e-15);
        Close.Relative(44.0 / 27, r.Centroid!.Value.X, 1e-15);
        Close.Relative(47.0 / 27, r.Centroid.Value.Y, 1e-15);
        Close.Relative(4.0 / 27, r.Centroid.Value.Z, 1e-15);
        // the box runs from (−1, −2, −1) to (6, 4, 3): D = √(49 + 36 + 16) = √101
        Close.Relative(27 * Math.Sqrt(101), r.GrossMoment, 1e-15);
    }

    [Fact]
    public void A_reduction_without_geometry_has_only_its_couples_as_gross_moment()
    {
        var acc = new ReductionAccumulator();
        acc.AddCouple(V(0, 3, 4));
        LoadReduction r = acc.ResultAt(V(0, 0, 0));
        Assert.Null(r.Bounds);
        Assert.Null(r.Centroid);
        Assert.Equal(5, r.GrossMoment);
    }

    [Theory]
    // box far on the negative side: |min| = √200 governs over |max| = √162 and D = √2
    [InlineData(-10, -10, -9, -9, 14.142135623730951)]
    // box far on the positive side: |max| = √200 governs over |min| = √162
    [InlineData(9, 9, 10, 10, 14.142135623730951)]
    // box across the origin: D = √(8² + 6²) = 10 governs over |min| = √32 and |max| = √20
    [InlineData(-4, -4, 4, 2, 10)]
    public void Length_scale_is_the_largest_of_the_box_diagonal_its_corners_distances_and_the_point(double x0, double y0, double x1, double y1, double expected)
    {
        // expected values: Pythagoras on the corners given (√200 = 14.1421356237…, common arithmetic)
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(x0, y0, 0), V(0, 0, -1));
        acc.AddPointForce(V(x1, y1, 0), V(0, 0, -1));
        Close.Relative(expected, acc.ResultAt(V(0, 0, 0)).LengthScale, 1e-15);
        // a reference point farther than all of them governs
        Assert.Equal(30, acc.ResultAt(V(0, 0, 30)).LengthScale);
    }

    [Theory]
    [InlineData(0, "x")]
    [InlineData(1, "y")]
    [InlineData(2, "z")]
    public void Plane_crossing_names_its_plane_by_the_normal_axis(int axis, string name) =>
        Assert.Equal(name, new PlaneCrossing(axis, V(0, 0, 0)).AxisName);
}
