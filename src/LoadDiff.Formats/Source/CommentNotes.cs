namespace LoadDiff.Formats.Source;

/// <summary>
/// Moves comments into notes (<c>fmt --comments-to-notes</c>): each comment becomes a line of the note of the document,
/// case or item it directly precedes; a note the element already has comes first, then a line feed, then the comments.
/// </summary>
public static class CommentNotes
{
    /// <summary>Separator between an existing note and the comment text added to it, and between successive comments.</summary>
    public const string Separator = "\n";

    /// <summary>The first comment that cannot become a note, or null when all can.</summary>
    public static SourceComment? FirstUnplaced(IReadOnlyList<SourceComment> comments)
    {
        ArgumentNullException.ThrowIfNull(comments);
        return comments.FirstOrDefault(c => c.Target is null);
    }

    /// <summary>The document with every comment moved into the note of the element it precedes.</summary>
    /// <exception cref="ArgumentException">A comment has no target (check <see cref="FirstUnplaced"/> first).</exception>
    public static LoadDocument MoveIntoNotes(LoadDocument document, IReadOnlyList<SourceComment> comments)
    {
        ArgumentNullException.ThrowIfNull(document);
        ArgumentNullException.ThrowIfNull(comments);
        if (FirstUnplaced(comments) is { } bad)
        {
            throw new ArgumentException($"the comment at line {bad.Line}, column {bad.Column} cannot become a note: {bad.Problem}; {SourceComment.Rule}", nameof(comments));
        }
        string? Text(CommentPlace place, string? @case, int item) =>
            Join(comments.Where(c => c.Target == new CommentTarget(place, @case, item) && c.Text.Length > 0).Select(c => c.Text));
        return document with
        {
            Note = Append(document.Note, Text(CommentPlace.Document, null, -1)),
            Cases = [.. document.Cases.Select(c => c with
            {
                Note = Append(c.Note, Text(CommentPlace.Case, c.Name, -1)),
                Items = [.. c.Items.Select((item, i) => item with { Note = Append(item.Note, Text(CommentPlace.Item, c.Name, i)) })],
            })],
        };
    }

    private static string? Join(IEnumerable<string> texts)
    {
        string joined = string.Join(Separator, texts);
        return joined.Length == 0 ? null : joined;
    }

    private static string? Append(string? note, string? text) =>
        text is null ? note : note is null or "" ? text : note + Separator + text;
}
