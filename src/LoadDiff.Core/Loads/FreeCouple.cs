namespace LoadDiff.Core.Loads;

/// <summary>A free couple: a moment vector (force × length) that acts the same about every point.</summary>
/// <param name="Id">Identifier within the case.</param>
/// <param name="Value">Moment vector, right-hand rule.</param>
public sealed record FreeCouple(string Id, Vector3 Value) : LoadItem(Id)
{
    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.Couple;

    /// <inheritdoc/>
    public override Contribution ContributionAbout(Vector3 point) =>
        new(Vector3.Zero, Value, 0, Vector3.Zero, Value.Length);

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit)
    {
    }

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) => true;

    internal override Vector3 ForceDirection => Vector3.Zero;

    /// <inheritdoc/>
    public override string ToString() => $"couple {Id}: {Value}";
}
