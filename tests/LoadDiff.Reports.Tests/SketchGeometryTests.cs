using System.Globalization;
using System.Xml.Linq;
using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Units;
using LoadDiff.Reports.Html;
using LoadDiff.Tests.Support;

namespace LoadDiff.Reports.Tests;

/// <summary>
/// The drawings checked as geometry, within one pixel. Expected pixel positions come from what the drawing shows
/// — the length scale bar (pixels per metre = the bar's pixel length over the length it states), the reference
/// point's mark (where P is drawn) and the view's stated axes (plan: x right, y up; elevation x–z: x right, z up;
/// SVG y grows downwards) — and from the invented loads' own coordinates; arrow lengths from the drawing's stated
/// rule that arrows are to the scale of its reference arrow ("= VALUE N"), the largest item drawn longest.
/// </summary>
public class SketchGeometryTests
{
    private const double Pixel = 1;

    // Invented loads (N, m): three point forces of different magnitudes at known coordinates, P = (1, 1, 0).
    private static readonly Vector3 Reference = Vector3.Create(1, 1, 0);
    private static readonly PointForce[] ThreeForces =
    [
        new("a", Vector3.Create(0, 0, 0), Vector3.Create(0, -30_000, 0)),      // |F| = 30 kN, along −y
        new("b", Vector3.Create(6, 0, 0), Vector3.Create(12_000, 16_000, 0)),  // |F| = 20 kN (3-4-5 triangle)
        new("c", Vector3.Create(3, 4, 2), Vector3.Create(-6_000, 0, 8_000)),   // |F| = 10 kN, partly along z
    ];

    [Fact]
    public void Plan_arrows_end_at_the_loads_mapped_through_the_scale_bar_and_are_as_long_as_the_reference_arrow_says()
    {
        var d = Draw(SketchView.Plan, ThreeForces);
        double k = d.PixelsPerLength("m"), perNewton = d.PixelsPerUnit("N");
        (double px, double py) = d.ReferenceMark();
        foreach (PointForce f in ThreeForces)
        {
            DrawnArrow a = d.Arrows.Single(r => r.Item == f.Id);
            // Tip at the point of application: plan x to the right, y up (SVG y down), P at its mark.
            Assert.Equal(px + (k * (f.At.X - Reference.X)), a.TipX, Pixel);
            Assert.Equal(py - (k * (f.At.Y - Reference.Y)), a.TipY, Pixel);
            // Tail: the in-plane part (Fx, Fy) of the force, to the reference arrow's scale, behind the tip.
            Assert.Equal(a.TipX - (f.Value.X * perNewton), a.X1, Pixel);
            Assert.Equal(a.TipY + (f.Value.Y * perNewton), a.Y1, Pixel);
        }
        AssertLengthsInRatio(d, ThreeForces, SketchView.Plan);
        AssertDirections(d, ThreeForces, SketchView.Plan);
        AssertLabels(d, ThreeForces);
    }

