using LoadDiff.Core.Equivalence;

namespace LoadDiff.Reports;

/// <summary>The check as GitHub-flavoured Markdown, fit for a review comment.</summary>
public static class CheckMarkdownRenderer
{
    /// <summary>Writes the check result.</summary>
    /// <param name="result">What to write.</param>
    /// <param name="w">Where to write it.</param>
    /// <param name="notes">The notes written in the inputs (the basis of the loads), listed after the results; none when null.</param>
    public static void Write(CheckResult result, TextWriter w, IReadOnlyList<Html.ReportNote>? notes = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        string verdict = result.Equivalent ? "✅ equivalent" : "❌ " + CheckWords.Overall(result);
        w.WriteLine($"### Static equivalence: {Esc(verdict)}");
        w.WriteLine();
        w.WriteLine($"{Esc(result.SubstitutePath)} checked against {Esc(result.OriginalPath)}. Units {f}, {l}; moments in {m} about "
            + $"{NumberText.Readable(result.ReferencePoint)} {l} ({Esc(result.ReferenceDescription)}).");
        w.WriteLine();
        w.WriteLine($"Tolerance: {Esc(CheckWords.Rule(result))}.");
        foreach (string warning in result.Warnings)
        {
            w.WriteLine();
            w.WriteLine($"⚠️ Warning: {Esc(warning)}.");
        }
        w.WriteLine();
        w.WriteLine($"| name | kind | verdict | \\|ΔR\\| ({f}) | allowed | worst \\|ΔM\\| ({m}) | allowed | governs (F/M) |");
        w.WriteLine("|---|---|---|---:|---:|---:|---:|---|");
        foreach (CaseComparison c in result.Comparisons)
        {
            string mark = c.Equivalent ? "✅ PASS" : "❌ " + CheckWords.Verdict(c);
            if (c.Tolerance is { } t)
            {
                w.WriteLine($"| {Esc(c.Name)} | {CheckWords.Kind(c)} | {mark} | {CheckWords.ForceNorm(c)} | {NumberText.Readable(t.Force)} | "
                    + $"{CheckWords.WorstMoment(c)} | {NumberText.Readable(t.Moment)} | {CheckWords.Governs(t)} |");
            }
            else
            {
                w.WriteLine($"| {Esc(c.Name)} | {CheckWords.Kind(c)} | {mark} | — | — | — | — | — |");
            }
        }
        foreach (CaseComparison c in result.Comparisons.Where(c => c.Equivalent && c.Notes.Count > 0))
        {
            w.WriteLine();
            w.WriteLine($"**{Esc(c.Name)}** (PASS): note: {Esc(string.Join("; ", c.Notes))}.");
        }
        foreach (CaseComparison c in result.Comparisons.Where(c => !c.Equivalent))
        {
            w.WriteLine();
            w.WriteLine($"**{Esc(c.Name)}**: {Esc(CheckWords.FailureReason(c, result))}.");
            foreach (string line in CheckWords.Explanation(c, result))
            {
                w.WriteLine();
                w.WriteLine(Esc(line));
            }
        }
        IReadOnlyList<string> gate = CheckWords.Gate(result);
        if (gate.Count > 0)
        {
            w.WriteLine();
            w.WriteLine($"**{Esc(gate[0])}**");
            w.WriteLine();
            foreach (string line in gate.Skip(1))
            {
                w.WriteLine("- " + Esc(line.Trim()));
            }
        }
        w.WriteLine();
        w.WriteLine("**Result: " + Esc(CheckWords.Overall(result)) + "**");
        w.WriteLine();
        NotesMarkdown.Write(notes, w);
        w.WriteLine("> " + Caution.Text);
    }

    private static string Esc(string s) => ReduceMarkdownRenderer.Escape(s);
}
