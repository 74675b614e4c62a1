using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Reduction;

/// <summary>One item's share of a case resultant, for pointing a reviewer at the loads that matter most.</summary>
/// <param name="Id">Item id (a mesh's triangles are summed under its id).</param>
/// <param name="Kind">Item kind.</param>
/// <param name="Force">The item's resultant force (force units).</param>
/// <param name="Couple">The item's free couple (force × length), zero for force items.</param>
/// <param name="Centroid">Where the item's load is centred (length units), null for couples.</param>
/// <param name="Parts">How many items were summed (mesh triangles).</param>
public sealed record Contributor(string Id, LoadKind Kind, Vector3 Force, Vector3 Couple, Vector3? Centroid, long Parts)
{
    private readonly Vector3? _centroidMoment;

    /// <summary>The ranking key: |F|, or |C| for couples.</summary>
    public double Magnitude => Kind == LoadKind.Couple ? Couple.Length : Force.Length;

    /// <summary>
    /// The item's moment about <see cref="Centroid"/> (about any point for a couple); zero for a point force, and for a
    /// distributed load of one sign and direction, by default the couple.
    /// </summary>
    public Vector3 CentroidMoment
    {
        get => _centroidMoment ?? Couple;
        init => _centroidMoment = value;
    }

    /// <summary>The item's contribution about <paramref name="point"/>: its force and M_Q = M_c + (c − Q) × F.</summary>
    public ForceCoupleSystem About(Vector3 point)
    {
        Vector3 c = Centroid ?? point;
        return new ForceCoupleSystem(Force, CentroidMoment + Vector3.Cross(c - point, Force), point);
    }
}
