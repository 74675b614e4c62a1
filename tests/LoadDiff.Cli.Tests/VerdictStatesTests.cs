using System.Globalization;
using System.Text.Json;
using System.Xml;
using System.Xml.Linq;
using System.Xml.Schema;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Every state that bears on the verdict of <c>check</c>, in every output format (text, Markdown, JSON, JUnit, HTML
/// report): the state must be stated and the exit code must say the verdict (0 equivalent, 1 not; SPEC §4 exit codes).
/// The load data are small invented systems whose resultants are worked out by hand in the comments.
/// </summary>
public class VerdictStatesTests
{
    private const string OriginalFile = "original.loads.json";
    private const string SubstituteFile = "substitute.loads.json";

    /// <summary>The two files of one state, the extra options and the exit code the verdict implies.</summary>
    private sealed record State(string Original, string Substitute, string[] Options, int ExitCode);

    private static string Force(string id, double x, double y, double fz) =>
        $$"""{ "id": "{{id}}", "kind": "force", "at": [{{R(x)}}, {{R(y)}}, 0], "value": [0, 0, {{R(fz)}}] }""";

    private static string R(double v) => v.ToString("R", CultureInfo.InvariantCulture);

    private static string Doc(string cases, string? combinations = null, string units = """{ "force": "kN", "length": "m" }""") =>
        $$"""{ {{(units.Length > 0 ? $"\"units\": {units}, " : "")}}"cases": { {{cases}} }{{(combinations is null ? "" : $", \"combinations\": {{ {combinations} }}")}} }""";

    private static string Case(string name, params string[] items) => "\"" + name + "\": { \"loads\": [ " + string.Join(", ", items) + " ] }";

    // Two 6.785 kN forces at x = 0 and x = 2: resultant 13.57 kN at the centre of parallel forces x̄ = 1 (any statics text).
    private static readonly string TwoSupports = Case("dead", Force("s1", 0, 0, -6.785), Force("s2", 2, 0, -6.785));

    // G: −10 kN at x = 0 and x = 2 (resultant −20 kN at x = 1); Q: −4 kN at x = 1. uls = 1.35 G + 1.5 Q
    // (EN 1990:2002 (6.10), Table A1.2(B): γG,sup = 1.35, γQ = 1.50; CHECK-VALUES.md).
    private static readonly string GDetailed = Case("G", Force("g1", 0, 0, -10), Force("g2", 2, 0, -10));
    private static readonly string GSingle = Case("G", Force("g", 1, 0, -20));
    private static readonly string QCase = Case("Q", Force("q1", 1, 0, -4));

    private static readonly Dictionary<string, State> States = new()
    {
        // 13.57 kN at x̄ = 1 exactly where the two forces' resultant acts: ΔR = 0, ΔM = 0 (exact).
        ["pass"] = new(Doc(TwoSupports), Doc(Case("dead", Force("r", 1, 0, -13.57))), [], 0),
        // The same 13.57 kN at x = 1.30: ΔM = 0.30 × 13.57 = 4.071 kN·m > 1e-3 × 13.57 × 2 = 0.02714 kN·m (r × F by hand).
        ["fail"] = new(Doc(TwoSupports), Doc(Case("dead", Force("r", 1.30, 0, -13.57))), [], 1),
        // "snow" only in the original, "wind" only in the substitute; "dead" agrees (SPEC §4: such a case fails).
        ["only-in"] = new(
            Doc(TwoSupports + ", " + Case("snow", Force("n", 1, 0, -2))),
            Doc(Case("dead", Force("r", 1, 0, -13.57)) + ", " + Case("wind", Force("w", 1, 0, -3))), [], 1),
        // The original's uls names Q, which the substitute lacks.
        ["incomplete-combination"] = new(
            Doc(GDetailed + ", " + QCase, "\"uls\": { \"G\": 1.35, \"Q\": 1.5 }"),
            Doc(GSingle), [], 1),
        // The substitute defines uls with other factors; the original's are applied to both, so it passes.
        ["conflicting-factors"] = new(
            Doc(GDetailed + ", " + QCase, "\"uls\": { \"G\": 1.35, \"Q\": 1.5 }"),
            Doc(GSingle + ", " + QCase, "\"uls\": { \"G\": 1.35, \"Q\": 1.35 }"), [], 0),
        // Statically equivalent (−20 kN at x = 1 both), but the cut moments differ: see Gate_numbers_are_the_hand_statics.
        ["section-gate-fail"] = new(
            Doc(Case("dead", Force("a", 0, 0, -10), Force("b", 2, 0, -10))),
            Doc(Case("dead", Force("r", 1, 0, -20))), ["--sections", "x", "--section-tol", "0.05"], 1),
        // The original says N and m; the substitute says nothing and is read as N, m (SPEC §4: a hint, never a changed verdict).
        ["unit-hint"] = new(
            Doc(TwoSupports, units: """{ "force": "N", "length": "m" }"""),
            Doc(Case("dead", Force("r", 1, 0, -13.57)), units: ""), [], 0),
    };

    private static readonly string[] Formats = ["text", "markdown", "json", "junit", "html"];

    public static TheoryData<string, string> StatesAndFormats()
    {
        var data = new TheoryData<string, string>();
        foreach (string state in States.Keys)
        {
            foreach (string format in Formats)
            {
                data.Add(state, format);
            }
        }
        return data;
    }

    /// <summary>Runs one state in one format in a fresh folder; for "html" the report file's text.</summary>
    private static (CliRun Run, string Output) Check(string stateName, string format)
    {
        State s = States[stateName];
        using var t = new TempFolder();
        t.Write(OriginalFile, s.Original);
        t.Write(SubstituteFile, s.Substitute);
        string[] args = format == "html"
            ? ["check", OriginalFile, SubstituteFile, .. s.Options, "--report", "r.html"]
            : ["check", OriginalFile, SubstituteFile, .. s.Options, "--format", format];
        CliRun run = CliProcess.RunIn(t.Path, args);
        string output = run.Stdout;
        if (format == "html")
        {
            string report = Path.Combine(t.Path, "r.html");
            Assert.True(File.Exists(report), run.ToString());
            output = File.ReadAllText(report);
        }
        return (run, output);
    }

    [Theory]
    [MemberData(nameof(StatesAndFormats))]
    public void Every_state_is_stated_in_every_format_with_the_exit_code_of_its_verdict(string state, string format)
    {
        (CliRun run, string output) = Check(state, format);
        Assert.True(run.ExitCode == States[state].ExitCode, $"{state}/{format}: expected exit {States[state].ExitCode}\n{run}");
        Assert.True(run.Stderr.Length == 0 || !run.Stderr.Contains("internal error", StringComparison.Ordinal), run.ToString());
        switch (format)
        {
            case "text":
                AssertText(state, output);
                break;
            case "markdown":
                AssertMarkdown(state, output);
                break;
            case "json":
                AssertJson(state, output);
                break;
            case "junit":
                AssertJUnit(state, output);
                break;
            default:
                AssertHtml(state, output);
                break;
        }
    }

    // The sentences every format must carry (CheckWords, the one place they are worded).
    private const string IncompleteNote = "the substitute lacks case Q, so this combination is incomplete there";
    private const string ConflictNote = "the substitute defines 'uls' as 1.35·G + 1.35·Q; the original's factors 1.35·G + 1.5·Q were applied to both";
    private const string UnitHint = "no units given in the substitute (" + SubstituteFile + "): its values were read as N, m, kg";
    private const string ShiftWords = "the substitute's resultant acts 0.3 m too far in +x"; // 1.30 − 1 (centre of parallel forces)
    private const string GateLine = "largest |ΔM| = 10 kN·m at s = 1 m; allowed 1 kN·m"; // see Gate_numbers_are_the_hand_statics

    private static void AssertText(string state, string text)
    {
        switch (state)
        {
            case "pass":
                Assert.Contains("Result: EQUIVALENT", text);
                break;
            case "fail":
                Assert.Contains("Case \"dead\": FAIL", text);
                Assert.Contains(ShiftWords, text);
                Assert.Contains("Result: NOT EQUIVALENT", text);
                break;
            case "only-in":
                Assert.Contains("FAIL (only in original)", text);
                Assert.Contains("'snow' is in the original only", text);
                Assert.Contains("FAIL (only in substitute)", text);
                Assert.Contains("'wind' is in the substitute only", text);
                Assert.Contains("Result: NOT EQUIVALENT", text);
                break;
            case "incomplete-combination":
                Assert.Contains("Combination \"uls\": FAIL", text);
                Assert.Contains(IncompleteNote, text);
                Assert.Contains("Result: NOT EQUIVALENT", text);
                break;
            case "conflicting-factors":
                Assert.Contains("Combination \"uls\": PASS, with note", text);
                Assert.Contains("note: " + ConflictNote, text);
                Assert.Contains("Result: EQUIVALENT", text);
                break;
            case "section-gate-fail":
                Assert.Contains(GateLine, text);
                Assert.Contains("Section-cut gate: FAIL", text);
                Assert.Contains("Result: NOT EQUIVALENT — every case and combination is within tolerance, but the section-cut gate FAILED.", text);
                break;
            case "unit-hint":
                Assert.Contains("warning:     " + UnitHint, text);
                Assert.Contains("Result: EQUIVALENT", text);
                break;
            default:
                Assert.Fail("no expectation for state " + state);
                break;
        }
    }

    // Markdown escapes only the table separator: "|" is written "\|".
    private static string Md(string s) => s.Replace("|", "\\|", StringComparison.Ordinal);

    private static void AssertMarkdown(string state, string md)
    {
        switch (state)
        {
            case "pass":
                Assert.Contains("### Static equivalence: ✅ equivalent", md);
                Assert.Contains("| dead | case | ✅ PASS |", md);
                break;
            case "fail":
                Assert.Contains("| dead | case | ❌ FAIL |", md);
                Assert.Contains(ShiftWords, md);
                Assert.Contains("**Result: NOT EQUIVALENT", md);
                break;
            case "only-in":
                Assert.Contains("| snow | case | ❌ FAIL (only in original) |", md);
                Assert.Contains("| wind | case | ❌ FAIL (only in substitute) |", md);
                Assert.Contains("**snow**: 'snow' is in the original only", md);
                break;
            case "incomplete-combination":
                Assert.Contains("| uls | combination | ❌ FAIL |", md);
                Assert.Contains(IncompleteNote, md);
                break;
            case "conflicting-factors":
                Assert.Contains("| uls | combination | ✅ PASS |", md);
                Assert.Contains("**uls** (PASS): note: " + ConflictNote, md);
                Assert.Contains("### Static equivalence: ✅ equivalent", md);
                break;
            case "section-gate-fail":
                Assert.Contains("| dead | case | ✅ PASS |", md);
                Assert.Contains(Md(GateLine), md);
                Assert.Contains("- Section-cut gate: FAIL", md);
                Assert.Contains("### Static equivalence: ❌ NOT EQUIVALENT", md);
                break;
            case "unit-hint":
                Assert.Contains("⚠️ Warning: " + UnitHint, md);
                Assert.Contains("### Static equivalence: ✅ equivalent", md);
                break;
            default:
                Assert.Fail("no expectation for state " + state);
                break;
        }
    }

    private static JsonElement Entry(JsonElement root, string name) =>
        root.GetProperty("cases").EnumerateArray().Single(c => c.GetProperty("name").GetString() == name);

    private static string[] Strings(JsonElement array) => array.EnumerateArray().Select(e => e.GetString()!).ToArray();

    private static void AssertJson(string state, string json)
    {
        using JsonDocument doc = JsonDocument.Parse(json);
        JsonElement root = doc.RootElement;
        bool equivalent = root.GetProperty("equivalent").GetBoolean();
        switch (state)
        {
            case "pass":
                Assert.True(equivalent);
                Assert.True(Entry(root, "dead").GetProperty("equivalent").GetBoolean());
                Assert.Equal("none", Entry(root, "dead").GetProperty("explanation").GetProperty("reading").GetString());
                break;
            case "fail":
                Assert.False(equivalent);
                JsonElement dead = Entry(root, "dead");
                Assert.False(dead.GetProperty("equivalent").GetBoolean());
                Assert.Equal("misplaced_resultant", dead.GetProperty("explanation").GetProperty("reading").GetString());
                // Shift 1.30 − 1 = 0.30 m in +x (centre of parallel forces).
                Assert.Equal(0.30, dead.GetProperty("explanation").GetProperty("shift")[0].GetDouble(), 9);
                Assert.Contains(Strings(dead.GetProperty("explanation").GetProperty("sentences")), s => s.Contains(ShiftWords, StringComparison.Ordinal));
                break;
            case "only-in":
                Assert.False(equivalent);
                Assert.Equal("original", Entry(root, "snow").GetProperty("only_in").GetString());
                Assert.False(Entry(root, "snow").GetProperty("equivalent").GetBoolean());
                Assert.Equal("substitute", Entry(root, "wind").GetProperty("only_in").GetString());
                Assert.False(Entry(root, "wind").GetProperty("equivalent").GetBoolean());
                Assert.Equal(JsonValueKind.Null, Entry(root, "dead").GetProperty("only_in").ValueKind);
                break;
            case "incomplete-combination":
                Assert.False(equivalent);
                Assert.False(Entry(root, "uls").GetProperty("equivalent").GetBoolean());
                Assert.Contains(IncompleteNote, Strings(Entry(root, "uls").GetProperty("notes")));
                break;
            case "conflicting-factors":
                Assert.True(equivalent);
                Assert.True(Entry(root, "uls").GetProperty("equivalent").GetBoolean());
                Assert.Contains(ConflictNote, Strings(Entry(root, "uls").GetProperty("notes")));
                break;
            case "section-gate-fail":
                Assert.False(equivalent);
                Assert.True(root.GetProperty("cases_equivalent").GetBoolean());
                Assert.False(root.GetProperty("section_gate").GetProperty("passes").GetBoolean());
                break;
            case "unit-hint":
                Assert.True(equivalent);
                Assert.Contains(UnitHint, Strings(root.GetProperty("warnings")));
                break;
            default:
                Assert.Fail("no expectation for state " + state);
                break;
        }
    }

    private static List<string> SchemaErrors(string xml) => JUnitSchema.Errors(xml);

    private static XElement TestCase(XDocument doc, string classname, string name) =>
        doc.Descendants("testcase").Single(c => (string?)c.Attribute("classname") == classname && (string?)c.Attribute("name") == name);

    private static void AssertJUnit(string state, string xml)
    {
        Assert.Empty(SchemaErrors(xml));
        XDocument doc = XDocument.Parse(xml);
        XElement suite = doc.Root!.Element("testsuite")!;
        int failures = int.Parse((string)suite.Attribute("failures")!, CultureInfo.InvariantCulture);
        Assert.Equal(suite.Descendants("failure").Count(), failures);
        const string CaseClass = "loaddiff.check.case", CombinationClass = "loaddiff.check.combination";
        switch (state)
        {
            case "pass":
                Assert.Equal(0, failures);
                Assert.Null(TestCase(doc, CaseClass, "dead").Element("failure"));
                break;
            case "fail":
                Assert.Equal(1, failures);
                XElement f = TestCase(doc, CaseClass, "dead").Element("failure")!;
                Assert.Contains("worst |ΔM| = 4.071 kN·m exceeds 0.02714 kN·m", (string)f.Attribute("message")!); // 0.30·13.57; 1e-3·13.57·2
                Assert.Contains(ShiftWords, f.Value);
                break;
            case "only-in":
                Assert.Equal(2, failures);
                XElement snow = TestCase(doc, CaseClass, "snow").Element("failure")!;
                Assert.Equal("missing", (string?)snow.Attribute("type"));
                Assert.Contains("'snow' is in the original only", (string)snow.Attribute("message")!);
                Assert.Contains("'wind' is in the substitute only", (string)TestCase(doc, CaseClass, "wind").Element("failure")!.Attribute("message")!);
                break;
            case "incomplete-combination":
                Assert.Contains(IncompleteNote, (string)TestCase(doc, CombinationClass, "uls").Element("failure")!.Attribute("message")!);
                break;
            case "conflicting-factors":
                Assert.Equal(0, failures);
                XElement uls = TestCase(doc, CombinationClass, "uls");
                Assert.Null(uls.Element("failure"));
                Assert.Equal("note: " + ConflictNote, uls.Element("system-out")!.Value);
                break;
            case "section-gate-fail":
                Assert.Equal(1, failures);
                Assert.Null(TestCase(doc, CaseClass, "dead").Element("failure"));
                XElement gate = TestCase(doc, "loaddiff.check.section-gate", "dead").Element("failure")!;
                Assert.Equal("section-gate", (string?)gate.Attribute("type"));
                Assert.Contains(GateLine, (string)gate.Attribute("message")!);
                break;
            case "unit-hint":
                Assert.Equal(0, failures);
                Assert.Contains("warning: " + UnitHint, suite.Element("system-err")!.Value);
                break;
            default:
                Assert.Fail("no expectation for state " + state);
                break;
        }
    }

    private static XElement ById(XDocument doc, string id) => doc.Descendants().Single(e => (string?)e.Attribute("id") == id);

    private static XElement SummaryRow(XDocument doc, string name) =>
        ById(doc, "summary").Element("tbody")!.Elements("tr").Single(r => (string?)r.Attribute("data-name") == name);

    private static IEnumerable<string> Paragraphs(XDocument doc, string cls) =>
        doc.Descendants("p").Where(p => (string?)p.Attribute("class") == cls).Select(p => p.Value);

    private static void AssertHtml(string state, string html)
    {
        XDocument doc = HtmlOutline.Parse(html);
        XElement h1 = ById(doc, "verdict");
        bool equivalent = (string?)h1.Attribute("data-equivalent") == "true";
        Assert.Equal(States[state].ExitCode == 0, equivalent);
        Assert.Equal(equivalent ? "Static equivalence check: EQUIVALENT ✓" : "Static equivalence check: NOT EQUIVALENT ✗", h1.Value);
        switch (state)
        {
            case "pass":
                Assert.Contains("PASS", SummaryRow(doc, "dead").Elements("td").ElementAt(2).Value);
                break;
            case "fail":
                Assert.Contains("FAIL", SummaryRow(doc, "dead").Elements("td").ElementAt(2).Value);
                Assert.Contains(Paragraphs(doc, "explanation"), p => p.Contains(ShiftWords, StringComparison.Ordinal));
                break;
            case "only-in":
                Assert.Contains("FAIL (only in original)", SummaryRow(doc, "snow").Elements("td").ElementAt(2).Value);
                Assert.Contains("FAIL (only in substitute)", SummaryRow(doc, "wind").Elements("td").ElementAt(2).Value);
                break;
            case "incomplete-combination":
                Assert.Contains("FAIL", SummaryRow(doc, "uls").Elements("td").ElementAt(2).Value);
                Assert.Contains(doc.Descendants("p"), p => p.Value.Contains(IncompleteNote, StringComparison.Ordinal));
                break;
            case "conflicting-factors":
                Assert.Contains("PASS", SummaryRow(doc, "uls").Elements("td").ElementAt(2).Value);
                Assert.Contains(ConflictNote, Paragraphs(doc, "note"));
                break;
            case "section-gate-fail":
                XElement gate = ById(doc, "section-gate");
                Assert.Equal("false", (string?)gate.Attribute("data-passes"));
                Assert.Contains("FAIL", gate.Element("h3")!.Value);
                Assert.Contains(gate.Descendants("li"), li => li.Value.Contains(GateLine, StringComparison.Ordinal));
                break;
            case "unit-hint":
                Assert.Contains("Warning: " + UnitHint + ".", Paragraphs(doc, "warning"));
                break;
            default:
                Assert.Fail("no expectation for state " + state);
                break;
        }
    }

    [Fact]
    public void Every_state_has_an_expectation_in_every_format()
    {
        // Guards the guard: the theory covers all 7 states × 5 formats, and an unknown state cannot pass silently.
        Assert.Equal(7 * 5, StatesAndFormats().Count);
        Assert.ThrowsAny<Xunit.Sdk.XunitException>(() => AssertText("no-such-state", ""));
        Assert.ThrowsAny<Xunit.Sdk.XunitException>(() => AssertJson("no-such-state", "{\"equivalent\": true}"));
    }

    [Fact]
    public void The_same_factors_written_in_another_order_are_no_conflict()
    {
        // A JSON object is an unordered collection of name/value pairs (RFC 8259, §4): { "Q": 1.5, "G": 1.35 } is the
        // combination 1.35 G + 1.5 Q, the original's own. The substitute defines no other factors, so no note is due.
        using var t = new TempFolder();
        t.Write(OriginalFile, Doc(GDetailed + ", " + QCase, "\"uls\": { \"G\": 1.35, \"Q\": 1.5 }"));
        t.Write(SubstituteFile, Doc(GSingle + ", " + QCase, "\"uls\": { \"Q\": 1.5, \"G\": 1.35 }"));
        CliRun run = CliProcess.RunIn(t.Path, "check", OriginalFile, SubstituteFile, "--format", "json");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout);
        Assert.Empty(Strings(Entry(doc.RootElement, "uls").GetProperty("notes")));
    }

    // ---- the section-cut gate in detail ----------------------------------------------------------------------------

    [Fact]
    public void Gate_numbers_are_the_hand_statics()
    {
        // Cut at s along x, the loads with x ≤ s reduced to the cut point (SPEC §4 sections). Original: −10 kN at x = 0
        // and x = 2. For 0 ≤ s < 2 only the first counts: |M(s)| = 10·s; at s = 2 both: 10·2 + 10·0 = 20 kN·m, the peak.
        // Substitute −20 kN at x = 1: |M(s)| = 0 for s < 1 and 20·(s − 1) from s = 1. |ΔM(s)| = 10·s on [0, 1] and
        // |10·s − 20·(s − 1)| = |20 − 10·s| on [1, 2]: largest 10 kN·m at s = 1. Allowed 0.05 × 20 = 1 kN·m.
        (CliRun run, string json) = Check("section-gate-fail", "json");
        Assert.True(run.ExitCode == 1, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(json);
        JsonElement gate = doc.RootElement.GetProperty("section_gate");
        JsonElement dead = gate.GetProperty("cases").EnumerateArray().Single(c => c.GetProperty("name").GetString() == "dead");
        Assert.False(dead.GetProperty("passes").GetBoolean());
        Assert.Equal(10, dead.GetProperty("max_moment_deviation").GetDouble(), 9);
        Assert.Equal(1, dead.GetProperty("max_moment_deviation_at").GetDouble(), 9);
        Assert.Equal(20, dead.GetProperty("peak_moment").GetDouble(), 9);
        Assert.Equal(1, dead.GetProperty("allowed_moment").GetDouble(), 9);
        Assert.Equal(0.05, gate.GetProperty("relative_tolerance").GetDouble());
    }

    [Fact]
    public void Html_report_of_a_failing_section_gate_says_fail_and_not_equivalent_with_exit_1()
    {
        (CliRun run, string html) = Check("section-gate-fail", "html");
        Assert.True(run.ExitCode == 1, run.ToString());
        XDocument doc = HtmlOutline.Parse(html);
        XElement h1 = ById(doc, "verdict");
        Assert.Equal("false", (string?)h1.Attribute("data-equivalent"));
        Assert.Contains("NOT EQUIVALENT", h1.Value);
        // Every case passes the resultant test (−20 kN at x = 1 in both) — only the gate fails, and the page says so.
        Assert.All(ById(doc, "summary").Element("tbody")!.Elements("tr"), r => Assert.Contains("PASS", r.Elements("td").ElementAt(2).Value));
        XElement gate = ById(doc, "section-gate");
        Assert.Equal("false", (string?)gate.Attribute("data-passes"));
        Assert.Contains("FAIL", gate.Element("h3")!.Value);
        Assert.Contains("section-cut gate FAILED", ById(doc, "overall").Value);
    }

    // ---- numbers within the rounding noise print as 0 ----------------------------------------------------------------

    // NIST SP 811 (2008), Appendix B.8: 1 kip = 4448.2216152605 N, 1 ft = 0.3048 m (both exact).
    private static readonly decimal Kip = 4448.2216152605m, Ft = 0.3048m;

    // Invented loads in N and m: (id, position, force).
    private static readonly (string Id, decimal[] At, decimal[] F)[] NoiseLoads =
    [
        ("p1", [1.234m, 0.567m, 0m], [0m, 0m, -12345.6m]),
        ("p2", [3.21m, 2.5m, 0.4m], [100.5m, 0m, -9876.5m]),
        ("p3", [0.1m, 1.9m, 0m], [0m, -33.3m, -777.7m]),
    ];

    private static string NoiseDoc(string force, string length, Func<decimal, decimal> position, Func<decimal, decimal> value)
    {
        static string Join(IEnumerable<decimal> xs) => string.Join(", ", xs.Select(x => x.ToString(CultureInfo.InvariantCulture)));
        IEnumerable<string> items = NoiseLoads.Select(l =>
            $$"""{ "id": "{{l.Id}}", "kind": "force", "at": [{{Join(l.At.Select(position))}}], "value": [{{Join(l.F.Select(value))}}] }""");
        return $$"""{ "units": { "force": "{{force}}", "length": "{{length}}" }, "cases": { "dead": { "loads": [ {{string.Join(", ", items)}} ] } } }""";
    }

    [Fact]
    public void Pure_rounding_residual_prints_as_zero_in_text_markdown_and_html_while_json_keeps_the_exact_values()
    {
        // The same loads in N, m and in kip, ft: each number divided by the exact factor in decimal (28 digits) and rounded
        // once, to a double, by the reader. What remains after the reader converts back is rounding only.
        using var t = new TempFolder();
        t.Write("si.loads.json", NoiseDoc("N", "m", x => x, x => x));
        t.Write("us.loads.json", NoiseDoc("kip", "ft", x => x / Ft, x => x / Kip));

        CliRun json = CliProcess.RunIn(t.Path, "check", "si.loads.json", "us.loads.json", "--format", "json");
        Assert.True(json.ExitCode == 0, json.ToString());
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        JsonElement dead = Entry(doc.RootElement, "dead");
        double force = dead.GetProperty("residual").GetProperty("force_norm").GetDouble();
        double moment = dead.GetProperty("residual").GetProperty("worst_moment_norm").GetDouble();
        // The data were chosen so that both are nonzero: JSON must give them as they are, not as printed.
        Assert.True(force > 0, $"|ΔR| = {force:R}: choose data whose conversion leaves a rounding residual");
        Assert.True(moment > 0, $"worst |ΔM| = {moment:R}: choose data whose conversion leaves a rounding residual");
        // … and they are rounding: within the rounding allowance the tolerance reports (not an engineering tolerance).
        Assert.True(force <= dead.GetProperty("tolerance").GetProperty("rounding_force").GetDouble(), json.Stdout);
        Assert.True(moment <= dead.GetProperty("tolerance").GetProperty("rounding_moment").GetDouble(), json.Stdout);

        CliRun text = CliProcess.RunIn(t.Path, "check", "si.loads.json", "us.loads.json");
        Assert.True(text.ExitCode == 0, text.ToString());
        string[] row = text.Stdout.Split('\n').Single(l => l.TrimStart().StartsWith("dead ", StringComparison.Ordinal))
            .Split(' ', StringSplitOptions.RemoveEmptyEntries);
        // name kind verdict |ΔR| allowed worst|ΔM| allowed governs
        Assert.Equal(["dead", "case", "PASS"], row[..3]);
        Assert.Equal("0", row[3]);
        Assert.Equal("0", row[5]);

        CliRun md = CliProcess.RunIn(t.Path, "check", "si.loads.json", "us.loads.json", "--format", "markdown", "--report", "r.html");
        Assert.True(md.ExitCode == 0, md.ToString());
        string[] cells = md.Stdout.Split('\n').Single(l => l.StartsWith("| dead |", StringComparison.Ordinal))
            .Split(" | ").Select(c => c.Trim(' ', '|')).ToArray();
        // | name | kind | verdict | |ΔR| | allowed | worst |ΔM| | allowed | governs |
        Assert.Equal("✅ PASS", cells[2]);
        Assert.Equal("0", cells[3]);
        Assert.Equal("0", cells[5]);

        XDocument html = HtmlOutline.Parse(File.ReadAllText(Path.Combine(t.Path, "r.html")));
        string[] td = SummaryRow(html, "dead").Elements("td").Select(c => c.Value).ToArray();
        // name, kind, verdict, R orig, R subs, M orig, M subs, |ΔR|, allowed, worst |ΔM|, allowed, governs
        Assert.Equal("0", td[7]);
        Assert.Equal("0", td[9]);
    }

    // ---- zero-magnitude items widen nothing, at the command line -----------------------------------------------------

    // An invented skid frame, 2.4 m × 1.6 m, four legs of 12.5 kN each; the substitute has leg L2 0.3 m further in +x.
    // The zero force, when given, comes first: it must not become the anchor or widen any box either.
    private static string Frame(double l2x, string? zeroAt)
    {
        var items = new List<string>();
        if (zeroAt is not null)
        {
            items.Add($$"""{ "id": "zero", "kind": "force", "at": [{{zeroAt}}], "value": [0, 0, 0] }""");
        }
        items.AddRange([Force("L1", 0, 0, -12.5), Force("L2", l2x, 0, -12.5), Force("L3", 0, 1.6, -12.5), Force("L4", 2.4, 1.6, -12.5)]);
        return Doc(Case("operating", [.. items]));
    }

    [Theory]
    [InlineData(null, null)]
    [InlineData("original", "72, 30, 0")]
    [InlineData("original", "3000, 30, 0")]
    [InlineData("substitute", "72, 30, 0")]
    [InlineData("substitute", "3000, 30, 0")]
    public void A_zero_force_far_away_changes_neither_the_allowance_nor_the_verdict(string? file, string? zeroAt)
    {
        // ΔR = 0; ΔM is a couple of 12.5 × 0.3 = 3.75 kN·m (r × F). G_F = 50 kN, D = √(2.4² + 1.6²) = 2.884441… m (the
        // original's loaded box), allowed 1e-3 · 50 · D = 0.1442220… kN·m (SPEC §4). Were the zero force at (72, 30, 0)
        // loaded geometry, D would be √(72² + 30²) = 78 m and the allowance 3.9 kN·m > 3.75: the failure would vanish.
        // The resultant moves by 12.5 × 0.3 / 50 = 0.075 m in +x (centre of parallel forces).
        using var t = new TempFolder();
        t.Write("a.loads.json", Frame(2.4, file == "original" ? zeroAt : null));
        t.Write("b.loads.json", Frame(2.7, file == "substitute" ? zeroAt : null));

        CliRun json = CliProcess.RunIn(t.Path, "check", "a.loads.json", "b.loads.json", "--format", "json");
        Assert.True(json.ExitCode == 1, json.ToString());
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        JsonElement c = Entry(doc.RootElement, "operating");
        Assert.False(c.GetProperty("equivalent").GetBoolean());
        double d = Math.Sqrt((2.4 * 2.4) + (1.6 * 1.6));
        Assert.Equal(d, c.GetProperty("tolerance").GetProperty("box_diagonal").GetDouble(), 12);
        Assert.Equal(1e-3 * 50 * d, c.GetProperty("tolerance").GetProperty("moment").GetDouble(), 12);
        Assert.Equal(1e-3 * 50, c.GetProperty("tolerance").GetProperty("force").GetDouble(), 12);
        Assert.Equal(12.5 * 0.3, c.GetProperty("residual").GetProperty("worst_moment_norm").GetDouble(), 9);
        Assert.Equal(0.075, c.GetProperty("explanation").GetProperty("shift")[0].GetDouble(), 9);

        CliRun text = CliProcess.RunIn(t.Path, "check", "a.loads.json", "b.loads.json");
        Assert.True(text.ExitCode == 1, text.ToString());
        Assert.Contains("the substitute's resultant acts 0.075 m too far in +x", text.Stdout);
        Assert.Contains("0.144222", text.Stdout); // the allowance above, to 6 significant digits
    }
}