    [Fact]
    public void Elevation_xz_draws_the_x_and_z_parts_and_a_force_along_the_line_of_sight_as_a_dot_towards_the_viewer()
    {
        var d = Draw(SketchView.ElevationXZ, ThreeForces);
        double k = d.PixelsPerLength("m"), perNewton = d.PixelsPerUnit("N");
        (double px, double py) = d.ReferenceMark();
        foreach (PointForce f in ThreeForces.Where(f => f.Id != "a"))
        {
            DrawnArrow a = d.Arrows.Single(r => r.Item == f.Id);
            Assert.Equal(px + (k * (f.At.X - Reference.X)), a.TipX, Pixel);
            Assert.Equal(py - (k * (f.At.Z - Reference.Z)), a.TipY, Pixel);
            Assert.Equal(a.TipX - (f.Value.X * perNewton), a.X1, Pixel);
            Assert.Equal(a.TipY + (f.Value.Z * perNewton), a.Y1, Pixel);
        }
        // "a" is (0, −30 kN, 0): along the line of sight. Seen from −y, −y points at the viewer: a circle with a dot.
        Assert.DoesNotContain(d.Arrows, r => r.Item == "a");
        var symbols = d.ForItem("a").Where(e => e.Name.LocalName == "circle").ToList();
        Assert.Equal(2, symbols.Count);
        Assert.All(symbols, c =>
        {
            Assert.Equal(px + (k * (0 - Reference.X)), SvgDrawing.Num(c, "cx"), Pixel);
            Assert.Equal(py - (k * (0 - Reference.Z)), SvgDrawing.Num(c, "cy"), Pixel);
        });
        Assert.Contains(symbols, c => SvgDrawing.Class(c).StartsWith("head ", StringComparison.Ordinal));
        Assert.DoesNotContain(d.ForItem("a"), e => e.Name.LocalName == "path"); // the cross means "away"
        AssertLengthsInRatio(d, ThreeForces.Where(f => f.Id != "a").ToArray(), SketchView.ElevationXZ, maxForce: 30_000);
        AssertDirections(d, ThreeForces.Where(f => f.Id != "a").ToArray(), SketchView.ElevationXZ);
        AssertLabels(d, ThreeForces);
    }

    [Fact]
    public void A_line_load_is_drawn_as_arrows_onto_the_member_as_long_as_the_intensity_where_they_stand()
    {
        // Invented: 6 m member along x at y = −2, −2 kN/m rising linearly to −5 kN/m (along −y), P = (1, 1, 0).
        var line = new LineLoad("w", Vector3.Create(0, -2, 0), Vector3.Create(6, -2, 0), Vector3.Create(0, -2_000, 0), Vector3.Create(0, -5_000, 0));
        var d = Draw(SketchView.Plan, [line]);
        double k = d.PixelsPerLength("m"), perIntensity = d.PixelsPerUnit("N/m");
        (double px, double py) = d.ReferenceMark();
        var arrows = d.Arrows.Where(r => r.Item == "w").OrderBy(r => r.TipX).ToList();
        Assert.True(arrows.Count >= 2, "at least the two ends are drawn");
        foreach (DrawnArrow a in arrows)
        {
            // Each tip stands on the member (y = −2 m); its intensity is linear in x: w(x) = −2000 − 500·x N/m.
            Assert.Equal(py - (k * (-2 - Reference.Y)), a.TipY, Pixel);
            double x = Reference.X + ((a.TipX - px) / k);
            Assert.InRange(x, 0 - (Pixel / k), 6 + (Pixel / k));
            double w = -2_000 - (500 * x);
            Assert.Equal(a.TipX, a.X1, Pixel);
            Assert.Equal(a.TipY + (w * perIntensity), a.Y1, Pixel);
        }
        // The two ends: 2 kN/m at x = 0 and 5 kN/m at x = 6.
        Assert.Equal(px + (k * (0 - Reference.X)), arrows[0].TipX, Pixel);
        Assert.Equal(px + (k * (6 - Reference.X)), arrows[^1].TipX, Pixel);
        Assert.Equal(2.0 / 5.0, arrows[0].Length / arrows[^1].Length, 0.02);
    }

