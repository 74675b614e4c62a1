using System.Globalization;
using LoadDiff.Core.Model;

namespace LoadDiff.Core.Sections;

/// <summary>
/// The section-cut gate over every compared case and combination (see <see cref="SectionGateCase"/> for the rule); it
/// passes when each of them does.
/// </summary>
/// <param name="Axis">The cut axis.</param>
/// <param name="RelativeTolerance">The allowed deviation as a fraction of each original's peak cut moment.</param>
/// <param name="Cases">The verdict per case and combination, in the order given.</param>
public sealed record SectionGateVerdict(SectionAxis Axis, double RelativeTolerance, IReadOnlyList<SectionGateCase> Cases)
{
    /// <summary>True when every case and combination passes (also when there are none).</summary>
    public bool Passes => Cases.All(c => c.Passes);

    /// <summary>The gate on each comparison with one relative tolerance.</summary>
    /// <exception cref="ArgumentException">The tolerance is negative or not finite, or a comparison is along another axis.</exception>
    public static SectionGateVerdict Evaluate(
        SectionAxis axis, double relativeTolerance, IEnumerable<(string Name, EntryKind Kind, SectionComparison Comparison)> comparisons)
    {
        Guard.NotNull(axis);
        Guard.NotNull(comparisons);
        Guard.That(double.IsFinite(relativeTolerance) && relativeTolerance >= 0,
            "The relative tolerance must be a finite number of at least 0.", nameof(relativeTolerance));
        var cases = new List<SectionGateCase>();
        foreach ((string name, EntryKind kind, SectionComparison c) in comparisons)
        {
            Guard.NotNull(c);
            Guard.That(c.Axis == axis, $"The comparison of '{name}' is along another axis.", nameof(comparisons));
            cases.Add(SectionGateCase.Evaluate(name, kind, c, relativeTolerance));
        }
        return new SectionGateVerdict(axis, relativeTolerance, cases);
    }

    /// <inheritdoc/>
    public override string ToString() => string.Create(CultureInfo.InvariantCulture,
        $"section-cut gate along {Axis}, rel {RelativeTolerance:R}: {(Passes ? "PASS" : "FAIL")} ({Cases.Count(c => !c.Passes)} of {Cases.Count} fail)");
}
