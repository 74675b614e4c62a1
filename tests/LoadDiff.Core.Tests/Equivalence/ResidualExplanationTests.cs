using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// How <see cref="EquivalenceCheck.Run"/> explains a residual (SPEC §4, "Explaining the residual"). Every expected value is
/// worked out by hand in the test from statics: the moment of a force about a point r × F, the centre of parallel forces,
/// the central axis of a wrench through R × M / |R|² (Murray, Li &amp; Sastry, ch. 2; CHECK-VALUES.md, wrench facts).
/// </summary>
public class ResidualExplanationTests
{
    private static readonly UnitSystem KiloNewtonMetre = new(UnitCatalog.Kilonewton, UnitCatalog.Metre, UnitCatalog.Kilogram);

    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Force(string id, double x, double y, double fz) => new(id, V(x, y, 0), V(0, 0, fz));

    /// <summary>A file as the readers would deliver it: one sink fed through its <see cref="ILoadSink"/> methods, candidates kept.</summary>
    private static CheckSide Side(string name, IEnumerable<(string Case, LoadItem[] Items)> cases, params LoadCombination[] combinations)
    {
        var sink = new ReductionSink(topContributors: 4096);
        foreach ((string caseName, LoadItem[] items) in cases)
        {
            sink.BeginCase(caseName, null);
            foreach (LoadItem item in items)
            {
                sink.Item(item);
            }
            sink.EndCase();
        }
        foreach (LoadCombination c in combinations)
        {
            sink.Combination(c);
        }
        return new CheckSide(name, sink);
    }

    private static CheckSide OneCase(string name, params LoadItem[] items) => Side(name, [("dead", items)]);

    private static CheckResult Run(CheckSide original, CheckSide substitute, Vector3 point, ToleranceSpec? tolerance = null) =>
        EquivalenceCheck.Run(original, substitute, KiloNewtonMetre, point, "given point", tolerance ?? ToleranceSpec.Default, []);

    private static CaseComparison Entry(CheckResult r, string name) => r.Comparisons.Single(c => c.Name == name);

    private static LoadCombination Combination(string name, params (string Case, double Factor)[] factors) =>
        new(name, factors.Select(f => KeyValuePair.Create(f.Case, f.Factor)).ToImmutableArray());

    // ---- misplaced resultant -------------------------------------------------------------------------------------

    [Theory]
    [InlineData(1.30, 0.30)] // the 13.57 kN support put 0.30 m too far in +x
    [InlineData(0.70, -0.30)] // … and 0.30 m too far in −x
    public void Support_moved_along_x_reads_as_a_misplaced_resultant_with_the_hand_shift(double placedAt, double expectedShift)
    {
        // Original: two forces of 6.785 kN downward at x = 0 and x = 2; their resultant 13.57 kN acts at the centre of the
        // parallel forces x̄ = Σ F x / Σ F = (6.785·0 + 6.785·2) / 13.57 = 1 (any statics text, Varignon's theorem).
        CheckSide original = OneCase("a", Force("s1", 0, 0, -6.785), Force("s2", 2, 0, -6.785));
        CheckSide substitute = OneCase("b", Force("r", placedAt, 0, -13.57));
        CaseComparison c = Entry(Run(original, substitute, V(1, 0, 0)), "dead");

        // About (1, 0, 0): ΔM = (placedAt − 1, 0, 0) × (0, 0, −13.57) = (0, 13.57·(placedAt − 1), 0) (r × F by hand);
        // s = R × ΔM / |R|² (SPEC §4): (0, 0, −13.57) × (0, d, 0) = (13.57·d, 0, 0) with d = 13.57·(placedAt − 1), over
        // 13.57², gives (placedAt − 1, 0, 0): the resultant line moved by exactly the support's own displacement.
        Assert.Equal(expectedShift, placedAt - 1, 12);

        Assert.False(c.Equivalent); // |ΔM| = 4.071 kN·m against 1e-3 · 13.57 · 2 = 0.02714 kN·m
        ResidualExplanation e = c.Explanation!;
        Assert.Equal(ResidualReading.MisplacedResultant, e.Reading);
        Close.Absolute(V(expectedShift, 0, 0), e.Shift!.Value, 1e-9);
        // The point is on the original's resultant line (vertical through x = 1, y = 0); the direction is R's.
        Close.Absolute(1, e.Point.X, 1e-9);
        Close.Absolute(0, e.Point.Y, 1e-9);
        Close.Absolute(V(0, 0, -1), e.AxisDirection!.Value, 1e-12);
        // Coplanar parallel forces: nothing is left over, neither a force nor a couple about R.
        Close.Absolute(Vector3.Zero, e.Force, 1e-9);
        Close.Absolute(Vector3.Zero, e.Couple, 1e-9);
    }

