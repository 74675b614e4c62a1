using System.Globalization;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports.Html;

/// <summary>The reduction of one load file as a self-contained HTML page with drawings of each case.</summary>
public static class HtmlReportReduce
{
    /// <summary>Writes the report.</summary>
    /// <param name="result">The reduction.</param>
    /// <param name="sketch">Sketch of the file's cases, or null to leave the item drawings out.</param>
    /// <param name="info">Version, date and inputs.</param>
    /// <param name="w">Where the HTML goes.</param>
    public static void Write(ReduceResult result, SketchSink? sketch, HtmlReportInfo info, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(info);
        ArgumentNullException.ThrowIfNull(w);
        string f = result.Units.Force.Symbol, l = result.Units.Length.Symbol, m = result.Units.MomentSymbol;
        HtmlReportPage.Begin(w, "Reduction of " + result.Source);
        w.WriteLine("<header>");
        w.WriteLine($"<h1 id=\"verdict\">Reduction of <code>{HtmlText.Escape(result.Source)}</code></h1>");
        if (result.Title is { } t)
        {
            w.WriteLine($"<p><strong>{HtmlText.Escape(t)}</strong></p>");
        }
        HtmlReportPage.CautionBox(w);
        w.WriteLine("</header>");
        w.WriteLine("<section id=\"summary-section\">");
        w.WriteLine("<h2>Summary</h2>");
        w.WriteLine($"<p>Units: force {f}, length {l}, moment {m}. Moments about P = {NumberText.Readable(result.ReferencePoint)} {l} ({HtmlText.Escape(result.ReferenceDescription)}).</p>");
        w.WriteLine("<table id=\"summary\">");
        w.WriteLine($"<thead><tr><th>name</th><th>kind</th><th>R ({f})</th><th>M_P ({m})</th><th>G_F ({f})</th><th>reduces to</th><th>line of action / central axis through ({l})</th><th>pitch ({l})</th></tr></thead>");
        w.WriteLine("<tbody>");
        int index = 0;
        foreach (ReducedEntry e in result.Entries)
        {
            LoadReduction r = e.Reduction;
            WrenchAnalysis wr = e.Wrench;
            string kind = e.Kind == EntryKind.Case ? "case" : "combination " + Describe.Factors(e.Combination!);
            string axis = wr.AxisPoint is { } a ? NumberText.Readable(a, WrenchAnalysis.RoundingThreshold * r.LengthScale) : "—";
            string pitch = wr.Kind == SystemKind.Wrench ? NumberText.Readable(wr.Pitch!.Value) : "—";
            w.WriteLine($"<tr data-name=\"{HtmlText.Escape(e.Name)}\"><td><a href=\"#entry-{index}\">{HtmlText.Escape(e.Name)}</a></td><td>{HtmlText.Escape(kind)}</td>"
                + $"<td class=\"num\">{NumberText.Readable(r.Force, CheckWords.Noise(r).Force)}</td><td class=\"num\">{NumberText.Readable(r.Moment, CheckWords.Noise(r).Moment)}</td>"
                + $"<td class=\"num\">{NumberText.Readable(r.GrossForce)}</td><td>{HtmlText.Escape(Describe.System(wr, r.AllForcesParallel))}</td><td class=\"num\">{axis}</td><td class=\"num\">{pitch}</td></tr>");
            index++;
        }
        w.WriteLine("</tbody>");
        w.WriteLine("</table>");
        w.WriteLine("</section>");
        index = 0;
        foreach (ReducedEntry e in result.Entries)
        {
            LoadReduction r = e.Reduction;
            w.WriteLine($"<section class=\"case\" id=\"entry-{index++}\" data-name=\"{HtmlText.Escape(e.Name)}\">");
            w.WriteLine($"<h2>{(e.Kind == EntryKind.Case ? "Case" : "Combination")} “{HtmlText.Escape(e.Name)}”{(e.Title is { } title ? " — " + HtmlText.Escape(title) : "")}</h2>");
            w.WriteLine($"<p>{r.ItemCount.ToString(CultureInfo.InvariantCulture)} item{(r.ItemCount == 1 ? "" : "s")}; reduces to {HtmlText.Escape(Describe.System(e.Wrench, r.AllForcesParallel))}.</p>");
            var frames = HtmlReportDrawings.Frames(r.Bounds, result.ReferencePoint);
            SystemSketch? s = e.Kind == EntryKind.Case ? sketch?.Case(e.Name) : null;
            SketchScales? scales = s is null ? null : new SketchScales(s, s.MaxPressure);
            HtmlReportDrawings.Legend(w, check: false, new PressureBands(s?.MaxPressure ?? 0), result.Units);
            if (s is not null)
            {
                HtmlReportDrawings.SystemRow(w, "Loads", s, "orig", frames, scales!, result.ReferencePoint, result.Units);
            }
            (LoadDiff.Core.Vector3, LoadDiff.Core.Vector3)? axis = null;
            HtmlReportDrawings.ResultantRow(w, "Resultant at P", [new ResultantArrow(r.Force, r.Moment, "orig", "R")], r.Bounds, axis, frames, result.ReferencePoint, result.Units);
            w.WriteLine("</section>");
        }
        HtmlReportPage.Method(w, result.Units, check: false);
        HtmlReportPage.Inputs(w, info);
        HtmlReportPage.CautionBox(w);
        HtmlReportPage.End(w);
    }
}
