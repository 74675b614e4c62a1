using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>Sentences about a check, shared by the text, Markdown and JUnit renderers.</summary>
public static class CheckWords
{
    /// <summary>PASS, FAIL or ONLY IN ….</summary>
    public static string Verdict(CaseComparison c) => c.Presence switch
    {
        OnlyIn.Original => "FAIL (only in original)",
        OnlyIn.Substitute => "FAIL (only in substitute)",
        _ => c.Equivalent ? "PASS" : "FAIL",
    };

    /// <summary>"case" or "combination".</summary>
    public static string Kind(CaseComparison c) => c.Kind == EntryKind.Case ? "case" : "combination";

    /// <summary>The tolerance rule in one sentence.</summary>
    public static string Rule(CheckResult r)
    {
        string rel = NumberText.Exact(r.Tolerance.Relative) + (r.DefaultRelative ? " (default: common practice, no published source)" : "");
        return $"|ΔR| ≤ max(F, rel·G_F) and |ΔM_Q| ≤ max(M, rel·G_M) at every corner Q of the box of both systems; "
            + $"rel = {rel}, F = {NumberText.Readable(r.Tolerance.Force)} {r.Units.Force.Symbol}, "
            + $"M = {NumberText.Readable(r.Tolerance.Moment)} {r.Units.MomentSymbol}; G_F, G_M of the original";
    }

    /// <summary>Which tolerance governed, e.g. "relative" or "absolute".</summary>
    public static string Governs(bool relative) => relative ? "relative" : "absolute";

    /// <summary>Why a case failed, in one line.</summary>
    public static string FailureReason(CaseComparison c, CheckResult r)
    {
        string f = r.Units.Force.Symbol, m = r.Units.MomentSymbol;
        if (c.Presence == OnlyIn.Original)
        {
            return $"'{c.Name}' is in the original only; the substitute has no {Kind(c)} of that name";
        }
        if (c.Presence == OnlyIn.Substitute)
        {
            return $"'{c.Name}' is in the substitute only; the original has no {Kind(c)} of that name";
        }
        var parts = new List<string>();
        if (!c.ForcePasses)
        {
            parts.Add($"|ΔR| = {NumberText.Readable(c.Residual!.ForceNorm)} {f} exceeds {NumberText.Readable(c.Tolerance!.Force)} {f}");
        }
        if (!c.MomentPasses)
        {
            parts.Add($"worst |ΔM| = {NumberText.Readable(c.Residual!.WorstMomentNorm)} {m} exceeds {NumberText.Readable(c.Tolerance!.Moment)} {m}");
        }
        parts.AddRange(c.Notes);
        return string.Join("; ", parts);
    }

    /// <summary>Where the difference acts: what the substitute lacks, as a force on a line plus a couple, or a pure couple.</summary>
    public static string Missing(CaseComparison c, CheckResult r)
    {
        if (c.Residual is not { } res)
        {
            return "";
        }
        string f = r.Units.Force.Symbol, l = r.Units.Length.Symbol, m = r.Units.MomentSymbol;
        WrenchAnalysis w = res.Wrench;
        double ln = WrenchAnalysis.RoundingThreshold * Math.Max(c.Original!.LengthScale, c.Substitute!.LengthScale);
        double fn = WrenchAnalysis.RoundingThreshold * Math.Max(c.Original.GrossForce, c.Substitute.GrossForce);
        double mn = WrenchAnalysis.RoundingThreshold * Math.Max(c.Original.MomentScale(r.ReferencePoint), c.Substitute.MomentScale(r.ReferencePoint));
        switch (w.Kind)
        {
            case SystemKind.Null:
                return "There is no residual: the resultants agree to rounding.";
            case SystemKind.Couple:
                return $"The substitute lacks a pure couple of {NumberText.Readable(-res.System.Moment, mn)} {m} (the resultant forces agree).";
            default:
                string s = $"The substitute lacks a force of {NumberText.Readable(-res.System.Force, fn)} {f} acting along the line through "
                    + $"{NumberText.Readable(w.AxisPoint!.Value, ln)} {l} in direction {NumberText.Readable(-w.AxisDirection!.Value, 1e-12)}";
                if (w.Kind == SystemKind.Wrench)
                {
                    s += $", plus a couple of {NumberText.Readable(-w.MinimumCouple, mn)} {m} about that line";
                }
                return s + ".";
        }
    }

    /// <summary>A contributor in a few words.</summary>
    public static string Contributor(Contributor k, CheckResult r)
    {
        string kind = k.Kind.ToString().ToLowerInvariant();
        string parts = k.Parts > 1 ? $", {k.Parts} parts" : "";
        return k.Kind == LoadDiff.Core.Loads.LoadKind.Couple
            ? $"{k.Id} ({kind}) |C| = {NumberText.Readable(k.Couple.Length)} {r.Units.MomentSymbol}"
            : $"{k.Id} ({kind}{parts}) |F| = {NumberText.Readable(k.Force.Length)} {r.Units.Force.Symbol} at {NumberText.Readable(k.Centroid ?? Vector3.Zero)} {r.Units.Length.Symbol}";
    }
}
