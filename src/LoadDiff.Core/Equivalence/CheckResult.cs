using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Equivalence;

/// <summary>The largest contributors of one case in both files.</summary>
/// <param name="Original">Largest items of the original (forces then couples).</param>
/// <param name="Substitute">Largest items of the substitute.</param>
public sealed record CaseContributors(IReadOnlyList<Contributor> Original, IReadOnlyList<Contributor> Substitute);

/// <summary>
/// The result of a whole check, computed once (<see cref="EquivalenceCheck.Run"/>): every case and combination, the
/// notes that bear on the verdict, the optional section-cut gate and the overall verdict. The exit code and every
/// output format read it; none of them decides anything.
/// </summary>
/// <param name="OriginalPath">The original (detailed) file as named by the user.</param>
/// <param name="SubstitutePath">The substitute file as named by the user.</param>
/// <param name="Units">Output units (the original's unless asked otherwise).</param>
/// <param name="ReferencePoint">The point the moments are stated about.</param>
/// <param name="ReferenceDescription">How that point was chosen.</param>
/// <param name="Tolerance">The tolerance rule's numbers.</param>
/// <param name="Comparisons">Cases, then combinations.</param>
/// <param name="Contributors">Largest contributors by case name.</param>
public sealed record CheckResult(
    string OriginalPath, string SubstitutePath, UnitSystem Units, Vector3 ReferencePoint, string ReferenceDescription,
    ToleranceSpec Tolerance, IReadOnlyList<CaseComparison> Comparisons, IReadOnlyDictionary<string, CaseContributors> Contributors)
{
    /// <summary>Warnings about the whole check (units not stated, a likely unit slip); they never change a verdict.</summary>
    public IReadOnlyList<string> Warnings { get; init; } = [];

    /// <summary>The section-cut gate, when asked for.</summary>
    public Sections.SectionGateVerdict? SectionGate { get; init; }

    /// <summary>True when every compared case and combination is equivalent (the gate aside).</summary>
    public bool CasesEquivalent => Comparisons.Count > 0 && Comparisons.All(c => c.Equivalent);

    /// <summary>The overall verdict: every case and combination equivalent, and the section-cut gate passed when asked for.</summary>
    public bool Equivalent => CasesEquivalent && (SectionGate?.Passes ?? true);

    /// <summary>How many cases and combinations failed.</summary>
    public int FailureCount => Comparisons.Count(c => !c.Equivalent);

    /// <summary>True when the relative tolerance is the documented default.</summary>
    public bool DefaultRelative => Tolerance.Relative == ToleranceSpec.DefaultRelative;

    /// <inheritdoc/>
    public override string ToString() => $"check {OriginalPath} against {SubstitutePath}: {(Equivalent ? "equivalent" : "not equivalent")}";
}
