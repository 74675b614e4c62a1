using System.Text.Json;
using System.Text.RegularExpressions;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// The HTML reports opened in a real headless Chromium with no network: the page loads without errors and fetches
/// nothing, every drawing has a non-empty bounding box, the summary table has one row per case and combination, and
/// a screenshot is taken (kept in LOADDIFF_SCREENSHOTS when that folder is named, for a person to look at).
/// </summary>
public partial class BrowserReportTests
{
    // Measures the page in the browser: injected into a test copy only; the report itself has no script.
    private const string ErrorProbe = """
        <script>window.__errors=[];window.addEventListener('error',function(e){window.__errors.push(String(e.message||e.type)+' '+String((e.target&&(e.target.src||e.target.href))||''));},true);</script>
        """;

    private const string Measure = """
        <script>
        window.addEventListener('load',function(){
          var out={errors:window.__errors,resources:performance.getEntriesByType('resource').map(function(r){return r.name;}),svgs:[],rows:0};
          document.querySelectorAll('svg').forEach(function(s){var b=s.getBBox();var r=s.getBoundingClientRect();out.svgs.push([b.width,b.height,r.width,r.height]);});
          out.rows=document.querySelectorAll('#summary tbody tr').length;
          var pre=document.createElement('pre');pre.id='measurements';pre.textContent=JSON.stringify(out);document.body.appendChild(pre);
        });
        </script>
        """;

    [BrowserFact]
    public void Tank_wall_report_renders_in_chromium() =>
        Renders("tank-wall", "check", "fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified-reversed.loads.json");

    [BrowserFact]
    public void Footbridge_report_renders_in_chromium() =>
        Renders("footbridge", "check", "fixtures/footbridge/detailed.loads.json", "fixtures/footbridge/simplified-no-tank.loads.json");

    [BrowserFact]
    public void Reduce_report_renders_in_chromium() =>
        Renders("reduce-footbridge", "reduce", "fixtures/footbridge/detailed.loads.json");

    [BrowserFact]
    public void Aggregated_report_of_a_large_case_renders_in_chromium()
    {
        using var t = new TempFolder();
        (string big, string lumped) = LargeCase.Write(t);
        Renders("large", "check", big, lumped);
    }

    private static void Renders(string name, params string[] args)
    {
        using var t = new TempFolder();
        string report = Path.Combine(t.Path, name + ".html");
        CliRun run = CliProcess.Run([.. args, "--report", report]);
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        // check ORIGINAL SUBSTITUTE or reduce FILE: the rows expected come from the input files themselves.
        int expectedRows = EntriesIn(args[0] == "check" ? [args[1], args[2]] : [args[1]]);
        Assert.True(expectedRows > 0);
        Inspect(t, name, report, expectedRows);
    }

    [Fact]
    public void The_fixtures_hold_the_entries_the_row_counts_expect()
    {
        // By inspection of the files: footbridge 4 cases (dead, surfacing, vehicle, wind) + 2 combinations in each file;
        // tank-wall one case (water) in each; the generated large pair one case (roof) in each.
        Assert.Equal(6, EntriesIn("fixtures/footbridge/detailed.loads.json", "fixtures/footbridge/simplified-no-tank.loads.json"));
        Assert.Equal(6, EntriesIn("fixtures/footbridge/detailed.loads.json"));
        Assert.Equal(1, EntriesIn("fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified-reversed.loads.json"));
        using var t = new TempFolder();
        (string big, string lumped) = LargeCase.Write(t);
        Assert.Equal(1, EntriesIn(big, lumped));
    }

