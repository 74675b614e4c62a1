using DiffPlex;
using DiffPlex.Model;

namespace LoadDiff.Reports;

/// <summary>One line of a listing diff: <c>' '</c> context, <c>'-'</c> old only, <c>'+'</c> new only, <c>'@'</c> a hunk header.</summary>
/// <param name="Tag">The line's tag.</param>
/// <param name="Text">The line without its tag.</param>
public readonly record struct ListingLine(char Tag, string Text);

/// <summary>
/// A unified line diff of two canonical listings (DiffPlex), with context lines. Both texts end in one newline,
/// which is stripped first so the last hunk carries no phantom empty line.
/// </summary>
public static class ListingDiff
{
    /// <summary>Context lines around each change.</summary>
    public const int ContextLines = 3;

    /// <summary>The hunks, empty when the listings are the same.</summary>
    public static IReadOnlyList<ListingLine> Lines(string oldText, string newText, int context = ContextLines)
    {
        ArgumentNullException.ThrowIfNull(oldText);
        ArgumentNullException.ThrowIfNull(newText);
        string a = oldText.EndsWith('\n') ? oldText[..^1] : oldText;
        string b = newText.EndsWith('\n') ? newText[..^1] : newText;
        DiffResult d = Differ.Instance.CreateLineDiffs(a, b, ignoreWhitespace: false, ignoreCase: false);
        var lines = new List<ListingLine>();
        List<DiffBlock> blocks = [.. d.DiffBlocks];
        int k = 0;
        while (k < blocks.Count)
        {
            // merge blocks whose gap of unchanged lines is at most 2·context into one hunk
            int last = k;
            while (last + 1 < blocks.Count && blocks[last + 1].DeleteStartA - (blocks[last].DeleteStartA + blocks[last].DeleteCountA) <= 2 * context)
            {
                last++;
            }
            int startA = Math.Max(0, blocks[k].DeleteStartA - context);
            int startB = Math.Max(0, blocks[k].InsertStartB - context);
            int endA = Math.Min(d.PiecesOld.Count, blocks[last].DeleteStartA + blocks[last].DeleteCountA + context);
            int endB = Math.Min(d.PiecesNew.Count, blocks[last].InsertStartB + blocks[last].InsertCountB + context);
            lines.Add(new ListingLine('@', $"@@ -{Range(startA, endA - startA)} +{Range(startB, endB - startB)} @@"));
            int ia = startA;
            for (int m = k; m <= last; m++)
            {
                DiffBlock blk = blocks[m];
                for (; ia < blk.DeleteStartA; ia++)
                {
                    lines.Add(new ListingLine(' ', d.PiecesOld[ia]));
                }
                for (int i = 0; i < blk.DeleteCountA; i++)
                {
                    lines.Add(new ListingLine('-', d.PiecesOld[blk.DeleteStartA + i]));
                }
                for (int i = 0; i < blk.InsertCountB; i++)
                {
                    lines.Add(new ListingLine('+', d.PiecesNew[blk.InsertStartB + i]));
                }
                ia = blk.DeleteStartA + blk.DeleteCountA;
            }
            for (; ia < endA; ia++)
            {
                lines.Add(new ListingLine(' ', d.PiecesOld[ia]));
            }
            k = last + 1;
        }
        return lines;
    }

    private static string Range(int start, int count) =>
        count == 1 ? (start + 1).ToString(System.Globalization.CultureInfo.InvariantCulture)
        : (count == 0 ? start : start + 1).ToString(System.Globalization.CultureInfo.InvariantCulture) + "," + count.ToString(System.Globalization.CultureInfo.InvariantCulture);
}
