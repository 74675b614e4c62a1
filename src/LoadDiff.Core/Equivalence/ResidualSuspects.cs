using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>
/// Looks for one item that accounts for a residual within the tolerance: an original item left out (ΔR + C ≈ 0), a
/// substitute item without counterpart (ΔR − C ≈ 0), or either with its sign reversed (ΔR ± 2C ≈ 0), "≈ 0" meaning the
/// remaining residual passes the same tolerance rule (|ΔR'| within the force allowance, |ΔM'| within the moment
/// allowance at every corner of the box). Only items that are themselves beyond the tolerance are named.
/// </summary>
public static class ResidualSuspects
{
    /// <summary>Most suspects named per case.</summary>
    public const int MaxNamed = 5;

    /// <summary>An item offered to the search, with the file it is in and its factor.</summary>
    /// <param name="Item">The item's contribution.</param>
    /// <param name="InOriginal">True when it is an item of the original.</param>
    /// <param name="Case">For a combination, the component case; null otherwise.</param>
    /// <param name="Factor">Its load factor (1 for a case).</param>
    public sealed record Candidate(Contributor Item, bool InOriginal, string? Case, double Factor);

    /// <summary>The items that account for the residual, largest first, at most <see cref="MaxNamed"/>.</summary>
    public static IReadOnlyList<SuspectItem> Find(
        ResidualAnalysis residual, AppliedTolerance tolerance, Box? box, Vector3 point, IReadOnlyList<Candidate> candidates)
    {
        Guard.NotNull(residual);
        Guard.NotNull(tolerance);
        Guard.NotNull(candidates);
        if (candidates.Count == 0 || (residual.ForceNorm <= tolerance.Force && residual.WorstMomentNorm <= tolerance.Moment))
        {
            return [];
        }
        IReadOnlyList<Vector3> corners = box?.Corners ?? [point];
        var residualAt = new ForceCoupleSystem[corners.Count];
        for (int i = 0; i < corners.Count; i++)
        {
            residualAt[i] = residual.System.MoveTo(corners[i]);
        }
        var found = new List<(SuspectItem Item, double Size)>();
        foreach (Candidate c in candidates)
        {
            var at = new ForceCoupleSystem[corners.Count];
            for (int i = 0; i < corners.Count; i++)
            {
                at[i] = c.Item.About(corners[i]) * c.Factor;
            }
            if (Within(at, null, 1, tolerance))
            {
                continue; // the item itself is within the tolerance: it explains nothing
            }
            // residual = substitute − original, so a left-out original item leaves −C, an extra substitute item +C
            double sign = c.InOriginal ? -1 : 1;
            SuspectKind? kind = Within(residualAt, at, -sign, tolerance) ? (c.InOriginal ? SuspectKind.LeftOut : SuspectKind.NoCounterpart)
                : Within(residualAt, at, -2 * sign, tolerance) ? SuspectKind.SignReversed
                : null;
            if (kind is { } k)
            {
                found.Add((new SuspectItem(c.Item.Id, c.InOriginal, c.Case, c.Factor, k), c.Item.Magnitude * Math.Abs(c.Factor)));
            }
        }
        return found.OrderByDescending(f => f.Size).Take(MaxNamed).Select(f => f.Item).ToList();
    }

    // True when a + k·b passes the tolerance at every corner (b null: a alone).
    private static bool Within(ForceCoupleSystem[] a, ForceCoupleSystem[]? b, double k, AppliedTolerance t)
    {
        for (int i = 0; i < a.Length; i++)
        {
            Vector3 f = b is null ? a[i].Force : a[i].Force + (b[i].Force * k);
            Vector3 m = b is null ? a[i].Moment : a[i].Moment + (b[i].Moment * k);
            if (f.Length > t.Force || m.Length > t.Moment)
            {
                return false;
            }
        }
        return true;
    }
}
