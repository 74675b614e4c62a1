using System.Globalization;
using LoadDiff.Core;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Html;

/// <summary>
/// Draws load systems as inline SVG in plan and elevation: point forces as arrows scaled by magnitude (a circle
/// with a cross or a dot where the force points away from or towards the viewer), couples as curved arrows (the
/// component along the line of sight) and double-headed arrows (the component in the drawing plane), line loads as
/// their intensity diagrams, areas and meshes shaded by pressure band.
/// </summary>
internal static partial class SvgSketch
{
    /// <summary>Smallest side of a drawn mesh cell, in pixels; finer bins are merged.</summary>
    public const double MinCellPixels = 10;

    /// <summary>Side of the cells in which the positions of undrawn point forces are shown as dots.</summary>
    public const double DotCellPixels = 6;

    private const double HeadLength = 6;

    /// <summary>One system in one view.</summary>
    public static string System(SketchFrame f, SystemSketch s, string cls, SketchScales sc, Vector3 reference, string title, UnitSystem units)
    {
        var b = new SvgBuilder();
        Begin(b, f, title);
        Mesh(b, f, s, sc);
        Areas(b, f, s, cls, sc);
        Lines(b, f, s, cls, sc);
        ForceDots(b, f, s, cls);
        Forces(b, f, s, cls, sc, units);
        Couples(b, f, s, reference, cls, sc);
        ReferenceMark(b, f, reference);
        var bars = new List<(double Px, string Label, bool Double)>();
        if (s.ForceCount > 0 && sc.Force > 0)
        {
            double n = SketchScales.Nice(sc.MaxForce);
            bars.Add((n * sc.Force, $"{SketchScales.NiceText(n)} {units.Force.Symbol}", false));
        }
        if (s.LineCount > 0 && sc.Line > 0)
        {
            double n = SketchScales.Nice(sc.MaxLine);
            bars.Add((n * sc.Line, $"{SketchScales.NiceText(n)} {units.Force.Symbol}/{units.Length.Symbol}", false));
        }
        if ((s.AreaCount > 0 || s.TriangleCount > 0) && sc.Pressure > 0)
        {
            double n = SketchScales.Nice(sc.Bands.Max);
            bars.Add((n * sc.Pressure, $"{SketchScales.NiceText(n)} {units.Force.Symbol}/{units.Length.Symbol}²", false));
        }
        Furniture(b, f, units, bars);
        b.Close("svg");
        return b.ToString();
    }

    /// <summary>Opens the SVG element with its accessible title.</summary>
    private static void Begin(SvgBuilder b, SketchFrame f, string title)
    {
        b.Open("svg", $"class=\"view\" data-view=\"{f.View}\" viewBox=\"0 0 {SketchFrame.Width} {SketchFrame.Height}\" role=\"img\" aria-label=\"{HtmlText.Escape(title)}\"");
        b.Raw($"<title>{HtmlText.Escape(title)}</title>\n");
        b.Rect(0.5, 0.5, SketchFrame.Width - 1, SketchFrame.Height - 1, "frame");
        b.Text(8, 13, ViewAxes.Title(f.View), "vtitle");
    }

    /// <summary>Axes with their names and the length unit, a length scale bar, and the arrow scales.</summary>
    private static void Furniture(SvgBuilder b, SketchFrame f, UnitSystem units, IReadOnlyList<(double Px, string Label, bool Double)> bars)
    {
        (string un, string vn) = ViewAxes.Names(f.View);
        const double ox = 14, oy = 290;
        Arrow(b, ox, oy, ox + 22, oy, "axis", 4);
        Arrow(b, ox, oy, ox, oy - 22, "axis", 4);
        b.Text(ox + 25, oy + 3, un, "axl");
        b.Text(ox - 3, oy - 25, vn, "axl");
        double target = 70 / f.K;
        double len = SketchScales.Nice(target);
        double px = len * f.K;
        if (px > 110)
        {
            len /= 2;
            px /= 2;
        }
        const double sx = 54, sy = 288;
        b.Line(sx, sy, sx + px, sy, "bar");
        b.Line(sx, sy - 4, sx, sy + 2, "bar");
        b.Line(sx + px, sy - 4, sx + px, sy + 2, "bar");
        b.Text(sx, sy - 6, "0", "sc");
        b.Text(sx + px, sy - 6, $"{SketchScales.NiceText(len)} {units.Length.Symbol}", "sc", "middle");
        double x = Math.Max(sx + px + 30, 150);
        foreach ((double apx, string label, bool twoHeads) in bars)
        {
            double w = apx;
            string text = label;
            if (w > 60 && label.Split(' ', 2) is [string number, string unit]
                && double.TryParse(number, NumberStyles.Float, CultureInfo.InvariantCulture, out double value))
            {
                // A shorter reference arrow for a round value that fits beside the others.
                double smaller = SketchScales.Nice(value * 50 / w);
                w *= smaller / value;
                text = SketchScales.NiceText(smaller) + " " + unit;
            }
            Arrow(b, x, sy, x + w, sy, "bar", 4);
            if (twoHeads)
            {
                Arrow(b, x, sy, x + w - 4, sy, "bar", 4);
            }
            b.Text(x + w + 3, sy + 3, "= " + text, "sc");
            x += w + 26 + (text.Length * 5.2);
        }
    }

