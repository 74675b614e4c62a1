using System.Globalization;
using LoadDiff.Core;

namespace LoadDiff.Reports;

/// <summary>Invariant number formatting: exact (shortest round-trip) for machines, rounded for people.</summary>
public static class NumberText
{
    /// <summary>Significant digits in text and Markdown output.</summary>
    public const int ReadableDigits = 6;

    /// <summary>Shortest text that round-trips the double exactly.</summary>
    public static string Exact(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>
    /// Six significant digits; a value within <paramref name="noise"/> of zero (rounding noise of the
    /// reduction, not an engineering tolerance) prints as 0.
    /// </summary>
    public static string Readable(double value, double noise = 0)
    {
        if (Math.Abs(value) <= noise || value == 0)
        {
            return "0";
        }
        string s = value.ToString("G" + ReadableDigits.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture);
        return s.Contains('E', StringComparison.Ordinal) ? s.Replace("E+", "e", StringComparison.Ordinal).Replace("E-", "e-", StringComparison.Ordinal) : s;
    }

    /// <summary>A vector as <c>(x, y, z)</c> with readable components.</summary>
    public static string Readable(Vector3 v, double noise = 0) =>
        "(" + Readable(v.X, noise) + ", " + Readable(v.Y, noise) + ", " + Readable(v.Z, noise) + ")";
}
