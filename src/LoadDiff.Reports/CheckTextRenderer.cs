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
        w.WriteLine($"  original:    {result.OriginalPath}");
        w.WriteLine($"  substitute:  {result.SubstitutePath}");
        w.WriteLine($"  units:       force {f}, length {l}, moment {m}");
        w.WriteLine($"  moments about {NumberText.Readable(result.ReferencePoint)} {l} ({result.ReferenceDescription})");
        w.WriteLine($"  tolerance:   {CheckWords.Rule(result)}");
        w.WriteLine();
        int nameWidth = Math.Max(4, result.Comparisons.Max(c => c.Name.Length));
        string header = $"  {"name".PadRight(nameWidth)}  {"kind",-11}  {"verdict",-24}  {"|ΔR|",-11}  {"allowed",-11}  {"worst |ΔM|",-11}  {"allowed",-11}  governs (F/M)";
        w.WriteLine(header);
        w.WriteLine("  " + new string('-', header.Length - 2));
        foreach (CaseComparison c in result.Comparisons)
        {
            string dr = "—", af = "—", dm = "—", am = "—", gov = "—";
            if (c.Residual is { } r && c.Tolerance is { } t)
            {
                dr = NumberText.Readable(r.ForceNorm);
                af = NumberText.Readable(t.Force);
                dm = NumberText.Readable(r.WorstMomentNorm);
                am = NumberText.Readable(t.Moment);
                gov = CheckWords.Governs(t.ForceGovernedByRelative) + "/" + CheckWords.Governs(t.MomentGovernedByRelative);
            }
            w.WriteLine($"  {c.Name.PadRight(nameWidth)}  {CheckWords.Kind(c),-11}  {CheckWords.Verdict(c),-24}  {dr,-11}  {af,-11}  {dm,-11}  {am,-11}  {gov}".TrimEnd());
        }
        w.WriteLine($"  (|ΔR| in {f}; |ΔM| in {m}, the largest over the corners of the box)");
        foreach (CaseComparison c in result.Comparisons.Where(c => !c.Equivalent))
        {
            w.WriteLine();
            w.WriteLine($"{(c.Kind == LoadDiff.Core.Model.EntryKind.Case ? "Case" : "Combination")} \"{c.Name}\": {CheckWords.Verdict(c)}");
            w.WriteLine($"  {CheckWords.FailureReason(c, result)}");
            if (c.Original is { } o)
            {
                w.WriteLine($"  original    R = {NumberText.Readable(o.Force, Noise(o))} {f}   M = {NumberText.Readable(o.Moment, MomentNoise(o))} {m}");
            }
            if (c.Substitute is { } s)
            {
                w.WriteLine($"  substitute  R = {NumberText.Readable(s.Force, Noise(s))} {f}   M = {NumberText.Readable(s.Moment, MomentNoise(s))} {m}");
            }
            if (c.Residual is { } res)
            {
                double fn = Math.Max(Noise(c.Original!), Noise(c.Substitute!));
                double mn = Math.Max(MomentNoise(c.Original!), MomentNoise(c.Substitute!));
                w.WriteLine($"  residual   ΔR = {NumberText.Readable(res.System.Force, fn)} {f}  ΔM = {NumberText.Readable(res.System.Moment, mn)} {m} (substitute − original)");
                w.WriteLine($"  worst |ΔM| at corner {NumberText.Readable(res.WorstCorner)} {l}");
                w.WriteLine("  " + CheckWords.Missing(c, result));
            }
            if (result.Contributors.TryGetValue(c.Name, out CaseContributors? k))
            {
                WriteContributors(w, "largest in original:  ", k.Original, result);
                WriteContributors(w, "largest in substitute:", k.Substitute, result);
            }
        }
        w.WriteLine();
        w.WriteLine(result.Equivalent
            ? $"Result: EQUIVALENT — {(result.Comparisons.Count == 1 ? "the one case is" : $"all {result.Comparisons.Count} cases and combinations are")} within tolerance."
            : $"Result: NOT EQUIVALENT — {result.FailureCount} of {result.Comparisons.Count} cases and combinations fail.");
        w.WriteLine(Caution.Text);
    }

    private static void WriteContributors(TextWriter w, string label, IReadOnlyList<Contributor> list, CheckResult r)
    {
        for (int i = 0; i < list.Count; i++)
        {
            w.WriteLine($"  {(i == 0 ? label : new string(' ', label.Length))} {CheckWords.Contributor(list[i], r)}");
        }
    }

    internal static double Noise(LoadReduction r) => WrenchAnalysis.RoundingThreshold * r.GrossForce;

    internal static double MomentNoise(LoadReduction r) => WrenchAnalysis.RoundingThreshold * r.MomentScale(r.ReferencePoint);
}
