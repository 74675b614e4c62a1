using System.Diagnostics;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Inputs are regular files or '-'. A device never ends (/dev/zero), opening a FIFO without a writer blocks, and a
/// descriptor closed before the start is reused by the runtime: each is refused with one line and exit 2, before
/// anything is read. Real devices, FIFOs and closed descriptors (bash's &lt;&amp;- and &gt;&amp;-), no stand-ins.
/// </summary>
public sealed class SpecialFilesTests
{
    private static readonly string Demo = CliProcess.Fixture("footbridge", "detailed.loads.json");
    private static readonly string Supports = CliProcess.Fixture("equipment-skid", "support-points.csv");

    public static TheoryData<string[]> CommandsOnDevice() => new()
    {
        new[] { "reduce", "/dev/zero" },
        new[] { "check", "/dev/zero", Demo },
        new[] { "check", Demo, "/dev/urandom" },
        new[] { "diff", "/dev/zero", Demo },
        new[] { "fmt", "--check", "/dev/zero" },
        new[] { "sections", "/dev/zero", Demo, "--axis", "x" },
        new[] { "distribute", "/dev/zero", "--onto", Supports },
        new[] { "distribute", Demo, "--onto", "/dev/zero" },
    };

    [Theory]
    [MemberData(nameof(CommandsOnDevice))]
    public void A_character_device_is_refused_by_every_command_before_it_is_read(string[] args)
    {
        CliRun run = CliProcess.Run(args);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("error LD001: is a character device, not a regular file", line, StringComparison.Ordinal);
        Assert.StartsWith("/dev/", line, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", run.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void A_fifo_without_a_writer_is_refused_not_waited_on_as_operand_and_as_referenced_table()
    {
        using var t = new TempFolder();
        string fifo = Path.Combine(t.Path, "wheels.csv");
        MakeFifo(fifo);
        CliRun direct = CliProcess.Run("reduce", fifo);
        Assert.Equal(2, direct.ExitCode);
        Assert.Contains("error LD001: is a named pipe (FIFO), not a regular file", Assert.Single(direct.StderrLines), StringComparison.Ordinal);

        string doc = t.Write("deck.loads.json", """{ "cases": { "a": { "loads": [ { "id": "w", "kind": "forces", "file": "wheels.csv" } ] } } }""");
        foreach (string[] args in new[] { new[] { "reduce", doc }, new[] { "check", doc, doc }, new[] { "diff", doc, doc }, new[] { "fmt", "--check", doc } })
        {
            CliRun run = CliProcess.Run(args);
            Assert.True(run.ExitCode == 2, string.Join(' ', args) + ": " + run);
            Assert.Contains("LD001", Assert.Single(run.StderrLines), StringComparison.Ordinal);
            Assert.Contains("named pipe", run.Stderr, StringComparison.Ordinal);
        }
    }

    [Theory]
    [InlineData("reduce", "-")]
    [InlineData("fmt", "--check", "-")]
    [InlineData("diff", "-", "DEMO")]
    public void A_closed_standard_input_is_one_line_not_a_wait(params string[] args)
    {
        (int exit, string stderr) = Shell("<&-", args);
        Assert.Equal(2, exit);
        Assert.Equal("-: error LD001: standard input is closed; give a file, or pipe the document in", stderr.TrimEnd('\n'));
    }

    [Fact]
    public void A_closed_standard_output_is_refused_before_any_work()
    {
        // Written nowhere, a result would be lost while the exit code still reported a verdict.
        (int exit, string stderr) = Shell(">&-", "check", "DEMO", "DEMO");
        Assert.Equal(2, exit);
        Assert.StartsWith("loaddiff: error LD083: standard output is closed", stderr, StringComparison.Ordinal);
        Assert.Single(stderr.TrimEnd('\n').Split('\n'));
    }

    [Fact]
    public void An_open_standard_input_still_reads()
    {
        CliRun run = CliProcess.Run(CliProcess.RepoRoot, (IReadOnlyDictionary<string, string>?)null, File.ReadAllText(Demo), "reduce", "-");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.StartsWith("Reduction of -", run.Stdout, StringComparison.Ordinal);
    }

    // Runs the tool through bash with one descriptor closed by `redirect`; DEMO stands for the demo file.
    private static (int Exit, string Stderr) Shell(string redirect, params string[] args)
    {
        string quoted = string.Join(' ', args.Select(a => "'" + (a == "DEMO" ? Demo : a) + "'"));
        var psi = new ProcessStartInfo("bash") { RedirectStandardError = true, UseShellExecute = false };
        psi.ArgumentList.Add("-c");
        psi.ArgumentList.Add($"exec dotnet '{CliProcess.ToolDll}' {quoted} {redirect}");
        psi.Environment["DOTNET_CLI_TELEMETRY_OPTOUT"] = "1";
        using var p = Process.Start(psi)!;
        Task<string> err = p.StandardError.ReadToEndAsync();
        if (!p.WaitForExit(60_000))
        {
            p.Kill(entireProcessTree: true);
            Assert.Fail("the tool waited on a closed descriptor: " + string.Join(' ', args) + " " + redirect);
        }
        return (p.ExitCode, err.Result);
    }

    private static void MakeFifo(string path)
    {
        using var p = Process.Start(new ProcessStartInfo("mkfifo", [path]) { UseShellExecute = false })!;
        p.WaitForExit();
        Assert.Equal(0, p.ExitCode);
    }
}
