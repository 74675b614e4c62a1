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
    private ulong _digestSum;
    private ulong _digestMix;

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

    /// <summary>
    /// A digest of the rows themselves, independent of their order: two items whose referenced data differ in any row
    /// (a force moved along its line, two forces moved apart symmetrically) differ here even where their resultants agree.
    /// Each row contributes a 64-bit FNV-1a hash of its kind, id, geometry and exact contribution about the origin.
    /// </summary>
    public (ulong Sum, ulong Mix, long Count) RowDigest => (_digestSum, _digestMix, _count);

    /// <summary>The CSV files the item's data came from, in the order the reader opened them (full path, display name).</summary>
    internal List<(string FullPath, string Display)> Files { get; } = [];

    internal void Add(LoadItem item)
    {
        _count++;
        _single = _count == 1 ? item : null;
        _rows.Add(item);
        ulong h = RowHash(item);
        _digestSum += h;
        _digestMix ^= (h * 0x9E3779B97F4A7C15UL) ^ (h >> 29);
    }

    private static ulong RowHash(LoadItem item)
    {
        ulong h = 14695981039346656037UL;
        void Byte(ulong b) => h = (h ^ b) * 1099511628211UL;
        void Double(double d)
        {
            ulong bits = (ulong)BitConverter.DoubleToInt64Bits(d);
            for (int k = 0; k < 8; k++)
            {
                Byte((bits >> (8 * k)) & 0xFF);
            }
        }
        void Vector(Vector3 v)
        {
            Double(v.X);
            Double(v.Y);
            Double(v.Z);
        }
        Byte((ulong)item.Kind);
        foreach (char ch in item.Id)
        {
            Byte(ch & 0xFFu);
            Byte((ulong)ch >> 8);
        }
        item.VisitGeometry(Vector);
        Contribution c = item.ContributionAbout(Vector3.Zero);
        Vector(c.Force);
        Vector(c.Moment);
        Double(c.GrossForce);
        Vector(c.GrossFirstMoment);
        Double(c.GrossCouple);
        return h;
    }
}
