using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports;

/// <summary>Words for reduction results, shared by the text and Markdown renderers.</summary>
public static class Describe
{
    /// <summary>The JSON name of a system kind: null, couple, force or wrench.</summary>
    public static string SystemCode(SystemKind kind) => kind switch
    {
        SystemKind.Null => "null",
        SystemKind.Couple => "couple",
        SystemKind.Force => "force",
        _ => "wrench",
    };

    /// <summary>A phrase for what the system reduces to.</summary>
    public static string System(WrenchAnalysis w, bool parallel) => w.Kind switch
    {
        SystemKind.Null => "a null system (no force, no moment)",
        SystemKind.Couple => "a pure couple (no resultant force)",
        SystemKind.Force => parallel ? "a single force (parallel system)" : "a single force",
        _ => "a wrench (force along the central axis plus a parallel couple)",
    };

    /// <summary>"1.35·dead + 1.5·live".</summary>
    public static string Factors(LoadCombination c) =>
        string.Join(" + ", c.Factors.Select(f => NumberText.Exact(f.Value) + "·" + f.Key));
}
