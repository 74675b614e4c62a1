namespace LoadDiff.Core.Distribution;

/// <summary>The outcome of distributing one force-couple system onto the support points.</summary>
/// <param name="Forces">Force at each support point, in the points' order (force units).</param>
/// <param name="Couples">Couple at each point (force × length); all zero unless couples were allowed.</param>
/// <param name="Rank">Rank of the equilibrium equations (6 when the points can carry any load).</param>
/// <param name="UncarriedForce">The part of the resultant force the points cannot carry (zero when feasible).</param>
/// <param name="UncarriedMoment">The part of the moment about the centroid of the points that they cannot carry.</param>
/// <param name="Feasible">True when the forces (and couples) reproduce the system up to rounding.</param>
public sealed record Distribution(
    IReadOnlyList<Vector3> Forces, IReadOnlyList<Vector3> Couples, int Rank,
    Vector3 UncarriedForce, Vector3 UncarriedMoment, bool Feasible);
