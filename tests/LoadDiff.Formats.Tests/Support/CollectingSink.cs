using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Formats.Tests.Support;

/// <summary>A sink that keeps everything a reader delivers, in order, for tests to inspect.</summary>
public sealed class CollectingSink : ILoadSink
{
    private readonly List<CollectedCase> _cases = [];
    private readonly List<LoadCombination> _combinations = [];
    private readonly List<string> _events = [];
    private CollectedCase? _current;

    public DocumentHeader? DocumentHeader { get; private set; }

    public IReadOnlyList<CollectedCase> Cases => _cases;

    public IReadOnlyList<LoadCombination> Combinations => _combinations;

    /// <summary>The calls received, such as <c>header</c>, <c>begin dead</c>, <c>item p1</c>, <c>end</c>, <c>combination uls</c>.</summary>
    public IReadOnlyList<string> Events => _events;

    public CollectedCase Case(string name) => _cases.Single(c => c.Name == name);

    public void Header(DocumentHeader header)
    {
        Assert.Null(DocumentHeader);
        DocumentHeader = header;
        _events.Add("header");
    }

    public void BeginCase(string name, string? title)
    {
        Assert.Null(_current);
        _current = new CollectedCase(name, title);
        _cases.Add(_current);
        _events.Add("begin " + name);
    }

    public void Item(LoadItem item)
    {
        Assert.NotNull(_current);
        _current.Items.Add(item);
        _events.Add("item " + item.Id);
    }

    public void EndCase()
    {
        Assert.NotNull(_current);
        _current = null;
        _events.Add("end");
    }

    public void Combination(LoadCombination combination)
    {
        Assert.Null(_current);
        _combinations.Add(combination);
        _events.Add("combination " + combination.Name);
    }
}

/// <summary>One case as delivered.</summary>
public sealed record CollectedCase(string Name, string? Title)
{
    public List<LoadItem> Items { get; } = [];

    public T Item<T>(string id)
        where T : LoadItem => Assert.IsType<T>(Items.Single(i => i.Id == id));
}
