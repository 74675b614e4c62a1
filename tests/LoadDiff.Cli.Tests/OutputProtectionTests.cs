using System.Diagnostics;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Output files never replace an input or a file an input references, however the name reaches it (symbolic link,
/// hard link); fmt --write keeps links, permissions and read-only files as they are unless told otherwise; a write
/// that fails or is interrupted leaves no temporary file behind.
/// </summary>
[System.Runtime.Versioning.UnsupportedOSPlatform("windows")]
public class OutputProtectionTests
{
    private const string Referencing = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "w": { "loads": [ { "id": "nodes", "kind": "forces", "file": "nodes.csv" } ] } } }
        """;

    private const string Nodes = "id,x,y,z,fx,fy,fz\nn1,0,0,0,0,0,-10\nn2,2,0,0,0,0,-10\n";

    private const string Messy = """
        { "cases": { "d": { "loads": [ { "value": [0, 0, -1e3], "kind": "force", "at": [1.50, 0, 0], "id": "p" } ] } }, "units": { "force": "kN" } }
        """;

    private static readonly string Detailed = CliProcess.Fixture("footbridge", "detailed.loads.json");
    private static readonly string Simplified = CliProcess.Fixture("footbridge", "simplified.loads.json");

    private static Dictionary<string, byte[]> Snapshot(string folder) =>
        Directory.GetFiles(folder).ToDictionary(f => Path.GetFileName(f), File.ReadAllBytes);

    private static void AssertSame(Dictionary<string, byte[]> before, string folder)
    {
        Dictionary<string, byte[]> after = Snapshot(folder);
        Assert.Equal(before.Keys.Order(), after.Keys.Order());
        foreach (var kv in before)
        {
            Assert.True(kv.Value.AsSpan().SequenceEqual(after[kv.Key]), kv.Key + " changed");
        }
    }

    private static void HardLink(string existing, string link)
    {
        using var p = Process.Start(new ProcessStartInfo("ln", [existing, link]) { RedirectStandardError = true })!;
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, "ln failed: " + p.StandardError.ReadToEnd());
    }

    private static (int Exit, string Err) UnderSizeLimit(string workingDirectory, string arguments)
    {
        // no 'trap' here: the tool itself must ignore SIGXFSZ, or the limit kills it with exit 153 and no message.
        // W^X double mapping is switched off so the runtime itself can start under the limit.
        var psi = new ProcessStartInfo("bash") { RedirectStandardError = true, RedirectStandardOutput = true, UseShellExecute = false, WorkingDirectory = workingDirectory };
        psi.ArgumentList.Add("-c");
        psi.ArgumentList.Add($"ulimit -f 2; exec dotnet \"{CliProcess.ToolDll}\" {arguments}");
        psi.Environment["DOTNET_EnableWriteXorExecute"] = "0";
        psi.Environment["NO_COLOR"] = "1";
        using var p = Process.Start(psi)!;
        p.StandardOutput.ReadToEnd();
        string err = p.StandardError.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, err);
    }

    [Fact]
    public void Distribute_refuses_an_output_that_links_to_a_referenced_csv_or_the_points()
    {
        using var t = new TempFolder();
        string doc = t.Write("f.loads.json", Referencing);
        t.Write("nodes.csv", Nodes);
        string points = t.Write("pts.csv", File.ReadAllText(CliProcess.Fixture("equipment-skid", "support-points.csv")));
        // the output name must end in .loads.json, so a link with that name is how a CSV input can be reached
        File.CreateSymbolicLink(Path.Combine(t.Path, "via-symlink.loads.json"), "nodes.csv");
        HardLink(points, Path.Combine(t.Path, "via-hardlink.loads.json"));
        Dictionary<string, byte[]> before = Snapshot(t.Path);

        foreach (string output in new[] { "via-symlink.loads.json", "via-hardlink.loads.json" })
        {
            CliRun run = CliProcess.Run("distribute", doc, "--onto", points, "-o", Path.Combine(t.Path, output));
            Assert.True(run.ExitCode == 2, run.ToString());
            string line = Assert.Single(run.StderrLines);
            Assert.Contains("LD080", line);
            AssertSame(before, t.Path);
        }
        Assert.True(File.ResolveLinkTarget(Path.Combine(t.Path, "via-symlink.loads.json"), false) is not null, "the link was replaced");

        // the same inputs with a fresh output name are fine (the refusal is about the name, not the inputs)
        CliRun ok = CliProcess.Run("distribute", doc, "--onto", points, "-o", Path.Combine(t.Path, "out.loads.json"));
        Assert.True(ok.ExitCode == 0, ok.ToString());
    }

    [Fact]
    public void A_report_that_is_a_hard_link_to_an_input_is_refused()
    {
        using var t = new TempFolder();
        string original = t.Write("original.loads.json", File.ReadAllText(Detailed));
        string report = Path.Combine(t.Path, "review.md");
        HardLink(original, report); // a different path, the same inode: only the device+inode comparison sees it
        Dictionary<string, byte[]> before = Snapshot(t.Path);
        CliRun run = CliProcess.Run("check", original, Simplified, "--report", report);
        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Contains("LD080", Assert.Single(run.StderrLines));
        AssertSame(before, t.Path);
    }

    [Fact]
    public void Fmt_write_through_a_symbolic_link_replaces_the_target_and_keeps_the_link_and_mode()
    {
        using var t = new TempFolder();
        Directory.CreateDirectory(Path.Combine(t.Path, "real"));
        string target = t.Write("real/m.loads.json", Messy);
        File.SetUnixFileMode(target, UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead);
        string link = Path.Combine(t.Path, "link.loads.json");
        File.CreateSymbolicLink(link, Path.Combine("real", "m.loads.json"));

        CliRun run = CliProcess.Run("fmt", "--write", link);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Equal(Path.Combine("real", "m.loads.json"), new FileInfo(link).LinkTarget);
        Assert.Contains("\"value\": [0, 0, -1000]", File.ReadAllText(target));
        Assert.Equal(UnixFileMode.UserRead | UnixFileMode.UserWrite | UnixFileMode.GroupRead, File.GetUnixFileMode(target));
        Assert.Empty(Directory.GetFiles(t.Path, "*.tmp", SearchOption.AllDirectories));
    }

    // fmt --write refuses the file (LD081, naming the option, every file in the folder unchanged), then with the option
    // rewrites it in canonical form.
    private static void RefusedUnlessTold(string folder, string f, string option)
    {
        Dictionary<string, byte[]> before = Snapshot(folder);
        CliRun refused = CliProcess.Run("fmt", "--write", f);
        Assert.True(refused.ExitCode == 2, refused.ToString());
        string line = Assert.Single(refused.StderrLines);
        Assert.Contains("LD081", line);
        Assert.Contains(option, line);
        AssertSame(before, folder);

        CliRun allowed = CliProcess.Run("fmt", "--write", option, f);
        Assert.True(allowed.ExitCode == 0, allowed.ToString());
        Assert.Contains("\"value\": [0, 0, -1000]", File.ReadAllText(f));
    }

    [Fact]
    public void Fmt_write_refuses_a_read_only_file_unless_told()
    {
        using var t = new TempFolder();
        string f = t.Write("ro.loads.json", Messy);
        const UnixFileMode readOnly = UnixFileMode.UserRead | UnixFileMode.GroupRead | UnixFileMode.OtherRead; // 0444
        File.SetUnixFileMode(f, readOnly);
        RefusedUnlessTold(t.Path, f, "--replace-read-only");
        Assert.Equal(readOnly, File.GetUnixFileMode(f));
    }

    [Fact]
    public void Fmt_write_refuses_a_file_with_two_hard_links_unless_told()
    {
        using var t = new TempFolder();
        string f = t.Write("a.loads.json", Messy);
        string other = Path.Combine(t.Path, "b.loads.json");
        HardLink(f, other);
        RefusedUnlessTold(t.Path, f, "--split-hard-links");
        Assert.Equal(Messy, File.ReadAllText(other)); // the other name keeps the old content, as the option says
    }

    [Fact]
    public void Fmt_write_under_a_file_size_limit_is_one_coded_line_without_a_trap()
    {
        using var t = new TempFolder();
        string big = Messy.Replace("\"units\"", "\"title\": \"" + new string('x', 3000) + "\", \"units\"", StringComparison.Ordinal);
        string f = t.Write("big.loads.json", big);
        Dictionary<string, byte[]> before = Snapshot(t.Path);
        (int exit, string err) = UnderSizeLimit(t.Path, $"fmt --write \"{f}\"");
        Assert.True(exit == 2, "exit " + exit + ": " + err);
        string line = Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("LD082", line);
        Assert.Contains("unchanged", line);
        AssertSame(before, t.Path);
    }

    [Fact]
    public void An_html_report_under_a_file_size_limit_is_one_coded_line_and_leaves_no_temporary_file()
    {
        using var t = new TempFolder();
        string report = Path.Combine(t.Path, "r.html"); // the page with drawings is far over 2 KiB
        (int exit, string err) = UnderSizeLimit(t.Path, $"check \"{Detailed}\" \"{Simplified}\" --report \"{report}\"");
        Assert.True(exit == 2, "exit " + exit + ": " + err);
        string line = Assert.Single(err.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("LD082", line);
        Assert.Empty(Directory.GetFiles(t.Path));
    }

    [Fact]
    public void A_stale_temporary_file_of_the_target_is_removed_by_the_next_write()
    {
        using var t = new TempFolder();
        // what a killed run leaves: the tool's own pattern, .NAME.<8 hex digits>.tmp
        string stale = t.Write(".review.md.0123abcd.tmp", "half a report");
        string notOurs = t.Write(".review.md.backup.tmp", "someone else's file");
        string otherTarget = t.Write(".other.md.0123abcd.tmp", "another target's");
        CliRun run = CliProcess.Run("check", Detailed, Simplified, "--report", Path.Combine(t.Path, "review.md"));
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        Assert.False(File.Exists(stale));
        Assert.True(File.Exists(notOurs));
        Assert.True(File.Exists(otherTarget));
        Assert.True(File.Exists(Path.Combine(t.Path, "review.md")));
    }
}
