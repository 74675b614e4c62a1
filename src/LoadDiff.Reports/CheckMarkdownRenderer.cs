using LoadDiff.Core.Equivalence;

namespace LoadDiff.Reports;

/// <summary>The check as GitHub-flavoured Markdown, fit for a review comment.</summary>
public static class CheckMarkdownRenderer
{
    /// <summary>Writes the check result.</summary>
    public static void Write(CheckResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        string verdict = result.Equivalent ? "✅ equivalent" : $"❌ not equivalent ({result.FailureCount} of {result.Comparisons.Count} fail)";
        w.WriteLine($"### Static equivalence: {verdict}");
        w.WriteLine();
        w.WriteLine($"`{Esc(result.SubstitutePath)}` checked against `{Esc(result.OriginalPath)}`. Units {f}, {l}; moments in {m} about "
            + $"{NumberText.Readable(result.ReferencePoint)} {l} ({Esc(result.ReferenceDescription)}).");
        w.WriteLine();
        w.WriteLine($"Tolerance: {Esc(CheckWords.Rule(result))}.");
        w.WriteLine();
        w.WriteLine($"| name | kind | verdict | \\|ΔR\\| ({f}) | allowed | worst \\|ΔM\\| ({m}) | allowed | governs (F/M) |");
        w.WriteLine("|---|---|---|---:|---:|---:|---:|---|");
        foreach (CaseComparison c in result.Comparisons)
        {
            string mark = c.Equivalent ? "✅ PASS" : "❌ " + CheckWords.Verdict(c);
            if (c.Residual is { } r && c.Tolerance is { } t)
            {
                w.WriteLine($"| {Esc(c.Name)} | {CheckWords.Kind(c)} | {mark} | {NumberText.Readable(r.ForceNorm)} | {NumberText.Readable(t.Force)} | "
                    + $"{NumberText.Readable(r.WorstMomentNorm)} | {NumberText.Readable(t.Moment)} | {CheckWords.Governs(t.ForceGovernedByRelative)}/{CheckWords.Governs(t.MomentGovernedByRelative)} |");
            }
            else
            {
                w.WriteLine($"| {Esc(c.Name)} | {CheckWords.Kind(c)} | {mark} | — | — | — | — | — |");
            }
        }
        foreach (CaseComparison c in result.Comparisons.Where(c => !c.Equivalent))
        {
            w.WriteLine();
            w.WriteLine($"**{Esc(c.Name)}**: {Esc(CheckWords.FailureReason(c, result))}.");
            if (c.Residual is not null)
            {
                w.WriteLine($"{Esc(CheckWords.Missing(c, result))}");
            }
        }
        w.WriteLine();
        w.WriteLine("> " + Caution.Text);
    }

    private static string Esc(string s) => ReduceMarkdownRenderer.Escape(s);
}
