using LoadDiff.Core;
using LoadDiff.Core.Loads;

namespace LoadDiff.Reports.Html;

/// <summary>A point force to draw (a mass is drawn as its weight).</summary>
/// <param name="Id">Item id.</param>
/// <param name="At">Point of application (length units).</param>
/// <param name="Value">Force vector (force units).</param>
/// <param name="Kind">Force or mass.</param>
public sealed record SketchForce(string Id, Vector3 At, Vector3 Value, LoadKind Kind);

/// <summary>
/// A bounded sample of one load case of one file, enough to draw it: the largest point forces, couples, line loads
/// and areas, the mesh triangles while they are few, and binned cells (per view) of mesh pressure and of the
/// positions of all point forces. Memory does not grow with the number of items.
/// </summary>
public sealed class SystemSketch
{
    /// <summary>Point forces drawn as arrows (the largest).</summary>
    public const int ForceLimit = 40;

    /// <summary>Couples drawn (the largest).</summary>
    public const int CoupleLimit = 12;

    /// <summary>Line loads drawn (the largest by ∫|w|).</summary>
    public const int LineLimit = 60;

    /// <summary>Area loads drawn (the largest by ∫|p| dA).</summary>
    public const int AreaLimit = 60;

    /// <summary>Mesh triangles drawn one by one; more are drawn as binned cells.</summary>
    public const int TriangleLimit = 400;

    private readonly TopList<SketchForce> _forces = new(ForceLimit);
    private readonly TopList<FreeCouple> _couples = new(CoupleLimit);
    private readonly TopList<LineLoad> _lines = new(LineLimit);
    private readonly TopList<AreaLoad> _areas = new(AreaLimit);
    private List<MeshTriangle>? _triangles = [];
    private CellGrid[]? _meshCells;
    private CellGrid[]? _forceCells;

    /// <summary>Point forces and masses of non-zero magnitude seen.</summary>
    public long ForceCount => _forces.Seen;

    /// <summary>Couples of non-zero magnitude seen.</summary>
    public long CoupleCount => _couples.Seen;

    /// <summary>Line loads of non-zero intensity seen.</summary>
    public long LineCount => _lines.Seen;

    /// <summary>Area loads of non-zero pressure seen.</summary>
    public long AreaCount => _areas.Seen;

    /// <summary>Mesh triangles of non-zero pressure seen.</summary>
    public long TriangleCount { get; private set; }

    /// <summary>Largest |F| of any point force or weight.</summary>
    public double MaxForce { get; private set; }

    /// <summary>Largest |C| of any couple.</summary>
    public double MaxCouple { get; private set; }

    /// <summary>Largest intensity |w| at either end of any line load.</summary>
    public double MaxLineIntensity { get; private set; }

    /// <summary>Largest |p| at any vertex of an area or mesh triangle.</summary>
    public double MaxPressure { get; private set; }

    /// <summary>The largest point forces, largest first.</summary>
    public IReadOnlyList<SketchForce> Forces => _forces.Largest();

    /// <summary>The largest couples, largest first.</summary>
    public IReadOnlyList<FreeCouple> Couples => _couples.Largest();

    /// <summary>The largest line loads.</summary>
    public IReadOnlyList<LineLoad> Lines => _lines.Largest();

    /// <summary>The largest area loads.</summary>
    public IReadOnlyList<AreaLoad> Areas => _areas.Largest();

    /// <summary>Every mesh triangle while there are at most <see cref="TriangleLimit"/>; null when there were more.</summary>
    public IReadOnlyList<MeshTriangle>? Triangles => _triangles;

    /// <summary>Binned mesh pressure in a view (weight = true area, value = ∫p dA); null without a mesh.</summary>
    public CellGrid? MeshCells(SketchView view) => _meshCells?[(int)view];

    /// <summary>Binned positions of all point forces in a view; null without point forces.</summary>
    public CellGrid? ForceCells(SketchView view) => _forceCells?[(int)view];

    /// <summary>
    /// Takes one item into the sample. An item of zero magnitude (<see cref="LoadItem.IsLoaded"/> false: a zero nodal force,
    /// a line or area of zero intensity) is no load: it is not drawn, not counted and places nothing in a cell grid.
    /// </summary>
    public void Add(LoadItem item)
    {
        ArgumentNullException.ThrowIfNull(item);
        if (!item.IsLoaded)
        {
            return;
        }
        switch (item)
        {
            case PointForce f:
                AddForce(new SketchForce(f.Id, f.At, f.Value, LoadKind.Force));
                break;
            case PointMass m:
                AddForce(new SketchForce(m.Id, m.At, m.Weight, LoadKind.Mass));
                break;
            case FreeCouple c:
                MaxCouple = Math.Max(MaxCouple, c.Value.Length);
                _couples.Offer(c, c.Value.Length);
                break;
            case LineLoad l:
                MaxLineIntensity = Math.Max(MaxLineIntensity, Math.Max(l.StartIntensity.Length, l.EndIntensity.Length));
                _lines.Offer(l, l.ContributionAbout(l.From).GrossForce);
                break;
            case AreaLoad a:
                foreach (Vector3 v in a.Polygon)
                {
                    MaxPressure = Math.Max(MaxPressure, Math.Abs(a.PressureAt(v)));
                }
                _areas.Offer(a, a.ContributionAbout(a.Polygon[0]).GrossForce);
                break;
            case MeshTriangle t:
                AddTriangle(t);
                break;
        }
    }

    private void AddForce(SketchForce f)
    {
        double size = f.Value.Length;
        MaxForce = Math.Max(MaxForce, size);
        _forces.Offer(f, size);
        _forceCells ??= NewGrids();
        foreach (SketchView view in ViewAxes.All)
        {
            (double u, double v) = ViewAxes.Project(view, f.At);
            _forceCells[(int)view].Add(u, v, size, 0);
        }
    }

    private void AddTriangle(MeshTriangle t)
    {
        TriangleCount++;
        MaxPressure = Math.Max(MaxPressure, Math.Max(Math.Abs(t.PressureA), Math.Max(Math.Abs(t.PressureB), Math.Abs(t.PressureC))));
        if (_triangles is not null)
        {
            _triangles.Add(t);
            if (_triangles.Count > TriangleLimit)
            {
                _triangles = null;
            }
        }
        double area = Vector3.Cross(t.B - t.A, t.C - t.A).Length / 2;
        double mean = (t.PressureA + t.PressureB + t.PressureC) / 3;
        Vector3 centroid = (t.A + t.B + t.C) / 3;
        _meshCells ??= NewGrids();
        foreach (SketchView view in ViewAxes.All)
        {
            (double u, double v) = ViewAxes.Project(view, centroid);
            _meshCells[(int)view].Add(u, v, area, area * mean);
        }
    }

    private static CellGrid[] NewGrids() => [new CellGrid(), new CellGrid(), new CellGrid()];
}
