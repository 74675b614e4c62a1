using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Model;

/// <summary>
/// A sink that keeps every item in memory, case by case, for the commands that need the items themselves
/// (section cuts, distribution) rather than a running reduction. Memory grows with the number of items.
/// </summary>
public sealed class CollectingSink : ILoadSink
{
    private readonly Dictionary<string, List<LoadItem>> _cases = new(StringComparer.Ordinal);
    private readonly List<string> _caseOrder = [];
    private readonly Dictionary<string, string?> _titles = new(StringComparer.Ordinal);
    private readonly List<LoadCombination> _combinations = [];
    private List<LoadItem>? _current;

    /// <summary>The header, once read.</summary>
    public DocumentHeader? DocumentHeader { get; private set; }

    /// <summary>Case names in file order.</summary>
    public IReadOnlyList<string> CaseNames => _caseOrder;

    /// <summary>Combinations in file order.</summary>
    public IReadOnlyList<LoadCombination> Combinations => _combinations;

    /// <summary>The items of a case in file order.</summary>
    /// <exception cref="KeyNotFoundException">No such case.</exception>
    public IReadOnlyList<LoadItem> Items(string caseName) => _cases[caseName];

    /// <summary>True when the file has a case of this name.</summary>
    public bool HasCase(string caseName) => _cases.ContainsKey(caseName);

    /// <summary>The title of a case, if it has one.</summary>
    public string? CaseTitle(string name) => _titles.GetValueOrDefault(name);

    /// <inheritdoc/>
    public void Header(DocumentHeader header) => DocumentHeader = header;

    /// <inheritdoc/>
    public void BeginCase(string name, string? title)
    {
        _current = [];
        _cases[name] = _current;
        _caseOrder.Add(name);
        _titles[name] = title;
    }

    /// <inheritdoc/>
    public void Item(LoadItem item) => _current?.Add(item);

    /// <inheritdoc/>
    public void EndCase() => _current = null;

    /// <inheritdoc/>
    public void Combination(LoadCombination combination) => _combinations.Add(combination);
}
