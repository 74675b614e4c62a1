using System.Text.Json;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// check --sections on point loads merged into their resultant: original −10 kN (z) at x = 0 and x = 2, substitute −20 kN at
/// x = 1. The cut-side free body is made of cantilever tip loads, M = P·x (AISC Manual, Beam Diagrams and Formulas, cantilever
/// with a concentrated load at the free end; case number from memory): the original's |M(s)| = 10·s on 0 … 2, peak 20 kN·m at
/// s = 2; the substitute's is 0 up to s = 1, so |ΔM| = 10 kN·m there, and a 5 % gate allows 0.05 × 20 = 1 kN·m.
/// Items of zero magnitude far along the axis must change none of it (SPEC §4: they are no loaded geometry).
/// </summary>
public class SectionGateTests
{
    private const string Header = """{ "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [""";
    private const string Footer = "] } } }";
    private const string P1 = """{ "id": "P1", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -10] }""";
    private const string P2 = """{ "id": "P2", "kind": "force", "at": [2, 0, 0], "value": [0, 0, -10] }""";
    private const string P = """{ "id": "P", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -20] }""";
    private const string FarZero = """{ "id": "Z", "kind": "force", "at": [1000, 0, 0], "value": [0, 0, 0] }""";
    private const string FarZeroLine = """{ "id": "ZL", "kind": "line", "from": [998, 0, 0], "to": [1000, 0, 0], "start": [0, 0, 0], "end": [0, 0, 0] }""";
    private const string FarReal = """{ "id": "F", "kind": "force", "at": [1000, 0, 0], "value": [0, 0, -1] }""";

    private const string ExpectedLine = "dead  FAIL  largest |ΔM| = 10 kN·m at s = 1 m; allowed 1 kN·m (peak 20 kN·m over the original's loads, s = 0 … 2 m)";

    private static string File(TempFolder t, string name, params string[] items) => t.Write(name, Header + string.Join(",\n", items) + Footer);

    [Fact]
    public void Gate_fails_the_merged_resultant_with_an_allowance_of_1_kNm_with_or_without_far_loads()
    {
        using var t = new TempFolder();
        string original = File(t, "O.loads.json", P1, P2), originalZero = File(t, "Oz.loads.json", P1, P2, FarZero);
        string substitute = File(t, "S.loads.json", P), substituteZero = File(t, "Sz.loads.json", P, FarZero);
        string substituteFar = File(t, "Sr.loads.json", P, FarReal);
        foreach ((string a, string b) in (ReadOnlySpan<(string, string)>)[(original, substitute), (original, substituteZero), (originalZero, substitute), (original, substituteFar)])
        {
            CliRun run = CliProcess.Run("check", a, b, "--sections", "x", "--section-tol", "0.05");
            Assert.True(run.ExitCode == 1, run.ToString());
            Assert.Contains(ExpectedLine, run.Stdout);
            Assert.Contains("Section-cut gate: FAIL", run.Stdout);
        }
        // The gate is what fails the zero-force pair: without it the two files are statically equivalent (same resultant).
        CliRun plain = CliProcess.Run("check", original, substituteZero);
        Assert.True(plain.ExitCode == 0, plain.ToString());
        // A 60 % gate allows 0.6 × 20 = 12 kN·m ≥ 10 kN·m and passes.
        CliRun loose = CliProcess.Run("check", original, substituteZero, "--sections", "x", "--section-tol", "0.6");
        Assert.True(loose.ExitCode == 0, loose.ToString());
        Assert.Contains("dead  PASS  largest |ΔM| = 10 kN·m at s = 1 m; allowed 12 kN·m (peak 20 kN·m over the original's loads, s = 0 … 2 m)", loose.Stdout);
    }

    [Fact]
    public void Sections_range_ends_at_the_last_load_when_only_zero_items_lie_beyond()
    {
        using var t = new TempFolder();
        string original = File(t, "O.loads.json", P1, P2, FarZeroLine), substitute = File(t, "S.loads.json", P, FarZero);
        CliRun run = CliProcess.Run("sections", original, substitute, "--axis", "x", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        double[] s = [.. doc.RootElement.GetProperty("stations").EnumerateArray().Select(x => x.GetProperty("s").GetDouble())];
        Assert.Equal(0, s[0]);
        Assert.Equal(2, s[^1]);
        // Against the original's largest |M| = 20 kN·m (class comment) the 10 kN·m deviation is 0.5.
        Assert.Equal(10, doc.RootElement.GetProperty("max_moment_deviation").GetDouble(), 12);
        Assert.Equal(0.5, doc.RootElement.GetProperty("max_moment_deviation_relative").GetDouble(), 12);
        CliRun text = CliProcess.Run("sections", original, substitute, "--axis", "x");
        Assert.Contains("stations from 0 to 2 m", text.Stdout);
        // With a real load out there the range does reach it.
        string far = File(t, "Sr.loads.json", P, FarReal);
        CliRun reaching = CliProcess.Run("sections", original, far, "--axis", "x");
        Assert.Contains("stations from 0 to 1000 m", reaching.Stdout);
    }

    [Fact]
    public void Report_draws_no_zero_force_and_charts_the_cuts_over_the_loads_only()
    {
        using var t = new TempFolder();
        string original = File(t, "O.loads.json", P1, P2), substitute = File(t, "Sz.loads.json", P, FarZero);
        string report = System.IO.Path.Combine(t.Path, "r.html");
        CliRun run = CliProcess.Run("check", original, substitute, "--sections", "x", "--section-tol", "0.05", "--report", report);
        Assert.True(run.ExitCode == 1, run.ToString());
        XDocument doc = HtmlOutline.Parse(System.IO.File.ReadAllText(report));
        XElement[] views = [.. doc.Descendants().Where(e => e.Name.LocalName == "div" && (string?)e.Attribute("data-system") == "subs")];
        Assert.NotEmpty(views);
        // Few forces are labelled with their size: the substitute's drawings show its one 20 kN force and no "0 kN".
        string[] labels = [.. views.SelectMany(v => v.Descendants()).Where(e => e.Name.LocalName == "text" && ((string?)e.Attribute("class") ?? "").StartsWith("lbl", StringComparison.Ordinal)).Select(e => e.Value)];
        Assert.Equal(["20 kN", "20 kN", "20 kN"], labels);
        // The section chart's station axis runs over the loads, 0 … 2 m, not out to the zero force at 1000 m.
        XElement chart = doc.Descendants().First(e => e.Name.LocalName == "svg" && e.Elements().Any(c => c.Name.LocalName == "title" && c.Value.StartsWith("Section cuts", StringComparison.Ordinal)));
        double[] ticks = [.. chart.Descendants().Where(e => e.Name.LocalName == "text" && (string?)e.Attribute("text-anchor") == "middle" && Regex.IsMatch(e.Value, @"^-?[0-9.]+$"))
            .Select(e => double.Parse(e.Value, System.Globalization.CultureInfo.InvariantCulture))];
        Assert.NotEmpty(ticks);
        Assert.Equal(0, ticks.Min());
        Assert.Equal(2, ticks.Max());
        // The chart's caption carries the gate's verdict.
        Assert.Contains(doc.Descendants(), e => e.Value.Contains("allowed 1 kN·m (peak 20 kN·m over the original's loads, s = 0 … 2 m): FAIL", StringComparison.Ordinal) && !e.HasElements);
    }
}
