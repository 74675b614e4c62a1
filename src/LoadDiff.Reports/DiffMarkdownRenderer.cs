using LoadDiff.Core.Diff;

namespace LoadDiff.Reports;

/// <summary>The diff as GitHub-flavoured Markdown, fit to paste into a review comment.</summary>
public static class DiffMarkdownRenderer
{
    /// <summary>Writes the diff.</summary>
    public static void Write(DocumentDiff d, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(w);
        string f = d.Units.Force.Symbol, m = d.Units.MomentSymbol;
        w.WriteLine($"### Load description diff: {(d.HasDifferences ? "changes found" : "no differences")}");
        w.WriteLine();
        w.WriteLine($"{Esc(d.OldName)} → {Esc(d.NewName)}. Units {f}, {d.Units.Length.Symbol}, {d.Units.Mass.Symbol}; contributions and resultants about {Esc(DiffWords.Point(d))}.");
        foreach (string note in d.Notes)
        {
            w.WriteLine();
            w.WriteLine("> " + Esc(note));
        }
        if (d.Settings.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("| document | change | old | new |");
            w.WriteLine("|---|---|---|---|");
            foreach (SettingChange s in d.Settings)
            {
                string u = s.Unit.Length > 0 ? " " + s.Unit : "";
                w.WriteLine($"| {Esc(s.What)} | {DiffWords.Change(s.Change)} | {Code(s.Old, u)} | {Code(s.New, u)} |");
            }
        }
        if (d.Items.Count > 0)
        {
            w.WriteLine();
            w.WriteLine($"| case | item | change | fields (old → new) | ΔR_i ({f}) | ΔM_i ({m}) |");
            w.WriteLine("|---|---|---|---|---|---|");
            foreach (ItemChange i in d.Items)
            {
                string fields = string.Join("<br>", i.Fields.Select(c =>
                {
                    string u = c.Unit.Length > 0 ? " " + c.Unit : "";
                    return i.Change switch
                    {
                        ChangeKind.Added => $"{Esc(c.Field)}: {Code(c.New, u)}",
                        ChangeKind.Removed => $"{Esc(c.Field)}: {Code(c.Old, u)}",
                        _ => $"{Esc(c.Field)}: {Code(c.Old, u)} → {Code(c.New, u)}",
                    };
                }));
                foreach (DataChange data in i.Data)
                {
                    fields += "<br>" + Esc(DiffWords.DataHeading(data));
                    fields += string.Concat(data.Shown.Select(r => "<br>• " + Esc(DiffWords.Row(r, f, m))));
                }
                string id = SafeText.MarkdownCode(i.Id, inTable: true) + (i.DerivedId ? " (derived key)" : "");
                w.WriteLine($"| {Esc(i.Case)} | {id} ({Esc(i.Kind)}) | {DiffWords.Change(i.Change)} | {fields} | {DiffWords.Vec(i.DeltaForce)} | {DiffWords.Vec(i.DeltaMoment)} |");
            }
        }
        w.WriteLine();
        w.WriteLine($"| name | kind | R before ({f}) | R after | ΔR | M before ({m}) | M after | ΔM |");
        w.WriteLine("|---|---|---|---|---|---|---|---|");
        foreach (ResultantChange r in d.Resultants)
        {
            if (r.NotShown is { } why)
            {
                w.WriteLine($"| {Esc(r.Name)} | {(r.Kind == Core.Model.EntryKind.Case ? "case" : "combination")} | {Esc(why)} | | | | | |");
                continue;
            }
            w.WriteLine($"| {Esc(r.Name)} | {(r.Kind == Core.Model.EntryKind.Case ? "case" : "combination")} | "
                + $"{(r.Old is { } o ? DiffWords.Vec(o.Force) : "—")} | {(r.New is { } n ? DiffWords.Vec(n.Force) : "—")} | {DiffWords.Vec(r.DeltaForce)} | "
                + $"{(r.Old is { } o2 ? DiffWords.Vec(o2.Moment) : "—")} | {(r.New is { } n2 ? DiffWords.Vec(n2.Moment) : "—")} | {DiffWords.Vec(r.DeltaMoment)} |");
        }
        IReadOnlyList<ListingLine> lines = d.HasListings ? ListingDiff.Lines(d.OldListing, d.NewListing) : [];
        if (lines.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("<details><summary>Canonical listing diff" + (d.ListingSignificantDigits is null ? "" : " (" + Esc(DiffWords.ListingBasis(d)) + ")") + "</summary>");
            w.WriteLine();
            w.WriteLine("````diff");
            foreach (ListingLine l in lines)
            {
                w.WriteLine(l.Tag == '@' ? l.Text : l.Tag + l.Text);
            }
            w.WriteLine("````");
            w.WriteLine();
            w.WriteLine("</details>");
        }
        w.WriteLine();
        w.WriteLine("**" + Esc(DiffWords.Summary(d)) + "**");
        w.WriteLine();
        w.WriteLine("_" + Esc(DiffWords.Caution) + "_");
    }

    private static string Code(string? s, string unit) => s is null ? "—" : SafeText.MarkdownCode(s, inTable: true) + Esc(unit);

    private static string Esc(string s) => ReduceMarkdownRenderer.Escape(s);
}
