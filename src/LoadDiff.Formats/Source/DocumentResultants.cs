using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Formats.Source;

/// <summary>What each case and each source item of a document applies, as read (in the units the reader was asked for).</summary>
public sealed class DocumentResultants : ILoadSink
{
    private readonly ReductionSink _cases = new();
    private readonly Dictionary<string, List<ItemResultant>> _items = new(StringComparer.Ordinal);
    private List<ItemResultant>? _current;
    private ItemResultant? _item;

    internal DocumentResultants()
    {
    }

    /// <summary>Per-case accumulators and the combinations, as for <c>reduce</c>.</summary>
    public ReductionSink Cases => _cases;

    /// <summary>The items of a case, in file order (the index matches the source case's items).</summary>
    public IReadOnlyList<ItemResultant> Items(string caseName) => _items.TryGetValue(caseName, out var l) ? l : [];

    internal void ItemBegins(int index, string key)
    {
        _item = new ItemResultant(key);
        _current!.Add(_item);
    }

    internal void FileOpened(string fullPath, string display) => _item?.Files.Add((fullPath, display));

    void ILoadSink.Header(DocumentHeader header) => ((ILoadSink)_cases).Header(header);

    void ILoadSink.BeginCase(string name, string? title)
    {
        _cases.BeginCase(name, title);
        _current = [];
        _items[name] = _current;
    }

    void ILoadSink.Item(LoadItem item)
    {
        _cases.Item(item);
        _item!.Add(item);
    }

    void ILoadSink.EndCase()
    {
        _cases.EndCase();
        _current = null;
        _item = null;
    }

    void ILoadSink.Combination(LoadCombination combination) => _cases.Combination(combination);
}
