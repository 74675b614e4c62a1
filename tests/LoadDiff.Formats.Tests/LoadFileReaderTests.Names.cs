using System.Globalization;
using LoadDiff.Formats.Csv;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Formats.Tests;

// Names are data, never markup: ids and case, combination and point names with control (Unicode Cc), line-separator
// or bidi characters are LD033 at the name's position. The character classes are from the Unicode Character Database
// (general category Cc; U+2028/U+2029 Zl/Zp; bidi controls U+202A–U+202E, U+2066–U+2069 per UAX #9).
public sealed partial class LoadFileReaderTests
{
    public static TheoryData<int> ForbiddenCharacters()
    {
        var data = new TheoryData<int>();
        for (int c = 0; c <= 0x1F; c++)
        {
            data.Add(c);
        }
        foreach (int c in new[] { 0x7F, 0x80, 0x85, 0x9F, 0x2028, 0x2029, 0x202A, 0x202E, 0x2066, 0x2069 })
        {
            data.Add(c);
        }
        return data;
    }

    private static string JsonEscape(int c) => "\\u" + c.ToString("x4", CultureInfo.InvariantCulture);

    [Theory]
    [MemberData(nameof(ForbiddenCharacters))]
    public void Read_id_with_a_forbidden_character_is_LD033_at_the_id(int c)
    {
        Diagnostic d = ReadError("{ \"cases\": { \"dead\": { \"loads\": [\n  { \"id\": \"p" + JsonEscape(c) + "\", \"kind\": \"force\", \"at\": [0, 0, 0], \"value\": [0, 0, -1] } ] } } }");
        Assert.Equal(Codes.InvalidId, d.Code);
        Assert.Equal(2, d.Location.Line);
        Assert.Equal(11, d.Location.Column);
        Assert.Equal("$.cases.dead.loads[0].id", d.Location.JsonPath);
        Assert.Contains($"U+{c:X4}", d.Message, StringComparison.Ordinal);
    }

    [Theory]
    [MemberData(nameof(ForbiddenCharacters))]
    public void Read_case_name_with_a_forbidden_character_is_LD033_at_the_case(int c)
    {
        Diagnostic d = ReadError("{ \"cases\": {\n  \"a" + JsonEscape(c) + "b\": { \"loads\": [] } } }");
        Assert.Equal(Codes.InvalidId, d.Code);
        Assert.Equal(2, d.Location.Line);
        Assert.StartsWith("$.cases['a", d.Location.JsonPath, StringComparison.Ordinal);
        // The one-line diagnostic keeps the character out of the terminal as a visible escape.
        Assert.DoesNotContain((char)c, d.ToString());
    }

    [Fact]
    public void Read_combination_name_factor_key_and_point_name_with_control_characters_are_LD033()
    {
        const string Case = "\"dead\": { \"loads\": [ { \"id\": \"p\", \"kind\": \"force\", \"at\": [0, 0, 0], \"value\": [0, 0, -1] } ] }";
        Diagnostic combination = ReadError("{ \"cases\": { " + Case + " },\n \"combinations\": { \"uls\\u001b[2J\": { \"dead\": 1.35 } } }");
        Assert.Equal((Codes.InvalidId, 2), (combination.Code, combination.Location.Line));
        Assert.StartsWith("$.combinations['uls", combination.Location.JsonPath, StringComparison.Ordinal);
        // A factor key naming no case with a control character: the name rule comes before the unknown-case rule.
        Diagnostic factor = ReadError("{ \"cases\": { " + Case + " },\n \"combinations\": { \"uls\": { \"dead\\n# x\": 1.35 } } }");
        Assert.Equal(Codes.InvalidId, factor.Code);
        Assert.StartsWith("$.combinations.uls['dead", factor.Location.JsonPath, StringComparison.Ordinal);
        Diagnostic point = ReadError("{ \"points\": { \"A\\u2028\": [0, 0, 0] },\n \"cases\": { " + Case + " } }");
        Assert.Equal(Codes.InvalidId, point.Code);
        Assert.StartsWith("$.points['A", point.Location.JsonPath, StringComparison.Ordinal);
    }

    [Fact]
    public void Read_csv_point_load_id_with_a_control_character_is_LD033_at_the_field()
    {
        _folder.Write("rows.csv", "id,x,y,z,fx,fy,fz\nok,0,0,0,0,0,-1\nbad\u001b[31m,1,0,0,0,0,-1\n");
        Diagnostic d = ReadError("""{ "cases": { "c": { "loads": [ { "kind": "forces", "file": "rows.csv" } ] } } }""");
        Assert.Equal(Codes.InvalidId, d.Code);
        Assert.EndsWith("rows.csv", d.Location.File, StringComparison.Ordinal);
        Assert.Equal((3, 1), (d.Location.Line, d.Location.Column));
    }

    [Fact]
    public void Support_point_id_with_a_bidi_override_is_LD033_at_the_field()
    {
        string path = _folder.Write("pts.csv", "id,x,y,z\nS1,0,0,0\nS\u202e2,1,0,0\n");
        (IReadOnlyList<LoadDiff.Core.Distribution.SupportPoint>? points, Diagnostic? error) = SupportPointReader.Read(path);
        Assert.Null(points);
        Assert.NotNull(error);
        Assert.Equal(Codes.InvalidId, error.Code);
        Assert.Equal((3, 1), (error.Location.Line, error.Location.Column));
    }

    [Fact]
    public void Read_names_with_ordinary_unicode_letters_and_punctuation_are_accepted()
    {
        // Not everything outside ASCII is refused: letters, the degree sign, dashes and zero-width joiners (Cf, not bidi) stay names.
        Read("{ \"cases\": { \"Eigengewicht – Brücke 3°\": { \"loads\": [ { \"id\": \"Stütze<1>\", \"kind\": \"force\", \"at\": [0, 0, 0], \"value\": [0, 0, -1] } ] } } }");
    }
}
