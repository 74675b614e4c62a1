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
}