    /// <summary>A straight arrow whose head is at (x2, y2).</summary>
    private static void Arrow(SvgBuilder b, double x1, double y1, double x2, double y2, string cls, double head = HeadLength, string? item = null)
    {
        double dx = x2 - x1, dy = y2 - y1;
        double len = Math.Sqrt((dx * dx) + (dy * dy));
        if (len < 0.5)
        {
            return;
        }
        double ux = dx / len, uy = dy / len;
        double h = Math.Min(head, len * 0.6);
        double bx = x2 - (ux * h), by = y2 - (uy * h);
        b.Line(x1, y1, bx, by, cls, item);
        b.Polygon([(x2, y2), (bx - (uy * h * 0.45), by + (ux * h * 0.45)), (bx + (uy * h * 0.45), by - (ux * h * 0.45))], "head " + cls, item: item);
    }

    /// <summary>A force vector ending at a point: an arrow of its in-plane part, or the out-of-plane symbol.</summary>
    private static void ForceAt(SvgBuilder b, SketchFrame f, Vector3 at, Vector3 force, double scale, double relative, string cls, string item)
    {
        (double x, double y) = f.Map(at);
        (double sx, double sy) = f.Screen(force);
        double total = force.Length * scale;
        double inPlane = Math.Sqrt((sx * sx) + (sy * sy)) * scale;
        if (inPlane >= 0.25 * total && inPlane >= 1)
        {
            Arrow(b, x - (sx * scale), y - (sy * scale), x, y, cls, item: item);
        }
        else if (inPlane >= 0.25 * total)
        {
            // In the drawing plane but under a pixel to scale: the out-of-plane symbol would give it a false sense.
            b.Circle(x, y, 1.2, "dot " + cls, item);
        }
        else if (force.Length > 0)
        {
            OutOfPlane(b, x, y, 2.5 + (4.5 * relative), f.Toward(force) > 0, cls, item);
        }
    }

    /// <summary>A vector along the line of sight: a circle with a dot (towards the viewer) or a cross (away).</summary>
    private static void OutOfPlane(SvgBuilder b, double x, double y, double r, bool toward, string cls, string? item = null)
    {
        b.Circle(x, y, r, "sym " + cls, item);
        if (toward)
        {
            b.Circle(x, y, Math.Max(0.8, r * 0.22), "head " + cls, item);
        }
        else
        {
            double d = r * 0.7;
            b.Path($"M{SvgBuilder.N(x - d)} {SvgBuilder.N(y - d)}L{SvgBuilder.N(x + d)} {SvgBuilder.N(y + d)}M{SvgBuilder.N(x - d)} {SvgBuilder.N(y + d)}L{SvgBuilder.N(x + d)} {SvgBuilder.N(y - d)}", "sym " + cls, item);
        }
    }

    /// <summary>A couple about the line of sight as a curved arrow (counter-clockwise for a component towards the viewer).</summary>
    private static void CurvedArrow(SvgBuilder b, double cx, double cy, double r, bool counterClockwise, string cls, string? item = null)
    {
        const double start = 200 * Math.PI / 180, sweep = 280 * Math.PI / 180;
        double end = counterClockwise ? start + sweep : start - sweep;
        (double X, double Y) P(double t) => (cx + (r * Math.Cos(t)), cy - (r * Math.Sin(t)));
        var (x0, y0) = P(start);
        var (x1, y1) = P(end);
        b.Path($"M{SvgBuilder.N(x0)} {SvgBuilder.N(y0)}A{SvgBuilder.N(r)} {SvgBuilder.N(r)} 0 1 {(counterClockwise ? 0 : 1)} {SvgBuilder.N(x1)} {SvgBuilder.N(y1)}", "arc " + cls, item);
        double tx = counterClockwise ? -Math.Sin(end) : Math.Sin(end);
        double ty = counterClockwise ? -Math.Cos(end) : Math.Cos(end);
        double h = 5;
        double bx = x1 - (tx * h), by = y1 - (ty * h);
        b.Polygon([(x1 + (tx * 1.5), y1 + (ty * 1.5)), (bx - (ty * h * 0.5), by + (tx * h * 0.5)), (bx + (ty * h * 0.5), by - (tx * h * 0.5))], "head " + cls, item: item);
    }

    /// <summary>A moment vector in the drawing plane as a double-headed arrow from the point.</summary>
    private static void DoubleArrow(SvgBuilder b, double x, double y, double dx, double dy, string cls, string? item = null)
    {
        double len = Math.Sqrt((dx * dx) + (dy * dy));
        if (len < 3)
        {
            return;
        }
        Arrow(b, x, y, x + dx, y + dy, cls, item: item);
        double ux = dx / len, uy = dy / len;
        Arrow(b, x, y, x + dx - (ux * 5), y + dy - (uy * 5), cls, item: item);
    }

    private static void ReferenceMark(SvgBuilder b, SketchFrame f, Vector3 reference)
    {
        (double x, double y) = f.Map(reference);
        b.Circle(x, y, 3.5, "ref");
        b.Line(x - 6, y, x + 6, y, "ref");
        b.Line(x, y - 6, x, y + 6, "ref");
        b.Text(x + 5, y + 11, "P", "reflbl");
    }
}
