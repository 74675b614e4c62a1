using CsCheck;
using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Tests.Source;

public class CanonicalWriterTests
{
    private static string FixtureRoot
    {
        get
        {
            string? dir = AppContext.BaseDirectory;
            while (dir is not null && !File.Exists(Path.Combine(dir, "LoadDiff.sln")))
            {
                dir = Path.GetDirectoryName(dir);
            }
            return Path.Combine(dir!, "fixtures");
        }
    }

    private static LoadDocument Read(string json)
    {
        SourceReadResult r = LoadDocumentReader.ReadText(json);
        Assert.True(r.Succeeded, r.Error?.ToString());
        return r.Document!;
    }

    public static TheoryData<string> Fixtures() =>
        [.. Directory.GetFiles(FixtureRoot, "*.loads.json", SearchOption.AllDirectories).Where(f => !f.Contains("bad", StringComparison.Ordinal))];

    [Theory]
    [MemberData(nameof(Fixtures))]
    public void Write_is_idempotent_and_lossless_on_every_fixture(string path)
    {
        SourceReadResult r = LoadDocumentReader.Read(path);
        Assert.True(r.Succeeded, r.Error?.ToString());
        string once = CanonicalWriter.Write(r.Document!);
        SourceReadResult again = LoadDocumentReader.ReadBytes(System.Text.Encoding.UTF8.GetBytes(once), path, Path.GetDirectoryName(path)!);
        Assert.Equal(r.Document, again.Document);
        Assert.Equal(once, CanonicalWriter.Write(again.Document!));
    }

    [Fact]
    public void Read_of_write_is_the_same_model_for_random_documents()
    {
        // read(format(x)) == x, exactly: every double drawn from all bit patterns must come back bit for bit
        SourceSamples.Document.SampleSeeded(json =>
        {
            LoadDocument x = Read(json);
            string text = CanonicalWriter.Write(x);
            LoadDocument y = Read(text);
            Assert.Equal(x, y);
            Assert.Equal(text, CanonicalWriter.Write(y));
        }, iter: 300);
    }

    [Fact]
    public void Numbers_are_shortest_round_trip_text_with_a_plain_exponent()
    {
        // exact expectations from the IEEE 754 binary64 format (shortest digits that round back), not from this code
        Assert.Equal("0.1", SourceText.Number(0.1));
        Assert.Equal("1000", SourceText.Number(1e3));
        Assert.Equal("1e-7", SourceText.Number(1e-7));
        Assert.Equal("2.5e20", SourceText.Number(2.5e20));
        Assert.Equal("5e-324", SourceText.Number(double.Epsilon));
        Assert.Equal("-0", SourceText.Number(-0.0));
        Assert.Equal("0.30000000000000004", SourceText.Number(0.1 + 0.2));
    }

    [Fact]
    public void Key_order_whitespace_comments_and_number_spelling_do_not_change_the_model()
    {
        LoadDocument a = Read("""
            { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
              { "id": "p", "kind": "force", "at": [1, 2, 3], "value": [0, 0, -1000] },
              { "id": "a", "kind": "area", "polygon": [[0,0,0],[1,0,0],[1,1,0]], "pressure": 2 } ] } } }
            """);
        LoadDocument b = Read("""
            // reformatted by hand
            { "cases": { "dead": { "loads": [
                { "value": [0.0, -0e0, -1e3], "at": [1.0, 2, 3E0], "kind": "force", "id": "p" },   /* same force */
                { "pressure": 2.000, "direction": "normal", "kind": "area", "id": "a", "polygon": [[0,0,0],[1,0,0],[1,1,0]] }, ] } },
              "units": { "length": "m", "force": "kN", "mass": "kg" } }
            """);
        Assert.Equal(a, b);
    }

    [Fact]
    public void Canonical_layout_puts_top_level_keys_in_spec_order_and_one_item_per_line()
    {
        string text = CanonicalWriter.Write(Read("""
            { "combinations": { "u": { "d": 1.35 } }, "cases": { "d": { "loads": [ { "value": [0, 0, -1], "kind": "couple" } ], "title": "t" } },
              "points": { "A": [0, 0, 0] }, "gravity": [0, 0, -10], "title": "x", "format": "loaddiff/1" }
            """));
        Assert.Equal("""
            {
              "format": "loaddiff/1",
              "title": "x",
              "units": { "force": "N", "length": "m", "mass": "kg" },
              "gravity": [0, 0, -10],
              "points": {
                "A": [0, 0, 0]
              },
              "cases": {
                "d": {
                  "title": "t",
                  "loads": [
                    { "kind": "couple", "value": [0, 0, -1] }
                  ]
                }
              },
              "combinations": {
                "u": { "d": 1.35 }
              }
            }

            """.Replace("\r\n", "\n", StringComparison.Ordinal), text);
    }

    [Fact]
    public void A_file_that_reduce_rejects_is_rejected_with_the_same_diagnostic()
    {
        const string bad = """{ "cases": { "d": { "loads": [ { "kind": "force", "at": [0, 0, 0], "value": [0, "x", 0] } ] } } }""";
        var reduce = LoadFileReader.ReadJson(System.Text.Encoding.UTF8.GetBytes(bad), "m.loads.json", ".", new Core.Model.ReductionSink());
        SourceReadResult source = LoadDocumentReader.ReadBytes(System.Text.Encoding.UTF8.GetBytes(bad), "m.loads.json", ".");
        Assert.False(source.Succeeded);
        Assert.Equal(reduce.Error, source.Error);
        Assert.Equal(Diagnostics.Codes.WrongType, source.Error!.Code);
    }

    [Fact]
    public void Comments_and_unknown_fields_are_reported_because_the_model_does_not_keep_them()
    {
        SourceReadResult r = LoadDocumentReader.ReadText("""{ /* c */ "cases": { "d": { "loads": [ { "kind": "couple", "value": [0, 0, 1], "remark": "x" } ] } } }""");
        Assert.True(r.Succeeded);
        Assert.True(r.HasComments);
        Assert.Equal(["$.cases.d.loads[0].remark"], r.DroppedFields);
        Assert.False(LoadDocumentReader.ReadText("""{ "cases": { "d": { "loads": [] } } }""").HasComments);
    }
}
