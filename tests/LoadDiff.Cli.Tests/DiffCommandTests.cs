using System.Text.Json;
using LoadDiff.Cli.Tests.Support;
using static LoadDiff.Cli.Tests.Support.HandStatics;

namespace LoadDiff.Cli.Tests;

public class DiffCommandTests
{
    private static readonly string Detailed = CliProcess.Fixture("footbridge", "detailed.loads.json");
    private static readonly string RevisionB = CliProcess.Fixture("footbridge", "detailed-rev-b.loads.json");

    private const string V1 = """
        { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
          { "id": "p1", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10] },
          { "id": "p2", "kind": "force", "at": [4, 0, 0], "value": [0, 0, -20] } ] } } }
        """;

    [Fact]
    public void Reordered_reformatted_and_commented_file_exits_0()
    {
        using var t = new TempFolder();
        string a = t.Write("a.loads.json", V1);
        string b = t.Write("b.loads.json", """
            // same loads, written differently
            { "cases": { "dead": { "loads": [
              { "value": [0, 0, -2e1], "at": [4.0, 0, 0], "kind": "force", "id": "p2" },
              { "id": "p1", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -10.000] }, ] } },
              "units": { "length": "m", "force": "kN" } }
            """);
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("No differences", run.Stdout);
    }

    [Fact]
    public void Changed_removed_and_added_items_exit_1_and_are_named()
    {
        using var t = new TempFolder();
        string a = t.Write("a.loads.json", V1);
        string b = t.Write("b.loads.json", """
            { "units": { "force": "kN", "length": "m" }, "cases": { "dead": { "loads": [
              { "id": "p1", "kind": "force", "at": [1, 0, 0], "value": [0, 0, -12] },
              { "id": "p3", "kind": "force", "at": [2, 0, 0], "value": [0, 0, -5] } ] } } }
            """);
        CliRun run = CliProcess.Run("diff", a, b, "--format", "json", "--at", "0,0,0");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.Equal(1, doc.RootElement.GetProperty("schema_version").GetInt32());
        var items = doc.RootElement.GetProperty("items").EnumerateArray().ToDictionary(i => i.GetProperty("id").GetString()!, i => i.GetProperty("change").GetString());
        Assert.Equal(new Dictionary<string, string?> { ["p1"] = "changed", ["p2"] = "removed", ["p3"] = "added" }, items);
        JsonElement dead = doc.RootElement.GetProperty("resultants")[0];
        // hand: ΔR = −2 + 20 − 5 = +13 kN in z
        Assert.Equal(13, dead.GetProperty("delta_force")[2].GetDouble());
        // ΔM about the origin, M = r × F per change (all at y = z = 0, so only M_y = −x·F_z): p1 −(1·−2) = +2,
        // p2 removed −(4·+20) = −80, p3 added −(2·−5) = +10: ΔM_y = −68 kN·m.
        Close(new Dec3(0, -68, 0), dead.GetProperty("delta_moment"), 1e-12m * 80, "ΔM about the origin");
        Close(new Dec3(0, 0, 13), dead.GetProperty("delta_force"), 1e-12m * 20, "ΔR");
    }

    [Fact]
    public void Demo_revision_names_the_heavier_vehicle_and_the_lighting_column()
    {
        CliRun run = CliProcess.Run("diff", Detailed, RevisionB);
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Contains("~ changed  water-tank (mass)", run.Stdout);
        Assert.Contains("value: 800 → 1000 kg", run.Stdout);
        // 200 kg × 9.80665 m/s² (CGPM standard gravity) = 1.96133 kN
        Assert.Contains("ΔR_i = (0, 0, -1.96133) kN", run.Stdout);
        Assert.Contains("+ added    lighting-column (force)", run.Stdout);
        Assert.Contains("@@", run.Stdout);
        Assert.DoesNotContain("\u001b[", run.Stdout); // not a terminal: no colour
    }

