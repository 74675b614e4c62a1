using System.Collections.Immutable;
using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Text;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Json;

/// <summary>
/// Walks a parsed load description (SPEC §3), validates it, converts units and hands the items to a sink
/// one at a time. Every error names the file, line, column and JSON path of the offending value.
/// </summary>
internal sealed class LoadJsonWalker
{
    public const string FormatTag = "loaddiff/1";

    private static readonly string[] RootKeys = ["format", "title", "note", "units", "gravity", "points", "cases", "combinations"];
    private static readonly string[] CaseKeys = ["title", "note", "loads"];

    private readonly string _file;
    private readonly ILineLocator _lines;
    private readonly ReadOptions _options;
    private readonly string _baseDirectory;
    private readonly List<Diagnostic> _warnings;
    private readonly Dictionary<string, Vector3> _points = new(StringComparer.Ordinal);
    private UnitConversion _units = new(UnitSystem.Si, UnitSystem.Si);
    private Vector3 _gravity;
    private long _items;
    private Func<string, IEnumerable<JsonNode>>? _streamedLoads;

    public LoadJsonWalker(string file, ILineLocator lines, ReadOptions options, string baseDirectory, List<Diagnostic> warnings)
    {
        _file = file;
        _lines = lines;
        _options = options;
        _baseDirectory = baseDirectory;
        _warnings = warnings;
    }

    /// <summary>Called as each item of a case begins, with its index in the case's array and its id (given or derived).</summary>
    public Action<int, string>? ItemBegins { get; init; }

    /// <summary>Walks a whole document; <paramref name="streamedLoads"/> supplies the items of cases whose loads were not kept in the tree.</summary>
    public DocumentHeader Walk(JsonNode root, ILoadSink sink, Func<string, IEnumerable<JsonNode>>? streamedLoads = null)
    {
        _streamedLoads = streamedLoads;
        const string path = "$";
        Expect(root, JsonKind.Object, path, "the load description must be a JSON object");
        CheckKeys(root, path, RootKeys);
        if (root["format"] is { } format)
        {
            string tag = String(format, "$.format");
            if (tag != FormatTag)
            {
                throw Error(format, "$.format", Codes.UnknownFormat, $"unknown format '{tag}'; this version reads '{FormatTag}'");
            }
        }
        string? title = root["title"] is { } t ? String(t, "$.title") : null;
        Note(root, "$");
        JsonNode? unitsNode = root["units"];
        UnitSystem source = ReadUnits(unitsNode);
        UnitSystem target = _options.TargetUnits ?? source;
        _units = new UnitConversion(source, target);
        Vector3 g = root["gravity"] is { } gn
            ? Vec(gn, "$.gravity")
            : Vector3.Create(0, 0, -UnitCatalog.StandardGravity / source.Length.ToSi);
        _gravity = g * _units.GravityToForcePerMass;
        if (root["points"] is { } points)
        {
            Expect(points, JsonKind.Object, "$.points", "'points' must be an object of named coordinates");
            foreach (JsonMember m in points.Members!)
            {
                CheckName(m.Value, Path("$.points", m.Key), m.Key, "a point name");
                _points[m.Key] = Vec(m.Value, Path("$.points", m.Key)) * _units.Length;
            }
        }
        JsonNode cases = root["cases"] ?? throw Error(root, path, Codes.MissingField, "missing 'cases': a load description needs at least one load case");
        Expect(cases, JsonKind.Object, "$.cases", "'cases' must be an object of named load cases");
        if (cases.Members!.Count == 0)
        {
            throw Error(cases, "$.cases", Codes.NoCases, "'cases' is empty: a load description needs at least one load case");
        }
        List<LoadCombination> combinations = ReadCombinations(root["combinations"], cases);
        // ReadUnits has checked that a 'units' node is an object; an absent key is a unit the file left to the default.
        var header = new DocumentHeader(title, source, target, _points.ToImmutableSortedDictionary(StringComparer.Ordinal))
        {
            ForceUnitStated = unitsNode?["force"] is not null,
            LengthUnitStated = unitsNode?["length"] is not null,
            MassUnitStated = unitsNode?["mass"] is not null,
        };
        sink.Header(header);
        foreach (JsonMember c in cases.Members)
        {
            WalkCase(c, sink);
        }
        foreach (LoadCombination combination in combinations)
        {
            sink.Combination(combination);
        }
        return header;
    }

