using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports.Html;

/// <summary>
/// The check as one self-contained HTML page for a checker to sign: summary table, per case the drawings of both
/// systems with resultants and residual, the section-cut charts when given, the method, the inputs with their
/// SHA-256, the tool version, the date and the caution.
/// </summary>
public static class HtmlReportCheck
{
    /// <summary>Writes the report.</summary>
    /// <param name="result">The check.</param>
    /// <param name="original">Sketch of the original's cases, or null to leave the item drawings out.</param>
    /// <param name="substitute">Sketch of the substitute's cases, or null.</param>
    /// <param name="info">Version, date, inputs and section charts.</param>
    /// <param name="w">Where the HTML goes.</param>
    public static void Write(CheckResult result, SketchSink? original, SketchSink? substitute, HtmlReportInfo info, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(info);
        ArgumentNullException.ThrowIfNull(w);
        string verdict = result.Equivalent ? "EQUIVALENT ✓" : "NOT EQUIVALENT ✗";
        HtmlReportPage.Begin(w, $"Static equivalence check: {result.SubstitutePath} against {result.OriginalPath}");
        w.WriteLine("<header>");
        w.WriteLine($"<h1 id=\"verdict\" data-equivalent=\"{(result.Equivalent ? "true" : "false")}\">Static equivalence check: {HtmlText.Escape(verdict)}</h1>");
        w.WriteLine($"<p>Substitute <code>{HtmlText.Escape(result.SubstitutePath)}</code> checked against the original <code>{HtmlText.Escape(result.OriginalPath)}</code>.</p>");
        w.WriteLine($"<p id=\"overall\" class=\"{(result.Equivalent ? "verdict-pass" : "verdict-fail")}\">{HtmlText.Escape(CheckWords.Overall(result))}</p>");
        foreach (string warning in result.Warnings)
        {
            w.WriteLine($"<p class=\"warning\">Warning: {HtmlText.Escape(warning)}.</p>");
        }
        HtmlReportPage.CautionBox(w);
        w.WriteLine("</header>");
        Summary(w, result);
        int index = 0;
        foreach (CaseComparison c in result.Comparisons)
        {
            Entry(w, result, c, index++, original, substitute);
        }
        HtmlReportPage.SectionCuts(w, info);
        HtmlReportPage.Method(w, result.Units, check: true);
        HtmlReportPage.Inputs(w, info);
        HtmlReportPage.CautionBox(w);
        HtmlReportPage.End(w);
    }

