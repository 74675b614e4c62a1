using LoadDiff.Core;

namespace LoadDiff.Reports.Html;

/// <summary>
/// Maps one view's coordinates to SVG pixels with the same scale along both axes, fitted so that the geometry
/// leaves room around it for arrows.
/// </summary>
internal sealed class SketchFrame
{
    public const double Width = 400;
    public const double Height = 300;
    public const double PlotLeft = 6, PlotRight = 394, PlotTop = 20, PlotBottom = 256;

    /// <summary>Longest arrow drawn for the largest item, in pixels.</summary>
    public const double ArrowMax = 50;

    private const double Pad = 54;
    private readonly double _uc, _vc, _cx, _cy;

    private SketchFrame(SketchView view, double k, double uc, double vc)
    {
        View = view;
        K = k;
        _uc = uc;
        _vc = vc;
        _cx = (PlotLeft + PlotRight) / 2;
        _cy = (PlotTop + PlotBottom) / 2;
    }

    public SketchView View { get; }

    /// <summary>Pixels per length unit.</summary>
    public double K { get; }

    /// <summary>A frame holding every given point.</summary>
    public static SketchFrame Fit(SketchView view, IEnumerable<Vector3> points)
    {
        double umin = double.PositiveInfinity, umax = double.NegativeInfinity, vmin = double.PositiveInfinity, vmax = double.NegativeInfinity;
        foreach (Vector3 p in points)
        {
            (double u, double v) = ViewAxes.Project(view, p);
            umin = Math.Min(umin, u);
            umax = Math.Max(umax, u);
            vmin = Math.Min(vmin, v);
            vmax = Math.Max(vmax, v);
        }
        if (double.IsInfinity(umin))
        {
            umin = umax = vmin = vmax = 0;
        }
        double du = umax - umin, dv = vmax - vmin;
        double extent = Math.Max(du, dv);
        if (extent == 0)
        {
            extent = Math.Max(1, Math.Max(Math.Abs(umin), Math.Abs(vmin)) * 1e-3);
        }
        double w = PlotRight - PlotLeft - (2 * Pad), h = PlotBottom - PlotTop - (2 * Pad);
        double k = Math.Min(w / Math.Max(du, extent * 1e-6), h / Math.Max(dv, extent * 1e-6));
        return new SketchFrame(view, k, (umin + umax) / 2, (vmin + vmax) / 2);
    }

    public (double X, double Y) Map(Vector3 p)
    {
        (double u, double v) = ViewAxes.Project(View, p);
        return MapUV(u, v);
    }

    public (double X, double Y) MapUV(double u, double v) => (_cx + (K * (u - _uc)), _cy - (K * (v - _vc)));

    /// <summary>The in-plane part of a direction in screen axes (x right, y down), not scaled.</summary>
    public (double X, double Y) Screen(Vector3 d)
    {
        (double u, double v) = ViewAxes.Project(View, d);
        return (u, -v);
    }

    /// <summary>The component of a vector towards the viewer.</summary>
    public double Toward(Vector3 d) => Vector3.Dot(d, ViewAxes.TowardViewer(View));
}
