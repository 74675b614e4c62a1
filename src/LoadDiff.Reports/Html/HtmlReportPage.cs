using System.Globalization;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Html;

/// <summary>
/// The frame every HTML report shares: one self-contained, well-formed document with inline CSS and SVG, nothing
/// fetched (no scripts, fonts, images or links to other documents), readable on screen and printed to PDF.
/// </summary>
internal static class HtmlReportPage
{
    public const string Css = """
        :root{--orig:#1f4e9a;--subs:#c2570c;--resid:#b00020}
        body{font:14px/1.45 system-ui,"Segoe UI","DejaVu Sans","Liberation Sans",Arial,sans-serif;color:#111;margin:20px auto;max-width:1280px;padding:0 16px}
        .note-text{white-space:pre-wrap}
        h1{font-size:22px;margin:0 0 6px} h2{font-size:18px;margin:28px 0 6px;border-bottom:2px solid #333} h3{font-size:15px;margin:14px 0 4px}
        table{border-collapse:collapse;margin:6px 0 10px} th,td{border:1px solid #aaa;padding:3px 7px;text-align:left;vertical-align:top}
        th{background:#eee} td.num{text-align:right;font-variant-numeric:tabular-nums;white-space:nowrap}
        .verdict-pass{font-weight:600} .verdict-fail{font-weight:700;text-decoration:underline}
        .caution{border:2px solid #333;padding:8px 12px;background:#fafafa;margin:10px 0}
        .views{display:grid;grid-template-columns:repeat(3,minmax(0,1fr));gap:8px;margin:4px 0 10px}
        .views figure{margin:0} .views figcaption{font-size:12px;color:#333}
        svg.view{width:100%;height:auto;display:block;background:#fff}
        svg.legend{width:100%;max-width:960px;height:auto;display:block}
        code,.mono{font-family:ui-monospace,"DejaVu Sans Mono",Menlo,Consolas,monospace;font-size:13px}
        .note{font-size:13px;color:#333} .formula{font-family:ui-monospace,"DejaVu Sans Mono",monospace;font-size:13px;margin:2px 0 2px 18px}
        svg text{stroke:none;fill:#111;font-size:9px;font-family:system-ui,"DejaVu Sans",Arial,sans-serif}
        svg .lgd{font-size:10px} svg .small{font-size:8px} svg .vtitle{font-size:11px;font-weight:700} svg .axl{font-size:10px;font-style:italic} svg .reflbl{font-size:10px;font-weight:700}
        svg .frame{fill:none;stroke:#bbb} svg .axis,svg .bar{stroke:#222;stroke-width:1} svg .head.axis,svg .head.bar{fill:#222;stroke:none}
        svg line,svg polyline,svg path{fill:none} svg .orig{stroke:var(--orig)} svg .subs{stroke:var(--subs);stroke-dasharray:5 3}
        svg .resid{stroke:var(--resid);stroke-dasharray:1.5 2.5}
        svg .head{stroke:none;stroke-dasharray:none} svg .head.orig{fill:var(--orig)} svg .head.subs{fill:var(--subs)} svg .head.resid{fill:var(--resid)}
        svg line.orig,svg line.subs,svg line.resid{stroke-width:1.4} svg .thin{stroke-width:.8} svg .member{stroke-width:2.6}
        svg .res{stroke-width:2.4} svg .head.res{stroke-width:0} svg .arc{stroke-width:1.4}
        svg .sym{fill:#fff;stroke-width:1.2;stroke-dasharray:none} svg .dot{stroke:none;stroke-dasharray:none} svg .dot.orig{fill:var(--orig)} svg .dot.subs{fill:var(--subs)}
        svg .diag{stroke-width:.8} svg .diag.orig{fill:rgba(31,78,154,.10)} svg .diag.subs{fill:rgba(194,87,12,.10)}
        svg .diagline{stroke-width:.8} svg .outline{fill:none;stroke-width:1.2}
        svg .band,svg .cell{stroke:none} svg .tri{stroke:#666;stroke-width:.25}
        svg .box{fill:none;stroke:#888;stroke-dasharray:1 3} svg .axisline{stroke:var(--resid);stroke-width:1.2;stroke-dasharray:9 3 2 3;fill:none}
        svg .ref{stroke:#000;fill:none;stroke-width:1}
        svg text[class]{stroke:none;stroke-dasharray:none} svg text.orig{fill:var(--orig)} svg text.subs{fill:var(--subs)} svg text.resid{fill:var(--resid)}
        @media print{body{margin:0;max-width:none;font-size:11px} .case{break-inside:avoid-page} .views{break-inside:avoid} h2{break-after:avoid}}
        """;