    [Fact]
    public void Support_moved_along_y_reads_as_a_shift_in_plus_y()
    {
        // The same two 6.785 kN forces at y = 0 and y = 2 (resultant at ȳ = 1), the 13.57 kN substitute at y = 1.30.
        // About (0, 1, 0): ΔM = (0, 0.30, 0) × (0, 0, −13.57) = (0.30·(−13.57), 0, 0) = (−4.071, 0, 0);
        // s = R × ΔM / |R|² = (0, 0, −13.57) × (−4.071, 0, 0) / 13.57² = (0, 13.57·4.071, 0) / 184.1449 = (0, 0.30, 0).
        CheckSide original = OneCase("a", Force("s1", 0, 0, -6.785), Force("s2", 0, 2, -6.785));
        CheckSide substitute = OneCase("b", Force("r", 0, 1.30, -13.57));
        ResidualExplanation e = Entry(Run(original, substitute, V(0, 1, 0)), "dead").Explanation!;
        Assert.Equal(ResidualReading.MisplacedResultant, e.Reading);
        Close.Absolute(V(0, 0.30, 0), e.Shift!.Value, 1e-9);
    }

    [Fact]
    public void The_shift_does_not_depend_on_the_reference_point()
    {
        // s is a property of the two lines of action; the point the moments are stated about must not change it
        // (moving a force-couple system: M_Q = M_P + (P − Q) × R, the same for both systems when ΔR = 0).
        CheckSide original = OneCase("a", Force("s1", 0, 0, -6.785), Force("s2", 2, 0, -6.785));
        CheckSide substitute = OneCase("b", Force("r", 1.30, 0, -13.57));
        foreach (Vector3 point in new[] { V(0, 0, 0), V(1, 0, 0), V(-40, 25, 7) })
        {
            ResidualExplanation e = Entry(Run(original, substitute, point), "dead").Explanation!;
            Assert.Equal(ResidualReading.MisplacedResultant, e.Reading);
            Close.Absolute(V(0.30, 0, 0), e.Shift!.Value, 1e-9);
        }
    }

    // ---- suspects ------------------------------------------------------------------------------------------------

    [Fact]
    public void Left_out_line_load_is_named_and_its_missing_force_acts_at_mid_length()
    {
        // AISC Manual, Beam Diagrams and Formulas, case 1 (from memory): a uniform load w over l has the resultant w·l at
        // l/2. Here w = 4 kN/m over l = 5 m: 20 kN at x = 2.5. The substitute keeps the two point forces only.
        double w = 4, l = 5;
        var udl = new LineLoad("udl", V(0, 0, 0), V(l, 0, 0), V(0, 0, -w), V(0, 0, -w));
        CheckSide original = OneCase("a", Force("p1", 1, 0, -10), udl, Force("p2", 4, 0, -8));
        CheckSide substitute = OneCase("b", Force("p1", 1, 0, -10), Force("p2", 4, 0, -8));
        CaseComparison c = Entry(Run(original, substitute, V(0, 0, 0)), "dead");

        Assert.False(c.Equivalent);
        ResidualExplanation e = c.Explanation!;
        SuspectItem named = Assert.Single(e.Suspects);
        Assert.Equal(new SuspectItem("udl", InOriginal: true, Case: null, Factor: 1, SuspectKind.LeftOut), named);
        // |ΔR| = 20 kN ≫ 1e-3 · 38 kN: a missing force, w·l = 20 kN downward, on the vertical line x = l/2, y = 0.
        Assert.Equal(ResidualReading.MissingForce, e.Reading);
        Close.Absolute(V(0, 0, -w * l), e.Force, 1e-9);
        Close.Absolute(l / 2, e.Point.X, 1e-9);
        Close.Absolute(0, e.Point.Y, 1e-9);
    }

    [Fact]
    public void Reversed_point_force_is_named_as_sign_reversed_in_both_files()
    {
        // p2 = −8 kN at x = 4 written as +8 kN: ΔR = +16 kN at x = 4 = −2 × (original p2) = 2 × (substitute p2) (exact).
        CheckSide original = OneCase("a", Force("p1", 1, 0, -10), Force("p2", 4, 0, -8), Force("p3", 2, 0, -6));
        CheckSide substitute = OneCase("b", Force("p1", 1, 0, -10), Force("p2", 4, 0, 8), Force("p3", 2, 0, -6));
        ResidualExplanation e = Entry(Run(original, substitute, V(0, 0, 0)), "dead").Explanation!;
        Assert.Contains(new SuspectItem("p2", true, null, 1, SuspectKind.SignReversed), e.Suspects);
        Assert.Contains(new SuspectItem("p2", false, null, 1, SuspectKind.SignReversed), e.Suspects);
        Assert.DoesNotContain(e.Suspects, s => s.Id != "p2");
    }

