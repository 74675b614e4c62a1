using System.Text.Encodings.Web;
using System.Text.Json;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Formats.Json;

/// <summary>One case of a written load description: its name, title and items (forces and couples).</summary>
/// <param name="Name">Case name.</param>
/// <param name="Title">Free-text title, or null.</param>
/// <param name="Items">Point forces and free couples, written in order.</param>
public sealed record WrittenCase(string Name, string? Title, IReadOnlyList<LoadItem> Items);

/// <summary>
/// Writes a <c>.loads.json</c> document (SPEC §3) of point forces and free couples, with numbers in the shortest
/// form that round-trips each double, so that reading it back gives exactly the values written.
/// </summary>
public static class LoadFileWriter
{
    /// <summary>Writes the document as UTF-8.</summary>
    /// <exception cref="ArgumentException">An item kind this writer does not handle.</exception>
    public static void Write(Stream output, string? comment, string? title, UnitSystem units,
        IReadOnlyList<WrittenCase> cases, IReadOnlyList<LoadCombination> combinations)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(units);
        ArgumentNullException.ThrowIfNull(cases);
        ArgumentNullException.ThrowIfNull(combinations);
        using var w = new Utf8JsonWriter(output, new JsonWriterOptions { Indented = true, Encoder = JavaScriptEncoder.UnsafeRelaxedJsonEscaping });
        if (comment is not null)
        {
            foreach (string line in comment.Split('\n'))
            {
                w.WriteCommentValue(" " + line.Replace("*/", "* /", StringComparison.Ordinal) + " ");
            }
        }
        w.WriteStartObject();
        w.WriteString("format", LoadJsonWalker.FormatTag);
        if (title is not null)
        {
            w.WriteString("title", title);
        }
        w.WriteStartObject("units");
        w.WriteString("force", units.Force.Symbol);
        w.WriteString("length", units.Length.Symbol);
        w.WriteString("mass", units.Mass.Symbol);
        w.WriteEndObject();
        w.WriteStartObject("cases");
        foreach (WrittenCase c in cases)
        {
            w.WriteStartObject(c.Name);
            if (c.Title is not null)
            {
                w.WriteString("title", c.Title);
            }
            w.WriteStartArray("loads");
            foreach (LoadItem item in c.Items)
            {
                w.WriteStartObject();
                w.WriteString("id", item.Id);
                switch (item)
                {
                    case PointForce f:
                        w.WriteString("kind", "force");
                        Vector(w, "at", f.At);
                        Vector(w, "value", f.Value);
                        break;
                    case FreeCouple m:
                        w.WriteString("kind", "couple");
                        Vector(w, "value", m.Value);
                        break;
                    default:
                        throw new ArgumentException($"cannot write a {item.Kind} item", nameof(cases));
                }
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndObject();
        if (combinations.Count > 0)
        {
            w.WriteStartObject("combinations");
            foreach (LoadCombination combination in combinations)
            {
                w.WriteStartObject(combination.Name);
                foreach (KeyValuePair<string, double> f in combination.Factors)
                {
                    w.WriteNumber(f.Key, f.Value);
                }
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        w.WriteEndObject();
        w.Flush();
        output.WriteByte((byte)'\n');
    }

    private static void Vector(Utf8JsonWriter w, string name, Vector3 v)
    {
        w.WriteStartArray(name);
        w.WriteNumberValue(v.X);
        w.WriteNumberValue(v.Y);
        w.WriteNumberValue(v.Z);
        w.WriteEndArray();
    }
}
