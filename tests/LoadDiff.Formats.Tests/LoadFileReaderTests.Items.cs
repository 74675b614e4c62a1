using LoadDiff.Core.Loads;
using LoadDiff.Core.Units;
using LoadDiff.Formats.Tests.Support;

namespace LoadDiff.Formats.Tests;

// Every kind of item, read in the file's own units (SI): the expected values are the numbers written in the file.
public sealed partial class LoadFileReaderTests
{
    [Fact]
    public void Read_force_and_couple_deliver_the_values_as_written()
    {
        CollectingSink sink = Read("""
            { "format": "loaddiff/1", "title": "Bracket",
              "cases": { "dead": { "title": "Self weight", "loads": [
                { "id": "p1", "kind": "force", "at": [1.5, -2, 3.25], "value": [0.125, 0, -10] },
                { "id": "c1", "kind": "couple", "value": [0, 5, -0.5] } ] } } }
            """);
        Assert.Equal("Bracket", sink.DocumentHeader!.Title);
        Assert.Equal(UnitSystem.Si, sink.DocumentHeader.Units);
        CollectedCase dead = sink.Case("dead");
        Assert.Equal("Self weight", dead.Title);
        Assert.Equal(2, dead.Items.Count);
        Assert.Equal(new PointForce("p1", V(1.5, -2, 3.25), V(0.125, 0, -10)), dead.Item<PointForce>("p1"));
        Assert.Equal(new FreeCouple("c1", V(0, 5, -0.5)), dead.Item<FreeCouple>("c1"));
    }

    [Fact]
    public void Read_line_load_delivers_ends_and_intensities()
    {
        CollectingSink sink = Read("""
            { "cases": { "soil": { "loads": [
                { "id": "w1", "kind": "line", "from": [0, 0, 0], "to": [6, 0, 0], "start": [0, 0, -2], "end": [0, 0, -4] } ] } } }
            """);
        Assert.Equal(new LineLoad("w1", V(0, 0, 0), V(6, 0, 0), V(0, 0, -2), V(0, 0, -4)), sink.Case("soil").Item<LineLoad>("w1"));
    }

    [Fact]
    public void Read_area_load_with_normal_direction_has_no_direction_and_zero_gradient()
    {
        CollectingSink sink = Read("""
            { "cases": { "roof": { "loads": [
                { "id": "a1", "kind": "area", "polygon": [[0, 0, 0], [4, 0, 0], [4, 3, 0], [0, 3, 0]], "pressure": 1.5, "direction": "normal" },
                { "id": "a2", "kind": "area", "polygon": [[0, 0, 0], [4, 0, 0], [4, 3, 0]], "pressure": 2 } ] } } }
            """);
        AreaLoad a1 = sink.Case("roof").Item<AreaLoad>("a1");
        Assert.Equal([V(0, 0, 0), V(4, 0, 0), V(4, 3, 0), V(0, 3, 0)], a1.Polygon.ToArray());
        Assert.Equal(1.5, a1.Pressure);
        Assert.Null(a1.Direction);
        Assert.Equal(V(0, 0, 0), a1.Gradient);
        Assert.Equal(V(0, 0, 0), a1.Origin);
        AreaLoad a2 = sink.Case("roof").Item<AreaLoad>("a2");
        Assert.Null(a2.Direction); // "normal" is the default
        Assert.Equal(2, a2.Pressure);
    }

    [Fact]
    public void Read_area_load_with_given_direction_gradient_and_origin_keeps_them_as_written()
    {
        // A hydrostatic wall: p(x) = 0 + (0, 0, -9.81)·(x − (0, 0, 3)), so 29.43 at the foot (hand check).
        CollectingSink sink = Read("""
            { "points": { "top": [0, 0, 3] },
              "cases": { "water": { "loads": [
                { "id": "wall", "kind": "area", "polygon": [[0, 0, 0], [5, 0, 0], [5, 0, 3], [0, 0, 3]],
                  "pressure": 0, "direction": [0, 2, 0], "gradient": [0, 0, -9.81], "origin": "top" } ] } } }
            """);
        AreaLoad wall = sink.Case("water").Item<AreaLoad>("wall");
        Assert.Equal(V(0, 2, 0), wall.Direction); // kept as given; normalised on use
        Assert.Equal(V(0, 0, -9.81), wall.Gradient);
        Assert.Equal(V(0, 0, 3), wall.Origin);
        Assert.Equal(0, wall.Pressure);
        Assert.Equal(9.81 * 3, wall.PressureAt(V(2, 0, 0)), 12);
    }

