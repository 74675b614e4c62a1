using LoadDiff.Formats.Source;

namespace LoadDiff.Formats.Tests.Source;

/// <summary><c>fmt --comments-to-notes</c>: each comment directly before the document, a case or an item becomes its note.</summary>
public class CommentNotesTests
{
    private static SourceReadResult Read(string json)
    {
        SourceReadResult r = LoadDocumentReader.ReadText(json.Replace("\r\n", "\n", StringComparison.Ordinal));
        Assert.True(r.Succeeded, r.Error?.ToString());
        return r;
    }

    private static LoadDocument Moved(string json)
    {
        SourceReadResult r = Read(json);
        Assert.Null(CommentNotes.FirstUnplaced(r.Comments));
        return CommentNotes.MoveIntoNotes(r.Document!, r.Comments);
    }

    private static SourceComment Refused(string json)
    {
        SourceReadResult r = Read(json);
        SourceComment? c = CommentNotes.FirstUnplaced(r.Comments);
        Assert.NotNull(c);
        Assert.Throws<ArgumentException>(() => CommentNotes.MoveIntoNotes(r.Document!, r.Comments));
        return c;
    }

    private const string Placed = """
        // Footbridge X-1 (invented), loads of the deck
        /* second line
           of the document note */
        {
          "cases": {
            // case basis
            "dead": {
              "loads": [
                // from drawing S-101
                { "id": "a", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -1] },
                // second item: a lamp
                //   on its own bracket
                { "id": "b", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -2], "note": "already here" },
                { "id": "c", "kind": "couple", "value": [0, 0, 1] }
              ]
            }
          }
        }
        """;

    [Fact]
    public void A_comment_before_an_item_a_case_or_the_document_becomes_its_note()
    {
        LoadDocument d = Moved(Placed);
        // expected notes: the comment texts above with markers and surrounding blanks removed, lines joined by a line feed
        Assert.Equal("Footbridge X-1 (invented), loads of the deck\nsecond line\nof the document note", d.Note);
        Assert.Equal("case basis", d.Cases[0].Note);
        Assert.Equal("from drawing S-101", d.Cases[0].Items[0].Note);
        Assert.Equal("already here\nsecond item: a lamp\non its own bracket", d.Cases[0].Items[1].Note); // appended after a line feed
        Assert.Null(d.Cases[0].Items[2].Note);
    }

    [Fact]
    public void Moving_comments_changes_no_load_and_the_canonical_text_reads_back_the_same()
    {
        SourceReadResult r = Read(Placed);
        LoadDocument moved = CommentNotes.MoveIntoNotes(r.Document!, r.Comments);
        string text = CanonicalWriter.Write(moved);
        SourceReadResult again = Read(text);
        Assert.Empty(again.Comments);
        Assert.Equal(moved, again.Document);
        // the loads themselves: identical reductions, bit for bit
        var before = r.Resultants!.Cases.Cases["dead"].ResultAt(Core.Vector3.Zero);
        var after = again.Resultants!.Cases.Cases["dead"].ResultAt(Core.Vector3.Zero);
        Assert.Equal((before.System.Force, before.System.Moment), (after.System.Force, after.System.Moment));
        // and the documents differ only in their notes
        Assert.Equal(r.Document! with { Note = null, Cases = [.. r.Document!.Cases.Select(c => c with { Note = null, Items = [.. c.Items.Select(i => i with { Note = null })] })] },
            moved with { Note = null, Cases = [.. moved.Cases.Select(c => c with { Note = null, Items = [.. c.Items.Select(i => i with { Note = null })] })] });
    }

    [Fact]
    public void A_comment_after_other_text_on_its_line_is_refused_with_its_position()
    {
        SourceComment c = Refused("""
            { "cases": { "dead": { "loads": [
              { "id": "a", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -1] }, // trailing
              { "id": "b", "kind": "couple", "value": [0, 0, 1] } ] } } }
            """);
        Assert.Equal((2, 73), (c.Line, c.Column)); // the first '/' of the comment on line 2
        Assert.Contains("other text on its line", c.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_comment_before_a_combination_inside_an_item_or_at_the_end_is_refused()
    {
        SourceComment combination = Refused("""
            { "cases": { "d": { "loads": [] } },
              "combinations": {
                // EN 1990 (6.10)
                "uls": { "d": 1.35 } } }
            """);
        Assert.Equal((3, 5), (combination.Line, combination.Column));
        Assert.Contains("the key \"uls\"", combination.Problem, StringComparison.Ordinal);

        SourceComment inside = Refused("""
            { "cases": { "d": { "loads": [ {
                // inside the item
                "kind": "couple", "value": [0, 0, 1] } ] } } }
            """);
        Assert.Equal((2, 5), (inside.Line, inside.Column));

        SourceComment end = Refused("{ \"cases\": { \"d\": { \"loads\": [] } } }\n// the end\n");
        Assert.Equal((2, 1), (end.Line, end.Column));
        Assert.Contains("end of the file", end.Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_blank_line_between_a_comment_and_the_item_is_refused_for_every_comment_of_the_run()
    {
        SourceReadResult r = Read("""
            { "cases": { "d": { "loads": [
              // heading of a group?
              // or of this item?

              { "kind": "couple", "value": [0, 0, 1] } ] } } }
            """);
        Assert.Equal(2, r.Comments.Count);
        Assert.All(r.Comments, c => Assert.Null(c.Target));
        Assert.Equal(2, CommentNotes.FirstUnplaced(r.Comments)!.Line);
        Assert.Contains("blank line", r.Comments[1].Problem, StringComparison.Ordinal);
    }

    [Fact]
    public void A_file_without_comments_has_none_and_moving_them_changes_nothing()
    {
        SourceReadResult r = Read("""{ "cases": { "d": { "loads": [ { "kind": "couple", "value": [0, 0, 1], "note": "n" } ] } } }""");
        Assert.False(r.HasComments);
        Assert.Empty(r.Comments);
        Assert.Equal(r.Document, CommentNotes.MoveIntoNotes(r.Document!, r.Comments));
    }

    [Fact]
    public void Offsets_after_a_byte_order_mark_still_find_the_item()
    {
        byte[] json = [0xEF, 0xBB, 0xBF, .. System.Text.Encoding.UTF8.GetBytes("{ \"cases\": { \"d\": { \"loads\": [\n  // é note\n  { \"kind\": \"couple\", \"value\": [0, 0, 1] } ] } } }")];
        SourceReadResult r = LoadDocumentReader.ReadBytes(json, "m.loads.json", ".");
        Assert.True(r.Succeeded);
        SourceComment c = Assert.Single(r.Comments);
        Assert.Equal(new CommentTarget(CommentPlace.Item, "d", 0), c.Target);
        Assert.Equal("é note", c.Text);
        Assert.Equal((2, 3), (c.Line, c.Column));
    }
}
