using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Reduction;

/// <summary>
/// <see cref="ContributorTracker"/>: the ranking (largest first, equal ones in the order offered), the capacity and its
/// truncation flag, consecutive items with one id summed, and each contributor's force, couple, centroid and moment about
/// its centroid. Expected values are hand statics: a uniform line load w over l has its resultant w·l at l/2 (AISC Manual,
/// Beam Diagrams and Formulas, case 1; from memory); a uniform pressure p on a rectangle has p·A at its centre; the moment of
/// forces about a point Σ (r − Q) × F, evaluated exactly in the test (ExactRational).
/// </summary>
public class ContributorTrackerTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Down(string id, double x, double fz) => new(id, V(x, 0, 0), V(0, 0, -fz));

    private static Contributor Ready(string id, double fz) => new(id, LoadKind.Force, V(0, 0, -fz), Vector3.Zero, V(0, 0, 0), 1);

    private static ContributorTracker Offered(int capacity, params LoadItem[] items)
    {
        var t = new ContributorTracker(capacity);
        foreach (LoadItem item in items)
        {
            t.Offer(item);
        }
        return t;
    }

    // ---- ranking ------------------------------------------------------------------------------------------------------

    [Fact]
    public void A_new_tracker_holds_nothing()
    {
        var t = new ContributorTracker(4);
        Assert.Empty(t.Forces);
        Assert.Empty(t.Couples);
        Assert.False(t.Truncated);
    }

    [Fact]
    public void Forces_are_listed_largest_first()
    {
        ContributorTracker t = Offered(8, Down("f2", 0, 2), Down("f7", 1, 7), Down("f5", 2, 5), Down("f9", 3, 9), Down("f1", 4, 1));
        Assert.Equal(["f9", "f7", "f5", "f2", "f1"], t.Forces.Select(c => c.Id));
        Assert.Equal(new double[] { 9, 7, 5, 2, 1 }, t.Forces.Select(c => c.Magnitude));
        Assert.Empty(t.Couples);
        Assert.False(t.Truncated);
    }

    [Fact]
    public void Equal_forces_are_listed_in_the_order_offered()
    {
        ContributorTracker t = Offered(8, Down("a", 0, 5), Down("b", 1, 5), Down("c", 2, 5));
        Assert.Equal(["a", "b", "c"], t.Forces.Select(c => c.Id));
        ContributorTracker mixed = Offered(8, Down("a", 0, 5), Down("big", 1, 9), Down("b", 2, 5), Down("c", 3, 5), Down("small", 4, 1));
        Assert.Equal(["big", "a", "b", "c", "small"], mixed.Forces.Select(c => c.Id));
    }

    [Fact]
    public void Couples_are_kept_apart_and_ranked_by_their_size()
    {
        ContributorTracker t = Offered(8, new FreeCouple("c3", V(0, 3, 0)), Down("f", 0, 4), new FreeCouple("c5", V(3, 0, 4)));
        Assert.Equal(["c5", "c3"], t.Couples.Select(c => c.Id));
        Contributor c5 = t.Couples[0];
        Assert.Equal(LoadKind.Couple, c5.Kind);
        Assert.Equal(V(3, 0, 4), c5.Couple);
        Assert.Equal(5, c5.Magnitude); // |(3, 0, 4)| = 5
        Assert.Equal(Vector3.Zero, c5.Force);
        Assert.Null(c5.Centroid);
        Contributor f = Assert.Single(t.Forces);
        Assert.Equal(Vector3.Zero, f.Couple);
        Assert.Equal(V(0, 0, -4), f.Force);
    }

    // ---- one contributor's figures -----------------------------------------------------------------------------------

    [Fact]
    public void A_point_force_is_centred_where_it_acts_with_no_moment_about_it()
    {
        Contributor c = Assert.Single(Offered(4, new PointForce("p", V(2, 3, 4), V(1, 0, -5))).Forces);
        Assert.Equal(V(2, 3, 4), c.Centroid);
        Assert.Equal(Vector3.Zero, c.CentroidMoment);
        Assert.Equal(1, c.Parts);
        Assert.Equal(LoadKind.Force, c.Kind);
    }

    [Fact]
    public void A_uniform_line_load_is_centred_at_mid_length()
    {
        // w = 4 kN/m over x = 1 … 6 (l = 5): w·l = 20 kN at x = 1 + l/2 = 3.5 (AISC case 1), no moment about that point.
        Contributor c = Assert.Single(Offered(4, new LineLoad("udl", V(1, 0, 0), V(6, 0, 0), V(0, 0, -4), V(0, 0, -4))).Forces);
        Close.Absolute(V(0, 0, -20), c.Force, 1e-12);
        Close.Absolute(V(3.5, 0, 0), c.Centroid!.Value, 1e-12);
        Close.Absolute(Vector3.Zero, c.CentroidMoment, 1e-12);
        Assert.Equal(LoadKind.Line, c.Kind);
    }

    [Fact]
    public void A_line_load_changing_sign_keeps_its_couple_about_its_centroid()
    {
        // w(x) = −3 + 1.5·x kN/m (z) on x = 0 … 4: ∫w = 0, so no resultant force; ∫|w| = 2 × (½ · 2 · 3) = 6 kN, symmetric
        // about x = 2, so the load centroid is (2, 0, 0). Moment (about any point, R = 0): ∫ (x, 0, 0) × (0, 0, w) dx =
        // (0, −∫ x·w dx, 0) and ∫₀⁴ x(−3 + 1.5x) dx = −24 + 32 = 8, so M = (0, −8, 0) kN·m (integrals by hand).
        Contributor c = Assert.Single(Offered(4, new LineLoad("w", V(0, 0, 0), V(4, 0, 0), V(0, 0, -3), V(0, 0, 3))).Forces);
        Close.Absolute(Vector3.Zero, c.Force, 1e-12);
        Close.Absolute(V(2, 0, 0), c.Centroid!.Value, 1e-12);
        Close.Absolute(V(0, -8, 0), c.CentroidMoment, 1e-12);
        Close.Absolute(V(0, -8, 0), c.About(V(-7, 3, 1)).Moment, 1e-12);
    }

    [Fact]
    public void Consecutive_triangles_of_one_mesh_are_summed_into_one_contributor()
    {
        // A 2 m × 2 m panel as two triangles under 3 kN/m² downward: p·A = 12 kN at the panel centre (1, 1, 0).
        Vector3 down = V(0, 0, -1);
        ContributorTracker t = Offered(4,
            new MeshTriangle("deck", V(0, 0, 0), V(2, 0, 0), V(2, 2, 0), 3, 3, 3, down),
            new MeshTriangle("deck", V(0, 0, 0), V(2, 2, 0), V(0, 2, 0), 3, 3, 3, down),
            Down("post", 5, 4));
        Assert.Equal(["deck", "post"], t.Forces.Select(c => c.Id));
        Contributor deck = t.Forces[0];
        Assert.Equal(2, deck.Parts);
        Assert.Equal(LoadKind.MeshTriangle, deck.Kind);
        Close.Absolute(V(0, 0, -12), deck.Force, 1e-12);
        Close.Absolute(V(1, 1, 0), deck.Centroid!.Value, 1e-12);
        Close.Absolute(Vector3.Zero, deck.CentroidMoment, 1e-12);
    }

    [Fact]
    public void The_same_id_again_after_another_item_is_a_new_contributor()
    {
        ContributorTracker t = Offered(4, Down("a", 0, 5), Down("b", 1, 6), Down("a", 2, 5));
        Assert.Equal(["b", "a", "a"], t.Forces.Select(c => c.Id));
        Assert.All(t.Forces, c => Assert.Equal(1, c.Parts));
    }

    [Fact]
    public void A_force_and_a_couple_sharing_an_id_are_two_contributors()
    {
        ContributorTracker t = Offered(4, Down("a", 0, 5), new FreeCouple("a", V(0, 7, 0)));
        Contributor force = Assert.Single(t.Forces);
        Contributor couple = Assert.Single(t.Couples);
        Assert.Equal(Vector3.Zero, force.Couple);
        Assert.Equal(V(0, 7, 0), couple.Couple);
    }

    [Fact]
    public void Items_of_one_id_far_from_the_origin_keep_their_moment_to_the_size_of_the_loads()
    {
        // Three forces of one id on survey coordinates (about 6.1e6 m from the origin). The moment of their sum about a nearby
        // point Q, Σ (r − Q) × F, is evaluated exactly from the very doubles used (ExactRational) and rounded once. Summed about
        // a point near the loads, the tracker must reproduce it to rounding of the loads' own size (|F| ≈ 20 kN, lever ≈ 4 m),
        // far finer than rounding of site coordinates (ulp of 6.1e6 m ≈ 1e-9 m, times 20 kN).
        Vector3 o = V(512_300.1, 6_104_800.7, 42.3);
        (Vector3 At, Vector3 F)[] loads = [(o, V(0, 0, -10)), (o + V(2, 0, 0), V(0, 0, -7.5)), (o + V(2, 3, 0.4), V(1.25, 0.5, -4))];
        ContributorTracker t = Offered(4, [.. loads.Select(l => (LoadItem)new PointForce("n", l.At, l.F))]);
        Contributor c = Assert.Single(t.Forces);
        Assert.Equal(3, c.Parts);

        Vector3 q = o + V(1, 1, 0);
        ExactRational mx = ExactRational.Zero, my = ExactRational.Zero, mz = ExactRational.Zero;
        foreach ((Vector3 at, Vector3 f) in loads)
        {
            ExactRational dx = X(at.X) - X(q.X), dy = X(at.Y) - X(q.Y), dz = X(at.Z) - X(q.Z);
            mx += (dy * X(f.Z)) - (dz * X(f.Y));
            my += (dz * X(f.X)) - (dx * X(f.Z));
            mz += (dx * X(f.Y)) - (dy * X(f.X));
        }
        Close.Absolute(V(mx.ToDouble(), my.ToDouble(), mz.ToDouble()), c.About(q).Moment, 1e-11);
    }

    private static ExactRational X(double v) => ExactRational.FromDouble(v);

    // ---- capacity and truncation -------------------------------------------------------------------------------------

    [Fact]
    public void A_full_tracker_keeps_the_largest_and_says_it_left_some_out()
    {
        ContributorTracker t = Offered(2, Down("f5", 0, 5), Down("f3", 1, 3), Down("f8", 2, 8), Down("f1", 3, 1), Down("f4", 4, 4));
        Assert.Equal(["f8", "f5"], t.Forces.Select(c => c.Id));
        Assert.True(t.Truncated);
    }

    [Fact]
    public void A_tracker_filled_exactly_to_capacity_left_nothing_out()
    {
        ContributorTracker t = Offered(2, Down("f5", 0, 5), Down("f3", 1, 3));
        Assert.Equal(["f5", "f3"], t.Forces.Select(c => c.Id));
        Assert.False(t.Truncated);
    }

    [Theory]
    [InlineData(8, 5, "f8")] // the smaller second item is left out
    [InlineData(5, 8, "f8")] // the larger second item replaces the first
    public void A_tracker_of_one_keeps_the_larger_force_and_says_so_before_anything_is_listed(double first, double second, string kept)
    {
        ContributorTracker t = Offered(1, Down("f" + first, 0, first), Down("f" + second, 1, second));
        Assert.True(t.Truncated); // read first: the last item offered counts as well
        Assert.Equal([kept], t.Forces.Select(c => c.Id));
    }

    [Fact]
    public void A_tracker_of_one_keeps_the_larger_couple()
    {
        ContributorTracker t = Offered(1, new FreeCouple("c5", V(0, 0, 5)), new FreeCouple("c8", V(0, 8, 0)), new FreeCouple("c2", V(2, 0, 0)));
        Assert.Equal(["c8"], t.Couples.Select(c => c.Id));
        Assert.True(t.Truncated);
    }

    [Fact]
    public void A_full_list_of_couples_does_not_keep_forces_out_and_the_other_way_round()
    {
        // Capacity 1 of each: a large couple fills the couples, and still the larger of two small forces is kept.
        ContributorTracker t = Offered(1, new FreeCouple("c100", V(0, 0, 100)), Down("f5", 0, 5), Down("f8", 1, 8));
        Assert.Equal(["f8"], t.Forces.Select(c => c.Id));
        Assert.Equal(["c100"], t.Couples.Select(c => c.Id));
        ContributorTracker u = Offered(1, Down("f100", 0, 100), new FreeCouple("c5", V(0, 5, 0)), new FreeCouple("c8", V(8, 0, 0)));
        Assert.Equal(["c8"], u.Couples.Select(c => c.Id));
        Assert.Equal(["f100"], u.Forces.Select(c => c.Id));
    }

    [Fact]
    public void Ready_contributors_are_ranked_with_the_items()
    {
        // An item offered before a ready contributor is complete: the same id offered after it is a new contributor.
        var t = new ContributorTracker(8);
        t.Offer(Down("a", 0, 5));
        t.Offer(Ready("block", 5));
        t.Offer(Down("a", 1, 5));
        Assert.Equal(["a", "block", "a"], t.Forces.Select(c => c.Id));
        Assert.All(t.Forces, c => Assert.Equal(1, c.Parts));
        t.Offer(new Contributor("m", LoadKind.Couple, Vector3.Zero, V(0, 0, 3), null, 1));
        Assert.Equal(["m"], t.Couples.Select(c => c.Id));
    }

    [Fact]
    public void A_full_tracker_of_ready_contributors_keeps_the_earlier_of_equals_and_replaces_only_by_a_larger_one()
    {
        var t = new ContributorTracker(1);
        t.Offer(Ready("a", 5));
        Assert.False(t.Truncated);
        t.Offer(Ready("b", 5));
        Assert.True(t.Truncated);
        Assert.Equal(["a"], t.Forces.Select(c => c.Id));
        t.Offer(Ready("c", 8));
        Assert.Equal(["c"], t.Forces.Select(c => c.Id));
        t.Offer(Ready("d", 3));
        Assert.Equal(["c"], t.Forces.Select(c => c.Id));
    }

    [Fact]
    public void Among_equals_the_latest_offered_is_the_first_to_go()
    {
        var t = new ContributorTracker(2);
        t.Offer(Ready("a", 5));
        t.Offer(Ready("b", 5));
        t.Offer(Ready("c", 8));
        Assert.Equal(["c", "a"], t.Forces.Select(c => c.Id));
    }

    [Fact]
    public void WouldKeepForce_says_whether_a_force_of_that_size_would_be_kept_now()
    {
        var t = new ContributorTracker(2);
        Assert.True(t.WouldKeepForce(0)); // room left
        t.Offer(Ready("a", 5));
        Assert.True(t.WouldKeepForce(1)); // room left
        t.Offer(Ready("b", 3));
        Assert.True(t.WouldKeepForce(10));
        Assert.True(t.WouldKeepForce(4));
        Assert.False(t.WouldKeepForce(3)); // equal to the smallest kept: the earlier one stays
        Assert.False(t.WouldKeepForce(2));
    }

    // ---- guards ------------------------------------------------------------------------------------------------------

    [Fact]
    public void Bad_arguments_are_refused()
    {
        ArgumentException e = Assert.Throws<ArgumentException>(() => new ContributorTracker(0));
        Assert.Equal("capacity", e.ParamName);
        Assert.StartsWith("Capacity must be positive.", e.Message, StringComparison.Ordinal);
        var t = new ContributorTracker(1);
        t.Offer(Down("a", 0, 1));
        Assert.Throws<ArgumentNullException>(() => t.Offer((LoadItem)null!));
        Assert.Throws<ArgumentNullException>(() => t.Offer((Contributor)null!));
    }
}
