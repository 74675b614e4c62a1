using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Diff;

/// <summary>A case's or combination's resultant about the reference point before and after (null where it does not exist).</summary>
/// <param name="Name">Case or combination name.</param>
/// <param name="Kind">Case or combination.</param>
/// <param name="Old">The old force-couple system, or null when the old version lacks it.</param>
/// <param name="New">The new one, or null when the new version lacks it.</param>
public sealed record ResultantChange(string Name, EntryKind Kind, ForceCoupleSystem? Old, ForceCoupleSystem? New)
{
    /// <summary>
    /// Why the resultant is not shown (the CSV data its case needs were not read, as in git's external diff, which hands
    /// over the documents only), or null when it is shown.
    /// </summary>
    public string? NotShown { get; init; }

    /// <summary>ΔR = R_new − R_old (a missing side counts as zero).</summary>
    public Vector3 DeltaForce => (New?.Force ?? Vector3.Zero) - (Old?.Force ?? Vector3.Zero);

    /// <summary>ΔM = M_new − M_old about the reference point (a missing side counts as zero).</summary>
    public Vector3 DeltaMoment => (New?.Moment ?? Vector3.Zero) - (Old?.Moment ?? Vector3.Zero);

    /// <summary>True when both exist and are exactly equal.</summary>
    public bool Unchanged => NotShown is null && Old is { } o && New is { } n && o.Force == n.Force && o.Moment == n.Moment;

    /// <inheritdoc/>
    public override string ToString() => $"{Name}: {Old?.ToString() ?? "(absent)"} → {New?.ToString() ?? "(absent)"}";
}
