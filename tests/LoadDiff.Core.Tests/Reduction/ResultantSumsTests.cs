using CsCheck;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Reduction;

/// <summary>
/// ResultantSums against the moment transfer of SPEC §2, M_Q = M_P + (P − Q) × R, evaluated exactly with ExactRational in
/// the test: one rounding at the end, so a few ulp of the exact result even 1e12 m from the loads.
/// </summary>
public class ResultantSumsTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    // multiples of 2⁻⁶ within ±64 for forces, of 2⁻⁸ within ±40 m for positions
    private static readonly Gen<Vector3> SmallForce = Gen.Select(Gen.Int[-4096, 4096], Gen.Int[-4096, 4096], Gen.Int[-4096, 4096], (x, y, z) => V(x / 64.0, y / 64.0, z / 64.0));
    private static readonly Gen<Vector3> SmallPoint = Gen.Select(Gen.Int[-10240, 10240], Gen.Int[-10240, 10240], Gen.Int[-10240, 10240], (x, y, z) => V(x / 256.0, y / 256.0, z / 256.0));
    private static readonly Gen<(Vector3 At, Vector3 Force)[]> Forces = Gen.Select(SmallPoint, SmallForce).Array[1, 10];

    // a point about 1e12 m from the loads, in a random direction, with non-dyadic digits
    private static readonly Gen<Vector3> FarPoint = Gen.Select(Systems.Vec(-1, 1), Gen.Double[0.5, 1.5])
        .Where((d, _) => d.Length > 0.1).Select((d, s) => d / d.Length * (s * 1e12));

    private static LoadReduction Reduced((Vector3 At, Vector3 Force)[] forces)
    {
        var acc = new ReductionAccumulator();
        foreach ((Vector3 at, Vector3 f) in forces)
        {
            acc.AddPointForce(at, f);
        }
        return acc.ResultAt(V(0, 0, 0));
    }

    // 2 ulp of each component, and an absolute floor of 2⁻⁹⁵ of the size of the terms (G_F·|Q|) for components that
    // cancel to nearly nothing (double-double carries about 2⁻¹⁰⁴ of its operands)
    private static double Floor(double grossForce, Vector3 q) => Math.ScaleB(grossForce * (q.Length + 100), -95);

    [Fact]
    public void Difference_twoAccumulatedSystems_atAPoint1e12Away_withinTwoUlpOfTheExactTransfer()
    {
        Gen.Select(Forces, Forces, FarPoint).SampleSeeded((a, b, q) =>
        {
            LoadReduction ra = Reduced(a), rb = Reduced(b);
            ForceCoupleSystem d = ResultantSums.Difference(ra.Sums, rb.Sums, q);
            ExactVector dm = ExactVector.MomentAbout(q, b) - ExactVector.MomentAbout(q, a);
            ExactVector dr = ExactVector.Resultant(b) - ExactVector.Resultant(a);
            Exact.WithinUlps(dm, d.Moment, 2, Floor(ra.GrossForce + rb.GrossForce, q));
            Exact.WithinUlps(dr, d.Force, 1);
            Assert.Equal(q, d.ReferencePoint);
        }, iter: 500);
    }

    [Fact]
    public void Difference_equivalentSystemsWithDifferentAnchors_atAPoint1e12Away_isExactlyZero()
    {
        // b is a split into halves, in reverse order (so its anchor is a's last point): exactly the same R and M_Q for
        // every Q (SPEC §2), so the difference must vanish although each moment about Q is about 1e12·|R|.
        Gen.Select(Forces, FarPoint).SampleSeeded((a, q) =>
        {
            (Vector3, Vector3)[] b = [.. a.Reverse().SelectMany(f => new[] { (f.At, f.Force * 0.5), (f.At, f.Force * 0.5) })];
            ForceCoupleSystem d = ResultantSums.Difference(Reduced(a).Sums, Reduced(b).Sums, q);
            Exact.WithinUlps(ExactVector.Zero, d.Moment, 0, Floor(Reduced(a).GrossForce, q));
            Assert.Equal(Vector3.Zero, d.Force);
        }, iter: 300);
    }

    [Fact]
    public void At_fromASystem_isTheExactTransferRoundedOnce()
    {
        // From(system) takes the doubles as they are; At(Q) = M_P + (P − Q) × R, exact before its one rounding.
        Gen.Select(Systems.Vec(-1e3, 1e3), Systems.Vec(-1e4, 1e4), Systems.Vec(-50, 50), FarPoint).SampleSeeded((r, m, p, q) =>
        {
            ResultantSums s = ResultantSums.From(new ForceCoupleSystem(r, m, p));
            Assert.Equal(p, s.Anchor);
            ForceCoupleSystem at = s.At(q);
            ExactVector expected = ExactVector.From(m) + ExactVector.Cross(ExactVector.From(p) - ExactVector.From(q), ExactVector.From(r));
            Exact.WithinUlps(expected, at.Moment, 2, Math.ScaleB(r.Length * q.Length, -95));
            Assert.Equal(r, at.Force);
            Assert.Equal(q, at.ReferencePoint);
        }, iter: 1000);
    }

    [Fact]
    public void At_byHand_momentTransfer()
    {
        // R = (0, 0, −10) at P = (2, 0, 0) with M_P = (0, 5, 0); about Q = (0, 0, 0):
        // M_Q = (0, 5, 0) + (2, 0, 0) × (0, 0, −10) = (0, 5, 0) + (0, 20, 0) = (0, 25, 0).
        ForceCoupleSystem at = ResultantSums.From(new ForceCoupleSystem(V(0, 0, -10), V(0, 5, 0), V(2, 0, 0))).At(V(0, 0, 0));
        Assert.Equal(V(0, 25, 0), at.Moment);
        Assert.Equal(V(0, 0, -10), at.Force);
    }

    [Fact]
    public void Sums_ofAnAccumulator_anchorIsTheFirstLoadedPoint_andDoNotDependOnTheReferencePoint()
    {
        var acc = new ReductionAccumulator();
        acc.AddPointForce(V(3000, 0, 0), Vector3.Zero);
        acc.AddPointForce(V(1, 2, 3), V(0, 0, -4));
        acc.AddPointForce(V(5, 2, 3), V(0, 1, 0));
        Assert.Equal(V(1, 2, 3), acc.ResultAt(V(0, 0, 0)).Sums.Anchor);
        Assert.Equal(acc.ResultAt(V(0, 0, 0)).Sums, acc.ResultAt(V(1e12, -1e12, 7)).Sums);
        // a reduction made by hand carries its own doubles
        var byHand = new LoadReduction(new ForceCoupleSystem(V(1, 0, 0), V(0, 2, 0), V(4, 4, 4)), 1, 0, null, null, false, 1);
        Assert.Equal(ResultantSums.From(byHand.System), byHand.Sums);
        Assert.Equal(V(4, 4, 4), byHand.Sums.Anchor);
    }

    [Fact]
    public void Equals_contract_holds()
    {
        ResultantSums a = ResultantSums.From(new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9)));
        ResultantSums same = ResultantSums.From(new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 9)));
        ResultantSums other = ResultantSums.From(new ForceCoupleSystem(V(1, 2, 3), V(4, 5, 6), V(7, 8, 10)));
        EqualityContract.Check(a, same, other, (x, y) => x == y, (x, y) => x != y);
    }
}
