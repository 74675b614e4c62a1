using LoadDiff.Core;
using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Tests;

public partial class LineLoadTests
{
    [Theory]
    [InlineData(1e-170)]
    [InlineData(1e-100)]
    [InlineData(1e90)]
    public void ContributionAbout_tinyOrHugeNonParallelIntensities_scaleLinearly(double k)
    {
        // ∫|w| is homogeneous of degree one in the intensities: the reference is the same load at unit scale
        // (itself checked against a Simpson rule elsewhere); here the squares would underflow or overflow.
        Vector3 a = Vector3.Create(1, 0, 0.5), b = Vector3.Create(0, 1, -2);
        var unit = new LineLoad("w", Vector3.Zero, Vector3.Create(2, 0, 0), a, b);
        var scaled = unit with { StartIntensity = a * k, EndIntensity = b * k };
        Contribution u = unit.ContributionAbout(Vector3.Zero), s = scaled.ContributionAbout(Vector3.Zero);
        Assert.True(double.IsFinite(s.GrossForce));
        Assert.Equal(1, s.GrossForce / (u.GrossForce * k), 12);
        Assert.Equal(1, s.GrossFirstMoment.X / (u.GrossFirstMoment.X * k), 12);
    }
}
