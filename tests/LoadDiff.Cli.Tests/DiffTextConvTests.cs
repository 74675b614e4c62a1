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
        Assert.Contains("// referenced file \"exports/canopy-wind.csv\" is not read by textconv", a.Stdout);
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
    public void A_table_beside_the_file_is_never_read_so_the_working_tree_file_and_a_copy_print_the_same()
    {
        // git runs textconv on the working-tree file itself (tables beside it) and on temporary copies of blobs (no
        // tables, or unrelated files of the same name in the temporary folder): both must print the same for the same document
        using var t = new TempFolder();
        string inTree = t.Write("tree/canopy.loads.json", Document);
        t.Write("tree/exports/canopy-wind.csv", "id,x,y,z,fx,fy,fz\nn1,2,3,0,0,4,0\n");
        string copy = t.Write("tmp/zz9yy8_canopy.loads.json", Document);
        t.Write("tmp/exports/canopy-wind.csv", "id,x,y,z,fx,fy,fz\nn9,0,0,0,0,0,-1\n");
        string bare = t.Write("bare/q1_canopy.loads.json", Document);
        CliRun a = CliProcess.RunIn(t.Path, "diff", "--textconv", inTree);
        CliRun b = CliProcess.RunIn(Path.GetDirectoryName(copy)!, "diff", "--textconv", Path.GetFileName(copy));
        CliRun c = CliProcess.RunIn(t.Path, "diff", "--textconv", bare);
        Assert.True(a.ExitCode == 0, a.ToString());
        Assert.Equal(a.Stdout, b.Stdout);
        Assert.Equal(a.Stdout, c.Stdout);
        Assert.Contains("// case wind: not shown: needs \"exports/canopy-wind.csv\"", Lines(a.Stdout));
        Assert.DoesNotContain(t.Path, a.Stdout);
    }

    // the wind case as one force in the document itself (textconv reads no referenced table)
    private static string Version(TempFolder t, string name, string fz) =>
        t.Write(name + "/canopy.loads.json", Document.Replace(
            "{ \"id\": \"nodes\", \"kind\": \"forces\", \"file\": \"exports/canopy-wind.csv\" }",
            "{ \"id\": \"n1\", \"kind\": \"force\", \"at\": [2, 3, 0], \"value\": [0, 0, " + fz + "] }", StringComparison.Ordinal));

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
        // the listing shows the new number; the resultant lines stay the same
        static string[] Resultants(string text) => [.. Lines(text).Where(l => l.StartsWith("// case", StringComparison.Ordinal) || l.StartsWith("// combination", StringComparison.Ordinal))];
        Assert.Equal(4, Resultants(b0.Stdout).Length);
        Assert.Equal(Resultants(b0.Stdout), Resultants(b1.Stdout));

        // by hand (decimal): F = (0, 0, Fz) at r = (2, 3, 0) m, M = r × F = (y·Fz, −x·Fz, 0)
        static string Line(decimal fz) => $"// case wind: R = [0, 0, {Invariant(fz)}] M = [{Invariant(3m * fz)}, {Invariant(-2m * fz)}, 0]";
        Assert.Contains(Line(-1000m), Lines(b0.Stdout));
        Assert.Contains(Line(-1000.00001m), Lines(b2.Stdout));
        Assert.NotEqual(b0.Stdout, b2.Stdout);
        // besides the listing's own line, only the resultant lines of the wind case and of the combination that holds it change
        string[] changed = [.. Resultants(b2.Stdout).Except(Resultants(b0.Stdout))];
        Assert.Equal(2, changed.Length);
        Assert.All(changed, l => Assert.Matches("^// (case wind|combination c-all): ", l));
    }
}
