using System.Text;
using LoadDiff.Core.Loads;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Tests.Support;

namespace LoadDiff.Formats.Tests;

// The document as a whole: comments, trailing commas, byte-order mark, derived ids, order of cases and combinations.
public sealed partial class LoadFileReaderTests
{
    [Fact]
    public void Read_accepts_line_and_block_comments_and_trailing_commas()
    {
        CollectingSink sink = Read("""
            // Canopy, bay 2
            {
              /* the format tag is optional */
              "format": "loaddiff/1",
              "cases": {
                "dead": {
                  "loads": [
                    { "id": "p1", "kind": "force", "at": [0, 0, 0], /* kN */ "value": [0, 0, -3,], }, // trailing commas
                  ],
                },
              },
            }
            """);
        Assert.Equal(new PointForce("p1", V(0, 0, 0), V(0, 0, -3)), Assert.Single(sink.Case("dead").Items));
    }

    [Fact]
    public void Read_accepts_a_utf8_byte_order_mark_and_reports_positions_without_counting_it()
    {
        byte[] good = [0xEF, 0xBB, 0xBF, .. """{ "cases": { "dead": { "loads": [ { "id": "p", "kind": "couple", "value": [1, 2, 3] } ] } } }"""u8];
        var sink = new CollectingSink();
        Assert.True(LoadFileReader.Read(_folder.WriteBytes("bom.loads.json", good), sink).Succeeded);
        Assert.Equal(new FreeCouple("p", V(1, 2, 3)), Assert.Single(sink.Case("dead").Items));

        // An editor shows no column for the mark: the value 5 starts at column 12 of line 1 (counted by hand).
        byte[] semantic = [0xEF, 0xBB, 0xBF, .. """{ "cases": 5 }"""u8];
        Diagnostic d = ReadErrorAt(_folder.WriteBytes("bom-semantic.loads.json", semantic));
        Assert.Equal(Codes.WrongType, d.Code);
        Assert.Equal((1, 12), (d.Location.Line, d.Location.Column));

        byte[] syntax = [0xEF, 0xBB, 0xBF, .. """{ "cases": x }"""u8];
        d = ReadErrorAt(_folder.WriteBytes("bom-syntax.loads.json", syntax));
        Assert.Equal(Codes.MalformedJson, d.Code);
        Assert.Equal((1, 12), (d.Location.Line, d.Location.Column));

        byte[] text = [0xEF, 0xBB, 0xBF, .. """{ "title": "a"""u8, 0xFF, .. "\" }"u8];
        d = ReadErrorAt(_folder.WriteBytes("bom-utf8.loads.json", text));
        Assert.Equal(Codes.InvalidUtf8, d.Code);
        Assert.Equal((1, 14), (d.Location.Line, d.Location.Column));
    }

    [Fact]
    public void Read_reports_columns_in_characters_after_multibyte_text()
    {
        // "Überführung" has two two-byte letters; the bad value starts at character 36 of line 2 (counted by hand).
        Diagnostic d = ReadError("{\n  \"title\": \"Überführung\", \"cases\": x }");
        Assert.Equal(Codes.MalformedJson, d.Code);
        Assert.Equal((2, 36), (d.Location.Line, d.Location.Column));
        d = ReadError("{\n  \"title\": \"Überführung\", \"cases\": 7 }");
        Assert.Equal(Codes.WrongType, d.Code);
        Assert.Equal((2, 36), (d.Location.Line, d.Location.Column));
        Assert.Equal("$.cases", d.Location.JsonPath);
    }

