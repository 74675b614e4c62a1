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
    /// vertex (which must not fold back along each other). The polygon is projected onto the coordinate plane most
    /// nearly its own; a sweep over the vertices tests it in O(n log n).
    /// </summary>
    public static bool IsSimple(IReadOnlyList<Vector3> vertices, Vector3 areaVector)
    {
        Guard.NotNull(vertices);
        int n = vertices.Count;
        Guard.That(n >= 3, "A polygon needs at least three vertices.", nameof(vertices));
        int drop = Math.Abs(areaVector.X) >= Math.Abs(areaVector.Y) && Math.Abs(areaVector.X) >= Math.Abs(areaVector.Z) ? 0
            : Math.Abs(areaVector.Y) >= Math.Abs(areaVector.Z) ? 1 : 2;
        Vector3 o = vertices[0];
        var p = new PlanePoint[n];
        for (int i = 0; i < n; i++)
        {
            Vector3 d = vertices[i] - o;
            p[i] = drop switch { 0 => new(d.Y, d.Z), 1 => new(d.Z, d.X), _ => new(d.X, d.Y) };
        }
        return new PolygonSweep(p).IsSimple();
    }
}
