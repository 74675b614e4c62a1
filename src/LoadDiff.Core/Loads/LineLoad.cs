namespace LoadDiff.Core.Loads;

/// <summary>
/// A line load on the straight segment <paramref name="From"/> → <paramref name="To"/> whose intensity
/// (force per unit length of the segment, a vector) varies linearly from <paramref name="StartIntensity"/>
/// to <paramref name="EndIntensity"/>.
/// </summary>
/// <param name="Id">Identifier within the case.</param>
/// <param name="From">Start point A (length units).</param>
/// <param name="To">End point B (length units); must differ from A.</param>
/// <param name="StartIntensity">Intensity w1 at A (force per length).</param>
/// <param name="EndIntensity">Intensity w2 at B (force per length).</param>
public sealed record LineLoad(string Id, Vector3 From, Vector3 To, Vector3 StartIntensity, Vector3 EndIntensity) : LoadItem(Id)
{
    /// <inheritdoc/>
    public override LoadKind Kind => LoadKind.Line;

    /// <summary>Length of the segment.</summary>
    public double Length => (To - From).Length;

    /// <summary>
    /// Closed form about P: R = L(w1+w2)/2, M_P = L[(A−P)×(w1+w2)/2 + (B−A)×(w1/6 + w2/3)].
    /// </summary>
    public override Contribution ContributionAbout(Vector3 point)
    {
        Vector3 a = From - point;
        Vector3 ab = To - From;
        double l = ab.Length;
        Vector3 half = (StartIntensity + EndIntensity) * 0.5;
        Vector3 force = half * l;
        Vector3 moment = (Vector3.Cross(a, half) + Vector3.Cross(ab, (StartIntensity / 6) + (EndIntensity / 3))) * l;
        (double i0, double i1) = NormIntegrals(StartIntensity, EndIntensity - StartIntensity);
        double gross = l * i0;
        Vector3 first = ((a * i0) + (ab * i1)) * l;
        return new Contribution(force, moment, gross, first, 0);
    }

    /// <inheritdoc/>
    public override void VisitGeometry(Action<Vector3> visit)
    {
        Guard.NotNull(visit);
        visit(From);
        visit(To);
    }

    internal override bool IsParallelTo(Vector3 direction, double relativeTolerance) =>
        Parallel(StartIntensity, direction, relativeTolerance) && Parallel(EndIntensity, direction, relativeTolerance);

    internal override Vector3 ForceDirection => StartIntensity + EndIntensity;

    /// <summary>
    /// I0 = ∫₀¹ |a + t b| dt and I1 = ∫₀¹ t |a + t b| dt in closed form. Parallel intensities (the usual case)
    /// are integrated piecewise-linearly, split where the intensity changes sign; otherwise the
    /// square root of a quadratic is integrated with asinh, in a form free of cancellation.
    /// </summary>
    internal static (double I0, double I1) NormIntegrals(Vector3 a, Vector3 b)
    {
        Vector3 end = a + b;
        double na = a.Length, nb = b.Length, ne = end.Length;
        if (nb == 0)
        {
            return (na, na / 2);
        }
        // Both integrals are homogeneous of degree one in (a, b): work at unit scale, so that squares and cross
        // products of very small or very large intensities neither underflow nor overflow.
        double scale = Math.Max(na, Math.Max(nb, ne));
        if (scale is < 1e-60 or > 1e60)
        {
            (double s0, double s1) = NormIntegrals(a / scale, b / scale);
            return (s0 * scale, s1 * scale);
        }
        Vector3 cross = Vector3.Cross(a, b);
        if (cross.Length <= 1e-14 * na * nb || na == 0 || ne == 0)
        {
            Vector3 e = (na >= ne ? a : end).Normalize();
            double s0 = Vector3.Dot(a, e), s1 = Vector3.Dot(end, e);
            if (s0 * s1 >= 0)
            {
                double p = Math.Abs(s0), q = Math.Abs(s1);
                return ((p + q) / 2, (p + (2 * q)) / 6);
            }
            double t = s0 / (s0 - s1);
            double m0 = Math.Abs(s0), m1 = Math.Abs(s1);
            return (((m0 * t) + (m1 * (1 - t))) / 2, ((m0 * t * t) + (m1 * (1 - t) * (2 + t))) / 6);
        }
        // Frame of the line a + t·b: u runs along b̂ (u0 = a·b̂ at t = 0, u1 = u0 + |b| at t = 1) and h is the
        // distance of the origin from the line, so |a + t b| = sqrt(u² + h²). The differences of the primitive
        // are written without cancellation: the plain asinh primitive loses about (|a|/|b|)² in relative
        // accuracy when the intensity is nearly uniform (|b| ≪ |a|).
        if (nb <= 1e-6 * Math.Max(na, ne))
        {
            // |a + t b| deviates from its linear interpolation by at most |b|²/(8·min|a + t b|) ≤ 1.3e-13·|a|.
            return ((na + ne) / 2, (na + (2 * ne)) / 6);
        }
        double u0 = Vector3.Dot(a, b) / nb, u1 = u0 + nb;
        double h = cross.Length / nb;
        double sum = u0 + u1, norms = na + ne;
        double z, lin;
        if (u0 >= 0 || u1 <= 0)
        {
            // asinh(u1/h) − asinh(u0/h) = asinh((u1·na − u0·ne)/h²), and u1·na − u0·ne = h²·|b|·(u0 + u1)/(u1·na + u0·ne).
            z = nb * sum / ((u1 * na) + (u0 * ne));
            lin = u0 >= 0 ? ne + (u0 * sum / norms) : na + (u1 * sum / norms);
        }
        else
        {
            z = ((u1 * na) - (u0 * ne)) / (h * h);
            lin = ((u1 * ne) - (u0 * na)) / nb;
        }
        // I0 = [u·sqrt(u² + h²) + h²·asinh(u/h)] from u0 to u1, over 2|b|; lin is the first difference over |b|.
        double i0 = (lin / 2) + (h * h / (2 * nb) * Math.Asinh(z));
        // |b|²·I1 = (ne³ − na³)/3 − (a·b)·I0, with ne³ − na³ = (ne − na)(ne² + ne·na + na²), ne − na = |b|(u0 + u1)/(na + ne).
        double cubes = sum * ((ne * ne) + (ne * na) + (na * na)) / (3 * norms);
        double i1 = (cubes - (u0 * i0)) / nb;
        return (i0, i1);
    }

    /// <inheritdoc/>
    public override string ToString() => $"line {Id} {From} → {To}: {StartIntensity} → {EndIntensity}";
}
