using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// <see cref="RoundingNoise"/> against its documented formula (DEVELOPERS.md, "How the mechanics are done"): 1e-12 times the
/// smaller gross force, and 1e-12 times the smaller of Σ|C| + G_F·reach over the two systems, reach being the diagonal of
/// the system's own loaded box plus the larger distance of its two extreme corners from the origin. Boxes, gross forces and distances are
/// worked by hand (3-4-5 and 6-8-10 triangles); the products are the test's own arithmetic.
/// </summary>
public class RoundingNoiseFormulaTests
{
    private const double Threshold = 1e-12; // DEVELOPERS.md: the rounding threshold, not an engineering tolerance

    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Down(string id, Vector3 at, double fz) => new(id, at, V(0, 0, -fz));

    [Fact]
    public void Of_two_systems_uses_the_smaller_gross_force_and_each_systems_own_reach()
    {
        // a: 10 kN at (0, 0, 0) and at (3, 4, 0): G_F = 20, box diagonal 5, |Max| = 5, reach 10, 20·10 = 200.
        // b: 5 kN at (3, 0, 0): G_F = 5, a point box 3 from the origin, reach 3, 5·3 = 15. Smaller: force 5, moment 15.
        LoadReduction a = Reduce.About(Vector3.Zero, Down("p", V(0, 0, 0), 10), Down("q", V(3, 4, 0), 10));
        LoadReduction b = Reduce.About(Vector3.Zero, Down("r", V(3, 0, 0), 5));
        RoundingNoise n = RoundingNoise.Of(a, b);
        Close.Relative(Threshold * 5, n.Force, 1e-15);
        Close.Relative(Threshold * 15, n.Moment, 1e-15);
        Assert.Equal(n, RoundingNoise.Of(b, a)); // the order of the files does not matter (SPEC §4)
    }

    [Fact]
    public void Of_two_systems_measures_reach_from_the_corner_farther_from_the_origin_and_counts_couples()
    {
        // x: 1 kN at the origin: reach 0, moment scale 0. y: 10 kN at (−6, −8, 0) and a couple (0, 0, 7): reach 0 + 10,
        // 7 + 10·10 = 107. Smaller: moment 0; force min(1, 10) = 1.
        LoadReduction x = Reduce.About(Vector3.Zero, Down("p", Vector3.Zero, 1));
        LoadReduction y = Reduce.About(Vector3.Zero, Down("q", V(-6, -8, 0), 10), new FreeCouple("c", V(0, 0, 7)));
        RoundingNoise n = RoundingNoise.Of(x, y);
        Close.Relative(Threshold * 1, n.Force, 1e-15);
        Assert.Equal(0, n.Moment);
        Assert.Equal(n, RoundingNoise.Of(y, x));
    }

    [Fact]
    public void Of_two_systems_without_geometry_is_the_smaller_couple_sum()
    {
        LoadReduction x = Reduce.About(Vector3.Zero, new FreeCouple("c", V(0, 3, 4)));
        LoadReduction y = Reduce.About(Vector3.Zero, new FreeCouple("d", V(0, 6, 8)));
        Assert.Equal(new RoundingNoise(0, 0), RoundingNoise.Of(x, Reduce.About(Vector3.Zero))); // an empty system has no noise
        RoundingNoise n = RoundingNoise.Of(x, y);
        Assert.Equal(0, n.Force);
        Close.Relative(Threshold * 5, n.Moment, 1e-15); // min(|(0, 3, 4)|, |(0, 6, 8)|) = 5
    }

    [Fact]
    public void Of_one_system_takes_the_larger_of_its_moment_scale_and_its_coordinate_scale()
    {
        // 10 kN at (0, 0, 0) and at (3, 4, 0) plus a couple of 7, about the origin: Σ|C| + G_F × (farthest corner, 5)
        // = 7 + 20·5 = 107 against G_F × (largest coordinate size, 5) = 100: 107 governs.
        LoadReduction r = Reduce.About(Vector3.Zero, Down("p", V(0, 0, 0), 10), Down("q", V(3, 4, 0), 10), new FreeCouple("c", V(0, 0, 7)));
        RoundingNoise n = RoundingNoise.Of(r);
        Close.Relative(Threshold * 20, n.Force, 1e-15);
        Close.Relative(Threshold * 107, n.Moment, 1e-15);
    }

    [Fact]
    public void Of_one_system_far_from_the_origin_is_governed_by_the_size_of_its_coordinates()
    {
        // 10 kN at (100, 0, 0) stated about that point: its moment scale there is 0, but its coordinates are 100 m from the
        // origin, so rounding them can move 10 kN by ~1e-14 m: the noise is 1e-12 × 10 × 100.
        Vector3 at = V(100, 0, 0);
        RoundingNoise n = RoundingNoise.Of(Reduce.About(at, Down("p", at, 10)));
        Close.Relative(Threshold * 10, n.Force, 1e-15);
        Close.Relative(Threshold * 1000, n.Moment, 1e-15);
    }

    [Fact]
    public void Moment_noise_outside_the_box_grows_with_the_force_noise_times_the_distance()
    {
        // MomentAt(d) = M + F·d: 3 + 2·5 = 13 (exact).
        Assert.Equal(13, new RoundingNoise(2, 3).MomentAt(5));
        Assert.Equal(3, new RoundingNoise(2, 3).MomentAt(0));
    }

    [Fact]
    public void A_force_at_or_below_the_force_noise_is_noise_either_sign()
    {
        var n = new RoundingNoise(2, 3);
        Assert.True(n.IsForceNoise(2));
        Assert.True(n.IsForceNoise(-2));
        Assert.True(n.IsForceNoise(-1));
        Assert.False(n.IsForceNoise(2.5));
        Assert.False(n.IsForceNoise(-2.5));
        Assert.True(RoundingNoise.None.IsForceNoise(0));
        Assert.False(RoundingNoise.None.IsForceNoise(1e-300));
    }

    [Fact]
    public void Text_states_both_parts_round_trip()
    {
        Assert.Equal("noise: force 2, moment 0.1", new RoundingNoise(2, 0.1).ToString());
    }

    [Fact]
    public void Null_reductions_throw()
    {
        LoadReduction r = Reduce.About(Vector3.Zero, Down("p", Vector3.Zero, 1));
        Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(null!, r));
        Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(r, null!));
        Assert.Throws<ArgumentNullException>(() => RoundingNoise.Of(null!));
    }
}
