using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Model;

/// <summary>A sink that reduces each case as its items arrive (one accumulator per case) and keeps the combinations.</summary>
public sealed class ReductionSink : IReducedBlockSink
{
    private readonly Dictionary<string, ReductionAccumulator> _cases = new(StringComparer.Ordinal);
    private readonly List<string> _caseOrder = [];
    private readonly Dictionary<string, string?> _titles = new(StringComparer.Ordinal);
    private readonly List<LoadCombination> _combinations = [];
    private readonly Dictionary<string, ContributorTracker> _contributors = new(StringComparer.Ordinal);
    private readonly HashSet<string> _blockCases = new(StringComparer.Ordinal);
    private readonly Func<string, bool>? _caseFilter;
    private readonly int _topContributors;
    private ReductionAccumulator? _current;
    private ContributorTracker? _tracker;

    /// <summary>Creates a sink; items of cases for which <paramref name="caseFilter"/> is false are skipped.</summary>
    /// <param name="caseFilter">Which cases to reduce; all when null.</param>
    /// <param name="topContributors">How many of the largest items to keep per case (0 for none).</param>
    public ReductionSink(Func<string, bool>? caseFilter = null, int topContributors = 0)
    {
        _caseFilter = caseFilter;
        _topContributors = topContributors;
    }

    /// <summary>The largest contributors of a case, when the sink was asked to keep them.</summary>
    public ContributorTracker? Contributors(string caseName) => _contributors.GetValueOrDefault(caseName);

    /// <summary>
    /// True when the kept contributors of a case are not all its items: the tracker was full, or part of the case
    /// arrived as reduced blocks (of which only the largest items are seen).
    /// </summary>
    public bool ContributorsBounded(string caseName) =>
        _blockCases.Contains(caseName) || (_contributors.GetValueOrDefault(caseName)?.Truncated ?? false);

    /// <summary>The header, once read.</summary>
    public DocumentHeader? DocumentHeader { get; private set; }

    /// <summary>Case names in file order.</summary>
    public IReadOnlyList<string> CaseNames => _caseOrder;

    /// <summary>Accumulators by case name.</summary>
    public IReadOnlyDictionary<string, ReductionAccumulator> Cases => _cases;

    /// <summary>Combinations in file order.</summary>
    public IReadOnlyList<LoadCombination> Combinations => _combinations;

    /// <summary>The title of a case, if it has one.</summary>
    public string? CaseTitle(string name) => _titles.GetValueOrDefault(name);

    /// <summary>All cases together, for the document's load centroid and bounding box.</summary>
    public ReductionAccumulator AllCases()
    {
        var all = new ReductionAccumulator();
        foreach (string name in _caseOrder)
        {
            all.AddScaled(_cases[name], 1);
        }
        return all;
    }

    /// <inheritdoc/>
    public void Header(DocumentHeader header) => DocumentHeader = header;

    /// <inheritdoc/>
    public void BeginCase(string name, string? title)
    {
        _current = new ReductionAccumulator();
        _cases[name] = _current;
        _caseOrder.Add(name);
        _titles[name] = title;
        _tracker = null;
        if (_caseFilter is not null && !_caseFilter(name))
        {
            _current = null;
        }
        else if (_topContributors > 0)
        {
            _tracker = new ContributorTracker(_topContributors);
            _contributors[name] = _tracker;
        }
    }

    /// <inheritdoc/>
    public void Item(LoadItem item)
    {
        _current?.Add(item);
        _tracker?.Offer(item);
    }

    /// <inheritdoc/>
    public void AddReducedBlock(ReductionAccumulator block, IReadOnlyList<Contributor> largest)
    {
        Guard.NotNull(block);
        Guard.NotNull(largest);
        _current?.AddScaled(block, 1);
        if (_tracker is not null)
        {
            _blockCases.Add(_caseOrder[^1]);
            foreach (Contributor c in largest)
            {
                _tracker.Offer(c);
            }
        }
    }

    /// <inheritdoc/>
    public void EndCase()
    {
        _current = null;
        _tracker = null;
    }

    /// <inheritdoc/>
    public void Combination(LoadCombination combination) => _combinations.Add(combination);
}
