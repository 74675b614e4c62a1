using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Html;

/// <content>The load items of one system.</content>
internal static partial class SvgSketch
{
    /// <summary>Mesh triangles one by one while few, otherwise binned cells shaded by mean pressure (∫p dA / A).</summary>
    private static void Mesh(SvgBuilder b, SketchFrame f, SystemSketch s, SketchScales sc)
    {
        if (s.TriangleCount == 0)
        {
            return;
        }
        if (s.Triangles is { } triangles)
        {
            foreach (MeshTriangle t in triangles)
            {
                double mean = (t.PressureA + t.PressureB + t.PressureC) / 3;
                b.Polygon([f.Map(t.A), f.Map(t.B), f.Map(t.C)], "tri", sc.Bands.Colour(mean));
            }
            return;
        }
        foreach ((double u, double v, double size, double p) in Merge(s.MeshCells(f.View)!, f, MinCellPixels))
        {
            (double x, double y) = f.MapUV(u, v + size);
            b.Rect(x, y, size * f.K, size * f.K, "cell", sc.Bands.Colour(p));
        }
    }

    /// <summary>Merges grid cells into blocks at least <paramref name="minPixels"/> wide; yields corner, side and mean value.</summary>
    private static List<(double U, double V, double Size, double Mean)> Merge(CellGrid grid, SketchFrame f, double minPixels)
    {
        var cells = grid.Cells().ToList();
        var merged = new List<(double, double, double, double)>();
        if (cells.Count == 0)
        {
            return merged;
        }
        double h = cells[0].Size;
        int factor = Math.Max(1, (int)Math.Ceiling(minPixels / (h * f.K)));
        double u0 = cells.Min(c => c.U), v0 = cells.Min(c => c.V);
        var blocks = new SortedDictionary<(int J, int I), (double W, double WP, long N)>();
        foreach (GridCell c in cells)
        {
            int i = (int)Math.Round((c.U - u0) / h) / factor, j = (int)Math.Round((c.V - v0) / h) / factor;
            blocks.TryGetValue((j, i), out var acc);
            blocks[(j, i)] = (acc.W + c.Weight, acc.WP + c.WeightedValue, acc.N + c.Count);
        }
        foreach (var kv in blocks)
        {
            double mean = kv.Value.W > 0 ? kv.Value.WP / kv.Value.W : 0;
            merged.Add((u0 + (kv.Key.I * factor * h), v0 + (kv.Key.J * factor * h), factor * h, mean));
        }
        return merged;
    }

    /// <summary>Areas: the polygon clipped into pressure bands, its outline, and pressure arrows along its edges where the view shows the force direction.</summary>
    private static void Areas(SvgBuilder b, SketchFrame f, SystemSketch s, string cls, SketchScales sc)
    {
        IReadOnlyList<AreaLoad> areas = s.Areas;
        int perEdge = areas.Count <= 4 ? 4 : 1;
        foreach (AreaLoad a in areas)
        {
            var poly = a.Polygon.Select(v => (X: v, P: a.PressureAt(v))).ToList();
            double lo = poly.Min(v => v.P), hi = poly.Max(v => v.P);
            int bl = sc.Bands.Band(lo), bh = sc.Bands.Band(hi);
            for (int band = bl; band <= bh; band++)
            {
                if (band == 0)
                {
                    continue;
                }
                (double from, double to) = BandRange(sc.Bands, band);
                List<(Vector3 X, double P)> piece = ClipAbove(ClipBelow(poly, to), from);
                if (piece.Count >= 3)
                {
                    b.Polygon(piece.Select(v => f.Map(v.X)), "band", PressureBands.BandColour(band));
                }
            }
            b.Polygon(a.Polygon.Select(f.Map), "outline " + cls);
            Vector3 u = a.ForceUnit;
            (double sx, double sy) = f.Screen(u);
            if (Math.Sqrt((sx * sx) + (sy * sy)) < 0.3 || sc.Pressure <= 0)
            {
                continue;
            }
            var tails = new List<(double X, double Y)>();
            for (int i = 0; i < a.Polygon.Length; i++)
            {
                Vector3 p0 = a.Polygon[i], p1 = a.Polygon[(i + 1) % a.Polygon.Length];
                for (int k = 0; k < perEdge; k++)
                {
                    Vector3 x = p0 + ((p1 - p0) * ((double)k / perEdge));
                    double p = a.PressureAt(x);
                    (double tx, double ty) = f.Map(x);
                    double l = p * sc.Pressure;
                    tails.Add((tx - (sx * l), ty - (sy * l)));
                    if (Math.Abs(l) >= 1)
                    {
                        Arrow(b, tx - (sx * l), ty - (sy * l), tx, ty, "thin " + cls, 4);
                    }
                }
            }
            tails.Add(tails[0]);
            b.Polyline(tails, "diagline " + cls);
        }
    }

    private static (double From, double To) BandRange(PressureBands bands, int band)
    {
        double step = bands.Max / PressureBands.Steps;
        return band > 0 ? ((band - 1) * step, band * step) : (band * step, (band + 1) * step);
    }

    /// <summary>Sutherland–Hodgman clip of a polygon with a linear field to the part where the field is at most <paramref name="limit"/>.</summary>
    private static List<(Vector3 X, double P)> ClipBelow(List<(Vector3 X, double P)> poly, double limit) =>
        Clip(poly, limit, below: true);

