using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>The check as aligned plain text: a summary table, then the details of every failure.</summary>
public static class CheckTextRenderer
{
    /// <summary>Writes the check result.</summary>
    public static void Write(CheckResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        w.WriteLine("Static equivalence check");
        w.WriteLine($"  original:    {SafeText.Visible(result.OriginalPath)}");
        w.WriteLine($"  substitute:  {SafeText.Visible(result.SubstitutePath)}");
        w.WriteLine($"  units:       force {f}, length {l}, moment {m}");
        w.WriteLine($"  moments about {NumberText.Readable(result.ReferencePoint)} {l} ({result.ReferenceDescription})");
        w.WriteLine($"  tolerance:   {CheckWords.Rule(result)}");
        foreach (string warning in result.Warnings)
        {
            w.WriteLine($"  warning:     {warning}");
        }
        w.WriteLine();
        int nameWidth = Math.Max(4, result.Comparisons.Max(c => SafeText.Visible(c.Name).Length));
        string header = $"  {"name".PadRight(nameWidth)}  {"kind",-11}  {"verdict",-24}  {"|ΔR|",-11}  {"allowed",-11}  {"worst |ΔM|",-11}  {"allowed",-11}  governs (F/M)";
        w.WriteLine(header);
        w.WriteLine("  " + new string('-', header.Length - 2));
        foreach (CaseComparison c in result.Comparisons)
        {
            string af = "—", am = "—", gov = "—";
            if (c.Tolerance is { } t)
            {
                af = NumberText.Readable(t.Force);
                am = NumberText.Readable(t.Moment);
                gov = CheckWords.Governs(t);
            }
            w.WriteLine($"  {SafeText.Visible(c.Name).PadRight(nameWidth)}  {CheckWords.Kind(c),-11}  {CheckWords.Verdict(c),-24}  {CheckWords.ForceNorm(c),-11}  {af,-11}  {CheckWords.WorstMoment(c),-11}  {am,-11}  {gov}".TrimEnd());
        }
        w.WriteLine($"  (|ΔR| in {f}; |ΔM| in {m}, the largest over the corners of the box; 0 = within rounding noise)");
        foreach (CaseComparison c in result.Comparisons.Where(c => c.Equivalent && c.Notes.Count > 0))
        {
            w.WriteLine();
            w.WriteLine($"{(c.Kind == LoadDiff.Core.Model.EntryKind.Case ? "Case" : "Combination")} \"{SafeText.Visible(c.Name)}\": PASS, with note{(c.Notes.Count > 1 ? "s" : "")}:");
            foreach (string note in c.Notes)
            {
                w.WriteLine($"  note: {SafeText.Visible(note)}");
            }
        }
        foreach (CaseComparison c in result.Comparisons.Where(c => !c.Equivalent))
        {
            w.WriteLine();
            w.WriteLine($"{(c.Kind == LoadDiff.Core.Model.EntryKind.Case ? "Case" : "Combination")} \"{SafeText.Visible(c.Name)}\": {CheckWords.Verdict(c)}");
            w.WriteLine($"  {CheckWords.FailureReason(c, result)}");
            if (c.Original is { } o)
            {
                (double nf, double nm) = CheckWords.Noise(o);
                w.WriteLine($"  original    R = {NumberText.Readable(o.Force, nf)} {f}   M = {NumberText.Readable(o.Moment, nm)} {m}");
            }
            if (c.Substitute is { } s)
            {
                (double nf, double nm) = CheckWords.Noise(s);
                w.WriteLine($"  substitute  R = {NumberText.Readable(s.Force, nf)} {f}   M = {NumberText.Readable(s.Moment, nm)} {m}");
            }
            if (c.Residual is { } res)
            {
                (double fn, double mn) = CheckWords.ResidualNoise(c, result.ReferencePoint);
                w.WriteLine($"  residual   ΔR = {NumberText.Readable(res.System.Force, fn)} {f}  ΔM = {NumberText.Readable(res.System.Moment, mn)} {m} (substitute − original)");
                w.WriteLine($"  worst |ΔM| at corner {NumberText.Readable(res.WorstCorner)} {l}");
                foreach (string line in CheckWords.Explanation(c, result))
                {
                    w.WriteLine("  " + line);
                }
            }
            if (result.Contributors.TryGetValue(c.Name, out CaseContributors? k))
            {
                WriteContributors(w, "largest in original:  ", k.Original, result);
                WriteContributors(w, "largest in substitute:", k.Substitute, result);
            }
        }
        IReadOnlyList<string> gate = CheckWords.Gate(result);
        if (gate.Count > 0)
        {
            w.WriteLine();
            foreach (string line in gate)
            {
                w.WriteLine(line);
            }
            w.WriteLine(LoadDiff.Reports.Sections.SectionsResult.SectionCaution);
        }
        w.WriteLine();
        w.WriteLine("Result: " + CheckWords.Overall(result));
        w.WriteLine(Caution.Text);
    }

    private static void WriteContributors(TextWriter w, string label, IReadOnlyList<Contributor> list, CheckResult r)
    {
        for (int i = 0; i < list.Count; i++)
        {
            w.WriteLine($"  {(i == 0 ? label : new string(' ', label.Length))} {CheckWords.Contributor(list[i], r)}");
        }
    }
}
