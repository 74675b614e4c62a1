using CsCheck;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

// The sweep against an independent reference: every pair of edges tested with exact rational orientation (the
// textbook segment-intersection predicate; neighbours may only share their common vertex, collinear and pointing
// away from each other). Small integer grids make touching, collinear and repeated-vertex cases common.
public partial class PolygonGeometryTests
{
    private static int ExactTurn((double U, double V) a, (double U, double V) b, (double U, double V) c)
    {
        ExactRational au = ExactRational.FromDouble(a.U), av = ExactRational.FromDouble(a.V);
        ExactRational bu = ExactRational.FromDouble(b.U), bv = ExactRational.FromDouble(b.V);
        ExactRational cu = ExactRational.FromDouble(c.U), cv = ExactRational.FromDouble(c.V);
        return (((bu - au) * (cv - av)) - ((bv - av) * (cu - au))).Sign;
    }

    private static bool Between(double a, double b, double c) => Math.Min(a, b) <= c && c <= Math.Max(a, b);

    // Collinear c lies on the closed segment ab.
    private static bool Within((double U, double V) a, (double U, double V) b, (double U, double V) c) =>
        Between(a.U, b.U, c.U) && Between(a.V, b.V, c.V);

    private static bool SegmentsMeet((double U, double V) a, (double U, double V) b, (double U, double V) c, (double U, double V) d)
    {
        int d1 = ExactTurn(c, d, a), d2 = ExactTurn(c, d, b), d3 = ExactTurn(a, b, c), d4 = ExactTurn(a, b, d);
        if (d1 * d2 < 0 && d3 * d4 < 0)
        {
            return true;
        }
        return (d1 == 0 && Within(c, d, a)) || (d2 == 0 && Within(c, d, b)) || (d3 == 0 && Within(a, b, c)) || (d4 == 0 && Within(a, b, d));
    }

    // Plane polygon (z = 0) simple by every pair of its edges.
    private static bool SimpleByPairs((double U, double V)[] p)
    {
        int n = p.Length;
        for (int i = 0; i < n; i++)
        {
            if (p[i] == p[(i + 1) % n])
            {
                return false;
            }
        }
        for (int i = 0; i < n; i++)
        {
            for (int j = i + 1; j < n; j++)
            {
                (double U, double V) a = p[i], b = p[(i + 1) % n], c = p[j], d = p[(j + 1) % n];
                if (j == i + 1 || (i == 0 && j == n - 1))
                {
                    // neighbours: the shared vertex and the two far ends
                    ((double U, double V) s, (double U, double V) x, (double U, double V) y) = j == i + 1 ? (b, a, d) : (a, b, c);
                    bool sameWay = ExactTurn(s, x, y) == 0 && ((x.U - s.U) * (y.U - s.U)) + ((x.V - s.V) * (y.V - s.V)) > 0;
                    if (sameWay)
                    {
                        return false;
                    }
                }
                else if (SegmentsMeet(a, b, c, d))
                {
                    return false;
                }
            }
        }
        return true;
    }

    private static Vector3[] InPlane((double U, double V)[] p) => [.. p.Select(q => V(q.U, q.V, 0))];

    private static bool SweepSimple((double U, double V)[] p) => PolygonGeometry.IsSimple(InPlane(p), V(0, 0, 1));

    [Fact]
    public void IsSimple_agrees_with_every_pair_on_random_polygons_of_a_small_grid()
    {
        // Vertices on a 5 × 5 grid: most polygons touch, cross, fold or repeat a vertex somewhere.
        Gen<(double U, double V)> vertex = Gen.Select(Gen.Int[0, 4], Gen.Int[0, 4], (u, v) => ((double)u, (double)v));
        int simple = 0;
        vertex.Array[3, 9].SampleSeeded(p =>
        {
            bool expected = SimpleByPairs(p);
            Assert.Equal(expected, SweepSimple(p));
            simple += expected ? 1 : 0;
        }, iter: 4000);
        Assert.InRange(simple, 100, 3900); // both answers were exercised
    }

