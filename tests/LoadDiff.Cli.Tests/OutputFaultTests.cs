using System.Diagnostics;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>Output files are written through a temporary file and a rename: a failed write leaves what was there.</summary>
public class OutputFaultTests
{
    private static readonly string Detailed = CliProcess.Fixture("footbridge", "detailed.loads.json");
    private static readonly string Simplified = CliProcess.Fixture("footbridge", "simplified.loads.json");

    private static void Chattr(string flag, string path)
    {
        using var p = Process.Start(new ProcessStartInfo("chattr", [flag, path]) { RedirectStandardError = true })!;
        p.WaitForExit();
        Assert.True(p.ExitCode == 0, $"chattr {flag} {path} failed: {p.StandardError.ReadToEnd()} (the test needs an ext4-like file system and root)");
    }

    [ImmutableFolderFact]
    public void A_report_into_a_folder_that_refuses_writes_exits_2_and_keeps_the_old_report()
    {
        using var t = new TempFolder();
        string folder = Path.Combine(t.Path, "reports");
        Directory.CreateDirectory(folder);
        string report = Path.Combine(folder, "review.md");
        File.WriteAllText(report, "previous report\n");
        // Tests run as root, which ignores permission bits; the immutable attribute stops root too.
        Chattr("+i", folder);
        try
        {
            CliRun run = CliProcess.Run("check", Detailed, Simplified, "--report", report);
            Assert.Equal(2, run.ExitCode);
            Assert.Contains("cannot write", Assert.Single(run.StderrLines));
            Assert.Equal("previous report\n", File.ReadAllText(report));
            Assert.Equal(new[] { report }, Directory.GetFiles(folder));
        }
        finally
        {
            Chattr("-i", folder);
        }
    }

    [Fact]
    public void A_report_path_that_is_a_directory_exits_2()
    {
        using var t = new TempFolder();
        CliRun run = CliProcess.Run("check", Detailed, Simplified, "--report", t.Path + "/sub.md/");
        Directory.CreateDirectory(Path.Combine(t.Path, "dir.md"));
        CliRun dir = CliProcess.Run("check", Detailed, Simplified, "--report", Path.Combine(t.Path, "dir.md"));
        Assert.Equal(2, dir.ExitCode);
        Assert.Contains("is a directory", dir.Stderr);
        Assert.Equal(2, run.ExitCode);
    }

    [Fact]
    public void A_report_into_a_missing_folder_exits_2()
    {
        using var t = new TempFolder();
        CliRun run = CliProcess.Run("check", Detailed, Simplified, "--report", Path.Combine(t.Path, "no", "such", "r.md"));
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("does not exist", run.Stderr);
        Assert.False(Directory.Exists(Path.Combine(t.Path, "no")));
    }
}

/// <summary>
/// A test that needs a folder that refuses writes even to root (<c>chattr +i</c>): probed once by making a folder
/// immutable and trying to create a file in it; skipped with the reason where that does not hold (no chattr, not
/// root, or a file system without the attribute such as tmpfs or overlay).
/// </summary>
public sealed class ImmutableFolderFactAttribute : FactAttribute
{
    private static readonly Lazy<string?> Missing = new(Probe);

    public ImmutableFolderFactAttribute()
    {
        if (Missing.Value is { } reason)
        {
            Skip = reason;
        }
    }

    private static string? Probe()
    {
        string folder = Path.Combine(Path.GetTempPath(), "loaddiff-immutable-probe-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(folder);
        try
        {
            if (!Run("+i", folder, out string why))
            {
                return $"needs 'chattr +i' on {Path.GetTempPath()} ({why}): root and a file system with the immutable attribute";
            }
            try
            {
                File.WriteAllText(Path.Combine(folder, "probe"), "");
                return $"a folder made immutable on {Path.GetTempPath()} still accepts files";
            }
            catch (Exception e) when (e is UnauthorizedAccessException or IOException)
            {
                return null;
            }
            finally
            {
                Run("-i", folder, out _);
            }
        }
        finally
        {
            Directory.Delete(folder, recursive: true);
        }
    }

    private static bool Run(string flag, string path, out string error)
    {
        try
        {
            using var p = Process.Start(new ProcessStartInfo("chattr", [flag, path]) { RedirectStandardError = true, UseShellExecute = false })!;
            error = p.StandardError.ReadToEnd().Trim();
            p.WaitForExit();
            return p.ExitCode == 0;
        }
        catch (System.ComponentModel.Win32Exception e)
        {
            error = e.Message;
            return false;
        }
    }
}
