using System.Collections.Immutable;

namespace LoadDiff.Core.Loads;

/// <summary>
/// A pressure on a planar polygon. The field is p(x) = <paramref name="Pressure"/> + <paramref name="Gradient"/>·(x − <paramref name="Origin"/>)
/// (force per unit area); the force per unit true area is p·n̂ (the polygon's unit normal by the right-hand rule of
/// its vertex order) or p·d̂ for a given <paramref name="Direction"/>.
/// </summary>
/// <param name="Id">Identifier within the case.</param>
/// <param name="Polygon">Vertices in order (length units), at least three, planar, not degenerate.</param>
/// <param name="Pressure">Pressure at <paramref name="Origin"/> (force per area).</param>
/// <param name="Direction">Direction of the force, normalised on use; null for the polygon normal.</param>
/// <param name="Gradient">Pressure gradient (force per area per length).</param>
/// <param name="Origin">Point where the pressure equals <paramref name="Pressure"/>.</param>
public sealed record AreaLoad(
    string Id, ImmutableArray<Vector3> Polygon, double Pressure, Vector3? Direction, Vector3 Gradient, Vector3 Origin) : LoadItem(Id)
{
    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.Area;

    /// <summary>The pressure at a point.</summary>
    public double PressureAt(Vector3 x) => Pressure + Vector3.Dot(Gradient, x - Origin);

    /// <summary>The unit direction of the force per unit of positive pressure.</summary>
    public Vector3 ForceUnit => Direction is { } d ? d.Normalize() : PolygonGeometry.Analyse(Polygon).AreaVector.Normalize();

    /// <summary>Exact integrals over a fan triangulation with signed areas (valid for any simple polygon).</summary>
    public override Contribution ContributionAbout(Vector3 point)
    {
        Vector3 normal = PolygonGeometry.Analyse(Polygon).AreaVector.Normalize();
        Vector3 u = Direction is { } d ? d.Normalize() : normal;
        // Integrate about the polygon's own first vertex (areas and first moments then do not depend on how far
        // the reference point is), and move the first moments to the reference point once: ∫p(x − P) = ∫p(x − x0) + (x0 − P)∫p.
        Vector3 origin = Polygon[0];
        double p0 = PressureAt(origin);
        double total = 0, gross = 0;
        Vector3 first = Vector3.Zero, grossFirst = Vector3.Zero;
        for (int i = 1; i + 1 < Polygon.Length; i++)
        {
            Vector3 xi = Polygon[i] - origin, xj = Polygon[i + 1] - origin;
            double area = Vector3.Dot(Vector3.Cross(xi, xj), normal) * 0.5;
            double pi = PressureAt(Polygon[i]), pj = PressureAt(Polygon[i + 1]);
            (double t, Vector3 f) = TriangleIntegrals.Of(area, Vector3.Zero, xi, xj, p0, pi, pj);
            (double g, Vector3 gf) = TriangleIntegrals.OfAbsolute(area, Vector3.Zero, xi, xj, p0, pi, pj);
            total += t;
            first += f;
            gross += g;
            grossFirst += gf;
        }
        Vector3 shift = origin - point;
        first += shift * total;
        grossFirst += shift * gross;
        return new Contribution(u * total, Vector3.Cross(first, u), gross, grossFirst, 0);
    }

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit)
    {
        Guard.NotNull(visit);
        foreach (Vector3 v in Polygon)
        {
            visit(v);
        }
    }

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) => Parallel(ForceUnit, direction, relativeTolerance);

    internal override Vector3 ForceDirection => ForceUnit;

    /// <inheritdoc/>
    public bool Equals(AreaLoad? other) =>
        other is not null && Id == other.Id && Polygon.SequenceEqual(other.Polygon) && Pressure.Equals(other.Pressure)
        && Direction.Equals(other.Direction) && Gradient.Equals(other.Gradient) && Origin.Equals(other.Origin);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Id);
        foreach (Vector3 v in Polygon)
        {
            h.Add(v);
        }
        h.Add(Pressure);
        h.Add(Direction);
        h.Add(Gradient);
        h.Add(Origin);
        return h.ToHashCode();
    }

    /// <inheritdoc/>
    public override string ToString() =>
        $"area {Id}: {Polygon.Length} vertices, p = {Pressure.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}";
}
