using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;

namespace LoadDiff.Core.Tests.Equivalence;

public partial class EquivalenceCheckerTests
{
    [Fact]
    public void Compare_refuses_an_allowance_beyond_double_even_when_only_the_moment_allowance_overflows()
    {
        // Two forces of 6e297 along the x axis at x = ±1e10: every moment is zero (r ∥ F) and |r|·|F| = 6e307 is in range,
        // G_F = 1.2e298 too, but G_M = G_F·D = 1.2e298 · 2e10 = 2.4e308 is beyond the largest double (IEEE 754 binary64,
        // 1.797e308). An infinite moment allowance would pass any substitute, so the check is refused, naming the case.
        var a = new PointForce("a", V(-1e10, 0, 0), V(6e297, 0, 0));
        var b = new PointForce("b", V(1e10, 0, 0), V(6e297, 0, 0));
        var wrong = new PointForce("w", V(0, 0, 0), V(6e297, 0, 0)); // half the force: it must never pass
        OverflowException e = Assert.Throws<OverflowException>(() =>
            EquivalenceChecker.Compare("far", EntryKind.Case, Reduce(V(0, 0, 0), a, b), Reduce(V(0, 0, 0), wrong), ToleranceSpec.Default));
        Assert.StartsWith("the tolerance of 'far' overflowed the range of double (G_F = 1.2E+298, G_M", e.Message, StringComparison.Ordinal);
    }
}
