using System.Text;

namespace LoadDiff.Reports.Html;

/// <summary>Escaping for HTML and SVG text and attribute values.</summary>
internal static class HtmlText
{
    public static string Escape(string s)
    {
        ArgumentNullException.ThrowIfNull(s);
        var b = new StringBuilder(s.Length + 8);
        foreach (char c in s)
        {
            b.Append(c switch
            {
                '&' => "&amp;",
                '<' => "&lt;",
                '>' => "&gt;",
                '"' => "&quot;",
                '\'' => "&#39;",
                _ => c.ToString(),
            });
        }
        return b.ToString();
    }
}
