using System.Diagnostics;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public class FmtCommandTests
{
    private const string Messy = """
        { "cases": { "d": { "loads": [ { "value": [0, 0, -1e3], "kind": "force", "at": [1.50, 0, 0], "id": "p" } ] } }, "units": { "force": "kN" } }
        """;

    [Fact]
    public void Check_exits_1_for_a_messy_file_and_0_after_write()
    {
        using var t = new TempFolder();
        string f = t.Write("m.loads.json", Messy);
        CliRun check = CliProcess.Run("fmt", "--check", f);
        Assert.True(check.ExitCode == 1, check.ToString());
        CliRun write = CliProcess.Run("fmt", "--write", f);
        Assert.True(write.ExitCode == 0, write.ToString());
        Assert.Contains("\"value\": [0, 0, -1000]", File.ReadAllText(f));
        Assert.Equal(0, CliProcess.Run("fmt", "--check", f).ExitCode);
        // idempotent: formatting the canonical file changes nothing
        Assert.Equal(File.ReadAllText(f), CliProcess.Run("fmt", f).Stdout);
        Assert.Equal(0, CliProcess.Run("diff", t.Write("orig.loads.json", Messy), f).ExitCode);
    }

    [Fact]
    public void Write_refuses_a_file_with_comments_unless_told_to_drop_them()
    {
        using var t = new TempFolder();
        string text = "// keep me\n" + Messy;
        string f = t.Write("c.loads.json", text);
        CliRun run = CliProcess.Run("fmt", "--write", f);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("comments", run.Stderr);
        Assert.Equal(text, File.ReadAllText(f));
        Assert.Equal(1, CliProcess.Run("fmt", "--check", f).ExitCode);
        Assert.Equal(0, CliProcess.Run("fmt", "--write", "--drop-comments", f).ExitCode);
        Assert.DoesNotContain("keep me", File.ReadAllText(f));
    }

    private const string Commented = """
        // Shed S-3 (invented): roof loads
        { "cases": {
            // self-weight of the purlins
            "dead": { "loads": [
              // purlin P1, from the supplier's table
              { "id": "p1", "kind": "force", "at": [1.50, 0, 0], "value": [0, 0, -1e3] },
              { "id": "p2", "kind": "force", "at": [3, 0, 0], "value": [0, 0, -2e3], "note": "purlin P2" } ] } },
          "units": { "force": "kN" } }
        """;

    [Fact]
    public void Comments_to_notes_moves_each_comment_into_the_note_of_what_follows_and_the_file_becomes_canonical()
    {
        using var t = new TempFolder();
        string f = t.Write("c.loads.json", Commented);
        CliRun write = CliProcess.Run("fmt", "--write", "--comments-to-notes", f);
        Assert.True(write.ExitCode == 0, write.ToString());
        string text = File.ReadAllText(f);
        // the expected lines are the comments above, placed by the rule of SPEC §3 / README (document, case, item notes)
        Assert.Contains("  \"note\": \"Shed S-3 (invented): roof loads\",\n", text, StringComparison.Ordinal);
        Assert.Contains("      \"note\": \"self-weight of the purlins\",\n", text, StringComparison.Ordinal);
        Assert.Contains("{ \"id\": \"p1\", \"kind\": \"force\", \"at\": [1.5, 0, 0], \"value\": [0, 0, -1000], \"note\": \"purlin P1, from the supplier's table\" }", text, StringComparison.Ordinal);
        Assert.Contains("\"note\": \"purlin P2\" }", text, StringComparison.Ordinal);
        Assert.DoesNotContain("//", text, StringComparison.Ordinal);
        Assert.Equal(0, CliProcess.Run("fmt", "--check", f).ExitCode);
        // the loads are the same: diff against the commented original finds only the notes
        CliRun diff = CliProcess.Run("diff", "--format", "json", t.Write("orig.loads.json", Commented), f);
        using var json = System.Text.Json.JsonDocument.Parse(diff.Stdout);
        Assert.All(json.RootElement.GetProperty("resultants").EnumerateArray(), r => Assert.True(r.GetProperty("unchanged").GetBoolean()));
        var item = Assert.Single(json.RootElement.GetProperty("items").EnumerateArray());
        Assert.Equal("p1", item.GetProperty("id").GetString());
        Assert.Equal("note", Assert.Single(item.GetProperty("fields").EnumerateArray()).GetProperty("field").GetString());
    }

    [Fact]
    public void A_comment_that_cannot_become_a_note_is_refused_with_file_line_and_column_and_the_file_is_unchanged()
    {
        using var t = new TempFolder();
        string text = Commented.Replace("[0, 0, -1e3] },", "[0, 0, -1e3] }, // trailing", StringComparison.Ordinal);
        string f = t.Write("t.loads.json", text);
        CliRun run = CliProcess.Run("fmt", "--write", "--comments-to-notes", f);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        int column = text.Split('\n')[5].IndexOf("//", StringComparison.Ordinal) + 1; // line 6 of the file, 1-based column
        Assert.StartsWith($"loaddiff: {f}:6:{column}: this comment cannot become a note", line, StringComparison.Ordinal);
        Assert.Equal(text, File.ReadAllText(f));
        // the advice of --check must work on this file: it names the comment, and offers dropping the comments
        CliRun check = CliProcess.Run("fmt", "--check", f);
        Assert.Equal(1, check.ExitCode);
        Assert.Contains($"line 6, column {column}", check.Stderr, StringComparison.Ordinal);
        Assert.Contains($"'loaddiff fmt --write --drop-comments {f}'", check.Stderr, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void The_advice_of_check_is_a_command_that_makes_the_file_canonical(bool comments)
    {
        using var t = new TempFolder();
        string f = t.Write("a.loads.json", comments ? Commented : Messy);
        CliRun check = CliProcess.Run("fmt", "--check", f);
        Assert.Equal(1, check.ExitCode);
        string advice = System.Text.RegularExpressions.Regex.Match(check.Stderr, "run 'loaddiff ([^']*)'").Groups[1].Value;
        Assert.Equal(comments, advice.Contains("--comments-to-notes", StringComparison.Ordinal));
        CliRun fix = CliProcess.Run(advice.Split(' '));
        Assert.True(fix.ExitCode == 0, fix.ToString());
        Assert.Equal(0, CliProcess.Run("fmt", "--check", f).ExitCode);
    }

    [Fact]
    public void Every_fixture_outside_bad_is_canonical()
    {
        string root = CliProcess.Fixture();
        string[] files = [.. Directory.GetFiles(root, "*.loads.json", SearchOption.AllDirectories)
            .Where(p => !Path.GetRelativePath(root, p).StartsWith("bad" + Path.DirectorySeparatorChar, StringComparison.Ordinal))];
        Assert.Equal(8, files.Length); // footbridge 4, tank-wall 3, equipment-skid 1
        foreach (string file in files)
        {
            CliRun run = CliProcess.Run("fmt", "--check", file);
            Assert.True(run.ExitCode == 0, file + ": " + run);
        }
    }

    [Fact]
    public void Comments_to_notes_is_refused_with_check_or_drop_comments()
    {
        using var t = new TempFolder();
        string f = t.Write("c.loads.json", Commented);
        Assert.Equal(2, CliProcess.Run("fmt", "--check", "--comments-to-notes", f).ExitCode);
        Assert.Equal(2, CliProcess.Run("fmt", "--write", "--comments-to-notes", "--drop-comments", f).ExitCode);
        Assert.Equal(Commented, File.ReadAllText(f));
    }

    [Fact]
    public void Write_leaves_the_original_intact_when_writing_fails()
    {
        // Root ignores permissions, so the failure comes from the file-size limit (RLIMIT_FSIZE, `ulimit -f`), which binds
        // root too. With SIGXFSZ ignored the write returns EFBIG; the tool must report it, remove its temporary file and
        // leave the original as it was. W^X double mapping is switched off so the runtime itself can start under the limit.
        using var t = new TempFolder();
        string big = Messy.Replace("\"units\"", "\"title\": \"" + new string('x', 3000) + "\", \"units\"", StringComparison.Ordinal);
        string f = t.Write("big.loads.json", big);
        byte[] before = File.ReadAllBytes(f);
        var psi = new ProcessStartInfo("bash") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false };
        psi.ArgumentList.Add("-c");
        psi.ArgumentList.Add($"trap '' XFSZ; ulimit -f 2; exec dotnet \"{CliProcess.ToolDll}\" fmt --write \"{f}\"");
        psi.Environment["DOTNET_EnableWriteXorExecute"] = "0";
        using var p = Process.Start(psi)!;
        string err = p.StandardError.ReadToEnd();
        p.WaitForExit();
        Assert.True(p.ExitCode == 2, "exit " + p.ExitCode + ": " + err);
        Assert.Contains("unchanged", err);
        Assert.Equal(before, File.ReadAllBytes(f));
        Assert.Equal(new[] { "big.loads.json" }, Directory.GetFiles(t.Path).Select(x => Path.GetFileName(x)).ToArray());
    }

    [Fact]
    public void A_directory_or_missing_file_exits_2()
    {
        using var t = new TempFolder();
        Assert.Equal(2, CliProcess.Run("fmt", "--write", t.Path).ExitCode);
        Assert.Equal(2, CliProcess.Run("fmt", "--check", Path.Combine(t.Path, "none.loads.json")).ExitCode);
    }
}
