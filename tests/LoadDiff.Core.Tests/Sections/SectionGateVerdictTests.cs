using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

/// <summary>
/// The section-cut gate on a pair worked by hand: original −10 kN (z) at x = 0 and at x = 2, substitute −20 kN at x = 1.
/// Each part of the cut-side free body is a cantilever tip load, M = P·x (AISC Manual, Beam Diagrams and Formulas, cantilever
/// with a concentrated load at the free end; case number from memory): the original's |M(s)| = 10·s on 0 ≤ s ≤ 2 (the load
/// at x = 2 is on the cut there, lever 0), so its peak over its own loads is 20 kN·m at s = 2; the substitute's is 0 up to
/// s = 1. |ΔM(1)| = 10 kN·m is the largest (|ΔM| = 10·s before, |10·s − 20| after, 0 beyond 2), and a 5 % gate allows
/// 0.05 × 20 = 1 kN·m.
/// </summary>
public partial class SectionGateVerdictTests
{
    private const double Rel = 0.05;

    private static readonly SectionAxis AlongX = SectionAxis.Create(Vector3.Zero, Vector3.UnitX);

    private static readonly LoadItem[] Original =
    [
        new PointForce("P1", V(0, 0, 0), V(0, 0, -10)),
        new PointForce("P2", V(2, 0, 0), V(0, 0, -10)),
    ];

    private static readonly LoadItem[] Substitute = [new PointForce("P", V(1, 0, 0), V(0, 0, -20))];

    private static readonly LoadItem FarZero = new PointForce("Z", V(1000, 0, 0), Vector3.Zero);

    private static SectionComparison Compare(LoadItem[] original, LoadItem[] substitute) =>
        SectionComparison.Compare(AlongX, null, null, 21, [new WeightedItems(original, 1)], [new WeightedItems(substitute, 1)]);

    private static SectionGateCase Gate(LoadItem[] original, LoadItem[] substitute, double rel = Rel) =>
        SectionGateCase.Evaluate("dead", EntryKind.Case, Compare(original, substitute), rel);

    public static TheoryData<string> Variants => ["plain", "zero force far away in the substitute", "zero force far away in the original", "real load far away in the substitute"];

    private static (LoadItem[] Original, LoadItem[] Substitute) Variant(string name) => name switch
    {
        "plain" => (Original, Substitute),
        "zero force far away in the substitute" => (Original, [.. Substitute, FarZero]),
        "zero force far away in the original" => ([.. Original, FarZero], Substitute),
        "real load far away in the substitute" => (Original, [.. Substitute, new PointForce("F", V(1000, 0, 0), V(0, 0, -1))]),
        _ => throw new ArgumentOutOfRangeException(nameof(name)),
    };

    [Theory]
    [MemberData(nameof(Variants))]
    public void Evaluate_pointLoadsMergedToTheirResultant_failsWithAnAllowanceOf1FromTheOriginalsOwnPeak(string variant)
    {
        (LoadItem[] original, LoadItem[] substitute) = Variant(variant);
        SectionGateCase c = Gate(original, substitute);
        Assert.False(c.Passes, c.ToString());
        // Peak 20 kN·m over the original's loads s = 0 … 2 (class comment); allowed 0.05 × 20 = 1 kN·m.
        Close.Relative(20, c.PeakMoment, 1e-14);
        Assert.Equal((0.0, 2.0), c.PeakExtent);
        Close.Relative(1, c.AllowedMoment, 1e-14);
        Close.Relative(10, c.MaxMomentDeviation, 1e-14);
        Assert.Equal(1, c.MaxMomentDeviationAt);
        Assert.Equal("dead", c.Name);
        Assert.Equal(EntryKind.Case, c.Kind);
        Assert.Equal(Rel, c.RelativeTolerance);
    }

    [Theory]
    [InlineData("zero force far away in the substitute")]
    [InlineData("zero force far away in the original")]
    public void Compare_zeroForceFarAway_extendsNoStationRange(string variant)
    {
        (LoadItem[] original, LoadItem[] substitute) = Variant(variant);
        SectionComparison c = Compare(original, substitute);
        Assert.Equal(0, c.Stations[0].S);
        Assert.Equal(2, c.Stations[^1].S);
        // Over 0 … 2 every station's |M| is the original's own: the peak over all stations is the same 20 kN·m.
        Close.Relative(20, c.OriginalPeakMoment, 1e-14);
    }

    [Fact]
    public void Compare_realLoadFarAway_stillComparesOutThereButTheAllStationPeakGrowsWithDistance()
    {
        (LoadItem[] original, LoadItem[] substitute) = Variant("real load far away in the substitute");
        SectionComparison c = Compare(original, substitute);
        Assert.Equal(1000, c.Stations[^1].S);
        // At s = 1000 the original's cut moment is 10·1000 + 10·998 = 19 980 kN·m (tip loads, P·x): an allowance taken
        // over every station would be 999 kN·m and would pass the 10 kN·m deviation.
        Close.Relative(19_980, c.OriginalPeakMoment, 1e-14);
        // The extra 1 kN lies on the last cut: |ΔV| = 1 kN there, no moment about the cut point.
        Close.Relative(1, c.Stations[^1].ForceDeviation, 1e-14);
    }

