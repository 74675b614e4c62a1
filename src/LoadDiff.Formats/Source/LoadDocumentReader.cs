using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Json;

namespace LoadDiff.Formats.Source;

/// <summary>
/// Reads a <c>.loads.json</c> document into the source-level <see cref="LoadDocument"/>. The file goes through the
/// same validation as <c>reduce</c> (the same walker, referenced CSV files included), so a file <c>reduce</c>
/// rejects is rejected here with the same diagnostic; the document is then built from the validated tree.
/// </summary>
public static class LoadDocumentReader
{
    private static readonly string[] RootKeys = ["format", "title", "note", "units", "gravity", "points", "cases", "combinations"];

    /// <summary>Reads a file from disk, or standard input for <c>-</c>.</summary>
    /// <param name="path">The file as the user named it.</param>
    /// <param name="options">Limits, and <see cref="ReadOptions.TargetUnits"/> for the resultants; the document keeps the file's units.</param>
    public static SourceReadResult Read(string path, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        options ??= new ReadOptions();
        byte[] bytes;
        try
        {
            bytes = LoadFileReader.ReadJsonFile(path, options);
        }
        catch (InputError e)
        {
            return new SourceReadResult(null, null, false, [], [e.Diagnostic]);
        }
        string dir = path == "-" ? Directory.GetCurrentDirectory() : System.IO.Path.GetDirectoryName(System.IO.Path.GetFullPath(path))!;
        return ReadBytes(bytes, path, dir, options);
    }

    /// <summary>
    /// Reads a document held in memory without any file it references (<see cref="ReadOptions.ReferencedFilesSkipped"/>):
    /// items whose data are in a CSV table are kept without them. Names that leave the document's folder are still errors.
    /// </summary>
    public static SourceReadResult ReadDocumentOnly(byte[] utf8, string displayName, ReadOptions? options = null) =>
        ReadBytes(utf8, displayName, DocumentOnlyFolder, (options ?? new ReadOptions()) with { ReferencedFilesSkipped = true });

    // Only the containment check of referenced names uses the folder when nothing is opened: any absolute path will do.
    private static readonly string DocumentOnlyFolder = Path.Combine(Path.GetTempPath(), "loaddiff-document-only");

    /// <summary>Reads JSON held in memory; referenced files resolve against <paramref name="baseDirectory"/>.</summary>
    public static SourceReadResult ReadBytes(byte[] utf8, string displayName, string baseDirectory, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(utf8);
        options ??= new ReadOptions();
        var warnings = new List<Diagnostic>();
        var resultants = new DocumentResultants();
        Action<string, string>? opened = options.ReferencedFileOpened;
        // each item remembers the CSV files its data came from, so diff can compare their rows
        options = options with
        {
            ReferencedFileOpened = (full, display) =>
            {
                opened?.Invoke(full, display);
                resultants.FileOpened(full, display);
            },
        };
        JsonNode? root = null;
        int bom = 0;
        try
        {
            LoadFileReader.ReadJsonBytes(utf8, displayName, baseDirectory, resultants, options, warnings,
                (r, b) => (root, bom) = (r, b), resultants.ItemBegins);
        }
        catch (InputError e)
        {
            warnings.Add(e.Diagnostic);
            return new SourceReadResult(null, null, false, [], warnings);
        }
        var dropped = new List<string>();
        LoadDocument document = Build(root!, dropped);
        List<SourceComment> comments = CommentScanner.Scan(bom == 0 ? utf8 : utf8[bom..], root!, options.MaxDepth);
        return new SourceReadResult(document, resultants, comments.Count > 0, dropped, warnings) { Comments = comments };
    }

    /// <summary>Reads a document from a string (for tests and tools); referenced files resolve against the current folder.</summary>
    public static SourceReadResult ReadText(string json, string displayName = "-", ReadOptions? options = null) =>
        ReadBytes(System.Text.Encoding.UTF8.GetBytes(json ?? throw new ArgumentNullException(nameof(json))), displayName,
            Directory.GetCurrentDirectory(), options);

