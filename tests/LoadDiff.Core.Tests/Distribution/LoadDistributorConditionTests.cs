using LoadDiff.Core.Distribution;
using LoadDiff.Core.Reduction;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Distribution;

/// <summary>
/// The condition number distribute refuses above (LoadDistributor.ConditionLimit), against hand values for two points at
/// ±s/2 on the x axis (no couples, weight 1). By hand: centroid 0, ℓ = s/2, d_i = (±1, 0, 0). The force rows have two
/// entries 1 each (σ = √2, three times); the moment rows y and z have entries ∓1 and ±1 (σ = √2, twice); the rows are
/// orthogonal because Σ d_i = 0, and the twist row about x is zero (rank 5). With the moment rows over L instead of ℓ
/// they shrink by ℓ/L, so σ_max/σ_min = L/ℓ when L ≥ ℓ.
/// </summary>
public class LoadDistributorConditionTests
{
    private static LoadDistributor Pair(double s) =>
        new([new SupportPoint("a", V(-s / 2, 0, 0), 1), new SupportPoint("b", V(s / 2, 0, 0), 1)], allowCouples: false);

    private static Box At(double x, double y, double z) => new(V(x, y, z), V(x, y, z));

    [Fact]
    public void A_load_at_the_centroid_of_two_points_gives_condition_number_one()
    {
        LoadDistributor d = Pair(2);
        Assert.Equal(5, d.Rank);
        Assert.Equal(1, d.ConditionNumber(At(0, 0, 0)), 12);
        Assert.Equal(1, d.ConditionNumber(null), 12);   // couples only: no lever arm beyond the points' own
    }

    [Fact]
    public void A_load_within_the_points_spread_does_not_raise_it()
    {
        // reach 0.5 < ℓ = 1: L = ℓ
        Assert.Equal(1, Pair(2).ConditionNumber(At(0.5, 0, 0)), 12);
    }

    [Theory]
    [InlineData(2.0)]       // L/ℓ = 3/1
    [InlineData(1e-3)]
    [InlineData(1e-6)]
    [InlineData(1e-12)]
    public void A_load_at_one_metre_from_points_s_apart_gives_2_over_s(double s)
    {
        // The load box is the point (1, 0, 0) (or (3, 0, 0) for s = 2), ℓ = s/2: κ = L/ℓ = 2L/s.
        double reach = s == 2.0 ? 3 : 1;
        double kappa = Pair(s).ConditionNumber(At(reach, 0, 0));
        double expected = 2 * reach / s;
        Assert.True(Math.Abs(kappa - expected) <= 1e-9 * expected, $"κ = {kappa:R}, expected {expected:R}");
    }

    [Fact]
    public void The_limit_separates_a_millimetre_pair_from_a_picometre_pair_under_a_load_a_metre_away()
    {
        Assert.True(Pair(1e-3).ConditionNumber(At(1, 0, 0)) <= LoadDistributor.ConditionLimit);
        Assert.True(Pair(1e-12).ConditionNumber(At(1, 0, 0)) > LoadDistributor.ConditionLimit);
    }

    [Fact]
    public void The_condition_number_does_not_depend_on_the_length_unit()
    {
        // The same geometry in mm and in m (factor 1000, exact in binary for these coordinates up to rounding).
        double m = Pair(0.004).ConditionNumber(At(1, 0, 0));
        double mm = Pair(4).ConditionNumber(At(1000, 0, 0));
        Assert.True(Math.Abs(m - mm) <= 1e-9 * m, $"{m:R} m vs {mm:R} mm");
        Assert.True(Math.Abs(m - 500) <= 1e-9 * 500);
    }
}
