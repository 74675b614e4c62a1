using System.Globalization;
using System.Security.Cryptography;
using System.Text.Json;
using System.Xml.Linq;
using LoadDiff.Cli.Tests.Support;
using static LoadDiff.Cli.Tests.Support.HandStatics;

namespace LoadDiff.Cli.Tests;

public class CheckCommandTests
{
    private static readonly string Detailed = CliProcess.Fixture("footbridge", "detailed.loads.json");
    private static readonly string Simplified = CliProcess.Fixture("footbridge", "simplified.loads.json");
    private static readonly string NoTank = CliProcess.Fixture("footbridge", "simplified-no-tank.loads.json");

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static JsonElement Case(JsonDocument doc, string name) =>
        doc.RootElement.GetProperty("cases").EnumerateArray().Single(c => c.GetProperty("name").GetString() == name);

    // Closed-form reductions are compared at 1e-12 of their scale (G_F for forces, G_M = G_F·D for moments), as
    // CHECK-VALUES.md asks; the text's 6 significant digits at half a unit of the 6th digit.
    private const decimal ClosedForm = 1e-12m;
    private const decimal SixDigits = 5e-6m;

    // rel = 1e-3 is the default relative tolerance (common practice, no source: CHECK-VALUES.md); no F, M or --length.
    private const decimal DefaultRel = 1e-3m;

    /// <summary>
    /// Every case and combination of a footbridge check (JSON) against the files reduced by hand (<see cref="FootbridgeByHand"/>):
    /// the reference point (the original's load centroid), R and M of both systems about it, and the tolerance rule of
    /// SPEC §4 worked by hand: G_F = Σ|F| of the original, D the diagonal of the original's loaded box, G_M = G_F·D (no free
    /// couples), allowances rel·G_F and rel·G_M; |ΔR|, |ΔM| at the point and the largest |ΔM_Q| over the corners Q of the
    /// union of both loaded boxes; the verdict |ΔR| ≤ rel·G_F and worst |ΔM_Q| ≤ rel·G_M.
    /// </summary>
    private static void AssertFootbridgeByHand(
        JsonDocument doc, IReadOnlyDictionary<string, HandCase> original, IReadOnlyDictionary<string, HandCase> substitute, params string[] only)
    {
        Dec3 p = FootbridgeByHand.LoadCentroid(original);
        Close(p, doc.RootElement.GetProperty("reference_point"), ClosedForm * 24, "reference point (load centroid)");
        var expected = FootbridgeByHand.Entries(original).Zip(FootbridgeByHand.Entries(substitute))
            .Where(e => only.Length == 0 || only.Contains(e.First.Name)).ToList();
        Assert.Equal(expected.Select(e => e.First.Name), doc.RootElement.GetProperty("cases").EnumerateArray().Select(c => c.GetProperty("name").GetString()));
        bool all = true;
        foreach (((string name, string kind, HandCase a), (_, _, HandCase b)) in expected)
        {
            JsonElement c = Case(doc, name);
            Assert.Equal(kind, c.GetProperty("kind").GetString());
            decimal gf = a.GrossForce, d = a.Diagonal, gm = gf * d;
            decimal tolF = ClosedForm * gf, tolM = ClosedForm * gm;
            Close(a.Resultant, c.GetProperty("original").GetProperty("force"), tolF, name + " original R");
            Close(a.MomentAbout(p), c.GetProperty("original").GetProperty("moment"), tolM, name + " original M");
            Close(b.Resultant, c.GetProperty("substitute").GetProperty("force"), tolF, name + " substitute R");
            Close(b.MomentAbout(p), c.GetProperty("substitute").GetProperty("moment"), tolM, name + " substitute M");
            Close(gf, c.GetProperty("original").GetProperty("gross_force"), tolF, name + " G_F");

            JsonElement tol = c.GetProperty("tolerance");
            Close(gf, tol.GetProperty("gross_force"), tolF, name + " G_F of the rule");
            Close(d, tol.GetProperty("box_diagonal"), ClosedForm * d, name + " D");
            Close(gm, tol.GetProperty("gross_moment"), tolM, name + " G_M");
            Close(DefaultRel * gf, tol.GetProperty("force"), tolF, name + " force allowance rel·G_F");
            Close(DefaultRel * gm, tol.GetProperty("moment"), tolM, name + " moment allowance rel·G_M");
            Assert.Equal("relative", tol.GetProperty("force_governed_by").GetString());
            Assert.Equal("relative", tol.GetProperty("moment_governed_by").GetString());

            // Residual = substitute − original.
            Dec3 dR = b.Resultant - a.Resultant;
            JsonElement r = c.GetProperty("residual");
            Close(dR, r.GetProperty("force"), tolF, name + " ΔR");
            Close(dR.Norm, r.GetProperty("force_norm"), tolF, name + " |ΔR|");
            Close((b.MomentAbout(p) - a.MomentAbout(p)).Norm, r.GetProperty("moment_norm"), tolM, name + " |ΔM| at the point");
            (Dec3 min, Dec3 max) = HandCase.Union(a, b);
            decimal worst = new HandCase([], min, max).Corners.Max(q => (b.MomentAbout(q) - a.MomentAbout(q)).Norm);
            Close(worst, r.GetProperty("worst_moment_norm"), tolM, name + " worst |ΔM_Q| over the corners");
            bool pass = dR.Norm <= DefaultRel * gf && worst <= DefaultRel * gm;
            Assert.True(pass == c.GetProperty("equivalent").GetBoolean(), name + " verdict: by hand " + (pass ? "pass" : "fail"));
            all &= pass;
        }
        Assert.Equal(all, doc.RootElement.GetProperty("equivalent").GetBoolean());
    }

