using System.Net;
using LoadDiff.Core.Diff;

namespace LoadDiff.Reports;

/// <summary>The diff as one self-contained HTML file: inline CSS, no scripts, nothing fetched.</summary>
public static class DiffHtmlRenderer
{
    private const string Style = """
        body { font-family: system-ui, sans-serif; margin: 2em; color: #1b1b1b; max-width: 80em; }
        h1 { font-size: 1.4em; } h2 { font-size: 1.15em; margin-top: 1.6em; }
        table { border-collapse: collapse; margin: 0.6em 0; }
        th, td { border: 1px solid #bbb; padding: 0.25em 0.6em; text-align: left; vertical-align: top; }
        th { background: #eee; }
        td.num { font-family: ui-monospace, monospace; white-space: nowrap; }
        code, pre { font-family: ui-monospace, monospace; }
        .added { background: #e3f4e1; } .removed { background: #fbe3e1; } .changed { background: #fff6d5; }
        pre.listing { border: 1px solid #bbb; padding: 0.5em; overflow-x: auto; }
        pre.listing .add { background: #e3f4e1; } pre.listing .del { background: #fbe3e1; } pre.listing .hunk { color: #555; font-weight: bold; }
        .note { color: #444; } .caution { border-left: 4px solid #b35c00; padding-left: 0.8em; }
        """;

    /// <summary>Writes the diff.</summary>
    public static void Write(DocumentDiff d, TextWriter w, string toolVersion)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(w);
        string f = d.Units.Force.Symbol, m = d.Units.MomentSymbol;
        w.WriteLine("<!DOCTYPE html>");
        w.WriteLine("<html lang=\"en\"><head><meta charset=\"utf-8\">");
        w.WriteLine($"<title>Load description diff: {H(d.OldName)} → {H(d.NewName)}</title>");
        w.WriteLine("<style>" + Style + "</style></head><body>");
        w.WriteLine($"<h1>Load description diff: {(d.HasDifferences ? "changes found" : "no differences")}</h1>");
        w.WriteLine($"<p><code>{H(d.OldName)}</code> → <code>{H(d.NewName)}</code>. Units {H(f)}, {H(d.Units.Length.Symbol)}, {H(d.Units.Mass.Symbol)}; "
            + $"contributions and resultants about {H(DiffWords.Point(d))}. loaddiff {H(toolVersion)}.</p>");
        foreach (string note in d.Notes)
        {
            w.WriteLine($"<p class=\"note\">{H(note)}</p>");
        }
        if (d.Settings.Count > 0)
        {
            w.WriteLine("<h2>Document</h2><table><tr><th>what</th><th>change</th><th>old</th><th>new</th><th>unit</th></tr>");
            foreach (SettingChange s in d.Settings)
            {
                w.WriteLine($"<tr class=\"{DiffWords.Change(s.Change)}\"><td>{H(s.What)}</td><td>{DiffWords.Change(s.Change)}</td><td><code>{H(s.Old ?? "—")}</code></td><td><code>{H(s.New ?? "—")}</code></td><td>{H(s.Unit)}</td></tr>");
            }
            w.WriteLine("</table>");
        }
        if (d.Items.Count > 0)
        {
            w.WriteLine($"<h2>Items</h2><table><tr><th>case</th><th>item</th><th>change</th><th>fields (old → new)</th><th>ΔR<sub>i</sub> ({H(f)})</th><th>ΔM<sub>i</sub> ({H(m)})</th></tr>");
            foreach (ItemChange i in d.Items)
            {
                string fields = string.Join("<br>", i.Fields.Select(c =>
                    $"{H(c.Field)}: <code>{H(c.Old ?? "—")}</code> → <code>{H(c.New ?? "—")}</code> {H(c.Unit)}"));
                foreach (DataChange data in i.Data)
                {
                    fields += "<br>" + H(DiffWords.DataHeading(data)) + "<ul class=\"rows\">"
                        + string.Concat(data.Shown.Select(r => $"<li class=\"{DiffWords.Change(r.Change)}\">{H(DiffWords.Row(r, f, m))}</li>")) + "</ul>";
                }
                w.WriteLine($"<tr class=\"{DiffWords.Change(i.Change)}\"><td>{H(i.Case)}</td><td><code>{H(i.Id)}</code> ({H(i.Kind)}){(i.DerivedId ? " derived key" : "")}</td>"
                    + $"<td>{DiffWords.Change(i.Change)}</td><td>{fields}</td><td class=\"num\">{H(DiffWords.Vec(i.DeltaForce))}</td><td class=\"num\">{H(DiffWords.Vec(i.DeltaMoment))}</td></tr>");
            }
            w.WriteLine("</table>");
        }
        w.WriteLine($"<h2>Resultants</h2><table><tr><th>name</th><th>kind</th><th>R before ({H(f)})</th><th>R after</th><th>ΔR</th><th>M before ({H(m)})</th><th>M after</th><th>ΔM</th></tr>");
        foreach (ResultantChange r in d.Resultants)
        {
            if (r.NotShown is { } why)
            {
                w.WriteLine($"<tr><td>{H(r.Name)}</td><td>{(r.Kind == Core.Model.EntryKind.Case ? "case" : "combination")}</td><td colspan=\"6\">{H(why)}</td></tr>");
                continue;
            }
            w.WriteLine($"<tr><td>{H(r.Name)}</td><td>{(r.Kind == Core.Model.EntryKind.Case ? "case" : "combination")}</td>"
                + $"<td class=\"num\">{(r.Old is { } o ? H(DiffWords.Vec(o.Force)) : "—")}</td><td class=\"num\">{(r.New is { } n ? H(DiffWords.Vec(n.Force)) : "—")}</td><td class=\"num\">{H(DiffWords.Vec(r.DeltaForce))}</td>"
                + $"<td class=\"num\">{(r.Old is { } o2 ? H(DiffWords.Vec(o2.Moment)) : "—")}</td><td class=\"num\">{(r.New is { } n2 ? H(DiffWords.Vec(n2.Moment)) : "—")}</td><td class=\"num\">{H(DiffWords.Vec(r.DeltaMoment))}</td></tr>");
        }
        w.WriteLine("</table>");
        IReadOnlyList<ListingLine> lines = d.HasListings ? ListingDiff.Lines(d.OldListing, d.NewListing) : [];
        if (lines.Count > 0)
        {
            w.WriteLine("<h2>Canonical listing diff</h2>" + (d.ListingSignificantDigits is null ? "" : "<p>" + H(DiffWords.ListingBasis(d)) + "</p>") + "<pre class=\"listing\">");
            foreach (ListingLine l in lines)
            {
                string cls = l.Tag switch { '+' => "add", '-' => "del", '@' => "hunk", _ => "ctx" };
                w.WriteLine($"<span class=\"{cls}\">{H(l.Tag == '@' ? l.Text : l.Tag + l.Text)}</span>");
            }
            w.WriteLine("</pre>");
        }
        w.WriteLine($"<p><strong>{H(DiffWords.Summary(d))}</strong></p>");
        w.WriteLine($"<p class=\"caution\">{H(DiffWords.Caution)}</p>");
        w.WriteLine("</body></html>");
    }

    private static string H(string s) => WebUtility.HtmlEncode(s);
}
