using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public partial class ReductionAccumulatorTests
{
    private sealed record Load(Vector3 At, Vector3 Force);

    /// <summary>
    /// 2·<paramref name="pairs"/> + 1 003 point forces (10⁵ or 10⁶ here) at site coordinates near 10⁶ m, built to cancel: random forces from 2⁻¹⁰ to 2²⁰ (about 10⁻³ to 10⁶) and their
    /// negatives (half at the same point, half at another), a small uncancelled remainder, and one very large pair
    /// (±2⁴⁰) placed second and last so that it, and its moment about the anchor (the first force), is part of every
    /// partial sum. Fixed seed: the data are reproducible.
    /// </summary>
    private static List<Load> CancellingLoads(int pairs = 49_500)
    {
        var random = new Random(20240611);
        double Coord(double centre) => centre + ((random.NextDouble() - 0.5) * 2000);
        Vector3 Site() => Vector3.Create(Coord(1e6), Coord(1.5e6), Coord(1e6));
        Vector3 Force(double magnitude) => Vector3.Create(
            (random.NextDouble() - 0.5) * magnitude, (random.NextDouble() - 0.5) * magnitude, (random.NextDouble() - 0.5) * magnitude);

        var bulk = new List<Load>();
        for (int i = 0; i < pairs; i++)
        {
            Vector3 f = Force(Math.ScaleB(1, random.Next(-10, 21))); // 2⁻¹⁰ … 2²⁰, exact scalings only
            Vector3 at = Site();
            bulk.Add(new Load(at, f));
            bulk.Add(new Load(i % 2 == 0 ? at : Site(), -f));
        }
        for (int i = 0; i < 1000; i++)
        {
            bulk.Add(new Load(Site(), Force(1)));
        }
        random.Shuffle(System.Runtime.InteropServices.CollectionsMarshal.AsSpan(bulk));
        Vector3 big = Vector3.Create(Math.ScaleB(1, 40), -Math.ScaleB(1, 39), Math.ScaleB(1, 40));
        return [new Load(Site(), Force(1)), new Load(Site(), big), .. bulk, new Load(Site(), -big)];
    }

    private static ExactRational X(double d) => ExactRational.FromDouble(d);

    private static double Ulp(double g) => Math.BitIncrement(g) - g;

    // One at a time, or as columns in batches of 509 rows (not a multiple of the four lanes, so every batch has a tail).
    private static ReductionAccumulator Accumulate(List<Load> loads, bool columns)
    {
        var acc = new ReductionAccumulator();
        if (!columns)
        {
            foreach (Load l in loads)
            {
                acc.AddPointForce(l.At, l.Force);
            }
            return acc;
        }
        const int batch = 509;
        var c = new double[7][];
        for (int k = 0; k < 7; k++)
        {
            c[k] = new double[batch];
        }
        for (int start = 0; start < loads.Count; start += batch)
        {
            int n = Math.Min(batch, loads.Count - start);
            for (int i = 0; i < n; i++)
            {
                Load l = loads[start + i];
                (c[0][i], c[1][i], c[2][i], c[3][i], c[4][i], c[5][i]) = (l.At.X, l.At.Y, l.At.Z, l.Force.X, l.Force.Y, l.Force.Z);
            }
            Assert.True(acc.AddPointForces(c[0].AsSpan(0, n), c[1].AsSpan(0, n), c[2].AsSpan(0, n), c[3].AsSpan(0, n), c[4].AsSpan(0, n), c[5].AsSpan(0, n), c[6]));
        }
        return acc;
    }

    // 10⁵ and, as SPEC §7 states the target, 10⁶ loads; both the one-at-a-time and the column path.
    [Theory]
    [InlineData(false, 49_500)]
    [InlineData(true, 49_500)]
    [InlineData(false, 499_500)]
    [InlineData(true, 499_500)]
    public void AddPointForce_cancellingForcesFarFromOrigin_withinFourUlpOfGrossOfExactRationalResult(bool columns, int pairs)
    {
        List<Load> loads = CancellingLoads(pairs);
        Assert.True(loads.Count >= 2 * pairs);
        ReductionAccumulator acc = Accumulate(loads, columns);
        Vector3 anchor = acc.Anchor!.Value;
        LoadReduction result = acc.ResultAt(anchor);

        // Exact reference on the same doubles: R = ΣF and M = Σ(at − anchor) × F, every operation exact.
        var r = new ExactRational[3];
        var m = new ExactRational[3];
        double grossForce = 0, grossMoment = 0;
        var naiveR = new double[3];
        var naiveM = new double[3];
        foreach (Load l in loads)
        {
            ExactRational dx = X(l.At.X) - X(anchor.X), dy = X(l.At.Y) - X(anchor.Y), dz = X(l.At.Z) - X(anchor.Z);
            ExactRational fx = X(l.Force.X), fy = X(l.Force.Y), fz = X(l.Force.Z);
            r[0] += fx;
            r[1] += fy;
            r[2] += fz;
            m[0] += (dy * fz) - (dz * fy);
            m[1] += (dz * fx) - (dx * fz);
            m[2] += (dx * fy) - (dy * fx);
            Vector3 d = l.At - anchor;
            grossForce += l.Force.Length;
            grossMoment += d.Length * l.Force.Length;

            // Naive summation in plain doubles, the textbook formula with every operation rounded.
            naiveR[0] += l.Force.X;
            naiveR[1] += l.Force.Y;
            naiveR[2] += l.Force.Z;
            naiveM[0] += (d.Y * l.Force.Z) - (d.Z * l.Force.Y);
            naiveM[1] += (d.Z * l.Force.X) - (d.X * l.Force.Z);
            naiveM[2] += (d.X * l.Force.Y) - (d.Y * l.Force.X);
        }

        // Tolerance: 4 ulp of the gross magnitudes G_F = Σ|F| and Σ|d||F| (the latter is below the G_F·D of the check).
        ExactRational forceBound = X(4 * Ulp(grossForce)), momentBound = X(4 * Ulp(grossMoment));
        double[] reduced = [result.Force.X, result.Force.Y, result.Force.Z];
        double[] reducedM = [result.Moment.X, result.Moment.Y, result.Moment.Z];
        bool naiveFails = false;
        double worst = 0, naiveWorst = 0;
        for (int k = 0; k < 3; k++)
        {
            ExactRational errorR = (X(reduced[k]) - r[k]).Abs(), errorM = (X(reducedM[k]) - m[k]).Abs();
            Assert.True(errorR <= forceBound, $"R[{k}] error {errorR} above {forceBound} (exact {r[k]})");
            Assert.True(errorM <= momentBound, $"M[{k}] error {errorM} above {momentBound} (exact {m[k]})");

            ExactRational naiveErrorR = (X(naiveR[k]) - r[k]).Abs(), naiveErrorM = (X(naiveM[k]) - m[k]).Abs();
            worst = Math.Max(worst, Math.Max(errorR.ToDouble() / Ulp(grossForce), errorM.ToDouble() / Ulp(grossMoment)));
            naiveWorst = Math.Max(naiveWorst, Math.Max(naiveErrorR.ToDouble() / Ulp(grossForce), naiveErrorM.ToDouble() / Ulp(grossMoment)));
            naiveFails |= naiveErrorR > forceBound;
            naiveFails |= naiveErrorM > momentBound;
        }
        // The same input, summed naively, fails the same 4-ulp test and is measurably worse.
        Assert.True(naiveFails, "naive summation unexpectedly met the 4-ulp bound");
        Assert.True(naiveWorst > 4 * Math.Max(worst, 1), $"naive worst error {naiveWorst} ulp against {worst} ulp");
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void ResultAt_originFarFromCancellingForces_withinFourUlpOfGrossOfExactRationalResult(bool columns)
    {
        // The same data about the global origin, 10⁶ m away: M_O = Σ at × F exactly.
        List<Load> loads = CancellingLoads();
        ReductionAccumulator acc = Accumulate(loads, columns);
        LoadReduction result = acc.ResultAt(Vector3.Zero);
        var m = new ExactRational[3];
        double gross = 0;
        foreach (Load l in loads)
        {
            ExactRational ax = X(l.At.X), ay = X(l.At.Y), az = X(l.At.Z), fx = X(l.Force.X), fy = X(l.Force.Y), fz = X(l.Force.Z);
            m[0] += (ay * fz) - (az * fy);
            m[1] += (az * fx) - (ax * fz);
            m[2] += (ax * fy) - (ay * fx);
            gross += l.At.Length * l.Force.Length;
        }
        ExactRational bound = X(4 * Ulp(gross));
        double[] reduced = [result.Moment.X, result.Moment.Y, result.Moment.Z];
        for (int k = 0; k < 3; k++)
        {
            ExactRational error = (X(reduced[k]) - m[k]).Abs();
            Assert.True(error <= bound, $"M_O[{k}] error {error} above {bound} (exact {m[k]})");
        }
    }

    [Fact]
    public void ResultAt_pointForcesShiftedByAMillionMetres_sameToAFewUlp_whereNaiveDoublesAreNot()
    {
        // The companion of the property ResultAt_coordinatesOffsetByAMillionMetres_sameResult (bound 10⁻¹⁵ of the
        // moment scale): here the naive textbook method — Σ r × F about the origin in plain doubles, then moved to the
        // point with (O − P) × R — is computed on the same shifted data and shown to miss that bound. Positions are
        // multiples of 2⁻¹⁶ within ±10 m, so the shift by (10⁶, −2·10⁶, 10⁶) is exact and the two systems are the same.
        var random = new Random(20261203);
        Vector3 shift = Vector3.Create(1e6, -2e6, 1e6);
        double Dyadic(double v) => Math.Round(v * 65536) / 65536;
        var at = new List<Vector3>();
        var forces = new List<Vector3>();
        for (int i = 0; i < 200; i++)
        {
            at.Add(Vector3.Create(Dyadic((random.NextDouble() - 0.5) * 20), Dyadic((random.NextDouble() - 0.5) * 20), Dyadic((random.NextDouble() - 0.5) * 20)));
            forces.Add(Vector3.Create((random.NextDouble() - 0.5) * 200, (random.NextDouble() - 0.5) * 200, (random.NextDouble() - 0.5) * 200));
        }
        Vector3 p = Vector3.Create(Dyadic(1.25), Dyadic(-3.5), Dyadic(0.75));
        var near = new ReductionAccumulator();
        var far = new ReductionAccumulator();
        for (int i = 0; i < at.Count; i++)
        {
            near.AddPointForce(at[i], forces[i]);
            far.AddPointForce(at[i] + shift, forces[i]);
        }
        LoadReduction a = near.ResultAt(p);
        LoadReduction b = far.ResultAt(p + shift);
        double bound = 1e-15 * a.MomentScale(a.ReferencePoint);
        Close.Absolute(a.Moment, b.Moment, bound);

        double mx = 0, my = 0, mz = 0, rx = 0, ry = 0, rz = 0;
        for (int i = 0; i < at.Count; i++)
        {
            Vector3 r = at[i] + shift, f = forces[i];
            mx += (r.Y * f.Z) - (r.Z * f.Y);
            my += (r.Z * f.X) - (r.X * f.Z);
            mz += (r.X * f.Y) - (r.Y * f.X);
            rx += f.X;
            ry += f.Y;
            rz += f.Z;
        }
        Vector3 q = p + shift;
        Vector3 naive = Vector3.Create(mx - ((q.Y * rz) - (q.Z * ry)), my - ((q.Z * rx) - (q.X * rz)), mz - ((q.X * ry) - (q.Y * rx)));
        double naiveError = (naive - a.Moment).Length;
        Assert.True(naiveError > 100 * bound, $"naive error {naiveError:R} against the bound {bound:R}");
    }
}
