using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>GitHub-flavoured Markdown for a review comment.</summary>
public static class ReduceMarkdownRenderer
{
    /// <summary>Writes the reduction as a heading, a table and the caution.</summary>
    /// <param name="result">What to write.</param>
    /// <param name="w">Where to write it.</param>
    /// <param name="notes">The notes written in the inputs (the basis of the loads), listed after the results; none when null.</param>
    public static void Write(ReduceResult result, TextWriter w, IReadOnlyList<Html.ReportNote>? notes = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        w.WriteLine($"### Reduction of {Escape(result.Source)}");
        w.WriteLine();
        if (result.Title is { } t)
        {
            w.WriteLine($"**{Escape(t)}**");
            w.WriteLine();
        }
        w.WriteLine($"Units: force {f}, length {l}, moment {m}. Moments about {NumberText.Readable(result.ReferencePoint)} {l} ({result.ReferenceDescription}).");
        w.WriteLine();
        w.WriteLine($"| name | kind | R ({f}) | M ({m}) | reduces to | line of action / central axis through ({l}) | pitch ({l}) |");
        w.WriteLine("|---|---|---|---|---|---|---:|");
        foreach (ReducedEntry e in result.Entries)
        {
            LoadReduction r = e.Reduction;
            double fn = WrenchAnalysis.RoundingThreshold * r.GrossForce;
            double mn = WrenchAnalysis.RoundingThreshold * r.MomentScale(r.ReferencePoint);
            WrenchAnalysis wr = e.Wrench;
            string kind = e.Kind == EntryKind.Case ? "case" : "combination " + Describe.Factors(e.Combination!);
            string axis = wr.AxisPoint is { } a ? NumberText.Readable(a, WrenchAnalysis.RoundingThreshold * r.LengthScale) : "—";
            string pitch = wr.Kind == SystemKind.Wrench ? NumberText.Readable(wr.Pitch!.Value) : "—";
            w.WriteLine($"| {Escape(e.Name)} | {kind} | {NumberText.Readable(r.Force, fn)} | {NumberText.Readable(r.Moment, mn)} | {Describe.SystemCode(wr.Kind)} | {axis} | {pitch} |");
        }
        w.WriteLine();
        NotesMarkdown.Write(notes, w);
        w.WriteLine("> " + Caution.Text);
    }

    // Names, titles and paths are data: no HTML, Markdown syntax or line break may come from them.
    internal static string Escape(string s) => SafeText.Markdown(s);
}