    [Fact]
    public void Equivalent_demo_pair_exits_0()
    {
        CliRun run = CliProcess.Run("check", Detailed, Simplified);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("Result: EQUIVALENT", run.Stdout);
        Assert.Contains("common practice, no published source", run.Stdout);
        Assert.Contains("Saint-Venant", run.Stdout);
        // The summary table, one row per case and combination, against the hand rule (6 significant digits):
        // name kind verdict |ΔR| allowed worst|ΔM| allowed governs. The pair agrees exactly by hand (every girder
        // line, axle and wind line carries the detailed loads' totals on the same lines of action), so |ΔR| = |ΔM| = 0.
        foreach ((string name, string kind, HandCase a) in FootbridgeByHand.Entries(FootbridgeByHand.Detailed))
        {
            string[] row = run.Stdout.Split('\n').Select(l => l.Split(' ', StringSplitOptions.RemoveEmptyEntries))
                .Single(t => t.Length == 8 && t[0] == name);
            Assert.Equal([kind, "PASS"], row[1..3]);
            decimal Num(int i) => decimal.Parse(row[i], NumberStyles.Float, CultureInfo.InvariantCulture);
            decimal allowF = DefaultRel * a.GrossForce, allowM = DefaultRel * a.GrossForce * a.Diagonal;
            Close(0, Num(3), 0, name + " |ΔR| (text)");
            Close(allowF, Num(4), SixDigits * allowF, name + " force allowance (text)");
            Close(0, Num(5), 0, name + " worst |ΔM| (text)");
            Close(allowM, Num(6), SixDigits * allowM, name + " moment allowance (text)");
        }
        CliRun json = CliProcess.Run("check", Detailed, Simplified, "--format", "json");
        Assert.True(json.ExitCode == 0, json.ToString());
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        AssertFootbridgeByHand(doc, FootbridgeByHand.Detailed, FootbridgeByHand.Simplified);
    }

