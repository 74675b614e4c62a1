using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public class ReduceCommandTests
{
    [Fact]
    public void Reduce_of_the_demo_file_exits_0_and_states_the_reference_point_and_caution()
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("Reference point:  (0, 0, 0) m (origin)", run.Stdout);
        Assert.Contains("Saint-Venant", run.Stdout);
        Assert.Equal("", run.Stderr);
    }

    [Fact]
    public void Reduce_json_follows_the_documented_schema()
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"), "--format", "json", "--case", "vehicle");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("schema_version").GetInt32());
        Assert.Equal("kN", root.GetProperty("units").GetProperty("force").GetString());
        Assert.Equal(3, root.GetProperty("reference_point").GetArrayLength());
        JsonElement c = Assert.Single(root.GetProperty("cases").EnumerateArray());
        foreach (string key in new[] { "name", "kind", "force", "moment", "gross_force", "pitch", "axis_point", "axis_direction", "single_force", "system" })
        {
            Assert.True(c.TryGetProperty(key, out _), "missing key " + key);
        }
        Assert.Equal("case", c.GetProperty("kind").GetString());
        Assert.Equal("force", c.GetProperty("system").GetString());
        Assert.True(c.GetProperty("single_force").GetBoolean());
        // Hand check (statics of parallel forces): 2·20 + 2·10 kN wheels plus 800 kg × 9.80665 m/s² = 7.84532 kN.
        double fz = c.GetProperty("force")[2].GetDouble();
        Assert.Equal(-(60 + (0.8 * 9.80665)), fz, 12);
        // Centre of parallel forces: x̄ = Σ F x / Σ F = (40·10.5 + 20·13.5 + 7.84532·12) / 67.84532.
        double x = c.GetProperty("centre_of_parallel_forces")[0].GetDouble();
        Assert.Equal(((40 * 10.5) + (20 * 13.5) + (7.84532 * 12)) / 67.84532, x, 12);
    }

    [Fact]
    public void Reduce_with_an_unknown_case_exits_2_with_one_message()
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"), "--case", "snow");
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("'snow'", line);
        Assert.Contains("dead", line);
        Assert.Equal("", run.Stdout);
    }

    [Fact]
    public void A_parse_error_exits_2_not_1()
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"), "--format", "yaml");
        Assert.Equal(2, run.ExitCode);
        Assert.DoesNotContain("   at ", run.Stderr);
    }

    [Fact]
    public void Help_of_reduce_shows_an_example()
    {
        CliRun run = CliProcess.Run("reduce", "--help");
        Assert.Equal(0, run.ExitCode);
        Assert.Contains("Example:", run.Stdout);
        Assert.Contains("--at", run.Stdout);
    }

    [Fact]
    public void Values_whose_products_overflow_exit_2_with_one_line_and_no_stack_trace()
    {
        // Each number is within the accepted 1e100, but the moment of 1e100 N at 1e100 m and the wrench axis pass 1.8e308.
        using var t = new TempFolder();
        string f = t.Write("huge.loads.json", """
            { "cases": { "c": { "loads": [
              { "id": "w", "kind": "line", "from": [0,0,0], "to": [1e100,0,0], "start": [1e100, 5e-324, 0], "end": [5e-324, 1e100, 0] } ] } } }
            """);
        CliRun run = CliProcess.RunIn(t.Path, "reduce", f);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("overflow", Assert.Single(run.StderrLines));
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.Equal("", run.Stdout);
    }

    [Theory]
    [InlineData("--max-file-size", "100", "1000000", "LD002")]
    [InlineData("--max-depth", "2", "64", "LD005")]
    [InlineData("--max-items", "3", "100", "LD071")]
    public void Limits_are_enforced_with_their_code_and_can_be_raised(string option, string low, string high, string code)
    {
        string demo = CliProcess.Fixture("footbridge", "detailed.loads.json");
        CliRun refused = CliProcess.Run("reduce", demo, option, low);
        Assert.Equal(2, refused.ExitCode);
        string line = Assert.Single(refused.StderrLines);
        Assert.Contains(code, line);
        Assert.Contains(option, line);
        Assert.Equal(0, CliProcess.Run("reduce", demo, option, high).ExitCode);
    }

    [Fact]
    public void A_long_csv_line_is_refused_with_LD072_unless_the_limit_is_raised()
    {
        using var t = new TempFolder();
        string csv = t.Write("long.csv", "id,x,y,z,fx,fy,fz\n" + new string('p', 200) + ",0,0,0,0,0,-1\n");
        CliRun refused = CliProcess.Run("reduce", csv, "--max-line-length", "64");
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("LD072", Assert.Single(refused.StderrLines));
        Assert.Equal(0, CliProcess.Run("reduce", csv, "--max-line-length", "1000").ExitCode);
    }

    [Fact]
    public void Json_output_is_bit_identical_for_one_thread_and_two()
    {
        // Several 4 MiB blocks, so the parallel path really splits the file.
        using var t = new TempFolder();
        var rnd = new Random(17);
        var sb = new System.Text.StringBuilder("id,x,y,z,fx,fy,fz\n");
        for (int i = 0; i < 150_000; i++)
        {
            sb.Append(System.Globalization.CultureInfo.InvariantCulture,
                $"n{i},{512000 + (rnd.NextDouble() * 200):R},{6170000 + (rnd.NextDouble() * 50):R},{rnd.NextDouble():R},{rnd.NextDouble() - 0.5:R},{rnd.NextDouble() - 0.5:R},{-1 - (rnd.NextDouble() * 20):R}\n");
        }
        string csv = t.Write("deck.csv", sb.ToString());
        Assert.True(new FileInfo(csv).Length > 3 * (4 << 20));
        CliRun one = CliProcess.Run("reduce", csv, "--format", "json", "--threads", "1");
        CliRun two = CliProcess.Run("reduce", csv, "--format", "json", "--threads", "2");
        Assert.Equal(0, one.ExitCode);
        Assert.Equal(one.Stdout, two.Stdout);
    }
}
