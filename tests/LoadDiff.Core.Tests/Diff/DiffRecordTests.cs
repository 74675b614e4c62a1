using LoadDiff.Core.Diff;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Diff;

/// <summary>The diff records' own arithmetic and verdict members, with exact small integers (hand values).</summary>
public class DiffRecordTests
{
    private static ForceCoupleSystem System(double fz, double my) =>
        new(Vector3.Create(0, 0, fz), Vector3.Create(0, my, 0), Vector3.Zero);

    [Fact]
    public void A_resultant_change_is_new_minus_old_with_a_missing_side_as_zero()
    {
        var both = new ResultantChange("wind", EntryKind.Case, System(-10, 4), System(-12, 7));
        Assert.Equal(Vector3.Create(0, 0, -2), both.DeltaForce);
        Assert.Equal(Vector3.Create(0, 3, 0), both.DeltaMoment);
        Assert.False(both.Unchanged);
        var added = new ResultantChange("gust", EntryKind.Case, null, System(-5, 1));
        Assert.Equal(Vector3.Create(0, 0, -5), added.DeltaForce);
        Assert.Equal(Vector3.Create(0, 1, 0), added.DeltaMoment);
        Assert.False(added.Unchanged);
        var removed = new ResultantChange("gust", EntryKind.Case, System(-5, 1), null);
        Assert.Equal(Vector3.Create(0, 0, 5), removed.DeltaForce);
        Assert.Equal(Vector3.Create(0, -1, 0), removed.DeltaMoment);
        Assert.False(removed.Unchanged);
        Assert.Equal("gust: (absent) → " + System(-5, 1), added.ToString());
        Assert.Equal("gust: " + System(-5, 1) + " → (absent)", removed.ToString());
    }

    [Fact]
    public void Unchanged_needs_both_sides_equal_in_force_and_moment_and_shown()
    {
        Assert.True(new ResultantChange("c", EntryKind.Case, System(-10, 4), System(-10, 4)).Unchanged);
        Assert.False(new ResultantChange("c", EntryKind.Case, System(-10, 4), System(-10, 5)).Unchanged);
        Assert.False(new ResultantChange("c", EntryKind.Case, System(-10, 4), System(-11, 4)).Unchanged);
        // a resultant that was not computed from the data it needs is never called unchanged
        Assert.False(new ResultantChange("c", EntryKind.Case, System(-10, 4), System(-10, 4)) { NotShown = "not shown: needs \"n.csv\"" }.Unchanged);
    }

    [Fact]
    public void A_data_change_counts_added_removed_and_changed_rows()
    {
        var data = new DataChange("point-load table", "a.csv", "b.csv", "id", 10, 11, 3, 2, 5, []);
        Assert.Equal(10, data.Differing);
        Assert.Equal("point-load table a.csv → b.csv: 5 changed, 3 added, 2 removed", data.ToString());
        Assert.Equal(0, new DataChange("t", "a", "a", "id", 4, 4, 0, 0, 0, []).Differing);
    }

    [Fact]
    public void Row_field_setting_and_item_changes_print_absent_sides()
    {
        Assert.Equal("Added n7: (absent) → at [1, 0, 0]", new RowChange("n7", ChangeKind.Added, 0, 8, null, "at [1, 0, 0]", null, null).ToString());
        Assert.Equal("Removed n7: at [1, 0, 0] → (absent)", new RowChange("n7", ChangeKind.Removed, 8, 0, "at [1, 0, 0]", null, null, null).ToString());
        Assert.Equal("value: (absent) → 3 kN", new FieldChange("value", null, "3", "kN").ToString());
        Assert.Equal("value: 3 → (absent)", new FieldChange("value", "3", null, "").ToString());
        Assert.Equal("title: (absent) → \"x\"", new SettingChange("title", ChangeKind.Added, null, "\"x\"", "").ToString());
        Assert.Equal("title: \"x\" → (absent) m", new SettingChange("title", ChangeKind.Removed, "\"x\"", null, "m").ToString());
        var item = new ItemChange("dead", "p1", false, "force", ChangeKind.Changed, [], Vector3.Create(0, 0, -2), Vector3.Zero);
        Assert.Empty(item.Data);
        Assert.StartsWith("Changed dead/p1 (force)", item.ToString(), StringComparison.Ordinal);
    }

    [Fact]
    public void A_document_diff_differs_when_a_setting_or_an_item_does_and_knows_when_units_were_converted()
    {
        var mm = new UnitSystem(UnitCatalog.Newton, UnitCatalog.Millimetre, UnitCatalog.Kilogram);
        DocumentDiff Diff(IReadOnlyList<SettingChange> s, IReadOnlyList<ItemChange> i, UnitSystem newUnits) =>
            new("a", "b", UnitSystem.Si, newUnits, Vector3.Zero, "origin", s, i, [], "", "", []);
        var setting = new SettingChange("title", ChangeKind.Changed, "x", "y", "");
        var item = new ItemChange("dead", "p1", false, "force", ChangeKind.Added, [], Vector3.Zero, Vector3.Zero);
        Assert.False(Diff([], [], UnitSystem.Si).HasDifferences);
        Assert.True(Diff([setting], [], UnitSystem.Si).HasDifferences);
        Assert.True(Diff([], [item], UnitSystem.Si).HasDifferences);
        Assert.False(Diff([], [], UnitSystem.Si).UnitsConverted);
        Assert.True(Diff([], [], mm).UnitsConverted);
        Assert.True(Diff([], [], mm).HasListings);
        Assert.Equal("a → b: 1 setting and 1 item differences", Diff([setting], [item], UnitSystem.Si).ToString());
    }
}
