namespace LoadDiff.Core.Tests.Support;

/// <summary>Tolerance assertions with messages that show both values.</summary>
public static class Close
{
    /// <summary>|actual − expected| ≤ relative·|expected| (or ≤ relative when expected is zero).</summary>
    public static void Relative(double expected, double actual, double relative)
    {
        double allowed = relative * Math.Max(Math.Abs(expected), expected == 0 ? 1 : 0);
        Assert.True(Math.Abs(actual - expected) <= allowed,
            $"expected {expected:R}, actual {actual:R}, difference {actual - expected:R}, allowed {allowed:R}");
    }

    /// <summary>|actual − expected| ≤ allowed.</summary>
    public static void Absolute(double expected, double actual, double allowed)
    {
        Assert.True(Math.Abs(actual - expected) <= allowed,
            $"expected {expected:R}, actual {actual:R}, difference {actual - expected:R}, allowed {allowed:R}");
    }

    /// <summary>|actual − expected| ≤ relative·|expected| for vectors (or ≤ relative when expected is zero).</summary>
    public static void Relative(Vector3 expected, Vector3 actual, double relative)
    {
        double scale = expected.Length;
        Absolute(expected, actual, relative * (scale == 0 ? 1 : scale));
    }

    /// <summary>|actual − expected| ≤ allowed for vectors.</summary>
    public static void Absolute(Vector3 expected, Vector3 actual, double allowed)
    {
        double d = (actual - expected).Length;
        Assert.True(d <= allowed, $"expected {expected}, actual {actual}, |difference| {d:R}, allowed {allowed:R}");
    }
}
