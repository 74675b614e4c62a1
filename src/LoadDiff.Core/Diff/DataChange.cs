namespace LoadDiff.Core.Diff;

/// <summary>
/// What differs between the rows of one CSV table an item references, old version against new: counts of rows added,
/// removed and changed, and the first of them in detail.
/// </summary>
/// <param name="Table">What the table is, such as <c>point-load table</c> or <c>mesh vertex table</c>.</param>
/// <param name="OldFile">The old version's file as the document names it.</param>
/// <param name="NewFile">The new version's file as the document names it.</param>
/// <param name="MatchedBy">How rows were matched (<c>id</c>, <c>row order</c>).</param>
/// <param name="OldRows">Rows in the old table.</param>
/// <param name="NewRows">Rows in the new table.</param>
/// <param name="Added">Rows only in the new table.</param>
/// <param name="Removed">Rows only in the old table.</param>
/// <param name="Changed">Rows in both whose values differ.</param>
/// <param name="Shown">The first differing rows, in the order they were found (at most the differ's limit).</param>
public sealed record DataChange(string Table, string OldFile, string NewFile, string MatchedBy, long OldRows, long NewRows,
    long Added, long Removed, long Changed, IReadOnlyList<RowChange> Shown)
{
    /// <summary>Rows added, removed or changed.</summary>
    public long Differing => Added + Removed + Changed;

    /// <inheritdoc/>
    public override string ToString() => $"{Table} {OldFile} → {NewFile}: {Changed} changed, {Added} added, {Removed} removed";
}
