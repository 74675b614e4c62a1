using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public partial class PolygonGeometryTests
{
    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    private static bool Simple(params Vector3[] p) => PolygonGeometry.IsSimple(p, PolygonGeometry.Analyse(p).AreaVector);

    // Exact arithmetic on small integer coordinates: each answer is read off a sketch of the polygon.
    [Fact]
    public void IsSimple_convex_and_non_convex_polygons_are_simple()
    {
        Assert.True(Simple(V(0, 0, 0), V(4, 0, 0), V(4, 3, 0), V(0, 3, 0)));
        Assert.True(Simple(V(0, 0, 0), V(4, 0, 0), V(4, 1, 0), V(1, 1, 0), V(1, 3, 0), V(0, 3, 0))); // an L
        Assert.True(Simple(V(0, 0, 0), V(0, 0, 2), V(0, 5, 2), V(0, 5, 0))); // a wall in the plane x = 0
        Assert.True(Simple(V(0, 3, 0), V(5, 3, 0), V(5, 3, 2), V(0, 3, 2))); // a wall in the plane y = 3
    }

    [Fact]
    public void IsSimple_crossing_touching_and_folded_polygons_are_not()
    {
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(0, 2, 0), V(1, 2, 0))); // edges (4,0)–(0,2) and (1,2)–(0,0) cross at (0.8, 1.6)
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(4, 4, 0), V(2, 0, 0), V(0, 4, 0))); // a vertex on another edge
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(2, 0, 0), V(2, 3, 0))); // an edge folding back along the previous one
        // The first crossing again, in the planes y = 3 and x = 0 (its lobes differ, so its area vector is not zero).
        Assert.False(Simple(V(0, 3, 0), V(4, 3, 0), V(0, 3, 2), V(1, 3, 2)));
        Assert.False(Simple(V(0, 0, 0), V(0, 4, 0), V(0, 0, 2), V(0, 1, 2)));
    }

    [Fact]
    public void Analyse_area_vector_size_and_out_of_plane_distance_of_a_warped_pentagon()
    {
        // Hand computation in exact fractions, relative to the first vertex o = (1, 1, 1): the edge vectors are
        // d = (0,0,0), (2,0,0), (2,2,0), (1,3,1), (0,2,0); the fan ½Σ d_i × d_(i+1) = ½[(0,0,4) + (2,−2,4) + (−2,0,2)]
        // = ½(0, −2, 10) = (0, −1, 5). Size = max |d| = √11 (the fourth vertex).
        // Mean of d = (1, 7/5, 1/5); (d − mean)·A = 2/5, 2/5, −8/5, 12/5, −8/5, so the largest distance from the
        // mean plane is (12/5)/|A| = (12/5)/√26, at the fourth vertex.
        PolygonGeometry g = PolygonGeometry.Analyse([V(1, 1, 1), V(3, 1, 1), V(3, 3, 1), V(2, 4, 2), V(1, 3, 1)]);
        Assert.Equal(V(0, -1, 5), g.AreaVector);
        Close.Relative(Math.Sqrt(26), g.Area, 1e-15);
        Close.Relative(Math.Sqrt(11), g.Size, 1e-15);
        Close.Relative(2.4 / Math.Sqrt(26), g.OutOfPlane, 1e-14);
    }

    [Fact]
    public void Analyse_out_of_plane_distance_is_measured_from_the_mean_of_the_vertices()
    {
        // By hand, o = (0, 0, 0): d = (0,0,0), (2,0,0), (2,2,1), (0,2,0); A = ½[(2,0,0)×(2,2,1) + (2,2,1)×(0,2,0)]
        // = ½[(0,−2,4) + (−2,0,4)] = (−1, −1, 4), |A| = √18. Mean of d = (1, 1, 1/4), mean·A = −1; d·A = 0, −2, 0, −2, so
        // (d − mean)·A = 1, −1, 1, −1: every vertex is 1/√18 from the mean plane. (Measured from −mean it would be 3/√18.)
        PolygonGeometry g = PolygonGeometry.Analyse([V(0, 0, 0), V(2, 0, 0), V(2, 2, 1), V(0, 2, 0)]);
        Assert.Equal(V(-1, -1, 4), g.AreaVector);
        Close.Relative(3, g.Size, 1e-15);
        Close.Relative(1 / Math.Sqrt(18), g.OutOfPlane, 1e-14);
    }

    [Fact]
    public void Analyse_refuses_fewer_than_three_vertices_and_null()
    {
        ArgumentException e = Assert.Throws<ArgumentException>(() => PolygonGeometry.Analyse([V(0, 0, 0), V(1, 0, 0)]));
        Assert.StartsWith("A polygon needs at least three vertices.", e.Message, StringComparison.Ordinal);
        Assert.Throws<ArgumentNullException>(() => PolygonGeometry.Analyse(null!));
        Assert.Throws<ArgumentNullException>(() => PolygonGeometry.IsSimple(null!, V(0, 0, 1)));
        e = Assert.Throws<ArgumentException>(() => PolygonGeometry.IsSimple([V(0, 0, 0), V(1, 0, 0)], V(0, 0, 1)));
        Assert.StartsWith("A polygon needs at least three vertices.", e.Message, StringComparison.Ordinal);
    }
}
