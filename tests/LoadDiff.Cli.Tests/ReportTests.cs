using System.Globalization;
using System.Security.Cryptography;
using System.Text.Json;
using System.Text.RegularExpressions;
using System.Xml.Linq;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>The --report files of check and reduce: golden structure, key values against independent sources, self-containment.</summary>
public partial class ReportTests
{
    // 1 700 000 000 s after 1970-01-01 is 2023-11-14 22:13:20 UTC (worked by hand: 19 675 days and 80 000 s).
    private static readonly Dictionary<string, string> FixedDate = new() { ["SOURCE_DATE_EPOCH"] = "1700000000" };

    private const string TankWall = "fixtures/tank-wall/detailed.loads.json";
    private const string TankWallReversed = "fixtures/tank-wall/simplified-reversed.loads.json";
    private const string Footbridge = "fixtures/footbridge/detailed.loads.json";
    private const string FootbridgeNoTank = "fixtures/footbridge/simplified-no-tank.loads.json";

    internal static string Report(TempFolder t, string name, int expectedExit, params string[] args)
    {
        string path = Path.Combine(t.Path, name);
        CliRun run = CliProcess.Run(CliProcess.RepoRoot, FixedDate, null, [.. args, "--report", path]);
        Assert.True(run.ExitCode == expectedExit, run.ToString());
        Assert.True(File.Exists(path), run.ToString());
        return File.ReadAllText(path);
    }

    [Fact]
    public void Markdown_report_of_the_reversed_wall_load_matches_the_verified_file()
    {
        using var t = new TempFolder();
        string md = Report(t, "wall.md", 1, "check", TankWall, TankWallReversed);
        Golden.Verify("check-tank-wall-reversed", "md", md);
        // Hydrostatic force on the 6 m wall, 4 m of water: γbh²/2 = 9.81 × 6 × 4² / 2 = 470.88 kN (Munson et al.,
        // Fundamentals of Fluid Mechanics, force on a vertical plane surface); the allowed |ΔR| is 1e-3 of it.
        Assert.Contains("| 0 | 0.47088 |", md);
        // Reversing the triangle moves the resultant from h/3 to 2h/3 above the floor: ΔM = 470.88 × 4/3 = 627.84 kN·m.
        Assert.Contains("627.84", md);
    }

    [Fact]
    public void Markdown_report_of_the_forgotten_tank_matches_the_verified_file()
    {
        using var t = new TempFolder();
        string md = Report(t, "bridge.md", 1, "check", Footbridge, FootbridgeNoTank);
        Golden.Verify("check-footbridge-no-tank", "md", md);
        // 800 kg × 9.80665 m/s² = 7.84532 kN (standard gravity, CGPM 1901).
        Assert.Contains(@"\|ΔR\| = 7.84532 kN", md);
    }

    [Fact]
    public void Html_report_of_the_reversed_wall_load_has_the_verified_structure_and_the_hydrostatic_values()
    {
        using var t = new TempFolder();
        string html = Report(t, "wall.html", 1, "check", TankWall, TankWallReversed);
        Golden.Verify("check-tank-wall-reversed.html-outline", "txt", HtmlOutline.Of(html));
        XDocument doc = HtmlOutline.Parse(html);
        XElement row = Rows(doc).Single();
        Assert.Equal("water", row.Attribute("data-name")!.Value);
        string[] cells = row.Elements("td").Select(c => c.Value).ToArray();
        Assert.Contains("FAIL", cells[2]);
        Assert.Equal("(470.88, 0, 0)", cells[3]);   // γbh²/2 (Munson et al.)
        Assert.Equal("(470.88, 0, 0)", cells[4]);
        Assert.Equal("(0, 627.84, 0)", cells[6]);   // 470.88 × (2h/3 − h/3) about the centroid
        Assert.Equal("627.84", cells[9]);
    }

