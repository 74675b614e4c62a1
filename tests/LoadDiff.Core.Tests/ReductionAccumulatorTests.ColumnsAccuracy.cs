using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public partial class ReductionAccumulatorTests
{
    // Rows that defeat plain summation in every lane: four forces of 1e16 open the file and four equal and opposite
    // ones, set 1 mm to 3 mm away, close it; between them 400 small forces with decimal (non-dyadic) coordinates and
    // components. In double each small term added to a lane holding 1e16 is lost (the spacing there is 2), and the
    // products of decimal coordinates and forces round; the compensated lanes (Sum2/Dot2, Ogita, Rump and Oishi 2005)
    // keep both. The first row sits at the origin so that the positions relative to the anchor are exact.
    private static (Vector3 At, Vector3 Force)[] CancellingRows()
    {
        var rows = new List<(Vector3, Vector3)>();
        for (int k = 0; k < 4; k++)
        {
            rows.Add((Vector3.Create(0.1 * k, 0.3 * k, -0.7 * k), Vector3.Create(1e16, -7e15 * (1 + (0.1 * k)), 3e15 * (k + 1))));
        }
        for (int j = 0; j < 400; j++)
        {
            rows.Add((Vector3.Create(0.37 * (j % 11), 0.1 + (0.013 * j), 2.9 - (0.07 * (j % 5))),
                      Vector3.Create((0.1 * (j % 7)) - 0.3, 0.2 + (0.001 * j), -0.7 + (0.01 * (j % 13)))));
        }
        for (int k = 0; k < 4; k++)
        {
            rows.Add((Vector3.Create((0.1 * k) + 0.001, (0.3 * k) - 0.002, (-0.7 * k) + 0.003), -rows[k].Item2));
        }
        return [.. rows];
    }

    [Fact]
    public void AddPointForces_cancellingRowsOfDecimalValues_resultantAndMomentToTheCompensatedBound()
    {
        var rows = CancellingRows();
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, Columns(rows)));
        LoadReduction r = acc.ResultAt(Vector3.Zero);

        // Reference: the same rows summed exactly in rationals (ExactVector, from the doubles as stored).
        ExactVector force = ExactVector.Resultant(rows), moment = ExactVector.MomentAbout(Vector3.Zero, rows);
        // The compensated bound, |result − exact| ≤ eps·|exact| + (n·eps)²·Σ|terms| (Ogita, Rump and Oishi 2005,
        // Sum2 and Dot2): with n = 408 and Σ|terms| ≈ 1e17 the second part is about 2e-10, while one plain sum in
        // double loses the whole of the small rows (ΣF_x ≈ −2.6, M ≈ 10² off).
        double n = rows.Length, eps = Math.Pow(2, -53);
        double termsF = rows.Sum(row => Math.Abs(row.Force.X) + Math.Abs(row.Force.Y) + Math.Abs(row.Force.Z));
        double termsM = rows.Sum(row => 2 * row.At.Length * row.Force.Length);
        AssertWithin(force, r.Force, eps, n * n * eps * eps * termsF);
        AssertWithin(moment, r.Moment, eps, n * n * eps * eps * termsM);

        // The same rows summed naively in double, to show the assertion tells the two apart.
        Vector3 naiveF = Vector3.Zero, naiveM = Vector3.Zero;
        foreach ((Vector3 at, Vector3 f) in rows)
        {
            naiveF = Vector3.Create(naiveF.X + f.X, naiveF.Y + f.Y, naiveF.Z + f.Z);
            naiveM += Vector3.Cross(at, f);
        }
        Assert.True(Math.Abs(naiveF.X - force.X.ToDouble()) > 1e3 * n * n * eps * eps * termsF, $"naive ΣF_x {naiveF.X:R} exact {force.X}");
        Assert.True((naiveM - ToVector(moment)).Length > 1e3 * n * n * eps * eps * termsM, $"naive M {naiveM} exact {moment}");
    }

    [Fact]
    public void AddPointForces_manySmallMagnitudesAfterLargeOnes_grossForceToTheCompensatedBound()
    {
        var rows = CancellingRows();
        var c = Columns(rows);
        var acc = new ReductionAccumulator();
        Assert.True(AddColumns(acc, c));
        // The magnitudes the accumulator reports, one per row (checked against Vector3.Length elsewhere), summed
        // exactly: G_F is their sum. Without cancellation the bound is about one rounding of the total (eps × 1.2e17 ≈ 13),
        // and plain summation in four lanes drops every small |F| added after 1e16 (320 lost, about 24 times the bound).
        ExactRational gross = ExactRational.Zero;
        foreach (double g in c[6])
        {
            gross += ExactRational.FromDouble(g);
        }
        double n = rows.Length, eps = Math.Pow(2, -53), all = c[6].Sum();
        double allowed = (eps * all) + (n * n * eps * eps * all);
        ExactRational error = (ExactRational.FromDouble(acc.ResultAt(Vector3.Zero).GrossForce) - gross).Abs();
        Assert.True(error <= ExactRational.FromDouble(allowed), $"G_F error {error}, allowed {allowed:R}");
        double naive = 0;
        for (int lane = 0; lane < 4; lane++)
        {
            double s = 0;
            for (int i = lane; i < c[6].Length; i += 4)
            {
                s += c[6][i];
            }
            naive += s;
        }
        Assert.True((ExactRational.FromDouble(naive) - gross).Abs() > ExactRational.FromDouble(10 * allowed), $"naive {naive:R} exact {gross}");
    }

    private static Vector3 ToVector(ExactVector v) => Vector3.Create(v.X.ToDouble(), v.Y.ToDouble(), v.Z.ToDouble());

    private static void AssertWithin(ExactVector expected, Vector3 actual, double relative, double absolute)
    {
        Component(expected.X, actual.X, "x");
        Component(expected.Y, actual.Y, "y");
        Component(expected.Z, actual.Z, "z");

        void Component(ExactRational e, double a, string name)
        {
            ExactRational error = (ExactRational.FromDouble(a) - e).Abs();
            ExactRational allowed = (e.Abs() * ExactRational.FromDouble(relative)) + ExactRational.FromDouble(absolute);
            Assert.True(error <= allowed, $"{name}: expected {e}, actual {a:R}, error {error}, allowed {allowed}");
        }
    }
}
