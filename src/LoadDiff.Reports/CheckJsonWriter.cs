using System.Text.Json;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>The documented JSON of <c>check</c> (schema_version 1; SPEC §4 keys plus a few more).</summary>
public static class CheckJsonWriter
{
    /// <summary>Schema version of this output.</summary>
    public const int SchemaVersion = 1;

    /// <summary>Writes the check result as UTF-8 JSON.</summary>
    public static void Write(CheckResult result, Stream output, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(result);
        using Utf8JsonWriter w = JsonOut.Begin(output, SchemaVersion, toolVersion);
        w.WriteString("original_file", result.OriginalPath);
        w.WriteString("substitute_file", result.SubstitutePath);
        w.WriteBoolean("equivalent", result.Equivalent);
        JsonOut.Units(w, result.Units);
        JsonOut.Vector(w, "reference_point", result.ReferencePoint);
        w.WriteString("reference", result.ReferenceDescription);
        w.WriteStartObject("tolerance_rule");
        w.WriteNumber("relative", result.Tolerance.Relative);
        w.WriteNumber("force", result.Tolerance.Force);
        w.WriteNumber("moment", result.Tolerance.Moment);
        w.WriteBoolean("relative_is_default", result.DefaultRelative);
        w.WriteEndObject();
        w.WriteStartArray("cases");
        foreach (CaseComparison c in result.Comparisons)
        {
            w.WriteStartObject();
            w.WriteString("name", c.Name);
            w.WriteString("kind", c.Kind == EntryKind.Case ? "case" : "combination");
            w.WriteBoolean("equivalent", c.Equivalent);
            WriteSystem(w, "original", c.Original);
            WriteSystem(w, "substitute", c.Substitute);
            if (c.Residual is { } r)
            {
                w.WriteStartObject("residual");
                JsonOut.Vector(w, "force", r.System.Force);
                JsonOut.Vector(w, "moment", r.System.Moment);
                w.WriteNumber("force_norm", r.ForceNorm);
                w.WriteNumber("moment_norm", r.MomentNorm);
                w.WriteNumber("worst_moment_norm", r.WorstMomentNorm);
                JsonOut.Vector(w, "worst_moment_at", r.WorstCorner);
                bool hasAxis = r.Wrench.Kind is SystemKind.Force or SystemKind.Wrench;
                JsonOut.NullableVector(w, "axis_point", hasAxis ? r.Wrench.AxisPoint : null);
                JsonOut.NullableVector(w, "axis_direction", hasAxis ? r.Wrench.AxisDirection : null);
                if (hasAxis)
                {
                    w.WriteNumber("pitch", r.Wrench.Pitch!.Value);
                }
                else
                {
                    w.WriteNull("pitch");
                }
                JsonOut.Vector(w, "axis_couple", r.Wrench.MinimumCouple);
                w.WriteString("system", Describe.SystemCode(r.Wrench.Kind));
                w.WriteEndObject();
            }
            else
            {
                w.WriteNull("residual");
            }
            if (c.Tolerance is { } t)
            {
                w.WriteStartObject("tolerance");
                w.WriteNumber("force", t.Force);
                w.WriteNumber("moment", t.Moment);
                w.WriteString("force_governed_by", CheckWords.Governs(t.ForceGovernedByRelative));
                w.WriteString("moment_governed_by", CheckWords.Governs(t.MomentGovernedByRelative));
                w.WriteNumber("gross_force", t.GrossForce);
                w.WriteNumber("gross_moment", t.GrossMoment);
                w.WriteNumber("box_diagonal", t.Diagonal);
                w.WriteEndObject();
            }
            else
            {
                w.WriteNull("tolerance");
            }
            switch (c.Presence)
            {
                case OnlyIn.Original:
                    w.WriteString("only_in", "original");
                    break;
                case OnlyIn.Substitute:
                    w.WriteString("only_in", "substitute");
                    break;
                default:
                    w.WriteNull("only_in");
                    break;
            }
            w.WriteStartArray("notes");
            foreach (string n in c.Notes)
            {
                w.WriteStringValue(n);
            }
            w.WriteEndArray();
            if (result.Contributors.TryGetValue(c.Name, out CaseContributors? k))
            {
                w.WriteStartObject("largest_items");
                Contributors(w, "original", k.Original);
                Contributors(w, "substitute", k.Substitute);
                w.WriteEndObject();
            }
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("caution", Caution.Text);
        w.WriteEndObject();
        w.Flush();
        output.WriteByte((byte)'\n');
    }

    private static void WriteSystem(Utf8JsonWriter w, string name, LoadReduction? r)
    {
        if (r is null)
        {
            w.WriteNull(name);
            return;
        }
        w.WriteStartObject(name);
        JsonOut.Vector(w, "force", r.Force);
        JsonOut.Vector(w, "moment", r.Moment);
        w.WriteNumber("gross_force", r.GrossForce);
        w.WriteNumber("gross_couple", r.GrossCouple);
        w.WriteNumber("item_count", r.ItemCount);
        w.WriteEndObject();
    }

    private static void Contributors(Utf8JsonWriter w, string name, IReadOnlyList<Contributor> list)
    {
        w.WriteStartArray(name);
        foreach (Contributor k in list)
        {
            w.WriteStartObject();
            w.WriteString("id", k.Id);
            w.WriteString("kind", k.Kind.ToString().ToLowerInvariant());
            JsonOut.Vector(w, "force", k.Force);
            JsonOut.Vector(w, "couple", k.Couple);
            JsonOut.NullableVector(w, "centroid", k.Centroid);
            w.WriteNumber("parts", k.Parts);
            w.WriteEndObject();
        }
        w.WriteEndArray();
    }
}