    private static void Summary(TextWriter w, CheckResult r)
    {
        string f = r.Units.Force.Symbol, l = r.Units.Length.Symbol, m = r.Units.MomentSymbol;
        w.WriteLine("<section id=\"summary-section\">");
        w.WriteLine("<h2>Summary</h2>");
        w.WriteLine($"<p>Units: force {f}, length {l}, moment {m}. Moments about P = {NumberText.Readable(r.ReferencePoint)} {l} ({HtmlText.Escape(r.ReferenceDescription)}). "
            + $"Tolerance: {HtmlText.Escape(CheckWords.Rule(r))}.</p>");
        w.WriteLine("<table id=\"summary\">");
        w.WriteLine($"<thead><tr><th>name</th><th>kind</th><th>verdict</th><th>R original ({f})</th><th>R substitute ({f})</th>"
            + $"<th>M_P original ({m})</th><th>M_P substitute ({m})</th><th>|ΔR| ({f})</th><th>allowed</th><th>worst |ΔM| ({m})</th><th>allowed</th><th>governs (F/M)</th></tr></thead>");
        w.WriteLine("<tbody>");
        int index = 0;
        foreach (CaseComparison c in r.Comparisons)
        {
            string cls = c.Equivalent ? "verdict-pass" : "verdict-fail";
            string mark = c.Equivalent ? "✓ PASS" : "✗ " + CheckWords.Verdict(c);
            string ro = c.Original is { } o ? NumberText.Readable(o.Force, CheckWords.Noise(o).Force) : "—";
            string rs = c.Substitute is { } s ? NumberText.Readable(s.Force, CheckWords.Noise(s).Force) : "—";
            string mo = c.Original is { } o2 ? NumberText.Readable(o2.Moment, CheckWords.Noise(o2).Moment) : "—";
            string ms = c.Substitute is { } s2 ? NumberText.Readable(s2.Moment, CheckWords.Noise(s2).Moment) : "—";
            string dr = CheckWords.ForceNorm(c), af = "—", dm = CheckWords.WorstMoment(c), am = "—", gov = "—";
            if (c.Tolerance is { } t)
            {
                af = NumberText.Readable(t.Force);
                am = NumberText.Readable(t.Moment);
                gov = CheckWords.Governs(t);
            }
            w.WriteLine($"<tr data-name=\"{HtmlText.Escape(c.Name)}\" data-kind=\"{CheckWords.Kind(c)}\"><td><a href=\"#entry-{index}\">{HtmlText.Escape(c.Name)}</a></td><td>{CheckWords.Kind(c)}</td>"
                + $"<td class=\"{cls}\">{HtmlText.Escape(mark)}</td><td class=\"num\">{ro}</td><td class=\"num\">{rs}</td><td class=\"num\">{mo}</td><td class=\"num\">{ms}</td>"
                + $"<td class=\"num\">{dr}</td><td class=\"num\">{af}</td><td class=\"num\">{dm}</td><td class=\"num\">{am}</td><td>{gov}</td></tr>");
            index++;
        }
        w.WriteLine("</tbody>");
        w.WriteLine("</table>");
        w.WriteLine($"<p class=\"note\">|ΔR| and |ΔM| are the norms of substitute − original; worst |ΔM| is the largest over the corners of the box of both systems. "
            + $"{NumberText.ReadableDigits.ToString(CultureInfo.InvariantCulture)} significant digits, 0 within the rounding noise; <code>--format json</code> gives exact values.</p>");
        IReadOnlyList<string> gate = CheckWords.Gate(r);
        if (gate.Count > 0)
        {
            bool passes = r.SectionGate!.Passes;
            w.WriteLine($"<div id=\"section-gate\" data-passes=\"{(passes ? "true" : "false")}\"><h3 class=\"{(passes ? "verdict-pass" : "verdict-fail")}\">{HtmlText.Escape(gate[^1])}</h3>");
            w.WriteLine($"<p>{HtmlText.Escape(gate[0])}.</p><ul>");
            foreach (string line in gate.Skip(1).Take(gate.Count - 2))
            {
                w.WriteLine($"<li>{HtmlText.Escape(line.Trim())}</li>");
            }
            w.WriteLine("</ul></div>");
        }
        w.WriteLine("</section>");
    }

