using System.Globalization;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The same load written in two unit systems is the same load, whichever file comes first (SPEC §4: "a verdict never
/// depends on rounding or on the order of the files"). Conversion factors: NIST SP 811 (2008), Appendix B.8,
/// 1 kip = 4448.2216152605 N and 1 ft = 0.3048 m, both exact.
/// </summary>
public partial class EquivalenceCheckerTests
{
    private const decimal KipInNewtons = 4448.2216152605m; // NIST SP 811 (2008), B.8: 1000 lbf
    private const decimal FootInMetres = 0.3048m;          // NIST SP 811 (2008), B.8: exact

    // The decimal quotient (28 significant digits) rounded once to the nearest double, as a writer of a kip/ft file would.
    private static double Written(decimal value) => double.Parse(value.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    private static decimal D(double value) => decimal.Parse(value.ToString("R", CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);

    // What the readers do with a file's numbers (Formats UnitConversion: value × source.FactorTo(target), a factor of
    // exactly 1 where the units agree), then the reduction.
    private static LoadReduction AsRead(Vector3 at, Vector3 force, Unit forceUnit, Unit lengthUnit, Unit targetForce, Unit targetLength, Vector3? point = null)
    {
        double f = forceUnit.FactorTo(targetForce), l = lengthUnit.FactorTo(targetLength);
        var acc = new ReductionAccumulator();
        acc.Add(new PointForce("P", at * l, force * f));
        return acc.ResultAt(point ?? at * l);
    }

    public static TheoryData<double, double, double, double, double, double> TenKilonewtonForces => new()
    {
        // (x, y, z) in m, (Fx, Fy, Fz) in N; |F| = 10 kN in every row (6-8-0 and 0-0-10 by hand)
        { 12.5, 30.25, 4.75, 6000, 0, -8000 },
        { 123.456, 78.9, 10.11, 0, 0, -10000 },
        { 1234.567, -987.65, 43.21, -8000, 6000, 0 },
        { 0.1, 0.2, 0.3, 0, -10000, 0 },
    };

    [Theory]
    [MemberData(nameof(TenKilonewtonForces))]
    public void Compare_tenKilonewtonsInNewtonMetresAndInKipFeet_passInBothOrders(double x, double y, double z, double fx, double fy, double fz)
    {
        Vector3 atM = V(x, y, z), forceN = V(fx, fy, fz);
        // the kip/ft file's numbers: N / 4448.2216152605 and m / 0.3048, exactly in decimal, rounded once to double
        Vector3 atFt = V(Written(D(x) / FootInMetres), Written(D(y) / FootInMetres), Written(D(z) / FootInMetres));
        Vector3 forceKip = V(Written(D(fx) / KipInNewtons), Written(D(fy) / KipInNewtons), Written(D(fz) / KipInNewtons));
        Unit n = UnitCatalog.Newton, m = UnitCatalog.Metre, kip = UnitCatalog.Kip, ft = UnitCatalog.Foot;

        // N/m first: the kip/ft numbers are converted to N and m
        LoadReduction a = AsRead(atM, forceN, n, m, n, m);
        LoadReduction b = AsRead(atFt, forceKip, kip, ft, n, m, a.ReferencePoint);
        CaseComparison metric = EquivalenceChecker.Compare("P", Model.EntryKind.Case, a, b, ToleranceSpec.Default);

        // kip/ft first: the N/m numbers are converted to kip and ft
        LoadReduction c = AsRead(atFt, forceKip, kip, ft, kip, ft);
        LoadReduction d = AsRead(atM, forceN, n, m, kip, ft, c.ReferencePoint);
        CaseComparison imperial = EquivalenceChecker.Compare("P", Model.EntryKind.Case, c, d, ToleranceSpec.Default);

        foreach (CaseComparison k in new[] { metric, imperial })
        {
            Assert.True(k.Equivalent, $"{k.Residual} against {k.Tolerance}");
            // one point, so D = 0 and rel·G_M = 0: only the rounding noise is left to allow for the conversion
            Assert.Equal(0, k.Tolerance!.Diagonal);
            Assert.Equal(AllowanceSource.Rounding, k.Tolerance.MomentGovernedBy);
            Assert.Equal(AllowanceSource.Relative, k.Tolerance.ForceGovernedBy);
            // the residual is rounding, so its own wrench is a null system (values below 1e-12 of the gross magnitudes)
            Assert.Equal(SystemKind.Null, k.Residual!.Wrench.Kind);
        }
        Assert.Equal(10000, metric.Tolerance!.GrossForce, 9);
        Assert.Equal(10000 / 4448.2216152605, imperial.Tolerance!.GrossForce, 12);
    }
}
