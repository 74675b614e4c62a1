namespace LoadDiff.Core.Loads;

/// <summary>
/// One triangle of a pressure map with the pressure given at each vertex and varying linearly between them.
/// The force per unit area is p·n̂ (right-hand rule of A, B, C) or p·d̂ for a given <paramref name="Direction"/>.
/// </summary>
/// <param name="Id">Identifier of the mesh this triangle belongs to.</param>
/// <param name="A">First vertex (length units).</param>
/// <param name="B">Second vertex.</param>
/// <param name="C">Third vertex.</param>
/// <param name="PressureA">Pressure at A (force per area).</param>
/// <param name="PressureB">Pressure at B.</param>
/// <param name="PressureC">Pressure at C.</param>
/// <param name="Direction">Direction of the force, normalised on use; null for the triangle normal.</param>
public sealed record MeshTriangle(
    string Id, Vector3 A, Vector3 B, Vector3 C, double PressureA, double PressureB, double PressureC, Vector3? Direction)
    : LoadItem(Id)
{
    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.MeshTriangle;

    /// <inheritdoc/>
    public override Contribution ContributionAbout(Vector3 point) =>
        Reduce(A, B, C, PressureA, PressureB, PressureC, Direction, point);

    /// <summary>The exact contribution of a triangle with vertex pressures about <paramref name="point"/>, without building an item.</summary>
    public static Contribution Reduce(Vector3 pa, Vector3 pb, Vector3 pc, double pressureA, double pressureB, double pressureC, Vector3? direction, Vector3 point)
    {
        // About the first vertex, then moved once to the point (see AreaLoad): the area does not depend on the point.
        Vector3 b = pb - pa, c = pc - pa;
        Vector3 areaVector = Vector3.Cross(b, c) * 0.5;
        double area = areaVector.Length;
        Vector3 u = direction is { } d ? d.Normalize() : areaVector / area;
        (double t, Vector3 f) = TriangleIntegrals.Of(area, Vector3.Zero, b, c, pressureA, pressureB, pressureC);
        (double g, Vector3 gf) = TriangleIntegrals.OfAbsolute(area, Vector3.Zero, b, c, pressureA, pressureB, pressureC);
        Vector3 shift = pa - point;
        f += shift * t;
        gf += shift * g;
        return new Contribution(u * t, Vector3.Cross(f, u), g, gf, 0);
    }

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit)
    {
        Guard.NotNull(visit);
        visit(A);
        visit(B);
        visit(C);
    }

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) => Parallel(ForceDirection, direction, relativeTolerance);

    internal override Vector3 ForceDirection => Direction ?? Vector3.Cross(B - A, C - A);

    /// <inheritdoc/>
    public override string ToString() => $"mesh triangle {Id} {A} {B} {C}";
}