    private UnitSystem ReadUnits(JsonNode? node)
    {
        if (node is null)
        {
            return UnitSystem.Si;
        }
        Expect(node, JsonKind.Object, "$.units", "'units' must be an object such as {\"force\": \"kN\", \"length\": \"m\"}");
        CheckKeys(node, "$.units", ["force", "length", "mass"]);
        Unit Pick(string key, Unit fallback, Func<string, Unit?> find, IReadOnlyList<Unit> all)
        {
            if (node[key] is not { } v)
            {
                return fallback;
            }
            string symbol = String(v, "$.units." + key);
            return find(symbol) ?? throw Error(v, "$.units." + key, Codes.UnknownUnit,
                $"unknown {key} unit '{symbol}'; expected one of {string.Join(", ", all.Select(u => u.Symbol))}");
        }
        return new UnitSystem(
            Pick("force", UnitCatalog.Newton, UnitCatalog.FindForce, UnitCatalog.ForceUnits),
            Pick("length", UnitCatalog.Metre, UnitCatalog.FindLength, UnitCatalog.LengthUnits),
            Pick("mass", UnitCatalog.Kilogram, UnitCatalog.FindMass, UnitCatalog.MassUnits));
    }

    private List<LoadCombination> ReadCombinations(JsonNode? node, JsonNode cases)
    {
        var list = new List<LoadCombination>();
        if (node is null)
        {
            return list;
        }
        Expect(node, JsonKind.Object, "$.combinations", "'combinations' must be an object such as {\"uls\": {\"dead\": 1.35}}");
        foreach (JsonMember m in node.Members!)
        {
            string cpath = Path("$.combinations", m.Key);
            CheckName(m.Value, cpath, m.Key, "a combination name");
            Expect(m.Value, JsonKind.Object, cpath, "a combination must be an object of case names and load factors");
            if (cases[m.Key] is not null)
            {
                throw Error(m.Value, cpath, Codes.DuplicateId, $"'{m.Key}' names both a load case and a combination");
            }
            var factors = ImmutableArray.CreateBuilder<KeyValuePair<string, double>>();
            foreach (JsonMember f in m.Value.Members!)
            {
                string fpath = Path(cpath, f.Key);
                CheckName(f.Value, fpath, f.Key, "a case name");
                if (cases[f.Key] is null)
                {
                    throw Error(f.Value, fpath, Codes.UnknownCase,
                        $"combination '{m.Key}' names case '{f.Key}', which is not defined; cases are {string.Join(", ", cases.Members!.Select(c => c.Key))}");
                }
                factors.Add(new(f.Key, Number(f.Value, fpath)));
            }
            list.Add(new LoadCombination(m.Key, factors.ToImmutable()));
        }
        return list;
    }