    [Fact]
    public void Couples_are_drawn_at_the_reference_mark_turning_by_the_right_hand_rule_and_in_ratio()
    {
        // Invented couples (N·m): +z (counter-clockwise seen from +z), and two in the plan's plane, +x and −y.
        FreeCouple[] couples =
        [
            new("mz", Vector3.Create(0, 0, 5_000)),
            new("mx", Vector3.Create(2_000, 0, 0)),
            new("my", Vector3.Create(0, -4_000, 0)),
        ];
        var d = Draw(SketchView.Plan, couples, [Vector3.Create(0, 0, 0), Vector3.Create(4, 3, 0)]);
        (double px, double py) = d.ReferenceMark();
        // The curved arrow: an arc about P whose SVG sweep flag is 0 (counter-clockwise on a y-down screen, SVG 1.1 §8.3.8).
        XElement arc = d.ForItem("mz").Single(e => e.Name.LocalName == "path");
        string[] parts = ((string)arc.Attribute("d")!).Split('A');
        double[] start = parts[0][1..].Split(' ').Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        double[] arcArgs = parts[1].Split(' ').Select(s => double.Parse(s, CultureInfo.InvariantCulture)).ToArray();
        double r = arcArgs[0];
        Assert.Equal(0, arcArgs[4]);
        Assert.Equal(r, Math.Sqrt(((start[0] - px) * (start[0] - px)) + ((start[1] - py) * (start[1] - py))), Pixel);
        Assert.Equal(r, Math.Sqrt(((arcArgs[5] - px) * (arcArgs[5] - px)) + ((arcArgs[6] - py) * (arcArgs[6] - py))), Pixel);
        Assert.DoesNotContain(d.Arrows, a => a.Item == "mz"); // no in-plane part
        // In-plane couples: double-headed arrows from P along the moment vector (+x → right, −y → down on screen).
        DrawnArrow ax = d.Arrows.Where(a => a.Item == "mx").MaxBy(a => a.Length)!;
        DrawnArrow ay = d.Arrows.Where(a => a.Item == "my").MaxBy(a => a.Length)!;
        Assert.Equal(2, d.Arrows.Count(a => a.Item == "mx"));
        Assert.Equal((px, py), (ax.X1, ax.Y1));
        Assert.Equal((px, py), (ay.X1, ay.Y1));
        Assert.Equal(py, ax.TipY, Pixel);
        Assert.True(ax.TipX > px);
        Assert.Equal(px, ay.TipX, Pixel);
        Assert.True(ay.TipY > py);
        // Lengths in the ratio of the moments, 4000 : 2000, the largest (5000 about z) not drawn in this plane.
        Assert.Equal(2.0, ay.Length / ax.Length, 0.02);
    }

    [Fact]
    public void A_force_in_the_drawing_plane_too_small_for_an_arrow_is_not_drawn_as_pointing_away_from_the_viewer()
    {
        // Invented: 30 kN and 0.2 kN, both along +x. To the drawing's scale the small one is under a pixel long; a circle
        // with a cross would say it points into the plan (−z), which it does not. Its position is still marked.
        PointForce[] forces =
        [
            new("large", Vector3.Create(0, 0, 0), Vector3.Create(30_000, 0, 0)),
            new("small", Vector3.Create(4, 3, 0), Vector3.Create(200, 0, 0)),
        ];
        var d = Draw(SketchView.Plan, forces);
        Assert.True(200 * d.PixelsPerUnit("N") < 1, "the small force is under a pixel to the drawing's scale");
        var drawn = d.ForItem("small").ToList();
        Assert.DoesNotContain(drawn, e => e.Name.LocalName == "path");
        Assert.DoesNotContain(drawn, e => SvgDrawing.Class(e).StartsWith("sym ", StringComparison.Ordinal));
        double k = d.PixelsPerLength("m");
        (double px, double py) = d.ReferenceMark();
        XElement mark = drawn.Single(e => e.Name.LocalName == "circle");
        Assert.Equal(px + (k * (4 - Reference.X)), SvgDrawing.Num(mark, "cx"), Pixel);
        Assert.Equal(py - (k * (3 - Reference.Y)), SvgDrawing.Num(mark, "cy"), Pixel);
        AssertLabels(d, forces);
    }

