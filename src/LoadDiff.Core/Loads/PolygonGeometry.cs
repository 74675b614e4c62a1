namespace LoadDiff.Core.Loads;

/// <summary>Geometry of a polygon in space: its area vector (Newell's method), planarity and size.</summary>
/// <param name="AreaVector">Area times the unit normal, right-hand rule of the vertex order.</param>
/// <param name="Size">Largest distance of a vertex from the first vertex (length units).</param>
/// <param name="OutOfPlane">Largest distance of a vertex from the mean plane (length units).</param>
public sealed record PolygonGeometry(Vector3 AreaVector, double Size, double OutOfPlane)
{
    /// <summary>The area (length²).</summary>
    public double Area => AreaVector.Length;

    /// <summary>Analyses the polygon given by its vertices in order.</summary>
    /// <exception cref="ArgumentException">Fewer than three vertices.</exception>
    public static PolygonGeometry Analyse(IReadOnlyList<Vector3> vertices)
    {
        Guard.NotNull(vertices);
        Guard.That(vertices.Count >= 3, "A polygon needs at least three vertices.", nameof(vertices));
        Vector3 o = vertices[0];
        Vector3 area = Vector3.Zero;
        Vector3 mean = Vector3.Zero;
        double size = 0;
        for (int i = 1; i + 1 < vertices.Count; i++)
        {
            area += Vector3.Cross(vertices[i] - o, vertices[i + 1] - o) * 0.5;
        }
        foreach (Vector3 v in vertices)
        {
            mean += (v - o) / vertices.Count;
            size = Math.Max(size, (v - o).Length);
        }
        double off = 0;
        if (!area.IsZero)
        {
            Vector3 n = area.Normalize();
            foreach (Vector3 v in vertices)
            {
                off = Math.Max(off, Math.Abs(Vector3.Dot(v - o - mean, n)));
            }
        }
        return new PolygonGeometry(area, size, off);
    }

    /// <summary>
    /// True when no two edges of the (planar) polygon cross or touch, other than neighbours at their shared
    /// vertex. The polygon is projected onto the coordinate plane most nearly its own; O(n²) in the vertices.
    /// </summary>
    public static bool IsSimple(IReadOnlyList<Vector3> vertices, Vector3 areaVector)
    {
        Guard.NotNull(vertices);
        int n = vertices.Count;
        int drop = Math.Abs(areaVector.X) >= Math.Abs(areaVector.Y) && Math.Abs(areaVector.X) >= Math.Abs(areaVector.Z) ? 0
            : Math.Abs(areaVector.Y) >= Math.Abs(areaVector.Z) ? 1 : 2;
        Vector3 o = vertices[0];
        var p = new (double U, double V)[n];
        for (int i = 0; i < n; i++)
        {
            Vector3 d = vertices[i] - o;
            p[i] = drop switch { 0 => (d.Y, d.Z), 1 => (d.Z, d.X), _ => (d.X, d.Y) };
        }
        for (int i = 0; i < n; i++)
        {
            for (int j = i + 1; j < n; j++)
            {
                bool neighbours = j == i + 1 || (i == 0 && j == n - 1);
                if (neighbours)
                {
                    // neighbours meet at one vertex; they must not fold back along each other
                    if (Overlap(p[i], p[(i + 1) % n], p[j], p[(j + 1) % n]))
                    {
                        return false;
                    }
                    continue;
                }
                if (Intersect(p[i], p[(i + 1) % n], p[j], p[(j + 1) % n]))
                {
                    return false;
                }
            }
        }
        return true;
    }

    private static double Orient((double U, double V) a, (double U, double V) b, (double U, double V) c) =>
        ((b.U - a.U) * (c.V - a.V)) - ((b.V - a.V) * (c.U - a.U));

    private static bool OnSegment((double U, double V) a, (double U, double V) b, (double U, double V) c) =>
        Math.Min(a.U, b.U) <= c.U && c.U <= Math.Max(a.U, b.U) && Math.Min(a.V, b.V) <= c.V && c.V <= Math.Max(a.V, b.V);

    private static bool Intersect((double U, double V) a, (double U, double V) b, (double U, double V) c, (double U, double V) d)
    {
        double d1 = Orient(c, d, a), d2 = Orient(c, d, b), d3 = Orient(a, b, c), d4 = Orient(a, b, d);
        if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0)))
        {
            return true;
        }
        return (d1 == 0 && OnSegment(c, d, a)) || (d2 == 0 && OnSegment(c, d, b))
            || (d3 == 0 && OnSegment(a, b, c)) || (d4 == 0 && OnSegment(a, b, d));
    }

    // Two edges sharing a vertex overlap when they are collinear and point the same way from it.
    private static bool Overlap((double U, double V) a, (double U, double V) b, (double U, double V) c, (double U, double V) d)
    {
        (double U, double V) shared, x, y;
        if (b == c)
        {
            (shared, x, y) = (b, a, d);
        }
        else
        {
            (shared, x, y) = (a, b, c); // the closing pair: edge n−1 → 0 meets edge 0 → 1 at vertex 0
        }
        if (Orient(shared, x, y) != 0)
        {
            return false;
        }
        return ((x.U - shared.U) * (y.U - shared.U)) + ((x.V - shared.V) * (y.V - shared.V)) > 0;
    }
}
