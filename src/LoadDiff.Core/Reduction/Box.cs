namespace LoadDiff.Core.Reduction;

/// <summary>An axis-aligned bounding box of load geometry (length units).</summary>
/// <param name="Min">Lowest corner.</param>
/// <param name="Max">Highest corner.</param>
public sealed record Box(Vector3 Min, Vector3 Max)
{
    /// <summary>Length of the diagonal.</summary>
    public double Diagonal => (Max - Min).Length;

    /// <summary>Centre of the box.</summary>
    public Vector3 Centre => Min + ((Max - Min) * 0.5);

    /// <summary>The eight corners (fewer distinct ones when the box is flat).</summary>
    public IReadOnlyList<Vector3> Corners
    {
        get
        {
            var list = new List<Vector3>(8);
            for (int i = 0; i < 8; i++)
            {
                Vector3 c = Vector3.Create((i & 1) == 0 ? Min.X : Max.X, (i & 2) == 0 ? Min.Y : Max.Y, (i & 4) == 0 ? Min.Z : Max.Z);
                if (!list.Contains(c))
                {
                    list.Add(c);
                }
            }
            return list;
        }
    }

    /// <summary>The smallest box holding both (either may be null).</summary>
    public static Box? Union(Box? a, Box? b) =>
        a is null ? b : b is null ? a : new Box(Vector3.Min(a.Min, b.Min), Vector3.Max(a.Max, b.Max));

    /// <summary>The smallest box holding this box and a point.</summary>
    public Box Including(Vector3 p) => new(Vector3.Min(Min, p), Vector3.Max(Max, p));
}
