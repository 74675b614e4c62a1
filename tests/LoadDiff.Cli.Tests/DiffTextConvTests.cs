using System.Globalization;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// <c>diff --textconv</c> as git runs it: a temporary copy of the document under a random name, in a folder of its own,
/// from whatever working directory. The output must depend on the content alone. Invented demo loads.
/// </summary>
public class DiffTextConvTests
{
    // Two forces of 0.1 and 0.2 kN at (1, 2, 0) m: in doubles 0.1 + 0.2 is 0.30000000000000004, so an unrounded
    // resultant line would print that. The wind case references a forces CSV.
    private const string Document = """
        { "units": { "force": "kN", "length": "m" },
          // invented: a canopy with a wind export beside it
          "cases": {
            "dead": { "loads": [ { "id": "p1", "kind": "force", "at": [1, 2, 0], "value": [0, 0, 0.1] },
                                 { "id": "p2", "kind": "force", "at": [1, 2, 0], "value": [0, 0, 0.2] } ] },
            "wind": { "loads": [ { "id": "nodes", "kind": "forces", "file": "exports/canopy-wind.csv" } ] } },
          "combinations": { "c-dead": { "dead": 1 }, "c-all": { "dead": 1, "wind": 1 } } }
        """;

    private static string Invariant(decimal d) => d.ToString(CultureInfo.InvariantCulture);

    private static string[] Lines(string text) => text.Split('\n');

    [Fact]
    public void Same_content_under_two_temporary_names_from_two_folders_gives_byte_identical_output_naming_the_absent_csv()
    {
        using var t = new TempFolder();
        // git's temporary copies: random names, folders without the referenced CSV
        string copyA = t.Write("tmp-one/Xq3z9a_canopy.loads.json", Document);
        string copyB = t.Write("tmp-two/Lm07pw_canopy.loads.json", Document);
        string cwdA = Directory.CreateDirectory(Path.Combine(t.Path, "work-a")).FullName;
        CliRun a = CliProcess.RunIn(cwdA, "diff", "--textconv", copyA);
        // the second run from the copy's own folder, with a relative operand
        CliRun b = CliProcess.RunIn(Path.GetDirectoryName(copyB)!, "diff", "--textconv", Path.GetFileName(copyB));
        Assert.True(a.ExitCode == 0, a.ToString());
        Assert.True(b.ExitCode == 0, b.ToString());
        Assert.Equal(a.Stdout, b.Stdout);

        // the absent CSV is named by the path the document writes, in a fixed note; no temporary path or name anywhere
        Assert.Contains("// referenced file \"exports/canopy-wind.csv\" is not beside this copy of the document", a.Stdout);
        Assert.Contains("// case wind: not shown: needs \"exports/canopy-wind.csv\"", a.Stdout);
        Assert.Contains("// combination c-all: not shown: needs \"exports/canopy-wind.csv\"", a.Stdout);
        foreach (string leak in new[] { t.Path, Path.GetTempPath(), "Xq3z9a", "Lm07pw", "tmp-one", "tmp-two", "work-a" })
        {
            Assert.DoesNotContain(leak, a.Stdout);
        }
        // the listing is the canonical one (the comment is gone)
        Assert.DoesNotContain("invented: a canopy", a.Stdout);

        // by hand (decimal): R = 0.1 + 0.2 = 0.3 kN along z; M = r × F = (y·Fz, −x·Fz, 0) with r = (1, 2, 0)
        decimal fz = 0.1m + 0.2m;
        string dead = $"R = [0, 0, {Invariant(fz)}] M = [{Invariant(2m * fz)}, {Invariant(-1m * fz)}, 0]";
        Assert.Contains("// case dead: " + dead, Lines(a.Stdout));
        Assert.Contains("// combination c-dead: " + dead, Lines(a.Stdout));
        Assert.Contains("12 significant digits", a.Stdout);
    }

    [Fact]
    public void With_the_csv_beside_both_copies_the_output_is_identical_and_the_case_resultant_is_shown()
    {
        using var t = new TempFolder();
        const string rows = "id,x,y,z,fx,fy,fz\nn1,2,3,0,0,4,0\n";
        string copyA = t.Write("one/a1b2c3_canopy.loads.json", Document);
        t.Write("one/exports/canopy-wind.csv", rows);
        string copyB = t.Write("two/zz9yy8_canopy.loads.json", Document);
        t.Write("two/exports/canopy-wind.csv", rows);
        CliRun a = CliProcess.RunIn(t.Path, "diff", "--textconv", copyA);
        CliRun b = CliProcess.RunIn(Path.GetDirectoryName(copyB)!, "diff", "--textconv", Path.GetFileName(copyB));
        Assert.True(a.ExitCode == 0, a.ToString());
        Assert.Equal(a.Stdout, b.Stdout);
        Assert.DoesNotContain("not beside this copy", a.Stdout);
        // by hand: F = (0, 4, 0) kN at (2, 3, 0) m; M = r × F = (0, 0, x·Fy) = (0, 0, 8) kN·m
        Assert.Contains("// case wind: R = [0, 4, 0] M = [0, 0, 8]", Lines(a.Stdout));
        Assert.DoesNotContain(t.Path, a.Stdout);
    }

    private static string Version(TempFolder t, string name, string fz)
    {
        t.Write(name + "/exports/canopy-wind.csv", "id,x,y,z,fx,fy,fz\nn1,2,3,0,0,0," + fz + "\n");
        return t.Write(name + "/canopy.loads.json", Document);
    }

    [Fact]
    public void A_rounding_sized_change_leaves_the_resultant_lines_alone_and_a_1e_8_relative_change_shows()
    {
        using var t = new TempFolder();
        const string baseline = "-1000", rounding = "-1000.000000000001", real = "-1000.00001";
        // the rounding version is a different double (1e-15 relative, about 9 ulp at 1000), so the test can fail
        Assert.NotEqual(double.Parse(baseline, CultureInfo.InvariantCulture), double.Parse(rounding, CultureInfo.InvariantCulture));
        CliRun b0 = CliProcess.RunIn(t.Path, "diff", "--textconv", Version(t, "v0", baseline));
        CliRun b1 = CliProcess.RunIn(t.Path, "diff", "--textconv", Version(t, "v1", rounding));
        CliRun b2 = CliProcess.RunIn(t.Path, "diff", "--textconv", Version(t, "v2", real));
        Assert.True(b0.ExitCode == 0 && b1.ExitCode == 0 && b2.ExitCode == 0, b0 + "\n" + b1 + "\n" + b2);
        Assert.Equal(b0.Stdout, b1.Stdout);

        // by hand (decimal): F = (0, 0, Fz) at r = (2, 3, 0) m, M = r × F = (y·Fz, −x·Fz, 0)
        static string Line(decimal fz) => $"// case wind: R = [0, 0, {Invariant(fz)}] M = [{Invariant(3m * fz)}, {Invariant(-2m * fz)}, 0]";
        Assert.Contains(Line(-1000m), Lines(b0.Stdout));
        Assert.Contains(Line(-1000.00001m), Lines(b2.Stdout));
        Assert.NotEqual(b0.Stdout, b2.Stdout);
        // only the resultant lines of the wind case and of the combination that holds it change
        string[] changed = [.. Lines(b2.Stdout).Except(Lines(b0.Stdout))];
        Assert.Equal(2, changed.Length);
        Assert.All(changed, l => Assert.Matches("^// (case wind|combination c-all): ", l));
    }
}
