using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;

namespace LoadDiff.Reports.Sections;

/// <summary>Section-cut profiles as GitHub-flavoured Markdown.</summary>
public static class SectionsMarkdownRenderer
{
    /// <summary>Writes the result.</summary>
    public static void Write(SectionsResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        SectionAxis a = result.Axis;
        w.WriteLine($"### Section cuts: {Esc(result.SubstitutePath)} against {Esc(result.OriginalPath)}");
        w.WriteLine();
        w.WriteLine($"Axis e1 = {NumberText.Readable(a.Direction)} through {NumberText.Readable(a.Origin)} {l}; e2 = {NumberText.Readable(a.Lateral)}, e3 = {NumberText.Readable(a.Transverse)}. "
            + $"Units {f}, {m}. {Esc(SectionsResult.Convention)}");
        foreach (SectionsEntry e in result.Entries)
        {
            SectionComparison c = e.Comparison;
            double fn = SectionsTextRenderer.Noise(c, x => x.Force), mn = SectionsTextRenderer.Noise(c, x => x.Moment);
            w.WriteLine();
            w.WriteLine($"#### {(e.Kind == EntryKind.Case ? "Case" : "Combination")} {Esc(e.Name)}");
            w.WriteLine();
            w.WriteLine($"Largest \\|ΔV\\| = {NumberText.Readable(c.MaxForceDeviation, fn)} {f} at s = {NumberText.Readable(c.MaxForceDeviationAt)} {l} "
                + $"({Esc(SectionsTextRenderer.Relative(c.MaxForceDeviationRelative, "|V|", c.OriginalPeakForce, f))}); "
                + $"largest \\|ΔM\\| = {NumberText.Readable(c.MaxMomentDeviation, mn)} {m} at s = {NumberText.Readable(c.MaxMomentDeviationAt)} {l} "
                + $"({Esc(SectionsTextRenderer.Relative(c.MaxMomentDeviationRelative, "|M|", c.OriginalPeakMoment, m))}).");
            w.WriteLine();
            w.WriteLine($"| s ({l}) | V original ({f}) | V substitute | M original ({m}) | M substitute | \\|ΔV\\| | \\|ΔM\\| |");
            w.WriteLine("|---:|---|---|---|---|---:|---:|");
            foreach (SectionStation s in c.Stations)
            {
                w.WriteLine($"| {NumberText.Readable(s.S)} | {NumberText.Readable(a.Local(s.Original.Force), fn)} | {NumberText.Readable(a.Local(s.Substitute.Force), fn)} | "
                    + $"{NumberText.Readable(a.Local(s.Original.Moment), mn)} | {NumberText.Readable(a.Local(s.Substitute.Moment), mn)} | "
                    + $"{NumberText.Readable(s.ForceDeviation, fn)} | {NumberText.Readable(s.MomentDeviation, mn)} |");
            }
            foreach (string note in SectionsTextRenderer.Notes(c, result))
            {
                w.WriteLine();
                w.WriteLine("Note: " + Esc(note) + ".");
            }
        }
        w.WriteLine();
        w.WriteLine("> " + SectionsResult.SectionCaution);
        w.WriteLine(">");
        w.WriteLine("> " + Caution.Text);
    }

    private static string Esc(string s) => ReduceMarkdownRenderer.Escape(s);
}
