using System.Text.Json;
using LoadDiff.Core.Diff;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>The documented JSON of <c>diff</c> (schema_version 1, snake_case keys, shortest round-trip numbers).</summary>
public static class DiffJsonWriter
{
    /// <summary>Schema version of this output.</summary>
    public const int SchemaVersion = 1;

    /// <summary>Writes the diff as UTF-8 JSON.</summary>
    public static void Write(DocumentDiff d, Stream output, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(d);
        using Utf8JsonWriter w = JsonOut.Begin(output, SchemaVersion, toolVersion);
        w.WriteString("old_file", d.OldName);
        w.WriteString("new_file", d.NewName);
        w.WriteBoolean("different", d.HasDifferences);
        JsonOut.Units(w, d.Units);
        w.WriteString("mass_unit", d.Units.Mass.Symbol);
        w.WriteBoolean("units_converted", d.UnitsConverted);
        w.WriteStartObject("new_units");
        w.WriteString("force", d.NewUnits.Force.Symbol);
        w.WriteString("length", d.NewUnits.Length.Symbol);
        w.WriteString("mass", d.NewUnits.Mass.Symbol);
        w.WriteEndObject();
        JsonOut.Vector(w, "reference_point", d.ReferencePoint);
        w.WriteString("reference", d.ReferenceDescription);
        w.WriteStartArray("settings");
        foreach (SettingChange s in d.Settings)
        {
            w.WriteStartObject();
            w.WriteString("what", s.What);
            w.WriteString("change", DiffWords.Change(s.Change));
            w.WriteString("old", s.Old);
            w.WriteString("new", s.New);
            w.WriteString("unit", s.Unit);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("items");
        foreach (ItemChange i in d.Items)
        {
            w.WriteStartObject();
            w.WriteString("case", i.Case);
            w.WriteString("id", i.Id);
            w.WriteBoolean("derived_id", i.DerivedId);
            w.WriteString("kind", i.Kind);
            w.WriteString("change", DiffWords.Change(i.Change));
            w.WriteStartArray("fields");
            foreach (FieldChange c in i.Fields)
            {
                w.WriteStartObject();
                w.WriteString("field", c.Field);
                w.WriteString("old", c.Old);
                w.WriteString("new", c.New);
                w.WriteString("unit", c.Unit);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            JsonOut.Vector(w, "delta_force", i.DeltaForce);
            JsonOut.Vector(w, "delta_moment", i.DeltaMoment);
            w.WriteStartArray("data");
            foreach (DataChange data in i.Data)
            {
                WriteData(w, data);
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("resultants");
        foreach (ResultantChange r in d.Resultants)
        {
            w.WriteStartObject();
            w.WriteString("name", r.Name);
            w.WriteString("kind", r.Kind == Core.Model.EntryKind.Case ? "case" : "combination");
            w.WriteString("not_shown", r.NotShown);
            WriteSystem(w, "old", r.NotShown is null ? r.Old : null);
            WriteSystem(w, "new", r.NotShown is null ? r.New : null);
            if (r.NotShown is null)
            {
                JsonOut.Vector(w, "delta_force", r.DeltaForce);
                JsonOut.Vector(w, "delta_moment", r.DeltaMoment);
            }
            else
            {
                w.WriteNull("delta_force");
                w.WriteNull("delta_moment");
            }
            w.WriteBoolean("unchanged", r.Unchanged);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("notes");
        foreach (string n in d.Notes)
        {
            w.WriteStringValue(n);
        }
        w.WriteEndArray();
        var text = new System.Text.StringBuilder();
        w.WriteBoolean("has_listings", d.HasListings);
        foreach (ListingLine l in d.HasListings ? ListingDiff.Lines(d.OldListing, d.NewListing) : [])
        {
            text.Append(l.Tag == '@' ? l.Text : l.Tag + l.Text).Append('\n');
        }
        w.WriteString("listing_diff", text.ToString());
        if (d.ListingSignificantDigits is { } digits)
        {
            w.WriteNumber("listing_significant_digits", digits);
        }
        else
        {
            w.WriteNull("listing_significant_digits");
        }
        w.WriteString("caution", DiffWords.Caution);
        w.WriteEndObject();
    }

    private static void WriteData(Utf8JsonWriter w, DataChange c)
    {
        w.WriteStartObject();
        w.WriteString("table", c.Table);
        w.WriteString("old_file", c.OldFile);
        w.WriteString("new_file", c.NewFile);
        w.WriteString("matched_by", c.MatchedBy);
        w.WriteNumber("old_rows", c.OldRows);
        w.WriteNumber("new_rows", c.NewRows);
        w.WriteNumber("changed", c.Changed);
        w.WriteNumber("added", c.Added);
        w.WriteNumber("removed", c.Removed);
        w.WriteStartArray("rows");
        foreach (RowChange r in c.Shown)
        {
            w.WriteStartObject();
            w.WriteString("key", r.Key);
            w.WriteString("change", DiffWords.Change(r.Change));
            w.WriteNumber("old_line", r.OldLine);
            w.WriteNumber("new_line", r.NewLine);
            w.WriteString("old", r.Old);
            w.WriteString("new", r.New);
            if (r.DeltaForce is { } df && r.DeltaMoment is { } dm)
            {
                JsonOut.Vector(w, "delta_force", df);
                JsonOut.Vector(w, "delta_moment", dm);
            }
            else
            {
                w.WriteNull("delta_force");
                w.WriteNull("delta_moment");
            }
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteSystem(Utf8JsonWriter w, string name, ForceCoupleSystem? s)
    {
        if (s is not { } x)
        {
            w.WriteNull(name);
            return;
        }
        w.WriteStartObject(name);
        JsonOut.Vector(w, "force", x.Force);
        JsonOut.Vector(w, "moment", x.Moment);
        w.WriteEndObject();
    }
}
