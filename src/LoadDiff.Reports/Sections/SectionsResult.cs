using LoadDiff.Core.Model;
using LoadDiff.Core.Sections;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports.Sections;

/// <summary>The section-cut comparison of one case or combination.</summary>
/// <param name="Name">Case or combination name.</param>
/// <param name="Kind">Case or combination.</param>
/// <param name="Comparison">Both profiles and their deviations.</param>
public sealed record SectionsEntry(string Name, EntryKind Kind, SectionComparison Comparison);

/// <summary>The result of <c>loaddiff sections</c>.</summary>
/// <param name="OriginalPath">The original file as named.</param>
/// <param name="SubstitutePath">The substitute file as named.</param>
/// <param name="Units">Output units.</param>
/// <param name="Axis">The cut axis.</param>
/// <param name="Entries">Cases, then combinations.</param>
public sealed record SectionsResult(
    string OriginalPath, string SubstitutePath, UnitSystem Units, SectionAxis Axis, IReadOnlyList<SectionsEntry> Entries)
{
    /// <summary>The section-cut gate's verdict on these entries, when <c>check --sections</c> asked for one.</summary>
    public SectionGateVerdict? Gate { get; init; }

    /// <summary>What the numbers are, in one sentence.</summary>
    public const string Convention =
        "V(s) and M(s) are the resultant force and moment of every load on the negative side of the cut, (x − origin)·axis ≤ s, "
        + "about the cut point origin + s·axis; a point load exactly on a cut counts on the negative side; free couples have no "
        + "position and are left out.";

    /// <summary>The caution specific to section cuts.</summary>
    public const string SectionCaution =
        "Section cuts here are the statics of the loads on one side of each cut (a free body without supports unless the files "
        + "contain the reactions); they are the member's internal forces only where the structure is statically determinate and "
        + "the cut side is free. Values are exact at the stations listed; between stations the profile is not sampled.";

    /// <inheritdoc/>
    public override string ToString() => $"sections of {SubstitutePath} against {OriginalPath}: {Entries.Count} entries";
}
