using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Sections;

namespace LoadDiff.Reports;

/// <summary>
/// Sentences about a check, shared by the text, Markdown, JUnit and HTML renderers, so that every format states the
/// same verdicts, notes and explanations. Numbers within the rounding noise of their case print as 0.
/// </summary>
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

    /// <summary>The overall verdict in one line, the section-cut gate included.</summary>
    public static string Overall(CheckResult r)
    {
        string gate = r.SectionGate is { } g ? g.Passes ? "; section-cut gate passed" : "; section-cut gate FAILED" : "";
        if (r.Equivalent)
        {
            return $"EQUIVALENT — {(r.Comparisons.Count == 1 ? "the one case is" : $"all {r.Comparisons.Count} cases and combinations are")} within tolerance{gate}.";
        }
        return r.FailureCount > 0
            ? $"NOT EQUIVALENT — {r.FailureCount} of {r.Comparisons.Count} cases and combinations fail{gate}."
            : $"NOT EQUIVALENT — every case and combination is within tolerance, but the section-cut gate FAILED.";
    }

    /// <summary>The tolerance rule in one sentence.</summary>
    public static string Rule(CheckResult r)
    {
        string rel = NumberText.Exact(r.Tolerance.Relative) + (r.DefaultRelative ? " (default: common practice, no published source)" : "");
        string d = r.Tolerance.Length is { } length
            ? $"D = {NumberText.Readable(length)} {r.Units.Length.Symbol} as stated (--length)"
            : "D the diagonal of the box of the original's loaded geometry";
        return $"|ΔR| ≤ max(F, rel·G_F) and |ΔM_Q| ≤ max(M, rel·G_M) at every corner Q of the box of both systems' loaded geometry; "
            + $"rel = {rel}, F = {NumberText.Readable(r.Tolerance.Force)} {r.Units.Force.Symbol}, "
            + $"M = {NumberText.Readable(r.Tolerance.Moment)} {r.Units.MomentSymbol}; G_F and G_M = Σ|C| + G_F·D of the original, {d}; "
            + "items of zero magnitude are no loaded geometry; neither allowance falls below the rounding noise of the two reductions";
    }

    /// <summary>Which tolerance governed: "absolute", "relative" or "rounding".</summary>
    public static string Governs(AllowanceSource source) => source switch
    {
        AllowanceSource.Absolute => "absolute",
        AllowanceSource.Relative => "relative",
        _ => "rounding",
    };

    /// <summary>Both governing parts as "F/M".</summary>
    public static string Governs(AppliedTolerance t)
    {
        ArgumentNullException.ThrowIfNull(t);
        return Governs(t.ForceGovernedBy) + "/" + Governs(t.MomentGovernedBy);
    }

    /// <summary>|ΔR| as printed: 0 within the rounding noise of the comparison.</summary>
    public static string ForceNorm(CaseComparison c) =>
        c.Residual is { } r && c.Tolerance is { } t ? NumberText.Readable(r.ForceNorm, t.Noise.Force) : "—";

    /// <summary>The worst |ΔM| as printed: 0 within the rounding noise of the comparison.</summary>
    public static string WorstMoment(CaseComparison c) =>
        c.Residual is { } r && c.Tolerance is { } t ? NumberText.Readable(r.WorstMomentNorm, t.Noise.Moment) : "—";

    /// <summary>The noise of one system's own numbers: force, and moment about its reference point.</summary>
    public static (double Force, double Moment) Noise(LoadReduction r)
    {
        RoundingNoise n = RoundingNoise.Of(r);
        return (n.Force, n.Moment);
    }

    /// <summary>The noise of a residual stated about the reference point (the comparison's moment noise grows with the distance).</summary>
    public static (double Force, double Moment) ResidualNoise(CaseComparison c, Vector3 point)
    {
        ArgumentNullException.ThrowIfNull(c);
        if (c.Tolerance is not { } t)
        {
            return (0, 0);
        }
        Box? box = Box.Union(c.Original?.Bounds, c.Substitute?.Bounds);
        double distance = box is null ? 0 : (point - box.Centre).Length + (box.Diagonal / 2);
        return (t.Noise.Force, t.Noise.MomentAt(distance));
    }

    /// <summary>Why a case failed, in one line.</summary>
    public static string FailureReason(CaseComparison c, CheckResult r)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(r);
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
            parts.Add($"|ΔR| = {ForceNorm(c)} {f} exceeds {NumberText.Readable(c.Tolerance!.Force)} {f}");
        }
        if (!c.MomentPasses)
        {
            parts.Add($"worst |ΔM| = {WorstMoment(c)} {m} exceeds {NumberText.Readable(c.Tolerance!.Moment)} {m}");
        }
        parts.AddRange(c.Notes);
        return string.Join("; ", parts);
    }

    /// <summary>The explanation of a case's residual: how it reads against the tolerance, then any item that accounts for it.</summary>
    public static IReadOnlyList<string> Explanation(CaseComparison c, CheckResult r)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(r);
        if (c.Explanation is not { } e || c.Tolerance is not { } t)
        {
            return [];
        }
        string f = r.Units.Force.Symbol, l = r.Units.Length.Symbol, m = r.Units.MomentSymbol;
        double fn = t.Noise.Force, mn = t.Noise.Moment, ln = WrenchAnalysis.RoundingThreshold * Math.Max(1, e.Point.Length);
        var lines = new List<string>();
        switch (e.Reading)
        {
            case ResidualReading.None:
                lines.Add("No residual beyond rounding: the resultants agree to the rounding noise of the two reductions.");
                break;
            case ResidualReading.MisplacedResultant:
                Vector3 s = e.Shift!.Value;
                string sentence = s.Length <= ln
                    ? "The resultant forces agree within tolerance and their lines coincide"
                    : $"The resultant forces agree within tolerance; the substitute's resultant acts {NumberText.Readable(s.Length)} {l} too far in {Direction(s)} "
                        + $"(its line is shifted by {NumberText.Readable(s, ln)} {l} from the original's, which passes through {NumberText.Readable(e.Point, ln)} {l})";
                if (e.Couple.Length > mn)
                {
                    sentence += $", and lacks a couple of {NumberText.Readable(e.Couple, mn)} {m} about that line, which no shift accounts for";
                }
                if (e.Force.Length > fn)
                {
                    sentence += $"; the force difference of {NumberText.Readable(e.Force.Length)} {f} is within its allowance";
                }
                lines.Add(sentence + ".");
                break;
            case ResidualReading.Couple:
                lines.Add($"The resultant forces agree within tolerance and the original's resultant is zero: the substitute lacks a couple of {NumberText.Readable(e.Couple, mn)} {m}.");
                break;
            case ResidualReading.MissingForce:
                string missing = $"The substitute lacks a force of {NumberText.Readable(e.Force, fn)} {f} acting along the line through "
                    + $"{NumberText.Readable(e.Point, ln)} {l} in direction {NumberText.Readable(e.AxisDirection!.Value, 1e-12)}";
                if (e.Couple.Length > mn)
                {
                    missing += $", plus a couple of {NumberText.Readable(e.Couple, mn)} {m} about that line";
                }
                lines.Add(missing + ".");
                break;
            default:
                string far = e.AxisDistance is { } dist
                    ? $"The residual's line of action passes {NumberText.Readable(dist)} {l} from the centre of the loads, farther from them than their extent, so the difference is stated at the box centre {NumberText.Readable(e.Point, ln)} {l}: "
                    : $"Stated at the box centre {NumberText.Readable(e.Point, ln)} {l}: ";
                lines.Add(far + $"the substitute lacks a force of {NumberText.Readable(e.Force, fn)} {f} and a couple of {NumberText.Readable(e.Couple, mn)} {m}.");
                break;
        }
        foreach (SuspectItem x in e.Suspects)
        {
            lines.Add(Suspect(x));
        }
        if (e.SearchBounded && !c.Equivalent)
        {
            lines.Add(e.Suspects.Count == 0
                ? "No single item accounts for the residual among the items searched (only the largest items of large inputs are kept, so the search was bounded)."
                : "(The search was bounded: only the largest items of large inputs are kept.)");
        }
        return lines;
    }

    /// <summary>One suspect item in a sentence.</summary>
    public static string Suspect(SuspectItem x)
    {
        ArgumentNullException.ThrowIfNull(x);
        string where = (x.InOriginal ? "original" : "substitute") + " item '" + x.Id + "'"
            + (x.Case is { } k ? $" of case '{k}' (×{NumberText.Exact(x.Factor)})" : "");
        return x.Kind switch
        {
            SuspectKind.LeftOut => $"The {where} accounts for the residual: left out of the substitute?",
            SuspectKind.NoCounterpart => $"The {where} accounts for the residual: it has no counterpart in the original — extra, or counted twice?",
            _ => $"The {where} with its sign reversed accounts for the residual: sign reversed?",
        };
    }

    /// <summary>The section-cut gate in lines (none when it was not asked for): the rule, one line per case, the verdict.</summary>
    public static IReadOnlyList<string> Gate(CheckResult r)
    {
        ArgumentNullException.ThrowIfNull(r);
        if (r.SectionGate is not { } g)
        {
            return [];
        }
        string m = r.Units.MomentSymbol, l = r.Units.Length.Symbol;
        var lines = new List<string>
        {
            $"Section-cut gate along e1 = {NumberText.Readable(g.Axis.Direction)} through {NumberText.Readable(g.Axis.Origin)}: fail when the largest |ΔM(s)| exceeds "
                + $"{NumberText.Readable(g.RelativeTolerance)} of the original's peak |M(s)| over the original's own loads",
        };
        int width = g.Cases.Count == 0 ? 0 : g.Cases.Max(e => e.Name.Length);
        foreach (SectionGateCase c in g.Cases)
        {
            lines.Add(GateCase(c, r, width));
        }
        lines.Add(g.Passes ? "Section-cut gate: PASS" : "Section-cut gate: FAIL — the substitute changes the internal effects by more than allowed.");
        return lines;
    }

    /// <summary>One case of the section-cut gate in a line.</summary>
    public static string GateCase(SectionGateCase c, CheckResult r, int width = 0)
    {
        ArgumentNullException.ThrowIfNull(c);
        ArgumentNullException.ThrowIfNull(r);
        string m = r.Units.MomentSymbol, l = r.Units.Length.Symbol;
        string extent = c.PeakExtent is { } e ? $", s = {NumberText.Readable(e.Min)} … {NumberText.Readable(e.Max)} {l}" : "";
        return $"  {c.Name.PadRight(width)}  {(c.Passes ? "PASS" : "FAIL")}  largest |ΔM| = {NumberText.Readable(c.MaxMomentDeviation)} {m} at s = "
            + $"{NumberText.Readable(c.MaxMomentDeviationAt)} {l}; allowed {NumberText.Readable(c.AllowedMoment)} {m} (peak {NumberText.Readable(c.PeakMoment)} {m} over the original's loads{extent})";
    }

    /// <summary>A contributor in a few words.</summary>
    public static string Contributor(Contributor k, CheckResult r)
    {
        ArgumentNullException.ThrowIfNull(k);
        ArgumentNullException.ThrowIfNull(r);
        string kind = k.Kind.ToString().ToLowerInvariant();
        string parts = k.Parts > 1 ? $", {k.Parts} parts" : "";
        return k.Kind == LoadDiff.Core.Loads.LoadKind.Couple
            ? $"{k.Id} ({kind}) |C| = {NumberText.Readable(k.Couple.Length)} {r.Units.MomentSymbol}"
            : $"{k.Id} ({kind}{parts}) |F| = {NumberText.Readable(k.Force.Length)} {r.Units.Force.Symbol} at {NumberText.Readable(k.Centroid ?? Vector3.Zero)} {r.Units.Length.Symbol}";
    }

    // "+x", "−y", … when the vector lies within about 0.08° of an axis (the vector itself is printed beside it); otherwise its unit direction.
    private static string Direction(Vector3 v)
    {
        double n = v.Length;
        string[] names = ["x", "y", "z"];
        for (int k = 0; k < 3; k++)
        {
            if (Math.Abs(v[k]) >= n * (1 - 1e-6))
            {
                return (v[k] > 0 ? "+" : "−") + names[k];
            }
        }
        return "direction " + NumberText.Readable(v / n, 1e-12);
    }
}
