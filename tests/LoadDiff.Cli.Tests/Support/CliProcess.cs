using System.Diagnostics;

namespace LoadDiff.Cli.Tests.Support;

/// <summary>The outcome of one run of the real executable.</summary>
public sealed record CliRun(int ExitCode, string Stdout, string Stderr)
{
    public string[] StderrLines => Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);

    public override string ToString() => $"exit {ExitCode}\n--- stdout\n{Stdout}\n--- stderr\n{Stderr}";
}

/// <summary>Runs the built <c>loaddiff</c> program as a separate process, as a user or CI would.</summary>
public static class CliProcess
{
    /// <summary>The folder holding the built tool (copied next to the tests by the project reference).</summary>
    public static string ToolDll => Path.Combine(AppContext.BaseDirectory, "loaddiff.dll");

    /// <summary>The repository root (holds LoadDiff.sln).</summary>
    public static string RepoRoot
    {
        get
        {
            string? dir = AppContext.BaseDirectory;
            while (dir is not null && !File.Exists(Path.Combine(dir, "LoadDiff.sln")))
            {
                dir = Path.GetDirectoryName(dir);
            }
            return dir ?? throw new InvalidOperationException("LoadDiff.sln not found above the test folder");
        }
    }

    /// <summary>A fixture file's full path.</summary>
    public static string Fixture(params string[] parts) => Path.Combine([RepoRoot, "fixtures", .. parts]);

    public static CliRun Run(string workingDirectory, IReadOnlyDictionary<string, string>? environment, string? stdin, params string[] args)
    {
        var psi = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = workingDirectory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            RedirectStandardInput = true,
            UseShellExecute = false,
        };
        psi.ArgumentList.Add(ToolDll);
        foreach (string a in args)
        {
            psi.ArgumentList.Add(a);
        }
        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        psi.Environment["NO_COLOR"] = "1";
        if (environment is not null)
        {
            foreach (var kv in environment)
            {
                psi.Environment[kv.Key] = kv.Value;
            }
        }
        using var p = Process.Start(psi)!;
        Task<string> stdout = p.StandardOutput.ReadToEndAsync();
        Task<string> stderr = p.StandardError.ReadToEndAsync();
        if (stdin is not null)
        {
            p.StandardInput.Write(stdin);
        }
        p.StandardInput.Close();
        if (!p.WaitForExit(120_000))
        {
            p.Kill(entireProcessTree: true);
            throw new TimeoutException("loaddiff did not finish within 120 s: " + string.Join(' ', args));
        }
        return new CliRun(p.ExitCode, stdout.Result, stderr.Result);
    }

    public static CliRun Run(params string[] args) => Run(RepoRoot, null, null, args);

    /// <summary>Runs in another working directory.</summary>
    public static CliRun RunIn(string workingDirectory, params string[] args) => Run(workingDirectory, null, null, args);
}
