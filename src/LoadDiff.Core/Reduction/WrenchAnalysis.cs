namespace LoadDiff.Core.Reduction;

/// <summary>
/// Poinsot's reduction of a force-couple system: pitch p = R·M_P/|R|², central axis through
/// P + (R × M_P)/|R|² along R, minimum couple p·R; single force when R ≠ 0 and R·M_P = 0.
/// Quantities below <see cref="RoundingThreshold"/> of the gross magnitudes count as zero (rounding noise, not a tolerance).
/// </summary>
/// <param name="Kind">Null system, pure couple, single force or wrench.</param>
/// <param name="Pitch">Pitch (length units); null when R = 0.</param>
/// <param name="AxisPoint">The point of the central axis nearest the reference point; null when R = 0.</param>
/// <param name="AxisDirection">Unit direction of R; null when R = 0.</param>
/// <param name="MinimumCouple">The couple along the central axis, p·R (the whole moment for a pure couple).</param>
/// <param name="Crossings">For a single force: where its line of action crosses the coordinate planes through the reference point.</param>
/// <param name="CentreOfParallelForces">For a parallel system: where the line pierces the coordinate plane through the
/// reference point most nearly normal to the forces.</param>
public sealed record WrenchAnalysis(
    SystemKind Kind, double? Pitch, Vector3? AxisPoint, Vector3? AxisDirection, Vector3 MinimumCouple,
    IReadOnlyList<PlaneCrossing> Crossings, PlaneCrossing? CentreOfParallelForces)
{
    /// <summary>Relative size below which a force or moment counts as rounding noise.</summary>
    public const double RoundingThreshold = 1e-12;

    /// <summary>True when the system reduces to a single force (or is null).</summary>
    public bool IsSingleForce => Kind == SystemKind.Force;

    /// <summary>Analyses a system; <paramref name="forceScale"/> and <paramref name="momentScale"/> set what counts as zero.</summary>
    public static WrenchAnalysis Analyse(ForceCoupleSystem system, double forceScale, double momentScale, bool parallel)
    {
        Vector3 r = system.Force, m = system.Moment, p = system.ReferencePoint;
        double rn = r.Length;
        double forceZero = RoundingThreshold * forceScale;
        double momentZero = RoundingThreshold * momentScale;
        if (rn == 0 || rn <= forceZero)
        {
            bool nullSystem = m.Length == 0 || m.Length <= momentZero;
            return new WrenchAnalysis(nullSystem ? SystemKind.Null : SystemKind.Couple, null, null, null,
                m, [], null);
        }
        // Through the unit direction rather than |R|²: |R|² underflows to 0 below about 1e-162 (and overflows above
        // 1e154) although R itself is representable, so R·M/|R|² would divide by zero for a tiny nonzero resultant.
        Vector3 direction = r / rn;
        double um = Vector3.Dot(direction, m);
        double pitch = um / rn;
        Vector3 axisPoint = p + (Vector3.Cross(direction, m) / rn);
        Vector3 minimum = direction * um;
        bool single = Math.Abs(um) <= momentZero;
        var crossings = new List<PlaneCrossing>();
        PlaneCrossing? centre = null;
        if (single)
        {
            int dominant = 0;
            for (int k = 0; k < 3; k++)
            {
                if (Math.Abs(direction[k]) > Math.Abs(direction[dominant]))
                {
                    dominant = k;
                }
                if (Math.Abs(direction[k]) > 1e-9)
                {
                    double lambda = (p[k] - axisPoint[k]) / direction[k];
                    Vector3 x = axisPoint + (direction * lambda);
                    // put the crossing exactly on its plane
                    x = Vector3.Create(k == 0 ? p.X : x.X, k == 1 ? p.Y : x.Y, k == 2 ? p.Z : x.Z);
                    crossings.Add(new PlaneCrossing(k, x));
                }
            }
            if (parallel)
            {
                centre = crossings.Find(c => c.Axis == dominant);
            }
        }
        return new WrenchAnalysis(single ? SystemKind.Force : SystemKind.Wrench, pitch, axisPoint, direction, minimum,
            crossings, centre);
    }
}
