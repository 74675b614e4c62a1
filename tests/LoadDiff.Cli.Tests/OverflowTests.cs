using LoadDiff.Cli.Tests.Support;
using LoadDiff.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Inputs are limited to 1e100, but products of accepted values can pass the range of double (about 1.8e308). Such a
/// file is an input error with a code naming what overflowed, never a result with an infinite number in it.
/// </summary>
public class OverflowTests
{
    // A mass of 1e100 kg under gravity 1e100 m/s² weighs 1e200 N; at x = 1e100 m its moment about the origin is
    // 1e300 N·m; the factor 1e100 of combination "big" makes that 1e400, beyond the largest double (IEEE 754
    // binary64, 1.797…e308). The case alone (1e300) is in range.
    private const string Huge = """
        { "units": { "force": "N", "length": "m", "mass": "kg" }, "gravity": [0, 0, -1e100],
          "cases": { "a": { "loads": [ { "id": "m", "kind": "mass", "at": [1e100, 2, 0], "value": 1e100 } ] } },
          "combinations": { "big": { "a": 1e100 } } }
        """;

    [Fact]
    public void Reduce_of_a_combination_that_overflows_is_one_coded_line_naming_it_and_the_file()
    {
        using var t = new TempFolder();
        string file = t.Write("huge.loads.json", Huge);
        CliRun run = CliProcess.Run("reduce", file);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("error LD021", line, StringComparison.Ordinal);
        Assert.Contains("combination 'big'", line, StringComparison.Ordinal);
        Assert.Contains("huge.loads.json", line, StringComparison.Ordinal);
        Assert.DoesNotContain("internal error", line, StringComparison.Ordinal);
    }

    [Fact]
    public void Check_with_an_overflowing_tolerance_is_refused_not_passed()
    {
        // The combination's moment (1e400) and its allowance are beyond double, so any comparison of it is
        // meaningless: before, checking the file against a copy printed PASS with "Infinity" as the allowed moment.
        using var t = new TempFolder();
        string original = t.Write("huge.loads.json", Huge);
        string substitute = t.Write("copy.loads.json", Huge);
        CliRun run = CliProcess.Run("check", original, substitute);
        Assert.Equal(2, run.ExitCode);
        Assert.DoesNotContain("EQUIVALENT", run.Stdout, StringComparison.Ordinal);
        string line = Assert.Single(run.Stderr.Split('\n', StringSplitOptions.RemoveEmptyEntries));
        Assert.Contains("error LD021", line, StringComparison.Ordinal);
        Assert.Contains("'big'", line, StringComparison.Ordinal);
    }
}
