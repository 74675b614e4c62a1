using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Csv;

namespace LoadDiff.Formats.Source;

/// <summary>
/// The semantic diff of two versions of a load description: cases matched by name, items by id (or derived key),
/// fields compared value by value in the old version's units, and each change's own contribution ΔR_i, ΔM_i to its
/// case resultant about the reference point. Order, whitespace, comments and number spelling are not differences.
/// </summary>
public static class DocumentDiffer
{
    /// <summary>Relative agreement, in units of the double epsilon, under which converted values count as equal.</summary>
    public const double ConvertedUlps = 4;

    /// <summary>Significant digits of the numbers in both listings when the units differ (the same-unit listings are exact).</summary>
    public const int ConvertedListingDigits = 12;

    private static readonly string[] OneTable = ["file"], TwoTables = ["vertices", "triangles"];

    private const double MachineEpsilon = 2.220446049250313e-16; // 2^-52, the spacing of doubles at 1

    /// <summary>Compares two successfully read versions.</summary>
    /// <param name="oldName">The old version as the user named it.</param>
    /// <param name="old">The old version.</param>
    /// <param name="newName">The new version as the user named it.</param>
    /// <param name="new">The new version, read with <see cref="ReadOptions.TargetUnits"/> set to the old version's units.</param>
    /// <param name="point">The reference point for moments, in the old version's units.</param>
    /// <param name="pointDescription">How the point was chosen.</param>
    /// <param name="selected">Only these cases and combinations (all when empty).</param>
    /// <param name="options">Limits for reading the CSV tables that mesh and forces items reference (their rows are diffed); defaults when null.</param>
    /// <param name="referencedDataRead">False when both versions were read without the CSV tables they reference (git's external
    /// diff hands over the documents only): the resultants of the cases that need them are then not shown.</param>
    public static DocumentDiff Compare(string oldName, SourceReadResult old, string newName, SourceReadResult @new, Vector3 point,
        string pointDescription, IReadOnlyCollection<string> selected, ReadOptions? options = null, bool referencedDataRead = true)
    {
        ArgumentNullException.ThrowIfNull(old);
        ArgumentNullException.ThrowIfNull(@new);
        ArgumentNullException.ThrowIfNull(selected);
        LoadDocument a = old.Document ?? throw new ArgumentException("the old version was not read", nameof(old));
        LoadDocument bAsWritten = @new.Document ?? throw new ArgumentException("the new version was not read", nameof(@new));
        LoadDocument b = bAsWritten.ConvertTo(a.Units);
        bool converted = bAsWritten.Units != a.Units;
        var ctx = new Context(a, b, converted)
        {
            NewUnitsAsWritten = bAsWritten.Units,
            TableOptions = CsvTableDiffer.Rereading(options),
        };
        bool Wanted(string name) => selected.Count == 0 || selected.Contains(name);
        Dictionary<string, List<string>> needs = referencedDataRead ? [] : TablesNeeded(a, b);
        string? NotShown(IEnumerable<string> cases)
        {
            List<string> files = [.. cases.Where(needs.ContainsKey).SelectMany(c => needs[c]).Distinct()];
            return files.Count == 0 ? null : "not shown: needs " + string.Join(", ", files.Select(SourceText.Quoted));
        }

        var settings = new List<SettingChange>();
        if (a.Title != b.Title)
        {
            settings.Add(new SettingChange("title", Kind(a.Title, b.Title), Q(a.Title), Q(b.Title), ""));
        }
        if (a.Note != b.Note)
        {
            settings.Add(new SettingChange("note", Kind(a.Note, b.Note), Q(a.Note), Q(b.Note), ""));
        }
        if (converted)
        {
            settings.Add(new SettingChange("units", ChangeKind.Changed, a.Units.ToString(), bAsWritten.Units.ToString(), ""));
        }
        if (!ctx.Same(a.Gravity, b.Gravity))
        {
            settings.Add(new SettingChange("gravity", ChangeKind.Changed, a.Gravity is { } ga ? SourceText.Vector(ga) : "default (standard gravity along −z)",
                b.Gravity is { } gb ? SourceText.Vector(gb) : "default (standard gravity along −z)", Quantities.Symbol(Quantity.Acceleration, a.Units)));
        }
        foreach (var p in a.Points)
        {
            Vector3? q = b.Point(p.Key);
            if (q is null)
            {
                settings.Add(new SettingChange("point " + p.Key, ChangeKind.Removed, SourceText.Vector(p.Value), null, a.Units.Length.Symbol));
            }
            else if (!ctx.Same(p.Value, q.Value))
            {
                settings.Add(new SettingChange("point " + p.Key, ChangeKind.Changed, SourceText.Vector(p.Value), SourceText.Vector(q.Value), a.Units.Length.Symbol));
            }
        }
        foreach (var p in b.Points.Where(p => a.Point(p.Key) is null))
        {
            settings.Add(new SettingChange("point " + p.Key, ChangeKind.Added, null, SourceText.Vector(p.Value), a.Units.Length.Symbol));
        }

        var items = new List<ItemChange>();
        var resultants = new List<ResultantChange>();
        // Looked up by name, not searched: files with 10⁵ cases are compared in linear time.
        Dictionary<string, SourceCase> casesA = ByName(a.Cases, c => c.Name), casesB = ByName(b.Cases, c => c.Name);
        IReadOnlyList<string> caseNames = [.. a.Cases.Select(c => c.Name), .. b.Cases.Select(c => c.Name).Where(n => !casesA.ContainsKey(n))];
        foreach (string name in caseNames.Where(Wanted))
        {
            SourceCase? ca = casesA.GetValueOrDefault(name);
            SourceCase? cb = casesB.GetValueOrDefault(name);
            if (ca is null || cb is null)
            {
                SourceCase only = (ca ?? cb)!;
                settings.Add(new SettingChange("case " + name, ca is null ? ChangeKind.Added : ChangeKind.Removed,
                    ca is null ? null : Count(only), cb is null ? null : Count(only), ""));
            }
            else
            {
                if (ca.Title != cb.Title)
                {
                    settings.Add(new SettingChange($"case {name} title", Kind(ca.Title, cb.Title), Q(ca.Title), Q(cb.Title), ""));
                }
                if (ca.Note != cb.Note)
                {
                    settings.Add(new SettingChange($"case {name} note", Kind(ca.Note, cb.Note), Q(ca.Note), Q(cb.Note), ""));
                }
            }
            items.AddRange(CompareCase(name, ca, cb, old.Resultants!, @new.Resultants!, point, ctx));
            resultants.Add(new ResultantChange(name, EntryKind.Case,
                ca is null ? null : old.Resultants!.Cases.Cases[name].ResultAt(point).System,
                cb is null ? null : @new.Resultants!.Cases.Cases[name].ResultAt(point).System)
            {
                NotShown = NotShown([name]),
            });
        }

        Dictionary<string, LoadCombination> combosA = ByName(a.Combinations, c => c.Name), combosB = ByName(b.Combinations, c => c.Name);
        IReadOnlyList<string> comboNames = [.. a.Combinations.Select(c => c.Name), .. b.Combinations.Select(c => c.Name).Where(n => !combosA.ContainsKey(n))];
        foreach (string name in comboNames.Where(Wanted))
        {
            LoadCombination? ka = combosA.GetValueOrDefault(name);
            LoadCombination? kb = combosB.GetValueOrDefault(name);
            if (ka is null || kb is null || !SameFactors(ka, kb))
            {
                settings.Add(new SettingChange("combination " + name, Kind(ka, kb), ka is null ? null : Factors(ka), kb is null ? null : Factors(kb), ""));
            }
            resultants.Add(new ResultantChange(name, EntryKind.Combination,
                ka is null ? null : ka.Combine(old.Resultants!.Cases.Cases, out _).ResultAt(point).System,
                kb is null ? null : kb.Combine(@new.Resultants!.Cases.Cases, out _).ResultAt(point).System)
            {
                NotShown = NotShown([.. ka?.Factors.Select(f => f.Key) ?? [], .. kb?.Factors.Select(f => f.Key) ?? []]),
            });
        }

        var notes = new List<string>();
        if (converted)
        {
            notes.Add($"{newName} is written in {bAsWritten.Units}; it was converted into {oldName}'s units {a.Units} with the exact NIST SP 811 factors before comparing, "
                + $"and values that agree within {ConvertedUlps.ToString(CultureInfo.InvariantCulture)} ulp after conversion count as equal. "
                + $"Both listings below are in {oldName}'s units, such equal values printed as {oldName} has them, every number rounded to {ConvertedListingDigits} significant digits.");
        }
        if (a.Cases.Concat(b.Cases).Any(c => c.Items.Any(i => i.Id is null)))
        {
            notes.Add("items without an id are matched by a key derived from their kind and position (shown starting with ~); such an item that moves shows as removed and added. Give items ids to track them.");
        }
        if (a.Cases.Concat(b.Cases).Any(c => c.Items.Any(i => i.Kind is "mesh" or "forces")))
        {
            notes.Add("mesh and forces items are compared by their file references and by the rows of the CSV tables they reference: point loads and "
                + "mesh vertices matched by id, triangles (and point loads in a table without an id column) by their position in the file"
                + (converted ? ", every value after exact conversion into the old version's units." : "."));
        }
        if (needs.Count > 0)
        {
            notes.Add("the CSV tables the documents reference were not read (git's external diff hands over the documents only): their rows are "
                + "not compared here (with '*.csv diff=loaddiff' in .gitattributes each table shows in its own diff), and the resultants of the cases "
                + "that need them are not shown; 'loaddiff diff REV1:PATH REV2:PATH' reads both versions whole.");
        }
        if (!converted)
        {
            return new DocumentDiff(oldName, newName, a.Units, bAsWritten.Units, point, pointDescription, settings, items, resultants,
                CanonicalWriter.Write(a), CanonicalWriter.Write(b), notes);
        }
        LoadDocument listed = Aligned(a, b, old.Resultants!, @new.Resultants!, ctx);
        return new DocumentDiff(oldName, newName, a.Units, bAsWritten.Units, point, pointDescription, settings, items, resultants,
            CanonicalWriter.Write(a.RoundedTo(ConvertedListingDigits)), CanonicalWriter.Write(listed.RoundedTo(ConvertedListingDigits)), notes)
        {
            ListingSignificantDigits = ConvertedListingDigits,
        };
    }

