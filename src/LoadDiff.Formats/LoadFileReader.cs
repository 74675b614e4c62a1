using LoadDiff.Core.Model;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Json;

namespace LoadDiff.Formats;

/// <summary>
/// Reads a load description — a <c>.loads.json</c> document, or a CSV given directly (one case named after the
/// file stem) — into a sink. Bad input comes back as diagnostics, never as an exception.
/// </summary>
public static class LoadFileReader
{
    /// <summary>Reads a file from disk; <c>-</c> reads standard input as JSON.</summary>
    /// <param name="path">The file, as the user named it.</param>
    /// <param name="sink">Receives the header, cases, items and combinations.</param>
    /// <param name="options">Units and limits; defaults when null.</param>
    public static ReadResult Read(string path, ILoadSink sink, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(sink);
        options ??= new ReadOptions();
        var warnings = new List<Diagnostic>();
        try
        {
            if (path == "-")
            {
                byte[] bytes = StandardInput(options);
                return ReadJsonBytes(bytes, "-", Directory.GetCurrentDirectory(), sink, options, warnings);
            }
            RequireRegular(path, path);
            if (Directory.Exists(path))
            {
                throw Fail(Codes.FileUnreadable, "is a directory, not a load file", path);
            }
            if (!File.Exists(path))
            {
                throw Fail(Codes.FileUnreadable, "file not found", path);
            }
            string dir = Path.GetDirectoryName(Path.GetFullPath(path))!;
            if (path.EndsWith(".csv", StringComparison.OrdinalIgnoreCase))
            {
                return ReadCsv(path, path, sink, options, warnings);
            }
            if (new FileInfo(path).Length > options.StreamJsonAbove)
            {
                return ReadJsonStreamed(path, dir, sink, options, warnings);
            }
            byte[] data = ReadJsonFile(path, options);
            options.BytesRead?.Invoke(data.Length);
            return ReadJsonBytes(data, path, dir, sink, options, warnings);
        }
        catch (InputError e)
        {
            warnings.Add(e.Diagnostic);
            return new ReadResult(null, warnings);
        }
    }

    /// <summary>Reads JSON held in memory (standard input, or a file read through git); referenced files resolve against <paramref name="baseDirectory"/>.</summary>
    public static ReadResult ReadJson(byte[] utf8, string displayName, string baseDirectory, ILoadSink sink, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(utf8);
        ArgumentNullException.ThrowIfNull(sink);
        options ??= new ReadOptions();
        var warnings = new List<Diagnostic>();
        try
        {
            return ReadJsonBytes(utf8, displayName, baseDirectory, sink, options, warnings);
        }
        catch (InputError e)
        {
            warnings.Add(e.Diagnostic);
            return new ReadResult(null, warnings);
        }
    }

    /// <summary>
    /// Reads a CSV given directly (one case named after the stem of <paramref name="path"/>), every diagnostic naming
    /// <paramref name="displayName"/>: the operand as the user wrote it, when <paramref name="path"/> is a copy taken from a revision.
    /// </summary>
    public static ReadResult ReadCsv(string path, string displayName, ILoadSink sink, ReadOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(displayName);
        ArgumentNullException.ThrowIfNull(sink);
        options ??= new ReadOptions();
        var warnings = new List<Diagnostic>();
        try
        {
            RequireRegular(path, displayName);
            if (Directory.Exists(path))
            {
                throw Fail(Codes.FileUnreadable, "is a directory, not a load file", displayName);
            }
            if (!File.Exists(path))
            {
                throw Fail(Codes.FileUnreadable, "file not found", displayName);
            }
            return ReadCsv(path, displayName, sink, options, warnings);
        }
        catch (InputError e)
        {
            warnings.Add(e.Diagnostic);
            return new ReadResult(null, warnings);
        }
    }

    private static ReadResult ReadJsonBytes(byte[] bytes, string file, string dir, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings) =>
        ReadJsonBytes(bytes, file, dir, sink, options, warnings, null, null);

