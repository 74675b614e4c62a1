using System.Text.RegularExpressions;
using System.Xml;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Free text from the inputs (titles, file names) is data, never markup: fed hostile strings, every output format is parsed
/// (System.Xml for JUnit and SVG) or checked strictly (Markdown, text). XML 1.0 §2.2 names the characters XML may hold.
/// </summary>
public sealed class HostileTextTests
{
    // Markup, Markdown syntax, forged lines and terminal escapes; names stay plain because names with control characters are refused.
    private const string HostileTitle =
        "T <img src=x onerror=alert(1)> <iframe src=x></iframe> <meta http-equiv=refresh> <script>x</script> ![](http://x.example/a.png) [a](javascript:x)"
        + "\\r\\n# Heading\\nResult: EQUIVALENT\\u001b[31m\\u0000\\u007f\\u0085\\u2028\\u202e\\u0001";

    private static string Write(TempFolder t, string name, double fz, string title) =>
        t.Write(name, "{ \"title\": \"" + title + "\", \"cases\": { \"dead\": { \"title\": \"" + title
            + "\", \"loads\": [ { \"id\": \"p\", \"kind\": \"force\", \"at\": [0, 0, 0], \"value\": [0, 0, " + fz.ToString(System.Globalization.CultureInfo.InvariantCulture) + "] } ] } } }");

    private static void NoControlCharacters(string output)
    {
        foreach (char c in output)
        {
            Assert.False(c != '\n' && (char.IsControl(c) || c is '\u2028' or '\u2029' or '\u202e'), $"U+{(int)c:X4} in the output");
        }
    }

    [Fact]
    public void Reduce_text_shows_control_characters_as_escapes_and_no_forged_result_line()
    {
        using var t = new TempFolder();
        string f = Write(t, "f.loads.json", -1, HostileTitle);
        CliRun run = CliProcess.RunIn(t.Path, "reduce", f);
        Assert.Equal(0, run.ExitCode);
        NoControlCharacters(run.Stdout);
        Assert.DoesNotContain(run.Stdout.Split('\n'), l => l.StartsWith("Result:", StringComparison.Ordinal) || l.StartsWith('#'));
        Assert.Contains("\\nResult: EQUIVALENT\\u001B[31m", run.Stdout, StringComparison.Ordinal);
    }

    [Fact]
    public void Markdown_of_reduce_and_check_forms_no_html_heading_image_or_link_from_data()
    {
        using var t = new TempFolder();
        string a = Write(t, "a.loads.json", -1, HostileTitle);
        string b = Write(t, "b <img src=x>.loads.json", -2, HostileTitle);
        foreach (CliRun run in new[] { CliProcess.RunIn(t.Path, "reduce", a, "--format", "markdown"), CliProcess.RunIn(t.Path, "check", a, b, "--format", "markdown") })
        {
            Assert.True(run.ExitCode is 0 or 1, run.ToString());
            NoControlCharacters(run.Stdout);
            Assert.DoesNotContain("<img", run.Stdout, StringComparison.Ordinal);
            Assert.DoesNotContain("<iframe", run.Stdout, StringComparison.Ordinal);
            Assert.DoesNotContain("<meta", run.Stdout, StringComparison.Ordinal);
            Assert.DoesNotContain("<script", run.Stdout, StringComparison.Ordinal);
            // An unescaped "![" or "](" would start an image or a link; escaped ones are preceded by a backslash.
            Assert.False(Regex.IsMatch(run.Stdout, @"(?<!\\)!(?<!\\)\[|(?<!\\)\]\("), run.Stdout);
            Assert.DoesNotContain(run.Stdout.Split('\n'), l => l.StartsWith("# Heading", StringComparison.Ordinal) || l.StartsWith("Result:", StringComparison.Ordinal));
        }
    }

    [Fact]
    public void Check_junit_of_a_file_name_with_a_control_character_parses_and_shows_it_escaped()
    {
        using var t = new TempFolder();
        string a = Write(t, "a\u0001<x>.loads.json", -1, "plain");
        string b = Write(t, "b.loads.json", -2, "plain");
        CliRun run = CliProcess.RunIn(t.Path, "check", a, b, "--format", "junit");
        Assert.Equal(1, run.ExitCode);
        Assert.Empty(run.Stderr);
        var doc = new XmlDocument();
        doc.LoadXml(run.Stdout);
        string suite = doc.SelectSingleNode("/testsuites/testsuite")!.Attributes!["name"]!.Value;
        Assert.Contains("a\\u0001<x>.loads.json", suite, StringComparison.Ordinal);
    }

    [Fact]
    public void Sections_svg_of_a_file_name_with_a_control_character_parses_and_shows_it_escaped()
    {
        using var t = new TempFolder();
        string a = Write(t, "a\u001b\u0002&.loads.json", -1, "plain");
        string b = Write(t, "b.loads.json", -2, "plain");
        CliRun run = CliProcess.RunIn(t.Path, "sections", a, b, "--axis", "x", "--format", "svg");
        Assert.True(run.ExitCode is 0 or 1, run.ToString());
        using var reader = XmlReader.Create(new StringReader(run.Stdout), new XmlReaderSettings { DtdProcessing = DtdProcessing.Ignore });
        var doc = new XmlDocument();
        doc.Load(reader);
        Assert.Contains("a\\u001B\\u0002&.loads.json", doc.DocumentElement!.InnerText, StringComparison.Ordinal);
    }
}
