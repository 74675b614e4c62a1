using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// Diffs two versions of one CSV table row by row: point loads and mesh vertices matched by id (point loads without an
/// id column, and triangles, by their position in the file), each value compared in the old version's units.
/// Both files stream at once through a symmetric hash join: a row waits in memory only until its partner in the other
/// file arrives, so two versions in the same order cost almost nothing, and reordered or unmatched rows cost one
/// pending entry each (about 250 bytes for a point load: its id, line and nine values, measured on 10⁶ reversed rows).
/// </summary>
internal static class CsvTableDiffer
{
    /// <summary>
    /// Options for reading tables again to compare their rows: the caller's line limit, no size limit (the first read,
    /// which reduced the same files, enforced it).
    /// </summary>
    internal static ReadOptions Rereading(ReadOptions? options) =>
        new() { MaxLineLength = options?.MaxLineLength ?? new ReadOptions().MaxLineLength, MaxCsvBytes = long.MaxValue };

    /// <summary>Differing rows kept in detail per table; the counts cover all of them.</summary>
    public const int ShownRows = 20;

    /// <summary>One version of the table.</summary>
    /// <param name="FullPath">Where to read it.</param>
    /// <param name="Display">How diagnostics name it.</param>
    /// <param name="Name">The file as its document names it (or as the user named the operand).</param>
    /// <param name="Units">From the file's units into the diff's (the old version's) units.</param>
    /// <param name="Direction">The mesh item's force direction (null: the triangle's normal).</param>
    public sealed record Side(string FullPath, string Display, string Name, UnitConversion Units, Vector3? Direction);

    /// <summary>Compares the two versions of a table of layout <paramref name="layout"/> (a <see cref="CsvLayouts"/> name).</summary>
    /// <param name="layout">The table's layout.</param>
    /// <param name="old">The old version.</param>
    /// <param name="new">The new version.</param>
    /// <param name="point">The reference point for each row's ΔM, in <paramref name="units"/>.</param>
    /// <param name="units">The diff's units (the old version's).</param>
    /// <param name="converted">True when the two versions are written in different units: values within
    /// <see cref="DocumentDiffer.ConvertedUlps"/> ulp after exact conversion count as equal.</param>
    /// <param name="options">Limits for reading the files.</param>
    public static DataChange Compare(string layout, Side old, Side @new, Vector3 point, UnitSystem units, bool converted, ReadOptions options)
    {
        try
        {
            return Join(layout, old, @new, point, units, converted, options);
        }
        catch (InputError e)
        {
            throw new UnreadableInputException(e.Diagnostic);
        }
    }

    private static DataChange Join(string layout, Side old, Side @new, Vector3 point, UnitSystem units, bool converted, ReadOptions options)
    {
        using var a = new Cursor(layout, old, options);
        using var b = new Cursor(layout, @new, options);
        if (layout != a.Layout || layout != b.Layout)
        {
            throw new InvalidOperationException("the table's layout changed between reading and diffing");
        }
        var text = new RowText(layout, units, converted, a.HasMoments || b.HasMoments);
        var waitingOld = new Dictionary<string, Row>(StringComparer.Ordinal);
        var waitingNew = new Dictionary<string, Row>(StringComparer.Ordinal);
        var shown = new List<RowChange>();
        long changed = 0;

        void Arrived(Row row, bool fromOld)
        {
            Dictionary<string, Row> other = fromOld ? waitingNew : waitingOld, own = fromOld ? waitingOld : waitingNew;
            if (other.Remove(row.Key, out Row? partner))
            {
                if (partner.Next is not null)
                {
                    other[row.Key] = partner.Next; // a repeated id: its occurrences pair up in file order
                }
                Row x = fromOld ? row : partner, y = fromOld ? partner : row;
                if (!SameValues(x, y, converted))
                {
                    changed++;
                    if (shown.Count < ShownRows)
                    {
                        shown.Add(Change(x.Key, ChangeKind.Changed, x, y, old, @new, point, text));
                    }
                }
            }
            else if (own.TryGetValue(row.Key, out Row? first))
            {
                while (first.Next is not null)
                {
                    first = first.Next;
                }
                first.Next = row;
            }
            else
            {
                own[row.Key] = row;
            }
        }

        bool moreOld = true, moreNew = true;
        while (moreOld || moreNew)
        {
            if (moreOld && (moreOld = a.Next(out Row? x)))
            {
                Arrived(x!, fromOld: true);
            }
            if (moreNew && (moreNew = b.Next(out Row? y)))
            {
                Arrived(y!, fromOld: false);
            }
        }

        List<Row> removed = Unmatched(waitingOld), added = Unmatched(waitingNew);
        foreach (Row r in removed.Take(Math.Max(0, ShownRows - shown.Count)).ToList())
        {
            shown.Add(Change(r.Key, ChangeKind.Removed, r, null, old, @new, point, text));
        }
        foreach (Row r in added.Take(Math.Max(0, ShownRows - shown.Count)).ToList())
        {
            shown.Add(Change(r.Key, ChangeKind.Added, null, r, old, @new, point, text));
        }
        return new DataChange(Describe(layout), old.Name, @new.Name, a.MatchedBy == b.MatchedBy ? a.MatchedBy : a.MatchedBy + " / " + b.MatchedBy,
            a.Rows, b.Rows, added.Count, removed.Count, changed, shown);
    }