    private void WalkCase(JsonMember c, ILoadSink sink)
    {
        string cpath = Path("$.cases", c.Key);
        CheckName(c.Value, cpath, c.Key, "a case name");
        Expect(c.Value, JsonKind.Object, cpath, "a load case must be an object with a 'loads' array");
        CheckKeys(c.Value, cpath, CaseKeys);
        string? title = c.Value["title"] is { } t ? String(t, cpath + ".title") : null;
        Note(c.Value, cpath);
        JsonNode loads = c.Value["loads"] ?? throw Error(c.Value, cpath, Codes.MissingField, $"case '{c.Key}' has no 'loads' array");
        Expect(loads, JsonKind.Array, cpath + ".loads", "'loads' must be an array of load items");
        sink.BeginCase(c.Key, title);
        var ids = new HashSet<string>(StringComparer.Ordinal);
        var nextSuffix = new Dictionary<string, int>(StringComparer.Ordinal);
        int couples = 0;
        // A streamed file keeps no items in the tree: they arrive one at a time, in file order.
        IEnumerable<JsonNode> items = loads.Streamed ? _streamedLoads!(c.Key) : loads.Elements!;
        int i = 0;
        foreach (JsonNode element in items)
        {
            WalkItem(element, i, $"{cpath}.loads[{i}]", ids, nextSuffix, ref couples, sink);
            i++;
        }
        sink.EndCase();
    }

