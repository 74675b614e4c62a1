using System.Globalization;
using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// diff of CSV tables, given directly or referenced by a document: rows matched by id (or position), each differing row
/// with its own ΔR_i, ΔM_i. Loads are invented; every expected value is hand statics (M = r × F) or the area-coordinate
/// integral of a linear field over a triangle, ∫ L_i dA = A/3 and ∫ L_i x dA = A (2 x_i + x_j + x_k) / 12
/// (Zienkiewicz and Taylor, The Finite Element Method, vol. 1, the area-coordinate integration formula).
/// </summary>
public class DiffTableRowsTests
{
    private static JsonElement Data(JsonDocument doc, int item = 0) => doc.RootElement.GetProperty("items")[item].GetProperty("data")[0];

    private static JsonElement Row(JsonElement data, string key)
    {
        foreach (JsonElement r in data.GetProperty("rows").EnumerateArray())
        {
            if (r.GetProperty("key").GetString() == key)
            {
                return r;
            }
        }
        throw new Xunit.Sdk.XunitException($"no row {key} in {data}");
    }

    [Fact]
    public void Two_point_load_tables_are_diffed_row_by_row_with_each_rows_contribution()
    {
        using var dir = new TempFolder();
        string a = dir.Write("old.csv", "id,x,y,z,fx,fy,fz\np1,0,0,0,0,0,-10\np2,4,0,0,0,0,-6\np3,2,1,0,3,0,0\n");
        string b = dir.Write("new.csv", "id,x,y,z,fx,fy,fz\np3,2,1,0,3,0,0\np1,0,0,0,0,0,-12\np4,1,0,0,0,0,-1\n");
        CliRun run = CliProcess.Run("diff", a, b, "--at", "0,0,0", "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement data = Data(doc);
        Assert.Equal((1, 1, 1), (data.GetProperty("changed").GetInt64(), data.GetProperty("added").GetInt64(), data.GetProperty("removed").GetInt64()));
        Assert.Equal("id", data.GetProperty("matched_by").GetString());
        // p1: −10 → −12 kN at the origin: ΔR_i = (0, 0, −2), ΔM_i = 0
        JsonElement p1 = Row(data, "p1");
        Assert.Equal("changed", p1.GetProperty("change").GetString());
        Assert.Equal((2L, 3L), (p1.GetProperty("old_line").GetInt64(), p1.GetProperty("new_line").GetInt64()));
        Assert.Equal(-2, p1.GetProperty("delta_force")[2].GetDouble(), 12);
        // p2 removed: −(4, 0, 0) × (0, 0, −6) = −(0, 24, 0) (r × F: M_y = z·F_x − x·F_z = 24)
        JsonElement p2 = Row(data, "p2");
        Assert.Equal("removed", p2.GetProperty("change").GetString());
        Assert.Equal(6, p2.GetProperty("delta_force")[2].GetDouble(), 12);
        Assert.Equal(-24, p2.GetProperty("delta_moment")[1].GetDouble(), 12);
        // p4 added: (1, 0, 0) × (0, 0, −1) = (0, 1, 0)
        JsonElement p4 = Row(data, "p4");
        Assert.Equal("added", p4.GetProperty("change").GetString());
        Assert.Equal(1, p4.GetProperty("delta_moment")[1].GetDouble(), 12);
        // p3 kept its values in another row: not a difference. The table's ΔR = −2 + 6 − 1 = 3 (z), ΔM_y = −24 + 1 = −23
        Assert.Equal(3, data.GetProperty("rows").GetArrayLength());
        JsonElement item = doc.RootElement.GetProperty("items")[0];
        Assert.Equal(3, item.GetProperty("delta_force")[2].GetDouble(), 12);
        Assert.Equal(-23, item.GetProperty("delta_moment")[1].GetDouble(), 12);
        Assert.False(doc.RootElement.GetProperty("has_listings").GetBoolean());
    }

    [Fact]
    public void Reordered_rows_are_no_difference_and_text_says_the_rows_were_compared()
    {
        using var dir = new TempFolder();
        string a = dir.Write("old.csv", "id,x,y,z,fx,fy,fz\np1,0,0,0,0,0,-10\np2,4,0,0,0,0,-6\n");
        string b = dir.Write("new.csv", "id,x,y,z,fx,fy,fz\np2,4,0,0,0,0,-6\np1,0,0,0,0,0,-10\n");
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("No differences", run.Stdout);
        Assert.Contains("their rows are compared above", run.Stdout);
        Assert.DoesNotContain("Canonical listings: identical", run.Stdout);
    }

    [Fact]
    public void Many_changed_rows_are_all_counted_and_the_first_twenty_shown()
    {
        using var dir = new TempFolder();
        string Rows(double fz) => "id,x,y,z,fx,fy,fz\n" + string.Concat(Enumerable.Range(1, 25).Select(i =>
            string.Create(CultureInfo.InvariantCulture, $"n{i},{i},0,0,0,0,{fz}\n")));
        string a = dir.Write("old.csv", Rows(-1));
        string b = dir.Write("new.csv", Rows(-1.5));
        CliRun run = CliProcess.Run("diff", a, b, "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement data = Data(doc);
        Assert.Equal(25, data.GetProperty("changed").GetInt64());
        Assert.Equal(20, data.GetProperty("rows").GetArrayLength());
        // 25 rows each 0.5 lighter downward: ΔR_z = −12.5
        Assert.Equal(-12.5, doc.RootElement.GetProperty("items")[0].GetProperty("delta_force")[2].GetDouble(), 12);
        CliRun text = CliProcess.Run("diff", a, b);
        Assert.Contains("the first 20 shown", text.Stdout);
        Assert.Contains("25 changed", text.Stdout);
    }

    [Fact]
    public void A_table_and_a_document_cannot_be_compared()
    {
        using var dir = new TempFolder();
        string a = dir.Write("old.csv", "id,x,y,z,fx,fy,fz\np1,0,0,0,0,0,-10\n");
        string b = dir.Write("new.loads.json", """{ "cases": { "c": { "loads": [] } } }""");
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.Equal(2, run.ExitCode);
        Assert.Single(run.Stderr.Trim().Split('\n'));
        Assert.Contains("two CSV tables", run.Stderr);
    }

    [Fact]
    public void A_triangle_row_whose_corner_pressure_changed_has_the_exact_change_of_its_load()
    {
        // triangle (0,0,0), (2,0,0), (0,2,0): A = 2, normal +z by the right-hand rule. p1 1.4 → 1.8 adds ∫ 0.4·L1 dA = 0.4·A/3
        // along +z, acting at (2·x1 + x2 + x3)/4 = (0.5, 0.5, 0): ΔM = (0.5, 0.5, 0) × (0, 0, F) = (0.5·F, −0.5·F, 0)
        using var dir = new TempFolder();
        const string header = "x1,y1,z1,x2,y2,z2,x3,y3,z3,p1,p2,p3\n";
        Directory.CreateDirectory(Path.Combine(dir.Path, "old"));
        Directory.CreateDirectory(Path.Combine(dir.Path, "new"));
        const string doc = """{ "units": { "force": "kN", "length": "m" }, "cases": { "wind": { "loads": [ { "id": "roof", "kind": "mesh", "file": "roof.csv" } ] } } }""";
        string a = dir.Write("old/m.loads.json", doc);
        string b = dir.Write("new/m.loads.json", doc);
        dir.Write("old/roof.csv", header + "0,0,0,2,0,0,0,2,0,1.4,1,1\n0,0,5,1,0,5,0,1,5,1,1,1\n");
        dir.Write("new/roof.csv", header + "0,0,0,2,0,0,0,2,0,1.8,1,1\n0,0,5,1,0,5,0,1,5,1,1,1\n");
        CliRun run = CliProcess.Run("diff", a, b, "--at", "0,0,0", "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument json = JsonDocument.Parse(run.Stdout);
        JsonElement data = Data(json);
        Assert.Equal("row order", data.GetProperty("matched_by").GetString());
        Assert.Equal(1, data.GetProperty("changed").GetInt64());
        JsonElement row = Row(data, "triangle 1");
        double f = 0.4 * 2 / 3;
        Assert.Equal(f, row.GetProperty("delta_force")[2].GetDouble(), 12);
        Assert.Equal(0.5 * f, row.GetProperty("delta_moment")[0].GetDouble(), 12);
        Assert.Equal(-0.5 * f, row.GetProperty("delta_moment")[1].GetDouble(), 12);
    }

    [Fact]
    public void A_vertex_table_change_names_the_vertex_and_the_items_load_change()
    {
        // a 2 m × 1 m panel of two triangles sharing vertex c: p_c 1.4 → 1.8 adds 0.4·(A1 + A2)/3 = 0.4·2/3 kN/m² × m²
        using var dir = new TempFolder();
        Directory.CreateDirectory(Path.Combine(dir.Path, "old"));
        Directory.CreateDirectory(Path.Combine(dir.Path, "new"));
        const string doc = """{ "units": { "force": "kN", "length": "m" }, "cases": { "wind": { "loads": [ { "id": "panel", "kind": "mesh", "vertices": "v.csv", "triangles": "t.csv" } ] } } }""";
        string a = dir.Write("old/m.loads.json", doc);
        string b = dir.Write("new/m.loads.json", doc);
        const string tris = "a,b,c\na,b,c\na,c,d\n";
        dir.Write("old/t.csv", tris);
        dir.Write("new/t.csv", tris);
        dir.Write("old/v.csv", "id,x,y,z,p\na,0,0,0,1\nb,2,0,0,1\nc,2,1,0,1.4\nd,0,1,0,1\n");
        dir.Write("new/v.csv", "id,x,y,z,p\na,0,0,0,1\nb,2,0,0,1\nc,2,1,0,1.8\nd,0,1,0,1\n");
        CliRun run = CliProcess.Run("diff", a, b, "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument json = JsonDocument.Parse(run.Stdout);
        JsonElement item = json.RootElement.GetProperty("items")[0];
        JsonElement data = item.GetProperty("data");
        Assert.Equal(1, data.GetArrayLength()); // the triangle table did not change
        Assert.Equal("mesh vertex table", data[0].GetProperty("table").GetString());
        JsonElement c = Row(data[0], "c");
        Assert.Equal(4, c.GetProperty("old_line").GetInt64());
        Assert.Equal(JsonValueKind.Null, c.GetProperty("delta_force").ValueKind);
        Assert.Equal(0.4 * 2 / 3, item.GetProperty("delta_force")[2].GetDouble(), 12);
    }

    [Fact]
    public void Referenced_rows_in_other_units_are_compared_after_exact_conversion()
    {
        // the same loads in kN, m and in N, mm (NIST SP 811: 1 kN = 1000 N, 1 m = 1000 mm): no item differs;
        // one row moved by 1 mm is a changed row, ΔM_i = Δx·F = 0.001 m × 10 kN = 0.01 kN·m
        using var dir = new TempFolder();
        Directory.CreateDirectory(Path.Combine(dir.Path, "si"));
        Directory.CreateDirectory(Path.Combine(dir.Path, "mm"));
        string Doc(string force, string length) =>
            $$"""{ "units": { "force": "{{force}}", "length": "{{length}}" }, "cases": { "w": { "loads": [ { "id": "roof", "kind": "forces", "file": "n.csv" } ] } } }""";
        string a = dir.Write("si/m.loads.json", Doc("kN", "m"));
        string b = dir.Write("mm/m.loads.json", Doc("N", "mm"));
        dir.Write("si/n.csv", "id,x,y,z,fx,fy,fz\nn1,0.3,0,0,0,0,-10\nn2,2.7,0.1,0,0,0,-10.3\n");
        dir.Write("mm/n.csv", "id,x,y,z,fx,fy,fz\nn1,300,0,0,0,0,-10000\nn2,2700,100,0,0,0,-10300\n");
        CliRun same = CliProcess.Run("diff", a, b, "--format", "json");
        using (JsonDocument json = JsonDocument.Parse(same.Stdout))
        {
            Assert.Equal(0, json.RootElement.GetProperty("items").GetArrayLength());
        }
        dir.Write("mm/n.csv", "id,x,y,z,fx,fy,fz\nn1,301,0,0,0,0,-10000\nn2,2700,100,0,0,0,-10300\n");
        CliRun moved = CliProcess.Run("diff", a, b, "--at", "0,0,0", "--format", "json");
        Assert.True(moved.ExitCode == 1, moved.ToString());
        using JsonDocument m = JsonDocument.Parse(moved.Stdout);
        JsonElement row = Row(Data(m), "n1");
        Assert.Equal(0.01, row.GetProperty("delta_moment")[1].GetDouble(), 12);
        Assert.Contains("0.301", row.GetProperty("new").GetString(), StringComparison.Ordinal);
    }
}