    public static void Begin(TextWriter w, string title)
    {
        w.WriteLine("<!DOCTYPE html>");
        w.WriteLine("<html lang=\"en\">");
        w.WriteLine("<head>");
        w.WriteLine("<meta charset=\"utf-8\"/>");
        w.WriteLine("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\"/>");
        w.WriteLine("<meta name=\"generator\" content=\"loaddiff\"/>");
        w.WriteLine($"<title>{HtmlText.Escape(title)}</title>");
        w.WriteLine("<style>");
        w.WriteLine(Css);
        w.WriteLine("</style>");
        w.WriteLine("</head>");
        w.WriteLine("<body>");
    }

    public static void End(TextWriter w)
    {
        w.WriteLine("</body>");
        w.WriteLine("</html>");
    }

    public static void CautionBox(TextWriter w) =>
        w.WriteLine($"<p class=\"caution\" id=\"caution\"><strong>Caution.</strong> {HtmlText.Escape(Caution.Text["Caution: ".Length..])}</p>");

    /// <summary>The method: the reduction formulas and, for a check, the tolerance rule.</summary>
    public static void Method(TextWriter w, UnitSystem units, bool check)
    {
        string f = units.Force.Symbol, l = units.Length.Symbol, m = units.MomentSymbol;
        w.WriteLine("<section id=\"method\">");
        w.WriteLine("<h2>Method</h2>");
        w.WriteLine($"<p>Every load system is reduced exactly to a force-couple system about one reference point P (force in {f}, moment in {m}, coordinates in {l}, global axes):</p>");
        Formula(w, "R = Σ Fᵢ        M_P = Σ Cⱼ + Σ (rᵢ − P) × Fᵢ");
        Formula(w, "moving the point: M_Q = M_P + (P − Q) × R");
        w.WriteLine("<p>Distributed loads are integrated in closed form, never sampled:</p>");
        Formula(w, "line load, w varying linearly from w₁ at A to w₂ at B (L = |B − A|): R = L(w₁ + w₂)/2,");
        Formula(w, "    M_P = L[(A − P) × (w₁ + w₂)/2 + (B − A) × (w₁/6 + w₂/3)]");
        Formula(w, "area or mesh triangle with vertex pressures p₁, p₂, p₃ (area A): ∫p dA = A(p₁ + p₂ + p₃)/3,");
        Formula(w, "    ∫p x dA = A/12 · Σₖ (pₖ + p₁ + p₂ + p₃) xₖ; polygons as a fan of triangles; a mass m: F = m·g");
        w.WriteLine("<p>Sums are accumulated in double-double arithmetic with moments taken about a point near the loads and then moved to P, so large site coordinates cost no accuracy. "
            + "The wrench of a system (R ≠ 0): pitch p = R·M_P/|R|², central axis through P + (R × M_P)/|R|² along R; it is a single force when R·M_P = 0.</p>");
        if (check)
        {
            w.WriteLine("<p>Tolerance rule. A case or combination passes if and only if</p>");
            Formula(w, "|ΔR| ≤ max(F, rel·G_F)   and   |ΔM_Q| ≤ max(M, rel·G_M) at every corner Q of the bounding box of both systems,");
            w.WriteLine("<p>so at every point inside the box (the norm of ΔM_Q is convex in Q). ΔR and ΔM are substitute − original; "
                + "G_F = Σ|Fᵢ| (∫|w| for distributed loads) and G_M = Σ|Cⱼ| + G_F·D of the original, D being the box diagonal. "
                + "The default rel = 0.001 is common practice; no published source for it was found. "
                + "The residual's own central axis is the line along which the substitute lacks a force −ΔR.</p>");
        }
        w.WriteLine("<p>Drawings. Both systems of a case share one frame and one set of pressure bands, so positions and pressures compare by eye; the arrows of each system have their own scale, shown under each view (the largest item of each system gets the longest arrow). "
            + "A force along the line of sight is a circle with a cross (pointing away from the viewer) or a dot (towards the viewer). "
            + "Line loads are drawn as intensity diagrams on the side the load comes from; area and mesh pressures as shaded bands with arrows where the view shows their direction. "
            + "Where a case has more items than can be drawn legibly, the largest are drawn and the rest aggregated, as the note under each case says. "
            + "The numbers in the tables, not the drawings, are the result.</p>");
        w.WriteLine("</section>");
    }

