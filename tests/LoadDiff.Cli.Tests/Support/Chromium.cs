using System.Diagnostics;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>
/// The real headless Chromium (Debian package <c>chromium</c>) for the HTML report tests. When it is missing the tests
/// skip with the reason; CI's script installs it before the tests run.
/// </summary>
public static class Chromium
{
    private static readonly Lazy<(string? Path, string Reason)> Found = new(Locate);

    public static string? Executable => Found.Value.Path;

    public static string SkipReason => Found.Value.Reason;

    /// <summary>True when Chromium can be run in a network namespace of its own (no network at all).</summary>
    public static bool CanIsolateNetwork { get; } = Succeeds("unshare", "-n", "true");

    /// <summary>Runs Chromium headless with a fresh profile and no network; returns exit code, stdout, stderr.</summary>
    public static (int Exit, string Stdout, string Stderr) Run(string profileFolder, params string[] args)
    {
        string exe = Executable ?? throw new InvalidOperationException(SkipReason);
        var psi = new ProcessStartInfo(CanIsolateNetwork ? "unshare" : exe)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        if (CanIsolateNetwork)
        {
            psi.ArgumentList.Add("-n");
            psi.ArgumentList.Add(exe);
        }
        foreach (string a in (string[])["--headless", "--no-sandbox", "--disable-gpu", "--no-first-run", "--disable-background-networking",
            "--disable-component-update", "--disable-sync", "--disable-quic", "--host-resolver-rules=MAP * ~NOTFOUND", "--user-data-dir=" + profileFolder])
        {
            psi.ArgumentList.Add(a);
        }
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        using var p = Process.Start(psi)!;
        Task<string> stdout = p.StandardOutput.ReadToEndAsync();
        Task<string> stderr = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(120_000))
        {
            p.Kill(entireProcessTree: true);
            throw new TimeoutException("chromium did not finish within 120 s");
        }
        return (p.ExitCode, stdout.Result, stderr.Result);
    }

    // Nothing is installed during a test run: .ci/run installs the Debian package before the tests start.
    private static (string?, string) Locate()
    {
        string? path = Which("chromium") ?? Which("chromium-browser");
        return path is not null ? (path, "")
            : (null, "chromium is not installed: install the Debian package 'chromium' (.ci/run does so before the tests)");
    }

    private static string? Which(string name) =>
        (Environment.GetEnvironmentVariable("PATH") ?? "").Split(':', StringSplitOptions.RemoveEmptyEntries)
            .Select(d => Path.Combine(d, name)).FirstOrDefault(File.Exists);

    private static bool Succeeds(string file, params string[] args)
    {
        try
        {
            var psi = new ProcessStartInfo(file) { UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true };
            foreach (string a in args)
            {
                psi.ArgumentList.Add(a);
            }
            using var p = Process.Start(psi)!;
            p.StandardOutput.ReadToEnd();
            p.StandardError.ReadToEnd();
            if (!p.WaitForExit(900_000))
            {
                p.Kill(entireProcessTree: true);
                return false;
            }
            return p.ExitCode == 0;
        }
        catch (System.ComponentModel.Win32Exception)
        {
            return false;
        }
    }
}

/// <summary>A test that needs the real browser: skipped, with the reason, when Chromium is not installed.</summary>
public sealed class BrowserFactAttribute : FactAttribute
{
    public BrowserFactAttribute()
    {
        if (Chromium.Executable is null)
        {
            Skip = Chromium.SkipReason;
        }
    }
}
