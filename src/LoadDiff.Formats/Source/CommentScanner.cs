using System.Text;
using System.Text.Json;
using LoadDiff.Formats.Json;

namespace LoadDiff.Formats.Source;

/// <summary>
/// Finds the comments of a validated load file and the element each one directly precedes, by matching the byte
/// offset of the token after it against the tree's offsets (the document's opening brace, each case's key, each
/// item's opening brace). A comment becomes a note only when that is unambiguous: it stands on its own line(s),
/// and nothing but white space without a blank line lies between it and the element.
/// </summary>
internal static class CommentScanner
{
    public static List<SourceComment> Scan(byte[] text, JsonNode root, int maxDepth)
    {
        var targets = new Dictionary<long, CommentTarget> { [root.Offset] = new CommentTarget(CommentPlace.Document, null, -1) };
        foreach (JsonMember c in root["cases"]!.Members!)
        {
            targets[c.KeyOffset] = new CommentTarget(CommentPlace.Case, c.Key, -1);
            List<JsonNode> loads = c.Value["loads"]!.Elements!;
            for (int i = 0; i < loads.Count; i++)
            {
                targets[loads[i].Offset] = new CommentTarget(CommentPlace.Item, c.Key, i);
            }
        }
        var lines = new LineIndex(text);
        var found = new List<SourceComment>();
        var pending = new List<(long Start, long End)>();
        var reader = new Utf8JsonReader(text, new JsonReaderOptions
        {
            CommentHandling = JsonCommentHandling.Allow,
            AllowTrailingCommas = true,
            MaxDepth = maxDepth,
        });
        while (reader.Read())
        {
            if (reader.TokenType == JsonTokenType.Comment)
            {
                long start = reader.TokenStartIndex;
                pending.Add((start, CommentEnd(text, start)));
                continue;
            }
            if (pending.Count > 0)
            {
                string what = reader.TokenType switch
                {
                    JsonTokenType.PropertyName => "the key " + SourceText.Quoted(reader.GetString()!),
                    JsonTokenType.StartObject => "an object that is not an item or the document",
                    JsonTokenType.EndObject => "the end of an object",
                    JsonTokenType.EndArray => "the end of an array",
                    _ => "a value",
                };
                Resolve(text, lines, pending, reader.TokenStartIndex, targets.GetValueOrDefault(reader.TokenStartIndex), what, found);
                pending.Clear();
            }
        }
        if (pending.Count > 0)
        {
            Resolve(text, lines, pending, text.Length, null, "the end of the file", found);
        }
        return found;
    }

    private static void Resolve(byte[] text, LineIndex lines, List<(long Start, long End)> run, long next, CommentTarget? target, string what,
        List<SourceComment> found)
    {
        // a comment is directly before the element only when every link of the chain from it to the element is
        var results = new SourceComment[run.Count];
        string? problem = null;
        for (int k = run.Count - 1; k >= 0; k--)
        {
            (long start, long end) = run[k];
            long following = k + 1 < run.Count ? run[k + 1].Start : next;
            string? own = !AloneOnLine(text, start) ? "it follows other text on its line"
                : Gap(text, end, following)
                ?? (k == run.Count - 1 && target is null ? $"it stands before {what}" : null);
            if (own is not null)
            {
                problem = own;
            }
            else if (problem is not null)
            {
                problem = $"the comment after it, at line {results[k + 1].Line}, cannot become a note, so neither can this one";
            }
            var (line, column) = lines.Locate(start);
            results[k] = new SourceComment(Body(text, start, end), line, column, problem is null ? target : null, problem);
        }
        found.AddRange(results);
    }

    // A line comment runs to the line end; a block comment to its closing marker (the reader has checked it is there).
    private static long CommentEnd(byte[] text, long start)
    {
        if (text[start + 1] == (byte)'/')
        {
            int nl = Array.IndexOf(text, (byte)'\n', (int)start);
            return nl < 0 ? text.Length : nl;
        }
        int close = text.AsSpan((int)start + 2).IndexOf("*/"u8);
        return start + 2 + close + 2;
    }

    private static bool AloneOnLine(byte[] text, long start)
    {
        for (long i = start - 1; i >= 0 && text[i] != (byte)'\n'; i--)
        {
            if (text[i] is not ((byte)' ' or (byte)'\t' or (byte)'\r'))
            {
                return false;
            }
        }
        return true;
    }

    // Only white space, with at most one line break: the comment is directly before what follows.
    private static string? Gap(byte[] text, long from, long to)
    {
        int breaks = 0;
        for (long i = from; i < to; i++)
        {
            byte b = text[i];
            if (b == (byte)'\n')
            {
                breaks++;
            }
            else if (b is not ((byte)' ' or (byte)'\t' or (byte)'\r'))
            {
                return "other text stands between it and what follows";
            }
        }
        return breaks <= 1 ? null : "a blank line separates it from what follows";
    }

    private static string Body(byte[] text, long start, long end)
    {
        bool line = text[start + 1] == (byte)'/';
        int from = (int)start + 2, to = (int)end - (line ? 0 : 2);
        string body = Encoding.UTF8.GetString(text, from, to - from);
        return string.Join('\n', body.Split('\n').Select(l => l.Trim())).Trim();
    }
}
