using LoadDiff.Core;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Reports;

/// <summary>One reduced load case or combination.</summary>
/// <param name="Name">Case or combination name.</param>
/// <param name="Kind">Case or combination.</param>
/// <param name="Title">Free-text title, or null.</param>
/// <param name="Reduction">The reduction about the report's reference point.</param>
/// <param name="Combination">The combination's factors, for combinations.</param>
public sealed record ReducedEntry(string Name, EntryKind Kind, string? Title, LoadReduction Reduction, LoadCombination? Combination)
{
    /// <summary>The wrench analysis about the reference point.</summary>
    public WrenchAnalysis Wrench { get; } = Reduction.Wrench();
}

/// <summary>The result of <c>loaddiff reduce</c>: every selected case and combination about one stated point.</summary>
/// <param name="Source">The input file as named by the user.</param>
/// <param name="Title">The document title, or null.</param>
/// <param name="Units">Output units.</param>
/// <param name="ReferencePoint">The point moments are taken about.</param>
/// <param name="ReferenceDescription">How that point was chosen, for example "origin" or "load centroid".</param>
/// <param name="Entries">Cases then combinations, in file order.</param>
public sealed record ReduceResult(
    string Source, string? Title, UnitSystem Units, Vector3 ReferencePoint, string ReferenceDescription, IReadOnlyList<ReducedEntry> Entries)
{
    /// <inheritdoc/>
    public override string ToString() => $"reduction of {Source}: {Entries.Count} entries about {ReferencePoint}";
}