    [Fact]
    public void Forgotten_tank_exits_1_and_says_where_the_missing_force_acts()
    {
        CliRun run = CliProcess.Run("check", Detailed, NoTank, "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.False(doc.RootElement.GetProperty("equivalent").GetBoolean());
        JsonElement vehicle = Case(doc, "vehicle");
        Assert.False(vehicle.GetProperty("equivalent").GetBoolean());
        JsonElement residual = vehicle.GetProperty("residual");
        // 800 kg × 9.80665 m/s² = 7.84532 kN missing from the substitute (CGPM standard gravity).
        Assert.Equal(0.8 * 9.80665, residual.GetProperty("force")[2].GetDouble(), 12);
        // Its line of action is the tank's: vertical through x = 12, y = 0.
        Assert.Equal(12, residual.GetProperty("axis_point")[0].GetDouble(), 9);
        Assert.Equal(0, residual.GetProperty("axis_point")[1].GetDouble(), 9);
        Assert.Equal(1, Math.Abs(residual.GetProperty("axis_direction")[2].GetDouble()), 12);
        Assert.True(Case(doc, "dead").GetProperty("equivalent").GetBoolean());
        Assert.False(Case(doc, "uls-vehicle").GetProperty("equivalent").GetBoolean());
        AssertFootbridgeByHand(doc, FootbridgeByHand.Detailed, FootbridgeByHand.NoTank);
        // The worst corner in closed form: the residual is the tank's weight W = 7.84532 kN reversed, so |ΔM_Q| = W × the
        // horizontal distance from Q to the tank's line x = 12, y = 0. Vehicle box corners (10.5 or 13.5, ±0.8):
        // √(1.5² + 0.8²) = 1.7 m, so 13.337044 kN·m against rel·G_F·D = 1e-3 × 67.84532 × √13 = 0.24462 kN·m.
        Close(7.84532m * 1.7m, vehicle.GetProperty("residual").GetProperty("worst_moment_norm"), 1e-9m, "vehicle worst |ΔM_Q|");
        // uls-vehicle: 1.5·W at the corners (0 or 24, ±1.5) of the deck box: 11.76798 kN × √(12² + 1.5²) m.
        Close(1.5m * 7.84532m * HandStatics.Sqrt(146.25m), Case(doc, "uls-vehicle").GetProperty("residual").GetProperty("worst_moment_norm"), 1e-9m, "uls-vehicle worst |ΔM_Q|");
    }

    [Fact]
    public void Reversed_line_load_fails_on_moment_with_the_force_equal()
    {
        CliRun run = CliProcess.Run("check", CliProcess.Fixture("tank-wall", "detailed.loads.json"),
            CliProcess.Fixture("tank-wall", "simplified-reversed.loads.json"));
        Assert.Equal(1, run.ExitCode);
        // Munson et al.: the resultant γ b h²/2 = 9.81·6·16/2 = 470.88 kN; reversing the triangle moves it
        // from h/3 to 2h/3 above the floor, a couple of 470.88 × 4/3 = 627.84 kN·m, read as the resultant
        // acting h/3 = 1.33333 m too high (+z).
        Assert.Contains("627.84", run.Stdout);
        Assert.Contains("the substitute's resultant acts 1.33333 m too far in +z", run.Stdout);
    }

    [Fact]
    public void Json_output_has_every_key_of_the_documented_schema()
    {
        CliRun run = CliProcess.Run("check", Detailed, NoTank, "--format", "json");
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("schema_version").GetInt32());
        Assert.Equal(JsonValueKind.False, root.GetProperty("equivalent").ValueKind);
        Assert.Equal("kN", root.GetProperty("units").GetProperty("force").GetString());
        Assert.Equal("m", root.GetProperty("units").GetProperty("length").GetString());
        Assert.Equal(3, root.GetProperty("reference_point").GetArrayLength());
        foreach (JsonElement c in root.GetProperty("cases").EnumerateArray())
        {
            Assert.Contains(c.GetProperty("kind").GetString(), new[] { "case", "combination" });
            foreach (string system in new[] { "original", "substitute" })
            {
                Assert.Equal(3, c.GetProperty(system).GetProperty("force").GetArrayLength());
                Assert.Equal(3, c.GetProperty(system).GetProperty("moment").GetArrayLength());
            }
            JsonElement r = c.GetProperty("residual");
            foreach (string key in new[] { "force_norm", "moment_norm", "worst_moment_norm" })
            {
                Assert.Equal(JsonValueKind.Number, r.GetProperty(key).ValueKind);
            }
            Assert.True(r.TryGetProperty("axis_point", out _));
            Assert.True(r.TryGetProperty("axis_direction", out _));
            Assert.Equal(JsonValueKind.Number, c.GetProperty("tolerance").GetProperty("force").ValueKind);
            Assert.Equal(JsonValueKind.Number, c.GetProperty("tolerance").GetProperty("moment").ValueKind);
            Assert.Equal(JsonValueKind.Null, c.GetProperty("only_in").ValueKind);
        }
    }

