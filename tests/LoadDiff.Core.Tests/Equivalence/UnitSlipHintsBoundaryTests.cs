using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Equivalence;

// The unit-slip hints at the edges of their documented windows (UnitSlipHints remarks): "mostly outside" means an
// intersection diagonal *less than* half the substitute's, a rescaled box matches at *at least* nine tenths, a ratio is near
// a factor k within the *closed* interval [k/(1+t), k·(1+t)], and a resultant is significant at *at least* 1 % of its gross
// force. Factors from outside the project: 10 mm = 1 cm and 1000 mm = 1 m (SI prefixes, NIST SP 330), 1000 N = 1 kN (SI
// prefix kilo, NIST SP 330). Boxes are made of point forces (their loaded geometry); where a boundary is met exactly the test
// first checks, with its own double arithmetic, that the numbers involved are exact.
public class UnitSlipHintsBoundaryTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    // 5 kN downward at each point: equal gross forces on both sides when the counts are equal, so no force hint.
    private static LoadReduction At(params Vector3[] points) =>
        Reduce.About(Vector3.Zero, points.Select((p, i) => (LoadItem)new PointForce($"n{i}", p, V(0, 0, -5))));

    private static LoadReduction Along(params double[] xs) => At([.. xs.Select(x => V(x, 0, 0))]);

    private static LoadReduction One(double fz) => Reduce.About(Vector3.Zero, new PointForce("p", V(1, 2, 0), V(0, 0, fz)));

    // ---- "mostly outside": less than half --------------------------------------------------------------------------

    [Fact]
    public void A_tenth_size_substitute_exactly_half_inside_the_original_is_not_mostly_outside()
    {
        // Original x = 10 … 20 (diagonal 10), substitute x = 9.5 … 10.5 (diagonal 1, a tenth). Their intersection 10 … 10.5 has
        // diagonal 0.5 = half the substitute's: not less than half. Rescaled ×10 about the origin it lies at 95 … 105, nowhere
        // near 10 … 20. So no hint.
        Assert.Equal(1.0, 10.5 - 9.5);
        Assert.Equal(0.5, 10.5 - 10);
        Assert.Empty(UnitSlipHints.Find(Along(10, 20), Along(9.5, 10.5)));
    }

    [Fact]
    public void A_tenth_size_substitute_three_quarters_outside_the_original_is_hinted()
    {
        // Original x = 10 … 30 (diagonal 20), substitute x = 8.5 … 10.5 (diagonal 2): intersection 10 … 10.5, diagonal 0.5 < 1.
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Along(10, 30), Along(8.5, 10.5)));
        Assert.Equal(UnitHint.LengthFactorCode, hint.Code);
        Assert.Equal("the substitute's loads span a region about 10× smaller than the original's (lengths in cm read as mm?)", hint.Message);
        Close.Relative(0.1, hint.Factor!.Value, 1e-15);
    }

    [Fact]
    public void A_tenth_size_substitute_beside_the_original_is_hinted_though_their_y_ranges_overlap()
    {
        // Original: the corners of 0 … 10 × 0 … 4 (diagonal √116); substitute: 20 … 21 × 1 … 1.4 (diagonal √1.16, a tenth).
        // Disjoint in x, overlapping in y: no intersection, so wholly outside.
        LoadReduction original = At(V(0, 0, 0), V(10, 0, 0), V(10, 4, 0), V(0, 4, 0));
        LoadReduction substitute = At(V(20, 1, 0), V(21, 1, 0), V(21, 1.4, 0), V(20, 1.4, 0));
        UnitHint hint = Assert.Single(UnitSlipHints.Find(original, substitute));
        Assert.Equal(UnitHint.LengthFactorCode, hint.Code);
        Close.Relative(0.1, hint.Factor!.Value, 1e-12);
    }

    [Fact]
    public void A_compact_well_placed_substitute_on_a_vertical_line_gives_no_hint()
    {
        // A column: the original's loads at z = 0 and z = 10 on the z axis, the substitute's at z = 4.5 and 5.5 (a tenth of
        // the length, inside). The boxes are lines (flat in x and y) and still intersect, over 4.5 … 5.5; rescaled ×10 the
        // substitute would lie at 45 … 55. So no hint.
        Assert.Empty(UnitSlipHints.Find(At(V(0, 0, 0), V(0, 0, 10)), At(V(0, 0, 4.5), V(0, 0, 5.5))));
    }

    // ---- rescaled match: at least nine tenths ------------------------------------------------------------------------

    [Fact]
    public void A_substitute_shrunk_towards_an_origin_at_the_centre_of_the_original_is_hinted()
    {
        // The original's corners ±3 × ±2 around the origin; the substitute's the same numbers / 1000 (metres read as
        // millimetres): it sits inside the original, and times 1000 about the origin it is the original's box again.
        Vector3[] corners = [V(-3, -2, 0), V(3, -2, 0), V(3, 2, 0), V(-3, 2, 0)];
        UnitHint hint = Assert.Single(UnitSlipHints.Find(At(corners), At([.. corners.Select(c => c / 1000)])));
        Assert.Equal("the substitute's loads span a region about 1000× smaller than the original's (lengths in m read as mm?)", hint.Message);
    }

    [Fact]
    public void A_rescaled_box_overlapping_the_original_by_exactly_nine_tenths_is_a_match()
    {
        // Original x = 0 … 10; substitute x = 0.001 … 0.011 (inside it), which times 1000 is 1 … 11: intersection 1 … 10 of
        // diagonal 9 = 0.9 × 10, the larger diagonal (both are 10).
        Assert.Equal(1.0, 0.001 * 1000);
        Assert.Equal(11.0, 0.011 * 1000);
        Assert.Equal(9.0, 0.9 * 10);
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Along(0, 10), Along(0.001, 0.011)));
        Assert.Equal(UnitHint.LengthFactorCode, hint.Code);
    }

    [Fact]
    public void A_rescaled_box_larger_than_the_original_must_overlap_nine_tenths_of_itself()
    {
        // Original x = 0 … 10; substitute x = 0.00095 … 0.01115 (inside it, ratio 1.02e-3), times 1000: 0.95 … 11.15 of
        // diagonal 10.2. The intersection 0.95 … 10 (9.05) is 0.9 × 10 = 9 of the original's but less than 0.9 × 10.2 = 9.18 of
        // the larger: no match, and no hint.
        Assert.Empty(UnitSlipHints.Find(Along(0, 10), Along(0.00095, 0.01115)));
    }

    // ---- force factors ---------------------------------------------------------------------------------------------

    [Fact]
    public void A_force_hint_says_which_way_round()
    {
        Assert.Equal("the substitute's gross force is about 1000× larger than the original's (forces in N read as kN, or kN as MN?)",
            Assert.Single(UnitSlipHints.Find(One(-1), One(-1000))).Message);
        Assert.Equal("the substitute's gross force is about 1000× smaller than the original's (forces in kN read as N, or MN as kN?)",
            Assert.Single(UnitSlipHints.Find(One(-1000), One(-1))).Message);
    }

    [Fact]
    public void A_force_ratio_at_the_edge_of_the_window_is_near_the_factor_and_just_beyond_it_is_not()
    {
        // 1010 / 1000 = 1.01 = 1 + 0.01 in doubles: on the closed window's upper edge.
        Assert.Equal(1 + UnitSlipHints.ForceNearness, 1010.0 / 1000);
        UnitHint hint = Assert.Single(UnitSlipHints.Find(One(-1), One(-1010)));
        Assert.Equal(1010, hint.Factor);
        Assert.True(1010.000001 / 1000 > 1 + UnitSlipHints.ForceNearness);
        Assert.Empty(UnitSlipHints.Find(One(-1), One(-1010.000001)));
    }

    [Fact]
    public void Resultants_of_exactly_one_hundredth_of_their_gross_forces_are_significant()
    {
        // Original −50.5 kN and +49.5 kN: gross 100, resultant 1 = 0.01 × 100. The substitute is the same in N read as kN:
        // gross 100 000, resultant 1000 = 0.01 × 100 000. Both significant, both ratios 1000: the hint is given.
        Assert.Equal(1.0, 0.01 * 100);
        Assert.Equal(1000.0, 0.01 * 100_000);
        LoadItem[] original = [new PointForce("w", V(0, 0, 0), V(0, 0, -50.5)), new PointForce("l", V(1, 0, 0), V(0, 0, 49.5))];
        LoadItem[] substitute = [new PointForce("w", V(0, 0, 0), V(0, 0, -50_500)), new PointForce("l", V(1, 0, 0), V(0, 0, 49_500))];
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Reduce.About(Vector3.Zero, original), Reduce.About(Vector3.Zero, substitute)));
        Assert.Equal(UnitHint.ForceFactorCode, hint.Code);
    }

    [Fact]
    public void Resultants_below_one_hundredth_of_their_gross_forces_are_compared_by_gross_force_alone()
    {
        // Gross 100 and resultant 0.5 (−50.25 + 49.75); the substitute ×1000: gross 100 000, resultant 500. Neither resultant
        // reaches 1 % of its gross force, so the gross ratio 1000 alone gives the hint.
        LoadItem[] original = [new PointForce("w", V(0, 0, 0), V(0, 0, -50.25)), new PointForce("l", V(1, 0, 0), V(0, 0, 49.75))];
        LoadItem[] substitute = [new PointForce("w", V(0, 0, 0), V(0, 0, -50_250)), new PointForce("l", V(1, 0, 0), V(0, 0, 49_750))];
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Reduce.About(Vector3.Zero, original), Reduce.About(Vector3.Zero, substitute)));
        Assert.Equal(UnitHint.ForceFactorCode, hint.Code);
    }

    // ---- guards ----------------------------------------------------------------------------------------------------

    [Fact]
    public void NoUnits_refuses_null_arguments()
    {
        var header = new DocumentHeader(null, UnitSystem.Si, UnitSystem.Si, ImmutableSortedDictionary<string, Vector3>.Empty);
        Assert.Throws<ArgumentNullException>(() => UnitSlipHints.NoUnits(null!, header));
        Assert.Throws<ArgumentNullException>(() => UnitSlipHints.NoUnits("the original", null!));
    }
}
