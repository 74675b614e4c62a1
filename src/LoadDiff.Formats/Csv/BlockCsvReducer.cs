using System.Buffers;
using System.Text;
using Microsoft.Win32.SafeHandles;
using csFastFloat;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Csv;

/// <summary>
/// Reduces large point-load and triangle-row CSV files without building items: the data are cut into fixed
/// byte ranges (so the cut does not depend on the thread count); each block owns the lines that start in its
/// range, reads them with its own positioned read, parses them into one accumulator, and the accumulators are
/// merged in file order. Results are therefore identical whether one thread or many parse. Memory is one
/// buffer per worker.
/// </summary>
/// <remarks>
/// The splitter is written here rather than taken from a CSV library because it must report the
/// exact line and column of every error, never pad a short row, and cut blocks deterministically;
/// the common line is read by <see cref="PlainRowScanner"/>, every other one field by field with
/// csFastFloat, checked to consume the whole field.
/// </remarks>
internal sealed class BlockCsvReducer
{
    /// <summary>Size of one block of lines.</summary>
    public const int BlockSize = 1 << 20;

    private const int Largest = 3;

    // Rows per column batch handed to the accumulator.
    private const int Batch = 512;

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
        CsvFileGate.Check(path, _display, _options);
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
        using SafeFileHandle handle = File.OpenHandle(path, FileMode.Open, FileAccess.Read, FileShare.Read, FileOptions.SequentialScan);
        long fileLength = RandomAccess.GetLength(handle);
        int blockSize = _options.CsvBlockSize ?? BlockSize;
        (Layout layout, long dataStart) = ReadHeader(handle, fileLength, expected);
        string idPrefix = layout.Name == CsvLayouts.TriangleRows ? meshId : pointPrefix;
        var plan = new BlockPlan(handle, fileLength, dataStart, blockSize, layout, idPrefix, direction);
        int count = (int)((fileLength - dataStart + blockSize - 1) / blockSize);
        ReductionAccumulator? meshTotal = layout.Name == CsvLayouts.TriangleRows ? new ReductionAccumulator() : null;
        long nextLine = 2;

        void Merge(BlockResult r)
        {
            r.Failure?.Throw();
            if (r.Error is { } e)
            {
                throw Fail(e.Code, e.Message, nextLine + e.Line - 1, e.Column);
            }
            if (countItems(r.Items) > _options.MaxItems)
            {
                throw Fail(Codes.TooManyItems, $"more than {_options.MaxItems} items (raise the limit with --max-items)", nextLine, 1);
            }
            var largest = new List<Contributor>(r.Largest.Count);
            foreach (LargestRow row in r.Largest)
            {
                if (row.Id is { } kept && LoadDiff.Core.Text.NameCharacters.FirstForbidden(kept) is int bad and >= 0)
                {
                    throw Fail(Codes.InvalidId, LoadDiff.Core.Text.NameCharacters.Describe("an id", kept, bad), nextLine + row.Line - 1, 1);
                }
                string id = row.Id ?? "row" + (nextLine + row.Line - 1).ToString(System.Globalization.CultureInfo.InvariantCulture);
                largest.Add(new Contributor(idPrefix.Length > 0 ? idPrefix + "/" + id : id, LoadKind.Force, row.Force, Vector3.Zero, row.At, 1));
            }
            sink.AddReducedBlock(r.Accumulator, meshTotal is null ? largest : []);
            meshTotal?.AddScaled(r.Accumulator, 1);
            nextLine += r.Newlines;
            _options.BytesRead?.Invoke(r.Bytes);
        }