    private void WalkItem(JsonNode item, int index, string path, HashSet<string> ids, Dictionary<string, int> nextSuffix,
        ref int couples, ILoadSink sink)
    {
        Expect(item, JsonKind.Object, path, "a load item must be an object with a 'kind'");
        JsonNode kindNode = item["kind"] ?? throw Error(item, path, Codes.MissingField,
            "missing 'kind'; expected one of force, couple, line, area, mass, mesh, forces");
        string kind = String(kindNode, path + ".kind");
        Note(item, path);
        string? id = null;
        if (item["id"] is { } idNode)
        {
            id = String(idNode, path + ".id");
            if (ItemIds.Problem(id, "an id") is { } problem)
            {
                throw Error(idNode, path + ".id", Codes.InvalidId, problem);
            }
            if (!ids.Add(id))
            {
                throw Error(idNode, path + ".id", Codes.DuplicateId, $"id '{id}' is used twice in this case");
            }
        }
        string Derive(string basis)
        {
            string d = "~" + basis;
            if (ids.Add(d))
            {
                return d;
            }
            // Numbers below the one remembered for this basis are taken (ids are never released), so the search
            // starts there: many id-less items at one place cost linear, not quadratic, time.
            int n = nextSuffix.GetValueOrDefault(basis, 2);
            while (!ids.Add(d = "~" + basis + "#" + n.ToString(CultureInfo.InvariantCulture)))
            {
                n++;
            }
            nextSuffix[basis] = n + 1;
            return d;
        }
        string Begin(string basis)
        {
            string itemId = id ?? Derive(basis);
            ItemBegins?.Invoke(index, itemId);
            return itemId;
        }
        void Emit(LoadItem li)
        {
            CountItem(item, path);
            try
            {
                sink.Item(li);
            }
            catch (OverflowException)
            {
                // Accepted magnitudes (≤ 1e100) can still overflow in the products of the reduction (moments of huge loads at huge distances).
                throw Error(item, path, Codes.OutOfRange, "this load's values overflow the range of double when it is reduced (forces × lever arms); use smaller units");
            }
        }
        switch (kind)
        {
            case "force":
            {
                CheckKeys(item, path, ["id", "kind", "note", "at", "value"]);
                Vector3 at = PointOrVec(Required(item, "at", path), path + ".at");
                Vector3 v = Vec(Required(item, "value", path), path + ".value") * _units.Force;
                Emit(new PointForce(Begin("force@" + Text(at)), at, v));
                break;
            }
            case "couple":
            {
                CheckKeys(item, path, ["id", "kind", "note", "value"]);
                Vector3 v = Vec(Required(item, "value", path), path + ".value") * _units.Moment;
                couples++;
                Emit(new FreeCouple(Begin("couple#" + couples.ToString(CultureInfo.InvariantCulture)), v));
                break;
            }
            case "line":
            {
                CheckKeys(item, path, ["id", "kind", "note", "from", "to", "start", "end"]);
                JsonNode toNode = Required(item, "to", path);
                Vector3 a = PointOrVec(Required(item, "from", path), path + ".from");
                Vector3 b = PointOrVec(toNode, path + ".to");
                if ((b - a).Length <= 1e-12 * Math.Max(a.Length, b.Length) || a == b)
                {
                    throw Error(toNode, path + ".to", Codes.ZeroLengthSegment, "the line load's 'from' and 'to' are the same point (zero-length segment)");
                }
                Vector3 w1 = Vec(Required(item, "start", path), path + ".start") * _units.LineIntensity;
                Vector3 w2 = Vec(Required(item, "end", path), path + ".end") * _units.LineIntensity;
                Emit(new LineLoad(Begin("line@" + Text(a) + "-" + Text(b)), a, b, w1, w2));
                break;
            }
            case "area":
            {
                CheckKeys(item, path, ["id", "kind", "note", "polygon", "pressure", "direction", "gradient", "origin"]);
                JsonNode polyNode = Required(item, "polygon", path);
                Expect(polyNode, JsonKind.Array, path + ".polygon", "'polygon' must be an array of at least three points");
                var poly = ImmutableArray.CreateBuilder<Vector3>();
                for (int i = 0; i < polyNode.Elements!.Count; i++)
                {
                    poly.Add(PointOrVec(polyNode.Elements[i], $"{path}.polygon[{i}]"));
                }
                if (poly.Count < 3)
                {
                    throw Error(polyNode, path + ".polygon", Codes.TooFewVertices, $"a polygon needs at least three vertices, this one has {poly.Count}");
                }
                PolygonGeometry geo = PolygonGeometry.Analyse(poly);
                if (geo.Area <= 1e-12 * geo.Size * geo.Size)
                {
                    throw Error(polyNode, path + ".polygon", Codes.DegeneratePolygon, "the polygon has no area (its vertices are collinear or repeated)");
                }
                if (geo.OutOfPlane > 1e-9 * geo.Size)
                {
                    throw Error(polyNode, path + ".polygon", Codes.NonPlanarPolygon,
                        $"the polygon is not planar: a vertex lies {Text(geo.OutOfPlane)} off its mean plane (limit 1e-9 of its size)");
                }
                if (!PolygonGeometry.IsSimple(poly, geo.AreaVector))
                {
                    throw Error(polyNode, path + ".polygon", Codes.SelfIntersectingPolygon,
                        "the polygon's edges cross or touch each other; give its vertices in order around its boundary");
                }
                double p = Number(Required(item, "pressure", path), path + ".pressure") * _units.Pressure;
                Vector3? dir = Direction(item["direction"], path + ".direction");
                Vector3 grad = item["gradient"] is { } gn ? Vec(gn, path + ".gradient") * _units.PressureGradient : Vector3.Zero;
                Vector3 origin = item["origin"] is { } on ? PointOrVec(on, path + ".origin") : Vector3.Zero;
                Emit(new AreaLoad(Begin("area@" + Text(poly[0])), poly.ToImmutable(), p, dir, grad, origin));
                break;
            }
            case "mass":
            {
                CheckKeys(item, path, ["id", "kind", "note", "at", "value"]);
                Vector3 at = PointOrVec(Required(item, "at", path), path + ".at");
                double m = Number(Required(item, "value", path), path + ".value") * _units.Mass;
                Emit(new PointMass(Begin("mass@" + Text(at)), at, m, _gravity));
                break;
            }
            case "mesh":
            {
                CheckKeys(item, path, ["id", "kind", "note", "file", "vertices", "triangles", "direction"]);
                string meshId = Begin("mesh#" + ids.Count.ToString(CultureInfo.InvariantCulture));
                Vector3? dir = Direction(item["direction"], path + ".direction");
                var csv = new CsvLoadReader(_units, _options, li => sink.Item(li), () => ++_items);
                if (LeftOut(item, path, "file", "vertices", "triangles"))
                {
                    break;
                }
                if (item["file"] is { } fileNode && sink is IReducedBlockSink bulkMesh)
                {
                    (string full, string display) = ResolveReferenced(fileNode, path + ".file");
                    new BlockCsvReducer(display, _options, _units, _options.Threads)
                        .Reduce(full, bulkMesh, CsvLayouts.TriangleRows, "", meshId, dir, n => _items += n);
                }
                else if (item["file"] is { } fileNode2)
                {
                    csv.ReadTriangleRows(OpenReferenced(fileNode2, path + ".file"), meshId, dir);
                }
                else
                {
                    JsonNode v = item["vertices"] ?? throw Error(item, path, Codes.MissingField,
                        "a mesh needs 'file' (one row per triangle) or 'vertices' and 'triangles' (two tables)");
                    JsonNode tr = Required(item, "triangles", path);
                    csv.ReadIndexedMesh(OpenReferenced(v, path + ".vertices"), OpenReferenced(tr, path + ".triangles"), meshId, dir, sink as IReducedBlockSink);
                }
                break;
            }
            case "forces":
            {
                CheckKeys(item, path, ["id", "kind", "note", "file"]);
                string prefix = Begin("forces#" + ids.Count.ToString(CultureInfo.InvariantCulture));
                if (LeftOut(item, path, "file"))
                {
                    break;
                }
                if (sink is IReducedBlockSink bulk)
                {
                    (string full, string display) = ResolveReferenced(Required(item, "file", path), path + ".file");
                    new BlockCsvReducer(display, _options, _units, _options.Threads)
                        .Reduce(full, bulk, CsvLayouts.PointLoads, prefix, prefix, null, n => _items += n);
                }
                else
                {
                    var csv = new CsvLoadReader(_units, _options, li => sink.Item(li), () => ++_items);
                    csv.ReadPointLoads(OpenReferenced(Required(item, "file", path), path + ".file"), prefix);
                }
                break;
            }
            default:
                throw Error(kindNode, path + ".kind", Codes.UnknownKind,
                    $"unknown kind '{kind}'; expected one of force, couple, line, area, mass, mesh, forces");
        }
    }

