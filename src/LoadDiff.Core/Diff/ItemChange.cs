namespace LoadDiff.Core.Diff;

/// <summary>
/// An item added, removed or changed in one load case, with its own contribution to the change of the case
/// resultant about the diff's reference point: ΔR_i = R_new,i − R_old,i and ΔM_i likewise (an added item
/// contributes its whole load, a removed one minus its load).
/// </summary>
/// <param name="Case">The load case.</param>
/// <param name="Id">The item's id, or its derived key (starting with <c>~</c>) when it has none.</param>
/// <param name="DerivedId">True when <paramref name="Id"/> is a key derived from kind and position.</param>
/// <param name="Kind">The item's kind (the new one when the kind changed).</param>
/// <param name="Change">Added, removed or changed.</param>
/// <param name="Fields">The fields that differ (every field for an added or removed item).</param>
/// <param name="DeltaForce">ΔR_i, force units, global axes.</param>
/// <param name="DeltaMoment">ΔM_i about the reference point, force × length.</param>
public sealed record ItemChange(
    string Case, string Id, bool DerivedId, string Kind, ChangeKind Change, IReadOnlyList<FieldChange> Fields,
    Vector3 DeltaForce, Vector3 DeltaMoment)
{
    /// <summary>For a mesh or forces item: the rows of each referenced CSV table that differ (empty when none do or the item has none).</summary>
    public IReadOnlyList<DataChange> Data { get; init; } = [];

    /// <inheritdoc/>
    public override string ToString() => $"{Change} {Case}/{Id} ({Kind}): ΔR {DeltaForce}, ΔM {DeltaMoment}";
}