    /// <summary>The layout of a table read directly, from its header (null when it is neither a point-load table nor a triangle mesh).</summary>
    public static string? LayoutOf(string fullPath, string display, ReadOptions options)
    {
        try
        {
            using CsvRowReader csv = CsvLoadReader.Open(fullPath, display, options);
            csv.ReadHeader();
            return CsvLoadReader.DetectLayout(csv.Header);
        }
        catch (InputError e)
        {
            throw new UnreadableInputException(e.Diagnostic);
        }
    }

    private static string Describe(string layout) => layout switch
    {
        CsvLayouts.TriangleRows => "triangle table",
        _ => layout,
    };

    private static List<Row> Unmatched(Dictionary<string, Row> waiting)
    {
        var list = new List<Row>();
        foreach (Row first in waiting.Values)
        {
            for (Row? r = first; r is not null; r = r.Next)
            {
                list.Add(r);
            }
        }
        list.Sort((p, q) => p.Line.CompareTo(q.Line));
        return list;
    }

    private static bool SameValues(Row x, Row y, bool converted)
    {
        for (int k = 0; k < x.Values.Length; k++)
        {
            double u = x.Values[k], v = y.Values[k];
            if (!DocumentDiffer.SameValue(u, v, converted))
            {
                return false;
            }
        }
        for (int k = 0; k < x.Texts.Length; k++)
        {
            if (!string.Equals(x.Texts[k], y.Texts[k], StringComparison.Ordinal))
            {
                return false;
            }
        }
        return true;
    }

    private static RowChange Change(string key, ChangeKind kind, Row? x, Row? y, Side old, Side @new, Vector3 point, RowText text)
    {
        Vector3? df = null, dm = null;
        if (text.Layout is CsvLayouts.PointLoads or CsvLayouts.TriangleRows)
        {
            (Vector3 fa, Vector3 ma) = x is null ? (Vector3.Zero, Vector3.Zero) : Load(text.Layout, x, old.Direction, point);
            (Vector3 fb, Vector3 mb) = y is null ? (Vector3.Zero, Vector3.Zero) : Load(text.Layout, y, @new.Direction, point);
            df = fb - fa;
            dm = mb - ma;
        }
        return new RowChange(key, kind, x?.Line ?? 0, y?.Line ?? 0, x is null ? null : text.Of(x), y is null ? null : text.Of(y), df, dm);
    }

    // The row's exact contribution about the point, by the same Core items the reader builds
    private static (Vector3 Force, Vector3 Moment) Load(string layout, Row r, Vector3? direction, Vector3 point)
    {
        double[] v = r.Values;
        if (layout == CsvLayouts.PointLoads)
        {
            Contribution f = new PointForce(r.Key, Vector3.Create(v[0], v[1], v[2]), Vector3.Create(v[3], v[4], v[5])).ContributionAbout(point);
            return (f.Force, f.Moment + Vector3.Create(v[6], v[7], v[8]));
        }
        Contribution t = MeshTriangle.Reduce(Vector3.Create(v[0], v[1], v[2]), Vector3.Create(v[3], v[4], v[5]), Vector3.Create(v[6], v[7], v[8]),
            v[9], v[10], v[11], direction, point);
        return (t.Force, t.Moment);
    }

    private sealed class Row(string key, long line, double[] values, string[] texts)
    {
        public string Key { get; } = key;

        public long Line { get; } = line;

        public double[] Values { get; } = values;

        public string[] Texts { get; } = texts;

        /// <summary>The next waiting row with the same key (an id repeated in one file).</summary>
        public Row? Next { get; set; }
    }

    // Reads one version's rows, each value converted into the diff's units.
    private sealed class Cursor : IDisposable
    {
        private static readonly string[] NoTexts = [];
        private static readonly string[] PointColumns = ["x", "y", "z", "fx", "fy", "fz"];
        private static readonly string[] TriangleColumns = ["x1", "y1", "z1", "x2", "y2", "z2", "x3", "y3", "z3", "p1", "p2", "p3"];
        private static readonly string[] VertexColumns = ["x", "y", "z", "p"];
        private static readonly string[] CornerColumns = ["a", "b", "c"];
        private readonly CsvRowReader _csv;
        private readonly int[] _numbers;
        private readonly double[] _factors;
        private readonly int[] _texts;
        private readonly int _id;