    private CsvRowReader OpenReferenced(JsonNode node, string path)
    {
        (string full, string display) = ResolveReferenced(node, path);
        return CsvLoadReader.Open(full, display, _options);
    }

    // With ReadOptions.MissingReferencedFile set, an item whose referenced file does not exist keeps no data (and no
    // load): the caller has only the document (git's textconv gets a temporary copy) and says so. Only a file that is
    // simply absent is left out; a name outside the folder or an empty one is still an error.
    private bool LeftOut(JsonNode item, string path, params string[] keys)
    {
        if (_options.MissingReferencedFile is null && !_options.ReferencedFilesSkipped)
        {
            return false;
        }
        var missing = new List<string>();
        foreach (string key in keys)
        {
            if (item[key] is { } node)
            {
                (string full, string rel) = Locate(node, path + "." + key);
                if (_options.ReferencedFilesSkipped || !File.Exists(full))
                {
                    missing.Add(rel);
                }
            }
        }
        foreach (string rel in missing)
        {
            _options.MissingReferencedFile?.Invoke(rel);
        }
        return missing.Count > 0;
    }

    private (string Full, string Relative) Locate(JsonNode node, string path)
    {
        string rel = String(node, path);
        if (rel.Length == 0)
        {
            throw Error(node, path, Codes.ReferencedFileMissing, "the file name is empty");
        }
        if (LoadDiff.Core.Text.NameCharacters.FirstForbidden(rel) is int bad and >= 0)
        {
            // no file system can name a file with a NUL, and a control character in a name is a forgery waiting to be printed
            throw Error(node, path, Codes.InvalidId, LoadDiff.Core.Text.NameCharacters.Describe("the file name", rel, bad));
        }
        string full = System.IO.Path.GetFullPath(System.IO.Path.Combine(_baseDirectory, rel));
        string baseFull = System.IO.Path.GetFullPath(_baseDirectory).TrimEnd(System.IO.Path.DirectorySeparatorChar) + System.IO.Path.DirectorySeparatorChar;
        if (!_options.AllowOutside && (System.IO.Path.IsPathRooted(rel) || !full.StartsWith(baseFull, StringComparison.Ordinal)))
        {
            throw Error(node, path, Codes.OutsideFolder,
                $"'{rel}' lies outside the folder of the load file; only relative paths inside it are read (--allow-outside permits others)");
        }
        if (_options.PrepareReferencedFile?.Invoke(full) is { } refused)
        {
            throw Error(node, path, Codes.OutsideFolder, $"'{rel}' {refused}");
        }
        // the lexical test above cannot see links: a link, or a linked folder on the way, may still lead out
        if (!_options.AllowOutside && !_options.ReferencedFilesSkipped && !ReferencedPath.StaysInside(full, _baseDirectory))
        {
            throw Error(node, path, Codes.OutsideFolder,
                $"'{rel}' escapes the folder of the load file through a symbolic link; only files inside it are read (--allow-outside permits others)");
        }
        return (full, rel);
    }

