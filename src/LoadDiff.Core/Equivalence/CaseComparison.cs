using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Equivalence;

/// <summary>Which file a case or combination was found in, when it is in one only.</summary>
public enum OnlyIn
{
    /// <summary>In both files.</summary>
    Both,

    /// <summary>Only in the original.</summary>
    Original,

    /// <summary>Only in the substitute.</summary>
    Substitute,
}

/// <summary>The verdict for one load case or combination.</summary>
/// <param name="Name">Case or combination name.</param>
/// <param name="Kind">Case or combination.</param>
/// <param name="Original">The original's reduction about the reference point; null when absent.</param>
/// <param name="Substitute">The substitute's reduction about the reference point; null when absent.</param>
/// <param name="Residual">Substitute − original, when both exist.</param>
/// <param name="Tolerance">The tolerances applied, when both exist.</param>
/// <param name="Presence">Whether it was in both files or one only (then it fails).</param>
/// <param name="Equivalent">The verdict.</param>
/// <param name="Notes">Anything the reviewer must know (a combination naming a case the substitute lacks, …).</param>
public sealed record CaseComparison(
    string Name, EntryKind Kind, LoadReduction? Original, LoadReduction? Substitute, ResidualAnalysis? Residual,
    AppliedTolerance? Tolerance, OnlyIn Presence, bool Equivalent, IReadOnlyList<string> Notes)
{
    /// <summary>How the residual reads against the tolerance, and the items that account for it; null when the case is in one file only.</summary>
    public ResidualExplanation? Explanation { get; init; }

    /// <inheritdoc/>
    public override string ToString() => $"{Kind} {Name}: {(Equivalent ? "equivalent" : "not equivalent")}{(Presence == OnlyIn.Both ? "" : $" (only in {Presence})")}";

    /// <summary>True when |ΔR| is within its tolerance.</summary>
    public bool ForcePasses => Residual is not null && Tolerance is not null && Residual.ForceNorm <= Tolerance.Force;

    /// <summary>True when the worst |ΔM| is within its tolerance.</summary>
    public bool MomentPasses => Residual is not null && Tolerance is not null && Residual.WorstMomentNorm <= Tolerance.Moment;
}
