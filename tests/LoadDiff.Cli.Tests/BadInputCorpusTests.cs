using System.Reflection;
using System.Security.Cryptography;
using System.Text.RegularExpressions;
using LoadDiff.Cli.Tests.Support;
using LoadDiff.Formats.Diagnostics;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Runs every file of <c>fixtures/bad</c> through the real executable. The expected code comes from the file
/// name and the expected position from the corpus README, where each position was read off the file by hand.
/// </summary>
public partial class BadInputCorpusTests
{
    private static readonly string BadFolder = CliProcess.Fixture("bad");

    // Codes without a corpus file: they need a missing file or inputs far over a size limit (see the README), or are
    // distribute's refusals of a load file and a points file together (tested in DistributeCommandTests).
    private static readonly string[] CodesWithoutCorpusFile =
        [Codes.FileUnreadable, Codes.FileTooLarge, Codes.TooManyItems, Codes.LineTooLong, Codes.NoSupportPoints,
         Codes.IllConditionedPoints, Codes.DistributionFailsCheck];

    /// <summary>The naming rule of the corpus: <c>LD*.loads.json</c> and <c>LD*-direct-*.csv</c> are run; other CSVs are helpers.</summary>
    public static bool IsRunnable(string name) =>
        CodePrefix().IsMatch(name)
        && (name.EndsWith(".loads.json", StringComparison.Ordinal)
            || (name.EndsWith(".csv", StringComparison.Ordinal) && name.Contains("-direct-", StringComparison.Ordinal)));

    public static TheoryData<string> RunnableFiles() => new(RunnableNames());

    private static List<string> RunnableNames() =>
        Directory.GetFiles(BadFolder).Select(f => Path.GetFileName(f)).Where(IsRunnable).Order(StringComparer.Ordinal).ToList();

    [Theory]
    [MemberData(nameof(RunnableFiles))]
    public void A_bad_file_exits_2_with_one_located_message_and_is_left_unchanged(string name)
    {
        string code = name[..5];
        Expectation expected = Manifest()[name];
        Assert.Equal(code, expected.Code);
        Dictionary<string, string> before = HashCorpus();

        string relative = Path.Combine("fixtures", "bad", name);
        CliRun run = CliProcess.Run("reduce", relative);

        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Equal("", run.Stdout);
        Assert.DoesNotContain("   at ", run.Stderr);
        string line = Assert.Single(run.StderrLines);
        Assert.StartsWith(expected.Prefix(Path.Combine("fixtures", "bad"), relative, "error"), line);
        Assert.Equal(before, HashCorpus());
    }

    public static TheoryData<string, string> RunnableFilesByCommand()
    {
        var data = new TheoryData<string, string>();
        foreach (string name in RunnableNames())
        {
            // diff and fmt read load descriptions only; a CSV given directly is refused before it is read
            string[] commands = name.EndsWith(".csv", StringComparison.Ordinal)
                ? ["check-original", "check-substitute"]
                : ["check-original", "check-substitute", "diff-old", "diff-new", "fmt"];
            foreach (string c in commands)
            {
                data.Add(name, c);
            }
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(RunnableFilesByCommand))]
    public void A_bad_file_fails_the_same_way_in_every_command_and_position(string name, string command)
    {
        Expectation expected = Manifest()[name];
        Dictionary<string, string> before = HashCorpus();
        string bad = Path.Combine("fixtures", "bad", name);
        string good = Path.Combine("fixtures", "footbridge", "detailed.loads.json");
        string[] args = command switch
        {
            "check-original" => ["check", bad, good],
            "check-substitute" => ["check", good, bad],
            "diff-old" => ["diff", bad, good],
            "diff-new" => ["diff", good, bad],
            _ => ["fmt", bad],
        };
        CliRun run = CliProcess.Run(args);

        Assert.True(run.ExitCode == 2, run.ToString());
        Assert.Equal("", run.Stdout);
        Assert.DoesNotContain("   at ", run.Stderr);
        string line = Assert.Single(run.StderrLines);
        Assert.StartsWith(expected.Prefix(Path.Combine("fixtures", "bad"), bad, "error"), line);
        Assert.Equal(before, HashCorpus());
    }

