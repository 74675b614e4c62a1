using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using LoadDiff.Cli.Tests.Support;
using static LoadDiff.Cli.Tests.Support.HandStatics;

namespace LoadDiff.Cli.Tests;

public partial class ReduceCommandTests
{
    // Closed-form reductions at 1e-12 of their scale (CHECK-VALUES.md); text at half a unit of its 6th significant digit.
    private const decimal ClosedForm = 1e-12m;
    private const decimal SixDigits = 5e-6m;

    [GeneratedRegex(@"^(?:Case|Combination) ""(?<name>[^""]+)""")]
    private static partial Regex EntryHeading();

    [GeneratedRegex(@"^\s+(?<what>Resultant force R|Moment M about the point)\s+\((?<v>[^)]*)\)")]
    private static partial Regex VectorLine();

    [Fact]
    public void Reduce_of_the_demo_file_exits_0_and_states_the_reference_point_and_caution()
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"));
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("Reference point:  (0, 0, 0) m (origin)", run.Stdout);
        Assert.Contains("Saint-Venant", run.Stdout);
        Assert.Equal("", run.Stderr);
        // R and M about the origin of every case and combination as printed (6 significant digits), against hand sums
        // (FootbridgeByHand: e.g. dead R = −326.4 kN z, M_y = 326.4 × 12 = 3916.8 kN·m, the loads' centroid at x = 12).
        var printed = new Dictionary<string, Dictionary<string, Dec3>>();
        string? current = null;
        foreach (string line in run.Stdout.Split('\n'))
        {
            if (EntryHeading().Match(line) is { Success: true } h)
            {
                current = h.Groups["name"].Value;
                printed[current] = [];
            }
            else if (current is not null && VectorLine().Match(line) is { Success: true } v)
            {
                decimal[] c = [.. v.Groups["v"].Value.Split(',').Select(x => decimal.Parse(x, NumberStyles.Float, CultureInfo.InvariantCulture))];
                printed[current][v.Groups["what"].Value] = new Dec3(c[0], c[1], c[2]);
            }
        }
        var entries = FootbridgeByHand.Entries(FootbridgeByHand.Detailed).ToList();
        Assert.Equal(entries.Select(e => e.Name), printed.Keys);
        foreach ((string name, _, HandCase hand) in entries)
        {
            Dec3 r = hand.Resultant, m = hand.MomentAbout(Dec3.Zero);
            AssertSixDigits(r, printed[name]["Resultant force R"], name + " R");
            AssertSixDigits(m, printed[name]["Moment M about the point"], name + " M about the origin");
        }
    }

    private static void AssertSixDigits(Dec3 expected, Dec3 printed, string what)
    {
        decimal tol = SixDigits * expected.Norm;
        Close(expected.X, printed.X, tol, what + " x");
        Close(expected.Y, printed.Y, tol, what + " y");
        Close(expected.Z, printed.Z, tol, what + " z");
    }

    [Theory]
    [InlineData("midspan", "12", "0", "0")] // the file's named point midspan = (12, 0, 0)
    [InlineData("1.5,2,-3", "1.5", "2", "-3")]
    [InlineData("0,0,0", "0", "0", "0")]
    public void Json_moments_about_the_stated_point_match_hand_sums_for_every_case_and_combination(string at, string x, string y, string z)
    {
        CliRun run = CliProcess.Run("reduce", CliProcess.Fixture("footbridge", "detailed.loads.json"), "--at", at, "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        var p = new Dec3(decimal.Parse(x, CultureInfo.InvariantCulture), decimal.Parse(y, CultureInfo.InvariantCulture), decimal.Parse(z, CultureInfo.InvariantCulture));
        Close(p, doc.RootElement.GetProperty("reference_point"), 0, "reference point");
        var entries = FootbridgeByHand.Entries(FootbridgeByHand.Detailed).ToList();
        JsonElement[] cases = [.. doc.RootElement.GetProperty("cases").EnumerateArray()];
        Assert.Equal(entries.Select(e => e.Name), cases.Select(c => c.GetProperty("name").GetString()));
        foreach (((string name, string kind, HandCase hand), JsonElement c) in entries.Zip(cases))
        {
            Assert.Equal(kind, c.GetProperty("kind").GetString());
            decimal gf = hand.GrossForce, scale = gf * 24; // forces at most 24 m from any of these points
            Dec3 r = hand.Resultant, m = hand.MomentAbout(p);
            // R = Σ F_i, M_P = Σ (r_i − P) × F_i (SPEC §2; statics, any text).
            Close(r, c.GetProperty("force"), ClosedForm * gf, name + " R");
            Close(m, c.GetProperty("moment"), ClosedForm * scale, name + " M about " + at);
            Close(gf, c.GetProperty("gross_force"), ClosedForm * gf, name + " G_F = Σ|F|");
            // Load centroid Σ|F_i| r_i / Σ|F_i| (SPEC §4), a combination's with |factor|·|F_i|.
            Dec3 centroid = hand.Forces.Aggregate(Dec3.Zero, (s, f) => s + (f.Force.Norm * f.At)) / gf;
            Close(centroid, c.GetProperty("centroid"), ClosedForm * 24, name + " load centroid");
            // Poinsot (Murray, Li & Sastry 1994, ch. 2): pitch p = R·M_P/|R|², central axis through P + R × M_P/|R|²
            // along R. The cases are parallel systems (pitch 0, a single force); a combination adds the horizontal wind
            // to the vertical loads, whose moments are not perpendicular to R: a wrench.
            decimal r2 = (r.X * r.X) + (r.Y * r.Y) + (r.Z * r.Z);
            decimal pitch = ((r.X * m.X) + (r.Y * m.Y) + (r.Z * m.Z)) / r2;
            Close(pitch, c.GetProperty("pitch"), ClosedForm * 24, name + " pitch");
            Assert.Equal(kind == "case" ? "force" : "wrench", c.GetProperty("system").GetString());
            Assert.Equal(kind == "case", c.GetProperty("single_force").GetBoolean());
            // The stated axis point lies on the central axis: its offset from P + R × M/|R|² is parallel to R.
            Dec3 onAxis = p + (Dec3.Cross(r, m) / r2);
            Dec3 off = Dec3.Cross(Dec3Of(c.GetProperty("axis_point")) - onAxis, r / r.Norm);
            Close(0, off.Norm, ClosedForm * 24, name + " axis point off the central axis");
            Close(r / r.Norm, c.GetProperty("axis_direction"), ClosedForm, name + " axis direction R/|R|");
        }
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
        // About the origin M_y = Σ x_i·|F_i| = 40·10.5 + 20·13.5 + 7.84532·12 = 784.14384 kN·m; M_x = Σ y_i·F_z,i = 0
        // (the wheels stand at y = ±0.8 in equal pairs, the tank on y = 0).
        Close(new Dec3(0, 784.14384m, 0), c.GetProperty("moment"), 1e-12m * 784.14384m, "vehicle M about the origin");
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
        // Each number is within the accepted 1e100, but a pressure of 1e100 Pa on a square of side 1e100 m is a force of
        // 1e300 N acting at (5e99, 5e99, 0) m: its moment about the origin, about 7e399 N·m, passes the largest double
        // (IEEE 754 binary64, 1.797e308). (A line load of 1e100 N/m over 1e100 m stays in range: 1e200 N, 1e300 N·m.)
        using var t = new TempFolder();
        string f = t.Write("huge.loads.json", """
            { "cases": { "c": { "loads": [
              { "id": "a", "kind": "area", "polygon": [[0,0,0],[1e100,0,0],[1e100,1e100,0],[0,1e100,0]], "pressure": 1e100 } ] } } }
            """);
        CliRun run = CliProcess.RunIn(t.Path, "reduce", f);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("huge.loads.json:2:3: error LD021", line, StringComparison.Ordinal);
        Assert.Contains("overflow", line, StringComparison.Ordinal);
        Assert.Contains("$.cases.c.loads[0]", line, StringComparison.Ordinal);
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.Equal("", run.Stdout);
    }

    [Fact]
    public void A_line_load_at_the_edge_of_the_range_reduces_to_hand_values_without_squaring_its_resultant()
    {
        // q(t) = (1e100, 5e-324, 0)(1 − t) + (5e-324, 1e100, 0) t N/m along x over L = 1e100 m. By hand (statics):
        // R = L (q0 + q1)/2 = (5e199, 5e199, 0) N; M_z = ∫ x q_y dx = L² · 1e100 / 3 = 1e300/3 N·m; the central axis passes
        // through R × M / |R|² = (1e100/3, −1e100/3, 0) m. |R|² (5e399) is beyond double: the axis is found through R/|R|.
        using var t = new TempFolder();
        string f = t.Write("edge.loads.json", """
            { "cases": { "c": { "loads": [
              { "id": "w", "kind": "line", "from": [0,0,0], "to": [1e100,0,0], "start": [1e100, 5e-324, 0], "end": [5e-324, 1e100, 0] } ] } } }
            """);
        CliRun run = CliProcess.RunIn(t.Path, "reduce", f, "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement c = doc.RootElement.GetProperty("cases")[0];
        double[] r = [.. c.GetProperty("force").EnumerateArray().Select(e => e.GetDouble())];
        double[] m = [.. c.GetProperty("moment").EnumerateArray().Select(e => e.GetDouble())];
        double[] a = [.. c.GetProperty("axis_point").EnumerateArray().Select(e => e.GetDouble())];
        Assert.Equal([5e199, 5e199, 0], r);
        Assert.Equal(0, m[0]);
        Assert.Equal(0, m[1]);
        Assert.Equal(1e300 / 3, m[2], 1e300 * 1e-15);
        Assert.Equal("force", c.GetProperty("system").GetString());
        Assert.Equal(1e100 / 3, a[0], 1e100 * 1e-15);
        Assert.Equal(-1e100 / 3, a[1], 1e100 * 1e-15);
        Assert.Equal(0, a[2]);
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