    [Fact]
    public void Junit_output_has_one_testcase_per_case_and_combination_and_a_failure_for_each_that_fails()
    {
        CliRun run = CliProcess.Run("check", Detailed, NoTank, "--format", "junit");
        Assert.Equal(1, run.ExitCode);
        XDocument xml = XDocument.Parse(run.Stdout);
        XElement suite = xml.Root!.Element("testsuite")!;
        var cases = suite.Elements("testcase").ToList();
        Assert.Equal(6, cases.Count); // 4 cases + 2 combinations in the demo files
        Assert.Equal(new[] { "vehicle", "uls-vehicle", "characteristic" },
            cases.Where(c => c.Element("failure") is not null).Select(c => (string)c.Attribute("name")!).ToArray());
        Assert.Equal("3", (string)suite.Attribute("failures")!);
        Assert.All(cases.Select(c => c.Element("failure")).OfType<XElement>(), f => Assert.False(string.IsNullOrEmpty((string?)f.Attribute("message"))));
    }

    [Fact]
    public void Case_option_narrows_the_check()
    {
        CliRun run = CliProcess.Run("check", Detailed, NoTank, "--case", "dead", "--case", "wind");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.DoesNotContain("vehicle", run.Stdout);
        // The same narrowed check in JSON: exactly dead and wind, each against the hand values (the tank is in neither).
        // The reference point stays the load centroid of the whole original file (SPEC §4: the original's load centroid).
        CliRun json = CliProcess.Run("check", Detailed, NoTank, "--case", "dead", "--case", "wind", "--format", "json");
        Assert.True(json.ExitCode == 0, json.ToString());
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        AssertFootbridgeByHand(doc, FootbridgeByHand.Detailed, FootbridgeByHand.NoTank, "dead", "wind");
    }

    [Fact]
    public void Files_in_different_units_are_compared_after_exact_conversion()
    {
        // NIST SP 811 (2008), Appendix B.8: 1 kip = 4448.2216152605 N, 1 ft = 0.3048 m (exact).
        using var t = new TempFolder();
        string a = t.Write("a.loads.json", """
            { "units": { "force": "kN", "length": "m" },
              "cases": { "c": { "loads": [
                { "id": "p", "kind": "force", "at": [3, 1, 0], "value": [0, 0, -100] },
                { "id": "w", "kind": "line", "from": [0, 0, 0], "to": [6, 0, 0], "start": [0, 0, -2], "end": [0, 0, -2] } ] } } }
            """);
        double kip = 4448.2216152605 / 1000, ft = 0.3048;
        string Sub(double fz) => $$"""
            { "units": { "force": "kip", "length": "ft" },
              "cases": { "c": { "loads": [
                { "id": "p", "kind": "force", "at": [{{R(3 / ft)}}, {{R(1 / ft)}}, 0], "value": [0, 0, {{R(fz / kip)}}] },
                { "id": "w", "kind": "force", "at": [{{R(3 / ft)}}, 0, 0], "value": [0, 0, {{R(-12 / kip)}}] } ] } } }
            """;
        string good = t.Write("good.loads.json", Sub(-100));
        string bad = t.Write("bad.loads.json", Sub(-100.5));
        CliRun pass = CliProcess.RunIn(t.Path, "check", a, good, "--rel-tol", "1e-9", "--format", "json");
        Assert.True(pass.ExitCode == 0, pass.ToString());
        using (JsonDocument doc = JsonDocument.Parse(pass.Stdout))
        {
            Assert.Equal("kN", doc.RootElement.GetProperty("units").GetProperty("force").GetString());
            Assert.Equal(-112, Case(doc, "c").GetProperty("substitute").GetProperty("force")[2].GetDouble(), 9);
        }
        CliRun fail = CliProcess.RunIn(t.Path, "check", a, bad);
        Assert.Equal(1, fail.ExitCode);
        // Output in other units on request: 112 kN = 112 / 4.4482216152605 kip.
        CliRun kips = CliProcess.RunIn(t.Path, "check", a, good, "--rel-tol", "1e-9", "--units", "kip,ft", "--format", "json");
        using JsonDocument k = JsonDocument.Parse(kips.Stdout);
        Assert.Equal(-112 / kip, Case(k, "c").GetProperty("original").GetProperty("force")[2].GetDouble(), 9);
    }

