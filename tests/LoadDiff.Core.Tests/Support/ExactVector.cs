namespace LoadDiff.Core.Tests.Support;

/// <summary>
/// A vector of exact dyadic rationals, for reference values of resultants and moments (SPEC §2: R = Σ F_i,
/// M_P = Σ C_j + Σ (r_i − P) × F_i) computed in the test without a single rounding.
/// </summary>
public readonly record struct ExactVector(ExactRational X, ExactRational Y, ExactRational Z)
{
    public static ExactVector Zero => default;

    public static ExactVector From(Vector3 v) =>
        new(ExactRational.FromDouble(v.X), ExactRational.FromDouble(v.Y), ExactRational.FromDouble(v.Z));

    public static ExactVector operator +(ExactVector a, ExactVector b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);

    public static ExactVector operator -(ExactVector a, ExactVector b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);

    public static ExactVector operator *(ExactVector a, ExactRational s) => new(a.X * s, a.Y * s, a.Z * s);

    public static ExactVector Cross(ExactVector a, ExactVector b) =>
        new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));

    public static ExactRational Dot(ExactVector a, ExactVector b) => (a.X * b.X) + (a.Y * b.Y) + (a.Z * b.Z);

    /// <summary>|v|², exact (the norm itself is irrational in general, so comparisons are made on squares).</summary>
    public ExactRational LengthSquared => Dot(this, this);

    /// <summary>Σ (r_i − q) × F_i of point forces (SPEC §2), exact.</summary>
    public static ExactVector MomentAbout(Vector3 q, IEnumerable<(Vector3 At, Vector3 Force)> forces)
    {
        ExactVector m = Zero, eq = From(q);
        foreach ((Vector3 at, Vector3 force) in forces)
        {
            m += Cross(From(at) - eq, From(force));
        }
        return m;
    }

    /// <summary>Σ F_i, exact.</summary>
    public static ExactVector Resultant(IEnumerable<(Vector3 At, Vector3 Force)> forces)
    {
        ExactVector r = Zero;
        foreach ((_, Vector3 force) in forces)
        {
            r += From(force);
        }
        return r;
    }

    public override string ToString() => $"({X}, {Y}, {Z})";
}

/// <summary>Assertions of computed doubles against exact values.</summary>
public static class Exact
{
    public static ExactRational Of(double d) => ExactRational.FromDouble(d);

    /// <summary>|actual − expected| ≤ relative·|expected|, decided exactly.</summary>
    public static void Relative(ExactRational expected, double actual, double relative)
    {
        ExactRational error = (Of(actual) - expected).Abs();
        Assert.True(error <= expected.Abs() * Of(relative),
            $"expected {expected}, actual {actual:R}, error {error}, allowed relative {relative:R}");
    }

    /// <summary>
    /// A norm against its exact square: (1 − rel)²·e ≤ actual² ≤ (1 + rel)²·e, i.e. actual = √e to <paramref name="relative"/>.
    /// </summary>
    public static void NormRelative(ExactRational expectedSquare, double actual, double relative)
    {
        Assert.True(actual >= 0, $"a norm is not negative: {actual:R}");
        ExactRational a2 = Of(actual) * Of(actual);
        ExactRational lo = Of(1 - relative) * Of(1 - relative) * expectedSquare;
        ExactRational hi = Of(1 + relative) * Of(1 + relative) * expectedSquare;
        Assert.True(a2 >= lo && a2 <= hi,
            $"expected √{expectedSquare} ≈ {Math.Sqrt(expectedSquare.ToDouble()):R}, actual {actual:R}, allowed relative {relative:R}");
    }

    /// <summary>Each component within a few units in the last place of the exact value (absolute floor for zero).</summary>
    public static void WithinUlps(ExactVector expected, Vector3 actual, int ulps, double floor = 0)
    {
        Component(expected.X, actual.X, ulps, floor, "x");
        Component(expected.Y, actual.Y, ulps, floor, "y");
        Component(expected.Z, actual.Z, ulps, floor, "z");
    }

    private static void Component(ExactRational expected, double actual, int ulps, double floor, string name)
    {
        // ulp of the double nearest the exact value; ToDouble is used only to size the allowance
        double e = expected.ToDouble();
        double ulp = Math.BitIncrement(Math.Abs(e)) - Math.Abs(e);
        ExactRational error = (Of(actual) - expected).Abs();
        Assert.True(error <= Of(Math.Max(ulps * ulp, floor)),
            $"{name}: expected {expected}, actual {actual:R}, error {error}, allowed {ulps} ulp = {ulps * ulp:R}");
    }
}
