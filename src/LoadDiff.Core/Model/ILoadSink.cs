using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Model;

/// <summary>
/// Receives a load description as a reader walks it: the header, then each case's items one at a time,
/// then the combinations. Reductions hold constant memory this way; a collecting sink builds a document.
/// </summary>
public interface ILoadSink
{
    /// <summary>Called once, before any case.</summary>
    void Header(DocumentHeader header);

    /// <summary>Starts a load case.</summary>
    void BeginCase(string name, string? title);

    /// <summary>One item of the current case.</summary>
    void Item(LoadItem item);

    /// <summary>Ends the current case.</summary>
    void EndCase();

    /// <summary>A combination, after all cases.</summary>
    void Combination(LoadCombination combination);
}
