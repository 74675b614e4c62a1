namespace LoadDiff.Core.Loads;

/// <summary>
/// What one load item contributes to a reduction about a point P: its resultant force, its moment about P,
/// and the gross magnitudes used for tolerances and the load centroid.
/// </summary>
/// <param name="Force">Resultant force, force units, global axes.</param>
/// <param name="Moment">Resultant moment about P, force × length.</param>
/// <param name="GrossForce">Σ|F| for point forces, ∫|w| for distributed loads (force units).</param>
/// <param name="GrossFirstMoment">Σ|F|(r − P), or ∫|w|(r − P) (force × length), for the load centroid.</param>
/// <param name="GrossCouple">Σ|C| of free couples (force × length).</param>
public readonly record struct Contribution(
    Vector3 Force, Vector3 Moment, double GrossForce, Vector3 GrossFirstMoment, double GrossCouple);