    [Fact]
    public void Extra_substitute_force_is_named_as_having_no_counterpart()
    {
        // The substitute carries an extra 5 kN at x = 3: ΔR = −5 kN at x = 3, equal to that item (exact).
        CheckSide original = OneCase("a", Force("p1", 1, 0, -10), Force("p2", 4, 0, -8));
        CheckSide substitute = OneCase("b", Force("p1", 1, 0, -10), Force("p2", 4, 0, -8), Force("extra", 3, 0, -5));
        ResidualExplanation e = Entry(Run(original, substitute, V(0, 0, 0)), "dead").Explanation!;
        SuspectItem named = Assert.Single(e.Suspects);
        Assert.Equal(new SuspectItem("extra", false, null, 1, SuspectKind.NoCounterpart), named);
    }

    [Fact]
    public void In_a_combination_the_suspect_carries_its_case_and_factor()
    {
        // EN 1990:2002 (6.10), Table A1.2(B): γG,sup = 1.35, γQ = 1.50 (CHECK-VALUES.md). The substitute's G lacks g2
        // (−10 kN at x = 3), so the combination's residual is 1.35 × 10 = 13.5 kN upward at x = 3 (exact arithmetic).
        LoadCombination uls = Combination("uls", ("G", 1.35), ("Q", 1.5));
        CheckSide original = Side("a", [("G", [Force("g1", 0, 0, -10), Force("g2", 3, 0, -10)]), ("Q", [Force("q1", 1.5, 0, -4)])], uls);
        CheckSide substitute = Side("b", [("G", [Force("g1", 0, 0, -10)]), ("Q", [Force("q1", 1.5, 0, -4)])], uls);
        CheckResult r = Run(original, substitute, V(0, 0, 0));

        CaseComparison combination = Entry(r, "uls");
        Assert.Equal(EntryKind.Combination, combination.Kind);
        Assert.False(combination.Equivalent);
        Close.Absolute(V(0, 0, 1.35 * 10), combination.Residual!.System.Force, 1e-9);
        SuspectItem named = Assert.Single(combination.Explanation!.Suspects);
        Assert.Equal(new SuspectItem("g2", true, "G", 1.35, SuspectKind.LeftOut), named);
        // In the case itself the same item is named without a case and with factor 1.
        Assert.Equal(new SuspectItem("g2", true, null, 1, SuspectKind.LeftOut), Assert.Single(Entry(r, "G").Explanation!.Suspects));
        Assert.True(Entry(r, "Q").Equivalent);
    }

    // ---- missing force on its axis, or at the box centre -----------------------------------------------------------

    [Fact]
    public void Residual_force_beyond_tolerance_reads_as_a_missing_force_on_its_central_axis()
    {
        // The substitute lacks b = 5 kN downward at x = 4. About the origin: ΔR = (0, 0, 5),
        // ΔM = −(4, 0, 0) × (0, 0, −5) = −(0, 20, 0) = (0, −20, 0) (r × F by hand).
        // Axis point ΔR × ΔM / |ΔR|² = (0, 0, 5) × (0, −20, 0) / 25 = (100, 0, 0) / 25 = (4, 0, 0)
        // (Murray–Li–Sastry ch. 2; CHECK-VALUES.md wrench facts); coplanar check d × ΔR = ΔM with d = (x, 0, 0):
        // (0, −5x, 0) = (0, −20, 0), x = 4.
        CheckSide original = OneCase("a", Force("a", 0, 0, -10), Force("b", 4, 0, -5), Force("c", 6, 0, -10));
        CheckSide substitute = OneCase("b", Force("a", 0, 0, -10), Force("c", 6, 0, -10));
        CaseComparison c = Entry(Run(original, substitute, V(0, 0, 0)), "dead");

        Assert.False(c.ForcePasses); // 5 kN against 1e-3 · 25 kN
        ResidualExplanation e = c.Explanation!;
        Assert.Equal(ResidualReading.MissingForce, e.Reading);
        Close.Absolute(V(4, 0, 0), e.Point, 1e-9);
        Close.Absolute(V(0, 0, -5), e.Force, 1e-9);
        Close.Absolute(V(0, 0, -1), e.AxisDirection!.Value, 1e-12);
        Close.Absolute(Vector3.Zero, e.Couple, 1e-9); // coplanar: a pure force, no couple about its line
        Assert.Contains(new SuspectItem("b", true, null, 1, SuspectKind.LeftOut), e.Suspects);
    }