    [Fact]
    public void Coordinates_a_million_metres_from_the_origin_cost_no_accuracy()
    {
        using var t = new TempFolder();
        // Uniform 3 kN/m over 6 m ≡ 18 kN at mid-length (exact arithmetic), placed at site coordinates ~10⁶ m.
        string a = t.Write("a.loads.json", """
            { "cases": { "c": { "loads": [
              { "id": "w", "kind": "line", "from": [1000000, 2000000, 100], "to": [1000006, 2000000, 100], "start": [0, 0, -3], "end": [0, 0, -3] } ] } } }
            """);
        string b = t.Write("b.loads.json", """
            { "cases": { "c": { "loads": [
              { "id": "R", "kind": "force", "at": [1000003, 2000000, 100], "value": [0, 0, -18] } ] } } }
            """);
        CliRun run = CliProcess.RunIn(t.Path, "check", a, b, "--rel-tol", "1e-12", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.Equal(1000003, doc.RootElement.GetProperty("reference_point")[0].GetDouble(), 6);
        Assert.True(Case(doc, "c").GetProperty("residual").GetProperty("worst_moment_norm").GetDouble() < 1e-9 * 18 * 6);
    }

    [Fact]
    public void A_case_in_one_file_only_is_reported_and_fails()
    {
        using var t = new TempFolder();
        string a = t.Write("a.loads.json", """{ "cases": { "dead": { "loads": [] }, "snow": { "loads": [] } } }""");
        string b = t.Write("b.loads.json", """{ "cases": { "dead": { "loads": [] }, "wind": { "loads": [] } } }""");
        CliRun run = CliProcess.RunIn(t.Path, "check", a, b, "--format", "json");
        Assert.Equal(1, run.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.Equal("original", Case(doc, "snow").GetProperty("only_in").GetString());
        Assert.Equal("substitute", Case(doc, "wind").GetProperty("only_in").GetString());
        Assert.True(Case(doc, "dead").GetProperty("equivalent").GetBoolean());
    }

    [Fact]
    public void The_reference_point_can_be_named_or_given_and_is_stated()
    {
        CliRun named = CliProcess.Run("check", Detailed, Simplified, "--at", "midspan", "--format", "json");
        using JsonDocument n = JsonDocument.Parse(named.Stdout);
        Assert.Equal(12, n.RootElement.GetProperty("reference_point")[0].GetDouble());
        Assert.Contains("midspan", n.RootElement.GetProperty("reference").GetString());
        CliRun given = CliProcess.Run("check", Detailed, Simplified, "--at", "1.5,2,-3");
        Assert.Contains("moments about (1.5, 2, -3) m (given point)", given.Stdout);
    }

    [Theory]
    [InlineData("--rel-tol", "-1")]
    [InlineData("--rel-tol", "NaN")]
    [InlineData("--force-tol", "1,5")]
    [InlineData("--at", "1,2")]
    [InlineData("--units", "kN,yard")]
    public void Bad_option_values_exit_2_without_a_stack_trace(string option, string value)
    {
        CliRun run = CliProcess.Run("check", Detailed, Simplified, option, value);
        Assert.Equal(2, run.ExitCode);
        Assert.DoesNotContain("   at ", run.Stderr);
        Assert.Contains(option, run.Stderr);
        Assert.Equal("", run.Stdout);
    }

    [Fact]
    public void A_bad_substitute_file_exits_2_naming_the_file_and_position()
    {
        using var t = new TempFolder();
        string b = t.Write("b.loads.json", "{ \"cases\": { \"dead\": { \"loads\": [ { \"kind\": \"forse\" } ] } } }");
        CliRun run = CliProcess.Run("check", Detailed, b);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("b.loads.json:1:", line);
        Assert.Contains("LD031", line);
    }

    [Fact]
    public void Report_is_written_as_markdown_and_never_over_an_input()
    {
        using var t = new TempFolder();
        string a = t.Write("a.loads.json", File.ReadAllText(Detailed));
        string report = Path.Combine(t.Path, "review.md");
        CliRun run = CliProcess.RunIn(t.Path, "check", a, Simplified, "--report", report);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.StartsWith("### Static equivalence: ✅ equivalent", File.ReadAllText(report));
        byte[] before = SHA256.HashData(File.ReadAllBytes(a));
        string renamed = Path.ChangeExtension(a, ".md");
        File.Copy(a, renamed);
        CliRun refused = CliProcess.RunIn(t.Path, "check", renamed, Simplified, "--report", renamed);
        Assert.Equal(2, refused.ExitCode);
        Assert.Contains("refusing to write over it", refused.Stderr);
        Assert.Equal(before, SHA256.HashData(File.ReadAllBytes(renamed)));
    }
}