    [Fact]
    public void Read_delivers_cases_in_file_order_then_combinations_in_file_order()
    {
        CollectingSink sink = Read("""
            { "cases": {
                "wind": { "loads": [ { "id": "w", "kind": "force", "at": [0, 0, 0], "value": [1, 0, 0] } ] },
                "dead": { "loads": [] },
                "live": { "loads": [ { "id": "l", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -1] } ] } },
              "combinations": {
                "uls-2": { "live": 1.5, "dead": 1.35, "wind": 0.9 },
                "sls": { "dead": 1, "live": 1 },
                "uls-1": { "wind": 1.5, "dead": 1.35 } } }
            """);
        Assert.Equal(
            ["header", "begin wind", "item w", "end", "begin dead", "end", "begin live", "item l", "end",
             "combination uls-2", "combination sls", "combination uls-1"],
            sink.Events);
        Assert.Equal([new("live", 1.5), new("dead", 1.35), new("wind", 0.9)], sink.Combinations[0].Factors.ToArray());
        Assert.Equal([new("wind", 1.5), new("dead", 1.35)], sink.Combinations[2].Factors.ToArray());
    }

    [Fact]
    public void Read_derives_ids_that_start_with_a_tilde_are_unique_and_do_not_depend_on_other_items()
    {
        const string items = """
            { "kind": "force", "at": [1, 0, 0], "value": [0, 0, -1] },
            { "kind": "force", "at": [1, 0, 0], "value": [0, 0, -2] },
            { "kind": "couple", "value": [0, 1, 0] },
            { "kind": "line", "from": [0, 0, 0], "to": [1, 0, 0], "start": [0, 0, -1], "end": [0, 0, -1] },
            { "kind": "area", "polygon": [[0, 0, 0], [1, 0, 0], [0, 1, 0]], "pressure": 1 },
            { "kind": "mass", "at": [2, 0, 0], "value": 5 },
            { "id": "named", "kind": "force", "at": [3, 0, 0], "value": [0, 0, -1] }
            """;
        string Doc(string loads) => "{ \"cases\": { \"dead\": { \"loads\": [ " + loads + " ] } } }";
        List<string> first = Read(Doc(items), name: "a.loads.json").Case("dead").Items.Select(i => i.Id).ToList();
        List<string> again = Read(Doc(items), name: "b.loads.json").Case("dead").Items.Select(i => i.Id).ToList();
        Assert.Equal(first, again);
        Assert.Equal(first.Count, first.Distinct(StringComparer.Ordinal).Count());
        Assert.All(first.Take(6), id => Assert.StartsWith("~", id, StringComparison.Ordinal));
        Assert.Equal("named", first[6]);

        // A force placed in front of them does not change the ids derived for forces elsewhere.
        string withExtra = """{ "kind": "force", "at": [9, 9, 9], "value": [0, 0, -1] },""" + items;
        List<string> shifted = Read(Doc(withExtra), name: "c.loads.json").Case("dead").Items.Select(i => i.Id).ToList();
        Assert.Equal(first[0], shifted[1]);
        Assert.Equal(first[1], shifted[2]);
        Assert.Equal(first[5], shifted[6]);
    }

    [Fact]
    public void ReadJson_reads_bytes_in_memory_and_resolves_files_against_the_given_folder()
    {
        _folder.Write("data/p.csv", "x,y,z,fx,fy,fz\n1,1,1,0,0,-2\n");
        byte[] json = Encoding.UTF8.GetBytes("""{ "cases": { "c": { "loads": [ { "id": "t", "kind": "forces", "file": "p.csv" } ] } } }""");
        var sink = new CollectingSink();
        ReadResult result = LoadFileReader.ReadJson(json, "HEAD:model.loads.json", Path.Combine(_folder.Path, "data"), sink);
        Assert.True(result.Succeeded, string.Join("\n", result.Diagnostics));
        Assert.Equal(new PointForce("t/row2", V(1, 1, 1), V(0, 0, -2)), Assert.Single(sink.Case("c").Items));

        ReadResult bad = LoadFileReader.ReadJson("{ \"cases\": {} }"u8.ToArray(), "HEAD:model.loads.json", _folder.Path, new CollectingSink());
        Diagnostic d = Assert.Single(bad.Diagnostics);
        Assert.Equal(Codes.NoCases, d.Code);
        Assert.StartsWith("HEAD:model.loads.json:1:12: error LD041: ", d.ToString(), StringComparison.Ordinal);
    }
}
