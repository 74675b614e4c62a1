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
/// <see cref="EquivalenceCheck.Run"/> as a whole (SPEC §4): which cases and combinations are compared, the notes on a
/// combination, the warnings, and the largest contributors listed per case. The load sets are invented; every expected
/// number is hand statics (Σ F, r × F) or exact arithmetic in the test, every expected sentence the one SPEC §4 describes.
/// </summary>
public class EquivalenceCheckTests
{
    private static readonly UnitSystem KiloNewtonMetre = new(UnitCatalog.Kilonewton, UnitCatalog.Metre, UnitCatalog.Kilogram);

    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Down(string id, double x, double fz) => new(id, V(x, 0, 0), V(0, 0, -fz));

    private static ReductionSink Sink(IEnumerable<(string Case, LoadItem[] Items)> cases, params LoadCombination[] combinations) =>
        Sink(4096, cases, combinations);

    private static ReductionSink Sink(int kept, IEnumerable<(string Case, LoadItem[] Items)> cases, params LoadCombination[] combinations)
    {
        var sink = new ReductionSink(topContributors: kept);
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
        return sink;
    }

    private static CheckSide Side(string name, IEnumerable<(string Case, LoadItem[] Items)> cases, params LoadCombination[] combinations) =>
        new(name, Sink(cases, combinations));

    private static LoadCombination Combination(string name, params (string Case, double Factor)[] factors) =>
        new(name, factors.Select(f => KeyValuePair.Create(f.Case, f.Factor)).ToImmutableArray());

    private static CheckResult Run(CheckSide original, CheckSide substitute, IReadOnlyCollection<string>? selected = null) =>
        EquivalenceCheck.Run(original, substitute, KiloNewtonMetre, Vector3.Zero, "origin", ToleranceSpec.Default, selected ?? []);

    private static CaseComparison Entry(CheckResult r, string name) => r.Comparisons.Single(c => c.Name == name);

    // G: two 10 kN loads at x = 0 and x = 4, resultant 20 kN at x = 2 (centre of parallel forces). Q: 4 kN at x = 2.
    private static readonly LoadItem[] DeadLoads = [Down("g1", 0, 10), Down("g2", 4, 10)];
    private static readonly LoadItem[] DeadLumped = [Down("G", 2, 20)];
    private static readonly LoadItem[] Imposed = [Down("q1", 2, 4)];

    // EN 1990:2002 (6.10) with Table A1.2(B): γG = 1.35, γQ = 1.5 (CHECK-VALUES.md).
    private static readonly LoadCombination Uls = Combination("uls", ("G", 1.35), ("Q", 1.5));

    // ---- which entries are compared ---------------------------------------------------------------------------------

