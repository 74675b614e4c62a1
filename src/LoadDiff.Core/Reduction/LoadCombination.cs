using System.Collections.Immutable;

namespace LoadDiff.Core.Reduction;

/// <summary>A load combination: a factored sum of load cases, Σ γ_k · case_k.</summary>
/// <param name="Name">Combination name.</param>
/// <param name="Factors">Case names and their load factors, in the order given.</param>
public sealed record LoadCombination(string Name, ImmutableArray<KeyValuePair<string, double>> Factors)
{
    /// <summary>Combines reduced cases into one accumulator; a case missing from <paramref name="cases"/> is reported in <paramref name="missing"/>.</summary>
    public ReductionAccumulator Combine(IReadOnlyDictionary<string, ReductionAccumulator> cases, out IReadOnlyList<string> missing)
    {
        Guard.NotNull(cases);
        var result = new ReductionAccumulator();
        var absent = new List<string>();
        foreach (KeyValuePair<string, double> f in Factors)
        {
            if (cases.TryGetValue(f.Key, out ReductionAccumulator? acc))
            {
                result.AddScaled(acc, f.Value);
            }
            else
            {
                absent.Add(f.Key);
            }
        }
        missing = absent;
        return result;
    }

    /// <inheritdoc/>
    public bool Equals(LoadCombination? other) =>
        other is not null && Name == other.Name && Factors.SequenceEqual(other.Factors);

    /// <inheritdoc/>
    public override int GetHashCode()
    {
        var h = new HashCode();
        h.Add(Name);
        foreach (KeyValuePair<string, double> f in Factors)
        {
            h.Add(f.Key);
            h.Add(f.Value);
        }
        return h.ToHashCode();
    }

    /// <inheritdoc/>
    public override string ToString() =>
        Name + " = " + string.Join(" + ", Factors.Select(f => f.Value.ToString("R", System.Globalization.CultureInfo.InvariantCulture) + "·" + f.Key));
}