    /// <summary>
    /// The summary rows a report of these load files should have: every case named in any of them plus every combination
    /// named in any of them (a check lists cases and combinations found in either file), read from the files' JSON.
    /// </summary>
    private static int EntriesIn(params string[] loadFiles)
    {
        var cases = new HashSet<string>(StringComparer.Ordinal);
        var combinations = new HashSet<string>(StringComparer.Ordinal);
        foreach (string file in loadFiles)
        {
            using JsonDocument doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(CliProcess.RepoRoot, file)),
                new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip, AllowTrailingCommas = true });
            cases.UnionWith(doc.RootElement.GetProperty("cases").EnumerateObject().Select(c => c.Name));
            if (doc.RootElement.TryGetProperty("combinations", out JsonElement combos))
            {
                combinations.UnionWith(combos.EnumerateObject().Select(c => c.Name));
            }
        }
        return cases.Count + combinations.Count;
    }

    [BrowserFact]
    public void Diff_html_renders_in_chromium()
    {
        using var t = new TempFolder();
        CliRun run = CliProcess.Run("diff", "fixtures/footbridge/detailed.loads.json", "fixtures/footbridge/detailed-rev-b.loads.json", "--format", "html");
        Assert.True(run.ExitCode == 1, run.ToString());
        string page = t.Write("diff.html", run.Stdout);
        Inspect(t, "diff", page, expectedRows: null);
    }

    [BrowserFact]
    public void Check_report_with_section_charts_renders_in_chromium()
    {
        using var t = new TempFolder();
        string report = Path.Combine(t.Path, "sections.html");
        CliRun run = CliProcess.Run("check", "fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified-reversed.loads.json",
            "--sections", "z", "--section-tol", "0.05", "--report", report);
        Assert.True(run.ExitCode == 1, run.ToString());
        Inspect(t, "sections", report, EntriesIn("fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified-reversed.loads.json"));
    }

    // Opens a page in the browser with the probe, checks errors, fetches, drawings and rows, and takes a screenshot.
    private static void Inspect(TempFolder t, string name, string report, int? expectedRows)
    {
        string html = File.ReadAllText(report);
        string probe = Path.Combine(t.Path, name + ".probe.html");
        File.WriteAllText(probe, html.Replace("<head>", "<head>\n" + ErrorProbe, StringComparison.Ordinal)
            .Replace("</body>", Measure + "\n</body>", StringComparison.Ordinal));
        var dump = Chromium.Run(Path.Combine(t.Path, "profile-dom"), "--virtual-time-budget=10000", "--window-size=1280,2000", "--dump-dom", new Uri(probe).AbsoluteUri);
        Match m = Regex.Match(dump.Stdout, "<pre id=\"measurements\">(.*?)</pre>", RegexOptions.Singleline);
        Assert.True(m.Success, $"no measurements in the dumped page (exit {dump.Exit}):\n{dump.Stderr}");
        using JsonDocument doc = JsonDocument.Parse(System.Net.WebUtility.HtmlDecode(m.Groups[1].Value));
        JsonElement root = doc.RootElement;
        Assert.Equal(0, root.GetProperty("errors").GetArrayLength());
        Assert.Equal(0, root.GetProperty("resources").GetArrayLength());
        if (expectedRows is { } rows)
        {
            Assert.Equal(rows, root.GetProperty("rows").GetInt32());
        }
        var svgs = root.GetProperty("svgs").EnumerateArray().Select(s => s.EnumerateArray().Select(v => v.GetDouble()).ToArray()).ToList();
        Assert.Equal(Regex.Count(html, "<svg "), svgs.Count);
        Assert.All(svgs, s =>
        {
            Assert.True(s[0] > 0 && s[1] > 0, $"an SVG has an empty bounding box {s[0]} × {s[1]}");
            Assert.True(s[2] > 100 && s[3] > 10, $"an SVG is laid out at {s[2]} × {s[3]} px");
        });

        string png = Path.Combine(t.Path, name + ".png");
        var shot = Chromium.Run(Path.Combine(t.Path, "profile-shot"), "--window-size=1280,2000", "--screenshot=" + png, new Uri(report).AbsoluteUri);
        Assert.True(File.Exists(png), $"no screenshot (exit {shot.Exit}):\n{shot.Stderr}");
        byte[] bytes = File.ReadAllBytes(png);
        Assert.Equal([0x89, (byte)'P', (byte)'N', (byte)'G'], bytes[..4]);
        Assert.True(bytes.Length > 30_000, $"the screenshot is only {bytes.Length} bytes");
        if (Environment.GetEnvironmentVariable("LOADDIFF_SCREENSHOTS") is { Length: > 0 } keep)
        {
            Directory.CreateDirectory(keep);
            File.Copy(png, Path.Combine(keep, name + ".png"), overwrite: true);
        }
    }
}
