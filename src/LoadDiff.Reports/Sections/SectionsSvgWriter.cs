using System.Globalization;
using System.Security;
using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;

namespace LoadDiff.Reports.Sections;

/// <summary>
/// A self-contained SVG chart of both profiles: for each entry, one panel of the cut-side force components and one of
/// the moment components along e₁, e₂, e₃, the original drawn solid and the substitute dashed, with labelled axes in units.
/// </summary>
public static class SectionsSvgWriter
{
    private const int Width = 880, PanelHeight = 240, Left = 90, Right = 170, Top = 66, Gap = 70;
    private static readonly string[] Colours = ["#5b3a8c", "#c2452d", "#1d6f8a"];

    /// <summary>Writes the chart.</summary>
    public static void Write(SectionsResult result, TextWriter w)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(w);
        int panels = result.Entries.Count * 2;
        int height = Top + (panels * (PanelHeight + Gap)) + 40;
        w.WriteLine($"<svg xmlns=\"http://www.w3.org/2000/svg\" width=\"{Width}\" height=\"{height}\" viewBox=\"0 0 {Width} {height}\" font-family=\"sans-serif\" font-size=\"12\">");
        w.WriteLine($"<title>Section cuts of {Esc(result.SubstitutePath)} against {Esc(result.OriginalPath)}</title>");
        w.WriteLine("<rect width=\"100%\" height=\"100%\" fill=\"white\"/>");
        SectionAxis a = result.Axis;
        w.WriteLine($"<text x=\"{Left}\" y=\"20\" font-size=\"14\" font-weight=\"bold\">Section cuts along e1 = {Esc(NumberText.Readable(a.Direction))} through {Esc(NumberText.Readable(a.Origin))} {Esc(result.Units.Length.Symbol)}</text>");
        w.WriteLine($"<text x=\"{Left}\" y=\"36\">solid: original ({Esc(result.OriginalPath)}); dashed: substitute ({Esc(result.SubstitutePath)}); e2 = {Esc(NumberText.Readable(a.Lateral))}, e3 = {Esc(NumberText.Readable(a.Transverse))}</text>");
        int y = Top;
        foreach (SectionsEntry e in result.Entries)
        {
            string label = (e.Kind == EntryKind.Case ? "case " : "combination ") + e.Name;
            Panel(w, e.Comparison, y, $"{label}: cut-side force V(s)", result.Units.Force.Symbol, true, result);
            y += PanelHeight + Gap;
            Panel(w, e.Comparison, y, $"{label}: cut-side moment M(s) about the cut point", result.Units.MomentSymbol, false, result);
            y += PanelHeight + Gap;
        }
        w.WriteLine($"<text x=\"{Left}\" y=\"{height - 14}\" font-size=\"10\">{Esc(SectionsResult.SectionCaution)}</text>");
        w.WriteLine("</svg>");
    }

    private static void Panel(TextWriter w, SectionComparison c, int top, string title, string unit, bool force, SectionsResult r)
    {
        SectionAxis a = r.Axis;
        Vector3 Pick(Core.Reduction.ForceCoupleSystem s) => a.Local(force ? s.Force : s.Moment);
        double s0 = c.Stations[0].S, s1 = c.Stations[^1].S;
        if (s1 == s0)
        {
            s1 = s0 + 1;
        }
        double lo = 0, hi = 0;
        foreach (SectionStation s in c.Stations)
        {
            for (int k = 0; k < 3; k++)
            {
                lo = Math.Min(lo, Math.Min(Pick(s.Original)[k], Pick(s.Substitute)[k]));
                hi = Math.Max(hi, Math.Max(Pick(s.Original)[k], Pick(s.Substitute)[k]));
            }
        }
        double noise = Core.Reduction.WrenchAnalysis.RoundingThreshold * Math.Max(Math.Abs(lo), Math.Abs(hi));
        if (hi - lo <= noise)
        {
            lo = -1;
            hi = 1;
        }
        double pad = (hi - lo) * 0.05;
        lo -= pad;
        hi += pad;
        int plotW = Width - Left - Right;
        string X(double s) => F(Left + ((s - s0) / (s1 - s0) * plotW));
        string Y(double v) => F(top + PanelHeight - ((v - lo) / (hi - lo) * PanelHeight));

        w.WriteLine($"<g>");
        w.WriteLine($"<text x=\"{Left}\" y=\"{top - 8}\" font-weight=\"bold\">{Esc(title)}</text>");
        w.WriteLine($"<rect x=\"{Left}\" y=\"{top}\" width=\"{plotW}\" height=\"{PanelHeight}\" fill=\"none\" stroke=\"#888\"/>");
        foreach (double t in Ticks(lo, hi))
        {
            w.WriteLine($"<line x1=\"{Left}\" x2=\"{Left + plotW}\" y1=\"{Y(t)}\" y2=\"{Y(t)}\" stroke=\"{(t == 0 ? "#444" : "#e2e2e2")}\"/>");
            w.WriteLine($"<text x=\"{Left - 6}\" y=\"{Y(t)}\" text-anchor=\"end\" dominant-baseline=\"middle\">{Esc(NumberText.Readable(t))}</text>");
        }
        foreach (double t in Ticks(s0, s1))
        {
            w.WriteLine($"<line x1=\"{X(t)}\" x2=\"{X(t)}\" y1=\"{top + PanelHeight}\" y2=\"{top + PanelHeight + 5}\" stroke=\"#444\"/>");
            w.WriteLine($"<text x=\"{X(t)}\" y=\"{top + PanelHeight + 18}\" text-anchor=\"middle\">{Esc(NumberText.Readable(t))}</text>");
        }
        w.WriteLine($"<text x=\"{Left + (plotW / 2)}\" y=\"{top + PanelHeight + 34}\" text-anchor=\"middle\">station s ({Esc(r.Units.Length.Symbol)})</text>");
        w.WriteLine($"<text transform=\"translate({Left - 62},{top + (PanelHeight / 2)}) rotate(-90)\" text-anchor=\"middle\">{(force ? "V" : "M")} ({Esc(unit)})</text>");
        string[] names = force ? ["N (along e1)", "V2 (along e2)", "V3 (along e3)"] : ["T (about e1)", "M2 (about e2)", "M3 (about e3)"];
        int legend = 0;
        for (int k = 0; k < 3; k++)
        {
            bool present = c.Stations.Any(s => Math.Abs(Pick(s.Original)[k]) > noise || Math.Abs(Pick(s.Substitute)[k]) > noise);
            if (!present)
            {
                continue;
            }
            string orig = string.Join(" ", c.Stations.Select(s => X(s.S) + "," + Y(Pick(s.Original)[k])));
            string sub = string.Join(" ", c.Stations.Select(s => X(s.S) + "," + Y(Pick(s.Substitute)[k])));
            w.WriteLine($"<polyline points=\"{orig}\" fill=\"none\" stroke=\"{Colours[k]}\" stroke-width=\"2\"/>");
            w.WriteLine($"<polyline points=\"{sub}\" fill=\"none\" stroke=\"{Colours[k]}\" stroke-width=\"2\" stroke-dasharray=\"6 4\"/>");
            int ly = top + 14 + (legend++ * 18);
            w.WriteLine($"<line x1=\"{Left + plotW + 12}\" x2=\"{Left + plotW + 36}\" y1=\"{ly}\" y2=\"{ly}\" stroke=\"{Colours[k]}\" stroke-width=\"2\"/>");
            w.WriteLine($"<text x=\"{Left + plotW + 42}\" y=\"{ly}\" dominant-baseline=\"middle\">{names[k]}</text>");
        }
        if (legend == 0)
        {
            w.WriteLine($"<text x=\"{Left + 10}\" y=\"{top + 20}\">zero at every station in both systems</text>");
        }
        w.WriteLine("</g>");
    }

    // About five round tick values covering [lo, hi].
    private static IEnumerable<double> Ticks(double lo, double hi)
    {
        double span = hi - lo;
        double step = Math.Pow(10, Math.Floor(Math.Log10(span / 5)));
        foreach (double m in new[] { 1.0, 2, 5, 10 })
        {
            if (span / (step * m) <= 6)
            {
                step *= m;
                break;
            }
        }
        for (double t = Math.Ceiling(lo / step) * step; t <= hi + (step * 1e-9); t += step)
        {
            yield return Math.Abs(t) < step * 1e-9 ? 0 : t;
        }
    }

    private static string F(double v) => v.ToString("0.##", CultureInfo.InvariantCulture);

    private static string Esc(string s) => SecurityElement.Escape(SafeText.Xml(s));
}
