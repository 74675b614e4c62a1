using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Tests.Support;
using CollectingSink = LoadDiff.Formats.Tests.Support.CollectingSink;

namespace LoadDiff.Formats.Tests;

/// <summary>The streamed JSON path (large files) must read exactly what the in-memory path reads, and fail the same way.</summary>
public class StreamingJsonTests
{
    private static readonly ReadOptions Streamed = new() { StreamJsonAbove = 0 };

    private static string Repo()
    {
        string? dir = AppContext.BaseDirectory;
        while (dir is not null && !File.Exists(Path.Combine(dir, "LoadDiff.sln")))
        {
            dir = Path.GetDirectoryName(dir);
        }
        return dir ?? throw new InvalidOperationException("repository root not found");
    }

    public static TheoryData<string> JsonFixtures()
    {
        var data = new TheoryData<string>();
        foreach (string f in Directory.EnumerateFiles(Path.Combine(Repo(), "fixtures"), "*.json", SearchOption.AllDirectories).Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetRelativePath(Repo(), f));
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(JsonFixtures))]
    public void Streamed_and_in_memory_reading_agree_on_every_fixture(string relative)
    {
        string path = Path.Combine(Repo(), relative);
        var a = new CollectingSink();
        var b = new CollectingSink();
        ReadResult whole = LoadFileReader.Read(path, a);
        ReadResult streamed = LoadFileReader.Read(path, b, Streamed);
        Assert.Equal(whole.Succeeded, streamed.Succeeded);
        Assert.Equal(whole.Diagnostics.Select(Describe), streamed.Diagnostics.Select(Describe));
        if (whole.Succeeded)
        {
            Assert.Equal(whole.Header, streamed.Header);
            Assert.Equal(a.Events, b.Events);
            Assert.Equal(a.Cases.SelectMany(c => c.Items), b.Cases.SelectMany(c => c.Items));
        }
    }

    [Fact]
    public void A_large_loads_array_is_streamed_with_the_header_after_the_cases()
    {
        // Units and points written after the cases: the first pass must find them before items are converted.
        using var t = new TempFolder();
        var sb = new System.Text.StringBuilder("{ \"cases\": { \"many\": { \"loads\": [\n");
        for (int i = 0; i < 50_000; i++)
        {
            sb.Append("  { \"id\": \"f").Append(i).Append("\", \"kind\": \"force\", \"at\": \"A\", \"value\": [0, 0, -2] },\n");
        }
        sb.Append("] } },\n \"units\": { \"force\": \"kN\", \"length\": \"mm\" },\n \"points\": { \"A\": [1000, 0, 0] } }\n");
        string path = t.Write("many.loads.json", sb.ToString());
        var sink = new ReductionSink();
        ReadResult r = LoadFileReader.Read(path, sink, Streamed);
        Assert.True(r.Succeeded, r.Error?.ToString());
        Assert.Equal("mm", r.Header!.Units.Length.Symbol);
        var red = sink.Cases["many"].ResultAt(Vector3.Zero);
        Assert.Equal(-100_000, red.Force.Z, 9); // 50 000 × 2 kN (exact arithmetic)
        Assert.Equal(100_000_000, red.Moment.Y, 3); // 100 000 kN at x = 1000 mm: M_y = −x F_z
    }

    [Fact]
    public void A_streamed_error_deep_in_the_file_names_its_line()
    {
        using var t = new TempFolder();
        var sb = new System.Text.StringBuilder("{ \"cases\": { \"many\": { \"loads\": [\n");
        for (int i = 0; i < 30_000; i++)
        {
            sb.Append(i == 25_000 ? "  { \"kind\": \"force\", \"at\": [0, 0, 0], \"value\": [0, 0, \"x\"] },\n" : "  { \"kind\": \"couple\", \"value\": [0, 0, 1] },\n");
        }
        sb.Append("] } } }\n");
        string path = t.Write("many.loads.json", sb.ToString());
        ReadResult r = LoadFileReader.Read(path, new ReductionSink(), Streamed);
        Assert.Equal(Codes.WrongType, r.Error!.Code);
        Assert.Equal(25_002, r.Error.Location.Line);
        Assert.Equal("$.cases.many.loads[25000].value[2]", r.Error.Location.JsonPath);
    }

    // Padding far longer than the streamed reader's 64 KiB buffer: white space (with and without line breaks) before,
    // inside and after the document, and errors behind it. The in-memory reader, which sees the whole text at once,
    // is the reference for what is read and for every error's line and column.
    public static TheoryData<string, string> Padded() => new()
    {
        { "spaces before", new string(' ', 300_000) + Doc },
        { "lines before", string.Concat(Enumerable.Repeat("  \r\n\t", 70_000)) + Doc },
        { "inside", Doc.Replace("\"loads\":", "\"loads\":" + new string('\n', 200_000) + new string(' ', 100_000), StringComparison.Ordinal) },
        { "after", Doc + new string(' ', 200_000) + "\n\n" + new string(' ', 150_000) },
        { "error after spaces", Doc + new string(' ', 200_000) + "x" },
        { "error after lines", Doc + string.Concat(Enumerable.Repeat(" \n", 150_000)) + "   x" },
        { "error inside after lines", Doc.Replace("[0, 0, -1]", "[0, 0," + new string('\n', 100_000) + "   -1e]", StringComparison.Ordinal) },
        { "NUL bytes", new string('\0', 300_000) },
        { "NUL after spaces", new string(' ', 100_000) + new string('\0', 300_000) },
        { "NUL after document", Doc + new string('\0', 300_000) },
        // White space after a separator (the reader holds the ',' or ':' until the next token arrives).
        { "spaces after a comma", Doc.Replace("[0, 0, -1] }", "[0, 0, -1] }," + new string(' ', 300_000) + "\n { \"id\": \"q\", \"kind\": \"force\", \"at\": [4, 0, 0], \"value\": [0, 0, -5] }", StringComparison.Ordinal) },
        { "lines after a colon", Doc.Replace("\"value\":", "\"value\":" + string.Concat(Enumerable.Repeat(" \r\n", 100_000)), StringComparison.Ordinal) },
        { "error after a comma and spaces", Doc.Replace("[0, 0, -1] }", "[0, 0, -1] }," + new string(' ', 300_000) + "  ]", StringComparison.Ordinal) },
        // Strings longer than the buffer are valid wherever they stand: after ':' and after ',' with white space between.
        { "long title after a colon", Doc.Replace("{ \"cases\"", "{ \"title\":   \"" + new string('t', 300_000) + "\", \"cases\"", StringComparison.Ordinal) },
        { "long note after a comma", Doc.Replace("[0, 0, -1] }", "[0, 0, -1], \"note\": \"n\" ,\n  \"title\" : \"" + new string('n', 300_000) + "\" }", StringComparison.Ordinal) },
        { "long key", Doc.Replace("{ \"cases\"", "{ \"" + new string('k', 300_000) + "\": 1, \"cases\"", StringComparison.Ordinal) },
    };

    private const string Doc = """{ "cases": { "a": { "loads": [ { "id": "p", "kind": "force", "at": [1, 2, 0], "value": [0, 0, -1] } ] } } }""";

    [Theory]
    [MemberData(nameof(Padded))]
    public void Padding_and_the_errors_behind_it_read_as_in_memory(string what, string text)
    {
        using var t = new TempFolder();
        string path = t.Write("padded.loads.json", text);
        var a = new CollectingSink();
        var b = new CollectingSink();
        ReadResult whole = LoadFileReader.Read(path, a);
        ReadResult streamed = LoadFileReader.Read(path, b, Streamed);
        Assert.True(whole.Succeeded == streamed.Succeeded, what);
        // every case is valid JSON but the errors and the NUL bytes (JSON grammar, RFC 8259)
        Assert.Equal(!what.Contains("error", StringComparison.Ordinal) && !what.Contains("NUL", StringComparison.Ordinal), whole.Succeeded);
        Assert.Equal(whole.Diagnostics.Select(Describe), streamed.Diagnostics.Select(Describe));
        Assert.Equal(a.Cases.SelectMany(c => c.Items), b.Cases.SelectMany(c => c.Items));
    }

    private static string Describe(Diagnostic d) => $"{d.Code} {d.Severity} {d.Location.Line}:{d.Location.Column} {d.Location.JsonPath}";
}
