namespace LoadDiff.Core.Distribution;

/// <summary>
/// The ids of the couples placed at support points: <c>ID-couple</c>, or, where that is already the id of another point
/// (or of an earlier point's couple), <c>ID-couple-2</c>, <c>ID-couple-3</c>, … — the first that is free. The forces keep
/// the point ids, so every id of a distributed case is distinct.
/// </summary>
public static class CoupleIds
{
    /// <summary>What is appended to a point's id to name its couple.</summary>
    public const string Suffix = "-couple";

    /// <summary>The couple id of each point, in the points' order; the point ids must be distinct.</summary>
    /// <exception cref="ArgumentException">Two points share an id.</exception>
    public static IReadOnlyList<string> For(IReadOnlyList<SupportPoint> points)
    {
        Guard.NotNull(points);
        var taken = new HashSet<string>(StringComparer.Ordinal);
        foreach (SupportPoint p in points)
        {
            Guard.That(taken.Add(p.Id), $"Support point id '{p.Id}' appears twice.", nameof(points));
        }
        var ids = new string[points.Count];
        for (int i = 0; i < points.Count; i++)
        {
            string id = points[i].Id + Suffix;
            for (int n = 2; !taken.Add(id); n++)
            {
                id = points[i].Id + Suffix + "-" + n.ToString(System.Globalization.CultureInfo.InvariantCulture);
            }
            ids[i] = id;
        }
        return ids;
    }
}
