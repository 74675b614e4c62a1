using CsCheck;
using LoadDiff.Core;
using LoadDiff.Core.Diff;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Tests.Source;

/// <summary>The optional <c>note</c> of the document, each case and each item (SPEC §3): read, kept by fmt, matched by diff.</summary>
public class NoteTests
{
    private const string Noted = """
        { "title": "t", "note": "doc \"basis\"\nline 2 \u00e9",
          "cases": { "dead": { "title": "d", "note": "from calc 12", "loads": [
            { "id": "p", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10], "note": "drawing S-101 <b>|`" },
            { "id": "q", "kind": "couple", "value": [0, 0, 1] } ] } } }
        """;

    private static SourceReadResult Read(string json)
    {
        SourceReadResult r = LoadDocumentReader.ReadText(json);
        Assert.True(r.Succeeded, r.Error?.ToString());
        return r;
    }

    private static DocumentDiff Diff(string a, string b)
    {
        SourceReadResult old = Read(a), @new = Read(b);
        return DocumentDiffer.Compare("old", old, "new", @new, Vector3.Zero, "origin", []);
    }

    [Fact]
    public void Notes_are_read_exactly_on_the_document_a_case_and_an_item_without_a_warning()
    {
        SourceReadResult r = Read(Noted);
        Assert.Empty(r.Diagnostics);
        Assert.Empty(r.DroppedFields);
        // expected strings are the JSON escapes decoded by hand (RFC 8259 §7: \" quote, \n line feed, \u00e9 é)
        Assert.Equal("doc \"basis\"\nline 2 é", r.Document!.Note);
        Assert.Equal("from calc 12", r.Document.Cases[0].Note);
        Assert.Equal("drawing S-101 <b>|`", r.Document.Cases[0].Items[0].Note);
        Assert.Null(r.Document.Cases[0].Items[1].Note);
    }

    [Fact]
    public void A_note_that_is_not_text_is_LD010_at_its_position()
    {
        const string json = """{ "cases": { "d": { "loads": [ { "kind": "couple", "value": [0, 0, 1], "note": 5 } ] } } }""";
        SourceReadResult r = LoadDocumentReader.ReadText(json, "m.loads.json");
        Assert.False(r.Succeeded);
        Assert.Equal(Codes.WrongType, r.Error!.Code);
        Assert.Equal("$.cases.d.loads[0].note", r.Error.Location.JsonPath);
        Assert.Equal((1, 80), (r.Error.Location.Line, r.Error.Location.Column)); // the column of the 5 in the literal above
    }

    [Fact]
    public void Canonical_form_keeps_notes_after_the_title_and_at_the_end_of_an_item_line()
    {
        string text = CanonicalWriter.Write(Read(Noted).Document!);
        Assert.Equal("""
            {
              "format": "loaddiff/1",
              "title": "t",
              "note": "doc \"basis\"\nline 2 é",
              "units": { "force": "N", "length": "m", "mass": "kg" },
              "cases": {
                "dead": {
                  "title": "d",
                  "note": "from calc 12",
                  "loads": [
                    { "id": "p", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10], "note": "drawing S-101 <b>|`" },
                    { "id": "q", "kind": "couple", "value": [0, 0, 1] }
                  ]
                }
              }
            }

            """.Replace("\r\n", "\n", StringComparison.Ordinal), text);
        Assert.Equal(Read(Noted).Document, Read(text).Document);
    }

