using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>Streams point loads and mesh triangles out of CSV files, converting units on the way.</summary>
internal sealed class CsvLoadReader
{
    private readonly UnitConversion _units;
    private readonly ReadOptions _options;
    private readonly Action<LoadItem> _emit;
    private readonly Func<long> _countItem;

    public CsvLoadReader(UnitConversion units, ReadOptions options, Action<LoadItem> emit, Func<long> countItem)
    {
        _units = units;
        _options = options;
        _emit = emit;
        _countItem = countItem;
    }

    public static string? DetectLayout(IReadOnlyList<string> header) =>
        header.Contains("fx") ? CsvLayouts.PointLoads
        : header.Contains("x1") ? CsvLayouts.TriangleRows
        : null;

    public static CsvRowReader Open(string path, string display, ReadOptions options)
    {
        CsvFileGate.Check(path, display, options);
        try
        {
            Stream stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
            if (options.BytesRead is { } progress)
            {
                stream = new CountingStream(stream, progress);
            }
            // No byte-order-mark detection: a UTF-16 file is refused as invalid UTF-8 here as in the block reducer.
            var text = new StreamReader(stream, new System.Text.UTF8Encoding(false, throwOnInvalidBytes: true), false, 1 << 16);
            return new CsvRowReader(text, display, options.MaxLineLength, path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputError(new Diagnostic(Codes.FileUnreadable, Severity.Error, "cannot read the file: " + e.Message, new SourceLocation(display)));
        }
    }

    /// <summary>Reads a whole CSV whose layout is detected from its header.</summary>
    public void ReadAny(CsvRowReader csv, string idPrefix)
    {
        Guarded(csv, () =>
        {
            csv.ReadHeader();
            switch (DetectLayout(csv.Header))
            {
                case CsvLayouts.PointLoads:
                    ReadPointLoadRows(csv, idPrefix);
                    break;
                case CsvLayouts.TriangleRows:
                    // A mesh read on its own has no id in any file: give it a derived one (never an empty id).
                    ReadTriangleRowsBody(csv, idPrefix.Length > 0 ? idPrefix : "~mesh", null);
                    break;
                default:
                    throw csv.Fail(Codes.CsvUnknownLayout,
                        "cannot tell the layout from the header: a point-load table has fx, fy, fz; a triangle mesh has x1 … p3", 0);
            }
        });
    }

    public void ReadPointLoads(CsvRowReader csv, string idPrefix) => Guarded(csv, () =>
    {
        csv.ReadHeader();
        ReadPointLoadRows(csv, idPrefix);
    });

    public void ReadTriangleRows(CsvRowReader csv, string id, Vector3? direction) => Guarded(csv, () =>
    {
        csv.ReadHeader();
        ReadTriangleRowsBody(csv, id, direction);
    });

    /// <summary>
    /// Reads a vertex table and a triangle table. With <paramref name="bulk"/> the triangles are reduced as they are
    /// read (no item per triangle) and handed over as one block, the mesh as its one contributor.
    /// </summary>
    public void ReadIndexedMesh(CsvRowReader vertices, CsvRowReader triangles, string id, Vector3? direction, IReducedBlockSink? bulk = null)
    {
        ReductionAccumulator? reduced = bulk is null ? null : new ReductionAccumulator();
        var table = new Dictionary<string, (Vector3 X, double P)>(StringComparer.Ordinal);
        Guarded(vertices, () =>
        {
            vertices.ReadHeader();
            int ci = vertices.RequiredColumn("id", CsvLayouts.Vertices);
            int cx = vertices.RequiredColumn("x", CsvLayouts.Vertices);
            int cy = vertices.RequiredColumn("y", CsvLayouts.Vertices);
            int cz = vertices.RequiredColumn("z", CsvLayouts.Vertices);
            int cp = vertices.RequiredColumn("p", CsvLayouts.Vertices);
            while (vertices.ReadRow())
            {
                string vid = vertices.Name(ci, "a vertex id");
                Vector3 x = Point(vertices, cx, cy, cz);
                if (!table.TryAdd(vid, (x, vertices.Number(cp) * _units.Pressure)))
                {
                    throw vertices.Fail(Codes.DuplicateId, $"vertex id '{vid}' appears twice", ci);
                }
            }
        });
        Guarded(triangles, () =>
        {
            triangles.ReadHeader();
            int ca = triangles.RequiredColumn("a", CsvLayouts.Triangles);
            int cb = triangles.RequiredColumn("b", CsvLayouts.Triangles);
            int cc = triangles.RequiredColumn("c", CsvLayouts.Triangles);
            while (triangles.ReadRow())
            {
                (Vector3 X, double P) Vertex(int col) =>
                    table.TryGetValue(triangles.Text(col), out var v) ? v
                    : throw triangles.Fail(Codes.UnknownVertex, $"no vertex with id '{triangles.Text(col)}' in the vertex table", col);
                var a = Vertex(ca);
                var b = Vertex(cb);
                var c = Vertex(cc);
                if (reduced is null)
                {
                    EmitTriangle(triangles, id, a.X, b.X, c.X, a.P, b.P, c.P, direction);
                }
                else
                {
                    CheckTriangle(triangles, a.X, b.X, c.X, direction);
                    Count(triangles);
                    reduced.AddTriangle(a.X, b.X, c.X, a.P, b.P, c.P, direction);
                }
            }
        });
        if (bulk is not null && reduced is { Count: > 0 })
        {
            LoadReduction total = reduced.ResultAt(reduced.Anchor ?? Vector3.Zero);
            bulk.AddReducedBlock(reduced, [new Contributor(id, LoadKind.MeshTriangle, total.Force, Vector3.Zero, total.Centroid, reduced.Count)]);
        }
    }

    private void ReadPointLoadRows(CsvRowReader csv, string idPrefix)
    {
        const string layout = CsvLayouts.PointLoads;
        int ci = csv.Column("id");
        int cx = csv.RequiredColumn("x", layout), cy = csv.RequiredColumn("y", layout), cz = csv.RequiredColumn("z", layout);
        int fx = csv.RequiredColumn("fx", layout), fy = csv.RequiredColumn("fy", layout), fz = csv.RequiredColumn("fz", layout);
        int mx = csv.Column("mx"), my = csv.Column("my"), mz = csv.Column("mz");
        bool moments = mx >= 0 || my >= 0 || mz >= 0;
        if (moments && (mx < 0 || my < 0 || mz < 0))
        {
            csv.RequiredColumn(mx < 0 ? "mx" : my < 0 ? "my" : "mz", layout);
        }
        while (csv.ReadRow())
        {
            string id = ci >= 0 ? csv.Name(ci, "an id") : "row" + csv.Line.ToString(System.Globalization.CultureInfo.InvariantCulture);
            if (idPrefix.Length > 0)
            {
                id = idPrefix + "/" + id;
            }
            Vector3 at = Point(csv, cx, cy, cz);
            Vector3 f = Vector3.Create(csv.Number(fx), csv.Number(fy), csv.Number(fz)) * _units.Force;
            Count(csv);
            _emit(new PointForce(id, at, f));
            if (moments)
            {
                Vector3 m = Vector3.Create(csv.Number(mx), csv.Number(my), csv.Number(mz)) * _units.Moment;
                if (!m.IsZero)
                {
                    Count(csv);
                    _emit(new FreeCouple(id + ":m", m));
                }
            }
        }
    }

    private void ReadTriangleRowsBody(CsvRowReader csv, string id, Vector3? direction)
    {
        const string layout = CsvLayouts.TriangleRows;
        string[] names = ["x1", "y1", "z1", "x2", "y2", "z2", "x3", "y3", "z3", "p1", "p2", "p3"];
        int[] c = names.Select(n => csv.RequiredColumn(n, layout)).ToArray();
        while (csv.ReadRow())
        {
            EmitTriangle(csv, id, Point(csv, c[0], c[1], c[2]), Point(csv, c[3], c[4], c[5]), Point(csv, c[6], c[7], c[8]),
                csv.Number(c[9]) * _units.Pressure, csv.Number(c[10]) * _units.Pressure, csv.Number(c[11]) * _units.Pressure, direction);
        }
    }

    private void EmitTriangle(CsvRowReader csv, string id, Vector3 a, Vector3 b, Vector3 c, double pa, double pb, double pc, Vector3? direction)
    {
        CheckTriangle(csv, a, b, c, direction);
        Count(csv);
        _emit(new MeshTriangle(id, a, b, c, pa, pb, pc, direction));
    }

    // Without a given direction the force follows the normal, which a triangle without area does not have.
    private static void CheckTriangle(CsvRowReader csv, Vector3 a, Vector3 b, Vector3 c, Vector3? direction)
    {
        if (direction is null)
        {
            Vector3 n = Vector3.Cross(b - a, c - a);
            double scale = Math.Max((b - a).LengthSquared, (c - a).LengthSquared);
            if (n.Length <= 1e-12 * scale)
            {
                throw csv.Fail(Codes.DegenerateTriangle, "the triangle has no area, so its normal is undefined", 0);
            }
        }
    }

    private Vector3 Point(CsvRowReader csv, int cx, int cy, int cz) =>
        Vector3.Create(csv.Number(cx), csv.Number(cy), csv.Number(cz)) * _units.Length;

    private void Count(CsvRowReader csv)
    {
        if (_countItem() > _options.MaxItems)
        {
            throw csv.Fail(Codes.TooManyItems, $"more than {_options.MaxItems} items (raise the limit with --max-items)", null);
        }
    }

    private static void Guarded(CsvRowReader csv, Action body)
    {
        try
        {
            body();
        }
        catch (OverflowException)
        {
            throw csv.Fail(Codes.OutOfRange, "values on this line overflow the range of double when reduced (forces × lever arms); use smaller units", null);
        }
        catch (System.Text.DecoderFallbackException)
        {
            throw csv.InvalidUtf8();
        }
        catch (IOException e)
        {
            throw csv.Fail(Codes.FileUnreadable, "cannot read the file: " + e.Message, null);
        }
        finally
        {
            csv.Dispose();
        }
    }
}
