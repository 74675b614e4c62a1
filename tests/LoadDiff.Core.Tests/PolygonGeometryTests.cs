using LoadDiff.Core;
using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Tests;

public class PolygonGeometryTests
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
    }

    [Fact]
    public void IsSimple_crossing_touching_and_folded_polygons_are_not()
    {
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(0, 2, 0), V(1, 2, 0))); // edges (4,0)–(0,2) and (1,2)–(0,0) cross at (0.8, 1.6)
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(4, 4, 0), V(2, 0, 0), V(0, 4, 0))); // a vertex on another edge
        Assert.False(Simple(V(0, 0, 0), V(4, 0, 0), V(2, 0, 0), V(2, 3, 0))); // an edge folding back along the previous one
    }
}
