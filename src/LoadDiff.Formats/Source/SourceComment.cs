namespace LoadDiff.Formats.Source;

/// <summary>What a comment stands directly before: the document, a case or an item.</summary>
public enum CommentPlace
{
    /// <summary>The document (the comment comes before its opening brace).</summary>
    Document,

    /// <summary>A load case (the comment comes before the case's key).</summary>
    Case,

    /// <summary>A load item (the comment comes before the item's opening brace).</summary>
    Item,
}

/// <summary>The element whose note a comment can become.</summary>
/// <param name="Place">Document, case or item.</param>
/// <param name="Case">The case name (null for the document).</param>
/// <param name="Item">The item's index in its case (−1 unless <paramref name="Place"/> is <see cref="CommentPlace.Item"/>).</param>
public sealed record CommentTarget(CommentPlace Place, string? Case, int Item);

/// <summary>
/// One comment of a load file: its text without the comment markers, where it starts, and the element it directly
/// precedes, or why it precedes none that can hold a note.
/// </summary>
/// <param name="Text">The comment's text: markers removed, each line trimmed, lines joined by a line feed.</param>
/// <param name="Line">1-based line of the comment's first character.</param>
/// <param name="Column">1-based column (in characters) of the comment's first character.</param>
/// <param name="Target">The document, case or item it stands directly before, or null.</param>
/// <param name="Problem">Why it cannot become a note (such as "it stands before the key \"uls\""), when <paramref name="Target"/> is null.</param>
public sealed record SourceComment(string Text, int Line, int Column, CommentTarget? Target, string? Problem)
{
    /// <summary>The rule a comment must meet to become a note.</summary>
    public const string Rule = "only a comment on its own line(s), directly before an item, a case or the document, can become a note";
}
