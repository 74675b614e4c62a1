using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Csv;

namespace LoadDiff.Formats.Source;

/// <summary>
/// The diff of two versions of a CSV table given directly (a point-load table or a triangle mesh, as <c>check</c> reads
/// one): rows matched by id or position, each differing row with its own ΔR_i, ΔM_i, and the table's resultant before
/// and after. A CSV states no units, so both are compared as written.
/// </summary>
public static class TableDiffer
{
    /// <summary>Compares two tables already read (and so validated) into <paramref name="oldLoads"/> and <paramref name="newLoads"/>.</summary>
    /// <param name="oldName">The old version as the user (or git) named it.</param>
    /// <param name="oldPath">Where its bytes are.</param>
    /// <param name="oldLoads">Its rows reduced.</param>
    /// <param name="newName">The new version as named.</param>
    /// <param name="newPath">Where its bytes are.</param>
    /// <param name="newLoads">Its rows reduced.</param>
    /// <param name="units">The units both were read in.</param>
    /// <param name="point">The reference point for moments.</param>
    /// <param name="pointDescription">How the point was chosen.</param>
    /// <param name="options">Limits for reading the rows again; defaults when null.</param>
    public static DocumentDiff Compare(string oldName, string oldPath, ReductionAccumulator oldLoads, string newName, string newPath,
        ReductionAccumulator newLoads, UnitSystem units, Vector3 point, string pointDescription, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(oldLoads);
        ArgumentNullException.ThrowIfNull(newLoads);
        ArgumentNullException.ThrowIfNull(units);
        ReadOptions reading = CsvTableDiffer.Rereading(options);
        string caseName = System.IO.Path.GetFileNameWithoutExtension(oldName[(oldName.LastIndexOf(':') + 1)..]);
        string? la = CsvTableDiffer.LayoutOf(oldPath, oldName, reading), lb = CsvTableDiffer.LayoutOf(newPath, newName, reading);
        LoadReduction ra = oldLoads.ResultAt(point), rb = newLoads.ResultAt(point);
        var settings = new List<SettingChange>();
        var items = new List<ItemChange>();
        if (la != lb)
        {
            settings.Add(new SettingChange("layout", ChangeKind.Changed, la, lb, ""));
        }
        else
        {
            var conversion = new UnitConversion(units, units);
            DataChange data = CsvTableDiffer.Compare(la!, new CsvTableDiffer.Side(oldPath, oldName, oldName, conversion, null),
                new CsvTableDiffer.Side(newPath, newName, newName, conversion, null), point, units, converted: false, reading);
            if (data.Differing > 0)
            {
                string same = (ra.Force == rb.Force && ra.Moment == rb.Moment) ? "; rows differ, the resultant is unchanged" : "";
                items.Add(new ItemChange(caseName, "rows", false, la == CsvLayouts.PointLoads ? "forces" : "mesh", ChangeKind.Changed,
                    [new FieldChange("rows", Rows(data.OldRows), Rows(data.NewRows) + $": {N(data.Changed)} changed, {N(data.Added)} added, {N(data.Removed)} removed" + same, "")],
                    rb.Force - ra.Force, rb.Moment - ra.Moment)
                {
                    Data = [data],
                });
            }
        }
        var notes = new List<string>
        {
            "CSV tables state no units: both are compared as written, labelled with the units they were read in ("
                + units.Force.Symbol + ", " + units.Length.Symbol + ").",
            "rows are matched by id (point loads without an id column and triangles by their position in the file); each row's values are compared exactly.",
        };
        return new DocumentDiff(oldName, newName, units, units, point, pointDescription, settings, items,
            [new ResultantChange(caseName, EntryKind.Case, ra.System, rb.System)], "", "", notes)
        {
            HasListings = false,
        };
    }

    private static string N(long n) => n.ToString(CultureInfo.InvariantCulture);

    private static string Rows(long n) => N(n) + (n == 1 ? " row" : " rows");
}
