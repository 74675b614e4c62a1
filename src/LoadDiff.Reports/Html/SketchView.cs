using LoadDiff.Core;

namespace LoadDiff.Reports.Html;

/// <summary>The three orthographic views a load system is drawn in.</summary>
public enum SketchView
{
    /// <summary>Plan: x to the right, y up, seen from above (+z towards the viewer).</summary>
    Plan,

    /// <summary>Elevation x–z: x to the right, z up, seen from −y.</summary>
    ElevationXZ,

    /// <summary>Elevation y–z: y to the right, z up, seen from +x.</summary>
    ElevationYZ,
}

/// <summary>Projection of global coordinates onto a view's drawing axes.</summary>
internal static class ViewAxes
{
    public static readonly SketchView[] All = [SketchView.Plan, SketchView.ElevationXZ, SketchView.ElevationYZ];

    /// <summary>The global directions drawn to the right (U) and up (V).</summary>
    public static (Vector3 U, Vector3 V) Of(SketchView view) => view switch
    {
        SketchView.Plan => (Vector3.UnitX, Vector3.UnitY),
        SketchView.ElevationXZ => (Vector3.UnitX, Vector3.UnitZ),
        _ => (Vector3.UnitY, Vector3.UnitZ),
    };

    /// <summary>The unit vector pointing out of the drawing towards the viewer (U × V).</summary>
    public static Vector3 TowardViewer(SketchView view)
    {
        (Vector3 u, Vector3 v) = Of(view);
        return Vector3.Cross(u, v);
    }

    /// <summary>Axis letters, right then up.</summary>
    public static (string U, string V) Names(SketchView view) => view switch
    {
        SketchView.Plan => ("x", "y"),
        SketchView.ElevationXZ => ("x", "z"),
        _ => ("y", "z"),
    };

    public static string Title(SketchView view) => view switch
    {
        SketchView.Plan => "Plan x–y (seen from +z)",
        SketchView.ElevationXZ => "Elevation x–z (seen from −y)",
        _ => "Elevation y–z (seen from +x)",
    };

    public static (double U, double V) Project(SketchView view, Vector3 p)
    {
        (Vector3 u, Vector3 v) = Of(view);
        return (Vector3.Dot(p, u), Vector3.Dot(p, v));
    }
}
