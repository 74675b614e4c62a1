namespace LoadDiff.Core.Loads;

/// <summary>
/// Exact integrals of a linear scalar field over a triangle: ∫p dA = A(p1+p2+p3)/3 and
/// ∫p x dA = A/12 Σ_k (p_k + p1+p2+p3) x_k, with positions already taken relative to the reference point.
/// </summary>
internal static class TriangleIntegrals
{
    /// <summary>∫p dA and ∫p x dA for a triangle of (signed) area <paramref name="area"/>.</summary>
    public static (double Integral, Vector3 First) Of(double area, Vector3 x1, Vector3 x2, Vector3 x3, double p1, double p2, double p3)
    {
        double s = p1 + p2 + p3;
        Vector3 first = ((x1 * (p1 + s)) + (x2 * (p2 + s)) + (x3 * (p3 + s))) * (area / 12);
        return (area * s / 3, first);
    }

    /// <summary>∫|p| dA and ∫|p| x dA, splitting the triangle exactly along the line p = 0.</summary>
    public static (double Integral, Vector3 First) OfAbsolute(double area, Vector3 x1, Vector3 x2, Vector3 x3, double p1, double p2, double p3)
    {
        int positive = (p1 > 0 ? 1 : 0) + (p2 > 0 ? 1 : 0) + (p3 > 0 ? 1 : 0);
        int negative = (p1 < 0 ? 1 : 0) + (p2 < 0 ? 1 : 0) + (p3 < 0 ? 1 : 0);
        if (negative == 0 || positive == 0)
        {
            (double i, Vector3 f) = Of(area, x1, x2, x3, p1, p2, p3);
            return negative == 0 ? (i, f) : (-i, -f);
        }
        // Rotate (keeps orientation) so that vertex 1 is alone on its side; the others are opposite or zero.
        bool lonePositive = positive == 1;
        bool IsLone(double p) => lonePositive ? p > 0 : p < 0;
        if (!IsLone(p1))
        {
            if (IsLone(p2))
            {
                (x1, x2, x3, p1, p2, p3) = (x2, x3, x1, p2, p3, p1);
            }
            else
            {
                (x1, x2, x3, p1, p2, p3) = (x3, x1, x2, p3, p1, p2);
            }
        }
        double t1 = p1 / (p1 - p2), t2 = p1 / (p1 - p3);
        Vector3 e12 = x1 + ((x2 - x1) * t1), e13 = x1 + ((x3 - x1) * t2);
        (double ia, Vector3 fa) = Of(area * t1 * t2, x1, e12, e13, p1, 0, 0);
        (double ib, Vector3 fb) = Of(area * (1 - t1), e12, x2, x3, 0, p2, p3);
        (double ic, Vector3 fc) = Of(area * t1 * (1 - t2), e12, x3, e13, 0, p3, 0);
        double sign = p1 > 0 ? 1 : -1;
        return (sign * (ia - ib - ic), (fa - fb - fc) * sign);
    }
}
