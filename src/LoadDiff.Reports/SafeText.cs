using System.Globalization;
using System.Text;
using LoadDiff.Core.Text;

namespace LoadDiff.Reports;

/// <summary>
/// Free text from input (titles, notes, names, file names) is data, never markup: one place turns it into text that
/// cannot forge a line, move the terminal's cursor, or form markup in the format it is written into.
/// </summary>
public static class SafeText
{
    /// <summary>For plain text: control, line-separator and bidi characters and lone surrogates become visible escapes (<c>\n</c>, <c>\u001B</c>); a backslash stays as it is.</summary>
    public static string Visible(string? s)
    {
        if (string.IsNullOrEmpty(s))
        {
            return s ?? "";
        }
        StringBuilder? b = null;
        for (int i = 0; i < s.Length; i++)
        {
            char c = s[i];
            bool lone = char.IsHighSurrogate(c) ? !(i + 1 < s.Length && char.IsLowSurrogate(s[i + 1]))
                : char.IsLowSurrogate(c) && !(i > 0 && char.IsHighSurrogate(s[i - 1]));
            if (!NameCharacters.IsForbidden(c) && !lone)
            {
                b?.Append(c);
                continue;
            }
            b ??= new StringBuilder(s, 0, i, s.Length + 16);
            b.Append(c switch
            {
                '\n' => "\\n",
                '\r' => "\\r",
                '\t' => "\\t",
                _ => "\\u" + ((int)c).ToString("X4", CultureInfo.InvariantCulture),
            });
        }
        return b?.ToString() ?? s;
    }

    /// <summary>For XML 1.0 text and attributes (JUnit, SVG): <see cref="Visible"/>, and U+FFFE/U+FFFF (also forbidden by XML) shown the same way. Escaping of &lt; &amp; is left to the XML writer.</summary>
    public static string Xml(string? s)
    {
        string v = Visible(s);
        return v.Contains('\uFFFE') || v.Contains('\uFFFF') ? v.Replace("\uFFFE", "\\uFFFE").Replace("\uFFFF", "\\uFFFF") : v;
    }

    /// <summary>
    /// For Markdown running text: <see cref="Visible"/> (so no line break, hence no heading, can come from data), HTML's
    /// &amp; &lt; &gt; as entities, and the characters that open inline markup (emphasis, code, links, images, table
    /// cells, strike-through) backslash-escaped; a block marker at the start is escaped too (a '>' there is already an
    /// entity). Other punctuation is left alone so that generated text (|ΔM| = 10 kN·m (PASS): …) reads as it is.
    /// </summary>
    public static string Markdown(string? s)
    {
        string v = Visible(s);
        var b = new StringBuilder(v.Length + 8);
        int listNumber = ListNumberLength(v);
        for (int i = 0; i < v.Length; i++)
        {
            char c = v[i];
            if (i == 0 && c is '#' or '+' or '-' or '=')
            {
                b.Append('\\');
            }
            switch (c)
            {
                case '&': b.Append("&amp;"); break;
                case '<': b.Append("&lt;"); break;
                case '>': b.Append("&gt;"); break;
                // Markdown drops spaces at the ends of a line or cell, and four at the start make code: as an entity a space stays text.
                case ' ' when i == 0 || i == v.Length - 1: b.Append("&#32;"); break;
                case '\\' or '`' or '*' or '_' or '[' or ']' or '|' or '~':
                    b.Append('\\').Append(c);
                    break;
                // "1." or "2)" at the start would open a numbered list; a backslash cannot escape a digit, so the mark is escaped.
                case '.' or ')' when i == listNumber: b.Append('\\').Append(c); break;
                default: b.Append(c); break;
            }
        }
        return b.ToString();
    }

    /// <summary>
    /// For a Markdown code span (file names, ids, values): <see cref="Visible"/>, fenced by one backtick more than the
    /// longest run inside so that no backtick in the data ends it; in a table cell a bar is written \| (GitHub's tables
    /// split cells before code spans are read). Nothing inside a code span is markup, so nothing else is escaped.
    /// </summary>
    public static string MarkdownCode(string? s, bool inTable)
    {
        string v = Visible(s);
        if (inTable)
        {
            v = v.Replace("|", "\\|", StringComparison.Ordinal);
        }
        int longest = 0, run = 0;
        foreach (char c in v)
        {
            run = c == '`' ? run + 1 : 0;
            longest = Math.Max(longest, run);
        }
        string fence = new('`', longest + 1);
        // A space each side keeps a backtick at either end from joining the fence; Markdown strips one such space each side
        // (CommonMark §6.1), so data starting or ending with a space gets one too.
        string pad = v.Length > 0 && v.Trim(' ').Length > 0 && (v[0] is '`' or ' ' || v[^1] is '`' or ' ') ? " " : "";
        return fence + pad + v + pad + fence;
    }

    // The position of the '.' or ')' after the digits a string starts with, or -1.
    private static int ListNumberLength(string v)
    {
        int i = 0;
        while (i < v.Length && char.IsAsciiDigit(v[i]))
        {
            i++;
        }
        return i > 0 && i < v.Length && v[i] is '.' or ')' ? i : -1;
    }
}
