using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public class DistributeCommandTests
{
    private static readonly string Skid = CliProcess.Fixture("equipment-skid", "vendor-anchor-loads.loads.json");
    private static readonly string Supports = CliProcess.Fixture("equipment-skid", "support-points.csv");

    [Fact]
    public void Distributed_skid_loads_pass_check_for_every_case_and_combination()
    {
        using var dir = new TempFolder();
        string output = Path.Combine(dir.Path, "supports.loads.json");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", Supports, "-o", output);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("rank 6 of 6", run.Stdout);
        CliRun check = CliProcess.Run("check", Skid, output, "--rel-tol", "1e-9", "--format", "json");
        Assert.True(check.ExitCode == 0, check.ToString());
        using JsonDocument doc = JsonDocument.Parse(check.Stdout);
        Assert.Equal(5, doc.RootElement.GetProperty("cases").GetArrayLength());
    }

    [Fact]
    public void The_written_substitute_is_canonical_and_reads_back_the_forces_printed_to_standard_output()
    {
        using var dir = new TempFolder();
        string output = Path.Combine(dir.Path, "supports.loads.json");
        Assert.Equal(0, CliProcess.Run("distribute", Skid, "--onto", Supports, "--couples", "-o", output).ExitCode);
        CliRun fmt = CliProcess.Run("fmt", "--check", output);
        Assert.True(fmt.ExitCode == 0, fmt.ToString());
        // without -o the same text goes to standard output
        CliRun stdout = CliProcess.Run("distribute", Skid, "--onto", Supports, "--couples");
        Assert.Equal(File.ReadAllText(output), stdout.Stdout);
        // what the file says about itself is a note, not a comment (the canonical form has none)
        string text = File.ReadAllText(output);
        Assert.DoesNotContain("/*", text, StringComparison.Ordinal);
        Assert.Contains("\"note\": \"Written by loaddiff", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Bolt_group_on_a_square_gets_the_elastic_method_forces()
    {
        // AISC Manual Part 7 / Salmon, Johnson & Malhas, Steel Structures, 5th ed., eccentric shear, elastic method
        // (section details from memory): 100 kN parallel to one side of a 100 mm square group at 200 mm from its
        // centroid: two bolts carry 90.14 kN, two 55.90 kN.
        using var dir = new TempFolder();
        string load = dir.Write("bracket.loads.json", """
            { "units": { "force": "kN", "length": "mm" }, "cases": { "shear": { "loads": [
              { "id": "P", "kind": "force", "at": [200, 0, 0], "value": [0, -100, 0] } ] } } }
            """);
        string bolts = dir.Write("bolts.csv", "id,x,y,z\nb1,-50,-50,0\nb2,50,-50,0\nb3,50,50,0\nb4,-50,50,0\n");
        CliRun run = CliProcess.Run("distribute", load, "--onto", bolts);
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip });
        double[] magnitudes = [.. doc.RootElement.GetProperty("cases").GetProperty("shear").GetProperty("loads").EnumerateArray()
            .Select(l => Math.Sqrt(l.GetProperty("value").EnumerateArray().Sum(c => c.GetDouble() * c.GetDouble())))];
        Assert.Equal([55.90, 90.14, 90.14, 55.90], magnitudes.Select(m => Math.Round(m, 2)));
    }

    [Fact]
    public void Collinear_points_refuse_a_twist_about_their_line_with_exit_2_and_accept_it_with_couples()
    {
        using var dir = new TempFolder();
        string line = CliProcess.Fixture("equipment-skid", "support-points-in-line.csv");
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", line, "-o", output);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("rank 5 of 6", run.Stderr);
        Assert.Contains("lie on one line", run.Stderr);
        Assert.False(File.Exists(output));
        CliRun couples = CliProcess.Run("distribute", Skid, "--onto", line, "--couples", "-o", output);
        Assert.True(couples.ExitCode == 0, couples.ToString());
        Assert.Equal(0, CliProcess.Run("check", Skid, output).ExitCode);
    }

    [Fact]
    public void Output_over_an_input_is_refused_and_the_input_is_unchanged()
    {
        using var dir = new TempFolder();
        string copy = dir.Write("skid.loads.json", File.ReadAllText(Skid));
        byte[] before = File.ReadAllBytes(copy);
        CliRun run = CliProcess.Run("distribute", copy, "--onto", Supports, "-o", copy);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("input file", run.Stderr);
        Assert.Equal(before, File.ReadAllBytes(copy));
    }

    [Fact]
    public void Bad_points_file_names_the_file_line_and_column()
    {
        using var dir = new TempFolder();
        string bad = dir.Write("points.csv", "id,x,y,z,weight\nS1,0,0,0,1\nS2,1,0,zero,1\n");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", bad);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("points.csv:3:8: error LD062", run.Stderr);
        string negative = dir.Write("weights.csv", "id,x,y,z,weight\nS1,0,0,0,-1\n");
        CliRun w = CliProcess.Run("distribute", Skid, "--onto", negative);
        Assert.Equal(2, w.ExitCode);
        Assert.Contains("LD021", w.Stderr);
        string missing = dir.Write("nocol.csv", "id,x,y\nS1,0,0\n");
        Assert.Contains("LD060", CliProcess.Run("distribute", Skid, "--onto", missing).Stderr);
    }

    [Fact]
    public void A_points_file_with_no_rows_exits_2_with_LD073()
    {
        using var dir = new TempFolder();
        string empty = dir.Write("points.csv", "id,x,y,z\n");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", empty);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("points.csv", line);
        Assert.Contains("LD073", line);
        Assert.DoesNotContain("   at ", run.Stderr);
    }
}