    // case name → the files its mesh and forces items reference, in either version
    // Names are unique within a document (its keys); the first one wins should a caller build a document otherwise.
    private static Dictionary<string, T> ByName<T>(IEnumerable<T> entries, Func<T, string> name)
    {
        var d = new Dictionary<string, T>(StringComparer.Ordinal);
        foreach (T e in entries)
        {
            d.TryAdd(name(e), e);
        }
        return d;
    }

    private static Dictionary<string, List<string>> TablesNeeded(LoadDocument a, LoadDocument b)
    {
        var needs = new Dictionary<string, List<string>>(StringComparer.Ordinal);
        foreach (SourceCase c in a.Cases.Concat(b.Cases))
        {
            foreach (SourceItem item in c.Items.Where(i => i.Kind is "mesh" or "forces"))
            {
                foreach (SourceField f in item.Fields.Where(f => f.Name is "file" or "vertices" or "triangles" && f.Value is TextValue))
                {
                    List<string> list = needs.TryGetValue(c.Name, out var l) ? l : needs[c.Name] = [];
                    string rel = ((TextValue)f.Value).Text;
                    if (!list.Contains(rel))
                    {
                        list.Add(rel);
                    }
                }
            }
        }
        return needs;
    }

    // Equal, or (after a conversion of units) within ConvertedUlps of each other
    internal static bool SameValue(double x, double y, bool converted) =>
        x == y || (converted && Math.Abs(x - y) <= ConvertedUlps * MachineEpsilon * Math.Max(Math.Abs(x), Math.Abs(y)));

