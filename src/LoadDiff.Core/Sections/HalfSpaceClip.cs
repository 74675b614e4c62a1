using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Sections;

/// <summary>
/// The exact part of a load item that lies on the negative side of a cut plane: line loads are cut at the
/// plane with the intensity interpolated, polygons and mesh triangles are clipped (Sutherland–Hodgman against
/// one plane) with the same linear pressure field. Nothing is sampled.
/// </summary>
/// <remarks>
/// Side rule: a point (force or mass) exactly on the plane, and any geometry lying in it, counts as on the
/// negative side, so the value at a station that holds a point load includes that load. Free couples have no
/// position and are never on either side: the caller accounts for them.
/// </remarks>
public static class HalfSpaceClip
{
    /// <summary>The parts of <paramref name="item"/> with (x − origin)·direction ≤ <paramref name="station"/>; none for free couples.</summary>
    /// <exception cref="ArgumentException">The station is not finite.</exception>
    public static IReadOnlyList<LoadItem> NegativeSide(LoadItem item, SectionAxis axis, double station)
    {
        Guard.NotNull(item);
        Guard.NotNull(axis);
        Guard.Finite(station);
        return item switch
        {
            PointForce f => axis.StationOf(f.At) <= station ? [f] : [],
            PointMass m => axis.StationOf(m.At) <= station ? [m] : [],
            LineLoad w => ClipLine(w, axis, station),
            AreaLoad a => ClipArea(a, axis, station),
            MeshTriangle t => ClipTriangle(t, axis, station),
            _ => [],
        };
    }

    /// <summary>The lowest and highest station of an item's geometry; null for free couples.</summary>
    public static (double Min, double Max)? StationRange(LoadItem item, SectionAxis axis)
    {
        Guard.NotNull(item);
        Guard.NotNull(axis);
        double min = double.PositiveInfinity, max = double.NegativeInfinity;
        item.VisitGeometry(p =>
        {
            double s = axis.StationOf(p);
            min = Math.Min(min, s);
            max = Math.Max(max, s);
        });
        return min <= max ? (min, max) : null;
    }

    private static IReadOnlyList<LoadItem> ClipLine(LineLoad w, SectionAxis axis, double s)
    {
        double a = axis.StationOf(w.From), b = axis.StationOf(w.To);
        if (Math.Max(a, b) <= s)
        {
            return [w];
        }
        if (Math.Min(a, b) >= s)
        {
            // Only an end point (a set of zero length) can touch the negative side.
            return [];
        }
        double t = (s - a) / (b - a);
        Vector3 cut = w.From + ((w.To - w.From) * t);
        Vector3 intensity = w.StartIntensity + ((w.EndIntensity - w.StartIntensity) * t);
        LineLoad part = a < b
            ? new LineLoad(w.Id, w.From, cut, w.StartIntensity, intensity)
            : new LineLoad(w.Id, cut, w.To, intensity, w.EndIntensity);
        return part.From == part.To ? [] : [part];
    }

    private static IReadOnlyList<LoadItem> ClipArea(AreaLoad area, SectionAxis axis, double s)
    {
        if (!Straddles(area, axis, s, out bool allInside))
        {
            return allInside ? [area] : [];
        }
        var kept = new List<Vector3>(area.Polygon.Length + 2);
        var pressures = new List<double>(area.Polygon.Length + 2);
        double[] none = new double[area.Polygon.Length];
        Clip(area.Polygon, none, axis, s, kept, pressures);
        if (kept.Count < 3 || PolygonGeometry.Analyse(kept).AreaVector.IsZero)
        {
            return [];
        }
        // The pressure field is defined in space, so it carries over; the force direction must not flip with the
        // clipped polygon's own normal, so it is stated explicitly.
        return [area with { Polygon = [.. kept], Direction = area.ForceUnit }];
    }

    private static List<LoadItem> ClipTriangle(MeshTriangle t, SectionAxis axis, double s)
    {
        if (!Straddles(t, axis, s, out bool allInside))
        {
            return allInside ? [t] : [];
        }
        var kept = new List<Vector3>(4);
        var pressures = new List<double>(4);
        Clip([t.A, t.B, t.C], [t.PressureA, t.PressureB, t.PressureC], axis, s, kept, pressures);
        Vector3 normal = t.Direction is { } d ? d.Normalize() : Vector3.Cross(t.B - t.A, t.C - t.A).Normalize();
        var parts = new List<LoadItem>(2);
        // The clip of a triangle by a plane is convex: a fan from the first vertex keeps the orientation.
        for (int i = 1; i + 1 < kept.Count; i++)
        {
            if (!Vector3.Cross(kept[i] - kept[0], kept[i + 1] - kept[0]).IsZero)
            {
                parts.Add(new MeshTriangle(t.Id, kept[0], kept[i], kept[i + 1], pressures[0], pressures[i], pressures[i + 1], normal));
            }
        }
        return parts;
    }

    private static bool Straddles(LoadItem item, SectionAxis axis, double s, out bool allInside)
    {
        (double min, double max) = StationRange(item, axis)!.Value;
        allInside = max <= s;
        return min < s && max > s;
    }

    // Sutherland–Hodgman against the half-space σ ≤ s; a vertex on the plane is kept, and an intersection is
    // added only where an edge crosses the plane strictly, so no vertex is doubled. Values are interpolated
    // linearly along each edge, which is exact for a linear field.
    private static void Clip(IReadOnlyList<Vector3> polygon, double[] values, SectionAxis axis, double s,
        List<Vector3> kept, List<double> keptValues)
    {
        int n = polygon.Count;
        for (int i = 0; i < n; i++)
        {
            Vector3 p = polygon[i], q = polygon[(i + 1) % n];
            double vp = values[i], vq = values[(i + 1) % n];
            double sp = axis.StationOf(p), sq = axis.StationOf(q);
            if ((sp < s && sq > s) || (sp > s && sq < s))
            {
                double t = (s - sp) / (sq - sp);
                kept.Add(p + ((q - p) * t));
                keptValues.Add(vp + ((vq - vp) * t));
            }
            if (sq <= s)
            {
                kept.Add(q);
                keptValues.Add(vq);
            }
        }
    }
}