    [Fact]
    public void A_line_load_in_the_drawing_plane_too_small_for_arrows_is_not_drawn_as_pointing_away_from_the_viewer()
    {
        // Invented: 10 kN/m and 0.1 kN/m, both along −y, on members along x; the small one is under a pixel to scale.
        LineLoad[] lines =
        [
            new("heavy", Vector3.Create(0, 0, 0), Vector3.Create(6, 0, 0), Vector3.Create(0, -10_000, 0), Vector3.Create(0, -10_000, 0)),
            new("light", Vector3.Create(0, 3, 0), Vector3.Create(6, 3, 0), Vector3.Create(0, -100, 0), Vector3.Create(0, -100, 0)),
        ];
        var d = Draw(SketchView.Plan, lines);
        Assert.True(100 * d.PixelsPerUnit("N/m") < 1, "the light load is under a pixel to the drawing's scale");
        var drawn = d.ForItem("light").ToList();
        Assert.DoesNotContain(drawn, e => e.Name.LocalName == "path");
        Assert.DoesNotContain(drawn, e => SvgDrawing.Class(e).StartsWith("sym ", StringComparison.Ordinal));
        Assert.Contains(drawn, e => SvgDrawing.Class(e).StartsWith("member ", StringComparison.Ordinal));
    }

    private static SvgDrawing Draw(SketchView view, IReadOnlyList<LoadItem> items, IEnumerable<Vector3>? extra = null)
    {
        var s = new SystemSketch();
        var points = new List<Vector3> { Reference };
        foreach (LoadItem item in items)
        {
            s.Add(item);
            item.VisitGeometry(points.Add);
        }
        points.AddRange(extra ?? []);
        SketchFrame frame = SketchFrame.Fit(view, points);
        string svg = SvgSketch.System(frame, s, "orig", new SketchScales(s, 0), Reference, "test", UnitSystem.Si);
        return SvgDrawing.Parse(svg);
    }

    /// <summary>Each arrow's length over the largest force's is the ratio of their in-plane parts to |F_max|.</summary>
    private static void AssertLengthsInRatio(SvgDrawing d, PointForce[] forces, SketchView view, double? maxForce = null)
    {
        double fMax = maxForce ?? forces.Max(f => f.Value.Length);
        double perNewton = d.PixelsPerUnit("N");
        double longest = fMax * perNewton;
        foreach (PointForce f in forces)
        {
            double inPlane = InPlane(f.Value, view);
            Assert.Equal(inPlane / fMax, d.Arrows.Single(r => r.Item == f.Id).Length / longest, 0.02);
        }
    }

    /// <summary>The arrow points the way the force's in-plane part does (screen y down).</summary>
    private static void AssertDirections(SvgDrawing d, PointForce[] forces, SketchView view)
    {
        foreach (PointForce f in forces)
        {
            DrawnArrow a = d.Arrows.Single(r => r.Item == f.Id);
            (double u, double v) = view == SketchView.Plan ? (f.Value.X, f.Value.Y) : (f.Value.X, f.Value.Z);
            double ex = u / Math.Sqrt((u * u) + (v * v)), ey = -v / Math.Sqrt((u * u) + (v * v));
            double dx = (a.TipX - a.X1) / a.Length, dy = (a.TipY - a.Y1) / a.Length;
            Assert.True((ex * dx) + (ey * dy) > 0.999, $"{f.Id}: drawn ({dx}, {dy}), force ({ex}, {ey})");
        }
    }

    /// <summary>Each label states |F| in newtons (to the six significant digits the report prints).</summary>
    private static void AssertLabels(SvgDrawing d, PointForce[] forces)
    {
        foreach (PointForce f in forces)
        {
            string text = d.ForItem(f.Id).Single(e => e.Name.LocalName == "text").Value;
            Assert.EndsWith(" N", text, StringComparison.Ordinal);
            Assert.Equal(f.Value.Length, double.Parse(text[..^2], CultureInfo.InvariantCulture), 1e-5 * f.Value.Length);
        }
    }

    private static double InPlane(Vector3 v, SketchView view) => view == SketchView.Plan
        ? Math.Sqrt((v.X * v.X) + (v.Y * v.Y))
        : Math.Sqrt((v.X * v.X) + (v.Z * v.Z));
}
