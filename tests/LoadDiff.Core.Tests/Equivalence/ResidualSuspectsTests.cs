using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// <see cref="ResidualSuspects.Find"/> on residuals worked by hand (SPEC §4: an item whose contribution equals −residual,
/// +residual, or whose doubled contribution equals it, "within the tolerance"). Residuals come from
/// <see cref="EquivalenceChecker.Compare"/> on point forces along x at z = 0; the candidates are written out as
/// contributors. Every number is hand statics: ΔR = Σ F, the moment of a force r × F, and for a vertical force F_z at
/// x = a about x = q: M = (a − q, 0, 0) × (0, 0, F_z) = (0, −(a − q)·F_z, 0).
/// </summary>
public class ResidualSuspectsTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static PointForce Up(string id, double x, double fz) => new(id, V(x, 0, 0), V(0, 0, fz));

    private static CaseComparison Compare(LoadItem[] original, LoadItem[] substitute, ToleranceSpec tolerance) =>
        EquivalenceChecker.Compare("c", EntryKind.Case,
            Support.Reduce.About(Vector3.Zero, original), Support.Reduce.About(Vector3.Zero, substitute), tolerance);

    private static ResidualSuspects.Candidate Force(string id, double x, double fz, bool inOriginal, string? inCase = null, double factor = 1) =>
        new(new Contributor(id, LoadKind.Force, V(0, 0, fz), Vector3.Zero, V(x, 0, 0), 1), inOriginal, inCase, factor);

    private static ResidualSuspects.Candidate Couple(string id, Vector3 c, bool inOriginal) =>
        new(new Contributor(id, LoadKind.Couple, Vector3.Zero, c, null, 1), inOriginal, null, 1);

    private static IReadOnlyList<SuspectItem> Find(CaseComparison c, params ResidualSuspects.Candidate[] candidates) =>
        ResidualSuspects.Find(c.Residual!, c.Tolerance!, Box.Union(c.Original!.Bounds, c.Substitute!.Bounds), Vector3.Zero, candidates);

    // Original −10 kN at x = 0 and x = 2; the substitute's second load is −8 kN: ΔR = +2 kN at x = 2. About the box corners
    // x = 0 and x = 2: |ΔM| = |−(2 − 0)·2| = 4 kN·m and 0. The candidate −3.5 kN at x = 2 would leave −1.5 kN at x = 2:
    // |ΔM'| = 1.5 · 2 = 3 kN·m at x = 0.
    private static readonly LoadItem[] Pair = [Up("a", 0, -10), Up("b", 2, -10)];
    private static readonly LoadItem[] PairLighter = [Up("a", 0, -10), Up("b", 2, -8)];

    [Fact]
    public void A_residual_at_exactly_its_allowances_passes_and_names_nothing()
    {
        // F = 2 kN and M = 4 kN·m exactly: |ΔR| ≤ F and |ΔM| ≤ M (SPEC §4, "≤"), so there is nothing to explain.
        CaseComparison c = Compare(Pair, PairLighter, new ToleranceSpec(0, 2, 4));
        Assert.True(c.Equivalent);
        Assert.Empty(Find(c, Force("x", 2, -3.5, inOriginal: true)));
    }

    [Fact]
    public void The_same_residual_just_beyond_the_force_allowance_names_the_item_that_accounts_for_it()
    {
        // F = 1.9 kN: |ΔR| = 2 fails, the moment (4 ≤ 4) passes. −3.5 kN is itself beyond 1.9 kN and leaves 1.5 kN ≤ 1.9 kN
        // and 3 kN·m ≤ 4 kN·m: it accounts for the residual, as an original item left out.
        CaseComparison c = Compare(Pair, PairLighter, new ToleranceSpec(0, 1.9, 4));
        Assert.False(c.ForcePasses);
        Assert.True(c.MomentPasses);
        Assert.Equal([new SuspectItem("x", true, null, 1, SuspectKind.LeftOut)], Find(c, Force("x", 2, -3.5, inOriginal: true)));
    }

    [Fact]
    public void A_couple_left_out_of_a_system_without_geometry_is_named()
    {
        // Couples only: no box, so the residual is judged at the reference point. ΔR = 0 passes; ΔM = −(0, 50, 0) fails.
        LoadItem[] original = [new FreeCouple("c1", V(0, 50, 0)), new FreeCouple("c2", V(0, 0, 20))];
        LoadItem[] substitute = [new FreeCouple("c2", V(0, 0, 20))];
        CaseComparison c = Compare(original, substitute, ToleranceSpec.Default);
        Assert.Null(c.Original!.Bounds);
        Assert.True(c.ForcePasses);
        Assert.False(c.MomentPasses);
        IReadOnlyList<SuspectItem> found = Find(c, Couple("c1", V(0, 50, 0), true), Couple("c2", V(0, 0, 20), true));
        Assert.Equal([new SuspectItem("c1", true, null, 1, SuspectKind.LeftOut)], found);
    }

    [Fact]
    public void An_item_within_the_tolerance_itself_explains_nothing()
    {
        // ΔR = 11 − 8.5 = +2.5 kN at x = 0, beyond F = 2 kN. The 1 kN item would leave 1.5 kN, within 2 kN, but it is itself
        // within 2 kN, so it is not named; the 10 kN item leaves 7.5 kN (or 17.5 kN doubled) and is not named either.
        CaseComparison c = Compare([Up("p", 0, -10), Up("t", 0, -1)], [Up("p", 0, -8.5)], new ToleranceSpec(0, 2, 100));
        Assert.False(c.Equivalent);
        Assert.Empty(Find(c, Force("p", 0, -10, true), Force("t", 0, -1, true)));
    }

    [Fact]
    public void A_remainder_exactly_at_the_force_allowance_counts_as_within()
    {
        // ΔR = 10 − 5.5 = +4.5 kN at x = 0. The −2.5 kN item leaves exactly 2 kN = F: within, so it was left out. (Doubled
        // it would leave −0.5 kN, also within, but "left out" is the first reading that fits.)
        CaseComparison c = Compare([Up("p", 0, -10)], [Up("p", 0, -5.5)], new ToleranceSpec(0, 2, 100));
        Assert.Equal([new SuspectItem("s", true, null, 1, SuspectKind.LeftOut)], Find(c, Force("s", 0, -2.5, true)));
    }

    [Fact]
    public void A_remainder_exactly_at_the_moment_allowance_counts_as_within()
    {
        // Couples only: ΔM = −(0, 4.5, 0) kN·m against M = 2; the (0, 2.5, 0) couple leaves exactly −(0, 2, 0): within.
        CaseComparison c = Compare([new FreeCouple("big", V(0, 4.5, 0))], [], new ToleranceSpec(0, 0, 2));
        Assert.Equal(2, c.Tolerance!.Moment);
        Assert.Equal([new SuspectItem("s", true, null, 1, SuspectKind.LeftOut)], Find(c, Couple("s", V(0, 2.5, 0), true)));
    }

    [Fact]
    public void An_item_must_account_for_the_residual_at_every_corner_not_only_at_the_reference_point()
    {
        // F = 5 kN, M = 1 kN·m; the substitute lacks a = −10 kN at x = 0: ΔR = +10 kN at x = 0, box x = 0 … 4.
        // The −7 kN item at x = 0 (itself beyond 5 kN) would leave +3 kN at x = 0: within F, and 0 about the reference
        // point x = 0, but |−(0 − 4)·3| = 12 kN·m about the corner x = 4. Doubled it leaves −4 kN: 16 kN·m there. Not named.
        CaseComparison c = Compare([Up("a", 0, -10), Up("b", 4, -10)], [Up("b", 4, -10)], new ToleranceSpec(0, 5, 1));
        IReadOnlyList<SuspectItem> found = Find(c, Force("a", 0, -10, true), Force("c", 0, -7, true));
        Assert.Equal([new SuspectItem("a", true, null, 1, SuspectKind.LeftOut)], found);
    }

    [Fact]
    public void Suspects_are_ordered_by_their_factored_size_largest_first()
    {
        // ΔR = +15 kN at x = 0. Candidate a: 10 kN × 1.5 = 15 kN, left out (EN 1990 (6.10) γQ = 1.5); candidate b: 7.5 kN,
        // whose doubled contribution is 15 kN (sign reversed). Sizes 15 and 7.5: a first, whatever the order offered.
        CaseComparison c = Compare([Up("a", 0, -15), Up("z", 4, -5)], [Up("z", 4, -5)], ToleranceSpec.Default);
        IReadOnlyList<SuspectItem> found = Find(c, Force("b", 0, -7.5, true, "G", 1), Force("a", 0, -10, true, "Q", 1.5));
        Assert.Equal(
        [
            new SuspectItem("a", true, "Q", 1.5, SuspectKind.LeftOut),
            new SuspectItem("b", true, "G", 1, SuspectKind.SignReversed),
        ], found);
    }

    [Fact]
    public void At_most_five_suspects_are_named()
    {
        // Seven substitute items, each +15 kN at x = 0 against ΔR = +15 kN: each has no counterpart; five are named, in the
        // order offered (equal sizes).
        CaseComparison c = Compare([Up("z", 4, -5)], [Up("z", 4, -5), Up("e", 0, 15)], ToleranceSpec.Default);
        ResidualSuspects.Candidate[] extra = [.. Enumerable.Range(1, 7).Select(i => Force($"e{i}", 0, 15, false))];
        IReadOnlyList<SuspectItem> found = Find(c, extra);
        Assert.Equal(ResidualSuspects.MaxNamed, found.Count);
        Assert.Equal(["e1", "e2", "e3", "e4", "e5"], found.Select(s => s.Id));
        Assert.All(found, s => Assert.Equal(SuspectKind.NoCounterpart, s.Kind));
    }

    [Fact]
    public void Null_arguments_throw()
    {
        CaseComparison c = Compare(Pair, PairLighter, ToleranceSpec.Default);
        ResidualSuspects.Candidate[] one = [Force("x", 2, -2, true)];
        Assert.Throws<ArgumentNullException>(() => ResidualSuspects.Find(null!, c.Tolerance!, null, Vector3.Zero, one));
        Assert.Throws<ArgumentNullException>(() => ResidualSuspects.Find(c.Residual!, null!, null, Vector3.Zero, one));
        Assert.Throws<ArgumentNullException>(() => ResidualSuspects.Find(c.Residual!, c.Tolerance!, null, Vector3.Zero, null!));
    }
}
