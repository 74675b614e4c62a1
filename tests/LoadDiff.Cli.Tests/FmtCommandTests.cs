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
