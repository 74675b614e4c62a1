using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Equivalence;

/// <summary>One side of a check: a file's reduced cases and combinations, as named by the user.</summary>
/// <param name="Name">The file as the user named it.</param>
/// <param name="Reduction">Its cases and combinations (reduced in the check's units).</param>
/// <param name="Header">Its header (units and whether they were stated), when known.</param>
public sealed record CheckSide(string Name, ReductionSink Reduction, DocumentHeader? Header = null);

/// <summary>
/// The whole check of a substitute against an original: cases matched by name, the original's combinations applied
/// to both with the original's factors, cases in one file only, incomplete combinations and conflicting factors, each
/// case's verdict and the explanation of its residual. Computed once; every format renders the result.
/// </summary>
public static class EquivalenceCheck
{
    /// <summary>How many of the largest items per case the result lists for the reviewer.</summary>
    public const int ListedContributors = 3;

    /// <summary>Checks every selected case and combination (all when <paramref name="selected"/> is empty) about one point.</summary>
    public static CheckResult Run(
        CheckSide original, CheckSide substitute, UnitSystem units, Vector3 point, string pointDescription,
        ToleranceSpec tolerance, IReadOnlyCollection<string> selected)
    {
        Guard.NotNull(original);
        Guard.NotNull(substitute);
        Guard.NotNull(tolerance);
        Guard.NotNull(selected);
        ReductionSink a = original.Reduction, b = substitute.Reduction;
        bool Wanted(string name) => selected.Count == 0 || selected.Contains(name);
        var comparisons = new List<CaseComparison>();
        var contributors = new Dictionary<string, CaseContributors>(StringComparer.Ordinal);

        foreach (string name in a.CaseNames.Concat(b.CaseNames.Where(n => !a.Cases.ContainsKey(n))).Where(Wanted))
        {
            LoadReduction? ra = a.Cases.TryGetValue(name, out var accA) ? accA.ResultAt(point) : null;
            LoadReduction? rb = b.Cases.TryGetValue(name, out var accB) ? accB.ResultAt(point) : null;
            CaseComparison c = ra is not null && rb is not null
                ? EquivalenceChecker.Compare(name, EntryKind.Case, ra, rb, tolerance)
                : EquivalenceChecker.Missing(name, EntryKind.Case, ra, rb);
            comparisons.Add(Explain(c, [(a, name, 1.0)], [(b, name, 1.0)]));
            contributors[name] = new CaseContributors(Listed(a, name), Listed(b, name));
        }

        foreach (LoadCombination combination in a.Combinations.Where(c => Wanted(c.Name)))
        {
            var notes = new List<string>();
            string[] absent = combination.Factors.Select(f => f.Key).Where(k => !b.Cases.ContainsKey(k)).ToArray();
            if (absent.Length > 0)
            {
                notes.Add($"the substitute lacks case{(absent.Length > 1 ? "s" : "")} {string.Join(", ", absent)}, so this combination is incomplete there");
            }
            LoadCombination? own = b.Combinations.FirstOrDefault(x => x.Name == combination.Name);
            if (own is not null && !SameFactors(own, combination))
            {
                notes.Add($"the substitute defines '{combination.Name}' as {Factors(own)}; the original's factors {Factors(combination)} were applied to both");
            }
            CaseComparison c = EquivalenceChecker.Compare(combination.Name, EntryKind.Combination,
                combination.Combine(a.Cases, out _).ResultAt(point), combination.Combine(b.Cases, out _).ResultAt(point), tolerance, notes);
            if (absent.Length > 0)
            {
                c = c with { Equivalent = false };
            }
            comparisons.Add(Explain(c,
                combination.Factors.Select(f => (a, f.Key, f.Value)).ToList(),
                combination.Factors.Select(f => (b, f.Key, f.Value)).ToList()));
        }
        foreach (LoadCombination combination in b.Combinations.Where(c => Wanted(c.Name) && a.Combinations.All(x => x.Name != c.Name)))
        {
            comparisons.Add(EquivalenceChecker.Missing(combination.Name, EntryKind.Combination, null, combination.Combine(b.Cases, out _).ResultAt(point)));
        }

        var warnings = new List<string>();
        foreach ((CheckSide side, string role) in new[] { (original, "the original"), (substitute, "the substitute") })
        {
            if (side.Header is { } header && UnitSlipHints.NoUnits($"{role} ({side.Name})", header) is { } hint)
            {
                warnings.Add(hint.Message);
            }
        }
        foreach (UnitHint hint in UnitSlipHints.Find(a.AllCases().ResultAt(point), b.AllCases().ResultAt(point)))
        {
            warnings.Add(hint.Message);
        }
        return new CheckResult(original.Name, substitute.Name, units, point, pointDescription, tolerance, comparisons, contributors)
        {
            Warnings = warnings,
        };
    }

    private static CaseComparison Explain(
        CaseComparison c, IReadOnlyList<(ReductionSink Sink, string Case, double Factor)> original,
        IReadOnlyList<(ReductionSink Sink, string Case, double Factor)> substitute)
    {
        if (c.Residual is null || c.Tolerance is null)
        {
            return c;
        }
        List<ResidualSuspects.Candidate> Candidates(IReadOnlyList<(ReductionSink Sink, string Case, double Factor)> parts, bool fromOriginal, out bool bounded)
        {
            var list = new List<ResidualSuspects.Candidate>();
            bounded = false;
            foreach ((ReductionSink sink, string name, double factor) in parts)
            {
                if (factor == 0 || sink.Contributors(name) is not { } tracker)
                {
                    continue;
                }
                bounded |= sink.ContributorsBounded(name);
                string? caseName = c.Kind == EntryKind.Combination ? name : null;
                foreach (Contributor k in tracker.Forces.Concat(tracker.Couples))
                {
                    list.Add(new ResidualSuspects.Candidate(k, fromOriginal, caseName, factor));
                }
            }
            return list;
        }
        List<ResidualSuspects.Candidate> all = Candidates(original, true, out bool boundedA);
        all.AddRange(Candidates(substitute, false, out bool boundedB));
        return c with { Explanation = ResidualExplanation.For(c, c.Equivalent ? [] : all, boundedA || boundedB) };
    }

    private static List<Contributor> Listed(ReductionSink sink, string name) =>
        sink.Contributors(name) is { } t ? [.. t.Forces.Take(ListedContributors), .. t.Couples.Take(ListedContributors)] : [];

    // A combination is a map from case to factor (a JSON object is unordered): the order written is no conflict.
    private static bool SameFactors(LoadCombination x, LoadCombination y) =>
        x.Factors.Length == y.Factors.Length
        && x.Factors.All(f => y.Factors.Any(g => g.Key == f.Key && g.Value.Equals(f.Value)));

    private static string Factors(LoadCombination c) =>
        string.Join(" + ", c.Factors.Select(f => f.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + "·" + f.Key));
}
