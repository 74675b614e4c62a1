using CsCheck;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

public class ForceCoupleSystemTests
{
    private static readonly Gen<Vector3> Vec = Gen.Select(Gen.Double[-100, 100], Gen.Double[-100, 100], Gen.Double[-100, 100], Vector3.Create);

    [Fact]
    public void MoveTo_integerExample_matchesTransferFormula()
    {
        // M_Q = M_P + (P − Q) × R (SPEC §2; any statics text). P = (1, 2, 3), Q = (0, 0, 0), R = (0, 0, −10), M_P = (1, 1, 1):
        // (1, 2, 3) × (0, 0, −10) = (−20, 10, 0), so M_Q = (−19, 11, 1).
        var s = new ForceCoupleSystem(V(0, 0, -10), V(1, 1, 1), V(1, 2, 3));
        ForceCoupleSystem q = s.MoveTo(V(0, 0, 0));
        Assert.Equal(V(-19, 11, 1), q.Moment);
        Assert.Equal(V(0, 0, -10), q.Force);
        Assert.Equal(V(0, 0, 0), q.ReferencePoint);
    }

    [Fact]
    public void MoveTo_thereAndBack_sameMoment()
    {
        Gen.Select(Vec, Vec, Vec, Vec).SampleSeeded((r, m, p, q) =>
        {
            var s = new ForceCoupleSystem(r, m, p);
            Close.Absolute(m, s.MoveTo(q).MoveTo(p).Moment, 1e-12 * (m.Length + (r.Length * (p - q).Length)));
        }, iter: 500);
    }

    [Fact]
    public void Subtract_sameSystemAboutOtherPoint_zeroResidual()
    {
        var s = new ForceCoupleSystem(V(3, -4, 12), V(5, 6, 7), V(1, 1, 1));
        ForceCoupleSystem residual = s - s.MoveTo(V(-8, 2, 5));
        Close.Absolute(Vector3.Zero, residual.Force, 0);
        Close.Absolute(Vector3.Zero, residual.Moment, 1e-13);
    }

    [Fact]
    public void Equals_contract_holds()
    {
        var a = new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9));
        EqualityContract.Check(a, new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9)),
            new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 10)), (x, y) => x == y, (x, y) => x != y);
    }
}
