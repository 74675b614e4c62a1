using System.Globalization;
using System.Text.Json;
using System.Text.RegularExpressions;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// Every number in the committed Markdown goldens of check, derived here in System.Decimal from the fixtures by hand
/// closed forms and the tolerance rule of SPEC §4, never from the tool: reference point, residuals, worst corner
/// moments, allowances, verdicts, the explanation of the residual. The golden file's numbers, read in order, must be
/// exactly these values rounded to the six significant digits the report prints.
/// </summary>
public partial class GoldenArithmeticTests
{
    private static readonly decimal Rel = 0.001m;    // --rel-tol default (SPEC §4; common practice, no published source)
    private static readonly decimal Gn = 9.80665m;   // standard gravity, m/s² (3rd CGPM 1901; NIST SP 330)

    /// <summary>An exact vector in decimal.</summary>
    internal readonly record struct V(decimal X, decimal Y, decimal Z)
    {
        public static V operator +(V a, V b) => new(a.X + b.X, a.Y + b.Y, a.Z + b.Z);
        public static V operator -(V a, V b) => new(a.X - b.X, a.Y - b.Y, a.Z - b.Z);
        public static V operator -(V a) => new(-a.X, -a.Y, -a.Z);
        public static V operator *(decimal k, V a) => new(k * a.X, k * a.Y, k * a.Z);
        public static V Cross(V a, V b) => new((a.Y * b.Z) - (a.Z * b.Y), (a.Z * b.X) - (a.X * b.Z), (a.X * b.Y) - (a.Y * b.X));
        public decimal Dot(V b) => (X * b.X) + (Y * b.Y) + (Z * b.Z);
        public decimal Length => Sqrt(Dot(this));
        public static readonly V Zero = new(0, 0, 0);
    }

    /// <summary>A force with a point on its line of action and its gross magnitude (|F|, or ∫|w| for a distributed load).</summary>
    internal readonly record struct Item(V Force, V At, decimal Gross);

    /// <summary>An axis-aligned box.</summary>
    internal readonly record struct Box(V Min, V Max)
    {
        public Box Union(Box b) => new(new(Math.Min(Min.X, b.Min.X), Math.Min(Min.Y, b.Min.Y), Math.Min(Min.Z, b.Min.Z)),
            new(Math.Max(Max.X, b.Max.X), Math.Max(Max.Y, b.Max.Y), Math.Max(Max.Z, b.Max.Z)));
        public decimal Diagonal => (Max - Min).Length;
        public V Centre => 0.5m * (Min + Max);
        public IEnumerable<V> Corners()
        {
            foreach (decimal x in (decimal[])[Min.X, Max.X])
            {
                foreach (decimal y in (decimal[])[Min.Y, Max.Y])
                {
                    foreach (decimal z in (decimal[])[Min.Z, Max.Z])
                    {
                        yield return new V(x, y, z);
                    }
                }
            }
        }
    }

    /// <summary>One case or combination of both systems: items (already multiplied by the factor) and loaded boxes.</summary>
    internal sealed record Entry(string Name, string Kind, List<Item> Original, List<Item> Substitute, Box OriginalBox, Box SubstituteBox);

    /// <summary>What SPEC §4 makes of one entry.</summary>
    internal sealed record Derived(
        V Dr, decimal DrNorm, decimal WorstDm, decimal AllowF, decimal AllowM, bool Pass, V CentreOfBox, V DmAtCentre, V Ro);

    /// <summary>Square root by Newton's iteration in decimal (28 digits; the report prints 6).</summary>
    internal static decimal Sqrt(decimal a)
    {
        Assert.True(a >= 0);
        if (a == 0)
        {
            return 0;
        }
        decimal x = (decimal)Math.Sqrt((double)a);
        for (int i = 0; i < 6; i++)
        {
            x = (x + (a / x)) / 2;
        }
        return x;
    }

    /// <summary>Rounded to six significant digits, the precision the reports print numbers in (G6).</summary>
    internal static decimal Round6(decimal x)
    {
        // Thirds (h/3) are not exact in 28 decimal digits: a residue below 1e-20 is that, not a number of the scenario.
        if (Math.Abs(x) < 1e-20m)
        {
            return 0;
        }
        int e = 0;
        decimal m = Math.Abs(x);
        while (m >= 10) { m /= 10; e++; }
        while (m < 1) { m *= 10; e--; }
        int scale = 5 - e;
        Assert.InRange(scale, 0, 27);
        return Math.Round(x, scale, MidpointRounding.ToEven);
    }

    internal static V Moment(IEnumerable<Item> items, V about)
    {
        V m = V.Zero;
        foreach (Item i in items)
        {
            m += V.Cross(i.At - about, i.Force);
        }
        return m;
    }

    internal static V Sum(IEnumerable<Item> items) => items.Aggregate(V.Zero, (a, i) => a + i.Force);

