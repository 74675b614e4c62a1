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
    /// <summary>The ranking key: |F|, or |C| for couples.</summary>
    public double Magnitude => Kind == LoadKind.Couple ? Couple.Length : Force.Length;
}