    [Fact]
    public void Html_report_of_the_footbridge_has_the_verified_structure_one_row_per_case_and_combination()
    {
        using var t = new TempFolder();
        string html = Report(t, "bridge.html", 1, "check", Footbridge, FootbridgeNoTank);
        Golden.Verify("check-footbridge-no-tank.html-outline", "txt", HtmlOutline.Of(html));
        XDocument doc = HtmlOutline.Parse(html);
        Assert.Equal(["dead", "surfacing", "vehicle", "wind", "uls-vehicle", "characteristic"], Rows(doc).Select(r => r.Attribute("data-name")!.Value));
        // Each case is drawn in plan and two elevations for both systems plus the resultants; combinations get the resultants.
        Assert.Equal((4 * 9) + (2 * 3), doc.Descendants("svg").Count(s => (string?)s.Attribute("class") == "view"));
    }

    [Fact]
    public void Html_report_states_inputs_with_their_sha256_the_version_the_date_and_the_caution()
    {
        using var t = new TempFolder();
        string html = Report(t, "wall.html", 0, "check", TankWall, "fixtures/tank-wall/simplified.loads.json");
        XDocument doc = HtmlOutline.Parse(html);
        var inputs = doc.Descendants("table").Single(e => (string?)e.Attribute("id") == "input-files").Descendants("tbody").Single().Elements("tr")
            .Select(r => r.Elements("td").Select(c => c.Value).ToArray()).ToList();
        Assert.Equal(2, inputs.Count);
        foreach ((string[] cells, string file) in inputs.Zip([TankWall, "fixtures/tank-wall/simplified.loads.json"]))
        {
            byte[] bytes = File.ReadAllBytes(Path.Combine(CliProcess.RepoRoot, file));
            Assert.Equal(file, cells[1]);
            Assert.Equal(bytes.Length.ToString(CultureInfo.InvariantCulture), cells[2]);
            Assert.Equal(Convert.ToHexStringLower(SHA256.HashData(bytes)), cells[3]);
        }
        Assert.Equal("2023-11-14T22:13:20Z", doc.Descendants("time").Single().Attribute("datetime")!.Value);
        Assert.Equal("0.1.0", doc.Descendants("span").Single(s => (string?)s.Attribute("id") == "tool-version").Value);
        Assert.Equal(2, Regex.Count(html, "Saint-Venant"));
        Assert.Contains("licensed engineering judgement", html);
        Assert.Contains("|ΔM_Q| ≤ max(M, rel·G_M)", html);
        Assert.Contains("M_P = L[(A − P) × (w₁ + w₂)/2 + (B − A) × (w₁/6 + w₂/3)]", html);
        Assert.Contains("No section cuts were requested", html);
    }

    [Fact]
    public void Reports_fetch_nothing_no_scripts_links_images_or_urls()
    {
        using var t = new TempFolder();
        (string big, string lumped) = LargeCase.Write(t);
        string[] pages =
        [
            Report(t, "a.html", 1, "check", TankWall, TankWallReversed),
            Report(t, "b.html", 1, "check", Footbridge, FootbridgeNoTank),
            Report(t, "c.html", 0, "reduce", TankWall),
            Report(t, "d.html", 1, "check", big, lumped),
        ];
        foreach (string html in pages)
        {
            Assert.DoesNotMatch(new Regex(@"\bsrc\s*=", RegexOptions.IgnoreCase), html);
            foreach (Match m in Regex.Matches(html, @"\bhref\s*=\s*""([^""]*)""", RegexOptions.IgnoreCase))
            {
                Assert.StartsWith("#", m.Groups[1].Value);
            }
            Assert.DoesNotMatch(new Regex(@"(https?:)?//[a-z0-9]", RegexOptions.IgnoreCase), html.Replace("<!DOCTYPE html>", "", StringComparison.Ordinal));
            Assert.DoesNotContain("@import", html, StringComparison.OrdinalIgnoreCase);
            foreach (Match m in Regex.Matches(html, @"url\(\s*['""]?([^)'""]*)", RegexOptions.IgnoreCase))
            {
                Assert.StartsWith("data:", m.Groups[1].Value);
            }
            foreach (string tag in (string[])["<script", "<link", "<img", "<iframe", "<object", "<embed", "<image", "<use", "@font-face"])
            {
                Assert.DoesNotContain(tag, html, StringComparison.OrdinalIgnoreCase);
            }
        }
    }

