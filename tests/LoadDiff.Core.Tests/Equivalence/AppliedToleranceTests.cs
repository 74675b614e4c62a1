using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// Which part of the rule sets each allowance (SPEC §4: max(F, rel·G_F) and max(M, rel·G_M), never below the rounding
/// noise), including the documented tie rule: ties go to the user's parts, the absolute one first. The original is −4 kN at
/// x = 0 and −6 kN at x = 2 (G_F = 10 kN, D = 2 m, G_M = 20 kN·m by hand), compared with itself. The rounding noise is
/// 1e-12 × G_F for forces (DEVELOPERS.md, "How the mechanics are done"); the products below are the test's own arithmetic.
/// </summary>
public class AppliedToleranceTests
{
    private static readonly LoadItem[] Original =
    [
        new PointForce("a", Vector3.Zero, Vector3.Create(0, 0, -4)),
        new PointForce("b", Vector3.Create(2, 0, 0), Vector3.Create(0, 0, -6)),
    ];

    private static AppliedTolerance Applied(ToleranceSpec spec)
    {
        LoadReduction r = Support.Reduce.About(Vector3.Zero, Original);
        return EquivalenceChecker.Compare("c", EntryKind.Case, r, r, spec).Tolerance!;
    }

    [Fact]
    public void An_absolute_tolerance_equal_to_the_relative_part_governs()
    {
        // rel·G_F = 0.5 × 10 = 5 = F and rel·G_M = 0.5 × 20 = 10 = M: ties, so the absolute parts govern.
        AppliedTolerance t = Applied(new ToleranceSpec(0.5, 5, 10));
        Assert.Equal(5, t.Force);
        Assert.Equal(10, t.Moment);
        Assert.Equal(AllowanceSource.Absolute, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Absolute, t.MomentGovernedBy);
        Assert.False(t.ForceGovernedByRelative);
        Assert.False(t.MomentGovernedByRelative);
    }

    [Fact]
    public void The_relative_part_governs_when_it_is_larger()
    {
        AppliedTolerance t = Applied(new ToleranceSpec(0.5, 4, 9));
        Assert.Equal(5, t.Force);
        Assert.Equal(10, t.Moment);
        Assert.Equal(AllowanceSource.Relative, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Relative, t.MomentGovernedBy);
        Assert.True(t.ForceGovernedByRelative);
        Assert.True(t.MomentGovernedByRelative);
    }

    [Fact]
    public void An_absolute_tolerance_equal_to_the_rounding_noise_governs()
    {
        const double noise = 1e-12 * 10;
        AppliedTolerance t = Applied(new ToleranceSpec(0, noise, 0));
        Assert.Equal(noise, t.Noise.Force);
        Assert.Equal(noise, t.Force);
        Assert.Equal(AllowanceSource.Absolute, t.ForceGovernedBy);
        // No moment tolerance at all: the noise is the floor.
        Assert.Equal(AllowanceSource.Rounding, t.MomentGovernedBy);
        Assert.Equal(t.Noise.Moment, t.Moment);
    }

    [Fact]
    public void A_relative_part_equal_to_the_rounding_noise_governs()
    {
        // rel = 1e-12: rel·G_F is the very product 1e-12 × 10 that the force noise is.
        AppliedTolerance t = Applied(new ToleranceSpec(1e-12, 0, 0));
        Assert.Equal(1e-12 * 10, t.Force);
        Assert.Equal(AllowanceSource.Relative, t.ForceGovernedBy);
    }

    [Fact]
    public void The_rounding_noise_governs_when_everything_else_is_smaller()
    {
        AppliedTolerance t = Applied(new ToleranceSpec(0, 0, 0));
        Assert.Equal(AllowanceSource.Rounding, t.ForceGovernedBy);
        Assert.Equal(1e-12 * 10, t.Force);
        Assert.False(t.ForceGovernedByRelative);
    }
}
