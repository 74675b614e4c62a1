using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;

namespace LoadDiff.Core.Tests.Sections;

public partial class SectionGateVerdictTests
{
    [Fact]
    public void Evaluate_checksItsOwnToleranceEvenWithNoComparisons()
    {
        // With no comparison the per-case check never runs: the verdict's own check is the only one.
        Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(AlongX, -0.1, []));
        Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(AlongX, double.NaN, []));
        Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(AlongX, double.PositiveInfinity, []));
        // zero is allowed (exact agreement asked for), and a gate over nothing passes
        SectionGateVerdict none = SectionGateVerdict.Evaluate(AlongX, 0, []);
        Assert.True(none.Passes);
        Assert.Empty(none.Cases);
    }

    [Fact]
    public void Evaluate_nullArgumentsAndAnotherAxis_areRefusedNamingTheCase()
    {
        SectionComparison c = Compare(Original, Substitute);
        Assert.Throws<ArgumentNullException>(() => SectionGateVerdict.Evaluate(null!, Rel, [("dead", EntryKind.Case, c)]));
        Assert.Throws<ArgumentNullException>(() => SectionGateVerdict.Evaluate(AlongX, Rel, null!));
        Assert.Throws<ArgumentNullException>(() => SectionGateVerdict.Evaluate(AlongX, Rel, [("dead", EntryKind.Case, null!)]));
        SectionAxis alongY = SectionAxis.Create(Vector3.Zero, Vector3.UnitY);
        var e = Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(alongY, Rel, [("dead", EntryKind.Case, c)]));
        Assert.Contains("'dead'", e.Message);
        Assert.Contains("another axis", e.Message);
    }

    [Fact]
    public void Verdict_descriptionCountsTheFailingCases()
    {
        SectionComparison bad = Compare(Original, Substitute), same = Compare(Original, Original);
        SectionGateVerdict both = SectionGateVerdict.Evaluate(AlongX, Rel, [("dead", EntryKind.Case, bad), ("self", EntryKind.Case, same)]);
        Assert.EndsWith("rel 0.05: FAIL (1 of 2 fail)", both.ToString());
        Assert.EndsWith(": PASS (0 of 1 fail)", SectionGateVerdict.Evaluate(AlongX, Rel, [("self", EntryKind.Case, same)]).ToString());
    }
}
