using LoadDiff.Core;
using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Tests;

public partial class AreaLoadTests
{
    [Fact]
    public void ContributionAbout_farReferencePoint_keepsTheAreaExact()
    {
        // A 1.37 × 2.59 rectangle under a uniform 1.5 pressure carries 1.5 · 1.37 · 2.59 whatever the reference point
        // (exact arithmetic to rounding); about a point 3·10¹⁵ away its corners would round to 0.5 if taken from there.
        Vector3 o = Vector3.Create(0.37, 0.21, 0);
        var area = new AreaLoad("a", [o, o + Vector3.Create(1.37, 0, 0), o + Vector3.Create(1.37, 2.59, 0), o + Vector3.Create(0, 2.59, 0)],
            1.5, Vector3.Create(0, 0, -1), Vector3.Zero, Vector3.Zero);
        var tri = new MeshTriangle("t", o, o + Vector3.Create(1.37, 0, 0), o + Vector3.Create(1.37, 2.59, 0), 1.5, 1.5, 1.5, Vector3.Create(0, 0, -1));
        Vector3 far = Vector3.Create(3e15, -3e15, 0);
        double expected = 1.5 * 1.37 * 2.59;
        Assert.Equal(1, area.ContributionAbout(far).Force.Z / -expected, 12);
        Assert.Equal(1, tri.ContributionAbout(far).Force.Z / (-expected / 2), 12);
    }
}
