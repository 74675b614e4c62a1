using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// A referenced forces CSV whose rows moved while its resultant stayed the same is a difference: −10 kN at x = 0 and
/// x = 2 became −10 kN at x = 1 twice (R = −20 kN and M about x = 1 are zero change, by hand), yet the cut shear at
/// x = 0.5 goes from −10 to 0 kN (statics of the free body behind the cut).
/// </summary>
public class DiffReferencedRowsTests
{
    private const string Document = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "w": { "loads": [ { "id": "roof", "kind": "forces", "file": "nodes.csv" } ] } } }
        """;

    private static string Version(TempFolder dir, string name, string rows)
    {
        Directory.CreateDirectory(Path.Combine(dir.Path, name));
        dir.Write(name + "/nodes.csv", "id,x,y,z,fx,fy,fz\n" + rows);
        return dir.Write(name + "/m.loads.json", Document);
    }

    [Fact]
    public void Rows_moved_with_the_same_resultant_are_reported_and_exit_1()
    {
        using var dir = new TempFolder();
        string a = Version(dir, "old", "n1,0,0,0,0,0,-10\nn2,2,0,0,0,0,-10\n");
        string b = Version(dir, "new", "n1,1,0,0,0,0,-10\nn2,1,0,0,0,0,-10\n");
        CliRun text = CliProcess.Run("diff", a, b);
        Assert.True(text.ExitCode == 1, text.ToString());
        Assert.Contains("rows differ, the item's resultant is unchanged", text.Stdout);
        Assert.DoesNotContain("No differences", text.Stdout);
        CliRun json = CliProcess.Run("diff", a, b, "--format", "json");
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        Assert.True(doc.RootElement.GetProperty("different").GetBoolean());
        // each moved row with its own ΔM_i about the old centroid x = 1: n1 moved +1 m under −10 kN gives
        // ΔM_y = −(Δx)·F_z = +10 kN·m, n2 moved −1 m gives −10 kN·m (M = r × F by hand); their sum is zero
        JsonElement data = doc.RootElement.GetProperty("items")[0].GetProperty("data")[0];
        Assert.Equal(2, data.GetProperty("changed").GetInt64());
        JsonElement rows = data.GetProperty("rows");
        Assert.Equal("n1", rows[0].GetProperty("key").GetString());
        Assert.Equal(10, rows[0].GetProperty("delta_moment")[1].GetDouble(), 12);
        Assert.Equal("n2", rows[1].GetProperty("key").GetString());
        Assert.Equal(-10, rows[1].GetProperty("delta_moment")[1].GetDouble(), 12);
        Assert.Equal(0, rows[1].GetProperty("delta_force")[2].GetDouble());
    }

    [Fact]
    public void The_same_rows_in_another_order_are_no_difference()
    {
        using var dir = new TempFolder();
        string a = Version(dir, "old", "n1,0,0,0,0,0,-10\nn2,2,0,0,0,0,-10\n");
        string b = Version(dir, "new", "n2,2,0,0,0,0,-10\nn1,0,0,0,0,0,-10\n");
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("No differences", run.Stdout);
    }
}
