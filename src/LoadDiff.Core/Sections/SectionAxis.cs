namespace LoadDiff.Core.Sections;

/// <summary>
/// The axis of a series of section cuts: the cut at station s is the plane through <see cref="Origin"/> + s·<see cref="Direction"/>
/// with normal <see cref="Direction"/>; its negative side is where (x − origin)·direction &lt; s.
/// </summary>
public sealed record SectionAxis
{
    private SectionAxis(Vector3 origin, Vector3 direction, Vector3 lateral, Vector3 transverse)
    {
        Origin = origin;
        Direction = direction;
        Lateral = lateral;
        Transverse = transverse;
    }

    /// <summary>The point at station 0 (length units).</summary>
    public Vector3 Origin { get; }

    /// <summary>Unit direction of the axis, which is the normal of every cut.</summary>
    public Vector3 Direction { get; }

    /// <summary>
    /// First unit direction across the axis, e₂ = ẑ × e₁ normalised (x̂ when the axis is vertical): with
    /// <see cref="Transverse"/> it makes the right-handed frame (e₁, e₂, e₃) used for shear and bending components.
    /// </summary>
    public Vector3 Lateral { get; }

    /// <summary>Second unit direction across the axis, e₃ = e₁ × e₂ (ẑ for a horizontal axis).</summary>
    public Vector3 Transverse { get; }

    /// <summary>Creates an axis; the direction is normalised.</summary>
    /// <exception cref="ArgumentException">The direction is the zero vector.</exception>
    public static SectionAxis Create(Vector3 origin, Vector3 direction)
    {
        Guard.That(!direction.IsZero, "The axis direction must not be the zero vector.", nameof(direction));
        Vector3 e1 = direction.Normalize();
        Vector3 up = Vector3.Cross(Vector3.UnitZ, e1);
        // A vertical axis has no ẑ × e₁: take x̂ across it instead.
        Vector3 e2 = up.Length <= 1e-9 ? Vector3.UnitX : up.Normalize();
        Vector3 e3 = Vector3.Cross(e1, e2);
        return new SectionAxis(origin, e1, e2, e3);
    }

    /// <summary>The station of a point: its signed distance along the axis from the origin (length units).</summary>
    public double StationOf(Vector3 point) => Vector3.Dot(point - Origin, Direction);

    /// <summary>The cut point of station <paramref name="s"/>.</summary>
    public Vector3 PointAt(double s) => Origin + (Direction * s);

    /// <summary>A vector's components in the frame (e₁, e₂, e₃): along the axis, then across it.</summary>
    public Vector3 Local(Vector3 v) => Vector3.Create(Vector3.Dot(v, Direction), Vector3.Dot(v, Lateral), Vector3.Dot(v, Transverse));

    /// <inheritdoc/>
    public override string ToString() => $"axis through {Origin} along {Direction}";
}
