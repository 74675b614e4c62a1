namespace LoadDiff.Reports.Html;

/// <summary>
/// Bins values at 2-D positions into square cells, in constant memory, without knowing the extent in advance: the
/// grid starts from the first few positions and doubles its cell size (merging 2×2 cells) whenever a position
/// falls outside it. Each cell sums a weight (area), a weighted value (∫p dA) and a count.
/// </summary>
public sealed class CellGrid
{
    /// <summary>Cells along each side.</summary>
    public const int Side = 96;

    private const int PendingLimit = 256;
    private readonly List<(double U, double V, double W, double WP)> _pending = [];
    private double[]? _weight;
    private double[]? _value;
    private long[]? _count;
    private double _u0, _v0, _h;

    /// <summary>How many values were added.</summary>
    public long Count { get; private set; }

    /// <summary>Adds a value at (u, v) with weight <paramref name="weight"/> and weighted value <paramref name="weightedValue"/>.</summary>
    public void Add(double u, double v, double weight, double weightedValue)
    {
        Count++;
        if (_count is null)
        {
            _pending.Add((u, v, weight, weightedValue));
            if (_pending.Count >= PendingLimit)
            {
                Start();
            }
            return;
        }
        Bin(u, v, weight, weightedValue);
    }

    /// <summary>The occupied cells: lower-left corner, side, summed weight, summed weighted value and count.</summary>
    public IEnumerable<GridCell> Cells()
    {
        if (_count is null)
        {
            if (_pending.Count == 0)
            {
                return [];
            }
            Start();
        }
        return Occupied();
    }

    private IEnumerable<GridCell> Occupied()
    {
        for (int j = 0; j < Side; j++)
        {
            for (int i = 0; i < Side; i++)
            {
                int k = (j * Side) + i;
                if (_count![k] > 0)
                {
                    yield return new GridCell(_u0 + (i * _h), _v0 + (j * _h), _h, _weight![k], _value![k], _count[k]);
                }
            }
        }
    }

    private void Start()
    {
        double umin = _pending.Min(p => p.U), umax = _pending.Max(p => p.U);
        double vmin = _pending.Min(p => p.V), vmax = _pending.Max(p => p.V);
        double extent = Math.Max(umax - umin, vmax - vmin);
        double scale = Math.Max(Math.Max(Math.Abs(umin), Math.Abs(umax)), Math.Max(Math.Abs(vmin), Math.Abs(vmax)));
        // Start with the first positions filling half the grid, so it rarely needs to grow.
        _h = extent > 0 ? extent / (Side / 2) : Math.Max(scale * 1e-9, 1e-9);
        _u0 = ((umin + umax) / 2) - (_h * Side / 2);
        _v0 = ((vmin + vmax) / 2) - (_h * Side / 2);
        _weight = new double[Side * Side];
        _value = new double[Side * Side];
        _count = new long[Side * Side];
        foreach (var p in _pending)
        {
            Bin(p.U, p.V, p.W, p.WP);
        }
        _pending.Clear();
        _pending.TrimExcess();
    }

    private void Bin(double u, double v, double w, double wp)
    {
        while (!Inside(u, _u0) || !Inside(v, _v0))
        {
            Grow(u, v);
        }
        int i = Math.Clamp((int)Math.Floor((u - _u0) / _h), 0, Side - 1);
        int j = Math.Clamp((int)Math.Floor((v - _v0) / _h), 0, Side - 1);
        int k = (j * Side) + i;
        _weight![k] += w;
        _value![k] += wp;
        _count![k]++;
    }

    private bool Inside(double x, double origin) => x >= origin && x < origin + (_h * Side);

    private void Grow(double u, double v)
    {
        // Extend towards the position: the old grid becomes one half of the new one along each axis.
        int shiftU = u < _u0 + (_h * Side / 2) ? Side : 0;
        int shiftV = v < _v0 + (_h * Side / 2) ? Side : 0;
        var weight = new double[Side * Side];
        var value = new double[Side * Side];
        var count = new long[Side * Side];
        for (int j = 0; j < Side; j++)
        {
            for (int i = 0; i < Side; i++)
            {
                int k = (j * Side) + i;
                if (_count![k] == 0)
                {
                    continue;
                }
                int n = (((j + shiftV) / 2) * Side) + ((i + shiftU) / 2);
                weight[n] += _weight![k];
                value[n] += _value![k];
                count[n] += _count[k];
            }
        }
        _u0 -= shiftU * _h;
        _v0 -= shiftV * _h;
        _h *= 2;
        (_weight, _value, _count) = (weight, value, count);
    }
}

/// <summary>One occupied cell of a <see cref="CellGrid"/>.</summary>
/// <param name="U">Lower bound along the view's right axis (length units).</param>
/// <param name="V">Lower bound along the view's up axis.</param>
/// <param name="Size">Side of the square cell.</param>
/// <param name="Weight">Summed weight (true area for mesh cells).</param>
/// <param name="WeightedValue">Summed weighted value (∫p dA for mesh cells).</param>
/// <param name="Count">How many values fell in the cell.</param>
public readonly record struct GridCell(double U, double V, double Size, double Weight, double WeightedValue, long Count);
