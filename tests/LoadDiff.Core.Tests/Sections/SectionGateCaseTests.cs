using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

/// <summary>
/// The section-cut gate of one case (DEVELOPERS.md, "Section cuts and distribution"): the allowance rel × peak, its
/// rounding floor, and the pass at the boundary. Cut moments are cantilever tip loads, M = P·x (AISC Manual, Beam Diagrams
/// and Formulas, cantilever with a concentrated load at the free end; from memory), summed over the loads behind the cut.
/// </summary>
public class SectionGateCaseTests
{
    private static readonly SectionAxis AlongX = SectionAxis.Create(Vector3.Zero, Vector3.UnitX);

    private static SectionComparison Compare(LoadItem[] original, LoadItem[] substitute) =>
        SectionComparison.Compare(AlongX, null, null, 21, [new WeightedItems(original, 1)], [new WeightedItems(substitute, 1)]);

    // Original −10 kN at x = 1 and x = 3; substitute −25 kN at x = 2 (not equivalent: it is 5 kN heavier). Stations 1 … 3.
    private static readonly LoadItem[] Original = [new PointForce("a", V(1, 0, 0), V(0, 0, -10)), new PointForce("b", V(3, 0, 0), V(0, 0, -10))];
    private static readonly LoadItem[] Heavier = [new PointForce("s", V(2, 0, 0), V(0, 0, -25))];

    [Fact]
    public void The_rounding_floor_follows_the_originals_largest_cut_force_and_moment_over_its_own_loads()
    {
        // Over the original's extent s = 1 … 3: its largest cut force is 20 kN (s ≥ 3), its largest cut moment
        // 10·(3 − 1) = 20 kN·m at s = 3; the farthest cut point is (3, 0, 0), 3 m from the origin; the extent is 2 m long.
        // Floor = 1e-12 × (20 × (3 + 2) + 20) = 1.2e-10 kN·m (1e-12: the rounding threshold, DEVELOPERS.md). The
        // substitute's larger 25 kN does not count: the system under check cannot widen its own floor.
        SectionComparison comparison = Compare(Original, Heavier);
        Assert.Equal(1, comparison.Stations[0].S);
        Assert.Equal(3, comparison.Stations[^1].S);
        SectionGateCase c = SectionGateCase.Evaluate("G", EntryKind.Case, comparison, 0.05);
        Close.Relative(1e-12 * ((20 * (3 + 2)) + 20), c.RoundingFloor, 1e-9);
        // The allowance: 0.05 × the original's peak over its own loads, 10·(3 − 1) = 20 kN·m, is 1 kN·m.
        Close.Relative(1, c.AllowedMoment, 1e-14);
        // |ΔM(2)| = |25·0 − 10·1| = 10 kN·m is the largest deviation (|ΔM| = 10·(s − 1) before, |15·s − 40| after).
        Close.Relative(10, c.MaxMomentDeviation, 1e-14);
        Assert.False(c.Passes);
    }

    [Fact]
    public void A_tiny_substitute_load_far_along_the_axis_widens_no_floor()
    {
        // Original −10 kN at x = 0 and x = 2, substitute −20 kN at x = 1 (|ΔM| = 10 kN·m at s = 1, allowed 0.05 × 20 = 1,
        // SectionGateVerdictTests) plus −1e-18 kN at x = 1e12: the stations now run to 1e12, which once made the floor
        // 1e-12 × 20 kN × 1e12 m = 20 kN·m and passed the gate.
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 0, -10)), new PointForce("b", V(2, 0, 0), V(0, 0, -10))];
        LoadItem[] substitute = [new PointForce("s", V(1, 0, 0), V(0, 0, -20)), new PointForce("far", V(1e12, 0, 0), V(0, 0, -1e-18))];
        SectionGateCase c = SectionGateCase.Evaluate("G", EntryKind.Case, Compare(original, substitute), 0.05);
        Assert.False(c.Passes, c.ToString());
        Close.Relative(1, c.AllowedMoment, 1e-12);
    }

    [Fact]
    public void A_relative_tolerance_of_zero_is_allowed_and_leaves_the_rounding_floor()
    {
        SectionGateCase c = SectionGateCase.Evaluate("G", EntryKind.Case, Compare(Original, Original), 0);
        Assert.Equal(0, c.RelativeTolerance);
        Assert.Equal(c.RoundingFloor, c.AllowedMoment);
        Assert.True(c.RoundingFloor > 0);
        Assert.Equal(0, c.MaxMomentDeviation); // the same items on both sides: exactly the same cut moments
        Assert.True(c.Passes);
    }

    [Fact]
    public void A_comparison_without_stations_has_no_floor_and_nothing_to_fail()
    {
        var empty = new SectionComparison(AlongX, [], true, Vector3.Zero, Vector3.Zero);
        SectionGateCase c = SectionGateCase.Evaluate("G", EntryKind.Case, empty, 0.05);
        Assert.Equal(0, c.RoundingFloor);
        Assert.Equal(0, c.AllowedMoment);
        Assert.True(c.Passes);
    }

    [Fact]
    public void A_deviation_exactly_at_the_allowance_passes()
    {
        // 0.5 × 20 = 10 exactly: "at most REL × the original's peak" (DEVELOPERS.md) includes equality.
        var atLimit = new SectionGateCase("G", EntryKind.Case, 0.5, 20, (0, 2), 10, 1);
        Assert.Equal(10, atLimit.AllowedMoment);
        Assert.True(atLimit.Passes);
        Assert.False((atLimit with { MaxMomentDeviation = Math.BitIncrement(10) }).Passes);
    }

    [Fact]
    public void The_text_states_the_verdict_deviation_station_and_allowance()
    {
        var failing = new SectionGateCase("dead", EntryKind.Case, 0.05, 20, (0, 2), 10, 1);
        Assert.Equal("dead: FAIL, largest |ΔM| 10 at s = 1, allowed 1", failing.ToString());
        Assert.Equal("dead: PASS, largest |ΔM| 0.5 at s = 1, allowed 1", (failing with { MaxMomentDeviation = 0.5 }).ToString());
    }

    [Fact]
    public void Bad_arguments_are_refused_with_their_names()
    {
        SectionComparison c = Compare(Original, Heavier);
        Assert.Throws<ArgumentNullException>(() => SectionGateCase.Evaluate(null!, EntryKind.Case, c, 0.05));
        Assert.Throws<ArgumentNullException>(() => SectionGateCase.Evaluate("G", EntryKind.Case, null!, 0.05));
        ArgumentException e = Assert.Throws<ArgumentException>(() => SectionGateCase.Evaluate("G", EntryKind.Case, c, -1e-9));
        Assert.Equal("relativeTolerance", e.ParamName);
        Assert.StartsWith("The relative tolerance must be a finite number of at least 0.", e.Message, StringComparison.Ordinal);
    }
}
