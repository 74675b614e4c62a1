using System.Collections.Immutable;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public class LoadCombinationTests
{
    private static LoadCombination Uls() => new("uls-6.10", [new("dead", 1.35), new("live", 1.5)]);

    private static Dictionary<string, ReductionAccumulator> Cases()
    {
        // dead: 10 down at (2, 0, 0) and 6 down at (0, 3, 0): R = (0, 0, −16), M_O = (−18, 20, 0) by hand: (0, 3, 0) × (0, 0, −6) = (−18, 0, 0).
        var dead = new ReductionAccumulator();
        dead.AddPointForce(V(2, 0, 0), V(0, 0, -10));
        dead.AddPointForce(V(0, 3, 0), V(0, 0, -6));
        // live: 4 along +x at (0, 0, 5) and a couple (0, 0, 3): R = (4, 0, 0), M_O = (0, 20, 3) by hand.
        var live = new ReductionAccumulator();
        live.AddPointForce(V(0, 0, 5), V(4, 0, 0));
        live.AddCouple(V(0, 0, 3));
        return new() { ["dead"] = dead, ["live"] = live };
    }

    [Fact]
    public void Combine_en1990Expression610_factoredSumOfCaseResultants()
    {
        // EN 1990:2002, expression (6.10), Table A1.2(B): γG,sup = 1.35, γQ = 1.50.
        LoadReduction r = Uls().Combine(Cases(), out IReadOnlyList<string> missing).ResultAt(V(0, 0, 0));
        Assert.Empty(missing);
        Vector3 deadR = V(0, 0, -16), deadM = V(-18, 20, 0), liveR = V(4, 0, 0), liveM = V(0, 20, 3);
        Close.Relative((deadR * 1.35) + (liveR * 1.5), r.Force, 1e-15);
        Close.Relative((deadM * 1.35) + (liveM * 1.5), r.Moment, 1e-15);
        Close.Relative((16 * 1.35) + (4 * 1.5), r.GrossForce, 1e-15);
        Close.Relative(3 * 1.5, r.GrossCouple, 1e-15);
    }

    [Fact]
    public void Combine_aboutAnotherPoint_momentTransferredWithFactoredResultant()
    {
        // Same EN 1990 (6.10) factors; about Q = (1, 1, 1): M_Q = M_O + (O − Q) × R, R and M_O as above.
        LoadReduction r = Uls().Combine(Cases(), out _).ResultAt(V(1, 1, 1));
        Vector3 rr = (V(0, 0, -16) * 1.35) + (V(4, 0, 0) * 1.5);
        Vector3 mo = (V(-18, 20, 0) * 1.35) + (V(0, 20, 3) * 1.5);
        Close.Relative(mo + Vector3.Cross(V(-1, -1, -1), rr), r.Moment, 1e-14);
    }

    [Fact]
    public void Combine_missingCase_reportedAndSkipped()
    {
        var combo = new LoadCombination("c", [new("dead", 1.0), new("wind", 1.5)]);
        LoadReduction r = combo.Combine(Cases(), out IReadOnlyList<string> missing).ResultAt(V(0, 0, 0));
        Assert.Equal(["wind"], missing);
        Assert.Equal(V(0, 0, -16), r.Force);
    }

    [Fact]
    public void Equals_sameFactorsInDifferentArrays_equalWithSameHash()
    {
        EqualityContract.Check(Uls(), Uls(), new LoadCombination("uls-6.10", [new("dead", 1.35), new("live", 1.6)]),
            (a, b) => a == b, (a, b) => a != b);
    }

    [Fact]
    public void ToString_germanCulture_invariantFactors()
    {
        using var scope = new CultureScope("de-DE");
        Assert.Equal("uls-6.10 = 1.35·dead + 1.5·live", Uls().ToString());
    }
}
