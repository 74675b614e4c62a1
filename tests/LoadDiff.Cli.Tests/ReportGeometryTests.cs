using System.Xml.Linq;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// The drawings of a written `check --report r.html` read back as geometry: the original's elevation x–z arrows end
/// at the loads' coordinates mapped through the drawing's own length scale bar from the reference mark P, and are
/// as long as the drawing's reference arrow says, in the ratio of the forces.
/// </summary>
public class ReportGeometryTests
{
    private const double Pixel = 1;

    // Invented pair (kN, m): three forces in the x–z plane and one force equal to their resultant, placed so that its
    // moment matches: ΣF = (6, 0, −38); Σ r × F about the origin = (0, 96, 0) + (0, −36, 0) = (0, 60, 0), and
    // (0, 0, 10) × (6, 0, −38) = (0, 60, 0) (worked by hand).
    private const string Original = """
        {
          "format": "loaddiff/1",
          "units": { "force": "kN", "length": "m" },
          "cases": {
            "rig": {
              "loads": [
                { "id": "a", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -30] },
                { "id": "b", "kind": "force", "at": [6, 0, 0], "value": [12, 0, -16] },
                { "id": "c", "kind": "force", "at": [3, 0, 2], "value": [-6, 0, 8] }
              ]
            }
          }
        }
        """;

    private const string Substitute = """
        {
          "format": "loaddiff/1",
          "units": { "force": "kN", "length": "m" },
          "cases": {
            "rig": {
              "loads": [
                { "id": "lumped", "kind": "force", "at": [0, 0, 10], "value": [6, 0, -38] }
              ]
            }
          }
        }
        """;

    private static readonly (string Id, decimal[] At, decimal[] F)[] Forces =
    [
        ("a", [0, 0, 0], [0, 0, -30]),
        ("b", [6, 0, 0], [12, 0, -16]),
        ("c", [3, 0, 2], [-6, 0, 8]),
    ];

    [Fact]
    public void Check_report_elevation_arrows_stand_at_the_loads_to_the_drawings_scales()
    {
        using var t = new TempFolder();
        File.WriteAllText(Path.Combine(t.Path, "original.loads.json"), Original);
        File.WriteAllText(Path.Combine(t.Path, "substitute.loads.json"), Substitute);
        string path = Path.Combine(t.Path, "r.html");
        CliRun run = CliProcess.Run(t.Path, null, null, ["check", "original.loads.json", "substitute.loads.json", "--report", path]);
        Assert.True(run.ExitCode == 0, run.ToString());
        XDocument doc = HtmlOutline.Parse(File.ReadAllText(path));
        XElement svg = doc.Descendants().Single(e => e.Name.LocalName == "div" && (string?)e.Attribute("data-system") == "orig")
            .Descendants().Single(e => e.Name.LocalName == "svg" && (string?)e.Attribute("data-view") == "ElevationXZ");
        var d = new SvgDrawing(svg);

        // check takes moments about the original's load centroid Σ|F_i| r_i / Σ|F_i| (SPEC conventions): the
        // magnitudes are 30, 20 (3-4-5) and 10 (3-4-5) kN, so P = (150/60, 0, 20/60) m, in decimal arithmetic.
        decimal[] magnitudes = [30, 20, 10];
        decimal gross = magnitudes.Sum();
        decimal[] p = new[] { 0, 1, 2 }.Select(i => Forces.Select((f, j) => magnitudes[j] * f.At[i]).Sum() / gross).ToArray();

        double k = d.PixelsPerLength("m"), perKn = d.PixelsPerUnit("kN");
        (double px, double py) = d.ReferenceMark();
        double longest = 0;
        foreach ((string id, decimal[] at, decimal[] f) in Forces)
        {
            DrawnArrow a = d.Arrows.Single(r => r.Item == id);
            // Elevation x–z seen from −y: x to the right, z up, SVG y down; the tip at the point of application.
            Assert.Equal(px + (k * (double)(at[0] - p[0])), a.TipX, Pixel);
            Assert.Equal(py - (k * (double)(at[2] - p[2])), a.TipY, Pixel);
            Assert.Equal(a.TipX - ((double)f[0] * perKn), a.X1, Pixel);
            Assert.Equal(a.TipY + ((double)f[2] * perKn), a.Y1, Pixel);
            longest = Math.Max(longest, a.Length);
        }
        // Lengths in the ratio |F_i| / |F_max| = 1 : 2/3 : 1/3.
        Assert.Equal(2.0 / 3.0, d.Arrows.Single(r => r.Item == "b").Length / longest, 0.02);
        Assert.Equal(1.0 / 3.0, d.Arrows.Single(r => r.Item == "c").Length / longest, 0.02);
        Assert.Equal(["30 kN", "20 kN", "10 kN"], Forces.Select(f => d.ForItem(f.Id).Single(e => e.Name.LocalName == "text").Value));
    }
}
