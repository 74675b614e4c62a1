using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// What distribute refuses before it writes: point ids a load file cannot hold, points too close together for the load,
/// and forces that would fail 'loaddiff check' against the input. Expected forces are hand statics.
/// </summary>
public partial class DistributeCommandTests
{
    // 10 kN down at x = 1 m on a beam line along x (hand statics below).
    private const string PointLoad = """
        { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
          { "id": "P", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10] } ] } } }
        """;

    private static JsonElement[] Loads(string file, string caseName)
    {
        using JsonDocument doc = JsonDocument.Parse(File.ReadAllText(file));
        return [.. doc.RootElement.GetProperty("cases").GetProperty(caseName).GetProperty("loads").EnumerateArray().Select(e => e.Clone())];
    }

    private static double[] Value(JsonElement item) => [.. item.GetProperty("value").EnumerateArray().Select(e => e.GetDouble())];

    [Fact]
    public void Two_supports_under_a_point_load_get_the_lever_rule_forces_and_the_written_file_passes_check()
    {
        // Lever rule (hand statics): supports at x = 0 and x = 4 m, 10 kN at x = 1 m: A = 10·3/4 = 7.5 kN, B = 10·1/4 = 2.5 kN.
        using var dir = new TempFolder();
        string load = dir.Write("beam.loads.json", PointLoad);
        string points = dir.Write("supports.csv", "id,x,y,z\nA,0,0,0\nB,4,0,0\n");
        string output = Path.Combine(dir.Path, "supports.loads.json");
        CliRun run = CliProcess.Run("distribute", load, "--onto", points, "-o", output);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("checked against the original", run.Stdout);
        JsonElement[] loads = Loads(output, "dead");
        Assert.Equal(["A", "B"], loads.Select(l => l.GetProperty("id").GetString()));
        double[][] expected = [[0, 0, -7.5], [0, 0, -2.5]];
        for (int i = 0; i < 2; i++)
        {
            double[] v = Value(loads[i]);
            for (int k = 0; k < 3; k++)
            {
                Assert.True(Math.Abs(v[k] - expected[i][k]) <= 1e-12 * 10, $"{i}[{k}] = {v[k]:R}, expected {expected[i][k]}");
            }
        }
        CliRun check = CliProcess.Run("check", load, output);
        Assert.True(check.ExitCode == 0, check.ToString());
    }

    [Fact]
    public void A_point_id_starting_with_a_tilde_is_refused_with_LD033_at_its_line_and_nothing_is_written()
    {
        // '~' opens the ids a reader derives; a file that gives one is refused by check (LD033), so distribute refuses the point.
        using var dir = new TempFolder();
        string load = dir.Write("beam.loads.json", PointLoad);
        string points = dir.Write("supports.csv", "id,x,y,z\nS0,0,0,0\n~S1,4,0,0\n");
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun run = CliProcess.Run("distribute", load, "--onto", points, "-o", output);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("supports.csv:3:1: error LD033", line);
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.False(File.Exists(output));
    }

    [Fact]
    public void A_point_named_like_another_points_couple_gets_a_couple_id_of_its_own_and_the_output_passes_check()
    {
        // Two points on the x axis, symmetric about the load (hand statics): 10 kN down at the midpoint x = 1 m gives 5 kN
        // each (lever rule); the twist of 6 kN·m about x cannot be carried by forces on that line, so the two equal couples
        // take it, 3 kN·m each (minimum of C1² + C2² subject to C1 + C2 = 6).
        using var dir = new TempFolder();
        string load = dir.Write("beam.loads.json", """
            { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
              { "id": "P", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10] },
              { "id": "T", "kind": "couple", "value": [6, 0, 0] } ] } } }
            """);
        string points = dir.Write("supports.csv", "id,x,y,z\nS1,0,0,0\nS1-couple,2,0,0\n");
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun run = CliProcess.Run("distribute", load, "--onto", points, "--couples", "-o", output);
        Assert.True(run.ExitCode == 0, run.ToString());
        JsonElement[] loads = Loads(output, "dead");
        string[] ids = [.. loads.Select(l => l.GetProperty("id").GetString()!)];
        Assert.Equal(["S1", "S1-couple", "S1-couple-2", "S1-couple-couple"], ids);
        Assert.Equal(["force", "force", "couple", "couple"], loads.Select(l => l.GetProperty("kind").GetString()));
        double[][] expected = [[0, 0, -5], [0, 0, -5], [3, 0, 0], [3, 0, 0]];
        for (int i = 0; i < 4; i++)
        {
            double[] v = Value(loads[i]);
            for (int k = 0; k < 3; k++)
            {
                Assert.True(Math.Abs(v[k] - expected[i][k]) <= 1e-12 * 10, $"{ids[i]}[{k}] = {v[k]:R}, expected {expected[i][k]}");
            }
        }
        CliRun check = CliProcess.Run("check", load, output);
        Assert.True(check.ExitCode == 0, check.ToString());
    }