        if (_threads == 1 || count <= 1)
        {
            var worker = new BlockWorker(this, plan);
            for (int k = 0; k < count; k++)
            {
                Merge(worker.Parse(k));
            }
        }
        else
        {
            ParseInParallel(plan, count, Merge);
        }
        if (meshTotal is { Count: > 0 })
        {
            LoadReduction total = meshTotal.ResultAt(meshTotal.Anchor ?? Vector3.Zero);
            sink.AddReducedBlock(new ReductionAccumulator(),
                [new Contributor(idPrefix, LoadKind.MeshTriangle, total.Force, Vector3.Zero, total.Centroid, meshTotal.Count)]);
        }
    }

    // Worker threads take blocks in file order and parse them; this thread merges the results in file order as
    // they arrive (so progress and the item limit are seen early) and stops the workers at the first error.
    private void ParseInParallel(BlockPlan plan, int count, Action<BlockResult> merge)
    {
        var results = new BlockResult?[count];
        var gate = new object();
        int next = -1, stopAfter = int.MaxValue;
        void Work()
        {
            BlockWorker? worker = null;
            int k;
            while ((k = Interlocked.Increment(ref next)) < count && k <= Volatile.Read(ref stopAfter))
            {
                BlockResult r;
                try
                {
                    worker ??= new BlockWorker(this, plan);
                    r = worker.Parse(k);
                }
                catch (Exception e)
                {
                    // every failure, out of memory included, goes to the merging thread, which waits for this block
                    r = BlockResult.Failed(System.Runtime.ExceptionServices.ExceptionDispatchInfo.Capture(e));
                }
                if (r.Error is not null || r.Failure is not null)
                {
                    int seen;
                    while (k < (seen = Volatile.Read(ref stopAfter)) && Interlocked.CompareExchange(ref stopAfter, k, seen) != seen)
                    {
                    }
                }
                lock (gate)
                {
                    results[k] = r;
                    Monitor.PulseAll(gate);
                }
            }
        }
        var workers = new Task[Math.Min(_threads, count)];
        for (int i = 0; i < workers.Length; i++)
        {
            workers[i] = Task.Factory.StartNew(Work, CancellationToken.None, TaskCreationOptions.LongRunning, TaskScheduler.Default);
        }
        try
        {
            for (int k = 0; k < count; k++)
            {
                BlockResult r;
                lock (gate)
                {
                    while (results[k] is null)
                    {
                        Monitor.Wait(gate);
                    }
                    r = results[k]!;
                    results[k] = null;
                }
                merge(r);
            }
        }
        finally
        {
            // an error or the item limit ends the reading: let the workers finish their block and stop
            Volatile.Write(ref stopAfter, -1);
            Task.WaitAll(workers);
        }
    }

    private (Layout Layout, long DataStart) ReadHeader(SafeFileHandle handle, long fileLength, string? expected)
    {
        byte[] head = new byte[(int)Math.Min(fileLength, (long)_options.MaxLineLength + 2)];
        int got = ReadAt(handle, 0, head, 0, head.Length);
        int newline = head.AsSpan(0, got).IndexOf((byte)'\n');
        if (newline < 0 && got < fileLength)
        {
            throw Fail(Codes.LineTooLong, $"the header is longer than the limit of {_options.MaxLineLength} characters", 1, 1);
        }
        int headerEnd = newline < 0 ? got : newline;
        ReadOnlySpan<byte> headerBytes = head.AsSpan(0, headerEnd);
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
        if (header.IndexOf('\r', StringComparison.Ordinal) is int cr and >= 0)
        {
            throw Fail(Codes.CsvCarriageReturnLines, CsvText.LoneCarriageReturn, 1, header.AsSpan(0, cr).Length + 1);
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
        long dataStart = newline < 0 ? got : newline + 1;
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
        return (new Layout(layout, [.. columns], Array.IndexOf(names, "id"), names.Length, moments, names), dataStart);
    }

    // Reads count bytes at offset, fewer only at the end of the file.
    private static int ReadAt(SafeFileHandle handle, long offset, byte[] buffer, int index, int count)
    {
        int total = 0;
        while (total < count)
        {
            int read = RandomAccess.Read(handle, buffer.AsSpan(index + total, count - total), offset + total);
            if (read == 0)
            {
                break;
            }
            total += read;
        }
        return total;
    }

    /// <summary>What every block needs to know of the file.</summary>
    private sealed record BlockPlan(SafeFileHandle Handle, long FileLength, long DataStart, int BlockSize, Layout Layout, string IdPrefix, Vector3? Direction);

    /// <summary>An error found in a block, at a line counted from the block's first line (1).</summary>
    private sealed record BlockError(string Code, string Message, long Line, int Column);

    /// <summary>One of the largest forces of a block; <see cref="Id"/> is null when the file has no id column.</summary>
    private sealed record LargestRow(string? Id, long Line, Vector3 Force, Vector3 At, double Magnitude);

    private sealed class BlockResult
    {
        public ReductionAccumulator Accumulator { get; init; } = new();

        public List<LargestRow> Largest { get; init; } = [];

        public long Items { get; init; }

        /// <summary>Line feeds in the block: the first line of the next block is this many lines further on.</summary>
        public long Newlines { get; init; }

        public long Bytes { get; init; }

        public BlockError? Error { get; init; }

        public System.Runtime.ExceptionServices.ExceptionDispatchInfo? Failure { get; init; }

        public static BlockResult Failed(System.Runtime.ExceptionServices.ExceptionDispatchInfo failure) => new() { Failure = failure };
    }

    /// <summary>
    /// Parses blocks: block k holds the lines that start within its fixed byte range of the data, read with its
    /// own positioned read (so workers read in parallel too). Buffers and column arrays are kept between blocks.
    /// </summary>
    private sealed class BlockWorker
    {
        // Bytes read past a block's range to find the end of its last line; more are read when it is longer.
        private const int Lookahead = 4096;

        private readonly BlockCsvReducer _reducer;
        private readonly BlockPlan _plan;
        private readonly int[] _valueOfField;
        private readonly double[] _x = new double[Batch], _y = new double[Batch], _z = new double[Batch];
        private readonly double[] _fx = new double[Batch], _fy = new double[Batch], _fz = new double[Batch];
        private readonly double[] _magnitude = new double[Batch];
        private readonly int[] _rowStart = new int[Batch], _rowEnd = new int[Batch];
        private readonly long[] _rowLine = new long[Batch];
        private readonly double[] _digits, _scales;
        private readonly int[] _starts, _ends;
        private byte[] _buffer;

        public BlockWorker(BlockCsvReducer reducer, BlockPlan plan)
        {
            _reducer = reducer;
            _plan = plan;
            _buffer = new byte[plan.BlockSize + Lookahead + PlainRowScanner.Padding + 1];
            _valueOfField = new int[plan.Layout.FieldCount];
            _starts = new int[plan.Layout.FieldCount + 1];
            _digits = new double[plan.Layout.Columns.Length * Batch];
            _scales = new double[plan.Layout.Columns.Length * Batch];
            _ends = new int[plan.Layout.FieldCount + 1];
            Array.Fill(_valueOfField, -1);
            for (int k = 0; k < plan.Layout.Columns.Length; k++)
            {
                _valueOfField[plan.Layout.Columns[k]] = k;
            }
        }

        public BlockResult Parse(int k)
        {
            BlockPlan p = _plan;
            long s = p.DataStart + ((long)k * p.BlockSize);
            long sNext = Math.Min(s + p.BlockSize, p.FileLength);
            long r0 = k == 0 ? s : s - 1;
            int length = Fill(r0, 0, (int)(Math.Min(p.FileLength, sNext + Lookahead) - r0));
            int begin = 0;
            if (k > 0)
            {
                int first = _buffer.AsSpan(0, (int)(sNext - 1 - r0)).IndexOf((byte)'\n');
                if (first < 0)
                {
                    return new BlockResult(); // no line starts here: the block before owns them
                }
                begin = first + 1;
            }
            int end;
            if (sNext == p.FileLength)
            {
                end = length;
            }
            else
            {
                int from = (int)(sNext - 1 - r0);
                while (true)
                {
                    int q = _buffer.AsSpan(from, length - from).IndexOf((byte)'\n');
                    if (q >= 0)
                    {
                        end = from + q + 1;
                        break;
                    }
                    if (r0 + length >= p.FileLength)
                    {
                        end = length;
                        break;
                    }
                    int lastStart = _buffer.AsSpan(begin, (int)(sNext - 1 - r0) - begin).LastIndexOf((byte)'\n') + 1 + begin;
                    if (length - lastStart > _reducer._options.MaxLineLength)
                    {
                        long line = 1 + _buffer.AsSpan(begin, lastStart - begin).Count((byte)'\n');
                        return new BlockResult
                        {
                            Error = new BlockError(Codes.LineTooLong, $"a line is longer than the limit of {_reducer._options.MaxLineLength} characters (raise it with --max-line-length)", line, 1),
                        };
                    }
                    from = length;
                    length = Fill(r0, length, (int)Math.Min(p.FileLength - r0 - length, Lookahead * 16L));
                }
            }
            _buffer[end] = (byte)'\n'; // the scanner's sentinel
            return _reducer.ParseBlock(this, begin, end);
        }

        // Reads count bytes of the file at r0 + index into the buffer at index, growing it when needed; returns index + count.
        private int Fill(long r0, int index, int count)
        {
            int need = index + count + PlainRowScanner.Padding + 1;
            if (need > _buffer.Length)
            {
                Array.Resize(ref _buffer, Math.Max(need, _buffer.Length + (_buffer.Length / 2)));
            }
            int got = ReadAt(_plan.Handle, r0 + index, _buffer, index, count);
            if (got < count)
            {
                throw new IOException("the file became shorter while it was read");
            }
            return index + count;
        }

        public BlockPlan Plan => _plan;

        public double[] Digits => _digits;

        public double[] Scales => _scales;

        public int[] Starts => _starts;

        public int[] Ends => _ends;

        public byte[] Buffer => _buffer;

        public int[] ValueOfField => _valueOfField;

        public double[] X => _x;

        public double[] Y => _y;

        public double[] Z => _z;

        public double[] Fx => _fx;

        public double[] Fy => _fy;

        public double[] Fz => _fz;

        public double[] Magnitude => _magnitude;

        public int[] RowStart => _rowStart;

        public int[] RowEnd => _rowEnd;

        public long[] RowLine => _rowLine;
    }

    // into[i] = digits / scale · factor for the rows of column k: the quotient is the correctly rounded value read,
    // the factor the unit conversion (the same two roundings as reading the number and converting it).
    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]
    private static void Divide(double[] digits, double[] scales, int k, int n, double factor, double[] into)
    {
        ReadOnlySpan<double> d = digits.AsSpan(k * Batch, n), s = scales.AsSpan(k * Batch, n);
        int i = 0;
        if (System.Numerics.Vector.IsHardwareAccelerated)
        {
            var f = new System.Numerics.Vector<double>(factor);
            for (; i <= n - System.Numerics.Vector<double>.Count; i += System.Numerics.Vector<double>.Count)
            {
                (new System.Numerics.Vector<double>(d[i..]) / new System.Numerics.Vector<double>(s[i..]) * f).CopyTo(into, i);
            }
        }
        for (; i < n; i++)
        {
            into[i] = d[i] / s[i] * factor;
        }
    }

    [System.Runtime.CompilerServices.MethodImpl(System.Runtime.CompilerServices.MethodImplOptions.AggressiveOptimization)]
    private BlockResult ParseBlock(BlockWorker w, int begin, int length)
    {
        byte[] data = w.Buffer;
        Layout layout = w.Plan.Layout;
        var acc = new ReductionAccumulator();
        var largest = new List<LargestRow>(Largest + 1);
        int[] starts = w.Starts, ends = w.Ends;
        Span<double> v = stackalloc double[layout.Columns.Length];
        long line = 0;
        long items = 0;
        int pos = begin;
        int batched = 0;
        double threshold = double.NegativeInfinity; // the smallest magnitude kept, once the list is full
        BlockResult Error(string code, string message, long atLine, int column) =>
            new() { Error = new BlockError(code, message, atLine, column) };
        // An invalid byte is reported when its line is reached, so that an error on an earlier line comes first
        // (as it does when the file is cut at other places).
        int bad = int.MaxValue, badLineStart = int.MaxValue;
        if (!System.Text.Unicode.Utf8.IsValid(data.AsSpan(begin, length - begin)))
        {
            bad = begin + FirstInvalid(data.AsSpan(begin, length - begin));
            badLineStart = Math.Max(begin, data.AsSpan(0, bad).LastIndexOf((byte)'\n') + 1);
        }
        double fl = _units.Length, ff = _units.Force, fm = _units.Moment, fp = _units.Pressure;
        bool triangles = layout.Name == CsvLayouts.TriangleRows;
        Vector3? direction = w.Plan.Direction;
        int[] valueOfField = w.ValueOfField;
        double[] digits = w.Digits, scales = w.Scales;
        int maxLine = _options.MaxLineLength;

        // Hands the batched rows to the accumulator, then looks among them for the largest forces.
        BlockResult? Flush()
        {
            int n = batched;
            batched = 0;
            Divide(digits, scales, 0, n, fl, w.X);
            Divide(digits, scales, 1, n, fl, w.Y);
            Divide(digits, scales, 2, n, fl, w.Z);
            Divide(digits, scales, 3, n, ff, w.Fx);
            Divide(digits, scales, 4, n, ff, w.Fy);
            Divide(digits, scales, 5, n, ff, w.Fz);
            if (!acc.AddPointForces(w.X.AsSpan(0, n), w.Y.AsSpan(0, n), w.Z.AsSpan(0, n), w.Fx.AsSpan(0, n), w.Fy.AsSpan(0, n), w.Fz.AsSpan(0, n), w.Magnitude))
            {
                // a term overflowed: add the rows one at a time to find the line
                for (int i = 0; i < n; i++)
                {
                    try
                    {
                        Vector3 at = Vector3.Create(w.X[i], w.Y[i], w.Z[i]), force = Vector3.Create(w.Fx[i], w.Fy[i], w.Fz[i]);
                        acc.AddPointForce(at, force);
                        w.Magnitude[i] = force.Length;
                    }
                    catch (Exception e) when (e is OverflowException or ArgumentException)
                    {
                        return Error(Codes.OutOfRange, "values on this line overflow when multiplied (unit conversion or moment)", w.RowLine[i], 1);
                    }
                }
            }
            double[] magnitudes = w.Magnitude;
            for (int i = 0; i < n; i++)
            {
                double mag = magnitudes[i];
                if (mag > threshold || largest.Count < Largest)
                {
                    ReadOnlySpan<byte> row = data.AsSpan(w.RowStart[i], w.RowEnd[i] - w.RowStart[i]);
                    string? id = null;
                    if (layout.Id >= 0)
                    {
                        Split(row, starts, ends, out _);
                        id = Encoding.UTF8.GetString(row[starts[layout.Id]..ends[layout.Id]]).Trim().Trim('"');
                    }
                    Keep(largest, new LargestRow(id, w.RowLine[i], Vector3.Create(w.Fx[i], w.Fy[i], w.Fz[i]), Vector3.Create(w.X[i], w.Y[i], w.Z[i]), mag));
                    threshold = largest.Count < Largest ? double.NegativeInfinity : largest[^1].Magnitude;
                }
            }
            return null;
        }

        try
        {
            while (pos < length)
            {
                line++;
                int lineStart = pos;
                if (lineStart >= badLineStart)
                {
                    return Error(Codes.InvalidUtf8, $"invalid UTF-8 byte 0x{data[bad]:X2}; CSV files must be UTF-8 text", line, Column(data, lineStart, bad - lineStart));
                }
                if (data[pos] == (byte)'\n')
                {
                    pos++;
                    continue;
                }
                // points are batched (slot = row in the batch); other layouts use the first slot only
                int slot = triangles ? 0 : batched;
                int lineEnd = PlainRowScanner.TryScan(data, pos, valueOfField, digits, scales, Batch, slot);
                bool scanned = lineEnd >= 0;
                if (scanned)
                {
                    pos = lineEnd + (data[lineEnd] == (byte)'\r' ? 2 : 1);
                    if (lineEnd - lineStart > maxLine)
                    {
                        return Error(Codes.LineTooLong, $"line is longer than the limit of {maxLine} characters (raise it with --max-line-length)", line, 1);
                    }
                }
                else
                {
                    int nl = data.AsSpan(pos, length - pos).IndexOf((byte)'\n');
                    lineEnd = nl < 0 ? length : pos + nl;
                    pos = lineEnd + 1;
                    if (lineEnd > lineStart && data[lineEnd - 1] == (byte)'\r')
                    {
                        lineEnd--;
                    }
                    ReadOnlySpan<byte> row = data.AsSpan(lineStart, lineEnd - lineStart);
                    if (row.Length > maxLine)
                    {
                        return Error(Codes.LineTooLong, $"line is longer than the limit of {maxLine} characters (raise it with --max-line-length)", line, 1);
                    }
                    if (row.IsEmpty || (row[0] <= (byte)' ' && Blank(row)))
                    {
                        continue;
                    }
                    int fields = Split(row, starts, ends, out string? splitError);
                    if (splitError is not null)
                    {
                        return Error(Codes.CsvRaggedRow, splitError, line, 1);
                    }
                    if (fields != layout.FieldCount)
                    {
                        return Error(Codes.CsvRaggedRow, $"row has {fields} fields, the header has {layout.FieldCount}", line, 1);
                    }
                    for (int k = 0; k < layout.Columns.Length; k++)
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
                        digits[(k * Batch) + slot] = x;
                        scales[(k * Batch) + slot] = 1;
                    }
                }
                if (triangles)
                {
                    for (int k = 0; k < v.Length; k++)
                    {
                        v[k] = digits[k * Batch] / scales[k * Batch];
                    }
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
                batched++;
                w.RowStart[slot] = lineStart;
                w.RowEnd[slot] = lineEnd;
                w.RowLine[slot] = line;
                items++;
                if (layout.Moments)
                {
                    Vector3 m = Vector3.Create(
                        digits[(6 * Batch) + slot] / scales[(6 * Batch) + slot] * fm,
                        digits[(7 * Batch) + slot] / scales[(7 * Batch) + slot] * fm,
                        digits[(8 * Batch) + slot] / scales[(8 * Batch) + slot] * fm);
                    if (!m.IsZero)
                    {
                        acc.AddCouple(m);
                        items++;
                    }
                }
                if (batched == Batch && Flush() is { } failed)
                {
                    return failed;
                }
            }
            if (batched > 0 && Flush() is { } lastFailed)
            {
                return lastFailed;
            }
        }
        catch (Exception e) when (e is OverflowException or ArgumentException)
        {
            return Error(Codes.OutOfRange, "values on this line overflow when multiplied (unit conversion or moment)", line, 1);
        }
        return new BlockResult { Accumulator = acc, Largest = largest, Items = items, Newlines = length > begin && data[length - 1] != (byte)'\n' ? line - 1 : line, Bytes = length - begin };
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

    private static void Keep(List<LargestRow> list, LargestRow c)
    {
        int i = list.FindIndex(x => c.Magnitude > x.Magnitude);
        list.Insert(i < 0 ? list.Count : i, c);
        if (list.Count > Largest)
        {
            list.RemoveAt(list.Count - 1);
        }
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

    private InputError Fail(string code, string message, long line, int column) =>
        new(new Diagnostic(code, Severity.Error, message, new SourceLocation(_display, (int)Math.Min(line, int.MaxValue), column)));
}