    private static void Entry(TextWriter w, CheckResult r, CaseComparison c, int index, SketchSink? original, SketchSink? substitute)
    {
        string f = r.Units.Force.Symbol, l = r.Units.Length.Symbol, m = r.Units.MomentSymbol;
        bool isCase = c.Kind == EntryKind.Case;
        w.WriteLine($"<section class=\"case\" id=\"entry-{index}\" data-name=\"{HtmlText.Escape(c.Name)}\">");
        w.WriteLine($"<h2>{(isCase ? "Case" : "Combination")} “{HtmlText.Escape(c.Name)}”: {HtmlText.Escape(c.Equivalent ? "✓ PASS" : "✗ " + CheckWords.Verdict(c))}</h2>");
        if (!c.Equivalent)
        {
            w.WriteLine($"<p><strong>Why:</strong> {HtmlText.Escape(CheckWords.FailureReason(c, r))}.</p>");
        }
        foreach (string line in CheckWords.Explanation(c, r))
        {
            w.WriteLine($"<p class=\"explanation\">{HtmlText.Escape(line)}</p>");
        }
        foreach (string note in c.Equivalent ? c.Notes : [])
        {
            w.WriteLine($"<p class=\"note\">{HtmlText.Escape(note)}</p>");
        }
        w.WriteLine("<table class=\"systems\">");
        w.WriteLine($"<thead><tr><th></th><th>R ({f})</th><th>M about P ({m})</th><th>G_F ({f})</th><th>items</th></tr></thead><tbody>");
        Row(w, "original", c.Original);
        Row(w, "substitute", c.Substitute);
        if (c.Residual is { } res)
        {
            (double fn, double mn) = CheckWords.ResidualNoise(c, r.ReferencePoint);
            w.WriteLine($"<tr><th>residual ΔR, ΔM</th><td class=\"num\">{NumberText.Readable(res.System.Force, fn)}</td><td class=\"num\">{NumberText.Readable(res.System.Moment, mn)}</td>"
                + $"<td colspan=\"2\">worst |ΔM| = {CheckWords.WorstMoment(c)} {m} at {NumberText.Readable(res.WorstCorner)} {l}</td></tr>");
        }
        w.WriteLine("</tbody></table>");
        if (r.Contributors.TryGetValue(c.Name, out CaseContributors? k) && (k.Original.Count > 0 || k.Substitute.Count > 0))
        {
            w.WriteLine("<p class=\"note\">Largest items — original: " + HtmlText.Escape(string.Join("; ", k.Original.Select(x => CheckWords.Contributor(x, r))))
                + (k.Substitute.Count > 0 ? ". Substitute: " + HtmlText.Escape(string.Join("; ", k.Substitute.Select(x => CheckWords.Contributor(x, r)))) : "") + ".</p>");
        }
        Box? box = Box.Union(c.Original?.Bounds, c.Substitute?.Bounds);
        SystemSketch? so = isCase ? original?.Case(c.Name) : null;
        SystemSketch? ss = isCase ? substitute?.Case(c.Name) : null;
        var frames = HtmlReportDrawings.Frames(box, r.ReferencePoint);
        double bandMax = Math.Max(so?.MaxPressure ?? 0, ss?.MaxPressure ?? 0);
        HtmlReportDrawings.Legend(w, check: true, new PressureBands(bandMax), r.Units);
        if (so is not null)
        {
            HtmlReportDrawings.SystemRow(w, "Original: " + r.OriginalPath, so, "orig", frames, new SketchScales(so, bandMax), r.ReferencePoint, r.Units);
        }
        if (ss is not null)
        {
            HtmlReportDrawings.SystemRow(w, "Substitute: " + r.SubstitutePath, ss, "subs", frames, new SketchScales(ss, bandMax), r.ReferencePoint, r.Units);
        }
        if (!isCase)
        {
            w.WriteLine("<p class=\"note\">A combination is the factored sum of its cases, drawn above; here its resultants and residual.</p>");
        }
        var arrows = new List<ResultantArrow>();
        if (c.Original is { } ro)
        {
            arrows.Add(new ResultantArrow(ro.Force, ro.Moment, "orig", "R original"));
        }
        if (c.Substitute is { } rs)
        {
            arrows.Add(new ResultantArrow(rs.Force, rs.Moment, "subs", "R substitute"));
        }
        (Vector3, Vector3)? axis = null;
        if (c.Residual is { } resid && c.Explanation is not { Reading: ResidualReading.None })
        {
            arrows.Add(new ResultantArrow(resid.System.Force, resid.System.Moment, "resid", "ΔR residual"));
            if (resid.Wrench.AxisPoint is { } ap && resid.Wrench.AxisDirection is { } ad)
            {
                axis = (ap, ad);
            }
        }
        HtmlReportDrawings.ResultantRow(w, "Resultants and residual at P", arrows, box, axis, frames, r.ReferencePoint, r.Units);
        w.WriteLine("</section>");
    }

    private static void Row(TextWriter w, string label, LoadReduction? red)
    {
        if (red is null)
        {
            w.WriteLine($"<tr><th>{label}</th><td colspan=\"4\">absent: no {label} case or combination of this name</td></tr>");
            return;
        }
        (double noise, double momentNoise) = CheckWords.Noise(red);
        w.WriteLine($"<tr><th>{label}</th><td class=\"num\">{NumberText.Readable(red.Force, noise)}</td><td class=\"num\">{NumberText.Readable(red.Moment, momentNoise)}</td>"
            + $"<td class=\"num\">{NumberText.Readable(red.GrossForce)}</td><td class=\"num\">{red.ItemCount.ToString(CultureInfo.InvariantCulture)}</td></tr>");
    }
}
