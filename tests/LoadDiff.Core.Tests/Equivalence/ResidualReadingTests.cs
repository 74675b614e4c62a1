using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The readings of <see cref="ResidualExplanation.For"/> at their edges (SPEC §4, "Explaining the residual"): no residual,
/// a couple, a misplaced resultant whose line misses the box centre, a residual force exactly at its allowance, an axis
/// exactly one diagonal from the box. Every expected value is statics by hand: r × F, the centre of parallel forces
/// x̄ = Σ F x / Σ F, the shift s = R × ΔM / |R|² and the couple along R, R (R · ΔM) / |R|² (SPEC §4), the central axis of a
/// wrench through R × M / |R|² (Murray, Li &amp; Sastry, ch. 2; CHECK-VALUES.md, wrench facts).
/// </summary>
public class ResidualReadingTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Down(string id, double x, double fz) => new(id, V(x, 0, 0), V(0, 0, -fz));

    private static CaseComparison Compare(Vector3 point, LoadItem[] original, LoadItem[] substitute, ToleranceSpec? tolerance = null) =>
        EquivalenceChecker.Compare("c", EntryKind.Case, Reduce.About(point, original), Reduce.About(point, substitute), tolerance ?? ToleranceSpec.Default);

    private static ResidualExplanation Read(CaseComparison c) => ResidualExplanation.For(c, [], false);

    [Fact]
    public void Two_empty_cases_have_no_residual_stated_at_the_reference_point()
    {
        // Nothing on either side: ΔR = 0 and ΔM = 0 with a rounding noise of 0, and no box to take a centre from.
        Vector3 p = V(1, 2, 3);
        ResidualExplanation e = Read(Compare(p, [], []));
        Assert.Equal(ResidualReading.None, e.Reading);
        Assert.Equal(p, e.Point);
        Assert.Equal(Vector3.Zero, e.Force);
        Assert.Equal(Vector3.Zero, e.Couple);
    }

    [Fact]
    public void Identical_systems_have_no_residual_stated_at_the_box_centre()
    {
        // Loads at (0, 0, 0) and (4, 2, 0): the box centre is (2, 1, 0), not the reference point (−5, 0, 0).
        LoadItem[] items = [new PointForce("a", V(0, 0, 0), V(0, 0, -10)), new PointForce("b", V(4, 2, 0), V(0, 0, -10))];
        ResidualExplanation e = Read(Compare(V(-5, 0, 0), items, items));
        Assert.Equal(ResidualReading.None, e.Reading);
        Assert.Equal(V(2, 1, 0), e.Point);
    }

    [Fact]
    public void Couples_only_differing_read_as_a_couple()
    {
        // The original's couple (0, 30, 0) kN·m, the substitute's (0, 20, 0): ΔR = 0, ΔM = (0, −10, 0), and the original has
        // no resultant force: the substitute lacks the couple (0, 10, 0), stated at the reference point (no geometry).
        Vector3 p = V(3, 0, 0);
        CaseComparison c = Compare(p, [new FreeCouple("c", V(0, 30, 0))], [new FreeCouple("c", V(0, 20, 0))]);
        Assert.False(c.Equivalent);
        ResidualExplanation e = Read(c);
        Assert.Equal(ResidualReading.Couple, e.Reading);
        Assert.Equal(Vector3.Zero, e.Force);
        Assert.Equal(V(0, 10, 0), e.Couple);
        Assert.Equal(p, e.Point);
        Assert.Null(e.Shift);
    }

    [Fact]
    public void A_misplaced_resultant_is_read_about_the_point_of_the_originals_line_nearest_the_box_centre()
    {
        // Original −10 kN at x = 0 and −30 kN at x = 4: R = −40 kN at x̄ = (10·0 + 30·4) / 40 = 3. The substitute puts −40 kN
        // at x = 3.5 and adds a torsion couple (0, 0, 5) kN·m. Box x = 0 … 4, centre (2, 0, 0); the original's line is the
        // vertical through x = 3, nearest the centre at (3, 0, 0).
        // About (3, 0, 0): ΔM = (0.5, 0, 0) × (0, 0, −40) + (0, 0, 5) = (0, 20, 5). s = R × ΔM / |R|²
        // = (0, 0, −40) × (0, 20, 5) / 1600 = (800, 0, 0) / 1600 = (0.5, 0, 0). Along R: R (R · ΔM) / |R|² =
        // (0, 0, −40)(−200) / 1600 = (0, 0, 5), which no shift can make: the substitute lacks its opposite, (0, 0, −5).
        CaseComparison c = Compare(Vector3.Zero, [Down("a", 0, 10), Down("b", 4, 30)], [Down("r", 3.5, 40), new FreeCouple("t", V(0, 0, 5))]);
        Assert.True(c.ForcePasses);
        ResidualExplanation e = Read(c);
        Assert.Equal(ResidualReading.MisplacedResultant, e.Reading);
        Close.Absolute(V(3, 0, 0), e.Point, 1e-12);
        Close.Absolute(V(0.5, 0, 0), e.Shift!.Value, 1e-12);
        Close.Absolute(V(0, 0, -5), e.Couple, 1e-12);
        Close.Absolute(V(0, 0, -1), e.AxisDirection!.Value, 1e-15);
        Assert.Equal(Vector3.Zero, e.Force);
    }

    [Fact]
    public void A_residual_force_exactly_at_its_allowance_is_read_with_the_resultant_not_as_a_missing_force()
    {
        // −10 kN against −15 kN, both at x = 0: ΔR = (0, 0, −5) and F = 5 kN exactly (SPEC §4: pass iff |ΔR| ≤ F). Both act
        // on one line, so there is no shift; the substitute has 5 kN too much, i.e. it lacks (0, 0, 5).
        CaseComparison c = Compare(Vector3.Zero, [Down("p", 0, 10)], [Down("p", 0, 15)], new ToleranceSpec(0, 5, 0));
        Assert.True(c.ForcePasses);
        ResidualExplanation e = Read(c);
        Assert.Equal(ResidualReading.MisplacedResultant, e.Reading);
        Assert.Equal(V(0, 0, 5), e.Force);
        Close.Absolute(Vector3.Zero, e.Shift!.Value, 1e-15);
        Assert.Null(e.AxisDistance);
    }

    [Fact]
    public void A_missing_force_whose_axis_lies_exactly_one_diagonal_from_the_box_is_stated_on_its_axis()
    {
        // Original −10 kN at x = 0 and x = 2 (box x = 0 … 2: diagonal 2, centre (1, 0, 0)); the substitute has −9 kN at x = 2
        // and a couple (0, −2, 0). About the centre: ΔR = (0, 0, 1), ΔM = (1, 0, 0) × (0, 0, 1) + (0, −2, 0) = (0, −3, 0);
        // axis point (1, 0, 0) + ΔR × ΔM / |ΔR|² = (1, 0, 0) + (3, 0, 0) = (4, 0, 0): 3 m from the centre, 2 m beyond the box
        // end x = 2, which is exactly the diagonal. SPEC §4 moves the statement to the box centre only when the axis lies
        // *farther* than that.
        CaseComparison c = Compare(V(1, 0, 0), [Down("s1", 0, 10), Down("s2", 2, 10)],
            [Down("s1", 0, 10), Down("s2", 2, 9), new FreeCouple("c", V(0, -2, 0))]);
        Assert.False(c.ForcePasses);
        ResidualExplanation e = Read(c);
        Assert.Equal(3, e.AxisDistance);
        Assert.Equal(ResidualReading.MissingForce, e.Reading);
        Close.Absolute(V(4, 0, 0), e.Point, 1e-12);
    }

    [Fact]
    public void Null_or_one_sided_comparisons_are_refused()
    {
        CaseComparison oneSided = EquivalenceChecker.Missing("c", EntryKind.Case, Reduce.About(Vector3.Zero, [Down("p", 0, 1)]), null);
        Assert.Throws<ArgumentNullException>(() => ResidualExplanation.For(null!, [], false));
        Assert.Throws<ArgumentNullException>(() => ResidualExplanation.For(oneSided, null!, false));
        ArgumentException e = Assert.Throws<ArgumentException>(() => ResidualExplanation.For(oneSided, [], false));
        Assert.Equal("c", e.ParamName);
        Assert.StartsWith("The comparison has no residual.", e.Message, StringComparison.Ordinal);
    }
}
