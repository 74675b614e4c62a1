using System.Globalization;
using CsCheck;
using LoadDiff.Core.Loads;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Tests.Support;

namespace LoadDiff.Formats.Tests;

// Errors that the corpus in fixtures/bad cannot hold (limits, options), and number reading.
public sealed partial class LoadFileReaderTests
{
    private const string TwoForces = """
        { "cases": { "dead": { "loads": [
          { "id": "a", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -1] },
          { "id": "b", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -1] } ] } } }
        """;

    [Fact]
    public void Read_missing_file_and_folder_are_LD001_naming_the_path()
    {
        string missing = Path.Combine(_folder.Path, "none.loads.json");
        Diagnostic d = ReadErrorAt(missing);
        Assert.Equal(Codes.FileUnreadable, d.Code);
        Assert.Equal(new SourceLocation(missing), d.Location);
        Assert.Equal(Codes.FileUnreadable, ReadErrorAt(_folder.Path).Code);
    }

    [Fact]
    public void Read_file_over_the_size_limit_is_LD002()
    {
        Diagnostic d = ReadError(TwoForces, new ReadOptions { MaxJsonBytes = 100 });
        Assert.Equal(Codes.FileTooLarge, d.Code);
        Assert.Null(d.Location.Line);
        _folder.Write("big.csv", "x,y,z,fx,fy,fz\n0,0,0,0,0,1\n");
        Assert.Equal(Codes.FileTooLarge, ReadErrorAt(Path.Combine(_folder.Path, "big.csv"), new ReadOptions { MaxCsvBytes = 10 }).Code);
    }

    [Fact]
    public void Read_more_items_than_the_limit_is_LD071_at_the_first_item_over_it()
    {
        Diagnostic d = ReadError(TwoForces, new ReadOptions { MaxItems = 1 });
        Assert.Equal(Codes.TooManyItems, d.Code);
        Assert.Equal((3, 3), (d.Location.Line, d.Location.Column));
        Assert.Equal("$.cases.dead.loads[1]", d.Location.JsonPath);

        _folder.Write("rows.csv", "x,y,z,fx,fy,fz\n0,0,0,0,0,1\n0,0,0,0,0,1\n0,0,0,0,0,1\n");
        d = ReadError("""{ "cases": { "c": { "loads": [ { "kind": "forces", "file": "rows.csv" } ] } } }""", new ReadOptions { MaxItems = 2 });
        Assert.Equal(Codes.TooManyItems, d.Code);
        Assert.Equal(4, d.Location.Line);
    }

    [Fact]
    public void Read_csv_line_over_the_length_limit_is_LD072()
    {
        string path = _folder.Write("long.csv", "x,y,z,fx,fy,fz\n0,0,0,0,0,1\n0,0,0,0,0,1.000000000000000000000000\n");
        Diagnostic d = ReadErrorAt(path, new ReadOptions { MaxLineLength = 20 });
        Assert.Equal(Codes.LineTooLong, d.Code);
        Assert.Equal(new SourceLocation(path, 3, 1), d.Location);
    }

    [Fact]
    public void Read_nesting_over_the_depth_limit_is_LD005()
    {
        Diagnostic d = ReadError("""{ "cases": { "dead": { "loads": [] } } }""", new ReadOptions { MaxDepth = 3 });
        Assert.Equal(Codes.TooDeep, d.Code);
        Assert.Equal((1, 33), (d.Location.Line, d.Location.Column)); // the '[' of loads, the fourth level
    }

    [Fact]
    public void Read_unknown_field_is_a_warning_by_default_and_an_error_in_strict_mode()
    {
        const string json = """{ "cases": { "dead": { "loads": [ { "kind": "couple", "value": [0, 0, 1], "remark": "x" } ] } } }""";
        string path = _folder.Write("remark.loads.json", json);
        var sink = new CollectingSink();
        ReadResult result = LoadFileReader.Read(path, sink);
        Assert.True(result.Succeeded);
        Diagnostic w = Assert.Single(result.Diagnostics);
        Assert.Equal((Codes.UnknownField, Severity.Warning), (w.Code, w.Severity));
        Assert.Equal((1, 75), (w.Location.Line, w.Location.Column)); // the key "remark", counted by hand
        Assert.Single(sink.Case("dead").Items);

        Diagnostic e = ReadErrorAt(path, new ReadOptions { Strict = true });
        Assert.Equal(Codes.UnknownField, e.Code);
        Assert.Equal("$.cases.dead.loads[0].remark", e.Location.JsonPath);
    }

    [Fact]
    public void Read_referenced_file_outside_the_folder_is_read_only_when_allowed()
    {
        _folder.Write("shared/wheels.csv", "x,y,z,fx,fy,fz\n0,0,0,0,0,-5\n");
        string json = """{ "cases": { "c": { "loads": [ { "id": "w", "kind": "forces", "file": "../shared/wheels.csv" } ] } } }""";
        Assert.Equal(Codes.OutsideFolder, ReadError(json, name: "model/m.loads.json").Code);
        CollectingSink sink = Read(json, new ReadOptions { AllowOutside = true }, name: "model/m.loads.json");
        Assert.Equal(new PointForce("w/row2", V(0, 0, 0), V(0, 0, -5)), Assert.Single(sink.Case("c").Items));
    }