    private (string Full, string Display) ResolveReferenced(JsonNode node, string path)
    {
        (string full, string rel) = Locate(node, path);
        if (!File.Exists(full))
        {
            throw Error(node, path, Codes.ReferencedFileMissing, $"referenced file '{rel}' does not exist");
        }
        _options.ReferencedFileOpened?.Invoke(full, DisplayPath(rel));
        return (full, DisplayPath(rel));
    }

    private string DisplayPath(string rel)
    {
        string dir = System.IO.Path.GetDirectoryName(_file) ?? "";
        int colon = _file.IndexOf(':', StringComparison.Ordinal);
        if (dir.Length == 0 && colon > 0 && _options.PrepareReferencedFile is not null)
        {
            // a document at the top of a revision (REV:model.loads.json): its tables are REV:table.csv, not the working tree's
            return _file[..(colon + 1)] + rel;
        }
        return dir.Length == 0 ? rel : System.IO.Path.Combine(dir, rel);
    }

    private void CountItem(JsonNode node, string path)
    {
        if (++_items > _options.MaxItems)
        {
            throw Error(node, path, Codes.TooManyItems, $"more than {_options.MaxItems} items (raise the limit with --max-items)");
        }
    }

    private Vector3? Direction(JsonNode? node, string path)
    {
        if (node is null || (node.Kind == JsonKind.String && node.Text == "normal"))
        {
            return null;
        }
        if (node.Kind == JsonKind.String)
        {
            throw Error(node, path, Codes.WrongType, $"direction must be \"normal\" or a vector [dx, dy, dz], found \"{node.Text}\"");
        }
        Vector3 d = Vec(node, path);
        if (d.IsZero)
        {
            throw Error(node, path, Codes.ZeroDirection, "the direction vector is zero");
        }
        return d;
    }

    private JsonNode Required(JsonNode obj, string key, string path) =>
        obj[key] ?? throw Error(obj, path, Codes.MissingField, $"missing '{key}'");

    private Vector3 PointOrVec(JsonNode node, string path)
    {
        if (node.Kind == JsonKind.String)
        {
            return _points.TryGetValue(node.Text!, out Vector3 p) ? p
                : throw Error(node, path, Codes.UnknownPoint, _points.Count == 0
                    ? $"unknown point '{node.Text}': the file defines no named points"
                    : $"unknown point '{node.Text}'; named points are {string.Join(", ", _points.Keys.Order(StringComparer.Ordinal))}");
        }
        return Vec(node, path) * _units.Length;
    }

    private Vector3 Vec(JsonNode node, string path)
    {
        if (node.Kind != JsonKind.Array || node.Elements!.Count != 3)
        {
            string found = node.Kind == JsonKind.Array ? $"an array of {node.Elements!.Count}" : node.KindName;
            throw Error(node, path, Codes.WrongType, $"expected a vector [x, y, z] of three numbers, found {found}");
        }
        return Vector3.Create(Number(node.Elements[0], path + "[0]"), Number(node.Elements[1], path + "[1]"), Number(node.Elements[2], path + "[2]"));
    }

