using LoadDiff.Core;
using LoadDiff.Core.Loads;
using LoadDiff.Reports.Html;

namespace LoadDiff.Reports.Tests;

public class SketchTests
{
    [Fact]
    public void The_sketch_keeps_the_largest_forces_of_many_and_counts_them_all()
    {
        var s = new SystemSketch();
        // Magnitudes 1 … 10 000 kN in a scrambled order (7919 is prime, so i·7919 mod 10 007 visits every residue once).
        for (int i = 1; i <= 10_000; i++)
        {
            int m = (int)((long)i * 7919 % 10_007);
            if (m == 0 || m > 10_000)
            {
                continue;
            }
            s.Add(new PointForce("f" + m, Vector3.Create(m % 100, m / 100, 0), Vector3.Create(0, 0, -m)));
        }
        Assert.Equal(SystemSketch.ForceLimit, s.Forces.Count);
        Assert.Equal(Enumerable.Range(10_001 - SystemSketch.ForceLimit, SystemSketch.ForceLimit).Reverse().Select(m => (double)m),
            s.Forces.Select(f => f.Value.Length));
        Assert.Equal(s.ForceCount, s.ForceCells(SketchView.Plan)!.Cells().Sum(c => c.Count));
    }

    [Fact]
    public void Mesh_cells_conserve_area_and_integrated_pressure_and_stay_bounded()
    {
        var s = new SystemSketch();
        double area = 0, integral = 0;
        // A 200 × 100 grid of right triangles, 0.5 m legs, at z = 3, on a spread of 100 m × 50 m (exact binary fractions).
        for (int i = 0; i < 200; i++)
        {
            for (int j = 0; j < 100; j++)
            {
                Vector3 a = Vector3.Create(i * 0.5, j * 0.5, 3), b = a + Vector3.Create(0.5, 0, 0), c = a + Vector3.Create(0, 0.5, 0);
                double pa = i, pb = i + 1, pc = j;
                s.Add(new MeshTriangle("roof", a, b, c, pa, pb, pc, null));
                area += 0.125;
                integral += 0.125 * (pa + pb + pc) / 3;
            }
        }
        Assert.Null(s.Triangles);
        Assert.Equal(20_000, s.TriangleCount);
        foreach (SketchView v in (SketchView[])[SketchView.Plan, SketchView.ElevationXZ, SketchView.ElevationYZ])
        {
            var cells = s.MeshCells(v)!.Cells().ToList();
            Assert.InRange(cells.Count, 1, CellGrid.Side * CellGrid.Side);
            Assert.Equal(area, cells.Sum(c => c.Weight), 1e-9 * area);
            Assert.Equal(integral, cells.Sum(c => c.WeightedValue), 1e-9 * integral);
            Assert.Equal(20_000, cells.Sum(c => c.Count));
        }
    }

    [Fact]
    public void Cell_grid_grows_to_hold_every_position_and_places_each_in_its_cell()
    {
        var g = new CellGrid();
        var points = new List<(double U, double V)>();
        for (int k = 0; k < 1000; k++)
        {
            // Spreads outwards in both directions, forcing the grid to grow many times.
            double r = k * k * 0.01;
            points.Add((k % 2 == 0 ? r : -r, k % 3 == 0 ? r / 2 : -r / 3));
        }
        foreach (var (u, v) in points)
        {
            g.Add(u, v, 1, 0);
        }
        var cells = g.Cells().ToList();
        Assert.Equal(1000, cells.Sum(c => c.Count));
        foreach (var (u, v) in points)
        {
            Assert.Contains(cells, c => u >= c.U && u <= c.U + c.Size && v >= c.V && v <= c.V + c.Size);
        }
    }

    [Fact]
    public void Items_of_zero_magnitude_are_neither_drawn_nor_counted_nor_widen_a_cell_grid()
    {
        // SPEC §4: an item whose gross magnitude is zero (a zero nodal force, a line, area or mesh of zero intensity,
        // a zero couple or mass) is no loaded geometry.
        LoadItem[] loaded =
        [
            new PointForce("P1", Vector3.Create(0, 0, 0), Vector3.Create(0, 0, -10)),
            new PointForce("P2", Vector3.Create(2, 0, 0), Vector3.Create(0, 0, -10)),
        ];
        LoadItem[] zero =
        [
            new PointForce("Z", Vector3.Create(1000, 0, 0), Vector3.Zero),
            new PointMass("M", Vector3.Create(-1000, 50, 0), 0, Vector3.Create(0, 0, -9.80665)),
            new LineLoad("ZL", Vector3.Create(998, 0, 0), Vector3.Create(1000, 0, 0), Vector3.Zero, Vector3.Zero),
            new AreaLoad("ZA", [Vector3.Create(500, 500, 0), Vector3.Create(501, 500, 0), Vector3.Create(501, 501, 0)], 0, null, Vector3.Zero, Vector3.Zero),
            new MeshTriangle("ZT", Vector3.Create(700, 0, 0), Vector3.Create(701, 0, 0), Vector3.Create(700, 1, 0), 0, 0, 0, null),
            new FreeCouple("ZC", Vector3.Zero),
        ];
        Assert.All(zero, z => Assert.False(z.IsLoaded, z.Id));
        var plain = new SystemSketch();
        var withZero = new SystemSketch();
        foreach (LoadItem item in loaded)
        {
            plain.Add(item);
        }
        foreach (LoadItem item in zero.Concat(loaded).Concat(zero))
        {
            withZero.Add(item);
        }
        Assert.Equal(2, withZero.ForceCount);
        Assert.Equal(0, withZero.LineCount + withZero.AreaCount + withZero.TriangleCount + withZero.CoupleCount);
        Assert.Equal(["P1", "P2"], withZero.Forces.Select(f => f.Id).Order());
        Assert.Empty(withZero.Lines);
        Assert.Empty(withZero.Areas);
        Assert.Empty(withZero.Triangles!);
        Assert.Null(withZero.MeshCells(SketchView.Plan));
        foreach (SketchView v in (SketchView[])[SketchView.Plan, SketchView.ElevationXZ, SketchView.ElevationYZ])
        {
            // The same cells as without the zero items: the grid did not grow towards x = ±1000.
            Assert.Equal(plain.ForceCells(v)!.Cells(), withZero.ForceCells(v)!.Cells());
        }
    }
}