    [Fact]
    public void Points_a_picometre_apart_are_refused_with_their_condition_number_and_LD074()
    {
        // Lever rule: supports at x = 0 and x = 1e-12 m under 10 kN at x = 1 m would carry about 10/1e-12 = 1e13 kN.
        // By hand: the two points sit at ±ℓ from their centroid, ℓ = 5e-13 m; with the moment rows over ℓ the force and
        // moment blocks both have singular values √2, and over L = 1 − 5e-13 m (the load's reach) the moment ones shrink
        // by ℓ/L, so σ_max/σ_min = L/ℓ ≈ 2e12.
        using var dir = new TempFolder();
        string load = dir.Write("beam.loads.json", PointLoad);
        string points = dir.Write("close.csv", "id,x,y,z\nA,0,0,0\nB,1e-12,0,0\n");
        string line = RefusedWithNothingWritten(dir, load, points, exit: 2);
        Assert.StartsWith(points + ": error LD074: case 'dead'", line);
        Assert.Contains("condition number 2e+12", line);
        Assert.Contains("the limit is 1e+8", line);
    }

    // The refusal is one line on standard error with that exit code; no -o file is made, and without -o nothing
    // reaches standard output either.
    private static string RefusedWithNothingWritten(TempFolder dir, string load, string points, int exit)
    {
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun run = CliProcess.Run("distribute", load, "--onto", points, "-o", output);
        Assert.Equal(exit, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Equal("", run.Stdout);
        Assert.False(File.Exists(output));
        CliRun piped = CliProcess.Run("distribute", load, "--onto", points);
        Assert.Equal(exit, piped.ExitCode);
        Assert.Equal("", piped.Stdout);
        return line;
    }

    [Fact]
    public void Forces_that_would_fail_check_are_not_written_and_exit_1_with_LD075()
    {
        // Three supports 10 µm apart under a point load 1 m away: the condition number is about 1e5, below the limit, but
        // the forces are about 1e5 times the load and their rounding leaves a moment residual above what check allows
        // for a single point load (its loaded box has no size, so the moment allowance is the rounding floor).
        using var dir = new TempFolder();
        string load = dir.Write("beam.loads.json", PointLoad);
        string points = dir.Write("tight.csv", "id,x,y,z\nA,0,0,0\nB,1e-5,0,0\nC,0,1e-5,0\n");
        string line = RefusedWithNothingWritten(dir, load, points, exit: 1);
        Assert.StartsWith(load + ": error LD075: case 'dead'", line);
        Assert.Contains("would fail 'loaddiff check'", line);
    }

    [Fact]
    public void A_case_of_couples_only_is_verified_with_the_force_tolerance_given_and_then_passes_check_with_it()
    {
        // A couple alone has G_F = 0, so check allows |ΔR| only rounding, which the cancelling forces at four irregular
        // points exceed; with --force-tol the same rule as 'check --force-tol' is applied before writing.
        using var dir = new TempFolder();
        string load = dir.Write("twist.loads.json", """
            { "units": { "force": "kN", "length": "m" }, "cases": { "twist": { "loads": [
              { "id": "T", "kind": "couple", "value": [0.3, 0.7, 1.1] } ] } } }
            """);
        string points = dir.Write("irregular.csv", "id,x,y,z\nA,0.1,0.2,0\nB,3.3,0.7,0.1\nC,1.9,2.9,0.3\nD,0.7,1.3,2.1\n");
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun plain = CliProcess.Run("distribute", load, "--onto", points, "-o", output);
        Assert.Equal(1, plain.ExitCode);
        Assert.Contains("LD075", plain.Stderr);
        Assert.Contains("--force-tol", plain.Stderr);
        Assert.False(File.Exists(output));
        CliRun tolerant = CliProcess.Run("distribute", load, "--onto", points, "--force-tol", "1e-9", "-o", output);
        Assert.True(tolerant.ExitCode == 0, tolerant.ToString());
        Assert.Equal(1, CliProcess.Run("check", load, output).ExitCode);
        CliRun check = CliProcess.Run("check", load, output, "--force-tol", "1e-9");
        Assert.True(check.ExitCode == 0, check.ToString());
    }
}