    // The converted new version for its listing: every value the comparison counts as equal (within ConvertedUlps) is
    // written as the old version has it, so a value the item diff calls unchanged can never round to other digits.
    private static LoadDocument Aligned(LoadDocument a, LoadDocument b, DocumentResultants ra, DocumentResultants rb, Context ctx)
    {
        SourceItem Item(SourceItem y, SourceItem? x) => x is null || x.Kind != y.Kind ? y : y with
        {
            Fields = [.. y.Fields.Select(f => x[f.Name] is { } u && ctx.Same(u, f.Value) ? f with { Value = u } : f)],
        };
        Dictionary<string, SourceCase> casesA = ByName(a.Cases, c => c.Name);
        SourceCase Case(SourceCase cb)
        {
            SourceCase? ca = casesA.GetValueOrDefault(cb.Name);
            if (ca is null)
            {
                return cb;
            }
            IReadOnlyList<ItemResultant> ia = ra.Items(cb.Name), ib = rb.Items(cb.Name);
            var oldByKey = new Dictionary<string, SourceItem>(StringComparer.Ordinal);
            for (int k = 0; k < ca.Items.Length; k++)
            {
                oldByKey[ia[k].Key] = ca.Items[k];
            }
            return cb with { Items = [.. cb.Items.Select((y, j) => Item(y, oldByKey.GetValueOrDefault(ib[j].Key)))] };
        }
        return b with
        {
            Gravity = ctx.Same(a.Gravity, b.Gravity) ? a.Gravity : b.Gravity,
            Points = [.. b.Points.Select(p => a.Point(p.Key) is { } q && ctx.Same(q, p.Value) ? new KeyValuePair<string, Vector3>(p.Key, q) : p)],
            Cases = [.. b.Cases.Select(Case)],
        };
    }

