namespace LoadDiff.Core.Diff;

/// <summary>
/// One row of a referenced CSV table (a point load, a mesh triangle, a mesh vertex) added, removed or changed, with
/// its own contribution to the change of the case resultant where a row has one (a vertex does not: it belongs to
/// every triangle that uses it).
/// </summary>
/// <param name="Key">How the row was matched: its id, or <c>row N</c> / <c>triangle N</c> by position.</param>
/// <param name="Change">Added, removed or changed.</param>
/// <param name="OldLine">The row's line in the old file, or 0 when it is not there.</param>
/// <param name="NewLine">The row's line in the new file, or 0 when it is not there.</param>
/// <param name="Old">The old row's values as text (in the diff's units), or null.</param>
/// <param name="New">The new row's values as text (in the diff's units), or null.</param>
/// <param name="DeltaForce">ΔR of the row, or null for a vertex.</param>
/// <param name="DeltaMoment">ΔM of the row about the diff's reference point, or null for a vertex.</param>
public sealed record RowChange(string Key, ChangeKind Change, long OldLine, long NewLine, string? Old, string? New,
    Vector3? DeltaForce, Vector3? DeltaMoment)
{
    /// <inheritdoc/>
    public override string ToString() => $"{Change} {Key}: {Old ?? "(absent)"} → {New ?? "(absent)"}";
}
