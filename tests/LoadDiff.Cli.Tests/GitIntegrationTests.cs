using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>Real git in a temporary repository: the driver configured through git's documented interfaces.</summary>
public sealed class GitIntegrationTests : IDisposable
{
    private readonly TempFolder _repo = new();

    public GitIntegrationTests()
    {
        Git("init", "-q", "-b", "main");
        Git("config", "user.name", "Test Engineer");
        Git("config", "user.email", "engineer@example.invalid");
        string tool = $"dotnet \"{CliProcess.ToolDll}\"";
        Git("config", "diff.loaddiff.command", tool + " diff --git-external");
        Git("config", "diff.loaddiff.textconv", tool + " diff --textconv");
        _repo.Write(".gitattributes", "*.loads.json diff=loaddiff\n");
        File.Copy(CliProcess.Fixture("footbridge", "detailed.loads.json"), Path.Combine(_repo.Path, "deck.loads.json"));
        Git("add", ".");
        Git("commit", "-q", "-m", "Deck loads");
        File.Copy(CliProcess.Fixture("footbridge", "detailed-rev-b.loads.json"), Path.Combine(_repo.Path, "deck.loads.json"), overwrite: true);
        Git("commit", "-q", "-am", "Revision B");
    }

    public void Dispose() => _repo.Dispose();

    private (int Exit, string Out, string Err) GitRun(params string[] args) => GitProcess.Run(_repo.Path, args);

    private string Git(params string[] args) => GitProcess.Ok(_repo.Path, args);

    [Fact]
    public void Git_diff_shows_the_semantic_diff_through_the_external_driver()
    {
        string output = Git("diff", "HEAD~1", "HEAD");
        Assert.Contains("loaddiff diff a/deck.loads.json b/deck.loads.json", output);
        Assert.Contains("~ changed  rear-left (force)", output);
        Assert.Contains("value: [0, 0, -20] → [0, 0, -22] kN", output);
        Assert.Contains("+ added    lighting-column (force)", output);
        Assert.Contains("Differences: 3 items changed, 1 added, 0 removed", output);
    }

    [Fact]
    public void Git_log_p_shows_canonical_listings_and_resultants_through_textconv()
    {
        string output = Git("log", "-p", "--format=commit %s");
        Assert.Contains("commit Revision B", output);
        // textconv: the canonical listing and the resultants
        Assert.Contains("+        { \"id\": \"water-tank\", \"kind\": \"mass\", \"at\": [12, 0, 1.2], \"value\": 1000 }", output);
        Assert.Contains("-        { \"id\": \"water-tank\", \"kind\": \"mass\", \"at\": [12, 0, 1.2], \"value\": 800 }", output);
        Assert.Contains("+// case vehicle: R = [0, 0, -73.80665]", output);
        // the document's note is part of the listing: the revision's added sentence shows on the changed note line
        Assert.Contains(output.Split('\n'), l => l.StartsWith("+  \"note\":", StringComparison.Ordinal) && l.Contains("\\nRevision B: the owner", StringComparison.Ordinal));
        string ext = Git("log", "-p", "--ext-diff", "-1", "--format=commit %s");
        Assert.Contains("~ changed  water-tank (mass)", ext);
    }

    [Fact]
    public void Rev_path_operands_are_read_through_git_show()
    {
        CliRun run = CliProcess.RunIn(_repo.Path, "diff", "HEAD~1:deck.loads.json", "HEAD:deck.loads.json", "--format", "markdown");
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Contains("HEAD\\~1:deck.loads.json → HEAD:deck.loads.json", run.Stdout); // ~ escaped: GitHub reads ~text~ as strike-through
        Assert.Contains("water-tank", run.Stdout);
        CliRun same = CliProcess.RunIn(_repo.Path, "diff", "HEAD:deck.loads.json", "deck.loads.json");
        Assert.True(same.ExitCode == 0, same.ToString());
        CliRun missing = CliProcess.RunIn(_repo.Path, "diff", "HEAD~5:deck.loads.json", "deck.loads.json");
        Assert.Equal(2, missing.ExitCode);
    }

    [Fact]
    public void Git_diff_of_a_working_change_with_no_semantic_difference_exits_0_and_says_so()
    {
        // reformat the file by hand: same model, different text (a comment, keys reordered, a number spelled otherwise)
        string path = Path.Combine(_repo.Path, "deck.loads.json");
        string canonical = File.ReadAllText(path);
        string reformatted = "// reformatted by hand\n" + canonical
            .Replace("{ \"id\": \"rear-left\", \"kind\": \"force\", \"at\": [10.5, -0.8, 0], \"value\": [0, 0, -22] }",
                "{ \"kind\": \"force\", \"id\": \"rear-left\", \"value\": [0, 0, -22.0], \"at\": [10.5, -0.8, 0] }", StringComparison.Ordinal)
            .Replace("\"value\": 1000 }", "\"value\": 1.0e3 }", StringComparison.Ordinal);
        Assert.Contains("\"id\": \"rear-left\", \"value\": [0, 0, -22.0]", reformatted, StringComparison.Ordinal); // both replacements took place
        Assert.Contains("\"value\": 1.0e3 }", reformatted, StringComparison.Ordinal);
        File.WriteAllText(path, reformatted);
        var (exit, output, _) = GitRun("diff");
        Assert.Equal(0, exit);
        Assert.Contains("No differences", output);
    }
}