    [Fact]
    public void Cases_in_one_file_only_are_listed_after_the_shared_ones_and_fail()
    {
        // SPEC §4: "A case present in one file only is reported and fails."
        CheckSide original = Side("a", [("G", DeadLoads), ("S", [Down("s1", 1, 3)])]);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("W", [Down("w1", 1, 2)])]);
        CheckResult r = Run(original, substitute);

        Assert.Equal(["G", "S", "W"], r.Comparisons.Select(c => c.Name));
        CaseComparison g = Entry(r, "G");
        Assert.Equal(OnlyIn.Both, g.Presence);
        Assert.True(g.Equivalent); // 20 kN at x = 2 on both sides: ΔR = 0 and ΔM = 0 (exact)

        CaseComparison s = Entry(r, "S");
        Assert.Equal(OnlyIn.Original, s.Presence);
        Assert.False(s.Equivalent);
        Assert.Null(s.Residual);
        Assert.Null(s.Substitute);
        Assert.NotNull(s.Original);
        Assert.Null(s.Explanation);

        CaseComparison w = Entry(r, "W");
        Assert.Equal(OnlyIn.Substitute, w.Presence);
        Assert.Equal(EntryKind.Case, w.Kind);
        Assert.False(w.Equivalent);
        Assert.Null(w.Original);
        Close.Absolute(V(0, 0, -2), w.Substitute!.Force, 0);
    }

    [Fact]
    public void Only_the_selected_cases_and_combinations_are_compared()
    {
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed)], Uls);
        Assert.Equal(["Q"], Run(original, substitute, ["Q"]).Comparisons.Select(c => c.Name));
        Assert.Equal(["uls"], Run(original, substitute, ["uls"]).Comparisons.Select(c => c.Name));
        Assert.Equal(["G", "Q", "uls"], Run(original, substitute).Comparisons.Select(c => c.Name));
    }

    [Fact]
    public void Complete_combination_with_the_same_factors_passes_without_a_note()
    {
        // The factors written in another order: a combination is a map from case to factor, so this is no conflict.
        LoadCombination swapped = Combination("uls", ("Q", 1.5), ("G", 1.35));
        LoadCombination other = Combination("sls", ("G", 1.0), ("Q", 1.0));
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls, Combination("sls", ("G", 1.0), ("Q", 1.0)));
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed)], other, swapped);
        CheckResult r = Run(original, substitute);

        CaseComparison uls = Entry(r, "uls");
        Assert.Equal(EntryKind.Combination, uls.Kind);
        Assert.True(uls.Equivalent);
        Assert.Empty(uls.Notes);
        // 1.35 × 20 + 1.5 × 4 = 33 kN downward in both (EN 1990 (6.10)); the residual is exactly zero.
        Close.Relative(V(0, 0, -33), uls.Original!.Force, 1e-15);
        Close.Absolute(Vector3.Zero, uls.Residual!.System.Force, 0);
        Assert.Empty(Entry(r, "sls").Notes);
        Assert.DoesNotContain(r.Comparisons, c => c.Presence != OnlyIn.Both);
        Assert.Equal(4, r.Comparisons.Count);
    }

    [Fact]
    public void Combination_naming_a_case_the_substitute_lacks_fails_with_a_note_even_when_the_sums_agree()
    {
        // The substitute put Q's 4 kN at x = 2 into its G: 24 kN at x = 2. The original's 1.0·G + 1.0·Q is 20 kN at x = 2
        // plus 4 kN at x = 2, the same 24 kN at x = 2 (hand sum), yet the substitute has no Q to combine.
        LoadCombination sls = Combination("sls", ("G", 1.0), ("Q", 1.0));
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], sls);
        CheckSide substitute = Side("b", [("G", [Down("G", 2, 24)])]);
        CaseComparison c = Entry(Run(original, substitute), "sls");

        Close.Absolute(Vector3.Zero, c.Residual!.System.Force, 0);
        Assert.True(c.ForcePasses);
        Assert.True(c.MomentPasses);
        Assert.False(c.Equivalent);
        Assert.Equal(["the substitute lacks case Q, so this combination is incomplete there"], c.Notes);
    }

    [Fact]
    public void Combination_lacking_two_cases_names_both_in_the_plural()
    {
        LoadCombination all = Combination("all", ("G", 1.0), ("Q", 1.0), ("S", 1.0));
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed), ("S", [Down("s1", 1, 3)])], all);
        CheckSide substitute = Side("b", [("G", DeadLumped)]);
        CaseComparison c = Entry(Run(original, substitute), "all");
        Assert.False(c.Equivalent);
        Assert.Equal(["the substitute lacks cases Q, S, so this combination is incomplete there"], c.Notes);
    }

    [Fact]
    public void Conflicting_factors_are_noted_and_the_originals_are_applied_to_both()
    {
        // The substitute defines uls with γG = 1.35 but γQ = 1.05 (ψ0·γQ = 0.7 × 1.5, EN 1990 (6.10a), from memory). The
        // original's factors are applied to both, so the combination compares 1.35·20 + 1.5·4 = 33 kN on both sides.
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed)], Combination("uls", ("G", 1.35), ("Q", 1.05)));
        CaseComparison c = Entry(Run(original, substitute), "uls");

        Assert.Equal(["the substitute defines 'uls' as 1.35·G + 1.05·Q; the original's factors 1.35·G + 1.5·Q were applied to both"], c.Notes);
        Assert.True(c.Equivalent); // a note only: the verdict uses the original's factors
        Close.Relative(V(0, 0, -33), c.Substitute!.Force, 1e-15);
    }

    [Fact]
    public void Same_cases_with_one_factor_moved_to_another_case_is_a_conflict()
    {
        // {G: 1.5, Q: 1.35} has the same keys and the same set of values as {G: 1.35, Q: 1.5}, but not the same pairs.
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed)], Combination("uls", ("G", 1.5), ("Q", 1.35)));
        CaseComparison c = Entry(Run(original, substitute), "uls");
        Assert.Equal(["the substitute defines 'uls' as 1.5·G + 1.35·Q; the original's factors 1.35·G + 1.5·Q were applied to both"], c.Notes);
    }

    [Fact]
    public void Substitute_combination_with_an_extra_case_is_a_conflict()
    {
        LoadCombination more = Combination("uls", ("G", 1.35), ("Q", 1.5), ("W", 0.9));
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed), ("W", [Down("w", 1, 1)])], more);
        CaseComparison c = Entry(Run(original, substitute), "uls");
        Assert.Equal(["the substitute defines 'uls' as 1.35·G + 1.5·Q + 0.9·W; the original's factors 1.35·G + 1.5·Q were applied to both"], c.Notes);
    }

    [Fact]
    public void Combination_in_the_substitute_only_is_reported_and_fails()
    {
        LoadCombination acc = Combination("acc", ("G", 1.0));
        CheckSide original = Side("a", [("G", DeadLoads), ("Q", Imposed)], Uls);
        CheckSide substitute = Side("b", [("G", DeadLumped), ("Q", Imposed)], Uls, acc);
        CheckResult r = Run(original, substitute);

        Assert.Equal(["G", "Q", "uls", "acc"], r.Comparisons.Select(c => c.Name));
        CaseComparison c = Entry(r, "acc");
        Assert.Equal(EntryKind.Combination, c.Kind);
        Assert.Equal(OnlyIn.Substitute, c.Presence);
        Assert.False(c.Equivalent);
        Close.Absolute(V(0, 0, -20), c.Substitute!.Force, 0); // 1.0 × 20 kN
    }

    // ---- warnings -------------------------------------------------------------------------------------------------

    private static DocumentHeader Header(bool force, bool length) =>
        new(null, UnitSystem.Si, UnitSystem.Si, ImmutableSortedDictionary<string, Vector3>.Empty)
        {
            ForceUnitStated = force,
            LengthUnitStated = length,
        };

    [Fact]
    public void A_file_without_units_is_warned_about_by_role_and_name()
    {
        // SPEC §3: units default to N, m, kg.
        var original = new CheckSide("a.loads.json", Sink([("G", DeadLoads)]), Header(false, false));
        var substitute = new CheckSide("b.loads.json", Sink([("G", DeadLumped)]), Header(true, false));
        CheckResult r = Run(original, substitute);
        Assert.Equal(
        [
            "no units given in the original (a.loads.json): its values were read as N, m, kg",
            "the substitute (b.loads.json) states a force unit but no length unit: its lengths were read as m",
        ], r.Warnings);
        Assert.True(r.Equivalent); // warnings never change a verdict
    }

    [Fact]
    public void Files_that_state_their_units_and_agree_in_size_give_no_warning()
    {
        var original = new CheckSide("a", Sink([("G", DeadLoads)]), Header(true, true));
        var substitute = new CheckSide("b", Sink([("G", DeadLumped)]), Header(true, true));
        Assert.Empty(Run(original, substitute).Warnings);
    }

    [Fact]
    public void A_substitute_in_millimetres_read_as_metres_is_warned_about()
    {
        // The substitute spreads G's two loads over 0 … 4000 instead of 0 … 4: a 1000× larger region (1 m = 1000 mm, SI
        // prefix milli, NIST SP 330), hinted over all cases together.
        CheckSide original = Side("a", [("G", DeadLoads)]);
        CheckSide substitute = Side("b", [("G", [Down("g1", 0, 10), Down("g2", 4000, 10)])]);
        CheckResult r = Run(original, substitute);
        string warning = Assert.Single(r.Warnings);
        Assert.Equal("the substitute's loads span a region about 1000× larger than the original's (lengths in mm read as m?)", warning);
        Assert.False(r.Equivalent);
    }

    // ---- listed contributors --------------------------------------------------------------------------------------

    [Fact]
    public void The_three_largest_forces_and_couples_of_each_file_are_listed_per_case()
    {
        LoadItem[] original =
        [
            Down("f2", 1, 2), Down("f7", 2, 7), Down("f5", 3, 5), Down("f9", 4, 9), Down("f1", 5, 1),
            new FreeCouple("c3", V(0, 3, 0)), new FreeCouple("c8", V(0, 0, 8)), new FreeCouple("c4", V(4, 0, 0)), new FreeCouple("c6", V(0, 6, 0)),
        ];
        CheckSide a = Side("a", [("G", original)]);
        CheckSide b = Side("b", [("G", [Down("R", 3, 24)])]);
        CaseContributors listed = Run(a, b).Contributors["G"];
        // |F| = 9, 7, 5 of the five forces, then |C| = 8, 6, 4 of the four couples (largest first, by hand).
        Assert.Equal(["f9", "f7", "f5", "c8", "c6", "c4"], listed.Original.Select(k => k.Id));
        Assert.Equal(["R"], listed.Substitute.Select(k => k.Id));
    }

    [Fact]
    public void A_case_in_one_file_only_lists_no_contributors_for_the_other()
    {
        CheckResult r = Run(Side("a", [("G", DeadLoads)]), Side("b", [("W", [Down("w1", 1, 2)])]));
        Assert.Equal(["g1", "g2"], r.Contributors["G"].Original.Select(k => k.Id));
        Assert.Empty(r.Contributors["G"].Substitute);
        Assert.Empty(r.Contributors["W"].Original);
    }

    [Fact]
    public void A_search_among_fewer_items_than_the_case_has_says_it_was_bounded()
    {
        // Two items kept per case: the original's third and smallest load (1 kN, left out of the substitute) was never a
        // candidate, so no suspect is named and the explanation must say the search was bounded.
        var original = new CheckSide("a", Sink(2, [("G", [Down("f5", 0, 5), Down("f3", 1, 3), Down("f1", 2, 1)])]));
        var substitute = new CheckSide("b", Sink(2, [("G", [Down("f5", 0, 5), Down("f3", 1, 3)])]));
        CaseComparison c = Entry(Run(original, substitute), "G");
        Assert.False(c.Equivalent); // ΔR = 1 kN against 1e-3 × 9 kN
        Assert.Empty(c.Explanation!.Suspects);
        Assert.True(c.Explanation.SearchBounded);
    }

    [Fact]
    public void A_search_among_every_item_is_not_bounded()
    {
        var original = new CheckSide("a", Sink(3, [("G", [Down("f5", 0, 5), Down("f3", 1, 3), Down("f1", 2, 1)])]));
        var substitute = new CheckSide("b", Sink(3, [("G", [Down("f5", 0, 5), Down("f3", 1, 3)])]));
        CaseComparison c = Entry(Run(original, substitute), "G");
        Assert.Equal([new SuspectItem("f1", true, null, 1, SuspectKind.LeftOut)], c.Explanation!.Suspects);
        Assert.False(c.Explanation.SearchBounded);
    }

    // ---- guards ---------------------------------------------------------------------------------------------------

    [Fact]
    public void Null_arguments_throw_even_when_there_is_nothing_to_compare()
    {
        CheckSide empty = new("e", new ReductionSink());
        Assert.Throws<ArgumentNullException>(() => EquivalenceCheck.Run(null!, empty, KiloNewtonMetre, Vector3.Zero, "o", ToleranceSpec.Default, []));
        Assert.Throws<ArgumentNullException>(() => EquivalenceCheck.Run(empty, null!, KiloNewtonMetre, Vector3.Zero, "o", ToleranceSpec.Default, []));
        Assert.Throws<ArgumentNullException>(() => EquivalenceCheck.Run(empty, empty, KiloNewtonMetre, Vector3.Zero, "o", null!, []));
        Assert.Throws<ArgumentNullException>(() => EquivalenceCheck.Run(empty, empty, KiloNewtonMetre, Vector3.Zero, "o", ToleranceSpec.Default, null!));
    }
}
