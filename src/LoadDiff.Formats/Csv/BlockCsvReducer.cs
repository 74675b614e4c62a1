using System.Buffers;
using System.Text;
using csFastFloat;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// Reduces large point-load and triangle-row CSV files without building items: the file is cut into
/// blocks of whole lines (fixed size, so the cut does not depend on the thread count), the blocks of a
/// batch are parsed on all cores into one accumulator each, and the accumulators are merged in file
/// order. Results are therefore identical whether one thread or many parse. Memory is a few blocks.
/// </summary>
/// <remarks>
/// The splitter is written here rather than taken from a CSV library because it must report the
/// exact line and column of every error, never pad a short row, and cut blocks deterministically;
/// numbers are parsed with csFastFloat and checked to consume the whole field.
/// </remarks>
internal sealed class BlockCsvReducer
{
    /// <summary>Size of one block of lines.</summary>
    public const int BlockSize = 4 << 20;

    private const int Largest = 3;

    private readonly string _display;
    private readonly ReadOptions _options;
    private readonly UnitConversion _units;
    private readonly int _threads;

    public BlockCsvReducer(string display, ReadOptions options, UnitConversion units, int threads)
    {
        _display = display;
        _options = options;
        _units = units;
        _threads = Math.Max(1, threads);
    }

    /// <summary>The layout of a header, or null when it is neither kind this reducer handles.</summary>
    private sealed record Layout(string Name, int[] Columns, int Id, int FieldCount, bool Moments, string[] Names);

    /// <summary>Reduces the whole file into the sink's current case; returns the number of items.</summary>
    /// <param name="path">File to read.</param>
    /// <param name="sink">Receives the reduced blocks.</param>
    /// <param name="expected">A layout name of <see cref="CsvLayouts"/>, or null to detect it.</param>
    /// <param name="pointPrefix">Prefix of the ids of point loads ("" for none).</param>
    /// <param name="meshId">The id of a mesh's triangles.</param>
    /// <param name="direction">Force direction of mesh triangles (null: the normal).</param>
    /// <param name="countItems">Adds a number of items to the file's count and returns the total.</param>
    public void Reduce(string path, IReducedBlockSink sink, string? expected, string pointPrefix, string meshId, Vector3? direction, Func<long, long> countItems)
    {
        var info = new FileInfo(path);
        if (info.Length > _options.MaxCsvBytes)
        {
            throw new InputError(new Diagnostic(Codes.FileTooLarge, Severity.Error,
                $"file is {info.Length} bytes, more than the limit of {_options.MaxCsvBytes}", new SourceLocation(_display)));
        }
        try
        {
            ReduceFile(path, sink, expected, pointPrefix, meshId, direction, countItems);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new InputError(new Diagnostic(Codes.FileUnreadable, Severity.Error, "cannot read the file: " + e.Message, new SourceLocation(_display)));
        }
    }

