using System.Globalization;
using System.Text;
using LoadDiff.Reports.Html;

namespace LoadDiff.Reports;

/// <summary>The notes of a report's inputs as a Markdown table, every character of the free text escaped.</summary>
public static class NotesMarkdown
{
    /// <summary>Writes a "Basis of the loads" table followed by a blank line (after a blank line), or nothing when there are no notes.</summary>
    public static void Write(IReadOnlyList<ReportNote>? notes, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(w);
        if (notes is null || notes.Count == 0)
        {
            return;
        }
        w.WriteLine("#### Basis of the loads (notes in the inputs)");
        w.WriteLine();
        w.WriteLine("| file | on | note |");
        w.WriteLine("|---|---|---|");
        foreach (ReportNote n in notes)
        {
            w.WriteLine($"| {Text(n.Input)} | {Text(n.Where)} | {Text(n.Text)} |");
        }
        w.WriteLine();
    }

    /// <summary>
    /// Free text inside a Markdown table cell: the characters that format inside a cell (\ ` * _ [ ] | ~) backslash-escaped, &lt; and &amp; as entities (no
    /// HTML gets through), a line break as &lt;br&gt;, other control characters as \uXXXX.
    /// </summary>
    public static string Text(string s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var b = new StringBuilder(s.Length + 8);
        foreach (char c in s)
        {
            if (c == '\n')
            {
                b.Append("<br>");
            }
            else if (c == '&')
            {
                b.Append("&amp;");
            }
            else if (c == '<')
            {
                b.Append("&lt;");
            }
            else if (c < ' ' || c == '\u007f')
            {
                b.Append("\\u").Append(((int)c).ToString("x4", CultureInfo.InvariantCulture));
            }
            else if ("\\`*_[]|~".Contains(c, StringComparison.Ordinal))
            {
                b.Append('\\').Append(c);
            }
            else
            {
                b.Append(c);
            }
        }
        return b.ToString();
    }
}
