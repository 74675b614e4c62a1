using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>The public contract of the verdict's records and of ToleranceSpec's validation (as documented on them).</summary>
public partial class EquivalenceCheckerTests
{
    [Theory]
    [InlineData(true, false)]
    [InlineData(false, true)]
    [InlineData(false, false)]
    public void ForcePassesAndMomentPasses_withoutAResidualOrATolerance_false(bool withResidual, bool withTolerance)
    {
        // "True when |ΔR| is within its tolerance": no residual or no tolerance, nothing is within anything.
        CaseComparison both = Check(ToleranceSpec.Default, V(0, 0, 0), FarOriginal, FarOriginal);
        Assert.True(both.ForcePasses && both.MomentPasses);
        CaseComparison partial = both with
        {
            Residual = withResidual ? both.Residual : null,
            Tolerance = withTolerance ? both.Tolerance : null,
        };
        Assert.False(partial.ForcePasses);
        Assert.False(partial.MomentPasses);
    }

    [Fact]
    public void Create_zeroEverywhere_isValid_andKeepsTheNumbers()
    {
        ToleranceSpec zero = ToleranceSpec.Create(0, 0, 0, 0);
        Assert.Equal(new ToleranceSpec(0, 0, 0, 0), zero);
        Assert.Equal(new ToleranceSpec(2e-3, 1.5, 7, null), ToleranceSpec.Create(2e-3, 1.5, 7));
        Assert.Equal(new ToleranceSpec(2e-3, 1.5, 7, 12), ToleranceSpec.Create(2e-3, 1.5, 7, 12));
    }

    [Fact]
    public void Default_isRelativeOnePerMille_noAbsoluteParts_noStatedLength()
    {
        // rel = 1e-3: common practice, no published source (CHECK-VALUES, "Tolerance of a load-balance check")
        Assert.Equal(new ToleranceSpec(1e-3, 0, 0, null), ToleranceSpec.Default);
        Assert.Equal(1e-3, ToleranceSpec.DefaultRelative);
    }

    public static TheoryData<int, double, string, string> BadTolerances
    {
        get
        {
            var data = new TheoryData<int, double, string, string>();
            string[] names = ["relative", "force", "moment", "length"];
            string[] words = ["relative tolerance", "force tolerance", "moment tolerance", "length D"];
            for (int k = 0; k < 4; k++)
            {
                foreach (double bad in new[] { -1e-3, -double.Epsilon, double.NaN, double.PositiveInfinity, double.NegativeInfinity })
                {
                    data.Add(k, bad, names[k], words[k]);
                }
            }
            return data;
        }
    }

    [Theory]
    [MemberData(nameof(BadTolerances))]
    public void Create_negativeOrNonFinite_refusedNamingTheValue(int which, double bad, string parameter, string words)
    {
        double[] v = [1e-3, 1, 1, 1];
        v[which] = bad;
        ArgumentException e = Assert.Throws<ArgumentException>(() => ToleranceSpec.Create(v[0], v[1], v[2], v[3]));
        Assert.Equal(parameter, e.ParamName);
        Assert.Contains(words, e.Message, StringComparison.Ordinal);
        Assert.Contains("finite number ≥ 0", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Compare_residualASingleForceOfNonParallelSystems_isNotReportedAsAParallelSystem()
    {
        // The residual of two systems is no load system of parallel forces: its wrench gives the line of the missing
        // force, and no "centre of parallel forces" (WrenchAnalysis: that is for a parallel system). Original: a
        // horizontal and a vertical force; the substitute lacks the vertical one, so the residual is −(0, 0, −5) at (3, 0, 0).
        LoadItem[] original = [new PointForce("h", V(0, 0, 1), V(4, 0, 0)), new PointForce("v", V(3, 0, 0), V(0, 0, -5))];
        LoadItem[] substitute = [new PointForce("h", V(0, 0, 1), V(4, 0, 0))];
        CaseComparison c = Check(ToleranceSpec.Default, V(0, 0, 0), original, substitute);
        Assert.False(c.Original!.AllForcesParallel);
        Assert.Equal(SystemKind.Force, c.Residual!.Wrench.Kind);
        Assert.Null(c.Residual.Wrench.CentreOfParallelForces);
        // the missing force's line: x = 3, vertical (through the axis point found from the box centre (1.5, 0, 0.5))
        Assert.Equal(3, c.Residual.Wrench.AxisPoint!.Value.X, 12);
        Assert.Equal(0, c.Residual.Wrench.AxisPoint!.Value.Y, 12);
        Assert.Equal(V(0, 0, 1), c.Residual.Wrench.AxisDirection);
    }
}