    [Fact]
    public void Evaluate_substituteLoadsMisplacedBeyondTheOriginal_failOnTheDeviationOutThere()
    {
        // Substitute: the resultant at x = 1 plus +5 kN at x = 500 and −5 kN at x = 600. Beyond s = 600 the pair is a
        // couple of 5 × 100 = 500 kN·m (hand statics), so |ΔM| = 500 kN·m from s = 600 on, against 1 kN·m allowed.
        LoadItem[] substitute = [.. Substitute, new PointForce("up", V(500, 0, 0), V(0, 0, 5)), new PointForce("down", V(600, 0, 0), V(0, 0, -5))];
        SectionComparison comparison = Compare(Original, substitute);
        SectionGateCase c = SectionGateCase.Evaluate("dead", EntryKind.Case, comparison, Rel);
        Assert.False(c.Passes, c.ToString());
        Close.Relative(500, c.MaxMomentDeviation, 1e-13);
        Assert.Equal(600, c.MaxMomentDeviationAt);
        Close.Relative(1, c.AllowedMoment, 1e-14);
        // The peak over every station (the original at s = 600: 10·600 + 10·598 = 11 980 kN·m) would have allowed 599.
        Close.Relative(11_980, comparison.OriginalPeakMoment, 1e-14);
    }

    [Fact]
    public void Evaluate_combination_takesTheExtentOfItsCasesWithNonZeroFactorOnly()
    {
        // The far case carries factor 0: no load in this combination, so it neither extends the range nor the peak's extent.
        LoadItem[] far = [new PointForce("F", V(1000, 0, 0), V(0, 0, -1))];
        WeightedItems[] original = [new WeightedItems(Original, 1.5), new WeightedItems(far, 0)];
        WeightedItems[] substitute = [new WeightedItems(Substitute, 1.5), new WeightedItems(far, 0)];
        SectionComparison comparison = SectionComparison.Compare(AlongX, null, null, 21, original, substitute);
        Assert.Equal(2, comparison.Stations[^1].S);
        SectionGateCase c = SectionGateCase.Evaluate("ULS", EntryKind.Combination, comparison, Rel);
        // 1.5 × the case figures (linearity of statics): peak 30, allowed 1.5, largest |ΔM| 15 at s = 1.
        Assert.Equal((0.0, 2.0), c.PeakExtent);
        Close.Relative(30, c.PeakMoment, 1e-14);
        Close.Relative(1.5, c.AllowedMoment, 1e-14);
        Close.Relative(15, c.MaxMomentDeviation, 1e-14);
        Assert.False(c.Passes);
    }

    [Fact]
    public void Evaluate_looseEnoughTolerance_passes()
    {
        // 0.6 × 20 = 12 kN·m ≥ 10 kN·m (class comment).
        SectionGateCase c = Gate(Original, [.. Substitute, FarZero], 0.6);
        Assert.True(c.Passes, c.ToString());
        Close.Relative(12, c.AllowedMoment, 1e-14);
    }

    [Fact]
    public void Verdict_passesOnlyWhenEveryCaseDoes()
    {
        SectionComparison bad = Compare(Original, Substitute), same = Compare(Original, Original);
        SectionGateVerdict both = SectionGateVerdict.Evaluate(AlongX, Rel, [("dead", EntryKind.Case, bad), ("self", EntryKind.Case, same)]);
        Assert.False(both.Passes);
        Assert.Equal([false, true], both.Cases.Select(c => c.Passes));
        Assert.Equal(["dead", "self"], both.Cases.Select(c => c.Name));
        Assert.All(both.Cases, c => Assert.Equal(Rel, c.RelativeTolerance));
        Assert.True(SectionGateVerdict.Evaluate(AlongX, Rel, [("self", EntryKind.Case, same)]).Passes);
    }

    [Fact]
    public void Evaluate_badToleranceOrAxis_throws()
    {
        SectionComparison c = Compare(Original, Substitute);
        Assert.Throws<ArgumentException>(() => SectionGateCase.Evaluate("dead", EntryKind.Case, c, -0.1));
        Assert.Throws<ArgumentException>(() => SectionGateCase.Evaluate("dead", EntryKind.Case, c, double.NaN));
        Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(AlongX, double.PositiveInfinity, [("dead", EntryKind.Case, c)]));
        SectionAxis alongY = SectionAxis.Create(Vector3.Zero, Vector3.UnitY);
        Assert.Throws<ArgumentException>(() => SectionGateVerdict.Evaluate(alongY, Rel, [("dead", EntryKind.Case, c)]));
    }

    [Fact]
    public void Evaluate_originalWithoutLocatedLoads_hasNoExtentAndNoAllowance()
    {
        // Only a zero force: no loaded geometry, so nothing to take a peak over.
        SectionComparison c = SectionComparison.Compare(AlongX, 0, 2, 3, [new WeightedItems([FarZero], 1)], [new WeightedItems(Substitute, 1)]);
        SectionGateCase gate = SectionGateCase.Evaluate("dead", EntryKind.Case, c, Rel);
        Assert.Null(gate.PeakExtent);
        Assert.Equal(0, gate.PeakMoment);
        Assert.False(gate.Passes);
    }
}
