using System.Diagnostics;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Real git: <c>git log -p</c> through the textconv filter on a document that references a forces CSV. git hands the
/// filter temporary copies of the blobs (in its temporary folder, without the CSV), so the output must depend on the
/// content only: a commit that changes whitespace, comments and key order shows no changed line. Invented demo loads.
/// </summary>
public sealed class GitTextConvTests : IDisposable
{
    private readonly TempFolder _repo = new();

    private const string First = """
        { "units": { "force": "kN", "length": "m" },
          "cases": {
            "dead": { "loads": [ { "id": "beam", "kind": "force", "at": [1, 2, 0], "value": [0, 0, -0.1] },
                                 { "id": "slab", "kind": "force", "at": [1, 2, 0], "value": [0, 0, -0.2] } ] },
            "wind": { "loads": [ { "id": "nodes", "kind": "forces", "file": "exports/wind.csv" } ] } } }
        """;

    // the same model: other whitespace, comments added and moved, keys of items in another order
    private const string Respelled = """
        // wind from the export beside this file
        {
          "cases": {
            "dead": {
              "loads": [
                { "value": [0, 0, -0.1], "at": [1, 2, 0], "kind": "force", "id": "beam" },   // primary beam
                { "kind": "force", "id": "slab", "at": [1.0, 2, 0], "value": [0, 0, -2e-1] }
              ]
            },
            /* export of the wind model */ "wind": { "loads": [ { "file": "exports/wind.csv", "kind": "forces", "id": "nodes" } ] }
          },
          "units": { "length": "m", "force": "kN" }
        }
        """;

    public GitTextConvTests()
    {
        Git("init", "-q", "-b", "main");
        Git("config", "user.name", "Test Engineer");
        Git("config", "user.email", "engineer@example.invalid");
        Git("config", "diff.loaddiff.textconv", $"dotnet \"{CliProcess.ToolDll}\" diff --textconv");
        _repo.Write(".gitattributes", "*.loads.json diff=loaddiff\n");
        _repo.Write("exports/wind.csv", "id,x,y,z,fx,fy,fz\nn1,2,3,0,0,5,0\n");
        _repo.Write("canopy.loads.json", First);
        Git("add", ".");
        Git("commit", "-q", "-m", "Canopy loads");
        _repo.Write("canopy.loads.json", Respelled);
        Git("commit", "-q", "-am", "Respelled");
        _repo.Write("canopy.loads.json", Respelled.Replace("-2e-1", "-0.25", StringComparison.Ordinal));
        Git("commit", "-q", "-am", "Heavier slab");
    }

    public void Dispose() => _repo.Dispose();

    private string Git(params string[] args)
    {
        var psi = new ProcessStartInfo("git") { WorkingDirectory = _repo.Path, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        // no dependence on the machine's or user's git configuration
        psi.Environment["GIT_CONFIG_NOSYSTEM"] = "1";
        psi.Environment["GIT_CONFIG_GLOBAL"] = "/dev/null";
        psi.Environment["HOME"] = _repo.Path;
        psi.Environment["GIT_PAGER"] = "cat";
        psi.Environment["NO_COLOR"] = "1";
        using var p = Process.Start(psi)!;
        Task<string> err = p.StandardError.ReadToEndAsync();
        string output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"git {string.Join(' ', args)} exited {p.ExitCode}: {err.Result}");
        return output;
    }

    // the changed lines (−/+, not the ---/+++ headers) of one commit's patch
    private static string[] ChangedLines(string log, string subject)
    {
        string[] commits = log.Split("commit-subject ", StringSplitOptions.RemoveEmptyEntries);
        string patch = Assert.Single(commits, c => c.StartsWith(subject + "\n", StringComparison.Ordinal));
        return [.. patch.Split('\n').Where(l => (l.StartsWith('-') && !l.StartsWith("---", StringComparison.Ordinal))
            || (l.StartsWith('+') && !l.StartsWith("+++", StringComparison.Ordinal)))];
    }

    [Fact]
    public void Git_log_p_shows_no_changed_line_for_a_commit_that_only_respells_the_document()
    {
        string log = Git("log", "-p", "--format=commit-subject %s", "--", "canopy.loads.json");
        Assert.Empty(ChangedLines(log, "Respelled"));

        // a real change still shows: the slab load and the resultant lines of the case (by hand: −0.1 − 0.25 = −0.35 kN)
        string[] heavier = ChangedLines(log, "Heavier slab");
        Assert.Contains("-        { \"id\": \"slab\", \"kind\": \"force\", \"at\": [1, 2, 0], \"value\": [0, 0, -0.2] }", heavier);
        Assert.Contains("+        { \"id\": \"slab\", \"kind\": \"force\", \"at\": [1, 2, 0], \"value\": [0, 0, -0.25] }", heavier);
        Assert.Contains(heavier, l => l.StartsWith("+// case dead: R = [0, 0, " + (-0.1m - 0.25m).ToString(System.Globalization.CultureInfo.InvariantCulture) + "]", StringComparison.Ordinal));
        Assert.Equal(4, heavier.Length);

        // git's copies lie elsewhere: the CSV is named as the document writes it, no temporary path is printed
        Assert.Contains("// referenced file \"exports/wind.csv\" is not read by textconv", log);
        Assert.DoesNotContain(Path.GetTempPath(), log);
    }
}