    [Fact]
    public void IsSimple_agrees_with_every_pair_on_star_shaped_polygons_with_collinear_runs()
    {
        // Grid points sorted by angle about an interior point form a star-shaped polygon: simple unless two share
        // a direction from it (then edges fold or touch), with many collinear neighbours on the grid.
        Gen<(double U, double V)> vertex = Gen.Select(Gen.Int[-3, 3], Gen.Int[-3, 3], (u, v) => ((double)u, (double)v));
        int simple = 0;
        vertex.Array[3, 14].SampleSeeded(points =>
        {
            (double U, double V)[] p = [.. points.Distinct().OrderBy(q => Math.Atan2(q.V - 0.25, q.U - 0.125)).ThenBy(q => (q.U * q.U) + (q.V * q.V))];
            if (p.Length < 3)
            {
                return;
            }
            bool expected = SimpleByPairs(p);
            Assert.Equal(expected, SweepSimple(p));
            simple += expected ? 1 : 0;
        }, iter: 3000);
        Assert.InRange(simple, 100, 2900);
    }

    [Fact]
    public void IsSimple_decides_contacts_closer_than_rounding_exactly()
    {
        // Vertex (1, 1e-17) lies above the edge (0,0)–(2,0) by 1e-17 (exact binary values, no rounding in the
        // coordinates): a floating-point turn of this size is decided exactly, not by the rounded product.
        double eps = 1e-17;
        (double, double)[] above = [(0, 0), (2, 0), (2, 1), (1, eps), (0, 1)];
        Assert.True(SimpleByPairs(above));
        Assert.True(SweepSimple(above));
        (double, double)[] on = [(0, 0), (2, 0), (2, 1), (1, 0), (0, 1)]; // a vertex on the first edge
        Assert.False(SweepSimple(on));
        // Large offsets: (1e8 + 1, 1e8 + 1) is exactly on the line through (1e8, 1e8) and (1e8 + 2, 1e8 + 2).
        double b = 1e8;
        (double, double)[] collinear = [(b, b), (b + 2, b + 2), (b + 2, b + 4), (b + 1, b + 1), (b, b + 4)];
        Assert.False(SimpleByPairs(collinear));
        Assert.False(SweepSimple(collinear));
    }

    [Fact]
    public void IsSimple_handles_a_hundred_thousand_vertices_and_finds_one_crossing_among_them()
    {
        // A comb: 25 000 teeth of width 2 and height 10 on a base 5 high (every tooth a pair of vertical edges, so
        // the sweep holds ~50 000 edges at once). Simple by construction; then one tooth tip is moved sideways
        // across its neighbour's edge (tip vertices of tooth k at x = 4k and 4k + 2, neighbour's left edge at
        // x = 4k + 4), which makes exactly that tooth cross it.
        const int teeth = 25_000;
        var p = new List<(double U, double V)>();
        for (int k = 0; k < teeth; k++)
        {
            double x = 4.0 * k;
            p.AddRange([(x, 5), (x, 15), (x + 2, 15), (x + 2, 5)]);
        }
        p.AddRange([(4.0 * teeth, 0), (0, 0)]);
        p.Reverse(); // counter-clockwise, irrelevant to the test
        (double U, double V)[] comb = [.. p];
        Assert.Equal(100_002, comb.Length);
        Assert.True(SweepSimple(comb));
        int tip = Array.IndexOf(comb, (4.0 * 12_345 + 2, 15.0));
        comb[tip] = (4.0 * 12_345 + 5, 15.0); // now past x = 4·12 346, the next tooth's left edge
        Assert.False(SweepSimple(comb));
    }

    [Fact]
    public void IsSimple_regular_polygon_of_a_hundred_thousand_vertices_is_simple()
    {
        const int n = 100_000;
        var p = new (double U, double V)[n];
        for (int i = 0; i < n; i++)
        {
            double a = 2 * Math.PI * i / n;
            p[i] = (1000 * Math.Cos(a), 1000 * Math.Sin(a));
        }
        Assert.True(SweepSimple(p));
        p[n / 2] = (1000.5, 0.0); // pulled across the far side of the circle: its edges cross the edges near vertex 0
        Assert.False(SweepSimple(p));
    }
}