    /// <summary>
    /// Original −10 kN at x = 0 and x = 2 (box [0, 2] on the x axis: diagonal 2, centre (1, 0, 0)). The substitute has −9 kN
    /// at x = 2 and a free couple C, so ΔR = (0, 0, 1) at x = 2 plus C. Its axis is the vertical line x = a when the
    /// residual about (a, 0, 0) is a pure force: (2 − a, 0, 0) × (0, 0, 1) + C = (0, a − 2, 0) + C = 0, C = (0, 2 − a, 0).
    /// </summary>
    private static CaseComparison AxisAt(double a)
    {
        CheckSide original = OneCase("a", Force("s1", 0, 0, -10), Force("s2", 2, 0, -10));
        CheckSide substitute = OneCase("b", Force("s1", 0, 0, -10), Force("s2", 2, 0, -9), new FreeCouple("c", V(0, 2 - a, 0)));
        return Entry(Run(original, substitute, V(1, 0, 0)), "dead");
    }

    [Theory]
    [InlineData(3.9, ResidualReading.MissingForce)] // 1.9 m from the box, within its diagonal of 2 m
    [InlineData(4.1, ResidualReading.MissingForceAtCentre)] // 2.1 m from the box, beyond its diagonal
    [InlineData(-2.1, ResidualReading.MissingForceAtCentre)] // 2.1 m beyond the other end
    public void Axis_farther_from_the_box_than_its_diagonal_is_stated_at_the_box_centre(double a, ResidualReading expected)
    {
        // SPEC §4: "where that axis lies farther from the box than the box's diagonal, say so and give the force and couple
        // at the box centre instead". |ΔR| = 1 kN against 1e-3 · 20 kN: beyond its allowance.
        CaseComparison c = AxisAt(a);
        Assert.False(c.ForcePasses);
        ResidualExplanation e = c.Explanation!;
        Assert.Equal(expected, e.Reading);
        // Either way the axis passes |a − 1| from the box centre.
        Close.Absolute(Math.Abs(a - 1), e.AxisDistance!.Value, 1e-9);
        Close.Absolute(V(0, 0, -1), e.Force, 1e-9);
        if (expected == ResidualReading.MissingForce)
        {
            Close.Absolute(a, e.Point.X, 1e-9);
            Close.Absolute(0, e.Point.Y, 1e-9);
        }
    }

    [Fact]
    public void Far_axis_gives_the_force_and_couple_at_the_box_centre()
    {
        // a = 21 (20 m from the centre, 19 m beyond the box end, diagonal 2). About the centre (1, 0, 0):
        // ΔM = (2 − 1, 0, 0) × (0, 0, 1) + (0, −19, 0) = (0, −1, 0) + (0, −19, 0) = (0, −20, 0); the substitute lacks
        // −ΔR = (0, 0, −1) kN and −ΔM = (0, 20, 0) kN·m there (r × F by hand).
        ResidualExplanation e = AxisAt(21).Explanation!;
        Assert.Equal(ResidualReading.MissingForceAtCentre, e.Reading);
        Close.Absolute(V(1, 0, 0), e.Point, 1e-12);
        Close.Absolute(V(0, 0, -1), e.Force, 1e-9);
        Close.Absolute(V(0, 20, 0), e.Couple, 1e-9);
        Close.Absolute(20, e.AxisDistance!.Value, 1e-9);
    }

    // ---- nothing to explain ----------------------------------------------------------------------------------------

    [Fact]
    public void Identical_systems_pass_with_no_reading_and_no_suspects()
    {
        // The same items on both sides: the residual is exactly zero (exact arithmetic), nothing to explain.
        LoadItem[] items =
        [
            Force("p1", 1, 0, -10),
            new LineLoad("udl", V(0, 0, 0), V(5, 0, 0), V(0, 0, -4), V(0, 0, -4)),
            new FreeCouple("c", V(0, 3, 0)),
        ];
        CaseComparison c = Entry(Run(OneCase("a", items), OneCase("b", items), V(0, 0, 0)), "dead");
        Assert.True(c.Equivalent);
        Assert.Equal(ResidualReading.None, c.Explanation!.Reading);
        Assert.Empty(c.Explanation.Suspects);
    }

    [Fact]
    public void A_misplacement_within_tolerance_is_read_as_a_shift_but_names_no_suspect()
    {
        // Suspects are named for failing cases only (ResidualSuspects searches only a residual beyond the tolerance).
        // Resultant 13.57 kN at x = 1 against the same at x = 1.001: |ΔM| = 0.01357 kN·m ≤ 0.02714 kN·m allowed.
        CheckSide original = OneCase("a", Force("s1", 0, 0, -6.785), Force("s2", 2, 0, -6.785));
        CheckSide substitute = OneCase("b", Force("r", 1.001, 0, -13.57));
        CaseComparison c = Entry(Run(original, substitute, V(1, 0, 0)), "dead");
        Assert.True(c.Equivalent);
        Assert.Equal(ResidualReading.MisplacedResultant, c.Explanation!.Reading);
        Close.Absolute(V(0.001, 0, 0), c.Explanation.Shift!.Value, 1e-9);
        Assert.Empty(c.Explanation.Suspects);
    }
}
