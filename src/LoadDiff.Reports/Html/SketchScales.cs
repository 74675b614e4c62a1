using System.Globalization;

namespace LoadDiff.Reports.Html;

/// <summary>
/// The drawing scales of one case, shared by its views and by both systems so that they compare by eye: pixels per
/// force unit for point forces, per intensity for line loads, per pressure for areas and meshes, per moment for
/// couples, and the pressure shading bands.
/// </summary>
internal sealed class SketchScales
{
    public SketchScales(IEnumerable<SystemSketch> sketches)
    {
        double f = 0, w = 0, p = 0, c = 0;
        foreach (SystemSketch s in sketches)
        {
            f = Math.Max(f, s.MaxForce);
            w = Math.Max(w, s.MaxLineIntensity);
            p = Math.Max(p, s.MaxPressure);
            c = Math.Max(c, s.MaxCouple);
        }
        MaxForce = f;
        MaxLine = w;
        MaxCouple = c;
        Force = f > 0 ? SketchFrame.ArrowMax / f : 0;
        Line = w > 0 ? SketchFrame.ArrowMax / w : 0;
        Pressure = p > 0 ? SketchFrame.ArrowMax / p : 0;
        Bands = new PressureBands(p);
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