    private double Number(JsonNode node, string path)
    {
        if (node.Kind == JsonKind.String && node.Text is { } s && LooksNonFinite(s))
        {
            throw Error(node, path, Codes.NotFinite, $"\"{s}\" is not accepted: NaN and infinity are input errors");
        }
        if (node.Kind != JsonKind.Number)
        {
            throw Error(node, path, Codes.WrongType, $"expected a number, found {node.KindName}");
        }
        if (!double.IsFinite(node.Number))
        {
            throw Error(node, path, Codes.NotFinite, $"the number {node.Text} overflows a double");
        }
        if (Math.Abs(node.Number) > Codes.MaxMagnitude)
        {
            throw Error(node, path, Codes.OutOfRange, $"the number {node.Text} exceeds the largest magnitude accepted (1e100)");
        }
        return node.Number;
    }

    private static bool LooksNonFinite(string s)
    {
        string t = s.Trim().TrimStart('+', '-').ToLowerInvariant();
        return t is "nan" or "inf" or "infinity" or "∞";
    }

    private string String(JsonNode node, string path) =>
        node.Kind == JsonKind.String ? node.Text! : throw Error(node, path, Codes.WrongType, $"expected a string, found {node.KindName}");

    // A note is free text (any characters; every output escapes it), so only its type is checked.
    private void Note(JsonNode obj, string path)
    {
        if (obj["note"] is { } note)
        {
            String(note, path + ".note");
        }
    }

    private void Expect(JsonNode node, JsonKind kind, string path, string message)
    {
        if (node.Kind != kind)
        {
            throw Error(node, path, Codes.WrongType, $"{message}; found {node.KindName}");
        }
    }

    private void CheckKeys(JsonNode obj, string path, string[] known)
    {
        foreach (JsonMember m in obj.Members!)
        {
            if (Array.IndexOf(known, m.Key) < 0)
            {
                var (line, col) = _lines.Locate(m.KeyOffset);
                var d = new Diagnostic(Codes.UnknownField, _options.Strict ? Severity.Error : Severity.Warning,
                    $"unknown field '{m.Key}' (known here: {string.Join(", ", known)})", new SourceLocation(_file, line, col, Path(path, m.Key)));
                if (_options.Strict)
                {
                    throw new InputError(d);
                }
                _warnings.Add(d);
            }
        }
    }

    // Names are data, never markup: a control or bidi character could forge a line or reorder text in a report.
    private void CheckName(JsonNode node, string path, string name, string what)
    {
        int bad = NameCharacters.FirstForbidden(name);
        if (bad >= 0)
        {
            throw Error(node, path, Codes.InvalidId, NameCharacters.Describe(what, name, bad));
        }
    }

    private InputError Error(JsonNode node, string path, string code, string message)
    {
        var (line, col) = _lines.Locate(node.Offset);
        return new InputError(new Diagnostic(code, Severity.Error, message, new SourceLocation(_file, line, col, path)));
    }

    internal static string Path(string parent, string key) =>
        key.Length > 0 && key.All(ch => char.IsAsciiLetterOrDigit(ch) || ch is '_' or '-') && !char.IsAsciiDigit(key[0])
            ? parent + "." + key
            : parent + "['" + key.Replace("'", "\\'", StringComparison.Ordinal) + "']";

    private static string Text(Vector3 v) =>
        v.X.ToString("R", CultureInfo.InvariantCulture) + "," + v.Y.ToString("R", CultureInfo.InvariantCulture) + ","
        + v.Z.ToString("R", CultureInfo.InvariantCulture);

    private static string Text(double d) => d.ToString("G4", CultureInfo.InvariantCulture);
}
