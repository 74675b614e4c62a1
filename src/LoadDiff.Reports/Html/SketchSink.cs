using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Reports.Html;

/// <summary>
/// A load sink that keeps a bounded sketch of every case for the drawings of an HTML report. It can be fed beside
/// the reducing sink in the same pass; memory stays bounded however many items a file holds.
/// </summary>
public sealed class SketchSink : ILoadSink
{
    private readonly Dictionary<string, SystemSketch> _cases = new(StringComparer.Ordinal);
    private SystemSketch? _current;

    /// <summary>The sketch of a case, if the file had it.</summary>
    public SystemSketch? Case(string name) => _cases.GetValueOrDefault(name);

    /// <inheritdoc/>
    public void Header(DocumentHeader header)
    {
    }

    /// <inheritdoc/>
    public void BeginCase(string name, string? title)
    {
        _current = new SystemSketch();
        _cases[name] = _current;
    }

    /// <inheritdoc/>
    /// <remarks>Items of zero magnitude are dropped by <see cref="SystemSketch.Add"/>: they are neither drawn nor widen a drawing.</remarks>
    public void Item(LoadItem item) => _current?.Add(item);

    /// <inheritdoc/>
    public void EndCase() => _current = null;

    /// <inheritdoc/>
    public void Combination(LoadCombination combination)
    {
    }
}
