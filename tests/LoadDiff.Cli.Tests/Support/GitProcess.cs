using System.Diagnostics;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>Runs the real git in a test repository, independent of the machine's and the user's git configuration.</summary>
public static class GitProcess
{
    /// <summary>Runs git with the arguments as a list (no shell) and returns its exit code and output.</summary>
    public static (int Exit, string Out, string Err) Run(string workingDirectory, params string[] args)
    {
        var psi = new ProcessStartInfo("git") { WorkingDirectory = workingDirectory, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        psi.Environment["GIT_CONFIG_NOSYSTEM"] = "1";
        psi.Environment["GIT_CONFIG_GLOBAL"] = "/dev/null";
        psi.Environment["HOME"] = workingDirectory;
        psi.Environment["GIT_PAGER"] = "cat";
        psi.Environment["NO_COLOR"] = "1";
        using var p = Process.Start(psi)!;
        Task<string> err = p.StandardError.ReadToEndAsync();
        string output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        return (p.ExitCode, output, err.Result);
    }

    /// <summary>Runs git and fails the test when it does not exit 0; returns its output.</summary>
    public static string Ok(string workingDirectory, params string[] args)
    {
        var (exit, output, err) = Run(workingDirectory, args);
        Assert.True(exit == 0, $"git {string.Join(' ', args)} exited {exit}: {err}");
        return output;
    }
}