        public Cursor(string layout, Side side, ReadOptions options)
        {
            _csv = CsvLoadReader.Open(side.FullPath, side.Display, options);
            _csv.ReadHeader();
            UnitConversion u = side.Units;
            Layout = layout == CsvLayouts.PointLoads || layout == CsvLayouts.TriangleRows ? CsvLoadReader.DetectLayout(_csv.Header) ?? "" : layout;
            MatchedBy = "row order";
            _id = -1;
            _texts = [];
            switch (layout)
            {
                case CsvLayouts.PointLoads:
                    _id = _csv.Column("id");
                    MatchedBy = _id >= 0 ? "id" : "row order (no id column)";
                    int mx = _csv.Column("mx"), my = _csv.Column("my"), mz = _csv.Column("mz");
                    HasMoments = mx >= 0;
                    _numbers = [.. PointColumns.Select(n => _csv.RequiredColumn(n, layout)), mx, my, mz];
                    _factors = [u.Length, u.Length, u.Length, u.Force, u.Force, u.Force, u.Moment, u.Moment, u.Moment];
                    break;
                case CsvLayouts.TriangleRows:
                    _numbers = [.. TriangleColumns.Select(n => _csv.RequiredColumn(n, layout))];
                    _factors = [.. Enumerable.Repeat(u.Length, 9), u.Pressure, u.Pressure, u.Pressure];
                    break;
                case CsvLayouts.Vertices:
                    _id = _csv.RequiredColumn("id", layout);
                    MatchedBy = "vertex id";
                    _numbers = [.. VertexColumns.Select(n => _csv.RequiredColumn(n, layout))];
                    _factors = [u.Length, u.Length, u.Length, u.Pressure];
                    break;
                case CsvLayouts.Triangles:
                    _numbers = [];
                    _factors = [];
                    _texts = [.. CornerColumns.Select(n => _csv.RequiredColumn(n, layout))];
                    break;
                default:
                    throw new ArgumentException("no such table layout: " + layout, nameof(layout));
            }
        }

        public string Layout { get; }

        public string MatchedBy { get; }

        public bool HasMoments { get; }

        public long Rows { get; private set; }

        public bool Next(out Row? row)
        {
            if (!_csv.ReadRow())
            {
                row = null;
                return false;
            }
            Rows++;
            var values = new double[_numbers.Length];
            for (int k = 0; k < values.Length; k++)
            {
                values[k] = _numbers[k] < 0 ? 0 : _csv.Number(_numbers[k]) * _factors[k];
            }
            string[] texts = _texts.Length == 0 ? NoTexts : [.. _texts.Select(_csv.Text)];
            string key = _id >= 0 ? _csv.Text(_id)
                : (Layout == CsvLayouts.PointLoads ? "row " : "triangle ") + Rows.ToString(CultureInfo.InvariantCulture);
            row = new Row(key, _csv.Line, values, texts);
            return true;
        }

        public void Dispose() => _csv.Dispose();
    }

    // A row's values as text, in the diff's units (rounded to the listing's digits when the versions were converted)
    private sealed class RowText(string layout, UnitSystem units, bool converted, bool moments)
    {
        public string Layout { get; } = layout;

        private string N(double v) => SourceText.Number(converted ? SourceText.RoundToSignificant(v, DocumentDiffer.ConvertedListingDigits) : v);

        private string V(double[] v, int k) => "[" + N(v[k]) + ", " + N(v[k + 1]) + ", " + N(v[k + 2]) + "]";

        public string Of(Row r)
        {
            string l = units.Length.Symbol, f = units.Force.Symbol, p = Quantities.Symbol(Quantity.Pressure, units);
            double[] v = r.Values;
            return Layout switch
            {
                CsvLayouts.PointLoads => $"at {V(v, 0)} {l}, F {V(v, 3)} {f}" + (moments ? $", C {V(v, 6)} {units.MomentSymbol}" : ""),
                CsvLayouts.TriangleRows => $"{V(v, 0)}, {V(v, 3)}, {V(v, 6)} {l}, p [{N(v[9])}, {N(v[10])}, {N(v[11])}] {p}",
                CsvLayouts.Vertices => $"at {V(v, 0)} {l}, p {N(v[3])} {p}",
                _ => "vertices " + string.Join(", ", r.Texts),
            };
        }
    }
}
