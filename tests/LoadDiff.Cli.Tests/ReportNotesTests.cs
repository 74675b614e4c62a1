using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// The notes an engineer writes on the document, a case and an item (the basis of each load) are listed in the check's
/// Markdown and HTML reports, with every character of the free text escaped. Invented plant loads.
/// </summary>
public class ReportNotesTests
{
    private const string Original = """
        { "format": "loaddiff/1", "note": "Vendor sheet rev C, p. 4\nchecked <script>x</script>", "units": { "force": "kN", "length": "m" },
          "cases": { "dead": { "note": "self weight | skid", "loads": [
            { "id": "pump", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -5], "note": "pump *data* \u0007 sheet" },
            { "id": "motor", "kind": "force", "at": [3, 0, 0], "value": [0, 0, -5] } ] } } }
        """;

    private const string Substitute = """
        { "format": "loaddiff/1", "units": { "force": "kN", "length": "m" },
          "cases": { "dead": { "loads": [ { "id": "r", "kind": "force", "at": [2, 0, 0], "value": [0, 0, -10], "note": "resultant at the centre" } ] } } }
        """;

    [Fact]
    public void Markdown_report_lists_every_note_escaped()
    {
        using var dir = new TempFolder();
        string a = dir.Write("plant.loads.json", Original), b = dir.Write("plant-simple.loads.json", Substitute);
        string report = Path.Combine(dir.Path, "r.md");
        CliRun run = CliProcess.Run("check", a, b, "--report", report);
        Assert.True(run.ExitCode == 0, run.ToString());
        string[] rows = [.. File.ReadAllLines(report).Where(l => l.StartsWith("| ", StringComparison.Ordinal) && l.Contains("loads.json", StringComparison.Ordinal))];
        // four notes in the inputs: the original's document, case and pump item, the substitute's item
        Assert.Equal(4, rows.Length);
        Assert.Contains(rows, r => r.Contains("| document | Vendor sheet rev C, p. 4<br>checked &lt;script>x&lt;/script> |", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("| case dead | self weight \\| skid |", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("| case dead, item pump | pump \\*data\\* \\u0007 sheet |", StringComparison.Ordinal));
        Assert.Contains(rows, r => r.Contains("plant-simple.loads.json | case dead, item r | resultant at the centre |", StringComparison.Ordinal));
        Assert.DoesNotContain("<script>", File.ReadAllText(report), StringComparison.Ordinal);
    }

    [Fact]
    public void Html_report_lists_every_note_escaped()
    {
        using var dir = new TempFolder();
        string a = dir.Write("plant.loads.json", Original), b = dir.Write("plant-simple.loads.json", Substitute);
        string report = Path.Combine(dir.Path, "r.html");
        CliRun run = CliProcess.Run("check", a, b, "--report", report);
        Assert.True(run.ExitCode == 0, run.ToString());
        string html = File.ReadAllText(report);
        int start = html.IndexOf("<table id=\"input-notes\">", StringComparison.Ordinal);
        Assert.True(start >= 0, "no notes table");
        string table = html[start..html.IndexOf("</table>", start, StringComparison.Ordinal)];
        Assert.Equal(4, table.Split("<tr><td>").Length - 1);
        Assert.Contains("checked &lt;script&gt;x&lt;/script&gt;", table, StringComparison.Ordinal);
        Assert.DoesNotContain("<script>", html, StringComparison.Ordinal);
    }
}
