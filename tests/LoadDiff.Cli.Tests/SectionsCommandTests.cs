using System.Globalization;
using System.Text.Json;
using System.Xml.Linq;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public class SectionsCommandTests
{
    // A 10 m simple span under 7 kN/m with its reactions, against the single resultant at mid-span
    // (AISC Manual, Beam Diagrams and Formulas, Case 1: reactions wl/2, M_max = wl²/8 = 87.5 kN·m).
    private const string Uniform = """
        { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
          { "id": "R1", "kind": "force", "at": [0, 0, 0], "value": [0, 0, 35] },
          { "id": "udl", "kind": "line", "from": [0, 0, 0], "to": [10, 0, 0], "start": [0, 0, -7], "end": [0, 0, -7] },
          { "id": "R2", "kind": "force", "at": [10, 0, 0], "value": [0, 0, 35] } ] } } }
        """;

    private const string Resultant = """
        { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
          { "id": "R1", "kind": "force", "at": [0, 0, 0], "value": [0, 0, 35] },
          { "id": "P", "kind": "force", "at": [5, 0, 0], "value": [0, 0, -70] },
          { "id": "R2", "kind": "force", "at": [10, 0, 0], "value": [0, 0, 35] } ] } } }
        """;

    [Fact]
    public void Json_uniform_load_against_its_resultant_peaks_at_wl2_over_8_at_mid_span()
    {
        using var dir = new TempFolder();
        string a = dir.Write("udl.loads.json", Uniform), b = dir.Write("point.loads.json", Resultant);
        CliRun run = CliProcess.Run("sections", a, b, "--axis", "x", "--stations", "4", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement root = doc.RootElement;
        Assert.Equal(1, root.GetProperty("schema_version").GetInt32());
        Assert.Equal([1.0, 0, 0], root.GetProperty("axis").EnumerateArray().Select(x => x.GetDouble()));
        Assert.Equal([0.0, 0, 0], root.GetProperty("origin").EnumerateArray().Select(x => x.GetDouble()));
        // wl²/8 = 7·100/8 (same source), absolute and, against the original's own peak wl²/8, relative 1.
        Assert.Equal(87.5, root.GetProperty("max_moment_deviation").GetDouble(), 10);
        Assert.Equal(5, root.GetProperty("max_moment_deviation_at").GetDouble());
        Assert.Equal(1, root.GetProperty("max_moment_deviation_relative").GetDouble(), 12);
        Assert.True(root.TryGetProperty("max_force_deviation", out _));
        Assert.True(root.TryGetProperty("max_force_deviation_at", out _));
        Assert.True(root.TryGetProperty("max_force_deviation_relative", out _));
        JsonElement[] stations = [.. root.GetProperty("stations").EnumerateArray()];
        // Four even stations 0, 3.33, 6.67, 10 plus the resultant's point 5 (an item boundary).
        Assert.Equal([0.0, 10.0 / 3, 5, 20.0 / 3, 10], stations.Select(s => s.GetProperty("s").GetDouble()));
        foreach (JsonElement s in stations)
        {
            Assert.Equal(3, s.GetProperty("original").GetProperty("force").GetArrayLength());
            Assert.Equal(3, s.GetProperty("substitute").GetProperty("moment").GetArrayLength());
        }
        // Left of mid-span the simple-beam moment wlx/2 − wx²/2 (same source) at x = 10/3: 35·10/3 − 3.5·100/9.
        double x = 10.0 / 3;
        Assert.Equal((35 * x) - (3.5 * x * x), stations[1].GetProperty("original").GetProperty("moment")[1].GetDouble(), 10);
        Assert.Equal("dead", root.GetProperty("cases")[0].GetProperty("name").GetString());
    }

    // Cantilever, free end at x = 0, support at x = 4 m: 12.5 kN/m dead, 20 kN live at the tip, combination 1.35·G + 1.5·Q
    // (EN 1990 (6.10), Table A1.2(B)).
    private const string Cantilever = """
        { "units": { "force": "kN", "length": "m" }, "cases": {
          "dead": { "loads": [ { "id": "udl", "kind": "line", "from": [0, 0, 0], "to": [4, 0, 0], "start": [0, 0, -12.5], "end": [0, 0, -12.5] } ] },
          "live": { "loads": [ { "id": "tip", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -20] } ] } },
          "combinations": { "uls": { "dead": 1.35, "live": 1.5 } } }
        """;

    [Fact]
    public void Json_cantilever_combination_matches_the_closed_form_at_every_station()
    {
        using var dir = new TempFolder();
        string a = dir.Write("cantilever.loads.json", Cantilever);
        CliRun run = CliProcess.Run("sections", a, a, "--axis", "x", "--from", "0", "--to", "4", "--stations", "5", "--case", "uls", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement[] stations = [.. doc.RootElement.GetProperty("stations").EnumerateArray()];
        Assert.Equal([0.0, 1, 2, 3, 4], stations.Select(s => s.GetProperty("s").GetDouble()));
        foreach (JsonElement st in stations)
        {
            // Standard closed form (statics of a cantilever): loads towards −z, cut side x' ≤ x, moment about the cut point:
            // V_z = −(1.35·w·x + 1.5·P), M_y = −(1.35·w·x²/2 + 1.5·P·x); at x = 4: −97.5 kN and −255 kN·m.
            double x = st.GetProperty("s").GetDouble();
            JsonElement o = st.GetProperty("original");
            Assert.Equal(-((1.35 * 12.5 * x) + (1.5 * 20)), o.GetProperty("force")[2].GetDouble(), 9);
            Assert.Equal(-((1.35 * 12.5 * x * x / 2) + (1.5 * 20 * x)), o.GetProperty("moment")[1].GetDouble(), 9);
            Assert.Equal(0, o.GetProperty("force")[0].GetDouble(), 9);
            Assert.Equal(0, o.GetProperty("moment")[2].GetDouble(), 9);
        }
        Assert.Equal(-255, stations[^1].GetProperty("original").GetProperty("moment")[1].GetDouble(), 9);
    }

    [Fact]
    public void Svg_chart_is_well_formed_and_labelled_with_units()
    {
        using var dir = new TempFolder();
        string a = dir.Write("udl.loads.json", Uniform), b = dir.Write("point.loads.json", Resultant);
        CliRun run = CliProcess.Run("sections", a, b, "--axis", "x", "--format", "svg");
        Assert.True(run.ExitCode == 0, run.ToString());
        XDocument svg = XDocument.Parse(run.Stdout);
        XNamespace ns = "http://www.w3.org/2000/svg";
        Assert.Equal(ns + "svg", svg.Root!.Name);
        // Two panels (force, moment), each with a solid original and a dashed substitute line for the non-zero component.
        Assert.Equal(4, svg.Descendants(ns + "polyline").Count());
        Assert.Equal(2, svg.Descendants(ns + "polyline").Count(p => p.Attribute("stroke-dasharray") is not null));
        string text = string.Concat(svg.Descendants(ns + "text").Select(t => t.Value + "\n"));
        Assert.Contains("V (kN)", text);
        Assert.Contains("M (kN·m)", text);
        Assert.Contains("station s (m)", text);

        // Read the drawn lines back as a person reads the chart, through the labelled grid lines of each panel, and
        // compare them with the closed forms at the default stations s = 0, 0.5, …, 10 m. Loads on a cut count on its
        // negative side (the command's stated convention), so the reaction at 0 is in from s = 0 and the one at 10 at s = 10.
        // Original (AISC Manual, Beam Diagrams and Formulas, Case 1): V = wl/2 − w s = 35 − 7s, M = wls/2 − ws²/2 = 35s − 3.5s².
        // Substitute, by statics of the free body: V = 35 before the 70 kN load at 5, −35 from 5, and M = 35s up to 5,
        // 35s − 70(s − 5) = 350 − 35s after. Both V are 0 at s = 10, where the second reaction joins the cut side.
        static decimal OriginalV(decimal s) => s < 10 ? 35 - (7 * s) : 0;
        static decimal OriginalM(decimal s) => (35 * s) - (3.5m * s * s);
        static decimal SubstituteV(decimal s) => s < 5 ? 35 : s < 10 ? -35 : 0;
        static decimal SubstituteM(decimal s) => s <= 5 ? 35 * s : 350 - (35 * s);
        Assert.Equal(2, svg.Root.Elements(ns + "g").Count());
        foreach (XElement panel in svg.Root.Elements(ns + "g"))
        {
            string title = panel.Elements(ns + "text").First().Value;
            bool force = title.Contains("force V(s)", StringComparison.Ordinal);
            Assert.True(force || title.Contains("moment M(s)", StringComparison.Ordinal), title);
            (Func<decimal, decimal> toValue, decimal perPixel) = Scale(panel, ns, "end", "y");
            (Func<decimal, decimal> toStation, decimal perPixelS) = Scale(panel, ns, "middle", "x");
            foreach (XElement line in panel.Elements(ns + "polyline"))
            {
                bool dashed = line.Attribute("stroke-dasharray") is not null;
                Func<decimal, decimal> closed = (force, dashed) switch
                {
                    (true, false) => OriginalV,
                    (true, true) => SubstituteV,
                    (false, false) => OriginalM,
                    (false, true) => SubstituteM,
                };
                decimal[][] points = [.. ((string)line.Attribute("points")!).Split(' ')
                    .Select(pt => pt.Split(',').Select(v => decimal.Parse(v, CultureInfo.InvariantCulture)).ToArray())];
                Assert.Equal(21, points.Length);
                for (int i = 0; i < points.Length; i++)
                {
                    // Coordinates carry two decimals: the vertex and the two grid lines used for the scale together
                    // stay well inside 0.05 px here.
                    decimal station = i / 2m;
                    HandStatics.Close(station, toStation(points[i][0]), 0.05m * perPixelS, $"{title}: station of vertex {i}");
                    HandStatics.Close(closed(station), toValue(points[i][1]), 0.05m * perPixel, $"{title} {(dashed ? "substitute" : "original")} at s = {station}");
                }
            }
        }
    }

    // The affine map from a pixel coordinate to the value of the panel's labelled grid lines (the first and last labels).
    private static (Func<decimal, decimal> Map, decimal PerPixel) Scale(XElement panel, XNamespace ns, string anchor, string coordinate)
    {
        var labels = panel.Elements(ns + "text")
            .Where(t => (string?)t.Attribute("text-anchor") == anchor && t.Attribute("transform") is null
                && decimal.TryParse(t.Value, NumberStyles.Float, CultureInfo.InvariantCulture, out _))
            .Select(t => (Pixel: decimal.Parse((string)t.Attribute(coordinate)!, CultureInfo.InvariantCulture),
                Value: decimal.Parse(t.Value, NumberStyles.Float, CultureInfo.InvariantCulture)))
            .ToList();
        Assert.True(labels.Count >= 2, "fewer than two labelled grid lines");
        (decimal p0, decimal v0) = labels[0];
        (decimal p1, decimal v1) = labels[^1];
        decimal k = (v1 - v0) / (p1 - p0);
        return (pixel => v0 + ((pixel - p0) * k), Math.Abs(k));
    }

    [Fact]
    public void Text_shows_the_deviation_and_the_caution()
    {
        using var dir = new TempFolder();
        string a = dir.Write("udl.loads.json", Uniform), b = dir.Write("point.loads.json", Resultant);
        CliRun run = CliProcess.Run("sections", a, b, "--axis", "1,0,0", "--from", "0", "--to", "10", "--stations", "3");
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("largest |ΔM| = 87.5 kN·m at s = 5 m", run.Stdout);
        Assert.Contains("Saint-Venant", run.Stdout);
    }

    [Fact]
    public void Bad_axis_and_unknown_case_exit_2_with_one_message()
    {
        using var dir = new TempFolder();
        string a = dir.Write("udl.loads.json", Uniform), b = dir.Write("point.loads.json", Resultant);
        CliRun zero = CliProcess.Run("sections", a, b, "--axis", "0,0,0");
        Assert.Equal(2, zero.ExitCode);
        Assert.Contains("--axis '0,0,0'", zero.Stderr);
        CliRun unknown = CliProcess.Run("sections", a, b, "--axis", "x", "--case", "live");
        Assert.Equal(2, unknown.ExitCode);
        Assert.Contains("--case 'live'", unknown.Stderr);
        Assert.DoesNotContain("   at ", unknown.Stderr);
    }

    [Fact]
    public void Check_section_gate_fails_the_single_resultant_and_passes_the_load_itself()
    {
        using var dir = new TempFolder();
        string a = dir.Write("udl.loads.json", Uniform), b = dir.Write("point.loads.json", Resultant);
        // Statically equivalent, so check alone passes (exit 0) …
        Assert.Equal(0, CliProcess.Run("check", a, b).ExitCode);
        // … but the cut moment deviates by wl²/8, 100 % of the original's peak: a 10 % gate fails it.
        CliRun gated = CliProcess.Run("check", a, b, "--sections", "x", "--section-tol", "0.1");
        Assert.True(gated.ExitCode == 1, gated.ToString());
        // one verdict: the headline says what the exit code says
        Assert.Contains("Result: NOT EQUIVALENT", gated.Stdout);
        Assert.Contains("Section-cut gate: FAIL", gated.Stdout);
        Assert.Equal(0, CliProcess.Run("check", a, a, "--sections", "x", "--section-tol", "0.1").ExitCode);
        // JSON carries the gate in the same document: the cases pass, the gate and so the whole check fail.
        CliRun json = CliProcess.Run("check", a, b, "--sections", "x", "--section-tol", "0.1", "--format", "json");
        Assert.Equal(1, json.ExitCode);
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        Assert.False(doc.RootElement.GetProperty("equivalent").GetBoolean());
        Assert.True(doc.RootElement.GetProperty("cases_equivalent").GetBoolean());
        Assert.False(doc.RootElement.GetProperty("section_gate").GetProperty("passes").GetBoolean());
        // One option without the other is a usage error.
        Assert.Equal(2, CliProcess.Run("check", a, b, "--sections", "x").ExitCode);
        Assert.Equal(2, CliProcess.Run("check", a, b, "--section-tol", "0.1").ExitCode);
    }

    [Theory]
    [InlineData("vehicle")]
    [InlineData("dead")]
    public void Footbridge_cuts_along_the_span_match_the_statics_of_the_cut_side(string caseName)
    {
        CliRun run = CliProcess.Run("sections", CliProcess.Fixture("footbridge", "detailed.loads.json"),
            CliProcess.Fixture("footbridge", "simplified.loads.json"), "--axis", "x", "--case", caseName,
            "--from", "0", "--to", "24", "--stations", "9", "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        JsonElement[] stations = [.. doc.RootElement.GetProperty("stations").EnumerateArray()];
        // Nine even stations 0, 3, …, 24 and the vehicle's item boundaries 10.5 and 13.5 (12, the tank, is an even one);
        // the dead case's loads span 0…24 and add none.
        decimal[] expected = caseName == "vehicle" ? [0, 3, 6, 9, 10.5m, 12, 13.5m, 15, 18, 21, 24] : [0, 3, 6, 9, 12, 15, 18, 21, 24];
        Assert.Equal(expected, stations.Select(st => HandStatics.Dec(st.GetProperty("s"))));
        foreach ((decimal s, JsonElement st) in expected.Zip(stations))
        {
            var cut = new Dec3(s, 0, 0); // origin + s·axis
            (Dec3 v, Dec3 m) = caseName == "vehicle"
                // The free body left of the cut: the wheels and the tank with x_i ≤ s, reduced to the cut point
                // (V = Σ F_i, M = Σ (r_i − cut) × F_i); a load on the cut counts on the negative side. The detailed
                // file's wheels at y = ±0.8 pair up, so M_x = 0 as for the centre-line axles, and the tank's height
                // does not matter for a vertical force: both files give the same values.
                ? (HandStatics.Resultant(FootbridgeByHand.Detailed["vehicle"].Forces.Where(f => f.At.X <= s)),
                   HandStatics.MomentAbout(cut, FootbridgeByHand.Detailed["vehicle"].Forces.Where(f => f.At.X <= s)))
                // Dead: w = 4·3 + 2·0.8 = 13.6 kN/m (detailed) = 2·6.8 (two girders), uniform across y about y = 0, so the
                // cut side is the cantilever of AISC Case 19 (uniform load, cut at x from the free end): V = −w s,
                // M_y = −w s²/2 (the load acts at s/2 behind the cut, (s/2)·(−w s) with M_y = (s − x)·F_z).
                : (new Dec3(0, 0, -13.6m * s), new Dec3(0, -13.6m * s * s / 2, 0));
            foreach (string side in new[] { "original", "substitute" })
            {
                // Largest values: 67.85 kN and 844 kN·m (vehicle), 326.4 kN and 3917 kN·m (dead): 1e-12 of 1e4.
                HandStatics.Close(v, st.GetProperty(side).GetProperty("force"), 1e-8m, $"{caseName} {side} V at s = {s}");
                HandStatics.Close(m, st.GetProperty(side).GetProperty("moment"), 1e-8m, $"{caseName} {side} M at s = {s}");
            }
            HandStatics.Close(0, st.GetProperty("force_deviation"), 1e-8m, "force deviation");
            HandStatics.Close(0, st.GetProperty("moment_deviation"), 1e-8m, "moment deviation");
        }
        // The original's largest cut moment is at s = 24: vehicle Σ|F|·(24 − x̄) = 844.14384 kN·m
        // (40·13.5 + 20·10.5 + 7.84532·12), dead 13.6·24²/2 = 3916.8 kN·m.
        decimal peak = caseName == "vehicle" ? (40 * 13.5m) + (20 * 10.5m) + (7.84532m * 12) : 13.6m * 24 * 24 / 2;
        HandStatics.Close(peak, doc.RootElement.GetProperty("original_peak_moment"), 1e-8m, "original peak |M|");
    }

    [Fact]
    public void Check_report_with_the_section_gate_carries_one_chart_per_case_and_no_url()
    {
        using var t = new TempFolder();
        string report = Path.Combine(t.Path, "wall.html");
        CliRun run = CliProcess.Run("check", CliProcess.Fixture("tank-wall", "detailed.loads.json"), CliProcess.Fixture("tank-wall", "simplified.loads.json"),
            "--sections", "z", "--section-tol", "0.05", "--report", report);
        Assert.True(run.ExitCode == 0, run.ToString());
        string html = File.ReadAllText(report);
        Assert.Contains("Section cuts: water", html);
        // The chart is labelled with its units.
        Assert.Contains("V (kN)", html);
        Assert.DoesNotContain("http://", html);
        Assert.DoesNotContain("https://", html);
        Assert.DoesNotContain("No section cuts were requested", html, StringComparison.OrdinalIgnoreCase);
    }
}
