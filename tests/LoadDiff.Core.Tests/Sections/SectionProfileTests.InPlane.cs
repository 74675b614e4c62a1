using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;

namespace LoadDiff.Core.Tests.Sections;

public partial class SectionProfileTests
{
    [Fact]
    public void Compute_lineLyingInTheCutPlane_isOnTheSameSideWholeOrInPieces()
    {
        // A line from (0, 1, 0) to (2, 3, 2) lies in the plane −x + z = 0 of the cut at s = 0 (exact arithmetic);
        // its midpoint's station is rounding noise. Whole or split, the load counts as on the cut (negative side).
        var axis = SectionAxis.Create(Vector3.Zero, Vector3.Create(-1, 0, 1));
        var line = new LineLoad("w", Vector3.Create(0, 1, 0), Vector3.Create(2, 3, 2), Vector3.Create(0, 0, -3), Vector3.Create(0, 0, -3));
        Vector3 mid = Vector3.Create(1 - 2.220446049250313e-16, 2, 1); // one ulp below 1: station +1.6e-16, beyond the cut by rounding only
        LoadItem[] pieces = [line with { To = mid }, line with { From = mid }];
        ForceCoupleSystem whole = Profile(axis, [0.0], [line])[0], split = Profile(axis, [0.0], pieces)[0];
        Assert.Equal(-3 * line.Length, whole.Force.Z, 12);
        Assert.True((whole.Force - split.Force).Length <= 1e-12 * 3 * line.Length);
        Assert.True((whole.Moment - split.Moment).Length <= 1e-11 * 3 * line.Length * 4);
    }
}
