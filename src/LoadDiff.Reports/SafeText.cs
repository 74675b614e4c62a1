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

    /// <summary>For Markdown: <see cref="Visible"/> (so no line break, hence no heading, can come from data), then HTML's &amp; &lt; &gt; as entities and every Markdown punctuation mark backslash-escaped, so that no tag, image, link, emphasis or table cell can be formed.</summary>
    public static string Markdown(string? s)
    {
        string v = Visible(s);
        var b = new StringBuilder(v.Length + 8);
        foreach (char c in v)
        {
            switch (c)
            {
                case '&': b.Append("&amp;"); break;
                case '<': b.Append("&lt;"); break;
                case '>': b.Append("&gt;"); break;
                case '\\' or '`' or '*' or '_' or '[' or ']' or '(' or ')' or '!' or '#' or '|' or '~' or '{' or '}' or '+' or '=' or ':':
                    b.Append('\\').Append(c);
                    break;
                default: b.Append(c); break;
            }
        }
        return b.ToString();
    }
}
