using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Real git in a temporary repository: a <c>REV:PATH</c> operand is read whole from its revision (the document and the
/// CSV it references), never from the working tree, and no operand can become a git option. The loads are invented:
/// two nodal forces of a roof, −10 kN at x = 0 and at x = 2 m (hand statics for every expected value).
/// </summary>
public sealed class GitRevisionTests : IDisposable
{
    private const string Document = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "wind": { "loads": [ { "id": "roof", "kind": "forces", "file": "nodes.csv" } ] } } }
        """;

    private readonly TempFolder _repo = new();

    public GitRevisionTests()
    {
        Git("init", "-q", "-b", "main");
        Git("config", "user.name", "Test Engineer");
        Git("config", "user.email", "engineer@example.invalid");
        Directory.CreateDirectory(Path.Combine(_repo.Path, "models"));
        _repo.Write("models/roof.loads.json", Document);
        Nodes(-10);
        Git("add", ".");
        Git("commit", "-q", "-m", "Roof nodal loads");
        // the second revision changes only the CSV: the node at x = 2 carries −12 kN
        Nodes(-12);
        Git("commit", "-q", "-am", "Node 2 heavier");
        // the working tree holds a third version, which no REV:PATH operand may read
        Nodes(-99);
    }

    public void Dispose() => _repo.Dispose();

    private void Nodes(double fz2) =>
        _repo.Write("models/nodes.csv", $"id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,{fz2.ToString(System.Globalization.CultureInfo.InvariantCulture)}\n");

    private string Git(params string[] args) => GitProcess.Ok(_repo.Path, args);

    private static double Fz(JsonElement system) => system.GetProperty("force")[2].GetDouble();

    [Fact]
    public void Reduce_of_a_revision_reads_its_referenced_csv_from_that_revision()
    {
        // R = −10 − 10 = −20 kN in the first revision, −22 kN in the second; the working tree's −109 kN is never read.
        foreach ((string rev, double expected) in new[] { ("HEAD~1", -20.0), ("HEAD", -22.0) })
        {
            CliRun run = CliProcess.RunIn(_repo.Path, "reduce", rev + ":models/roof.loads.json", "--format", "json");
            Assert.True(run.ExitCode == 0, run.ToString());
            using JsonDocument doc = JsonDocument.Parse(run.Stdout);
            Assert.Equal(expected, Fz(doc.RootElement.GetProperty("cases")[0]), 12);
        }
    }

    [Fact]
    public void Check_of_a_csv_only_commit_fails_and_compares_the_two_revisions()
    {
        // ΔR = −2 kN (the node at x = 2 went from −10 to −12), far beyond 1e-3 × G_F = 0.02 kN.
        CliRun run = CliProcess.RunIn(_repo.Path, "check", "HEAD~1:models/roof.loads.json", "HEAD:models/roof.loads.json", "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement wind = doc.RootElement.GetProperty("cases")[0];
        Assert.Equal(-20, Fz(wind.GetProperty("original")), 12);
        Assert.Equal(-22, Fz(wind.GetProperty("substitute")), 12);
        Assert.Equal(2, wind.GetProperty("residual").GetProperty("force_norm").GetDouble(), 12);
        // the same revision against itself passes
        Assert.Equal(0, CliProcess.RunIn(_repo.Path, "check", "HEAD:models/roof.loads.json", "HEAD:models/roof.loads.json").ExitCode);
    }

    [Fact]
    public void Diff_of_a_csv_only_commit_reports_the_change_of_the_referenced_data()
    {
        CliRun run = CliProcess.RunIn(_repo.Path, "diff", "HEAD~1:models/roof.loads.json", "HEAD:models/roof.loads.json", "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.DoesNotContain("No differences", run.Stdout);
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.True(doc.RootElement.GetProperty("different").GetBoolean());
        // the changed row by id, with its own ΔR_i = −12 − (−10) = −2 kN and ΔM_i about the old centroid (1, 0, 0):
        // (2 − 1, 0, 0) × (0, 0, −2) = (0, 2, 0) kN·m (r × F by hand); the working tree's −99 kN is never read
        JsonElement data = doc.RootElement.GetProperty("items")[0].GetProperty("data")[0];
        Assert.Equal(1, data.GetProperty("changed").GetInt64());
        JsonElement row = data.GetProperty("rows")[0];
        Assert.Equal("n2", row.GetProperty("key").GetString());
        Assert.Equal(3, row.GetProperty("old_line").GetInt64());
        Assert.Contains("-12", row.GetProperty("new").GetString(), StringComparison.Ordinal);
        Assert.Equal(-2, row.GetProperty("delta_force")[2].GetDouble(), 12);
        Assert.Equal(2, row.GetProperty("delta_moment")[1].GetDouble(), 12);
        Assert.DoesNotContain("-99", run.Stdout, StringComparison.Ordinal);
        JsonElement wind = doc.RootElement.GetProperty("resultants")[0];
        Assert.Equal(-2, wind.GetProperty("delta_force")[2].GetDouble(), 12);
    }

    [Fact]
    public void Sections_read_both_revisions_whole()
    {
        // Cut at s = 1 along x: only the node at x = 0 is behind the cut, −10 kN in both revisions; past x = 2 the
        // cut shear is −20 and −22 kN (cantilever statics: V = ΣP behind the cut).
        CliRun run = CliProcess.RunIn(_repo.Path, "sections", "HEAD~1:models/roof.loads.json", "HEAD:models/roof.loads.json", "--axis", "x", "--format", "json");
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement wind = doc.RootElement.GetProperty("cases")[0];
        Assert.Equal(2, wind.GetProperty("max_force_deviation").GetDouble(), 12);
    }

    [Theory]
    [InlineData("--output=victim:x")]
    [InlineData("-p:models/roof.loads.json")]
    public void A_revision_beginning_with_a_dash_is_refused_and_nothing_is_run(string operand)
    {
        foreach (string command in new[] { "diff", "check", "reduce" })
        {
            string[] args = command == "reduce" ? [command, "--", operand] : [command, "--", operand, "models/roof.loads.json"];
            CliRun run = CliProcess.RunIn(_repo.Path, args);
            Assert.True(run.ExitCode == 2, run.ToString());
            Assert.Contains("may not begin with '-'", run.Stderr);
        }
        Assert.False(File.Exists(Path.Combine(_repo.Path, "victim:x")));
    }

    [Fact]
    public void Shell_metacharacters_reach_git_as_text_and_a_missing_path_is_one_line_exit_2()
    {
        string marker = Path.Combine(_repo.Path, "pwned");
        foreach (string operand in new[] { $"$(touch {marker}):models/roof.loads.json", $"HEAD;touch {marker}:x", "HEAD:models/missing.loads.json" })
        {
            CliRun run = CliProcess.RunIn(_repo.Path, "check", operand, "models/roof.loads.json");
            Assert.True(run.ExitCode == 2, run.ToString());
            Assert.Single(run.Stderr.Trim().Split('\n'));
            Assert.DoesNotContain("   at ", run.Stderr);
        }
        Assert.False(File.Exists(marker));
    }
}