    private static List<ItemChange> CompareCase(string name, SourceCase? ca, SourceCase? cb, DocumentResultants ra, DocumentResultants rb, Vector3 point, Context ctx)
    {
        var list = new List<ItemChange>();
        IReadOnlyList<ItemResultant> ia = ra.Items(name), ib = rb.Items(name);
        var newByKey = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int j = 0; cb is not null && j < cb.Items.Length; j++)
        {
            newByKey[ib[j].Key] = j;
        }
        var matched = new HashSet<int>();
        for (int i = 0; ca is not null && i < ca.Items.Length; i++)
        {
            SourceItem x = ca.Items[i];
            var (fa, ma) = ia[i].ContributionAbout(point);
            if (!newByKey.TryGetValue(ia[i].Key, out int j))
            {
                list.Add(new ItemChange(name, ia[i].Key, x.Id is null, x.Kind, ChangeKind.Removed, AllFields(x, ctx.Old, ctx, removed: true), -fa, -ma));
                continue;
            }
            matched.Add(j);
            SourceItem y = cb!.Items[j];
            var (fb, mb) = ib[j].ContributionAbout(point);
            var fields = new List<FieldChange>();
            if (x.Kind != y.Kind)
            {
                fields.Add(new FieldChange("kind", x.Kind, y.Kind, ""));
            }
            foreach (string field in Quantities.FieldOrder(x.Kind).Concat(Quantities.FieldOrder(y.Kind)).Distinct())
            {
                SourceValue? u = x[field], v = y[field];
                if (!ctx.Same(u, v))
                {
                    Quantity q = Quantities.Of(y[field] is null ? x.Kind : y.Kind, field);
                    fields.Add(new FieldChange(field, u is null ? null : Context.Text(u, ctx.Old), v is null ? null : Context.Text(v, ctx.New), Quantities.Symbol(q, ctx.Old.Units)));
                }
            }
            IReadOnlyList<DataChange> data = x.Kind == y.Kind ? CompareData(x, y, ia[i], ib[j], point, ctx) : [];
            if (data.Any(d => d.Differing > 0))
            {
                string same = ctx.Close(fa, fb) && ctx.Close(ma, mb) ? "; rows differ, the item's resultant is unchanged" : "";
                fields.Add(new FieldChange("referenced data", RowsText(data, old: true), RowsText(data, old: false) + same, ""));
            }
            else if (fields.Count == 0 && !(ctx.Close(fa, fb) && ctx.Close(ma, mb)))
            {
                // same fields, different load: gravity changed under a mass, or the referenced CSV data changed
                string why = x.Kind is "mesh" or "forces" ? "referenced data" : x.Kind == "mass" ? "weight (gravity changed)" : "load";
                fields.Add(new FieldChange(why, "R = " + SourceText.Vector(fa), "R = " + SourceText.Vector(fb), ctx.Old.Units.Force.Symbol));
            }
            else if (fields.Count == 0 && x.Kind is "mesh" or "forces" && !ctx.UnitsConverted && ia[i].RowDigest != ib[j].RowDigest)
            {
                // the rows differ although the resultants agree (loads moved without changing R or M): never "no differences"
                fields.Add(new FieldChange("referenced data", RowsText(ia[i]), RowsText(ib[j]) + "; rows differ, the resultant is unchanged", ""));
            }
            if (x.Note != y.Note)
            {
                fields.Add(new FieldChange("note", Q(x.Note), Q(y.Note), ""));
            }
            if (fields.Count > 0)
            {
                list.Add(new ItemChange(name, ia[i].Key, x.Id is null, y.Kind, ChangeKind.Changed, fields, fb - fa, mb - ma)
                {
                    Data = [.. data.Where(d => d.Differing > 0)],
                });
            }
        }
        for (int j = 0; cb is not null && j < cb.Items.Length; j++)
        {
            if (!matched.Contains(j))
            {
                SourceItem y = cb.Items[j];
                var (fb, mb) = ib[j].ContributionAbout(point);
                list.Add(new ItemChange(name, ib[j].Key, y.Id is null, y.Kind, ChangeKind.Added, AllFields(y, ctx.New, ctx, removed: false), fb, mb));
            }
        }
        return list;
    }

    // The rows of the tables a mesh or forces item references, old against new (none when either version's files were not read)
    private static List<DataChange> CompareData(SourceItem x, SourceItem y, ItemResultant rx, ItemResultant ry, Vector3 point, Context ctx)
    {
        string[] Tables(SourceItem item) =>
            item.Kind == "forces" ? [CsvLayouts.PointLoads]
            : item["file"] is not null ? [CsvLayouts.TriangleRows]
            : [CsvLayouts.Vertices, CsvLayouts.Triangles];
        string[] Names(SourceItem item) =>
            [.. (item.Kind == "forces" || item["file"] is not null ? OneTable : TwoTables).Select(k => item[k] is TextValue t ? t.Text : "?")];
        string[] tables = Tables(x);
        if (x.Kind is not ("mesh" or "forces") || !tables.SequenceEqual(Tables(y)) || rx.Files.Count != tables.Length || ry.Files.Count != tables.Length)
        {
            return [];
        }
        Vector3? Direction(SourceItem item) => item["direction"] is VectorValue v ? v.Value : null;
        string[] nx = Names(x), ny = Names(y);
        var list = new List<DataChange>();
        for (int k = 0; k < tables.Length; k++)
        {
            var a = new CsvTableDiffer.Side(rx.Files[k].FullPath, rx.Files[k].Display, nx[k], new UnitConversion(ctx.Old.Units, ctx.Old.Units), Direction(x));
            var b = new CsvTableDiffer.Side(ry.Files[k].FullPath, ry.Files[k].Display, ny[k], new UnitConversion(ctx.NewUnitsAsWritten, ctx.Old.Units), Direction(y));
            list.Add(CsvTableDiffer.Compare(tables[k], a, b, point, ctx.Old.Units, ctx.UnitsConverted, ctx.TableOptions));
        }
        return list;
    }

    // The tables were read once already within the caller's limits; reading them again for the diff keeps only the line limit.
    private static string RowsText(IReadOnlyList<DataChange> data, bool old)
    {
        static string Rows(long n) => n.ToString(CultureInfo.InvariantCulture) + (n == 1 ? " row" : " rows");
        string Table(DataChange d) => data.Count > 1 ? d.Table.Replace("mesh ", "", StringComparison.Ordinal) + " " : "";
        if (old)
        {
            return string.Join("; ", data.Select(d => Table(d) + Rows(d.OldRows)));
        }
        return string.Join("; ", data.Select(d => Table(d) + Rows(d.NewRows) + (d.Differing == 0 ? ", none differ"
            : $": {d.Changed.ToString(CultureInfo.InvariantCulture)} changed, {d.Added.ToString(CultureInfo.InvariantCulture)} added, {d.Removed.ToString(CultureInfo.InvariantCulture)} removed")));
    }

    private static List<FieldChange> AllFields(SourceItem item, LoadDocument doc, Context ctx, bool removed) =>
        [.. item.Fields.Select(f => new FieldChange(f.Name, removed ? Context.Text(f.Value, doc) : null, removed ? null : Context.Text(f.Value, doc),
            Quantities.Symbol(Quantities.Of(item.Kind, f.Name), ctx.Old.Units))),
        .. item.Note is null ? [] : new[] { new FieldChange("note", removed ? Q(item.Note) : null, removed ? null : Q(item.Note), "") }];

    private static bool SameFactors(LoadCombination a, LoadCombination b) =>
        a.Factors.Length == b.Factors.Length && a.Factors.All(f => b.Factors.Any(g => g.Key == f.Key && g.Value == f.Value));

    private static string Factors(LoadCombination c) =>
        string.Join(" + ", c.Factors.Select(f => SourceText.Number(f.Value) + "·" + f.Key));

    private static string RowsText(ItemResultant r) =>
        r.RowDigest.Count.ToString(CultureInfo.InvariantCulture) + (r.RowDigest.Count == 1 ? " row" : " rows");

    private static string Count(SourceCase c) => c.Items.Length.ToString(CultureInfo.InvariantCulture) + (c.Items.Length == 1 ? " item" : " items");

    private static string? Q(string? s) => s is null ? null : SourceText.Quoted(s);

    private static ChangeKind Kind(object? a, object? b) => a is null ? ChangeKind.Added : b is null ? ChangeKind.Removed : ChangeKind.Changed;

    private sealed class Context(LoadDocument old, LoadDocument @new, bool converted)
    {
        public LoadDocument Old { get; } = old;

        public LoadDocument New { get; } = @new;

        public bool UnitsConverted => converted;

        public UnitSystem NewUnitsAsWritten { get; init; } = @new.Units;

        public ReadOptions TableOptions { get; init; } = new();

        public bool Same(double x, double y) => SameValue(x, y, converted);

        public bool Same(Vector3 x, Vector3 y) => Same(x.X, y.X) && Same(x.Y, y.Y) && Same(x.Z, y.Z);

        public bool Same(Vector3? x, Vector3? y) => x is { } p ? y is { } q && Same(p, q) : y is null;

        public bool Close(Vector3 x, Vector3 y) => converted ? (x - y).Length <= 1e-12 * Math.Max(x.Length, y.Length) : x == y;

        public bool Same(SourceValue? x, SourceValue? y) => (x, y) switch
        {
            (null, null) => true,
            (NumberValue p, NumberValue q) => Same(p.Value, q.Value),
            (VectorValue p, VectorValue q) => Same(p.Value, q.Value),
            (PointReference p, PointReference q) => p.Name == q.Name && Same(Old.Point(p.Name), New.Point(q.Name)),
            (TextValue p, TextValue q) => p.Text == q.Text,
            (PolygonValue p, PolygonValue q) => p.Vertices.Length == q.Vertices.Length && p.Vertices.Zip(q.Vertices).All(t => Same(t.First, t.Second)),
            _ => false,
        };

        public static string Text(SourceValue v, LoadDocument doc) => v switch
        {
            PointReference p => SourceText.Quoted(p.Name) + " = " + (doc.Point(p.Name) is { } at ? SourceText.Vector(at) : "?"),
            PolygonValue poly => "[" + string.Join(", ", poly.Vertices.Select(x => Text(x, doc))) + "]",
            _ => SourceText.Of(v),
        };
    }
}
