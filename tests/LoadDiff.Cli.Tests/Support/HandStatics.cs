using System.Globalization;
using System.Text.Json;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>
/// A vector of <see cref="decimal"/> for expected values worked out by hand in a test: the fixtures' short decimals
/// are exact in it, so sums and cross products carry no rounding at all (division and square root round at the 28th digit).
/// </summary>
public readonly record struct Dec3(decimal X, decimal Y, decimal Z)
{
    public static Dec3 Zero => new(0, 0, 0);

    public static Dec3 operator +(Dec3 a, Dec3 b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    public static Dec3 operator -(Dec3 a, Dec3 b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    public static Dec3 operator -(Dec3 a) => new(-a.X, -a.Y, -a.Z);

    public static Dec3 operator *(decimal k, Dec3 a) => new(k * a.X, k * a.Y, k * a.Z);

    public static Dec3 operator /(Dec3 a, decimal k) => new(a.X / k, a.Y / k, a.Z / k);

    /// <summary>a × b, the right-hand rule.</summary>
    public static Dec3 Cross(Dec3 a, Dec3 b) => new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    public decimal Norm => HandStatics.Sqrt((X * X) + (Y * Y) + (Z * Z));

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"({X}, {Y}, {Z})");
}

/// <summary>Hand statics for expected values: resultants of forces and their moments about a point, and comparisons.</summary>
public static class HandStatics
{
    /// <summary>√x by Newton's iteration from the double's root (each step doubles the correct digits).</summary>
    public static decimal Sqrt(decimal x)
    {
        Assert.True(x >= 0, "square root of a negative number");
        if (x == 0)
        {
            return 0;
        }
        decimal g = (decimal)Math.Sqrt((double)x);
        for (int i = 0; i < 4; i++)
        {
            g = (g + (x / g)) / 2;
        }
        return g;
    }

    /// <summary>R = Σ F_i.</summary>
    public static Dec3 Resultant(IEnumerable<(Dec3 At, Dec3 Force)> forces) =>
        forces.Aggregate(Dec3.Zero, (sum, f) => sum + f.Force);

    /// <summary>M_P = Σ (r_i − P) × F_i.</summary>
    public static Dec3 MomentAbout(Dec3 point, IEnumerable<(Dec3 At, Dec3 Force)> forces) =>
        forces.Aggregate(Dec3.Zero, (sum, f) => sum + Dec3.Cross(f.At - point, f.Force));

    /// <summary>A JSON number as a decimal, through its shortest round-trip text (exact for the double it names).</summary>
    public static decimal Dec(JsonElement number) =>
        decimal.Parse(number.GetDouble().ToString("R", CultureInfo.InvariantCulture), NumberStyles.Float, CultureInfo.InvariantCulture);

    public static Dec3 Dec3Of(JsonElement array) => new(Dec(array[0]), Dec(array[1]), Dec(array[2]));

    /// <summary>Asserts |actual − expected| ≤ tolerance, naming the quantity.</summary>
    public static void Close(decimal expected, decimal actual, decimal tolerance, string what) =>
        Assert.True(Math.Abs(actual - expected) <= tolerance,
            string.Create(CultureInfo.InvariantCulture, $"{what}: expected {expected} ± {tolerance}, got {actual}"));

    public static void Close(decimal expected, JsonElement actual, decimal tolerance, string what) =>
        Close(expected, Dec(actual), tolerance, what);

    /// <summary>Asserts each component of a JSON vector within the tolerance of the hand vector.</summary>
    public static void Close(Dec3 expected, JsonElement actual, decimal tolerance, string what)
    {
        Assert.Equal(3, actual.GetArrayLength());
        Dec3 a = Dec3Of(actual);
        Assert.True(Math.Abs(a.X - expected.X) <= tolerance && Math.Abs(a.Y - expected.Y) <= tolerance && Math.Abs(a.Z - expected.Z) <= tolerance,
            string.Create(CultureInfo.InvariantCulture, $"{what}: expected {expected} ± {tolerance} per component, got {a}"));
    }
}
