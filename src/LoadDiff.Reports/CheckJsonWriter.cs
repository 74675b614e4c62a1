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
        w.WriteBoolean("cases_equivalent", result.CasesEquivalent);
        w.WriteStartArray("warnings");
        foreach (string warning in result.Warnings)
        {
            w.WriteStringValue(warning);
        }
        w.WriteEndArray();
        JsonOut.Units(w, result.Units);
        JsonOut.Vector(w, "reference_point", result.ReferencePoint);
        w.WriteString("reference", result.ReferenceDescription);
        w.WriteStartObject("tolerance_rule");
        w.WriteNumber("relative", result.Tolerance.Relative);
        w.WriteNumber("force", result.Tolerance.Force);
        w.WriteNumber("moment", result.Tolerance.Moment);
        w.WriteBoolean("relative_is_default", result.DefaultRelative);
        if (result.Tolerance.Length is { } length)
        {
            w.WriteNumber("length", length);
        }
        else
        {
            w.WriteNull("length");
        }
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
                w.WriteString("force_governed_by", CheckWords.Governs(t.ForceGovernedBy));
                w.WriteString("moment_governed_by", CheckWords.Governs(t.MomentGovernedBy));
                w.WriteNumber("gross_force", t.GrossForce);
                w.WriteNumber("gross_moment", t.GrossMoment);
                w.WriteNumber("box_diagonal", t.Diagonal);
                w.WriteBoolean("length_stated", t.DiagonalStated);
                w.WriteNumber("rounding_force", t.Noise.Force);
                w.WriteNumber("rounding_moment", t.Noise.Moment);
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
            Explanation(w, c, result);
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
        Gate(w, result);
        w.WriteString("caution", Caution.Text);
        w.WriteEndObject();
        w.Flush();
        output.WriteByte((byte)'\n');
    }

    private static void Explanation(Utf8JsonWriter w, CaseComparison c, CheckResult result)
    {
        if (c.Explanation is not { } e)
        {
            w.WriteNull("explanation");
            return;
        }
        w.WriteStartObject("explanation");
        w.WriteString("reading", e.Reading switch
        {
            ResidualReading.None => "none",
            ResidualReading.MisplacedResultant => "misplaced_resultant",
            ResidualReading.Couple => "couple",
            ResidualReading.MissingForce => "missing_force",
            _ => "missing_force_at_box_centre",
        });
        JsonOut.Vector(w, "missing_force", e.Force);
        JsonOut.Vector(w, "missing_couple", e.Couple);
        JsonOut.Vector(w, "point", e.Point);
        JsonOut.NullableVector(w, "shift", e.Shift);
        JsonOut.NullableVector(w, "direction", e.AxisDirection);
        if (e.AxisDistance is { } d)
        {
            w.WriteNumber("axis_distance", d);
        }
        else
        {
            w.WriteNull("axis_distance");
        }
        w.WriteStartArray("suspects");
        foreach (SuspectItem x in e.Suspects)
        {
            w.WriteStartObject();
            w.WriteString("id", x.Id);
            w.WriteString("file", x.InOriginal ? "original" : "substitute");
            if (x.Case is { } k)
            {
                w.WriteString("case", k);
            }
            else
            {
                w.WriteNull("case");
            }
            w.WriteNumber("factor", x.Factor);
            w.WriteString("kind", x.Kind switch { SuspectKind.LeftOut => "left_out", SuspectKind.NoCounterpart => "no_counterpart", _ => "sign_reversed" });
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteBoolean("search_bounded", e.SearchBounded);
        w.WriteStartArray("sentences");
        foreach (string line in CheckWords.Explanation(c, result))
        {
            w.WriteStringValue(line);
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void Gate(Utf8JsonWriter w, CheckResult result)
    {
        if (result.SectionGate is not { } g)
        {
            w.WriteNull("section_gate");
            return;
        }
        w.WriteStartObject("section_gate");
        w.WriteBoolean("passes", g.Passes);
        JsonOut.Vector(w, "axis_origin", g.Axis.Origin);
        JsonOut.Vector(w, "axis_direction", g.Axis.Direction);
        w.WriteNumber("relative_tolerance", g.RelativeTolerance);
        w.WriteStartArray("cases");
        foreach (LoadDiff.Core.Sections.SectionGateCase c in g.Cases)
        {
            w.WriteStartObject();
            w.WriteString("name", c.Name);
            w.WriteString("kind", c.Kind == EntryKind.Case ? "case" : "combination");
            w.WriteBoolean("passes", c.Passes);
            w.WriteNumber("max_moment_deviation", c.MaxMomentDeviation);
            w.WriteNumber("max_moment_deviation_at", c.MaxMomentDeviationAt);
            w.WriteNumber("allowed_moment", c.AllowedMoment);
            w.WriteNumber("peak_moment", c.PeakMoment);
            if (c.PeakExtent is { } x)
            {
                w.WriteStartArray("peak_extent");
                w.WriteNumberValue(x.Min);
                w.WriteNumberValue(x.Max);
                w.WriteEndArray();
            }
            else
            {
                w.WriteNull("peak_extent");
            }
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
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
