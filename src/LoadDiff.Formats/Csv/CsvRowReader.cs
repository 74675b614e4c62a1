using System.Globalization;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// A streaming reader of comma-separated rows with a header, line numbers and strict invariant number parsing.
/// Blank lines are skipped; a field may be double-quoted (with "" for a quote). Rows must have as many
/// fields as the header: short rows are never padded.
/// </summary>
internal sealed class CsvRowReader : IDisposable
{
    private readonly TextReader _text;
    private readonly string _file;
    private readonly int _maxLine;
    private readonly List<string> _fields = [];
    private readonly List<int> _starts = [];

    public CsvRowReader(TextReader text, string file, int maxLineLength)
    {
        _text = text;
        _file = file;
        _maxLine = maxLineLength;
    }

    public int Line { get; private set; }

    public IReadOnlyList<string> Header { get; private set; } = [];

    public IReadOnlyList<string> Fields => _fields;

    public void ReadHeader()
    {
        if (!NextLine(out string? line))
        {
            throw Fail(Codes.CsvNoHeader, "the CSV file is empty; expected a header row naming the columns", null);
        }
        Split(line!);
        var header = _fields.Select(f => f.Trim().ToLowerInvariant()).ToList();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        for (int i = 0; i < header.Count; i++)
        {
            if (!seen.Add(header[i]))
            {
                throw Fail(Codes.CsvDuplicateColumn, $"column '{header[i]}' appears twice in the header", i);
            }
        }
        Header = header;
    }

    /// <summary>The index of a column, or −1.</summary>
    public int Column(string name)
    {
        for (int i = 0; i < Header.Count; i++)
        {
            if (Header[i] == name)
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>The index of a required column; a missing one is an error naming all that are required.</summary>
    public int RequiredColumn(string name, string layout)
    {
        int i = Column(name);
        if (i < 0)
        {
            throw new InputError(new Diagnostic(Codes.CsvMissingColumn, Severity.Error,
                $"missing column '{name}'; a {layout} needs the columns {LayoutColumns(layout)}", new SourceLocation(_file, 1, 1)));
        }
        return i;
    }

    public bool ReadRow()
    {
        if (!NextLine(out string? line))
        {
            return false;
        }
        Split(line!);
        if (_fields.Count != Header.Count)
        {
            throw Fail(Codes.CsvRaggedRow, $"row has {_fields.Count} fields, the header has {Header.Count}", null);
        }
        return true;
    }

    public double Number(int column)
    {
        string s = _fields[column].Trim();
        if (!double.TryParse(s, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out double v))
        {
            throw Fail(Codes.CsvBadNumber, $"'{s}' in column '{Header[column]}' is not a number (use a point as decimal separator)", column);
        }
        if (!double.IsFinite(v))
        {
            throw Fail(Codes.NotFinite, $"'{s}' in column '{Header[column]}' overflows a double", column);
        }
        if (Math.Abs(v) > Codes.MaxMagnitude)
        {
            throw Fail(Codes.OutOfRange, $"'{s}' in column '{Header[column]}' exceeds the largest magnitude accepted (1e100)", column);
        }
        return v;
    }

    public string Text(int column) => _fields[column].Trim();

    public InputError Fail(string code, string message, int? column) =>
        new(new Diagnostic(code, Severity.Error, message,
            new SourceLocation(_file, Line, column is { } c && c < _starts.Count ? _starts[c] + 1 : 1)));

    public void Dispose() => _text.Dispose();

    private static string LayoutColumns(string layout) => layout switch
    {
        CsvLayouts.PointLoads => "id (optional), x, y, z, fx, fy, fz and optionally mx, my, mz",
        CsvLayouts.TriangleRows => "x1, y1, z1, x2, y2, z2, x3, y3, z3, p1, p2, p3",
        CsvLayouts.Vertices => "id, x, y, z, p",
        CsvLayouts.Triangles => "a, b, c (vertex ids)",
        _ => layout,
    };

    private bool NextLine(out string? line)
    {
        while (true)
        {
            line = _text.ReadLine();
            if (line is null)
            {
                return false;
            }
            Line++;
            if (line.Length > _maxLine)
            {
                throw new InputError(new Diagnostic(Codes.LineTooLong, Severity.Error,
                    $"line is {line.Length} characters long, more than the limit of {_maxLine}", new SourceLocation(_file, Line, 1)));
            }
            if (Line == 1 && line.Length > 0 && line[0] == '\uFEFF')
            {
                line = line[1..];
            }
            if (line.Trim().Length > 0)
            {
                return true;
            }
        }
    }

    private void Split(string line)
    {
        _fields.Clear();
        _starts.Clear();
        int i = 0;
        while (true)
        {
            _starts.Add(i);
            if (i < line.Length && line[i] == '"')
            {
                var sb = new System.Text.StringBuilder();
                i++;
                while (true)
                {
                    if (i >= line.Length)
                    {
                        throw Fail(Codes.CsvRaggedRow, "a quoted field is not closed", _starts.Count - 1);
                    }
                    if (line[i] == '"')
                    {
                        if (i + 1 < line.Length && line[i + 1] == '"')
                        {
                            sb.Append('"');
                            i += 2;
                            continue;
                        }
                        i++;
                        break;
                    }
                    sb.Append(line[i++]);
                }
                _fields.Add(sb.ToString());
                if (i < line.Length && line[i] != ',')
                {
                    throw Fail(Codes.CsvRaggedRow, "unexpected text after a quoted field", _starts.Count - 1);
                }
            }
            else
            {
                int comma = line.IndexOf(',', i);
                int end = comma < 0 ? line.Length : comma;
                _fields.Add(line[i..end]);
                i = end;
            }
            if (i >= line.Length)
            {
                return;
            }
            i++; // skip the comma
        }
    }
}

/// <summary>Names of the CSV layouts.</summary>
internal static class CsvLayouts
{
    public const string PointLoads = "point-load table";
    public const string TriangleRows = "mesh with one row per triangle";
    public const string Vertices = "mesh vertex table";
    public const string Triangles = "mesh triangle table";
}
