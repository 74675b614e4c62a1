using LoadDiff.Core.Loads;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Tests.Support;

namespace LoadDiff.Formats.Tests;

// Unit conversion on input. The factors are built here from the exact definitions published in
// NIST SP 811 (2008) Appendix B.8: 1 lb = 0.45359237 kg, g_n = 9.80665 m/s², 1 lbf = 1 lb × g_n,
// 1 kip = 1000 lbf, 1 ft = 0.3048 m, 1 in = 0.0254 m.
public sealed partial class LoadFileReaderTests
{
    private const double Pound = 0.45359237;         // kg, NIST SP 811 (2008) Appendix B.8
    private const double StandardGravity = 9.80665;  // m/s², NIST SP 811 (2008) Appendix B.8
    private const double Foot = 0.3048;              // m, NIST SP 811 (2008) Appendix B.8
    private const double Inch = 0.0254;              // m, NIST SP 811 (2008) Appendix B.8
    private static readonly double PoundForce = Pound * StandardGravity;   // N
    private static readonly double KipInKilonewtons = 1000 * PoundForce / 1000; // 1000 lbf, in kN

    private static readonly UnitSystem KilonewtonMetre = new(UnitCatalog.Kilonewton, UnitCatalog.Metre, UnitCatalog.Kilogram);

    private const string KipFootFile = """
        { "units": { "force": "kip", "length": "ft", "mass": "lb" },
          "points": { "A": [10, 20, 30] },
          "cases": { "dead": { "loads": [
            { "id": "p", "kind": "force", "at": [1, 2, 3], "value": [4, 5, 6] },
            { "id": "q", "kind": "force", "at": "A", "value": [0, 0, -1] },
            { "id": "c", "kind": "couple", "value": [7, 8, 9] },
            { "id": "w", "kind": "line", "from": [0, 0, 0], "to": [20, 0, 0], "start": [0, 0, -0.5], "end": [0, 0, -1.5] },
            { "id": "a", "kind": "area", "polygon": [[0, 0, 0], [10, 0, 0], [10, 8, 0]], "pressure": 0.25,
              "gradient": [0, 0, -0.0624], "origin": [0, 0, 12] },
            { "id": "m", "kind": "mass", "at": [5, 5, 5], "value": 1000 } ] } } }
        """;

    [Fact]
    public void Read_kip_foot_file_in_kN_m_converts_every_quantity_by_the_exact_factor()
    {
        CollectingSink sink = Read(KipFootFile, new ReadOptions { TargetUnits = KilonewtonMetre });
        Assert.Equal("kip, ft, lb", sink.DocumentHeader!.SourceUnits.ToString());
        Assert.Equal(KilonewtonMetre, sink.DocumentHeader.Units);
        double force = KipInKilonewtons, length = Foot;
        CollectedCase dead = sink.Case("dead");

        PointForce p = dead.Item<PointForce>("p");
        AssertRelative(V(1 * length, 2 * length, 3 * length), p.At);
        AssertRelative(V(4 * force, 5 * force, 6 * force), p.Value);
        AssertRelative(V(10 * length, 20 * length, 30 * length), sink.DocumentHeader.Points["A"]);
        AssertRelative(V(10 * length, 20 * length, 30 * length), dead.Item<PointForce>("q").At);

        AssertRelative(V(7 * force * length, 8 * force * length, 9 * force * length), dead.Item<FreeCouple>("c").Value);

        LineLoad w = dead.Item<LineLoad>("w");
        AssertRelative(V(20 * length, 0, 0), w.To);
        AssertRelative(V(0, 0, -0.5 * force / length), w.StartIntensity);
        AssertRelative(V(0, 0, -1.5 * force / length), w.EndIntensity);

        AreaLoad a = dead.Item<AreaLoad>("a");
        AssertRelative(V(10 * length, 8 * length, 0), a.Polygon[2]);
        AssertRelative(0.25 * force / (length * length), a.Pressure);
        AssertRelative(V(0, 0, -0.0624 * force / (length * length * length)), a.Gradient);
        AssertRelative(V(0, 0, 12 * length), a.Origin);

        PointMass m = dead.Item<PointMass>("m");
        AssertRelative(1000 * Pound, m.Mass);
        AssertRelative(V(5 * length, 5 * length, 5 * length), m.At);
        // Default gravity g_n in kN per kg: 9.80665 / 1000.
        AssertRelative(V(0, 0, -StandardGravity / 1000), m.Gravity);
        // By the definition of the pound-force, 1000 lb under standard gravity weighs exactly 1 kip.
        AssertRelative(-KipInKilonewtons, m.Weight.Z);
    }