    [Fact]
    public void Read_mass_with_default_gravity_gets_standard_gravity_downwards()
    {
        CollectingSink sink = Read("""
            { "cases": { "equipment": { "loads": [ { "id": "m1", "kind": "mass", "at": [2, 2, 0], "value": 1200 } ] } } }
            """);
        PointMass m = sink.Case("equipment").Item<PointMass>("m1");
        Assert.Equal(V(2, 2, 0), m.At);
        Assert.Equal(1200, m.Mass);
        // Standard acceleration of gravity g_n = 9.80665 m/s² (3rd CGPM 1901; NIST SP 811 (2008) Appendix B.8), along −z.
        Assert.Equal(V(0, 0, -9.80665), m.Gravity);
    }

    [Fact]
    public void Read_mass_with_given_gravity_uses_it()
    {
        CollectingSink sink = Read("""
            { "gravity": [0, -9.81, 0],
              "cases": { "equipment": { "loads": [ { "id": "m1", "kind": "mass", "at": [0, 0, 0], "value": 10 } ] } } }
            """);
        PointMass m = sink.Case("equipment").Item<PointMass>("m1");
        Assert.Equal(V(0, -9.81, 0), m.Gravity);
        AssertRelative(V(0, -98.1, 0), m.Weight); // 10 kg × 9.81 m/s², rounded once
    }

    [Fact]
    public void Read_named_points_resolve_and_appear_in_the_header()
    {
        CollectingSink sink = Read("""
            { "points": { "A": [0, 0, 0], "B": [6, 0, 0], "C": [6, 4, 0] },
              "cases": { "dead": { "loads": [
                { "id": "p", "kind": "force", "at": "C", "value": [0, 0, -1] },
                { "id": "w", "kind": "line", "from": "A", "to": "B", "start": [0, 0, -1], "end": [0, 0, -1] },
                { "id": "a", "kind": "area", "polygon": ["A", "B", "C"], "pressure": 1 },
                { "id": "m", "kind": "mass", "at": "B", "value": 1 } ] } } }
            """);
        Assert.Equal(["A", "B", "C"], sink.DocumentHeader!.Points.Keys);
        Assert.Equal(V(6, 4, 0), sink.DocumentHeader.Points["C"]);
        CollectedCase dead = sink.Case("dead");
        Assert.Equal(V(6, 4, 0), dead.Item<PointForce>("p").At);
        Assert.Equal(V(0, 0, 0), dead.Item<LineLoad>("w").From);
        Assert.Equal(V(6, 0, 0), dead.Item<LineLoad>("w").To);
        Assert.Equal([V(0, 0, 0), V(6, 0, 0), V(6, 4, 0)], dead.Item<AreaLoad>("a").Polygon.ToArray());
        Assert.Equal(V(6, 0, 0), dead.Item<PointMass>("m").At);
    }

    [Fact]
    public void Read_mesh_from_triangle_rows_delivers_one_triangle_per_row()
    {
        _folder.Write("wind-map.csv", "x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n0,0,0,2,0,0,0,2,0,0.5,0.75,1\n\n2,0,0,2,2,0,0,2,0,0.75,1.25,1\n");
        CollectingSink sink = Read("""
            { "cases": { "wind": { "loads": [ { "id": "map", "kind": "mesh", "file": "wind-map.csv" } ] } } }
            """);
        List<LoadItem> items = sink.Case("wind").Items;
        Assert.Equal(
            [
                new MeshTriangle("map", V(0, 0, 0), V(2, 0, 0), V(0, 2, 0), 0.5, 0.75, 1, null),
                new MeshTriangle("map", V(2, 0, 0), V(2, 2, 0), V(0, 2, 0), 0.75, 1.25, 1, null),
            ],
            items);
    }

    [Fact]
    public void Read_mesh_from_vertex_and_triangle_tables_joins_them_by_vertex_id()
    {
        // Columns in another order than the layout lists them, with a byte-order mark and spaces: all accepted.
        _folder.WriteBytes("v.csv", [0xEF, 0xBB, 0xBF, .. "p,id,x,y,z\n0.5, n1 ,0,0,0\n0.75,n2,2,0,0\n1,n3,0,2,0\n1.25,n4,2,2,0\n"u8]);
        _folder.Write("t.csv", "c,a,b\nn3,n1,n2\nn3,n2,n4\n");
        CollectingSink sink = Read("""
            { "cases": { "wind": { "loads": [
                { "id": "map", "kind": "mesh", "vertices": "v.csv", "triangles": "t.csv", "direction": [0, 0, -1] } ] } } }
            """);
        Assert.Equal(
            [
                new MeshTriangle("map", V(0, 0, 0), V(2, 0, 0), V(0, 2, 0), 0.5, 0.75, 1, V(0, 0, -1)),
                new MeshTriangle("map", V(2, 0, 0), V(2, 2, 0), V(0, 2, 0), 0.75, 1.25, 1, V(0, 0, -1)),
            ],
            sink.Case("wind").Items);
    }

