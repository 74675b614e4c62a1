using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Core.Tests.Support;

public static class Reduce
{
    /// <summary>Reduces the items, in order, about <paramref name="point"/>.</summary>
    public static LoadReduction About(Vector3 point, params IEnumerable<LoadItem> items)
    {
        var acc = new ReductionAccumulator();
        foreach (LoadItem item in items)
        {
            acc.Add(item);
        }
        return acc.ResultAt(point);
    }

    public static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);
}
