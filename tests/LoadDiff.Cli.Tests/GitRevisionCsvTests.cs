using System.Globalization;
using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Real git in a temporary repository: CSV files reached as <c>REV:PATH</c> — the points of <c>distribute --onto</c> and a
/// load CSV given directly to <c>check</c>/<c>reduce</c> — come from the revision, never from the working tree, and a
/// diagnostic inside one names the operand as written with its line and column, never the temporary copy. The scenario
/// is invented: a lintel carrying one vertical force of −10 kN at x = 1 m, resting on two supports whose positions
/// change from revision to revision. Expected forces are beam statics (two-support reactions by the lever rule).
/// </summary>
public sealed class GitRevisionCsvTests : IDisposable
{
    private const string Lintel = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "dead": { "loads": [ { "id": "P", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10] } ] } } }
        """;

    // Every snapshot folder of a REV:PATH operand is named so (GitSource.Open); no diagnostic may show one.
    private const string SnapshotPrefix = "loaddiff-rev-";

    private readonly TempFolder _repo = new();

    public GitRevisionCsvTests()
    {
        Git("init", "-q", "-b", "main");
        Git("config", "user.name", "Test Engineer");
        Git("config", "user.email", "engineer@example.invalid");
        _repo.Write("model.loads.json", Lintel);
        Supports(2);
        // committed with bad rows; the working tree holds good versions, so a bad row can only come from the revision
        _repo.Write("bad-number.csv", "id,x,y,z\nwest,0,0,0\neast,2,x,0\n");
        _repo.Write("duplicate.csv", "id,x,y,z\nwest,0,0,0\neast,2,0,0\nwest,4,0,0\n");
        _repo.Write("no-z.csv", "id,x,y\nwest,0,0\neast,2,0\n");
        _repo.Write("bad.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,abc\n");
        _repo.Write("data/nodes.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,-10\n");
        Git("add", ".");
        Git("commit", "-q", "-m", "Lintel on supports 2 m apart");
        Supports(3);
        Git("commit", "-q", "-am", "Supports 3 m apart");
        // the working tree: supports 4 m apart, every bad file repaired, the nodes changed
        Supports(4);
        _repo.Write("bad-number.csv", "id,x,y,z\nwest,0,0,0\neast,2,0,0\n");
        _repo.Write("duplicate.csv", "id,x,y,z\nwest,0,0,0\neast,2,0,0\n");
        _repo.Write("no-z.csv", "id,x,y,z\nwest,0,0,0\neast,2,0,0\n");
        _repo.Write("bad.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,-10\n");
        _repo.Write("data/nodes.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-99\n");
    }

    public void Dispose() => _repo.Dispose();

    private void Supports(double east) =>
        _repo.Write("supports.csv", $"id,x,y,z\nwest,0,0,0\neast,{east.ToString(CultureInfo.InvariantCulture)},0,0\n");

    private string Git(params string[] args) => GitProcess.Ok(_repo.Path, args);

    // Two-support reactions of a force P at distance a from the west support, span L (lever rule): west P(L − a)/L, east P·a/L.
    private static (double West, double East) LeverRule(double p, double a, double span) => (p * (span - a) / span, p * a / span);

    // The written substitute (standard output of distribute): each support's position along x and its vertical force.
    private static Dictionary<string, (double X, double Fz)> Forces(CliRun run)
    {
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip });
        var forces = new Dictionary<string, (double, double)>(StringComparer.Ordinal);
        foreach (JsonElement load in doc.RootElement.GetProperty("cases").GetProperty("dead").GetProperty("loads").EnumerateArray())
        {
            forces.Add(load.GetProperty("id").GetString()!, (load.GetProperty("at")[0].GetDouble(), load.GetProperty("value")[2].GetDouble()));
        }
        return forces;
    }

    private static void AssertOneCleanLine(CliRun run)
    {
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Single(run.StderrLines);
        Assert.DoesNotContain(SnapshotPrefix, run.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("Exception", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void Distribute_onto_a_revision_uses_the_points_committed_there_and_not_the_working_tree()
    {
        // HEAD~1: supports at x = 0 and 2, the force at x = 1 midway: −5 kN each (lever rule, a = 1, L = 2).
        // HEAD: L = 3, −6.667 and −3.333 kN; the working tree: L = 4, −7.5 and −2.5 kN.
        foreach ((string onto, double span) in new[] { ("HEAD~1:supports.csv", 2.0), ("HEAD:supports.csv", 3.0), ("supports.csv", 4.0) })
        {
            Dictionary<string, (double X, double Fz)> forces = Forces(CliProcess.RunIn(_repo.Path, "distribute", "HEAD~1:model.loads.json", "--onto", onto));
            (double west, double east) = LeverRule(-10, 1, span);
            Assert.Equal(2, forces.Count);
            Assert.Equal(0, forces["west"].X);
            Assert.Equal(span, forces["east"].X);
            Assert.Equal(west, forces["west"].Fz, 9);
            Assert.Equal(east, forces["east"].Fz, 9);
        }
        // FILE from the working tree, points from the revision: the committed supports (−5 kN each, not the tree's −7.5)
        Dictionary<string, (double X, double Fz)> mixed = Forces(CliProcess.RunIn(_repo.Path, "distribute", "model.loads.json", "--onto", "HEAD~1:supports.csv"));
        (double midWest, double midEast) = LeverRule(-10, 1, 2);
        Assert.Equal(midWest, mixed["west"].Fz, 9);
        Assert.Equal(midEast, mixed["east"].Fz, 9);
        Assert.NotEqual(LeverRule(-10, 1, 4).West, mixed["west"].Fz, 3);
    }

    [Fact]
    public void Output_over_an_input_is_still_refused_with_points_from_a_revision()
    {
        string model = Path.Combine(_repo.Path, "model.loads.json");
        CliRun run = CliProcess.RunIn(_repo.Path, "distribute", "model.loads.json", "--onto", "HEAD~1:supports.csv", "-o", "model.loads.json");
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("error LD080: 'model.loads.json' is the same file as the input file", run.Stderr, StringComparison.Ordinal);
        Assert.Equal(Lintel, File.ReadAllText(model));
    }

    [Theory]
    // bad-number.csv line 3 "east,2,x,0": the y field begins after "east,2," (7 characters), column 8
    [InlineData("bad-number.csv", ":3:8: error LD")]
    // duplicate.csv line 4 "west,4,0,0": the id, column 1
    [InlineData("duplicate.csv", ":4:1: error LD")]
    // no-z.csv: the header (line 1) lacks z
    [InlineData("no-z.csv", ":1:1: error LD")]
    public void A_bad_row_in_committed_points_names_the_operand_and_its_position(string file, string position)
    {
        CliRun run = CliProcess.RunIn(_repo.Path, "distribute", "model.loads.json", "--onto", "HEAD~1:" + file);
        AssertOneCleanLine(run);
        Assert.StartsWith("HEAD~1:" + file + position, run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void A_bad_row_in_a_committed_load_csv_names_the_operand_and_its_position()
    {
        // bad.csv line 3 "n2,2,0,0,0,0,abc": fz begins after 13 characters, column 14; the working tree's copy is good.
        // check without a report reads the CSV in reduced blocks, with --report item by item: both name the operand.
        string report = Path.Combine(_repo.Path, "report.html");
        foreach (string[] args in new[]
        {
            new[] { "check", "HEAD~1:bad.csv", "model.loads.json" },
            ["check", "model.loads.json", "HEAD:bad.csv", "--report", report],
            ["reduce", "HEAD~1:bad.csv"],
        })
        {
            CliRun run = CliProcess.RunIn(_repo.Path, args);
            AssertOneCleanLine(run);
            string operand = args.First(a => a.EndsWith(":bad.csv", StringComparison.Ordinal));
            Assert.StartsWith(operand + ":3:14: error LD", run.Stderr, StringComparison.Ordinal);
        }
        Assert.False(File.Exists(report));
        // the working tree's bad.csv is good: the same command without the revision succeeds
        Assert.Equal(0, CliProcess.RunIn(_repo.Path, "reduce", "bad.csv").ExitCode);
    }

    [Fact]
    public void A_load_csv_from_a_revision_is_one_case_named_after_its_file()
    {
        // committed: −10 kN at x = 0 and at x = 2, R = −20 kN (the working tree's one node of −99 kN is never read)
        CliRun run = CliProcess.RunIn(_repo.Path, "reduce", "HEAD:data/nodes.csv", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement only = Assert.Single(doc.RootElement.GetProperty("cases").EnumerateArray());
        Assert.Equal("nodes", only.GetProperty("name").GetString());
        Assert.Equal(-20, only.GetProperty("force")[2].GetDouble(), 12);
    }

    [Fact]
    public void Points_missing_from_the_revision_are_one_line_exit_2()
    {
        CliRun run = CliProcess.RunIn(_repo.Path, "distribute", "model.loads.json", "--onto", "HEAD:missing.csv");
        AssertOneCleanLine(run);
        Assert.Contains("'HEAD:missing.csv'", run.Stderr, StringComparison.Ordinal);
        // a revision that does not exist: the same
        CliRun rev = CliProcess.RunIn(_repo.Path, "distribute", "model.loads.json", "--onto", "no-such-branch:supports.csv");
        AssertOneCleanLine(rev);
        Assert.Contains("'no-such-branch:supports.csv'", rev.Stderr, StringComparison.Ordinal);
    }
}