    [Fact]
    public void Read_kip_foot_file_without_target_units_keeps_the_file_units()
    {
        CollectingSink sink = Read(KipFootFile);
        Assert.Equal(sink.DocumentHeader!.SourceUnits, sink.DocumentHeader.Units);
        CollectedCase dead = sink.Case("dead");
        Assert.Equal(new PointForce("p", V(1, 2, 3), V(4, 5, 6)), dead.Item<PointForce>("p"));
        PointMass m = dead.Item<PointMass>("m");
        Assert.Equal(1000, m.Mass);
        // In kip per lb, standard gravity is 1 lbf/lb = 0.001 kip/lb by the definition of the pound-force.
        AssertRelative(V(0, 0, -0.001), m.Gravity);
        AssertRelative(-1, m.Weight.Z);
    }

    [Fact]
    public void Read_mass_in_lb_with_gravity_in_ft_per_s2_converts_the_gravity()
    {
        // 32.174 ft/s² is the customary rounded value of g_n in feet (common practice, no source); 0.3048 m/ft exact.
        CollectingSink sink = Read("""
            { "units": { "force": "lbf", "length": "ft", "mass": "lb" }, "gravity": [0, 0, -32.174],
              "cases": { "tank": { "loads": [ { "id": "water", "kind": "mass", "at": [0, 0, 0], "value": 500 } ] } } }
            """,
            new ReadOptions { TargetUnits = UnitSystem.Si });
        PointMass m = sink.Case("tank").Item<PointMass>("water");
        AssertRelative(500 * Pound, m.Mass);
        AssertRelative(V(0, 0, -32.174 * Foot), m.Gravity); // N per kg = m/s²
        AssertRelative(-500 * Pound * 32.174 * Foot, m.Weight.Z);
    }

    [Fact]
    public void Read_mm_file_in_m_converts_pressure_by_the_square_of_the_length_factor()
    {
        CollectingSink sink = Read("""
            { "units": { "force": "N", "length": "mm" },
              "cases": { "wind": { "loads": [
                { "id": "a", "kind": "area", "polygon": [[0, 0, 0], [1000, 0, 0], [0, 1000, 0]], "pressure": 0.002 } ] } } }
            """,
            new ReadOptions { TargetUnits = KilonewtonMetre });
        AreaLoad a = sink.Case("wind").Item<AreaLoad>("a");
        // 0.002 N/mm² = 0.002 × 10⁶ N/m² = 2 kN/m² (SI prefixes, exact).
        AssertRelative(2, a.Pressure);
        AssertRelative(V(1, 0, 0), a.Polygon[1]);
    }

    [Fact]
    public void Read_csv_in_inches_and_lbf_converts_rows_and_moments()
    {
        string path = _folder.Write("anchors.csv", "id,x,y,z,fx,fy,fz,mx,my,mz\nb1,12,0,-6,100,0,-250,0,40,0\n");
        var sink = new CollectingSink();
        var units = new UnitSystem(UnitCatalog.PoundForce, UnitCatalog.Inch, UnitCatalog.Pound);
        ReadResult result = LoadFileReader.Read(path, sink, new ReadOptions { CsvUnits = units, TargetUnits = UnitSystem.Si });
        Assert.True(result.Succeeded, string.Join("\n", result.Diagnostics));
        Assert.Equal(units, sink.DocumentHeader!.SourceUnits);
        CollectedCase c = sink.Case("anchors");
        PointForce f = c.Item<PointForce>("b1");
        AssertRelative(V(12 * Inch, 0, -6 * Inch), f.At);
        AssertRelative(V(100 * PoundForce, 0, -250 * PoundForce), f.Value);
        AssertRelative(V(0, 40 * PoundForce * Inch, 0), c.Item<FreeCouple>("b1:m").Value);
    }

    [Fact]
    public void Read_mesh_csv_in_ft_and_kip_converts_vertices_and_pressures()
    {
        _folder.Write("map.csv", "x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n0,0,0,10,0,0,0,10,0,0.02,0.03,0.04\n");
        CollectingSink sink = Read("""
            { "units": { "force": "kip", "length": "ft" },
              "cases": { "wind": { "loads": [ { "id": "map", "kind": "mesh", "file": "map.csv" } ] } } }
            """,
            new ReadOptions { TargetUnits = KilonewtonMetre });
        MeshTriangle t = Assert.IsType<MeshTriangle>(Assert.Single(sink.Case("wind").Items));
        double pressure = KipInKilonewtons / (Foot * Foot);
        AssertRelative(V(10 * Foot, 0, 0), t.B);
        AssertRelative(0.02 * pressure, t.PressureA);
        AssertRelative(0.03 * pressure, t.PressureB);
        AssertRelative(0.04 * pressure, t.PressureC);
    }
}