    [Fact]
    public void Read_indexed_mesh_into_a_reducing_sink_gives_the_closed_form_resultant_and_one_contributor()
    {
        // The two triangles above, reduced as they are read. For a linear pressure over a triangle,
        // ∫p dA = A·Σp_i/3 and ∫p x dA = A/12·(Σp_i·Σx_i + Σp_i·x_i) (from ∫φ_iφ_j dA = A(1+δ_ij)/12, the
        // linear-triangle mass matrix of finite-element texts): ∫p = 2·0.75 + 2·1 = 3.5, ∫p x = 1 + 8/3 = 11/3,
        // ∫p y = 13/12 + 11/4 = 23/6. With the force along −z: R = (0, 0, −3.5), M_O = (−∫p y, ∫p x, 0).
        _folder.Write("v.csv", "id,x,y,z,p\nn1,0,0,0,0.5\nn2,2,0,0,0.75\nn3,0,2,0,1\nn4,2,2,0,1.25\n");
        _folder.Write("t.csv", "a,b,c\nn1,n2,n3\nn2,n4,n3\n");
        string path = _folder.Write("mesh.loads.json", """
            { "cases": { "wind": { "loads": [
                { "id": "map", "kind": "mesh", "vertices": "v.csv", "triangles": "t.csv", "direction": [0, 0, -1] } ] } } }
            """);
        var sink = new LoadDiff.Core.Model.ReductionSink(topContributors: 3);
        Assert.True(LoadFileReader.Read(path, sink).Succeeded);
        LoadDiff.Core.Reduction.LoadReduction r = sink.Cases["wind"].ResultAt(LoadDiff.Core.Vector3.Zero);
        Assert.Equal(2, r.ItemCount);
        Assert.Equal(0, r.Force.X);
        Assert.Equal(0, r.Force.Y);
        Assert.Equal(-3.5, r.Force.Z, 1e-14);
        Assert.Equal(-23.0 / 6, r.Moment.X, 1e-14);
        Assert.Equal(11.0 / 3, r.Moment.Y, 1e-14);
        Assert.Equal(0, r.Moment.Z, 1e-14);
        var mesh = Assert.Single(sink.Contributors("wind")!.Forces);
        Assert.Equal("map", mesh.Id);
        Assert.Equal(2, mesh.Parts);
    }

    [Fact]
    public void Read_forces_csv_prefixes_ids_numbers_rows_without_id_and_adds_nonzero_couples()
    {
        _folder.Write("sub/wheels.csv", "id,x,y,z,fx,fy,fz,mx,my,mz\nw1,0,0,0,0,0,-85,0,0,0\nw2,2.4,0,0,0,1.5e1,-85,0,12,0\n");
        _folder.Write("sub/anchors.csv", "x,y,z,fx,fy,fz\n1,2,3,4,5,6\n\n-1,-2,-3,-4,-5,-6\n");
        CollectingSink sink = Read("""
            { "cases": { "crane": { "loads": [
                { "id": "wheels", "kind": "forces", "file": "sub/wheels.csv" },
                { "id": "anchors", "kind": "forces", "file": "sub/anchors.csv" } ] } } }
            """);
        Assert.Equal(
            [
                new PointForce("wheels/w1", V(0, 0, 0), V(0, 0, -85)),
                new PointForce("wheels/w2", V(2.4, 0, 0), V(0, 15, -85)),
                new FreeCouple("wheels/w2:m", V(0, 12, 0)),
                new PointForce("anchors/row2", V(1, 2, 3), V(4, 5, 6)),
                new PointForce("anchors/row4", V(-1, -2, -3), V(-4, -5, -6)),
            ],
            sink.Case("crane").Items);
    }

    [Fact]
    public void Read_csv_given_directly_is_one_case_named_after_the_file_stem()
    {
        string path = _folder.Write("crane-wheels.csv", "id,x,y,z,fx,fy,fz\nw1,0,0,0,0,0,-85\nw2,2.4,0,0,0,0,-85\n");
        var sink = new CollectingSink();
        ReadResult result = LoadFileReader.Read(path, sink);
        Assert.True(result.Succeeded, string.Join("\n", result.Diagnostics));
        Assert.Equal(["header", "begin crane-wheels", "item w1", "item w2", "end"], sink.Events);
        Assert.Equal(UnitSystem.Si, sink.DocumentHeader!.Units);
        Assert.Equal(new PointForce("w2", V(2.4, 0, 0), V(0, 0, -85)), sink.Case("crane-wheels").Items[1]);
    }

    [Fact]
    public void Read_triangle_mesh_csv_given_directly_is_detected_from_its_header()
    {
        string path = _folder.Write("panel.csv", "x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n0,0,0,1,0,0,0,1,0,1,2,3\n");
        var sink = new CollectingSink();
        Assert.True(LoadFileReader.Read(path, sink).Succeeded);
        Assert.Equal(new MeshTriangle("~mesh", V(0, 0, 0), V(1, 0, 0), V(0, 1, 0), 1, 2, 3, null), Assert.Single(sink.Case("panel").Items));
    }
}