    private void ReduceFile(string path, IReducedBlockSink sink, string? expected, string pointPrefix, string meshId, Vector3? direction, Func<long, long> countItems)
    {
        using var stream = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan);
        int blockSize = Math.Max(BlockSize, (2 * _options.MaxLineLength) + 16);
        byte[] carry = new byte[blockSize];
        int carryLength = 0;
        bool eof = false;
        Layout layout = ReadHeader(stream, carry, ref carryLength, ref eof, expected);
        string idPrefix = layout.Name == CsvLayouts.TriangleRows ? meshId : pointPrefix;
        long nextLine = 2;
        ReductionAccumulator? meshTotal = layout.Name == CsvLayouts.TriangleRows ? new ReductionAccumulator() : null;
        var pool = ArrayPool<byte>.Shared;
        int batch = 2 * _threads;
        var blocks = new (byte[] Data, int Length, long FirstLine)[batch];
        var results = new BlockResult[batch];
        while (carryLength > 0 || !eof)
        {
            int n = 0;
            while (n < batch && (carryLength > 0 || !eof))
            {
                byte[] data = pool.Rent(blockSize);
                Buffer.BlockCopy(carry, 0, data, 0, carryLength);
                int length = carryLength;
                while (!eof && length < blockSize)
                {
                    int read = stream.Read(data, length, blockSize - length);
                    if (read == 0)
                    {
                        eof = true;
                    }
                    length += read;
                    _options.BytesRead?.Invoke(read);
                }
                int end = length;
                if (!eof)
                {
                    int lastNewline = data.AsSpan(0, length).LastIndexOf((byte)'\n');
                    if (lastNewline < 0)
                    {
                        throw Fail(Codes.LineTooLong, $"a line is longer than the limit of {_options.MaxLineLength} characters (raise it with --max-line-length)", nextLine, 1);
                    }
                    end = lastNewline + 1;
                }
                carryLength = length - end;
                Buffer.BlockCopy(data, end, carry, 0, carryLength);
                blocks[n] = (data, end, nextLine);
                nextLine += data.AsSpan(0, end).Count((byte)'\n');
                n++;
            }
            if (_threads == 1 || n == 1)
            {
                for (int i = 0; i < n; i++)
                {
                    results[i] = ParseBlock(blocks[i].Data, blocks[i].Length, blocks[i].FirstLine, layout, idPrefix, direction);
                }
            }
            else
            {
                Parallel.For(0, n, new ParallelOptions { MaxDegreeOfParallelism = _threads },
                    i => results[i] = ParseBlock(blocks[i].Data, blocks[i].Length, blocks[i].FirstLine, layout, idPrefix, direction));
            }
            for (int i = 0; i < n; i++)
            {
                pool.Return(blocks[i].Data);
                BlockResult r = results[i];
                if (r.Error is { } error)
                {
                    throw new InputError(error);
                }
                if (countItems(r.Items) > _options.MaxItems)
                {
                    throw Fail(Codes.TooManyItems, $"more than {_options.MaxItems} items (raise the limit with --max-items)", blocks[i].FirstLine, 1);
                }
                sink.AddReducedBlock(r.Accumulator, meshTotal is null ? r.Largest : []);
                meshTotal?.AddScaled(r.Accumulator, 1);
                results[i] = default;
            }
        }
        if (meshTotal is { Count: > 0 })
        {
            LoadReduction total = meshTotal.ResultAt(meshTotal.Anchor ?? Vector3.Zero);
            sink.AddReducedBlock(new ReductionAccumulator(),
                [new Contributor(idPrefix, LoadKind.MeshTriangle, total.Force, Vector3.Zero, total.Centroid, meshTotal.Count)]);
        }
    }

    private Layout ReadHeader(FileStream stream, byte[] carry, ref int carryLength, ref bool eof, string? expected)
    {
        int newline;
        while ((newline = carry.AsSpan(0, carryLength).IndexOf((byte)'\n')) < 0 && !eof)
        {
            if (carryLength == carry.Length)
            {
                throw Fail(Codes.LineTooLong, $"the header is longer than the limit of {_options.MaxLineLength} characters", 1, 1);
            }
            int read = stream.Read(carry, carryLength, carry.Length - carryLength);
            if (read == 0)
            {
                eof = true;
            }
            carryLength += read;
        }
        int headerEnd = newline < 0 ? carryLength : newline;
        ReadOnlySpan<byte> headerBytes = carry.AsSpan(0, headerEnd);
        if (headerBytes.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]))
        {
            headerBytes = headerBytes[3..];
        }
        string header;
        try
        {
            header = new UTF8Encoding(false, true).GetString(headerBytes).TrimEnd('\r');
        }
        catch (DecoderFallbackException)
        {
            throw Fail(Codes.InvalidUtf8, "the file is not valid UTF-8 text", 1, 1);
        }
        if (header.Trim().Length == 0)
        {
            // nothing read yet: the whole file is meant
            throw new InputError(new Diagnostic(Codes.CsvNoHeader, Severity.Error,
                "the CSV file is empty; expected a header row naming the columns", new SourceLocation(_display)));
        }
        string[] raw = header.Split(',');
        string[] names = raw.Select(h => h.Trim().Trim('"').ToLowerInvariant()).ToArray();
        for (int i = 0, column = 1; i < names.Length; column += raw[i].Length + 1, i++)
        {
            if (Array.IndexOf(names, names[i]) != i)
            {
                int lead = raw[i].Length - raw[i].TrimStart().Length;
                throw Fail(Codes.CsvDuplicateColumn, $"column '{names[i]}' appears twice in the header", 1, column + lead);
            }
        }
        int consumed = newline < 0 ? carryLength : newline + 1;
        Buffer.BlockCopy(carry, consumed, carry, 0, carryLength - consumed);
        carryLength -= consumed;
        string layout = expected ?? CsvLoadReader.DetectLayout(names)
            ?? throw Fail(Codes.CsvUnknownLayout, "cannot tell the layout from the header: a point-load table has fx, fy, fz; a triangle mesh has x1 … p3", 1, 1);
        string[] required = layout == CsvLayouts.PointLoads
            ? ["x", "y", "z", "fx", "fy", "fz"]
            : ["x1", "y1", "z1", "x2", "y2", "z2", "x3", "y3", "z3", "p1", "p2", "p3"];
        var columns = new List<int>();
        foreach (string r in required)
        {
            int c = Array.IndexOf(names, r);
            if (c < 0)
            {
                throw Fail(Codes.CsvMissingColumn, $"missing column '{r}'; a {layout} needs the columns {string.Join(", ", required)}", 1, 1);
            }
            columns.Add(c);
        }
        bool moments = false;
        if (layout == CsvLayouts.PointLoads)
        {
            int[] m = [Array.IndexOf(names, "mx"), Array.IndexOf(names, "my"), Array.IndexOf(names, "mz")];
            if (m.Any(x => x >= 0))
            {
                string? absent = m[0] < 0 ? "mx" : m[1] < 0 ? "my" : m[2] < 0 ? "mz" : null;
                if (absent is not null)
                {
                    throw Fail(Codes.CsvMissingColumn, $"missing column '{absent}': moments need all of mx, my, mz", 1, 1);
                }
                columns.AddRange(m);
                moments = true;
            }
        }
        return new Layout(layout, [.. columns], Array.IndexOf(names, "id"), names.Length, moments, names);
    }

    private readonly struct BlockResult
    {
        public BlockResult(ReductionAccumulator accumulator, List<Contributor> largest, long items, Diagnostic? error)
        {
            Accumulator = accumulator;
            Largest = largest;
            Items = items;
            Error = error;
        }

        public ReductionAccumulator Accumulator { get; }

        public List<Contributor> Largest { get; }

        public long Items { get; }

        public Diagnostic? Error { get; }
    }

    private BlockResult ParseBlock(byte[] data, int length, long firstLine, Layout layout, string idPrefix, Vector3? direction)
    {
        var acc = new ReductionAccumulator();
        var largest = new List<Contributor>(Largest + 1);
        Span<int> starts = stackalloc int[layout.FieldCount + 1];
        Span<int> ends = stackalloc int[layout.FieldCount + 1];
        Span<double> v = stackalloc double[layout.Columns.Length];
        long line = firstLine - 1;
        long items = 0;
        int pos = 0;
        if (!System.Text.Unicode.Utf8.IsValid(data.AsSpan(0, length)))
        {
            int bad = FirstInvalid(data.AsSpan(0, length));
            int lineStartOfBad = data.AsSpan(0, bad).LastIndexOf((byte)'\n') + 1;
            return Error(Codes.InvalidUtf8, $"invalid UTF-8 byte 0x{data[bad]:X2}; CSV files must be UTF-8 text",
                firstLine + data.AsSpan(0, bad).Count((byte)'\n'), Column(data, lineStartOfBad, bad - lineStartOfBad));
        }
        double fl = _units.Length, ff = _units.Force, fm = _units.Moment, fp = _units.Pressure;
        bool triangles = layout.Name == CsvLayouts.TriangleRows;
        // Blocks without quotes take a one-pass scanner; any line it cannot read is read again by the general path,
        // which also words every error.
        bool plain = data.AsSpan(0, length).IndexOf((byte)'"') < 0;
        int[] valueOfField = new int[layout.FieldCount];
        Array.Fill(valueOfField, -1);
        for (int k = 0; k < layout.Columns.Length; k++)
        {
            valueOfField[layout.Columns[k]] = k;
        }
        try
        {
            while (pos < length)
            {
                line++;
                int nl = data.AsSpan(pos, length - pos).IndexOf((byte)'\n');
                int lineEnd = nl < 0 ? length : pos + nl;
                int next = lineEnd + 1;
                if (lineEnd > pos && data[lineEnd - 1] == (byte)'\r')
                {
                    lineEnd--;
                }
                ReadOnlySpan<byte> row = data.AsSpan(pos, lineEnd - pos);
                int lineStart = pos;
                pos = next;
                if (row.Length > _options.MaxLineLength)
                {
                    return Error(Codes.LineTooLong, $"line is longer than the limit of {_options.MaxLineLength} characters (raise it with --max-line-length)", line, 1);
                }
                if (row.IsEmpty || (row[0] <= (byte)' ' && Blank(row)))
                {
                    continue;
                }
                bool scanned = plain && ScanRow(row, valueOfField, v);
                string? splitError = null;
                int fields = scanned ? layout.FieldCount : Split(row, starts, ends, out splitError);
                if (!scanned && splitError is not null)
                {
                    return Error(Codes.CsvRaggedRow, splitError, line, 1);
                }
                if (fields != layout.FieldCount)
                {
                    return Error(Codes.CsvRaggedRow, $"row has {fields} fields, the header has {layout.FieldCount}", line, 1);
                }
                for (int k = 0; !scanned && k < layout.Columns.Length; k++)
                {
                    int c = layout.Columns[k];
                    ReadOnlySpan<byte> f = TrimSpaces(row[starts[c]..ends[c]]);
                    double x;
                    int used = f.Length;
                    if (!DecimalFastPath.TryParse(f, out x)
                        && (!FastDoubleParser.TryParseDouble(f, out used, out x) || used != f.Length || f.Length == 0 || !double.IsFinite(x)))
                    {
                        // a quoted field is reported at its opening quote
                        int quoteAt = starts[c] > 0 && row[starts[c] - 1] == (byte)'"' ? starts[c] - 1 : starts[c];
                        string text = Text(f), name = layout.Names[c];
                        return IsNonFiniteWord(text)
                            ? Error(Codes.NotFinite, $"'{text}' in column '{name}' is not accepted: NaN and infinity are input errors", line, Column(data, lineStart, quoteAt))
                            : used == f.Length && f.Length > 0
                                ? Error(Codes.NotFinite, $"'{text}' in column '{name}' overflows a double", line, Column(data, lineStart, quoteAt))
                                : Error(Codes.CsvBadNumber, $"'{text}' in column '{name}' is not a number (use a point as decimal separator)", line, Column(data, lineStart, quoteAt));
                    }
                    if (Math.Abs(x) > Codes.MaxMagnitude)
                    {
                        return Error(Codes.OutOfRange, $"'{Text(f)}' in column '{layout.Names[c]}' exceeds the largest magnitude accepted (1e100)", line, Column(data, lineStart, starts[c]));
                    }
                    v[k] = x;
                }
                if (triangles)
                {
                    Vector3 a = Vector3.Create(v[0] * fl, v[1] * fl, v[2] * fl);
                    Vector3 b = Vector3.Create(v[3] * fl, v[4] * fl, v[5] * fl);
                    Vector3 c = Vector3.Create(v[6] * fl, v[7] * fl, v[8] * fl);
                    if (direction is null)
                    {
                        double scale = Math.Max((b - a).LengthSquared, (c - a).LengthSquared);
                        if (Vector3.Cross(b - a, c - a).Length <= 1e-12 * scale)
                        {
                            return Error(Codes.DegenerateTriangle, "the triangle has no area, so its normal is undefined", line, 1);
                        }
                    }
                    acc.AddTriangle(a, b, c, v[9] * fp, v[10] * fp, v[11] * fp, direction);
                    items++;
                    continue;
                }
                Vector3 at = Vector3.Create(v[0] * fl, v[1] * fl, v[2] * fl);
                Vector3 force = Vector3.Create(v[3] * ff, v[4] * ff, v[5] * ff);
                acc.AddPointForce(at, force);
                items++;
                double mag = force.Length;
                if (largest.Count < Largest || mag > largest[^1].Magnitude)
                {
                    if (scanned)
                    {
                        Split(row, starts, ends, out _);
                    }
                    Keep(largest, new Contributor(Id(row, starts, ends, layout.Id, line, idPrefix), LoadKind.Force, force, Vector3.Zero, at, 1));
                }
                if (layout.Moments)
                {
                    Vector3 m = Vector3.Create(v[6] * fm, v[7] * fm, v[8] * fm);
                    if (!m.IsZero)
                    {
                        acc.AddCouple(m);
                        items++;
                    }
                }
            }
        }
        catch (OverflowException)
        {
            return Error(Codes.OutOfRange, "values on this line overflow when multiplied (unit conversion or moment)", line, 1);
        }
        return new BlockResult(acc, largest, items, null);
    }

    // One pass over a line without quotes: skips text fields, parses number fields with the exact fast path and
    // checks the field count. False for anything unusual; the caller then reads the line the general way.
    private static bool ScanRow(ReadOnlySpan<byte> row, int[] valueOfField, Span<double> v)
    {
        int pos = 0;
        for (int f = 0; f < valueOfField.Length; f++)
        {
            if (f > 0)
            {
                if (pos >= row.Length || row[pos] != (byte)',')
                {
                    return false;
                }
                pos++;
            }
            int k = valueOfField[f];
            if (k < 0)
            {
                int comma = row[pos..].IndexOf((byte)',');
                pos = comma < 0 ? row.Length : pos + comma;
                continue;
            }
            if (!DecimalFastPath.TryParsePrefix(row[pos..], out double x, out int used))
            {
                return false;
            }
            v[k] = x;
            pos += used;
        }
        return pos == row.Length;
    }

    private static bool Blank(ReadOnlySpan<byte> row)
    {
        foreach (byte b in row)
        {
            if (b != (byte)' ' && b != (byte)'\t')
            {
                return false;
            }
        }
        return true;
    }

    // Spaces and tabs around a field are allowed; the common case has none, so look at the ends only.
    private static ReadOnlySpan<byte> TrimSpaces(ReadOnlySpan<byte> f)
    {
        int a = 0, b = f.Length;
        while (a < b && (f[a] == (byte)' ' || f[a] == (byte)'\t'))
        {
            a++;
        }
        while (b > a && (f[b - 1] == (byte)' ' || f[b - 1] == (byte)'\t'))
        {
            b--;
        }
        return f[a..b];
    }

    private static int FirstInvalid(ReadOnlySpan<byte> bytes)
    {
        int pos = 0;
        while (pos < bytes.Length)
        {
            if (Rune.DecodeFromUtf8(bytes[pos..], out _, out int consumed) != OperationStatus.Done)
            {
                return pos;
            }
            pos += consumed;
        }
        return 0;
    }

    private static void Keep(List<Contributor> list, Contributor c)
    {
        int i = list.FindIndex(x => c.Magnitude > x.Magnitude);
        list.Insert(i < 0 ? list.Count : i, c);
        if (list.Count > Largest)
        {
            list.RemoveAt(list.Count - 1);
        }
    }

    private static string Id(ReadOnlySpan<byte> row, Span<int> starts, Span<int> ends, int column, long line, string prefix)
    {
        string id = column >= 0
            ? Encoding.UTF8.GetString(row[starts[column]..ends[column]]).Trim().Trim('"')
            : "row" + line.ToString(System.Globalization.CultureInfo.InvariantCulture);
        return prefix.Length > 0 ? prefix + "/" + id : id;
    }

    // Splits one line into fields; a field may be double-quoted ("" is a quote). Returns the field count.
    private static int Split(ReadOnlySpan<byte> row, Span<int> starts, Span<int> ends, out string? error)
    {
        error = null;
        int count = 0;
        int i = 0;
        while (true)
        {
            if (count == starts.Length)
            {
                return count + 1 + row[i..].Count((byte)','); // more fields than the header: report the count
            }
            if (i < row.Length && row[i] == (byte)'"')
            {
                int j = i + 1;
                while (true)
                {
                    if (j >= row.Length)
                    {
                        error = "a quoted field is not closed";
                        return count;
                    }
                    if (row[j] == (byte)'"')
                    {
                        if (j + 1 < row.Length && row[j + 1] == (byte)'"')
                        {
                            j += 2;
                            continue;
                        }
                        break;
                    }
                    j++;
                }
                starts[count] = i + 1;
                ends[count] = j;
                count++;
                i = j + 1;
                if (i < row.Length && row[i] != (byte)',')
                {
                    error = "unexpected text after a quoted field";
                    return count;
                }
            }
            else
            {
                int comma = row[i..].IndexOf((byte)',');
                int end = comma < 0 ? row.Length : i + comma;
                starts[count] = i;
                ends[count] = end;
                count++;
                i = end;
            }
            if (i >= row.Length)
            {
                return count;
            }
            i++;
        }
    }

    private static int Column(byte[] data, int lineStart, int offsetInLine)
    {
        int n = 0;
        for (int i = lineStart; i < lineStart + offsetInLine; i++)
        {
            if ((data[i] & 0xC0) != 0x80)
            {
                n++;
            }
        }
        return n + 1;
    }

    private static string Text(ReadOnlySpan<byte> f) => Encoding.UTF8.GetString(f);

    // The words the invariant culture reads as non-finite numbers.
    private static bool IsNonFiniteWord(string s) =>
        s.TrimStart('+', '-').ToLowerInvariant() is "nan" or "infinity" or "∞";

    private BlockResult Error(string code, string message, long line, int column) =>
        new(new ReductionAccumulator(), [], 0, new Diagnostic(code, Severity.Error, message, new SourceLocation(_display, (int)Math.Min(line, int.MaxValue), column)));

    private InputError Fail(string code, string message, long line, int column) =>
        new(new Diagnostic(code, Severity.Error, message, new SourceLocation(_display, (int)Math.Min(line, int.MaxValue), column)));
}
