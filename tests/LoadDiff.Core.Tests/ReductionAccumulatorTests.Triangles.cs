using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests;

public partial class ReductionAccumulatorTests
{
    // The triangle path the mesh readers take (AddTriangle, without building an item), against hand integrals.
    // Triangle (0,0,0), (3,0,0), (0,3,0), pressures 1, 2, 3 at the vertices, normal +z by the right-hand rule.
    // With the linear shape functions φ_i, ∫φ_iφ_j dA = A(1 + δ_ij)/12, so ∫p·x dA = A/12 (Σp Σx + Σp_i x_i):
    // A = 4.5, Σp = 6; F = A Σp/3 = 9; ∫p x = 4.5/12 (6·3 + 2·3) = 9; ∫p y = 4.5/12 (6·3 + 3·3) = 10.125.
    // M about the origin = ∫ r × (0, 0, p) dA = (∫p y, −∫p x, 0) = (10.125, −9, 0).
    [Fact]
    public void AddTriangle_linearPressure_handIntegralsAboutAnAnchorSetByAnEarlierItem()
    {
        var acc = new ReductionAccumulator();
        // a point force first, so the triangle is reduced about the accumulator's anchor (10, 0, 0), not its vertex
        acc.AddPointForce(Vector3.Create(10, 0, 0), Vector3.Create(0, 0, -5));
        acc.AddTriangle(Vector3.Create(0, 0, 0), Vector3.Create(3, 0, 0), Vector3.Create(0, 3, 0), 1, 2, 3, null);
        LoadReduction r = acc.ResultAt(Vector3.Zero);
        Assert.Equal(2, r.ItemCount);
        Assert.Equal(Vector3.Create(0, 0, 4), r.Force);
        // the point force adds (10, 0, 0) × (0, 0, −5) = (0, 50, 0)
        Assert.Equal(Vector3.Create(10.125, 41, 0), r.Moment);
        Assert.Equal(14, r.GrossForce);
        Assert.Equal(Vector3.Create(0, 0, 0), r.Bounds!.Min);
        Assert.Equal(Vector3.Create(10, 3, 0), r.Bounds.Max);
        Assert.True(r.AllForcesParallel);
    }

    [Fact]
    public void AddTriangle_givenDirection_isNormalisedAndTrackedForParallelism()
    {
        // The same triangle pressed along (0, 0, −2): the direction is a direction only, so F = (0, 0, −9) and
        // M = −(10.125, −9, 0). A tilted direction on a second triangle makes the forces not parallel.
        var acc = new ReductionAccumulator();
        acc.AddTriangle(Vector3.Create(0, 0, 0), Vector3.Create(3, 0, 0), Vector3.Create(0, 3, 0), 1, 2, 3, Vector3.Create(0, 0, -2));
        LoadReduction r = acc.ResultAt(Vector3.Zero);
        Assert.Equal(Vector3.Create(0, 0, -9), r.Force);
        Assert.Equal(Vector3.Create(-10.125, 9, 0), r.Moment);
        Assert.True(r.AllForcesParallel);
        acc.AddTriangle(Vector3.Create(0, 0, 0), Vector3.Create(3, 0, 0), Vector3.Create(0, 3, 0), 1, 1, 1, Vector3.Create(1, 0, 0));
        LoadReduction both = acc.ResultAt(Vector3.Zero);
        // second: uniform 1 over A = 4.5 along +x: F = (4.5, 0, 0), M = ∫ r × (1, 0, 0) dA = (0, ∫z, −∫y) = (0, 0, −4.5)
        Assert.Equal(Vector3.Create(4.5, 0, -9), both.Force);
        Assert.Equal(Vector3.Create(-10.125, 9, -4.5), both.Moment);
        Assert.Equal(13.5, both.GrossForce);
        Assert.False(both.AllForcesParallel);
    }
}
