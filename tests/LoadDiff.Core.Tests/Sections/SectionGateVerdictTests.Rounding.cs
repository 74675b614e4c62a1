using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests.Sections;

/// <summary>The gate's rounding floor: a load set and its copy in other units never fail on rounding alone.</summary>
public class SectionGateRoundingTests
{
    private static readonly SectionAxis AlongX = SectionAxis.Create(Vector3.Zero, Vector3.UnitX);

    private static SectionGateCase Gate(LoadItem[] original, LoadItem[] substitute) =>
        SectionGateCase.Evaluate("c", EntryKind.Case,
            SectionComparison.Compare(AlongX, null, null, 21, [new WeightedItems(original, 1)], [new WeightedItems(substitute, 1)]), 0.05);

    [Fact]
    public void Evaluate_singleLoadAndItsCopyReadBackFromFeet_passesOnTheRoundingFloor()
    {
        // One 10 kN load at x = 7 m: its cut moment within its own extent (the one station x = 7) is 0, so rel·peak = 0.
        // The copy's position went through feet and back (1 ft = 0.3048 m exactly, NIST SP 811): 7 / 0.3048 · 0.3048
        // differs from 7 by rounding only, which moves the copy's cut moment beyond x = 7 by 10 kN × (that difference).
        double x = 7 / 0.3048 * 0.3048;
        LoadItem[] original = [new PointForce("p", V(7, 0, 0), V(0, 0, -10))];
        LoadItem[] copy = [new PointForce("p", V(x, 0, 0), V(0, 0, -10))];
        SectionGateCase c = Gate(original, copy);
        Assert.Equal(0, c.PeakMoment);
        Assert.True(c.MaxMomentDeviation > 0, "the copy must differ by rounding, or this test shows nothing: " + c);
        Assert.True(c.Passes, c.ToString());
        Assert.True(c.RoundingFloor is > 0 and < 1e-9, c.ToString());
    }

    [Fact]
    public void Evaluate_singleLoadMovedOneMillimetre_failsAboveTheFloor()
    {
        // Moved 1 mm: beyond the loads the cut moments differ by 10 kN × 0.001 m = 0.01 kN·m (moment of a force, any
        // statics text), far above the floor of about 1e-12 × 10 kN × 7 m.
        LoadItem[] original = [new PointForce("p", V(7, 0, 0), V(0, 0, -10))];
        LoadItem[] moved = [new PointForce("p", V(7.001, 0, 0), V(0, 0, -10))];
        SectionGateCase c = Gate(original, moved);
        Assert.False(c.Passes, c.ToString());
        Assert.Equal(0.01, c.MaxMomentDeviation, 12);
    }

    [Fact]
    public void Evaluate_floorNeverLowersTheRelativeAllowance()
    {
        // The worked pair of SectionGateVerdictTests: 0.05 × 20 kN·m = 1 kN·m, the floor far below it.
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 0, -10)), new PointForce("b", V(2, 0, 0), V(0, 0, -10))];
        LoadItem[] substitute = [new PointForce("s", V(1, 0, 0), V(0, 0, -20))];
        SectionGateCase c = Gate(original, substitute);
        Assert.Equal(1, c.AllowedMoment, 12);
        Assert.True(c.RoundingFloor < 1e-9);
    }
}
