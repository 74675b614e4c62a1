using System.Text.Json;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;

namespace LoadDiff.Reports.Sections;

/// <summary>
/// The documented JSON of <c>sections</c> (schema_version 1). The top-level <c>stations</c> and <c>max_*</c> keys are
/// those of the first entry (the only one when one case is asked for); <c>cases</c> holds every entry in the same shape.
/// Vectors are in global axes; deviations are norms of vector differences, relative ones divided by the original's
/// largest norm along the axis (null when that is zero).
/// </summary>
public static class SectionsJsonWriter
{
    /// <summary>Schema version of this output.</summary>
    public const int SchemaVersion = 1;

    /// <summary>Writes the result as UTF-8 JSON.</summary>
    public static void Write(SectionsResult result, Stream output, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(result);
        using Utf8JsonWriter w = JsonOut.Begin(output, SchemaVersion, toolVersion);
        w.WriteString("original_file", result.OriginalPath);
        w.WriteString("substitute_file", result.SubstitutePath);
        JsonOut.Units(w, result.Units);
        JsonOut.Vector(w, "axis", result.Axis.Direction);
        JsonOut.Vector(w, "origin", result.Axis.Origin);
        w.WriteStartObject("frame");
        JsonOut.Vector(w, "e1", result.Axis.Direction);
        JsonOut.Vector(w, "e2", result.Axis.Lateral);
        JsonOut.Vector(w, "e3", result.Axis.Transverse);
        w.WriteEndObject();
        w.WriteString("convention", SectionsResult.Convention);
        if (result.Entries.Count > 0)
        {
            w.WriteString("case", result.Entries[0].Name);
            Body(w, result.Entries[0]);
        }
        w.WriteStartArray("cases");
        foreach (SectionsEntry e in result.Entries)
        {
            w.WriteStartObject();
            w.WriteString("name", e.Name);
            w.WriteString("kind", e.Kind == EntryKind.Case ? "case" : "combination");
            Body(w, e);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("caution", SectionsResult.SectionCaution + " " + Caution.Text);
        w.WriteEndObject();
        w.Flush();
        output.WriteByte((byte)'\n');
    }

    private static void Body(Utf8JsonWriter w, SectionsEntry e)
    {
        SectionComparison c = e.Comparison;
        w.WriteStartArray("stations");
        foreach (SectionStation s in c.Stations)
        {
            w.WriteStartObject();
            w.WriteNumber("s", s.S);
            JsonOut.Vector(w, "point", s.Original.ReferencePoint);
            w.WriteStartObject("original");
            JsonOut.Vector(w, "force", s.Original.Force);
            JsonOut.Vector(w, "moment", s.Original.Moment);
            w.WriteEndObject();
            w.WriteStartObject("substitute");
            JsonOut.Vector(w, "force", s.Substitute.Force);
            JsonOut.Vector(w, "moment", s.Substitute.Moment);
            w.WriteEndObject();
            w.WriteNumber("force_deviation", s.ForceDeviation);
            w.WriteNumber("moment_deviation", s.MomentDeviation);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteNumber("max_force_deviation", c.MaxForceDeviation);
        w.WriteNumber("max_force_deviation_at", c.MaxForceDeviationAt);
        w.WriteNumber("max_moment_deviation", c.MaxMomentDeviation);
        w.WriteNumber("max_moment_deviation_at", c.MaxMomentDeviationAt);
        Nullable(w, "max_force_deviation_relative", c.MaxForceDeviationRelative);
        Nullable(w, "max_moment_deviation_relative", c.MaxMomentDeviationRelative);
        w.WriteNumber("original_peak_force", c.OriginalPeakForce);
        w.WriteNumber("original_peak_moment", c.OriginalPeakMoment);
        JsonOut.Vector(w, "original_excluded_couple", c.OriginalExcludedCouple);
        JsonOut.Vector(w, "substitute_excluded_couple", c.SubstituteExcludedCouple);
        w.WriteBoolean("item_boundaries_included", c.BoundariesIncluded);
    }

    private static void Nullable(Utf8JsonWriter w, string name, double? v)
    {
        if (v is { } x)
        {
            w.WriteNumber(name, x);
        }
        else
        {
            w.WriteNull(name);
        }
    }
}