    [Fact]
    public void Any_note_text_comes_back_from_fmt_exactly()
    {
        // the JSON literal is made by the BCL's encoder; the reader must give back the very string, and so must fmt's output
        // every Unicode scalar value: control characters, the BMP either side of the surrogates, the supplementary planes
        Gen.OneOf(Gen.Int[0, 0x1F], Gen.Int[0x20, 0xD7FF], Gen.Int[0xE000, 0x10FFFF])
            .Select(char.ConvertFromUtf32).Array[0, 20].Select(string.Concat)
            .SampleSeeded(note =>
            {
                string json = "{ \"cases\": { \"d\": { \"loads\": [ { \"kind\": \"couple\", \"value\": [0, 0, 1], \"note\": \""
                    + System.Text.Json.JsonEncodedText.Encode(note).Value + "\" } ] } } }";
                LoadDocument x = Read(json).Document!;
                Assert.Equal(note, x.Cases[0].Items[0].Note);
                string text = CanonicalWriter.Write(x);
                Assert.Equal(note, Read(text).Document!.Cases[0].Items[0].Note);
                Assert.DoesNotContain(text, ch => ch < 0x20 && ch != '\n'); // control characters are escaped, never raw
            }, iter: 500);
    }

    [Fact]
    public void A_bidirectional_control_in_a_note_is_written_as_an_escape_and_reads_back_the_same()
    {
        // U+202E RIGHT-TO-LEFT OVERRIDE and U+2066 LEFT-TO-RIGHT ISOLATE (Unicode UAX #9) would reorder the displayed line
        const string json = """{ "cases": { "d": { "loads": [ { "kind": "couple", "value": [0, 0, 1], "note": "a\u202Eb\u2066c" } ] } } }""";
        LoadDocument x = Read(json).Document!;
        Assert.Equal("a\u202Eb\u2066c", x.Cases[0].Items[0].Note);
        string text = CanonicalWriter.Write(x);
        Assert.Contains("\"note\": \"a\\u202Eb\\u2066c\"", text, StringComparison.Ordinal);
        Assert.DoesNotContain('\u202E', text);
        Assert.Equal(x, Read(text).Document);
    }

    [Fact]
    public void A_changed_note_is_a_difference_that_moves_no_load()
    {
        string changed = Noted.Replace("drawing S-101", "drawing S-102", StringComparison.Ordinal)
            .Replace("from calc 12", "from calc 13", StringComparison.Ordinal)
            .Replace("line 2", "line two", StringComparison.Ordinal);
        DocumentDiff d = Diff(Noted, changed);
        Assert.True(d.HasDifferences);
        ItemChange item = Assert.Single(d.Items);
        Assert.Equal(("p", ChangeKind.Changed), (item.Id, item.Change));
        FieldChange f = Assert.Single(item.Fields);
        Assert.Equal(new FieldChange("note", "\"drawing S-101 <b>|`\"", "\"drawing S-102 <b>|`\"", ""), f);
        Assert.Equal((Vector3.Zero, Vector3.Zero), (item.DeltaForce, item.DeltaMoment)); // a note applies no load
        Assert.Contains(new SettingChange("case dead note", ChangeKind.Changed, "\"from calc 12\"", "\"from calc 13\"", ""), d.Settings);
        Assert.Contains(new SettingChange("note", ChangeKind.Changed, "\"doc \\\"basis\\\"\\nline 2 é\"", "\"doc \\\"basis\\\"\\nline two é\"", ""), d.Settings);
        Assert.All(d.Resultants, r => Assert.True(r.Unchanged));
    }

    [Fact]
    public void A_note_added_to_an_item_and_the_note_of_an_added_item_are_shown()
    {
        string a = """{ "cases": { "d": { "loads": [ { "id": "q", "kind": "couple", "value": [0, 0, 1] } ] } } }""";
        string b = """{ "cases": { "d": { "loads": [ { "id": "q", "kind": "couple", "value": [0, 0, 1], "note": "n1" }, { "id": "r", "kind": "couple", "value": [0, 0, 2], "note": "n2" } ] } } }""";
        DocumentDiff d = Diff(a, b);
        Assert.Equal(2, d.Items.Count);
        Assert.Equal(new FieldChange("note", null, "\"n1\"", ""), Assert.Single(d.Items[0].Fields));
        Assert.Equal(ChangeKind.Added, d.Items[1].Change);
        Assert.Contains(new FieldChange("note", null, "\"n2\"", ""), d.Items[1].Fields);
        Assert.False(Diff(b, b).HasDifferences);
    }
}
