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

    private readonly string? _sourcePath;
    private readonly char[] _buffer = new char[1 << 14];
    private readonly System.Text.StringBuilder _line = new();
    private int _bufferPos, _bufferEnd;

    public CsvRowReader(TextReader text, string file, int maxLineLength, string? sourcePath = null)
    {
        _text = text;
        _file = file;
        _maxLine = maxLineLength;
        _sourcePath = sourcePath;
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
        if (line!.IndexOf('\r', StringComparison.Ordinal) is int cr and >= 0)
        {
            throw new InputError(new Diagnostic(Codes.CsvCarriageReturnLines, Severity.Error, CsvText.LoneCarriageReturn, new SourceLocation(_file, Line, cr + 1)));
        }
        Split(line);
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
        if (TryDecimal(s, out double fast))
        {
            return fast; // a plain decimal of at most 15 digits: exact, finite and far below the limit
        }
        if (!double.TryParse(s, NumberStyles.AllowLeadingSign | NumberStyles.AllowDecimalPoint | NumberStyles.AllowExponent,
                CultureInfo.InvariantCulture, out double v))
        {
            throw Fail(Codes.CsvBadNumber, $"'{s}' in column '{Header[column]}' is not a number (use a point as decimal separator)", column);
        }
        if (!double.IsFinite(v))
        {
            // The invariant culture also parses the symbols NaN and Infinity; only a numeral (it has digits) overflows.
            throw Fail(Codes.NotFinite, s.Any(char.IsAsciiDigit)
                ? $"'{s}' in column '{Header[column]}' overflows a double"
                : $"'{s}' in column '{Header[column]}' is not accepted: NaN and infinity are input errors", column);
        }
        if (Math.Abs(v) > Codes.MaxMagnitude)
        {
            throw Fail(Codes.OutOfRange, $"'{s}' in column '{Header[column]}' exceeds the largest magnitude accepted (1e100)", column);
        }
        return v;
    }

    public string Text(int column) => _fields[column].Trim();

    // Clinger's fast path on the ASCII text (the same correctly rounded value double.TryParse gives), with no
    // exponent so that the value stays within the accepted magnitude; anything else goes to the runtime parser.
    private static bool TryDecimal(string s, out double value)
    {
        value = 0;
        if (s.Length is 0 or > 24)
        {
            return false;
        }
        Span<byte> ascii = stackalloc byte[s.Length];
        for (int i = 0; i < s.Length; i++)
        {
            char c = s[i];
            if (c is 'e' or 'E' or > '\u007f')
            {
                return false;
            }
            ascii[i] = (byte)c;
        }
        return DecimalFastPath.TryParse(ascii, out value);
    }

    /// <summary>The text of a name column, refused (LD033) when it holds a control, line-separator or bidi character.</summary>
    public string Name(int column, string what)
    {
        string name = Text(column);
        int bad = LoadDiff.Core.Text.NameCharacters.FirstForbidden(name);
        return bad < 0 ? name : throw Fail(Codes.InvalidId, LoadDiff.Core.Text.NameCharacters.Describe(what, name, bad), column);
    }

    public InputError Fail(string code, string message, int? column) =>
        new(new Diagnostic(code, Severity.Error, message, Line == 0
            ? new SourceLocation(_file) // nothing read yet: the whole file is meant
            : new SourceLocation(_file, Line, column is { } c && c < _starts.Count ? _starts[c] + 1 : 1)));

    /// <summary>
    /// The error for text that does not decode: the decoder fails a buffer ahead of the rows returned, so the
    /// file is scanned again for the first invalid byte to name its line and column.
    /// </summary>
    public InputError InvalidUtf8()
    {
        const string message = "the file is not valid UTF-8 text";
        (int Line, int Column)? at = null;
        if (_sourcePath is not null)
        {
            try
            {
                using var s = new FileStream(_sourcePath, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
                at = FirstInvalidUtf8(s);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                at = null;
            }
        }
        return new InputError(new Diagnostic(Codes.InvalidUtf8, Severity.Error, message, at is { } p
            ? new SourceLocation(_file, p.Line, p.Column)
            : new SourceLocation(_file)));
    }

    /// <summary>Line and column (UTF-16 units, as the row reader counts them) of the first invalid UTF-8 sequence, or null.</summary>
    internal static (int Line, int Column)? FirstInvalidUtf8(Stream s)
    {
        byte[] buffer = new byte[1 << 16];
        int carry = 0, line = 1, column = 1;
        bool start = true;
        while (true)
        {
            int n = s.Read(buffer, carry, buffer.Length - carry);
            int length = carry + n;
            int pos = 0;
            if (start && length >= 3 && buffer[0] == 0xEF && buffer[1] == 0xBB && buffer[2] == 0xBF)
            {
                pos = 3; // the reader drops a byte-order mark
            }
            start = false;
            while (pos < length)
            {
                var status = System.Text.Rune.DecodeFromUtf8(buffer.AsSpan(pos, length - pos), out System.Text.Rune rune, out int consumed);
                if (status == System.Buffers.OperationStatus.NeedMoreData && n > 0)
                {
                    break;
                }
                if (status != System.Buffers.OperationStatus.Done)
                {
                    return (line, column);
                }
                if (rune.Value == '\n')
                {
                    line++;
                    column = 1;
                }
                else
                {
                    column += rune.Utf16SequenceLength;
                }
                pos += consumed;
            }
            carry = length - pos;
            Array.Copy(buffer, pos, buffer, 0, carry);
            if (n == 0)
            {
                return null;
            }
        }
    }

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
            line = ReadBoundedLine();
            if (line is null)
            {
                return false;
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

    /// <summary>
    /// The next line, ended by LF only (a CR before it is dropped), as the block reducer splits lines: a lone CR
    /// is text, not a line end. A line over the limit is refused as soon as the limit is passed, so one endless
    /// line is never held in memory.
    /// </summary>
    private string? ReadBoundedLine()
    {
        _line.Clear();
        bool any = false;
        while (true)
        {
            if (_bufferPos == _bufferEnd)
            {
                _bufferEnd = _text.Read(_buffer, 0, _buffer.Length);
                _bufferPos = 0;
                if (_bufferEnd == 0)
                {
                    if (!any)
                    {
                        return null;
                    }
                    Line++;
                    return TrimCr(_line);
                }
            }
            any = true;
            int nl = Array.IndexOf(_buffer, '\n', _bufferPos, _bufferEnd - _bufferPos);
            int end = nl < 0 ? _bufferEnd : nl;
            _line.Append(_buffer, _bufferPos, end - _bufferPos);
            _bufferPos = nl < 0 ? _bufferEnd : nl + 1;
            // One more character than the limit is allowed before the end: it may be the CR of a CRLF.
            if (_line.Length > _maxLine + 1 || (nl >= 0 && TrimmedLength(_line) > _maxLine))
            {
                Line++;
                throw new InputError(new Diagnostic(Codes.LineTooLong, Severity.Error,
                    nl >= 0
                        ? $"line is {TrimmedLength(_line)} characters long, more than the limit of {_maxLine} (raise it with --max-line-length)"
                        : $"line is longer than the limit of {_maxLine} characters (raise it with --max-line-length)",
                    new SourceLocation(_file, Line, 1)));
            }
            if (nl >= 0)
            {
                Line++;
                return TrimCr(_line);
            }
        }
    }

    private static int TrimmedLength(System.Text.StringBuilder sb) =>
        sb.Length > 0 && sb[^1] == '\r' ? sb.Length - 1 : sb.Length;

    private static string TrimCr(System.Text.StringBuilder sb) => sb.ToString(0, TrimmedLength(sb));

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
