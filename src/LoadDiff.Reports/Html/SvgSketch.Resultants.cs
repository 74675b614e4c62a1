using LoadDiff.Core;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Html;

/// <summary>A force-couple system to draw at the reference point.</summary>
/// <param name="Force">Resultant force.</param>
/// <param name="Moment">Resultant moment about the reference point.</param>
/// <param name="Class">Style class: orig, subs or resid.</param>
/// <param name="Label">Short label drawn beside it.</param>
internal sealed record ResultantArrow(Vector3 Force, Vector3 Moment, string Class, string Label);

/// <content>Resultants and the residual at the reference point.</content>
internal static partial class SvgSketch
{
    /// <summary>
    /// The systems' resultants and the residual drawn at the reference point on one force scale and one moment scale,
    /// over the outline of the geometry's box, with the residual's central axis (where the missing force acts).
    /// </summary>
    public static string Resultants(
        SketchFrame f, IReadOnlyList<ResultantArrow> items, Box? box, (Vector3 Point, Vector3 Direction)? axis,
        Vector3 reference, string title, UnitSystem units)
    {
        var b = new SvgBuilder();
        Begin(b, f, title);
        if (box is not null)
        {
            var corners = box.Corners.Select(f.Map).ToList();
            double x0 = corners.Min(c => c.X), x1 = corners.Max(c => c.X), y0 = corners.Min(c => c.Y), y1 = corners.Max(c => c.Y);
            b.Rect(x0, y0, Math.Max(x1 - x0, 0.5), Math.Max(y1 - y0, 0.5), "box");
        }
        if (axis is { } ax)
        {
            AxisLine(b, f, ax.Point, ax.Direction);
        }
        double maxF = items.Max(i => i.Force.Length), maxM = items.Max(i => i.Moment.Length);
        double fs = maxF > 0 ? 1.6 * SketchFrame.ArrowMax / maxF : 0;
        double ms = maxM > 0 ? 1.6 * SketchFrame.ArrowMax / maxM : 0;
        (double px, double py) = f.Map(reference);
        for (int i = 0; i < items.Count; i++)
        {
            ResultantArrow r = items[i];
            if (r.Force.Length > 0 && fs > 0)
            {
                (double sx, double sy) = f.Screen(r.Force);
                double inPlane = Math.Sqrt((sx * sx) + (sy * sy));
                if (inPlane >= 0.25 * r.Force.Length)
                {
                    Arrow(b, px - (sx * fs), py - (sy * fs), px, py, "res " + r.Class, 8);
                    b.Text(px - (sx * fs) + 4, py - (sy * fs) - 4 + (11 * i), r.Label, "lbl " + r.Class);
                }
                else
                {
                    OutOfPlane(b, px, py, 4 + (8 * r.Force.Length / maxF), f.Toward(r.Force) > 0, "res " + r.Class);
                    b.Text(px + 16, py - 14 + (11 * i), r.Label, "lbl " + r.Class);
                }
            }
            if (r.Moment.Length > 0 && ms > 0)
            {
                double toward = f.Toward(r.Moment);
                if (Math.Abs(toward) > 1e-12 * maxM)
                {
                    CurvedArrow(b, px, py, 14 + (6 * i), toward > 0, "res " + r.Class);
                }
                (double mx, double my) = f.Screen(r.Moment * ms);
                DoubleArrow(b, px, py, mx, my, "res " + r.Class);
            }
        }
        ReferenceMark(b, f, reference);
        var bars = new List<(double Px, string Label, bool Double)>();
        if (maxF > 0)
        {
            double n = SketchScales.Nice(maxF);
            bars.Add((n * fs, $"{SketchScales.NiceText(n)} {units.Force.Symbol}", false));
        }
        if (maxM > 0)
        {
            double n = SketchScales.Nice(maxM);
            bars.Add((n * ms, $"{SketchScales.NiceText(n)} {units.MomentSymbol}", true));
        }
        Furniture(b, f, units, bars);
        b.Close("svg");
        return b.ToString();
    }

    /// <summary>The residual's central axis clipped to the plot area (Liang–Barsky).</summary>
    private static void AxisLine(SvgBuilder b, SketchFrame f, Vector3 point, Vector3 direction)
    {
        (double x, double y) = f.Map(point);
        (double dx, double dy) = f.Screen(direction);
        if (Math.Sqrt((dx * dx) + (dy * dy)) < 1e-6)
        {
            b.Circle(x, y, 3, "axisline");
            return;
        }
        double t0 = double.NegativeInfinity, t1 = double.PositiveInfinity;
        bool Clip(double p, double q)
        {
            if (p == 0)
            {
                return q >= 0;
            }
            double r = q / p;
            if (p < 0)
            {
                t0 = Math.Max(t0, r);
            }
            else
            {
                t1 = Math.Min(t1, r);
            }
            return true;
        }
        if (Clip(-dx, x - SketchFrame.PlotLeft) && Clip(dx, SketchFrame.PlotRight - x)
            && Clip(-dy, y - SketchFrame.PlotTop) && Clip(dy, SketchFrame.PlotBottom - y) && t0 < t1)
        {
            b.Line(x + (dx * t0), y + (dy * t0), x + (dx * t1), y + (dy * t1), "axisline");
        }
    }
}
