using System.Globalization;
using System.Text.Json;
using LoadDiff.Cli.Tests.Support;
using LoadDiff.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Forces far below 1 but representable in double (down to the smallest subnormal) are loads like any other: every
/// command accepts them, and their resultant is reported as nonzero, not refused as an overflow.
/// </summary>
public class TinyMagnitudeTests
{
    // DBL_MIN (IEEE 754 binary64 smallest normal), two subnormals (1e-310 and the smallest, 4.9e-324), and 1e-200,
    // whose square (1e-400) underflows to 0 although the value itself is an ordinary normal double.
    public static TheoryData<string> TinyValues => ["1e-200", "2.2250738585072014e-308", "1e-310", "4.9e-324"];

    private static string OneForce(string fz, double x = 1) =>
        "{ \"cases\": { \"dead\": { \"loads\": [ { \"id\": \"p1\", \"kind\": \"force\", \"at\": ["
        + x.ToString("R", CultureInfo.InvariantCulture) + ", 2, 0], \"value\": [0, 0, -" + fz + "] } ] } } }";

    [Theory]
    [MemberData(nameof(TinyValues))]
    public void Reduce_of_a_tiny_force_reports_its_exact_resultant_and_moment(string value)
    {
        using var t = new TempFolder();
        string file = t.Write("tiny.loads.json", OneForce(value));
        CliRun run = CliProcess.Run("reduce", file, "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        double f = double.Parse(value, CultureInfo.InvariantCulture);
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement c = Assert.Single(doc.RootElement.GetProperty("cases").EnumerateArray());
        // Exact arithmetic: M = r × F with r = (1, 2, 0), F = (0, 0, −f) is (−2f, f, 0); doubling a double is exact,
        // subnormals included, so the expected values are the doubles themselves.
        Assert.Equal(-f, c.GetProperty("force")[2].GetDouble());
        Assert.Equal(-2 * f, c.GetProperty("moment")[0].GetDouble());
        Assert.Equal(f, c.GetProperty("moment")[1].GetDouble());
        Assert.Equal(0, c.GetProperty("moment")[2].GetDouble());
        // One force: a single force along −z (its unit direction is exactly (0, 0, −1)), pitch 0.
        Assert.True(c.GetProperty("single_force").GetBoolean());
        Assert.Equal(-1, c.GetProperty("axis_direction")[2].GetDouble());
        Assert.Equal(0, c.GetProperty("pitch").GetDouble());
    }

    [Theory]
    [MemberData(nameof(TinyValues))]
    public void Check_diff_and_fmt_accept_a_tiny_force(string value)
    {
        using var t = new TempFolder();
        string file = t.Write("tiny.loads.json", OneForce(value));
        CliRun check = CliProcess.Run("check", file, file);
        Assert.True(check.ExitCode == 0, check.ToString());
        CliRun diff = CliProcess.Run("diff", file, file);
        Assert.True(diff.ExitCode == 0, diff.ToString());
        CliRun fmt = CliProcess.Run("fmt", file);
        Assert.True(fmt.ExitCode == 0, fmt.ToString());
    }

    [Fact]
    public void Check_of_a_tiny_force_moved_along_x_fails_and_explains_instead_of_refusing()
    {
        // Same force 1e-200 N, moved from x = 1 to x = 3: ΔR = 0 but ΔM_y = 2e-200 N·m (exact: 2 m × 1e-200 N), far over
        // the relative allowance. The explanation (the misplaced resultant) once divided by |R|² = 0.
        using var t = new TempFolder();
        string original = t.Write("a.loads.json", OneForce("1e-200"));
        string substitute = t.Write("b.loads.json", OneForce("1e-200", 3));
        CliRun run = CliProcess.Run("check", original, substitute);
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Equal("", run.Stderr.Trim());
    }
}
