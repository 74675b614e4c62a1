using System.Text;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Formats.Source;

/// <summary>
/// Writes a <see cref="LoadDocument"/> in the canonical form of <c>loaddiff fmt</c>:
/// top-level keys in the order format, title, note, units, gravity, points, cases, combinations; a case's keys in the
/// order title, note, loads; named points, cases, items, combinations and factors in the order of the file; each item
/// on one line with its keys in the fixed order id, kind, the kind's fields (<see cref="Quantities.FieldOrder"/>), note;
/// numbers in the shortest text that reads back as the same double; two-space indentation, LF line ends, a final newline, no comments.
/// Reading the output gives exactly the same document.
/// </summary>
public static class CanonicalWriter
{
    /// <summary>The canonical text of a document.</summary>
    public static string Write(LoadDocument document)
    {
        ArgumentNullException.ThrowIfNull(document);
        var sb = new StringBuilder();
        sb.Append("{\n");
        var top = new List<string>
        {
            "  \"format\": " + SourceText.Quoted(Json.LoadJsonWalker.FormatTag),
        };
        if (document.Title is not null)
        {
            top.Add("  \"title\": " + SourceText.Quoted(document.Title));
        }
        if (document.Note is not null)
        {
            top.Add("  \"note\": " + SourceText.Quoted(document.Note));
        }
        top.Add($"  \"units\": {{ \"force\": {SourceText.Quoted(document.Units.Force.Symbol)}, \"length\": {SourceText.Quoted(document.Units.Length.Symbol)}, \"mass\": {SourceText.Quoted(document.Units.Mass.Symbol)} }}");
        if (document.Gravity is { } g)
        {
            top.Add("  \"gravity\": " + SourceText.Vector(g));
        }
        if (document.Points.Length > 0)
        {
            top.Add("  \"points\": {\n" + string.Join(",\n", document.Points.Select(p => "    " + SourceText.Quoted(p.Key) + ": " + SourceText.Vector(p.Value))) + "\n  }");
        }
        top.Add("  \"cases\": {\n" + string.Join(",\n", document.Cases.Select(Case)) + "\n  }");
        if (document.Combinations.Length > 0)
        {
            top.Add("  \"combinations\": {\n" + string.Join(",\n", document.Combinations.Select(Combination)) + "\n  }");
        }
        sb.Append(string.Join(",\n", top));
        sb.Append("\n}\n");
        return sb.ToString();
    }

    /// <summary>One item on one line: <c>{ "id": …, "kind": …, fields… }</c>.</summary>
    public static string Item(SourceItem item)
    {
        ArgumentNullException.ThrowIfNull(item);
        var parts = new List<string>();
        if (item.Id is not null)
        {
            parts.Add("\"id\": " + SourceText.Quoted(item.Id));
        }
        parts.Add("\"kind\": " + SourceText.Quoted(item.Kind));
        parts.AddRange(item.Fields.Select(f => SourceText.Quoted(f.Name) + ": " + SourceText.Of(f.Value)));
        if (item.Note is not null)
        {
            parts.Add("\"note\": " + SourceText.Quoted(item.Note));
        }
        return "{ " + string.Join(", ", parts) + " }";
    }

    private static string Case(SourceCase c)
    {
        var sb = new StringBuilder();
        sb.Append("    ").Append(SourceText.Quoted(c.Name)).Append(": {\n");
        if (c.Title is not null)
        {
            sb.Append("      \"title\": ").Append(SourceText.Quoted(c.Title)).Append(",\n");
        }
        if (c.Note is not null)
        {
            sb.Append("      \"note\": ").Append(SourceText.Quoted(c.Note)).Append(",\n");
        }
        if (c.Items.Length == 0)
        {
            sb.Append("      \"loads\": []\n");
        }
        else
        {
            sb.Append("      \"loads\": [\n");
            sb.Append(string.Join(",\n", c.Items.Select(i => "        " + Item(i))));
            sb.Append("\n      ]\n");
        }
        sb.Append("    }");
        return sb.ToString();
    }

    private static string Combination(LoadCombination c) =>
        "    " + SourceText.Quoted(c.Name) + ": { "
        + string.Join(", ", c.Factors.Select(f => SourceText.Quoted(f.Key) + ": " + SourceText.Number(f.Value)))
        + (c.Factors.Length == 0 ? "}" : " }");
}
