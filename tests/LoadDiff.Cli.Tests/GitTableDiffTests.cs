using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Real git with <c>*.csv diff=loaddiff</c> beside <c>*.loads.json diff=loaddiff</c>: a commit that changes only a
/// referenced CSV shows its changed rows through the external driver, the document's own diff never reads a table from
/// the working tree, and textconv of a table depends on its content only. Invented roof loads: −10 kN at x = 0 and
/// x = 2 m; the second commit makes the node at x = 2 carry −12 kN (hand statics for every expected value).
/// </summary>
public sealed class GitTableDiffTests : IDisposable
{
    private const string Document = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "wind": { "loads": [ { "id": "roof", "kind": "forces", "file": "nodes.csv" } ] } } }
        """;

    private readonly TempFolder _repo = new();

    public GitTableDiffTests()
    {
        Git("init", "-q", "-b", "main");
        Git("config", "user.name", "Test Engineer");
        Git("config", "user.email", "engineer@example.invalid");
        string tool = $"dotnet \"{CliProcess.ToolDll}\"";
        Git("config", "diff.loaddiff.command", tool + " diff --git-external");
        Git("config", "diff.loaddiff.textconv", tool + " diff --textconv");
        _repo.Write(".gitattributes", "*.loads.json diff=loaddiff\n*.csv diff=loaddiff\n");
        _repo.Write("models/roof.loads.json", Document);
        Nodes(-10);
        Git("add", ".");
        Git("commit", "-q", "-m", "Roof nodal loads");
        Nodes(-12);
        Git("commit", "-q", "-am", "Node 2 heavier");
        // the working tree holds a third version of both files
        Nodes(-99);
        _repo.Write("models/roof.loads.json", Document.Replace("\"wind\"", "\"gust\"", StringComparison.Ordinal));
    }

    public void Dispose() => _repo.Dispose();

    private void Nodes(double fz2) =>
        _repo.Write("models/nodes.csv", $"id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,{fz2.ToString(System.Globalization.CultureInfo.InvariantCulture)}\n");

    private string Git(params string[] args) => GitProcess.Ok(_repo.Path, args);

    [Fact]
    public void Git_diff_of_a_csv_only_commit_shows_the_changed_row_through_the_driver()
    {
        string output = Git("diff", "HEAD~1", "HEAD");
        Assert.Contains("loaddiff diff a/models/nodes.csv b/models/nodes.csv", output);
        // n2 at (2, 0, 0): −10 → −12 kN, ΔR_i = (0, 0, −2); about the old centroid (1, 0, 0): ΔM_i = (1, 0, 0) × (0, 0, −2) = (0, 2, 0)
        Assert.Contains("~ changed n2 (line 3): at [2, 0, 0] m, F [0, 0, -10] N → at [2, 0, 0] m, F [0, 0, -12] N; ΔR_i = (0, 0, -2) N, ΔM_i = (0, 2, 0) N·m", output);
        Assert.Contains("1 changed, 0 added, 0 removed", output);
        Assert.DoesNotContain("-99", output, StringComparison.Ordinal);
    }

    [Fact]
    public void The_documents_own_external_diff_never_reads_a_table_from_the_working_tree()
    {
        // working tree against HEAD: the case was renamed; the table's rows are not compared here and its resultant is not shown
        string output = Git("diff", "HEAD", "--", "models/roof.loads.json");
        Assert.Contains("loaddiff diff a/models/roof.loads.json b/models/roof.loads.json", output);
        Assert.Contains("not shown: needs \"nodes.csv\"", output);
        Assert.Contains("were not read (git's external diff hands over the documents only)", output);
        // the working tree's −99 kN row would make R = −109 kN; the committed ones −22 kN: neither is printed as a resultant
        Assert.DoesNotContain("-109", output, StringComparison.Ordinal);
        Assert.DoesNotContain("-22", output, StringComparison.Ordinal);
    }

    [Fact]
    public void Git_log_p_of_a_table_shows_its_rows_and_a_resultant_line_through_textconv()
    {
        string log = Git("log", "-p", "--no-ext-diff", "-1", "--", "models/nodes.csv");
        Assert.Contains("-n2,2,0,0,0,0,-10", log);
        Assert.Contains("+n2,2,0,0,0,0,-12", log);
        // R = −10 − 12 = −22, M about the origin = (2, 0, 0) × (0, 0, −12) = (0, 24, 0)
        Assert.Contains("+// loaddiff: 2 load rows; resultant about the origin", log);
        Assert.Contains("R = [0, 0, -22] M = [0, 24, 0]", log);
    }

    [Fact]
    public void Textconv_of_a_table_is_byte_identical_from_two_folders_and_names()
    {
        using var other = new TempFolder();
        const string rows = "id,x,y,z,fx,fy,fz\nn1,0.1,0.2,0,0,0,-0.3\nn2,2,0,0,x,0,-1\n";
        string first = _repo.Write("copy-a_nodes.csv", rows);
        Directory.CreateDirectory(Path.Combine(other.Path, "deep", "er"));
        string second = other.Write("deep/er/7f3a_nodes.csv", rows);
        CliRun a = CliProcess.RunIn(_repo.Path, "diff", "--textconv", first);
        CliRun b = CliProcess.RunIn(other.Path, "diff", "--textconv", second);
        Assert.Equal(0, a.ExitCode);
        Assert.Equal(a.Stdout, b.Stdout);
        // the bad number (line 3, column 10, counted by hand) is reported under a fixed name, not either file's
        Assert.Contains("// loaddiff: not readable as a load table: this-table:3:10: error", a.Stdout);
        Assert.DoesNotContain("nodes.csv", a.Stdout.Split('\n')[^2], StringComparison.Ordinal);
        string good = other.Write("good.csv", "id,x,y,z,fx,fy,fz\nn1,0.1,0,0,0,0,0.2\nn2,0.2,0,0,0,0,0.1\n");
        // 0.2 + 0.1 = 0.30000000000000004 in doubles; at 12 significant digits the line reads 0.3
        Assert.Contains("R = [0, 0, 0.3]", CliProcess.RunIn(other.Path, "diff", "--textconv", good).Stdout);
    }
}

/// <summary>A document at the top of a revision names the tables it references as REV:table.csv in diagnostics.</summary>
public sealed class GitTopLevelTableTests : IDisposable
{
    private readonly TempFolder _repo = new();

    public GitTopLevelTableTests()
    {
        GitProcess.Ok(_repo.Path, "init", "-q", "-b", "main");
        GitProcess.Ok(_repo.Path, "config", "user.name", "Test Engineer");
        GitProcess.Ok(_repo.Path, "config", "user.email", "engineer@example.invalid");
        _repo.Write("roof.loads.json", """{ "cases": { "wind": { "loads": [ { "id": "roof", "kind": "forces", "file": "nodes.csv" } ] } } }""");
        _repo.Write("nodes.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,oops\n");
        GitProcess.Ok(_repo.Path, "add", ".");
        GitProcess.Ok(_repo.Path, "commit", "-q", "-m", "Roof");
        _repo.Write("nodes.csv", "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\n");
    }

    public void Dispose() => _repo.Dispose();

    [Fact]
    public void A_bad_row_in_a_committed_table_is_named_by_revision_line_and_column()
    {
        CliRun run = CliProcess.RunIn(_repo.Path, "reduce", "HEAD:roof.loads.json");
        Assert.Equal(2, run.ExitCode);
        // 'oops' starts at column 14 of line 3 (counted by hand)
        Assert.StartsWith("HEAD:nodes.csv:3:14: error", run.Stderr, StringComparison.Ordinal);
        Assert.DoesNotContain("loaddiff-rev-", run.Stderr, StringComparison.Ordinal);
        Assert.Equal(0, CliProcess.RunIn(_repo.Path, "reduce", "roof.loads.json").ExitCode);
    }
}