    [Fact]
    public void Thousands_of_forces_and_triangles_are_aggregated_into_a_small_bounded_drawing()
    {
        using var t = new TempFolder();
        (string big, string lumped) = LargeCase.Write(t);
        string html = Report(t, "big.html", 1, "check", big, lumped);
        XDocument doc = HtmlOutline.Parse(html);
        var views = doc.Descendants("svg").Where(s => (string?)s.Attribute("class") == "view").ToList();
        Assert.Equal(9, views.Count);
        // Each view of 400 × 300 drawing units holds at most one mesh cell per 10 × 10 units of its plot area, one
        // dot per 6 × 6 units, and the 40 largest arrows: a bound that does not grow with the input.
        const int cellBound = (388 * 236 / 100) + 1, dotBound = (388 * 236 / 36) + 1;
        foreach (XElement v in views)
        {
            int cells = v.Descendants("rect").Count(r => (string?)r.Attribute("class") == "cell");
            int dots = v.Descendants("circle").Count(c => ((string?)c.Attribute("class"))?.StartsWith("dot", StringComparison.Ordinal) == true);
            Assert.InRange(cells, 0, cellBound);
            Assert.InRange(dots, 0, dotBound);
            Assert.InRange(v.Descendants().Count(), 1, cellBound + dotBound + 400);
        }
        XElement plan = views.First(v => (string?)v.Attribute("data-view") == "Plan");
        Assert.InRange(plan.Descendants("rect").Count(r => (string?)r.Attribute("class") == "cell"), 50, cellBound);
        Assert.Contains("the 40 largest of 6,000 point forces are drawn", html);
        Assert.Contains("the mesh of 6,000 triangles is drawn as cells", html);
        Assert.InRange(html.Length, 10_000, 600_000);
    }

    [Fact]
    public void Reduce_writes_an_html_report_of_one_system()
    {
        using var t = new TempFolder();
        string html = Report(t, "wall.html", 0, "reduce", TankWall);
        XDocument doc = HtmlOutline.Parse(html);
        XElement row = Rows(doc).Single();
        Assert.Equal("(470.88, 0, 0)", row.Elements("td").ElementAt(2).Value); // γbh²/2 (Munson et al.)
        // About the origin: M = r × R with the resultant at (0, 3, h/3): (0, 470.88·4/3, −470.88·3) = (0, 627.84, −1412.64).
        Assert.Equal("(0, 627.84, -1412.64)", row.Elements("td").ElementAt(3).Value);
        Assert.Equal(6, doc.Descendants("svg").Count(s => (string?)s.Attribute("class") == "view"));
        Assert.Contains("Saint-Venant", html);
    }

    [Fact]
    public void Markdown_report_of_reduce_is_written_too()
    {
        using var t = new TempFolder();
        string md = Report(t, "wall.md", 0, "reduce", TankWall);
        Assert.StartsWith("### Reduction of fixtures/tank-wall/detailed.loads.json", md);
        Assert.Contains("(470.88, 0, 0)", md);
    }

    [Fact]
    public void A_report_name_of_unknown_kind_is_a_usage_error()
    {
        using var t = new TempFolder();
        string path = Path.Combine(t.Path, "r.pdf");
        CliRun run = CliProcess.Run("check", TankWall, TankWallReversed, "--report", path);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("must end in .md (Markdown) or .html", run.Stderr);
        Assert.False(File.Exists(path));
    }

    internal static IEnumerable<XElement> Rows(XDocument doc) =>
        doc.Descendants("table").Single(e => (string?)e.Attribute("id") == "summary").Element("tbody")!.Elements("tr");
}
