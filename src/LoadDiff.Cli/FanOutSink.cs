using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Cli;

/// <summary>Passes one reading of a file to several sinks (the reduction and a report's sketch) and counts items for a progress display.</summary>
internal sealed class FanOutSink : ILoadSink
{
    private readonly ILoadSink[] _sinks;
    private readonly ProgressDisplay? _progress;

    public FanOutSink(ProgressDisplay? progress, params ILoadSink[] sinks)
    {
        _progress = progress;
        _sinks = sinks;
    }

    public void Header(DocumentHeader header)
    {
        foreach (ILoadSink s in _sinks)
        {
            s.Header(header);
        }
    }

    public void BeginCase(string name, string? title)
    {
        foreach (ILoadSink s in _sinks)
        {
            s.BeginCase(name, title);
        }
    }

    public void Item(LoadItem item)
    {
        foreach (ILoadSink s in _sinks)
        {
            s.Item(item);
        }
        _progress?.AddItem();
    }

    public void EndCase()
    {
        foreach (ILoadSink s in _sinks)
        {
            s.EndCase();
        }
    }

    public void Combination(LoadCombination combination)
    {
        foreach (ILoadSink s in _sinks)
        {
            s.Combination(combination);
        }
    }
}
