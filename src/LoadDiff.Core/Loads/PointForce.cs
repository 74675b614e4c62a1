namespace LoadDiff.Core.Loads;

/// <summary>A concentrated force <paramref name="Value"/> (force units) applied at <paramref name="At"/> (length units).</summary>
/// <param name="Id">Identifier within the case.</param>
/// <param name="At">Point of application.</param>
/// <param name="Value">Force vector.</param>
public sealed record PointForce(string Id, Vector3 At, Vector3 Value) : LoadItem(Id)
{
    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.Force;

    /// <inheritdoc/>
    public override Contribution ContributionAbout(Vector3 point)
    {
        Vector3 d = At - point;
        double g = Value.Length;
        return new Contribution(Value, Vector3.Cross(d, Value), g, d * g, 0);
    }

    /// <inheritdoc/>
    public override bool IsLoaded => !Value.IsZero;

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit) => Guard.NotNull(visit)(At);

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) => Parallel(Value, direction, relativeTolerance);

    internal override Vector3 ForceDirection => Value;

    /// <inheritdoc/>
    public override string ToString() => $"force {Id} at {At}: {Value}";
}
