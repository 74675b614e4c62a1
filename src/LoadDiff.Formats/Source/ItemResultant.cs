using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Reduction;

namespace LoadDiff.Formats.Source;

/// <summary>
/// The load one source item applies, as the reader delivered it (in the units asked for): the single Core item for
/// force, couple, line, area and mass, or the reduction of every row for mesh and forces items (their CSV data).
/// </summary>
public sealed class ItemResultant
{
    private readonly ReductionAccumulator _rows = new();
    private LoadItem? _single;
    private long _count;

    internal ItemResultant(string key)
    {
        Key = key;
    }

    /// <summary>The id the reader used: the given one, or the derived key starting with <c>~</c>.</summary>
    public string Key { get; }

    /// <summary>The item's exact contribution (force, and moment about <paramref name="point"/>); Core's <see cref="LoadItem.ContributionAbout"/> for a single item.</summary>
    public (Vector3 Force, Vector3 Moment) ContributionAbout(Vector3 point)
    {
        if (_count == 1 && _single is not null)
        {
            Contribution c = _single.ContributionAbout(point);
            return (c.Force, c.Moment);
        }
        LoadReduction r = _rows.ResultAt(point);
        return (r.Force, r.Moment);
    }

    internal void Add(LoadItem item)
    {
        _count++;
        _single = _count == 1 ? item : null;
        _rows.Add(item);
    }
}