    /// <summary>SPEC §4: residual = substitute − original, |ΔM_Q| at the corners of both boxes, allowances of the original.</summary>
    internal static Derived Derive(Entry e, V p)
    {
        V dr = Sum(e.Substitute) - Sum(e.Original);
        V dmP = Moment(e.Substitute, p) - Moment(e.Original, p);
        Box both = e.OriginalBox.Union(e.SubstituteBox);
        // M_Q = M_P + (P − Q) × ΔR (SPEC §2, moving the reference)
        decimal worst = both.Corners().Max(q => (dmP + V.Cross(p - q, dr)).Length);
        decimal gf = e.Original.Sum(i => i.Gross);
        decimal gm = gf * e.OriginalBox.Diagonal;    // no free couples in these fixtures: Σ|C| = 0
        // F = M = 0 by default; the rounding floor (a double's noise) is far below 1e-3 of G: asserted, not assumed.
        decimal allowF = Rel * gf, allowM = Rel * gm;
        Assert.True(allowF > 1e-9m * gf && allowM > 1e-9m * gm);
        V centre = both.Centre;
        V dmC = dmP + V.Cross(p - centre, dr);
        return new Derived(dr, dr.Length, worst, allowF, allowM, dr.Length <= allowF && worst <= allowM, centre, dmC, Sum(e.Original));
    }

    /// <summary>The numbers of a Markdown golden before its notes table, in reading order.</summary>
    internal static List<decimal> NumbersOf(string markdown)
    {
        int notes = markdown.IndexOf("#### Basis of the loads", StringComparison.Ordinal);
        Assert.True(notes > 0);
        return Regex.Matches(markdown[..notes], @"(?<![\w.\-])-?\d+(?:\.\d+)?(?:[eE][-+]?\d+)?")
            .Select(m => decimal.Parse(m.Value, NumberStyles.Float, CultureInfo.InvariantCulture)).ToList();
    }

    /// <summary>Each printed number equals its derivation rounded to six significant digits.</summary>
    internal static void AssertNumbers(IReadOnlyList<(decimal Value, string Derivation)> expected, IReadOnlyList<decimal> printed)
    {
        for (int i = 0; i < Math.Min(expected.Count, printed.Count); i++)
        {
            Assert.True(Round6(expected[i].Value) == printed[i],
                $"number {i + 1} of the golden is {printed[i]}; {expected[i].Derivation} = {expected[i].Value} prints as {Round6(expected[i].Value)}");
        }
        Assert.Equal(expected.Count, printed.Count);
    }

    internal static string ReadGolden(string name) =>
        File.ReadAllText(Path.Combine(Golden.Folder, name)).Replace("\r\n", "\n", StringComparison.Ordinal);

    /// <summary>The summary table rows: name, kind, verdict word, governing parts.</summary>
    internal static List<string[]> TableRows(string markdown) =>
        markdown.Split('\n').Where(l => l.StartsWith("| ", StringComparison.Ordinal) && (l.Contains("| case |", StringComparison.Ordinal) || l.Contains("| combination |", StringComparison.Ordinal)))
            .Select(l => l.Trim('|').Split(" | ").Select(c => c.Trim()).ToArray()).ToList();

    /// <summary>The notes table equals the fixtures' own notes (free text copied, with Markdown's escapes undone).</summary>
    internal static void AssertNotes(string markdown, params string[] files)
    {
        var rows = markdown[markdown.IndexOf("#### Basis of the loads", StringComparison.Ordinal)..].Split('\n')
            .Where(l => l.StartsWith("| fixtures/", StringComparison.Ordinal)).ToList();
        Assert.Equal(files.Length, rows.Count);
        foreach ((string row, string file) in rows.Zip(files))
        {
            using JsonDocument doc = JsonDocument.Parse(File.ReadAllText(Path.Combine(CliProcess.RepoRoot, file)));
            string note = doc.RootElement.GetProperty("note").GetString()!;
            string cell = row.Split(" | ")[2].TrimEnd('|', ' ');
            Assert.Equal(note, cell.Replace("<br>", "\n", StringComparison.Ordinal).Replace(@"\_", "_", StringComparison.Ordinal));
            Assert.StartsWith($"| {file} | document |", row);
        }
    }

    internal static void AssertVerdicts(string markdown, IReadOnlyList<(Entry E, Derived D)> entries)
    {
        List<string[]> rows = TableRows(markdown);
        Assert.Equal(entries.Select(x => x.E.Name), rows.Select(r => r[0]));
        foreach ((string[] row, (Entry e, Derived d)) in rows.Zip(entries))
        {
            Assert.Equal(e.Kind, row[1]);
            Assert.Equal(d.Pass ? "✅ PASS" : "❌ FAIL", row[2]);
            Assert.Equal("relative/relative", row[7]);   // F = M = 0, so rel·G governs both
        }
    }
}
