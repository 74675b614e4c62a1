using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// Substitutes built to widen the rounding floor: neither a negligible load far away nor a huge self-cancelling pair
/// may turn a clear failure into a pass. Original: −10 kN (z) at x = 0 and x = 2, resultant −20 kN at x = 1 (centre of
/// parallel forces); allowances 1e-3·20 = 0.02 kN and 1e-3·20·2 = 0.04 kN·m (SPEC §4; rel = 1e-3 common practice, no source).
/// </summary>
public partial class EquivalenceCheckerTests
{
    private static LoadItem[] PairAtZeroAndTwo() =>
        [new PointForce("a", V(0, 0, 0), V(0, 0, -10)), new PointForce("b", V(2, 0, 0), V(0, 0, -10))];

    [Fact]
    public void Compare_misplacedResultantPlusATinyLoadFarAway_stillFails()
    {
        // −20 kN at x = 1.5: a couple of 20 × 0.5 = 10 kN·m (moment of a force). The extra −1e-18 kN at 1e12 m adds at
        // most 1e-18 × 1e12 = 1e-6 kN·m at any corner, yet its position once made the floor 1e-12 × 20 × 1e12 = 20 kN·m.
        LoadItem[] substitute = [new PointForce("s", V(1.5, 0, 0), V(0, 0, -20)), new PointForce("far", V(1e12, 0, 0), V(0, 0, -1e-18))];
        CaseComparison c = Check(ToleranceSpec.Default, V(1, 0, 0), PairAtZeroAndTwo(), substitute);
        Assert.False(c.Equivalent, c.Tolerance!.ToString());
        Assert.True(c.Residual!.WorstMomentNorm >= 10, c.Residual.ToString());
        Assert.True(c.Tolerance.Moment < 0.05, c.Tolerance.ToString());
    }

    [Fact]
    public void Compare_wrongForcePlusAHugeSelfCancellingPair_stillFails()
    {
        // −20.5 kN instead of −20: ΔR = 0.5 kN > 0.02. The ±1e12 kN pair at the same point adds exactly nothing (the
        // double-double sums are exact here) but once made the force floor 1e-12 × 2e12 = 2 kN.
        LoadItem[] substitute =
        [
            new PointForce("s", V(1, 0, 0), V(0, 0, -20.5)),
            new PointForce("up", V(1, 0, 0), V(0, 0, 1e12)),
            new PointForce("down", V(1, 0, 0), V(0, 0, -1e12)),
        ];
        CaseComparison c = Check(ToleranceSpec.Default, V(1, 0, 0), PairAtZeroAndTwo(), substitute);
        Assert.False(c.Equivalent, c.Tolerance!.ToString());
        Assert.Equal(0.5, c.Residual!.ForceNorm, 12);
        Assert.Equal(0.02, c.Tolerance.Force, 15);
    }
}
