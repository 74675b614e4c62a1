using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using static LoadDiff.Core.Tests.Support.Reduce;

namespace LoadDiff.Core.Tests;

/// <summary>The laws of statics that any correct reduction obeys, checked on random systems of every item kind.</summary>
public partial class ReductionAccumulatorTests
{
    private const int Iterations = 300;

    private static void AssertSame(LoadReduction expected, Vector3 force, Vector3 moment, double relative)
    {
        Close.Absolute(expected.Force, force, relative * expected.GrossForce);
        Close.Absolute(expected.Moment, moment, relative * expected.MomentScale(expected.ReferencePoint));
    }

    [Fact]
    public void ResultAt_otherPoint_obeysMomentTransfer()
    {
        // M_Q = M_P + (P − Q) × R (SPEC §2).
        Gen.Select(Systems.System, Systems.Vec(-20, 20), Systems.Vec(-20, 20)).SampleSeeded((items, p, q) =>
        {
            var acc = new ReductionAccumulator();
            foreach (LoadItem item in items)
            {
                acc.Add(item);
            }
            LoadReduction atP = acc.ResultAt(p), atQ = acc.ResultAt(q);
            // Moving M_P to Q in doubles carries M_P's own rounding, so the allowance is the larger of the two moment
            // scales (with Q on a single force, M_Q is exactly ~1e-36 while M_P is ~50: a double transfer cannot cancel to it).
            double scale = Math.Max(atP.MomentScale(p), atQ.MomentScale(q));
            Close.Absolute(atQ.Force, atP.At(q).Force, 1e-12 * atQ.GrossForce);
            Close.Absolute(atQ.Moment, atP.At(q).Moment, 1e-12 * scale);
            Close.Absolute(atQ.Moment, atP.Moment + Vector3.Cross(p - q, atP.Force), 1e-12 * scale);
            Assert.Equal(q, atQ.ReferencePoint);
        }, iter: Iterations);
    }

    [Fact]
    public void ResultAt_everyForceScaled_resultantAndMomentScale()
    {
        Gen.Select(Systems.System, Gen.Double[-1000, 1000], Systems.Vec(-20, 20)).SampleSeeded((items, k, p) =>
        {
            LoadReduction plain = Reduce.About(p, items);
            LoadReduction scaled = Reduce.About(p, items.Select(i => Systems.Map(i, v => v, Vector3.Zero, k)));
            Close.Absolute(plain.Force * k, scaled.Force, 1e-12 * Math.Abs(k) * plain.GrossForce);
            Close.Absolute(plain.Moment * k, scaled.Moment, 1e-12 * Math.Abs(k) * plain.MomentScale(p));
            Close.Relative(plain.GrossForce * Math.Abs(k), scaled.GrossForce, 1e-12);
        }, iter: Iterations);
    }

    [Fact]
    public void ResultAt_itemsShuffled_sameResultant()
    {
        Gen.Select(Systems.System, Gen.Int, Systems.Vec(-20, 20)).SampleSeeded((items, seed, p) =>
        {
            LoadItem[] shuffled = [.. items];
            new Random(seed).Shuffle(shuffled);
            LoadReduction a = Reduce.About(p, items);
            LoadReduction b = Reduce.About(p, shuffled);
            AssertSame(a, b.Force, b.Moment, 1e-12);
            Close.Relative(a.GrossForce, b.GrossForce, 1e-12);
        }, iter: Iterations);
    }

    [Fact]
    public void ResultAt_systemRotatedAndTranslated_transformsAsVectors()
    {
        Gen.Select(Systems.System, Systems.Rotation, Systems.Vec(-50, 50), Systems.Vec(-20, 20)).SampleSeeded((items, rotate, shift, p) =>
        {
            LoadReduction a = Reduce.About(p, items);
            LoadReduction b = Reduce.About(rotate(p) + shift, items.Select(i => Systems.Map(i, rotate, shift)));
            // R' = Q·R and M' about the moved point = Q·M_P for a proper rotation Q. Moving the coordinates rounds each
            // to about ε of its magnitude (up to |shift| + 20 here), so lever arms carry that much noise too.
            Close.Absolute(rotate(a.Force), b.Force, 1e-12 * a.GrossForce);
            double coordinateNoise = a.GrossForce * (shift.Length + p.Length + 20);
            Close.Absolute(rotate(a.Moment), b.Moment, 1e-12 * (a.MomentScale(p) + coordinateNoise));
        }, iter: Iterations);
    }

    [Fact]
    public void ResultAt_coordinatesOffsetByAMillionMetres_sameResult()
    {
        // The reference point is dyadic like the positions, so p + shift is exact too.
        Gen.Select(Systems.System, Systems.Position).SampleSeeded((items, p) =>
        {
            Vector3 shift = V(1e6, -2e6, 1e6);
            LoadReduction a = Reduce.About(p, items);
            LoadReduction b = Reduce.About(p + shift, items.Select(i => Systems.Map(i, v => v, shift)));
            AssertSame(a, b.Force, b.Moment, 1e-15);
            Close.Relative(a.GrossForce, b.GrossForce, 1e-15);
        }, iter: Iterations);
    }

    [Fact]
    public void AddScaled_mergedHalves_sameAsOneAccumulator()
    {
        Gen.Select(Systems.System, Systems.System, Systems.Vec(-20, 20)).SampleSeeded((first, second, p) =>
        {
            var a = new ReductionAccumulator();
            var b = new ReductionAccumulator();
            foreach (LoadItem item in first)
            {
                a.Add(item);
            }
            foreach (LoadItem item in second)
            {
                b.Add(item);
            }
            a.AddScaled(b, 1);
            LoadReduction whole = Reduce.About(p, [.. first, .. second]);
            AssertSame(whole, a.ResultAt(p).Force, a.ResultAt(p).Moment, 1e-12);
            Assert.Equal(first.Length + second.Length, a.Count);
        }, iter: Iterations);
    }

    [Fact]
    public void ResultAt_pointMass_weightIsMassTimesStandardGravity()
    {
        // Standard gravity g_n = 9.80665 m/s² (3rd CGPM, 1901; NIST SP 330): 1200 kg at (2, 2, 0) weighs 11767.98 N.
        LoadReduction r = Reduce.About(V(0, 0, 0), new PointMass("m", V(2, 2, 0), 1200, V(0, 0, -9.80665)));
        Close.Relative(V(0, 0, -11767.98), r.Force, 1e-15);
        Close.Relative(V(-2 * 11767.98, 2 * 11767.98, 0), r.Moment, 1e-15);
    }
}
