using LoadDiff.Core.Loads;

namespace LoadDiff.Core.Sections;

/// <summary>The items of one load case with the factor it carries in a combination (1 for the case itself).</summary>
/// <param name="Items">The case's items.</param>
/// <param name="Factor">Load factor.</param>
public sealed record WeightedItems(IReadOnlyList<LoadItem> Items, double Factor);
