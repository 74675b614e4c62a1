using System.Text.Json;
using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>
/// The documented JSON of <c>reduce</c> (schema_version 1, snake_case keys, numbers in the shortest form that
/// round-trips the double exactly).
/// </summary>
public static class ReduceJsonWriter
{
    /// <summary>Schema version of this output.</summary>
    public const int SchemaVersion = 1;

    /// <summary>Writes the reduction to a stream as UTF-8 JSON.</summary>
    public static void Write(ReduceResult result, Stream output, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(result);
        using Utf8JsonWriter w = JsonOut.Begin(output, SchemaVersion, toolVersion);
        w.WriteString("source", result.Source);
        if (result.Title is { } t)
        {
            w.WriteString("title", t);
        }
        JsonOut.Units(w, result.Units);
        JsonOut.Vector(w, "reference_point", result.ReferencePoint);
        w.WriteString("reference", result.ReferenceDescription);
        w.WriteStartArray("cases");
        foreach (ReducedEntry e in result.Entries)
        {
            LoadReduction r = e.Reduction;
            WrenchAnalysis wr = e.Wrench;
            w.WriteStartObject();
            w.WriteString("name", e.Name);
            w.WriteString("kind", e.Kind == EntryKind.Case ? "case" : "combination");
            if (e.Title is { } title)
            {
                w.WriteString("title", title);
            }
            if (e.Combination is { } c)
            {
                w.WriteStartObject("factors");
                foreach (KeyValuePair<string, double> f in c.Factors)
                {
                    w.WriteNumber(f.Key, f.Value);
                }
                w.WriteEndObject();
            }
            JsonOut.Vector(w, "force", r.Force);
            JsonOut.Vector(w, "moment", r.Moment);
            w.WriteNumber("gross_force", r.GrossForce);
            w.WriteNumber("gross_couple", r.GrossCouple);
            w.WriteNumber("gross_moment", r.GrossMoment);
            JsonOut.NullableVector(w, "centroid", r.Centroid);
            if (wr.Pitch is { } p)
            {
                w.WriteNumber("pitch", p);
            }
            else
            {
                w.WriteNull("pitch");
            }
            JsonOut.NullableVector(w, "axis_point", wr.AxisPoint);
            JsonOut.NullableVector(w, "axis_direction", wr.AxisDirection);
            JsonOut.Vector(w, "minimum_couple", wr.MinimumCouple);
            w.WriteBoolean("single_force", wr.Kind == SystemKind.Force);
            w.WriteString("system", Describe.SystemCode(wr.Kind));
            w.WriteBoolean("parallel", r.AllForcesParallel);
            w.WriteStartArray("plane_crossings");
            foreach (PlaneCrossing x in wr.Crossings)
            {
                w.WriteStartObject();
                w.WriteString("plane_normal", x.AxisName);
                JsonOut.Vector(w, "point", x.Point);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            if (wr.CentreOfParallelForces is { } cp)
            {
                JsonOut.Vector(w, "centre_of_parallel_forces", cp.Point);
            }
            else
            {
                w.WriteNull("centre_of_parallel_forces");
            }
            w.WriteNumber("item_count", r.ItemCount);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteString("caution", Caution.Text);
        w.WriteEndObject();
        w.Flush();
        output.WriteByte((byte)'\n');
    }
}

/// <summary>Small helpers shared by the JSON writers.</summary>
public static class JsonOut
{
    /// <summary>
    /// A writer with the documented conventions (indented, UTF-8 text unescaped, shortest round-trip numbers),
    /// already inside the top-level object with <c>schema_version</c> and <c>tool</c> written.
    /// </summary>
    public static Utf8JsonWriter Begin(Stream output, int schemaVersion, string toolVersion)
    {
        var w = new Utf8JsonWriter(output, new JsonWriterOptions
        {
            Indented = true,
            Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping,
        });
        w.WriteStartObject();
        w.WriteNumber("schema_version", schemaVersion);
        w.WriteStartObject("tool");
        w.WriteString("name", "loaddiff");
        w.WriteString("version", toolVersion);
        w.WriteEndObject();
        return w;
    }

    /// <summary>Writes <c>"name": [x, y, z]</c>.</summary>
    public static void Vector(Utf8JsonWriter w, string name, Vector3 v)
    {
        ArgumentNullException.ThrowIfNull(w);
        w.WriteStartArray(name);
        w.WriteNumberValue(v.X);
        w.WriteNumberValue(v.Y);
        w.WriteNumberValue(v.Z);
        w.WriteEndArray();
    }

    /// <summary>Writes a vector or null.</summary>
    public static void NullableVector(Utf8JsonWriter w, string name, Vector3? v)
    {
        ArgumentNullException.ThrowIfNull(w);
        if (v is { } x)
        {
            Vector(w, name, x);
        }
        else
        {
            w.WriteNull(name);
        }
    }

    /// <summary>Writes <c>"units": {"force": …, "length": …, "moment": …}</c>.</summary>
    public static void Units(Utf8JsonWriter w, LoadDiff.Core.Units.UnitSystem u)
    {
        ArgumentNullException.ThrowIfNull(w);
        ArgumentNullException.ThrowIfNull(u);
        w.WriteStartObject("units");
        w.WriteString("force", u.Force.Symbol);
        w.WriteString("length", u.Length.Symbol);
        w.WriteString("moment", u.MomentSymbol);
        w.WriteEndObject();
    }
}
