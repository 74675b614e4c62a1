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
                using Stream stdin = Console.OpenStandardInput();
                byte[] bytes = ReadAllBounded(stdin, options.MaxJsonBytes, "-");
                return ReadJsonBytes(bytes, "-", Directory.GetCurrentDirectory(), sink, options, warnings);
            }
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
                return ReadCsv(path, sink, options, warnings);
            }
            var info = new FileInfo(path);
            if (info.Length > options.MaxJsonBytes)
            {
                throw Fail(Codes.FileTooLarge, $"file is {info.Length} bytes, more than the JSON limit of {options.MaxJsonBytes} (put large data in CSV files)", path);
            }
            byte[] data;
            try
            {
                data = File.ReadAllBytes(path);
            }
            catch (Exception e) when (e is IOException or UnauthorizedAccessException)
            {
                throw Fail(Codes.FileUnreadable, "cannot read the file: " + e.Message, path);
            }
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

    private static ReadResult ReadJsonBytes(byte[] bytes, string file, string dir, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings)
    {
        var lines = new LineIndex(bytes);
        ReadOnlySpan<byte> span = bytes;
        int bom = span.StartsWith((ReadOnlySpan<byte>)[0xEF, 0xBB, 0xBF]) ? 3 : 0;
        if (span.StartsWith((ReadOnlySpan<byte>)[0xFF, 0xFE]) || span.StartsWith((ReadOnlySpan<byte>)[0xFE, 0xFF]))
        {
            throw Fail(Codes.InvalidUtf8, "the file is UTF-16 encoded; load files must be UTF-8", file, 1, 1);
        }
        if (span[bom..].Trim((ReadOnlySpan<byte>)[(byte)' ', (byte)'\t', (byte)'\r', (byte)'\n']).IsEmpty)
        {
            throw Fail(Codes.EmptyInput, "the file is empty; expected a JSON load description", file, 1, 1);
        }
        long bad = LineIndex.FirstInvalidUtf8(span);
        if (bad >= 0)
        {
            var (l, c) = lines.Locate(bad);
            throw Fail(Codes.InvalidUtf8, $"invalid UTF-8 byte 0x{bytes[bad]:X2}; load files must be UTF-8 text", file, l, c);
        }
        JsonNode root;
        try
        {
            root = JsonTreeParser.Parse(span[bom..], options.MaxDepth);
        }
        catch (JsonSyntaxError e)
        {
            long offset = e.ReaderLine is { } rl ? lines.OffsetOf(rl, e.ReaderBytePosition + (rl == 0 ? bom : 0)) : e.Offset + bom;
            var (l, c) = lines.Locate(offset);
            throw e.TooDeep
                ? Fail(Codes.TooDeep, $"JSON nesting deeper than {options.MaxDepth} levels", file, l, c)
                : Fail(Codes.MalformedJson, "malformed JSON: " + e.Message, file, l, c);
        }
        catch (JsonDuplicateKey e)
        {
            var (l, c) = lines.Locate(e.Offset + bom);
            throw Fail(Codes.DuplicateKey, $"key '{e.Key}' appears twice in the same object", file, l, c);
        }
        catch (InvalidOperationException)
        {
            throw Fail(Codes.InvalidUtf8, "the file holds text that is not valid UTF-8", file, 1, 1);
        }
        var walker = new LoadJsonWalker(file, bom == 0 ? lines : new LineIndex(bytes[bom..]), options, dir, warnings);
        DocumentHeader header = walker.Walk(root, sink);
        return new ReadResult(header, warnings);
    }

    private static ReadResult ReadCsv(string path, ILoadSink sink, ReadOptions options, List<Diagnostic> warnings)
    {
        string name = Path.GetFileNameWithoutExtension(path);
        var units = new UnitConversion(options.CsvUnits, options.TargetUnits ?? options.CsvUnits);
        var header = new DocumentHeader(null, units.Source, units.Target,
            System.Collections.Immutable.ImmutableSortedDictionary<string, LoadDiff.Core.Vector3>.Empty);
        sink.Header(header);
        sink.BeginCase(name, null);
        long count = 0;
        var reader = new CsvLoadReader(units, options, sink.Item, () => ++count);
        reader.ReadAny(CsvLoadReader.Open(path, path, options), "");
        sink.EndCase();
        return new ReadResult(header, warnings);
    }

    private static byte[] ReadAllBounded(Stream s, long limit, string name)
    {
        using var ms = new MemoryStream();
        byte[] buffer = new byte[1 << 16];
        int n;
        while ((n = s.Read(buffer, 0, buffer.Length)) > 0)
        {
            ms.Write(buffer, 0, n);
            if (ms.Length > limit)
            {
                throw Fail(Codes.FileTooLarge, $"input is larger than the JSON limit of {limit} bytes", name);
            }
        }
        return ms.ToArray();
    }

    private static InputError Fail(string code, string message, string file, int? line = null, int? column = null) =>
        new(new Diagnostic(code, Severity.Error, message, new SourceLocation(file, line, column)));
}
