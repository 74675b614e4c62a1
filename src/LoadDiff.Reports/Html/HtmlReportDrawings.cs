using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Html;

/// <summary>Rows of views (plan and two elevations) and the legend, shared by the check and reduce reports.</summary>
internal static class HtmlReportDrawings
{
    /// <summary>The frames of one case's three views, holding both systems' geometry and the reference point.</summary>
    public static Dictionary<SketchView, SketchFrame> Frames(Box? box, Vector3 reference)
    {
        var points = new List<Vector3> { reference };
        if (box is not null)
        {
            points.AddRange(box.Corners);
        }
        return ViewAxes.All.ToDictionary(v => v, v => SketchFrame.Fit(v, points));
    }

    public static void SystemRow(
        TextWriter w, string heading, SystemSketch sketch, string cls, Dictionary<SketchView, SketchFrame> frames,
        SketchScales scales, Vector3 reference, UnitSystem units)
    {
        w.WriteLine($"<h3>{HtmlText.Escape(heading)}</h3>");
        w.WriteLine($"<div class=\"views\" data-system=\"{cls}\">");
        foreach (SketchView v in ViewAxes.All)
        {
            w.WriteLine("<figure>");
            w.Write(SvgSketch.System(frames[v], sketch, cls, scales, reference, ViewAxes.Title(v) + " — " + heading, units));
            w.WriteLine("</figure>");
        }
        w.WriteLine("</div>");
        string note = Aggregation(sketch, frames);
        if (note.Length > 0)
        {
            w.WriteLine($"<p class=\"note\">{HtmlText.Escape(note)}</p>");
        }
    }

    public static void ResultantRow(
        TextWriter w, string heading, IReadOnlyList<ResultantArrow> items, Box? box, (Vector3, Vector3)? axis,
        Dictionary<SketchView, SketchFrame> frames, Vector3 reference, UnitSystem units)
    {
        w.WriteLine($"<h3>{HtmlText.Escape(heading)}</h3>");
        w.WriteLine("<div class=\"views\" data-system=\"resultants\">");
        foreach (SketchView v in ViewAxes.All)
        {
            w.WriteLine("<figure>");
            w.Write(SvgSketch.Resultants(frames[v], items, box, axis, reference, ViewAxes.Title(v) + " — " + heading, units));
            w.WriteLine("</figure>");
        }
        w.WriteLine("</div>");
    }

    /// <summary>What a drawing leaves out or aggregates, in words.</summary>
    public static string Aggregation(SystemSketch s, Dictionary<SketchView, SketchFrame> frames)
    {
        var parts = new List<string>();
        if (s.ForceCount > s.Forces.Count)
        {
            parts.Add($"the {s.Forces.Count} largest of {Count(s.ForceCount)} point forces are drawn as arrows; the positions of all are shown as dots, one per {SvgSketch.DotCellPixels.ToString(CultureInfo.InvariantCulture)}-pixel cell");
        }
        if (s.CoupleCount > 3)
        {
            parts.Add($"the 3 largest of {Count(s.CoupleCount)} couples are drawn");
        }
        if (s.LineCount > s.Lines.Count)
        {
            parts.Add($"the {s.Lines.Count} largest of {Count(s.LineCount)} line loads are drawn");
        }
        if (s.AreaCount > s.Areas.Count)
        {
            parts.Add($"the {s.Areas.Count} largest of {Count(s.AreaCount)} areas are drawn");
        }
        if (s.TriangleCount > 0 && s.Triangles is null)
        {
            parts.Add($"the mesh of {Count(s.TriangleCount)} triangles is drawn as cells (at least {SvgSketch.MinCellPixels.ToString(CultureInfo.InvariantCulture)} pixels wide) shaded by the mean pressure ∫p dA / A of the triangles whose centroids fall in them");
        }
        return parts.Count == 0 ? "" : "Drawing: " + string.Join("; ", parts) + ". The reduction used every item.";
    }

    /// <summary>The legend of line styles, symbols and pressure bands.</summary>
    public static void Legend(TextWriter w, bool check, PressureBands pressure, UnitSystem units)
    {
        var b = new SvgBuilder();
        bool bands = pressure.Max > 0;
        double height = bands ? 86 : 48;
        b.Open("svg", $"class=\"legend\" viewBox=\"0 0 960 {SvgBuilder.N(height)}\" role=\"img\" aria-label=\"Legend\"");
        b.Raw("<title>Legend</title>\n");
        double x = 8;
        void Sample(string cls, string label)
        {
            b.Line(x, 14, x + 34, 14, "res " + cls);
            b.Text(x + 40, 17, label, "lgd");
            x += 46 + (label.Length * 5.4);
        }
        Sample("orig", check ? "original (solid)" : "load system (solid)");
        if (check)
        {
            Sample("subs", "substitute (dashed)");
            Sample("resid", "residual, substitute − original (dotted)");
            b.Line(x, 14, x + 34, 14, "axisline");
            b.Text(x + 40, 17, "residual's central axis", "lgd");
        }
        x = 8;
        b.Circle(x + 6, 36, 5, "sym orig");
        b.Path($"M{x + 2.5} 32.5L{x + 9.5} 39.5M{x + 2.5} 39.5L{x + 9.5} 32.5", "sym orig");
        b.Text(x + 16, 39, "force away from the viewer", "lgd");
        x += 160;
        b.Circle(x + 6, 36, 5, "sym orig");
        b.Circle(x + 6, 36, 1.2, "head orig");
        b.Text(x + 16, 39, "force towards the viewer", "lgd");
        x += 150;
        b.Path($"M{x + 1} 38A6 6 0 1 0 {x + 7} 30", "arc orig");
        b.Text(x + 16, 39, "couple about the line of sight (turning as drawn)", "lgd");
        x += 262;
        b.Line(x, 36, x + 26, 36, "orig");
        b.Polygon([(x + 30, 36), (x + 24, 33), (x + 24, 39)], "head orig");
        b.Polygon([(x + 25, 36), (x + 19, 33), (x + 19, 39)], "head orig");
        b.Text(x + 36, 39, "moment vector in the drawing plane", "lgd");
        x += 220;
        b.Circle(x + 6, 36, 3.5, "ref");
        b.Text(x + 14, 39, "P reference point", "lgd");
        if (bands)
        {
            PressureBands p = pressure;
            b.Text(8, 62, $"pressure bands ({units.Force.Symbol}/{units.Length.Symbol}²):", "lgd");
            double bx = 190;
            const double bw = 50;
            for (int band = -PressureBands.Steps; band <= PressureBands.Steps; band++)
            {
                if (band == 0)
                {
                    continue;
                }
                b.Rect(bx, 52, bw, 14, "band", PressureBands.BandColour(band));
                b.Line(bx, 50, bx, 68, "bar");
                double lo = band > 0 ? (band - 1) * p.Max / PressureBands.Steps : band * p.Max / PressureBands.Steps;
                b.Text(bx, 78, p.Label(lo), "lgd small", "middle");
                bx += bw;
            }
            b.Line(bx, 50, bx, 68, "bar");
            b.Text(bx, 78, p.Label(p.Max), "lgd small", "middle");
            b.Text(bx + 6, 63, "blue: pressure, orange: suction; darker is larger", "lgd");
        }
        b.Close("svg");
        w.Write(b.ToString());
    }

    private static string Count(long n) => n.ToString("N0", CultureInfo.InvariantCulture);
}