    /// <summary>The JSON path with hooks for the source-level reader: the parsed tree, and where each item begins.</summary>
    internal static ReadResult ReadJsonBytes(byte[] bytes, string file, string dir, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings,
        Action<JsonNode, int>? treeParsed, Action<int, string>? itemBegins)
    {
        if (bytes.AsSpan().StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || bytes.AsSpan().StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            throw Fail(Codes.InvalidUtf8, "the file is UTF-16 encoded; load files must be UTF-8", file, 1, 1);
        }

        // Positions are counted after a UTF-8 byte-order mark, which no editor shows as a column.
        byte[] text = bytes.AsSpan().StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]) ? bytes[3..] : bytes;
        var lines = new LineIndex(text);
        ReadOnlySpan<byte> span = text;
        if (span.Trim((ReadOnlySpan<byte>)[(byte)' ', (byte)'\t', (byte)'\r', (byte)'\n']).IsEmpty)
        {
            throw Fail(Codes.EmptyInput, "the file is empty; expected a JSON load description", file, 1, 1);
        }
        long bad = LineIndex.FirstInvalidUtf8(span);
        if (bad >= 0)
        {
            var (l, c) = lines.Locate(bad);
            throw Fail(Codes.InvalidUtf8, $"invalid UTF-8 byte 0x{text[bad]:X2}; load files must be UTF-8 text", file, l, c);
        }
        JsonNode root;
        try
        {
            root = JsonTreeParser.Parse(text, options.MaxDepth);
        }
        catch (JsonSyntaxError e)
        {
            long offset = e.ReaderLine is { } rl ? lines.OffsetOf(rl, e.ReaderBytePosition) : e.Offset;
            var (l, c) = lines.Locate(offset);
            throw SyntaxFailure(e, options, file, l, c);
        }
        catch (JsonDuplicateKey e)
        {
            var (l, c) = lines.Locate(e.Offset);
            throw DuplicateKeyFailure(e, file, l, c);
        }
        catch (InvalidOperationException)
        {
            throw Fail(Codes.InvalidUtf8, "the file holds text that is not valid UTF-8", file, 1, 1);
        }
        treeParsed?.Invoke(root, bytes.Length - text.Length);
        var walker = new LoadJsonWalker(file, lines, options, dir, warnings) { ItemBegins = itemBegins };
        DocumentHeader header = walker.Walk(root, sink);
        return new ReadResult(header, warnings);
    }

    // The checks and error mapping of ReadJsonBytes, for a file read in two streaming passes.
    private static ReadResult ReadJsonStreamed(string path, string dir, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings)
    {
        if (new FileInfo(path).Length > options.MaxCsvBytes)
        {
            throw Fail(Codes.FileTooLarge, $"file is larger than the limit of {options.MaxCsvBytes} bytes", path);
        }
        byte[] head = new byte[3];
        int got;
        using (FileStream f = File.OpenRead(path))
        {
            got = f.ReadAtLeast(head, 3, throwOnEndOfStream: false);
        }
        if (got >= 2 && ((head[0] == 0xFF && head[1] == 0xFE) || (head[0] == 0xFE && head[1] == 0xFF)))
        {
            throw Fail(Codes.InvalidUtf8, "the file is UTF-16 encoded; load files must be UTF-8", path, 1, 1);
        }
        long skip = got == 3 && head[0] == 0xEF && head[1] == 0xBB && head[2] == 0xBF ? 3 : 0;
        var lines = new FileLineLocator(path, skip);
        if (FileLineLocator.IsBlank(path, skip))
        {
            throw Fail(Codes.EmptyInput, "the file is empty; expected a JSON load description", path, 1, 1);
        }
        long bad = FileLineLocator.FirstInvalidUtf8(path, skip);
        if (bad >= 0)
        {
            var (l, c) = lines.Locate(bad);
            throw Fail(Codes.InvalidUtf8, "invalid UTF-8 byte; load files must be UTF-8 text", path, l, c);
        }
        JsonTokenPump Open() => new(new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1, FileOptions.SequentialScan), options.MaxDepth, skip);
        try
        {
            JsonNode skeleton = StreamingJsonReader.Skeleton(Open);
            using var feed = new StreamingJsonReader.CaseFeed(Open());
            var walker = new LoadJsonWalker(path, lines, options, dir, warnings);
            DocumentHeader header = walker.Walk(skeleton, sink, feed.ForCase);
            return new ReadResult(header, warnings);
        }
        catch (JsonSyntaxError e)
        {
            var (l, c) = e.ReaderLine is { } rl ? (rl + 1, 0) : lines.Locate(e.Offset);
            if (e.ReaderLine is not null)
            {
                c = ColumnOf(path, skip, rl: l - 1, e.ReaderBytePosition);
            }
            throw SyntaxFailure(e, options, path, l, c);
        }
        catch (JsonDuplicateKey e)
        {
            var (l, c) = lines.Locate(e.Offset);
            throw DuplicateKeyFailure(e, path, l, c);
        }
    }

    // The character column of a reader position given as (0-based line, byte in line).
    // The column (in characters) of a byte position in line rl (from 0, lines ending at LF as the JSON reader counts
    // them), read in blocks: a file of one endless line must not be held in memory to place an error at its start.
    private static int ColumnOf(string path, long skip, int rl, long bytePosition)
    {
        using var s = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan) { Position = skip };
        byte[] buffer = new byte[1 << 16];
        int line = 0, n = 0;
        long inLine = 0;
        int got;
        while ((got = s.Read(buffer, 0, buffer.Length)) > 0)
        {
            for (int i = 0; i < got; i++)
            {
                byte b = buffer[i];
                if (line < rl)
                {
                    line += b == (byte)'\n' ? 1 : 0;
                    continue;
                }
                if (inLine >= bytePosition || b == (byte)'\n')
                {
                    return n + 1;
                }
                n += (b & 0xC0) != 0x80 ? 1 : 0;
                inLine++;
            }
        }
        return n + 1;
    }

    /// <summary>The bytes of a JSON load file (standard input for <c>-</c>), within the size limit; throws <see cref="InputError"/>.</summary>
    internal static byte[] ReadJsonFile(string path, ReadOptions options)
    {
        if (path == "-")
        {
            return StandardInput(options);
        }
        RequireRegular(path, path);
        if (Directory.Exists(path))
        {
            throw Fail(Codes.FileUnreadable, "is a directory, not a load file", path);
        }
        if (!File.Exists(path))
        {
            throw Fail(Codes.FileUnreadable, "file not found", path);
        }
        var info = new FileInfo(path);
        if (info.Length > options.MaxJsonBytes)
        {
            throw Fail(Codes.FileTooLarge, $"file is {info.Length} bytes, more than the JSON limit of {options.MaxJsonBytes} (put large data in CSV files, or raise --max-file-size)", path);
        }
        try
        {
            return File.ReadAllBytes(path);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw Fail(Codes.FileUnreadable, "cannot read the file: " + e.Message, path);
        }
    }

    // The case is named after the file on disk: a display name such as REV:x.csv is no file name.
    private static ReadResult ReadCsv(string path, string display, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings)
    {
        string name = Path.GetFileNameWithoutExtension(path);
        var units = new UnitConversion(options.CsvUnits, options.TargetUnits ?? options.CsvUnits);
        // A CSV has no units block: its units are stated only when the caller chose them (ReadOptions.CsvUnits).
        bool given = options.CsvUnitsGiven;
        var header = new DocumentHeader(null, units.Source, units.Target,
            System.Collections.Immutable.ImmutableSortedDictionary<string, LoadDiff.Core.Vector3>.Empty)
        {
            ForceUnitStated = given,
            LengthUnitStated = given,
            MassUnitStated = given,
        };
        sink.Header(header);
        sink.BeginCase(name, null);
        long count = 0;
        if (sink is IReducedBlockSink bulk)
        {
            new BlockCsvReducer(display, options, units, options.Threads).Reduce(path, bulk, null, "", "~mesh", null, n => count += n);
        }
        else
        {
            var reader = new CsvLoadReader(units, options, sink.Item, () => ++count);
            reader.ReadAny(CsvLoadReader.Open(path, display, options), "");
        }
        sink.EndCase();
        return new ReadResult(header, warnings);
    }

    private static byte[] StandardInput(ReadOptions options)
    {
        try
        {
            return InputFiles.ReadStandardInput(options.MaxJsonBytes);
        }
        catch (UnreadableInputException e)
        {
            throw new InputError(e.Diagnostic);
        }
    }

    /// <summary>Devices, FIFOs and sockets are refused before they are opened (opening a FIFO blocks, a device never ends).</summary>
    internal static void RequireRegular(string path, string display)
    {
        try
        {
            InputFiles.RequireRegular(path, display);
        }
        catch (UnreadableInputException e)
        {
            throw new InputError(e.Diagnostic);
        }
    }

    // The diagnostics of the JSON token reader's errors, the same for a file read whole and one streamed.
    private static InputError SyntaxFailure(JsonSyntaxError e, ReadOptions options, string file, int line, int column) =>
        e.TooDeep ? Fail(Codes.TooDeep, $"JSON nesting deeper than {options.MaxDepth} levels (raise the limit with --max-depth)", file, line, column)
        : e.InvalidText ? Fail(Codes.InvalidUtf8, e.Message, file, line, column)
        : Fail(Codes.MalformedJson, "malformed JSON: " + e.Message, file, line, column);

    private static InputError DuplicateKeyFailure(JsonDuplicateKey e, string file, int line, int column) =>
        Fail(Codes.DuplicateKey, $"key '{e.Key}' appears twice in the same object", file, line, column);

    private static InputError Fail(string code, string message, string file, int? line = null, int? column = null) =>
        new(new Diagnostic(code, Severity.Error, message, new SourceLocation(file, line, column)));
}
