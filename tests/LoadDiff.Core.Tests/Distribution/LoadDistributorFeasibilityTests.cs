using LoadDiff.Core.Distribution;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Distribution;

/// <summary>
/// Where the distribution's "feasible" verdict turns: a residual of FeasibilityTolerance (1e-9) times the load's
/// scale is rounding, anything above it is load the points cannot carry. The verdict decides whether `distribute`
/// calls its output statically equivalent, so the scale is pinned on both sides of the line by hand.
/// </summary>
public class LoadDistributorFeasibilityTests
{
    // Supports on the x axis at −1, 0, 1 (no couples): centroid 0, ℓ² = (1 + 0 + 1)/3, so ℓ = √(2/3).
    // Forces on the x axis give moments (0, −x F_z, x F_y) and never an x part, so a twist m about the x axis is
    // uncarried exactly: the residual moment is (m, 0, 0) to rounding. Its allowance is 1e-9 × max(M_s, F_s ℓ) with
    // F_s = max(forceScale, |F|, M_s/ℓ) and M_s = max(momentScale, |M|) (the rule in LoadDistributor.Distribute).
    private static readonly SupportPoint[] Line = [new("a", V(-1, 0, 0), 1), new("b", V(0, 0, 0), 1), new("c", V(1, 0, 0), 1)];
    private static readonly double Ell = Math.Sqrt(2.0 / 3.0);

    private static LoadDiff.Core.Distribution.Distribution Twist(double m, double forceScale, double momentScale) =>
        new LoadDistributor(Line, allowCouples: false)
            .Distribute(new ForceCoupleSystem(V(0, 0, -1000), V(m, 0, 0), V(0, 0, 0)), forceScale, momentScale);

    [Fact]
    public void The_supports_have_rank_five_and_the_hand_length_scale()
    {
        var d = new LoadDistributor(Line, allowCouples: false);
        Assert.Equal(5, d.Rank);
        Close.Relative(Ell, d.LengthScale, 1e-15);
        Close.Absolute(Vector3.Zero, d.Centroid, 0);
    }

    [Theory]
    // The net force governs: allowance 1e-9 × 1000 ℓ = 8.165e-7 kN·m.
    [InlineData(0.95, 1000.0, 0.0, true)]
    [InlineData(1.05, 1000.0, 0.0, false)]
    public void A_twist_at_the_allowance_from_the_net_force(double fraction, double forceScale, double momentScale, bool feasible)
    {
        double m = fraction * 1e-9 * 1000 * Ell;
        var result = Twist(m, forceScale, momentScale);
        Assert.Equal(feasible, result.Feasible);
        if (feasible)
        {
            // Feasible means "carried": nothing uncarried is reported.
            Assert.Equal(Vector3.Zero, result.UncarriedMoment);
        }
        else
        {
            Close.Relative(V(m, 0, 0), result.UncarriedMoment, 1e-6);
        }
        // The force itself is carried: what remains of it is rounding, far inside its own allowance.
        Close.Absolute(Vector3.Zero, result.UncarriedForce, 1e-9 * 1000);
    }

    [Fact]
    public void The_gross_force_not_the_net_force_sets_the_scale()
    {
        // 5e-4 is rounding beside a gross force of 1e6 (allowance 1e-9 × 1e6 ℓ = 8.2e-4) but not beside a net 1000.
        Assert.True(Twist(5e-4, forceScale: 1e6, momentScale: 0).Feasible);
        Assert.False(Twist(5e-4, forceScale: 1000, momentScale: 0).Feasible);
    }

    [Fact]
    public void A_gross_moment_scale_widens_the_allowance_through_the_force_scale()
    {
        // momentScale 1e4: F_s = max(1000, 1e4/ℓ) = 1e4/ℓ, so the allowance is 1e-9 × max(1e4, (1e4/ℓ) ℓ) = 1e-5.
        // (M_s itself also bounds the allowance from below, so here the F_s route and the M_s route agree.)
        Assert.True(Twist(8e-6, forceScale: 1000, momentScale: 1e4).Feasible);
        Assert.False(Twist(1.2e-5, forceScale: 1000, momentScale: 1e4).Feasible);
        // The load's own moment counts even when the stated moment scale is smaller: |M| = 1e4 itself.
        var own = new LoadDistributor(Line, allowCouples: false)
            .Distribute(new ForceCoupleSystem(V(0, 0, -1000), V(8e-6, 1e4, 0), V(0, 0, 0)), 1000, 0);
        Assert.True(own.Feasible);
    }

    [Fact]
    public void No_points_and_weights_that_are_not_positive_finite_numbers_are_refused()
    {
        Assert.Throws<ArgumentException>(() => new LoadDistributor([], allowCouples: false));
        foreach (double w in new[] { 0.0, -1.0, double.NaN, double.PositiveInfinity })
        {
            SupportPoint[] points = [new("a", V(0, 0, 0), 1), new("b", V(1, 0, 0), w)];
            Assert.Throws<ArgumentException>(() => new LoadDistributor(points, allowCouples: true));
        }
        Assert.Throws<ArgumentNullException>(() => new LoadDistributor(null!, allowCouples: false));
    }
}
