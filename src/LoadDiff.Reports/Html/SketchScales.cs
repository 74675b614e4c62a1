using System.Globalization;

namespace LoadDiff.Reports.Html;

/// <summary>
/// The drawing scales of one system in one case, shared by its three views: pixels per force unit for point forces,
/// per intensity for line loads, per pressure for areas and meshes, per moment for couples (each system's largest
/// item fills the longest arrow, so a lumped substitute does not shrink the detailed loads to nothing), and the
/// pressure shading bands, which both systems of a case share.
/// </summary>
internal sealed class SketchScales
{
    public SketchScales(SystemSketch sketch, double bandMax)
    {
        double f = sketch.MaxForce, w = sketch.MaxLineIntensity, p = sketch.MaxPressure, c = sketch.MaxCouple;
        MaxForce = f;
        MaxLine = w;
        MaxCouple = c;
        Force = f > 0 ? SketchFrame.ArrowMax / f : 0;
        Line = w > 0 ? SketchFrame.ArrowMax / w : 0;
        Pressure = p > 0 ? SketchFrame.ArrowMax / p : 0;
        Bands = new PressureBands(Math.Max(bandMax, p));
    }

    public double MaxForce { get; }

    public double MaxLine { get; }

    public double MaxCouple { get; }

    /// <summary>Pixels per force unit.</summary>
    public double Force { get; }

    /// <summary>Pixels per force/length.</summary>
    public double Line { get; }

    /// <summary>Pixels per force/area.</summary>
    public double Pressure { get; }

    public PressureBands Bands { get; }

    /// <summary>A round number near <paramref name="target"/> (1, 2 or 5 times a power of ten), for scale bars.</summary>
    public static double Nice(double target)
    {
        if (target <= 0 || double.IsInfinity(target))
        {
            return 0;
        }
        double e = Math.Pow(10, Math.Floor(Math.Log10(target)));
        double m = target / e;
        return (m < 1.5 ? 1 : m < 3.5 ? 2 : m < 7.5 ? 5 : 10) * e;
    }

    public static string NiceText(double v) => v.ToString("G6", CultureInfo.InvariantCulture).Replace("E+", "e", StringComparison.Ordinal).Replace("E-", "e-", StringComparison.Ordinal);
}