    private static List<(Vector3 X, double P)> ClipAbove(List<(Vector3 X, double P)> poly, double limit) =>
        Clip(poly, limit, below: false);

    private static List<(Vector3 X, double P)> Clip(List<(Vector3 X, double P)> poly, double limit, bool below)
    {
        var output = new List<(Vector3 X, double P)>();
        bool In((Vector3 X, double P) v) => below ? v.P <= limit : v.P >= limit;
        for (int i = 0; i < poly.Count; i++)
        {
            var a = poly[i];
            var c = poly[(i + 1) % poly.Count];
            bool ai = In(a), ci = In(c);
            if (ai != ci)
            {
                double t = (limit - a.P) / (c.P - a.P);
                output.Add((a.X + ((c.X - a.X) * t), limit));
            }
            if (ci)
            {
                output.Add(c);
            }
        }
        return output;
    }

    /// <summary>Line loads: the member, the intensity diagram on the side the load comes from, and arrows onto the member.</summary>
    private static void Lines(SvgBuilder b, SketchFrame f, SystemSketch s, string cls, SketchScales sc)
    {
        IReadOnlyList<LineLoad> lines = s.Lines;
        int stations = lines.Count <= 10 ? 5 : 2;
        foreach (LineLoad l in lines)
        {
            (double ax, double ay) = f.Map(l.From);
            (double bx, double by) = f.Map(l.To);
            (double s1x, double s1y) = f.Screen(l.StartIntensity * sc.Line);
            (double s2x, double s2y) = f.Screen(l.EndIntensity * sc.Line);
            double full = Math.Max(l.StartIntensity.Length, l.EndIntensity.Length) * sc.Line;
            double shown = Math.Max(Math.Sqrt((s1x * s1x) + (s1y * s1y)), Math.Sqrt((s2x * s2x) + (s2y * s2y)));
            b.Line(ax, ay, bx, by, "member " + cls, l.Id);
            if (shown >= 0.25 * full && shown >= 1)
            {
                b.Polygon([(ax, ay), (bx, by), (bx - s2x, by - s2y), (ax - s1x, ay - s1y)], "diag " + cls, item: l.Id);
                for (int k = 0; k < stations; k++)
                {
                    double t = stations == 1 ? 0.5 : (double)k / (stations - 1);
                    double x = ax + ((bx - ax) * t), y = ay + ((by - ay) * t);
                    double wx = s1x + ((s2x - s1x) * t), wy = s1y + ((s2y - s1y) * t);
                    Arrow(b, x - wx, y - wy, x, y, "thin " + cls, 4, l.Id);
                }
            }
            else if (shown < 0.25 * full)
            {
                // Mostly along the line of sight. (In the plane but under a pixel to scale, the member alone is drawn:
                // the out-of-plane symbol would give it a false sense.)
                for (int k = 0; k < 3; k++)
                {
                    double t = (k + 0.5) / 3;
                    Vector3 w = l.StartIntensity + ((l.EndIntensity - l.StartIntensity) * t);
                    if (w.Length > 0)
                    {
                        OutOfPlane(b, ax + ((bx - ax) * t), ay + ((by - ay) * t), 2 + (3 * w.Length / sc.MaxLine), f.Toward(w) > 0, cls, l.Id);
                    }
                }
            }
        }
    }

    /// <summary>Where more point forces exist than are drawn: a dot per occupied cell shows where they are.</summary>
    private static void ForceDots(SvgBuilder b, SketchFrame f, SystemSketch s, string cls)
    {
        if (s.ForceCount <= s.Forces.Count || s.ForceCells(f.View) is not { } grid)
        {
            return;
        }
        foreach ((double u, double v, double size, _) in Merge(grid, f, DotCellPixels))
        {
            (double x, double y) = f.MapUV(u + (size / 2), v + (size / 2));
            b.Circle(x, y, 1.2, "dot " + cls);
        }
    }

    private static void Forces(SvgBuilder b, SketchFrame f, SystemSketch s, string cls, SketchScales sc, UnitSystem units)
    {
        IReadOnlyList<SketchForce> forces = s.Forces;
        foreach (SketchForce force in forces)
        {
            ForceAt(b, f, force.At, force.Value, sc.Force, force.Value.Length / sc.MaxForce, cls, force.Id);
        }
        if (forces.Count <= 6)
        {
            foreach (SketchForce force in forces)
            {
                (double x, double y) = f.Map(force.At);
                b.Text(x + 6, y - 4, $"{NumberText.Readable(force.Value.Length)} {units.Force.Symbol}", "lbl " + cls, item: force.Id);
            }
        }
    }

    /// <summary>Free couples act alike about every point; they are drawn at the reference point.</summary>
    private static void Couples(SvgBuilder b, SketchFrame f, SystemSketch s, Vector3 reference, string cls, SketchScales sc)
    {
        (double x, double y) = f.Map(reference);
        int i = 0;
        foreach (FreeCouple c in s.Couples.Take(3))
        {
            double toward = f.Toward(c.Value);
            if (Math.Abs(toward) > 1e-9 * sc.MaxCouple)
            {
                CurvedArrow(b, x, y, 10 + (4 * i), toward > 0, cls, c.Id);
            }
            (double mx, double my) = f.Screen(c.Value * (SketchFrame.ArrowMax / sc.MaxCouple));
            DoubleArrow(b, x, y, mx, my, cls, c.Id);
            i++;
        }
    }
}
