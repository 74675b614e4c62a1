using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Cli;

/// <summary>Passes one reading of a file to several sinks (the reduction and a report's sketch) and counts items for a progress display.</summary>
internal class FanOutSink : ILoadSink
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

/// <summary>
/// A fan-out whose sinks all take reduced blocks (a progress display on the reduction alone), so large CSV
/// files keep the parallel block path.
/// </summary>
internal sealed class BlockFanOutSink : FanOutSink, IReducedBlockSink
{
    private readonly IReducedBlockSink[] _blocks;
    private readonly ProgressDisplay? _progress;

    public BlockFanOutSink(ProgressDisplay? progress, params IReducedBlockSink[] sinks)
        : base(progress, sinks)
    {
        _blocks = sinks;
        _progress = progress;
    }

    public void AddReducedBlock(ReductionAccumulator block, IReadOnlyList<Contributor> largest)
    {
        foreach (IReducedBlockSink s in _blocks)
        {
            s.AddReducedBlock(block, largest);
        }
        _progress?.AddItems(block.Count);
    }
}