    [Fact]
    public void Demo_revision_changes_of_the_resultants_match_hand_statics()
    {
        CliRun run = CliProcess.Run("diff", Detailed, RevisionB, "--format", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        // Moments about the old file's load centroid (SPEC §4's convention, the point stated in the output).
        Dec3 p = FootbridgeByHand.LoadCentroid(FootbridgeByHand.Detailed);
        Close(p, doc.RootElement.GetProperty("reference_point"), 1e-12m * 24, "reference point");
        var oldEntries = FootbridgeByHand.Entries(FootbridgeByHand.Detailed).ToList();
        var newEntries = FootbridgeByHand.Entries(FootbridgeByHand.RevisionB).ToList();
        JsonElement[] resultants = [.. doc.RootElement.GetProperty("resultants").EnumerateArray()];
        Assert.Equal(oldEntries.Select(e => e.Name), resultants.Select(r => r.GetProperty("name").GetString()));
        foreach (((string name, string kind, HandCase a), (_, _, HandCase b), JsonElement r) in oldEntries.Zip(newEntries, resultants))
        {
            // Revision B by hand: dead + 1.8 kN at (12, 1.5, 0); vehicle rear wheels −2 kN each at (10.5, ±0.8, 0) and the
            // tank +200 kg = 1.96133 kN at (12, 0, 1.2); surfacing and wind unchanged; combinations their factored sums.
            Assert.Equal(kind, r.GetProperty("kind").GetString());
            decimal tolF = 1e-12m * b.GrossForce, tolM = tolF * 24;
            Close(a.Resultant, r.GetProperty("old").GetProperty("force"), tolF, name + " old R");
            Close(a.MomentAbout(p), r.GetProperty("old").GetProperty("moment"), tolM, name + " old M");
            Close(b.Resultant, r.GetProperty("new").GetProperty("force"), tolF, name + " new R");
            Close(b.MomentAbout(p), r.GetProperty("new").GetProperty("moment"), tolM, name + " new M");
            Dec3 dR = b.Resultant - a.Resultant, dM = b.MomentAbout(p) - a.MomentAbout(p);
            Close(dR, r.GetProperty("delta_force"), tolF, name + " ΔR");
            Close(dM, r.GetProperty("delta_moment"), tolM, name + " ΔM");
            Assert.Equal(dR == Dec3.Zero && dM == Dec3.Zero, r.GetProperty("unchanged").GetBoolean());
        }
        // uls-vehicle in closed form: ΔR_z = −(1.35·1.8 + 1.5·(2·2 + 1.96133)) = −11.371995 kN (EN 1990 (6.10) factors of the file).
        Close(-11.371995m, resultants.Single(r => r.GetProperty("name").GetString() == "uls-vehicle").GetProperty("delta_force")[2], 1e-9m, "uls-vehicle ΔR_z");

        // Each changed item's own contribution ΔR_i = ΔF_i, ΔM_i = (r_i − P) × ΔF_i.
        var items = doc.RootElement.GetProperty("items").EnumerateArray().ToDictionary(i => i.GetProperty("id").GetString()!);
        foreach ((string id, Dec3 at, Dec3 dF) in new[]
        {
            ("lighting-column", new Dec3(12, 1.5m, 0), new Dec3(0, 0, -1.8m)),
            ("rear-left", new Dec3(10.5m, -0.8m, 0), new Dec3(0, 0, -2)),
            ("rear-right", new Dec3(10.5m, 0.8m, 0), new Dec3(0, 0, -2)),
            ("water-tank", new Dec3(12, 0, 1.2m), new Dec3(0, 0, -200 * 9.80665m / 1000)), // (1000 − 800) kg × g_n
        })
        {
            Close(dF, items[id].GetProperty("delta_force"), 1e-12m * 2, id + " ΔR_i");
            Close(Dec3.Cross(at - p, dF), items[id].GetProperty("delta_moment"), 1e-12m * 2 * 24, id + " ΔM_i");
        }
        Assert.Equal(4, items.Count);
    }

    [Fact]
    public void Markdown_and_html_outputs_are_fit_for_a_review()
    {
        CliRun md = CliProcess.Run("diff", Detailed, RevisionB, "--format", "markdown");
        Assert.Equal(1, md.ExitCode);
        Assert.Contains("| case | item | change |", md.Stdout);
        Assert.Contains("````diff", md.Stdout);
        CliRun html = CliProcess.Run("diff", Detailed, RevisionB, "--format", "html");
        Assert.Equal(1, html.ExitCode);
        Assert.StartsWith("<!DOCTYPE html>", html.Stdout, StringComparison.Ordinal);
        Assert.Contains("<style>", html.Stdout);
        Assert.DoesNotContain("<script", html.Stdout, StringComparison.OrdinalIgnoreCase);
        Assert.DoesNotContain("http://", html.Stdout, StringComparison.Ordinal);
        Assert.DoesNotContain("https://", html.Stdout, StringComparison.Ordinal);
        Assert.DoesNotContain("<link", html.Stdout, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void A_changed_note_is_shown_and_escaped_in_every_format()
    {
        using var t = new TempFolder();
        const string template = """
            { "note": "NOTE", "cases": { "d": { "note": "case NOTE", "loads": [
              { "id": "p", "kind": "force", "at": [0, 0, 0], "value": [0, 0, -1], "note": "NOTE" } ] } } }
            """;
        // a note that would break each format if written raw: a line break, markup, a table bar, a backtick
        string old = t.Write("old.loads.json", template.Replace("NOTE", "from S-101", StringComparison.Ordinal));
        string @new = t.Write("new.loads.json", template.Replace("NOTE", "from S-102\\n<b>x</b> | `y`", StringComparison.Ordinal));

        CliRun text = CliProcess.Run("diff", old, @new);
        Assert.True(text.ExitCode == 1, text.ToString());
        Assert.Contains("      note: \"from S-101\" → \"from S-102\\n<b>x</b> | `y`\"", text.Stdout, StringComparison.Ordinal);
        Assert.Contains("case d note: \"case from S-101\" → \"case from S-102\\n", text.Stdout, StringComparison.Ordinal);
        Assert.Contains("ΔR_i = (0, 0, 0)", text.Stdout, StringComparison.Ordinal);
        Assert.DoesNotContain("from S-102\n", text.Stdout, StringComparison.Ordinal); // the line break stays escaped

        CliRun html = CliProcess.Run("diff", old, @new, "--format", "html");
        Assert.Equal(1, html.ExitCode);
        Assert.Contains("&lt;b&gt;x&lt;/b&gt;", html.Stdout, StringComparison.Ordinal);
        Assert.DoesNotContain("<b>x</b>", html.Stdout, StringComparison.Ordinal);

        CliRun md = CliProcess.Run("diff", old, @new, "--format", "markdown");
        Assert.Equal(1, md.ExitCode);
        string row = md.Stdout.Split('\n').First(l => l.Contains("case d note", StringComparison.Ordinal));
        // The bar cannot end the table cell (\|), and the value's backticks cannot end its code span: CommonMark §6.1 ends
        // a code span only at a backtick run as long as the opening one, so a value holding single backticks is fenced by two.
        Assert.Contains("| ``\"case from S-102\\n<b>x</b> \\| `y`\"`` |", row, StringComparison.Ordinal);

        CliRun json = CliProcess.Run("diff", old, @new, "--format", "json");
        using var doc = System.Text.Json.JsonDocument.Parse(json.Stdout);
        var field = doc.RootElement.GetProperty("items")[0].GetProperty("fields")[0];
        Assert.Equal("note", field.GetProperty("field").GetString());
        Assert.Equal("\"from S-102\\n<b>x</b> | `y`\"", field.GetProperty("new").GetString());
    }

    [Fact]
    public void Bad_input_exits_2_with_the_same_diagnostic_as_reduce()
    {
        using var t = new TempFolder();
        string bad = t.Write("bad.loads.json", """{ "cases": { "d": { "loads": [ { "kind": "force", "at": [0, 0, 0], "value": [0, "x", 0] } ] } } }""");
        CliRun reduce = CliProcess.Run("reduce", bad);
        CliRun diff = CliProcess.Run("diff", Detailed, bad);
        CliRun fmt = CliProcess.Run("fmt", bad);
        Assert.Equal(2, diff.ExitCode);
        Assert.Equal(2, fmt.ExitCode);
        Assert.Equal(reduce.StderrLines, diff.StderrLines);
        Assert.Equal(reduce.StderrLines, fmt.StderrLines);
        Assert.Contains("LD010", diff.Stderr);
    }
}
