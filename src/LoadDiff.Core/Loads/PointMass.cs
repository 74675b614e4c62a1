namespace LoadDiff.Core.Loads;

/// <summary>A mass at a point under gravity; its force is <paramref name="Mass"/> × <paramref name="Gravity"/>.</summary>
/// <param name="Id">Identifier within the case.</param>
/// <param name="At">Position of the mass (length units).</param>
/// <param name="Mass">Mass in mass units (may be negative only to model a removal).</param>
/// <param name="Gravity">Force per unit mass (force units per mass unit), global axes; the reader converts g into these units.</param>
public sealed record PointMass(string Id, Vector3 At, double Mass, Vector3 Gravity) : LoadItem(Id)
{
    /// <summary>The weight force m·g in force units.</summary>
    public Vector3 Weight => Gravity * Mass;

    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.Mass;

    /// <inheritdoc/>
    public override Contribution ContributionAbout(Vector3 point)
    {
        Vector3 f = Weight;
        Vector3 d = At - point;
        double g = f.Length;
        return new Contribution(f, Vector3.Cross(d, f), g, d * g, 0);
    }

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit) => Guard.NotNull(visit)(At);

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) => Parallel(Weight, direction, relativeTolerance);

    internal override Vector3 ForceDirection => Weight;

    /// <inheritdoc/>
    public override string ToString() => $"mass {Id} at {At}: {Mass.ToString("R", System.Globalization.CultureInfo.InvariantCulture)}";
}