    [Fact]
    public void A_file_with_an_unknown_field_exits_0_with_one_warning_line()
    {
        const string name = "warning-LD012-unknown-field.loads.json";
        Expectation expected = Manifest()[name];
        Dictionary<string, string> before = HashCorpus();
        string relative = Path.Combine("fixtures", "bad", name);

        CliRun run = CliProcess.Run("reduce", relative);

        Assert.True(run.ExitCode == 0, run.ToString());
        string line = Assert.Single(run.StderrLines);
        Assert.StartsWith(expected.Prefix(Path.Combine("fixtures", "bad"), relative, "warning"), line);
        Assert.Contains("'valeu'", line);
        // The item is still read. Hand check (statics): F = (0, 0, -10) N at r = (2, 0, 0) m gives
        // M_O = r × F = (0·(-10) − 0·0, 0·0 − 2·(-10), 0) = (0, 20, 0) N·m.
        Assert.Contains("(0, 0, -10) N", run.Stdout);
        Assert.Contains("(0, 20, 0) N·m", run.Stdout);
        Assert.Equal(before, HashCorpus());
    }

    [Fact]
    public void A_missing_file_exits_2_with_one_message_naming_it()
    {
        string relative = Path.Combine("fixtures", "bad", "no-such-file.loads.json");
        CliRun run = CliProcess.Run("reduce", relative);

        Assert.Equal(2, run.ExitCode);
        Assert.Equal("", run.Stdout);
        string line = Assert.Single(run.StderrLines);
        Assert.StartsWith(relative + ": error " + Codes.FileUnreadable + ": ", line);
    }

    [Fact]
    public void Every_runnable_file_is_listed_in_the_readme_and_every_listed_file_exists()
    {
        var runnable = RunnableNames().ToHashSet(StringComparer.Ordinal);
        var listed = Manifest().Keys.Where(IsRunnable).ToHashSet(StringComparer.Ordinal);
        Assert.Empty(runnable.Except(listed));
        Assert.Empty(listed.Except(runnable));
        Assert.All(Manifest().Keys, k => Assert.True(File.Exists(Path.Combine(BadFolder, k)), k + " is listed but missing"));
    }

    [Fact]
    public void Every_diagnostic_code_has_a_corpus_file_or_a_stated_reason()
    {
        string[] codes = typeof(Codes).GetFields(BindingFlags.Public | BindingFlags.Static)
            .Where(f => f.IsLiteral && f.FieldType == typeof(string))
            .Select(f => (string)f.GetRawConstantValue()!)
            .ToArray();
        Assert.NotEmpty(codes);
        var covered = Manifest().Values.Select(e => e.Code).ToHashSet(StringComparer.Ordinal);
        foreach (string code in codes)
        {
            Assert.True(covered.Contains(code) || CodesWithoutCorpusFile.Contains(code), $"{code} has no file in fixtures/bad");
        }
    }

    [Fact]
    public void Every_helper_csv_shares_the_stem_of_a_runnable_file()
    {
        var stems = RunnableNames().Select(n => n.Replace(".loads.json", "", StringComparison.Ordinal)).ToList();
        foreach (string name in Directory.GetFiles(BadFolder, "*.csv").Select(f => Path.GetFileName(f)))
        {
            if (!IsRunnable(name))
            {
                Assert.True(stems.Any(s => name.StartsWith(s + ".", StringComparison.Ordinal)), name + " is referenced by no corpus file of its stem");
            }
        }
    }

    private static Dictionary<string, string> HashCorpus() =>
        Directory.GetFiles(BadFolder).ToDictionary(
            f => Path.GetFileName(f),
            f => Convert.ToHexString(SHA256.HashData(File.ReadAllBytes(f))),
            StringComparer.Ordinal);

    /// <summary>The README table: file → code and position.</summary>
    private static Dictionary<string, Expectation> Manifest()
    {
        var result = new Dictionary<string, Expectation>(StringComparer.Ordinal);
        foreach (string raw in File.ReadLines(Path.Combine(BadFolder, "README.md")))
        {
            string[] cells = raw.Split('|', StringSplitOptions.TrimEntries);
            if (cells.Length < 5 || !cells[1].StartsWith('`'))
            {
                continue;
            }
            string file = cells[1].Trim('`');
            result.Add(file, new Expectation(cells[2], cells[3].Trim('`')));
        }
        return result;
    }

    [GeneratedRegex(@"^LD\d{3}-")]
    private static partial Regex CodePrefix();

    /// <summary>An expected code and position: <c>line:column</c>, <c>FILE:line:column</c>, or <c>FILE</c> (whole file).</summary>
    private sealed record Expectation(string Code, string Where)
    {
        public string Prefix(string folder, string runFile, string severity)
        {
            Match m = Regex.Match(Where, @"^(?:(?<file>[^:]+?):)?(?<line>\d+):(?<col>\d+)$");
            string location = m.Success
                ? (m.Groups["file"].Success ? Path.Combine(folder, m.Groups["file"].Value) : runFile)
                  + ":" + m.Groups["line"].Value + ":" + m.Groups["col"].Value
                : Path.Combine(folder, Where);
            return $"{location}: {severity} {Code}: ";
        }
    }
}