    // The tree has been validated by the walker: every shape below is known to be right.
    private static LoadDocument Build(JsonNode root, List<string> dropped)
    {
        Unknown(root, "$", RootKeys, dropped);
        string? title = root["title"]?.Text;
        UnitSystem units = UnitSystem.Si;
        if (root["units"] is { } u)
        {
            Unknown(u, "$.units", ["force", "length", "mass"], dropped);
            units = new UnitSystem(
                u["force"] is { } f ? UnitCatalog.FindForce(f.Text!)! : UnitCatalog.Newton,
                u["length"] is { } l ? UnitCatalog.FindLength(l.Text!)! : UnitCatalog.Metre,
                u["mass"] is { } m ? UnitCatalog.FindMass(m.Text!)! : UnitCatalog.Kilogram);
        }
        Vector3? gravity = root["gravity"] is { } g ? Vec(g) : null;
        var points = ImmutableArray.CreateBuilder<KeyValuePair<string, Vector3>>();
        if (root["points"] is { } pts)
        {
            foreach (JsonMember m in pts.Members!)
            {
                points.Add(new(m.Key, Vec(m.Value)));
            }
        }
        var cases = ImmutableArray.CreateBuilder<SourceCase>();
        foreach (JsonMember c in root["cases"]!.Members!)
        {
            string cpath = LoadJsonWalker.Path("$.cases", c.Key);
            Unknown(c.Value, cpath, ["title", "note", "loads"], dropped);
            var items = ImmutableArray.CreateBuilder<SourceItem>();
            List<JsonNode> loads = c.Value["loads"]!.Elements!;
            for (int i = 0; i < loads.Count; i++)
            {
                items.Add(Item(loads[i], $"{cpath}.loads[{i}]", dropped));
            }
            cases.Add(new SourceCase(c.Key, c.Value["title"]?.Text, items.ToImmutable()) { Note = c.Value["note"]?.Text });
        }
        var combinations = ImmutableArray.CreateBuilder<LoadCombination>();
        if (root["combinations"] is { } combos)
        {
            foreach (JsonMember m in combos.Members!)
            {
                combinations.Add(new LoadCombination(m.Key,
                    [.. m.Value.Members!.Select(f => new KeyValuePair<string, double>(f.Key, f.Value.Number))]));
            }
        }
        return new LoadDocument(title, units, gravity, points.ToImmutable(), cases.ToImmutable(), combinations.ToImmutable()) { Note = root["note"]?.Text };
    }

    private static SourceItem Item(JsonNode node, string path, List<string> dropped)
    {
        string kind = node["kind"]!.Text!;
        IReadOnlyList<string> order = Quantities.FieldOrder(kind);
        Unknown(node, path, ["id", "kind", "note", .. order], dropped);
        var fields = ImmutableArray.CreateBuilder<SourceField>();
        foreach (string name in order)
        {
            JsonNode? v = node[name];
            if (name == "direction" && (v is null || v.Kind == JsonKind.String))
            {
                // absent and "normal" mean the same; the model holds "normal" for areas, nothing for meshes
                if (kind == "area" || v is not null)
                {
                    fields.Add(new SourceField(name, new TextValue("normal")));
                }
                continue;
            }
            if (v is null)
            {
                continue;
            }
            fields.Add(new SourceField(name,
                name == "polygon" ? new PolygonValue([.. v.Elements!.Select(PointOrVector)])
                : Quantities.Of(kind, name) == Quantity.Length ? PointOrVector(v)
                : Value(v)));
        }
        return new SourceItem(node["id"]?.Text, kind, fields.ToImmutable()) { Note = node["note"]?.Text };
    }

    private static SourceValue Value(JsonNode v) => v.Kind switch
    {
        JsonKind.Number => new NumberValue(v.Number),
        JsonKind.String => new TextValue(v.Text!),
        JsonKind.Array => new VectorValue(Vec(v)),
        _ => throw new InvalidOperationException("the walker accepted a value of kind " + v.Kind),
    };

    private static SourceValue PointOrVector(JsonNode v) =>
        v.Kind == JsonKind.String ? new PointReference(v.Text!) : new VectorValue(Vec(v));

    private static Vector3 Vec(JsonNode v) => Vector3.Create(v.Elements![0].Number, v.Elements[1].Number, v.Elements[2].Number);

    private static void Unknown(JsonNode obj, string path, IReadOnlyList<string> known, List<string> dropped)
    {
        foreach (JsonMember m in obj.Members!)
        {
            if (!known.Contains(m.Key))
            {
                dropped.Add(LoadJsonWalker.Path(path, m.Key));
            }
        }
    }
}
