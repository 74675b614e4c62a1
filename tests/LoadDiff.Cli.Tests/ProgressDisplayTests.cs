using System.Diagnostics;
using System.Text;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public class ProgressDisplayTests
{
    private sealed class FakeClock
    {
        public TimeSpan Now { get; set; }
    }

    [Fact]
    public void Nothing_is_written_before_the_delay_then_one_line_that_is_cleared_at_the_end()
    {
        var clock = new FakeClock();
        var error = new StringWriter();
        var p = new ProgressDisplay(error, "big.csv", TimeSpan.FromSeconds(1), () => clock.Now);
        clock.Now = TimeSpan.FromSeconds(0.5);
        p.AddBytes(1_000_000);
        Assert.Equal("", error.ToString());
        clock.Now = TimeSpan.FromSeconds(2);
        p.AddBytes(11_000_000);
        // 12 000 000 bytes in 2 s: 12.0 MB at 6.0 MB/s (1 MB = 10^6 bytes).
        Assert.Equal("\rbig.csv: 12.0 MB, 0 items read (6.0 MB/s, 0 items/s)", error.ToString());
        Assert.True(p.Showing);
        p.Dispose();
        Assert.EndsWith("\r" + new string(' ', "big.csv: 12.0 MB, 0 items read (6.0 MB/s, 0 items/s)".Length) + "\r", error.ToString());
        Assert.False(p.Showing);
    }

    [Fact]
    public void Items_are_counted_and_the_rate_is_per_second()
    {
        // 3 000 000 items and 150 MB in 4 s: 750 000 items/s and 37.5 MB/s, worked by hand.
        Assert.Equal("a.csv: 150.0 MB, 3,000,000 items read (37.5 MB/s, 750,000 items/s)",
            ProgressDisplay.Line("a.csv", 150_000_000, 3_000_000, TimeSpan.FromSeconds(4)));
    }

    [Fact]
    public void A_quick_run_writes_nothing()
    {
        var error = new StringWriter();
        using (var p = new ProgressDisplay(error, "x", TimeSpan.FromSeconds(10), () => TimeSpan.FromMilliseconds(5)))
        {
            for (int i = 0; i < 100_000; i++)
            {
                p.AddItem();
            }
        }
        Assert.Equal("", error.ToString());
    }

    private static string WriteLargeCsv(TempFolder t)
    {
        var csv = new StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 0; i < 150_000; i++)
        {
            csv.Append('p').Append(i).Append(',').Append(i % 100).Append(",2,0,0,0,-1.25\n");
        }
        return t.Write("nodal.csv", csv.ToString());
    }

    /// <summary>Runs the tool with standard error on a real pseudo-terminal (util-linux script) and returns what the terminal showed.</summary>
    private static string OnTerminal(string csv, bool ci)
    {
        string command = $"dotnet '{CliProcess.ToolDll}' check '{csv}' '{csv}' >/dev/null";
        var psi = new ProcessStartInfo("script") { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in (string[])["-q", "-e", "-c", command, "/dev/null"])
        {
            psi.ArgumentList.Add(a);
        }
        psi.Environment.Remove("CI");
        if (ci)
        {
            psi.Environment["CI"] = "true";
        }
        psi.Environment["TERM"] = "xterm";
        psi.Environment["LOADDIFF_PROGRESS_DELAY_MS"] = "0";
        using var p = Process.Start(psi)!;
        string output = p.StandardOutput.ReadToEnd();
        p.StandardError.ReadToEnd();
        Assert.True(p.WaitForExit(120_000));
        return output;
    }

    [Fact]
    public void A_terminal_shows_bytes_items_and_rate_while_a_large_csv_is_read()
    {
        if (!File.Exists("/usr/bin/script"))
        {
            Assert.Fail("util-linux 'script' is needed to give the tool a terminal");
        }
        using var t = new TempFolder();
        string csv = WriteLargeCsv(t);
        string screen = OnTerminal(csv, ci: false);
        Assert.Contains("nodal.csv: ", screen);
        Assert.Contains(" items read (", screen);
        Assert.Contains(" MB/s, ", screen);
    }

    [Fact]
    public void No_progress_in_ci_or_when_standard_error_is_redirected()
    {
        using var t = new TempFolder();
        string csv = WriteLargeCsv(t);
        CliRun redirected = CliProcess.Run(CliProcess.RepoRoot, new Dictionary<string, string> { ["LOADDIFF_PROGRESS_DELAY_MS"] = "0" }, null, "check", csv, csv);
        Assert.True(redirected.ExitCode == 0, redirected.ToString());
        Assert.Equal("", redirected.Stderr);
        if (File.Exists("/usr/bin/script"))
        {
            Assert.DoesNotContain("items read", OnTerminal(csv, ci: true));
        }
    }
}