    [Fact]
    public void Read_csv_nan_and_infinity_are_LD020_and_are_not_called_an_overflow()
    {
        foreach (string bad in new[] { "NaN", "Infinity", "-Infinity" })
        {
            string path = _folder.Write($"nf-{bad}.csv", $"x,y,z,fx,fy,fz\n0,0,0,0,0,{bad}\n");
            Diagnostic d = ReadErrorAt(path);
            Assert.Equal(Codes.NotFinite, d.Code);
            Assert.Equal(new SourceLocation(path, 2, 11), d.Location);
            Assert.DoesNotContain("overflow", d.Message, StringComparison.Ordinal);
        }
        string over = _folder.Write("over.csv", "x,y,z,fx,fy,fz\n0,0,0,0,0,-1e309\n");
        Assert.Contains("overflow", ReadErrorAt(over).Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_csv_with_invalid_utf8_names_the_line_and_column_of_the_bad_byte()
    {
        // The bad byte sits far past the decoder's first buffer, on line 5001, after "id" and one good two-byte letter.
        var text = new System.Text.StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 2; i <= 5000; i++)
        {
            text.Append(CultureInfo.InvariantCulture, $"p{i},0,0,0,0,0,-1\n");
        }
        byte[] head = System.Text.Encoding.UTF8.GetBytes(text.ToString() + "pé");
        string path = _folder.WriteBytes("latin1.csv", [.. head, 0xE9, .. ",0,0,0,0,0,-1\n"u8]);
        Diagnostic d = ReadErrorAt(path);
        Assert.Equal(Codes.InvalidUtf8, d.Code);
        Assert.Equal(new SourceLocation(path, 5001, 3), d.Location);
    }

    [Fact]
    public void Read_empty_csv_is_LD063_for_the_whole_file()
    {
        string path = _folder.Write("empty.csv", "");
        Diagnostic d = ReadErrorAt(path);
        Assert.Equal(Codes.CsvNoHeader, d.Code);
        Assert.Equal(new SourceLocation(path), d.Location);
    }

    // Numbers are read exactly: any finite double written in round-trip form comes back bit for bit
    // (the "R" format of .NET round-trips by its documented contract), in JSON and in CSV alike.
    [Fact]
    public void Read_numbers_round_trip_exactly_in_json_and_csv()
    {
        Gen.Double.Where(x => double.IsFinite(x) && Math.Abs(x) <= Codes.MaxMagnitude).Array[3].SampleSeeded(v =>
        {
            string s0 = v[0].ToString("R", CultureInfo.InvariantCulture), s1 = v[1].ToString("R", CultureInfo.InvariantCulture);
            string s2 = v[2].ToString("R", CultureInfo.InvariantCulture);
            string json = $$"""{ "cases": { "c": { "loads": [ { "id": "p", "kind": "force", "at": [{{s0}}, {{s1}}, {{s2}}], "value": [{{s2}}, {{s0}}, {{s1}}] } ] } } }""";
            var sink = new CollectingSink();
            ReadResult r = LoadFileReader.ReadJson(System.Text.Encoding.UTF8.GetBytes(json), "gen.loads.json", _folder.Path, sink);
            Assert.True(r.Succeeded, string.Join("\n", r.Diagnostics));
            PointForce f = sink.Case("c").Item<PointForce>("p");
            Assert.Equal(BitConverter.DoubleToInt64Bits(v[0]), BitConverter.DoubleToInt64Bits(f.At.X));
            Assert.Equal(BitConverter.DoubleToInt64Bits(v[1]), BitConverter.DoubleToInt64Bits(f.At.Y));
            Assert.Equal(BitConverter.DoubleToInt64Bits(v[2]), BitConverter.DoubleToInt64Bits(f.At.Z));
            Assert.Equal(BitConverter.DoubleToInt64Bits(v[2]), BitConverter.DoubleToInt64Bits(f.Value.X));

            using var own = new TempFolder(); // each case its own file
            const string stem = "gen";
            string path = own.Write(stem + ".csv", $"x,y,z,fx,fy,fz\n{s0},{s1},{s2},{s2},{s0},{s1}\n");
            var csv = new CollectingSink();
            ReadResult rc = LoadFileReader.Read(path, csv);
            Assert.True(rc.Succeeded, string.Join("\n", rc.Diagnostics));
            PointForce g = Assert.IsType<PointForce>(Assert.Single(csv.Case(stem).Items));
            Assert.Equal(f.At, g.At);
            Assert.Equal(f.Value, g.Value);
        }, iter: 200);
    }
}