    public static void Inputs(TextWriter w, HtmlReportInfo info)
    {
        w.WriteLine("<section id=\"inputs\">");
        w.WriteLine("<h2>Inputs and provenance</h2>");
        w.WriteLine("<table id=\"input-files\">");
        w.WriteLine("<thead><tr><th>role</th><th>file</th><th>bytes</th><th>SHA-256</th></tr></thead>");
        w.WriteLine("<tbody>");
        foreach (ReportInput i in info.Inputs)
        {
            string bytes = i.Bytes?.ToString(CultureInfo.InvariantCulture) ?? "—";
            w.WriteLine($"<tr><td>{HtmlText.Escape(i.Role)}</td><td><code>{HtmlText.Escape(i.Name)}</code></td><td class=\"num\">{bytes}</td>"
                + $"<td><code>{HtmlText.Escape(i.Sha256 ?? "not hashed (read from standard input)")}</code></td></tr>");
        }
        w.WriteLine("</tbody>");
        w.WriteLine("</table>");
        w.WriteLine("<h3>Basis of the loads</h3>");
        if (info.Notes.Count == 0)
        {
            w.WriteLine("<p class=\"note\">The inputs carry no notes (the optional <code>note</code> on the document, a case or an item says where a load came from and why).</p>");
        }
        else
        {
            w.WriteLine("<table id=\"input-notes\">");
            w.WriteLine("<thead><tr><th>file</th><th>on</th><th>note</th></tr></thead>");
            w.WriteLine("<tbody>");
            foreach (ReportNote n in info.Notes)
            {
                w.WriteLine($"<tr><td><code>{HtmlText.Escape(n.Input)}</code></td><td>{HtmlText.Escape(n.Where)}</td><td class=\"note-text\">{HtmlText.Escape(n.Text)}</td></tr>");
            }
            w.WriteLine("</tbody>");
            w.WriteLine("</table>");
        }
        w.WriteLine($"<p>Made by loaddiff <span id=\"tool-version\">{HtmlText.Escape(info.ToolVersion)}</span> on "
            + $"<time id=\"created\" datetime=\"{info.Created.UtcDateTime.ToString("yyyy-MM-dd'T'HH:mm:ss'Z'", CultureInfo.InvariantCulture)}\">"
            + $"{info.Created.UtcDateTime.ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)} UTC</time>.</p>");
        w.WriteLine("</section>");
    }

    public static void SectionCuts(TextWriter w, HtmlReportInfo info)
    {
        w.WriteLine("<section id=\"section-cuts\">");
        w.WriteLine("<h2>Section cuts</h2>");
        if (info.SectionCharts.Count == 0)
        {
            w.WriteLine("<p class=\"note\">No section cuts were requested for this report.</p>");
        }
        foreach (SectionChart c in info.SectionCharts)
        {
            w.WriteLine("<figure class=\"section-chart\">");
            w.WriteLine($"<figcaption>{HtmlText.Escape(c.Title)}</figcaption>");
            w.WriteLine(c.Svg);
            if (c.Caption is { } caption)
            {
                w.WriteLine($"<p class=\"note\">{HtmlText.Escape(caption)}</p>");
            }
            w.WriteLine("</figure>");
        }
        w.WriteLine("</section>");
    }

    public static string Id(string prefix, string name)
    {
        var b = new System.Text.StringBuilder(prefix);
        foreach (char c in name)
        {
            b.Append(char.IsAsciiLetterOrDigit(c) || c is '-' or '_' ? c : '_');
        }
        return b.ToString();
    }

    private static void Formula(TextWriter w, string text) => w.WriteLine($"<p class=\"formula\">{HtmlText.Escape(text)}</p>");
}
