using LoadDiff.Core.Diff;

namespace LoadDiff.Reports;

/// <summary>The diff as aligned plain text for a terminal or CI log; ANSI colour only when asked (a terminal without NO_COLOR).</summary>
public static class DiffTextRenderer
{
    private const string Red = "\u001b[31m", Green = "\u001b[32m", Bold = "\u001b[1m", Reset = "\u001b[0m";

    /// <summary>Writes the diff.</summary>
    public static void Write(DocumentDiff d, TextWriter w, bool colour = false)
    {
        ArgumentNullException.ThrowIfNull(d);
        ArgumentNullException.ThrowIfNull(w);
        string f = d.Units.Force.Symbol, m = d.Units.MomentSymbol;
        string Paint(string s, string code) => colour && code.Length > 0 ? code + s + Reset : s;
        w.WriteLine("Load description diff");
        w.WriteLine($"  old:    {d.OldName}");
        w.WriteLine($"  new:    {d.NewName}");
        w.WriteLine($"  units:  force {f}, length {d.Units.Length.Symbol}, moment {m}, mass {d.Units.Mass.Symbol}" + (d.UnitsConverted ? $" (new version converted from {d.NewUnits})" : ""));
        w.WriteLine($"  ΔR_i, ΔM_i and resultants about {DiffWords.Point(d)}");
        foreach (string note in d.Notes)
        {
            w.WriteLine("  note:   " + note);
        }
        if (d.Settings.Count > 0)
        {
            w.WriteLine();
            w.WriteLine("Document");
            foreach (SettingChange s in d.Settings)
            {
                w.WriteLine($"  {DiffWords.Change(s.Change),-8} {s.What}: {s.Old ?? "(absent)"} → {s.New ?? "(absent)"}{(s.Unit.Length > 0 ? " " + s.Unit : "")}");
            }
        }
        foreach (var group in d.Items.GroupBy(i => i.Case))
        {
            w.WriteLine();
            w.WriteLine($"Case \"{group.Key}\"");
            foreach (ItemChange i in group)
            {
                string mark = i.Change switch { ChangeKind.Added => "+", ChangeKind.Removed => "-", _ => "~" };
                string head = $"  {mark} {DiffWords.Change(i.Change),-8} {i.Id} ({i.Kind}{(i.DerivedId ? ", no id: derived key" : "")})";
                w.WriteLine(Paint(head, i.Change switch { ChangeKind.Added => Green, ChangeKind.Removed => Red, _ => Bold }));
                foreach (FieldChange c in i.Fields)
                {
                    string unit = c.Unit.Length > 0 ? " " + c.Unit : "";
                    w.WriteLine(i.Change switch
                    {
                        ChangeKind.Added => $"      {c.Field}: {c.New}{unit}",
                        ChangeKind.Removed => $"      {c.Field}: {c.Old}{unit}",
                        _ => $"      {c.Field}: {c.Old ?? "(absent)"} → {c.New ?? "(absent)"}{unit}",
                    });
                }
                foreach (DataChange data in i.Data)
                {
                    w.WriteLine("      " + DiffWords.DataHeading(data));
                    foreach (RowChange r in data.Shown)
                    {
                        string mark2 = r.Change switch { ChangeKind.Added => "+", ChangeKind.Removed => "-", _ => "~" };
                        w.WriteLine(Paint($"        {mark2} {DiffWords.Row(r, f, m)}", r.Change switch { ChangeKind.Added => Green, ChangeKind.Removed => Red, _ => "" }));
                    }
                }
                w.WriteLine($"      contribution ΔR_i = {DiffWords.Vec(i.DeltaForce)} {f}   ΔM_i = {DiffWords.Vec(i.DeltaMoment)} {m}");
            }
        }
        w.WriteLine();
        w.WriteLine($"Resultants about {DiffWords.Point(d)}");
        var rows = d.Resultants.Select(r => r.NotShown is { } why
            ? [r.Name, r.Kind == Core.Model.EntryKind.Case ? "case" : "combination", why, "", "", "", "", ""]
            : new[]
        {
            r.Name, r.Kind == Core.Model.EntryKind.Case ? "case" : "combination",
            r.Old is { } o ? DiffWords.Vec(o.Force) : "(absent)", r.New is { } n ? DiffWords.Vec(n.Force) : "(absent)", DiffWords.Vec(r.DeltaForce),
            r.Old is { } o2 ? DiffWords.Vec(o2.Moment) : "(absent)", r.New is { } n2 ? DiffWords.Vec(n2.Moment) : "(absent)", DiffWords.Vec(r.DeltaMoment),
        }).ToList();
        string[] header = ["name", "kind", $"R before ({f})", "R after", "ΔR", $"M before ({m})", "M after", "ΔM"];
        int[] width = [.. header.Select((h, k) => Math.Max(h.Length, rows.Count == 0 ? 0 : rows.Max(r => r[k].Length)))];
        w.WriteLine("  " + string.Join("  ", header.Select((h, k) => h.PadRight(width[k]))).TrimEnd());
        w.WriteLine("  " + new string('-', width.Sum() + (2 * (width.Length - 1))));
        foreach (string[] r in rows)
        {
            w.WriteLine("  " + string.Join("  ", r.Select((c, k) => c.PadRight(width[k]))).TrimEnd());
        }
        IReadOnlyList<ListingLine> lines = ListingDiff.Lines(d.OldListing, d.NewListing);
        w.WriteLine();
        if (!d.HasListings)
        {
            w.WriteLine("CSV tables have no canonical listing: their rows are compared above.");
        }
        else if (lines.Count == 0)
        {
            w.WriteLine(d.ListingSignificantDigits is null ? "Canonical listings: identical." : $"Canonical listings identical, {DiffWords.ListingBasis(d)}.");
        }
        else
        {
            w.WriteLine($"Canonical listings (loaddiff fmt), {ListingDiff.ContextLines} lines of context"
                + (d.ListingSignificantDigits is null ? "" : "; " + DiffWords.ListingBasis(d))
                + (d.HasDifferences ? "" : "; they differ only in the order of points, cases, items or factors, which is not a difference"));
            w.WriteLine(Paint("--- " + d.OldName, Red));
            w.WriteLine(Paint("+++ " + d.NewName, Green));
            foreach (ListingLine l in lines)
            {
                string s = l.Tag == '@' ? l.Text : l.Tag + l.Text;
                w.WriteLine(l.Tag switch { '-' => Paint(s, Red), '+' => Paint(s, Green), '@' => Paint(s, Bold), _ => s });
            }
        }
        w.WriteLine();
        w.WriteLine(DiffWords.Summary(d));
        w.WriteLine(DiffWords.Caution);
    }
}
