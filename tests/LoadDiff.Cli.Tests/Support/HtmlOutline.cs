using System.Text;
using System.Xml;
using System.Xml.Linq;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>
/// The structure of a report page for golden files: elements with their ids and classes and the text of headings,
/// paragraphs and table cells; each SVG drawing only as counts of its element kinds (its coordinates are not
/// structure); the creation time replaced by a marker.
/// </summary>
public static class HtmlOutline
{
    /// <summary>Parses the report as XML: the pages are written well-formed, so any parser can read them.</summary>
    public static XDocument Parse(string html)
    {
        var settings = new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore, XmlResolver = null };
        using var reader = XmlReader.Create(new StringReader(html), settings);
        return XDocument.Load(reader);
    }

    public static string Of(string html)
    {
        XDocument doc = Parse(html);
        var b = new StringBuilder();
        Walk(doc.Root!, 0, b);
        return b.ToString();
    }

    private static void Walk(XElement e, int depth, StringBuilder b)
    {
        string name = e.Name.LocalName;
        string indent = new(' ', depth * 2);
        string id = e.Attribute("id") is { } i ? "#" + i.Value : "";
        string cls = e.Attribute("class") is { } c ? "." + c.Value.Replace(' ', '.') : "";
        if (name == "style")
        {
            b.AppendLine($"{indent}style ({e.Value.Split('\n').Length} lines)");
            return;
        }
        if (name == "svg")
        {
            var counts = e.Descendants().GroupBy(d => d.Name.LocalName).OrderBy(g => g.Key, StringComparer.Ordinal)
                .Select(g => $"{g.Key}×{g.Count()}");
            b.AppendLine($"{indent}svg{cls} [{e.Attribute("aria-label")?.Value}] {string.Join(" ", counts)}");
            return;
        }
        if (name == "time")
        {
            b.AppendLine($"{indent}time{id} [date]");
            return;
        }
        bool leaf = !e.Elements().Any();
        string text = leaf ? Normalise(e.Value) : "";
        b.AppendLine($"{indent}{name}{id}{cls}{(text.Length > 0 ? ": " + text : "")}");
        if (!leaf && name is "p" or "h1" or "h2" or "h3" or "td" or "th" or "figcaption")
        {
            b.AppendLine($"{indent}  = {Normalise(string.Concat(e.Nodes().Select(n => n is XElement x && x.Name.LocalName == "time" ? "[date]" : n is XElement y ? y.Value : n.ToString())))}");
            return;
        }
        foreach (XElement child in e.Elements())
        {
            Walk(child, depth + 1, b);
        }
    }

    private static string Normalise(string s) => string.Join(' ', s.Split([' ', '\n', '\r', '\t'], StringSplitOptions.RemoveEmptyEntries));
}
