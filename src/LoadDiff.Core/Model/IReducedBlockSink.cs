using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Model;

/// <summary>
/// A sink that can take a block of items already reduced (a chunk of a large CSV file parsed on another
/// thread) instead of the items one by one. Readers use it when the sink offers it; blocks arrive in file order.
/// </summary>
public interface IReducedBlockSink : ILoadSink
{
    /// <summary>Adds a reduced block to the current case, with the block's largest items for the reviewer.</summary>
    void AddReducedBlock(ReductionAccumulator block, IReadOnlyList<Contributor> largest);
}
