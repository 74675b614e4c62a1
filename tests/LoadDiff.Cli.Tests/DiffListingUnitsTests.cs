using System.Globalization;
using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

/// <summary>
/// The listing section of <c>diff</c> when the two versions are in different units: both compared in the old version's
/// units. The new version's numbers are converted in the test with decimal arithmetic from the NIST SP 811 definitions
/// 1 kN = 1000 N and 1 m = 1000 mm, so they are exact. Invented demo loads.
/// </summary>
public class DiffListingUnitsTests
{
    // (what, value in kN and m units, factor to N and mm units): kN/m = N/mm, kN/m² = 10⁻³ N/mm²
    private const decimal Length = 1000m, Force = 1000m, LineIntensity = 1000m / 1000m, Pressure = 1000m / (1000m * 1000m);

    private static string D(decimal x) => x.ToString(CultureInfo.InvariantCulture);

    private static string Document(string force, string length, Func<decimal, decimal> len, Func<decimal, decimal> f,
        Func<decimal, decimal> w, Func<decimal, decimal> p, decimal pointFz) => $$"""
        { "units": { "force": "{{force}}", "length": "{{length}}" },
          "points": { "bearing": [{{D(len(2.8m))}}, {{D(len(0.7m))}}, 0] },
          "cases": { "dead": { "loads": [
            { "id": "rail", "kind": "line", "from": [{{D(len(0.3m))}}, 0, 0], "to": [{{D(len(2.8m))}}, 0, 0], "start": [0, 0, {{D(w(-2.8m))}}], "end": [0, 0, {{D(w(-1.7m))}}] },
            { "id": "post", "kind": "force", "at": [{{D(len(0.7m))}}, {{D(len(0.1m))}}, 0], "value": [0, {{D(f(0.03m))}}, {{D(f(pointFz))}}] },
            { "id": "pad", "kind": "force", "at": "bearing", "value": [0, 0, {{D(f(-4.9m))}}] },
            { "id": "deck", "kind": "area", "polygon": [[0, 0, 0], [{{D(len(2.8m))}}, 0, 0], [{{D(len(2.8m))}}, {{D(len(1.1m))}}, 0]], "pressure": {{D(p(1.7m))}}, "direction": [0, 0, -1] } ] } } }
        """;

    private static string Metres(decimal pointFz) => Document("kN", "m", x => x, x => x, x => x, x => x, pointFz);

    private static string Millimetres(decimal pointFz) =>
        Document("N", "mm", x => x * Length, x => x * Force, x => x * LineIntensity, x => x * Pressure, pointFz);

    // the −/+ lines of the listing section (after its header), without the ---/+++ file lines
    private static string[] ListingChanges(string stdout)
    {
        int at = stdout.IndexOf("Canonical listings", StringComparison.Ordinal);
        Assert.True(at >= 0, stdout);
        return [.. stdout[at..].Split('\n').Where(l => (l.StartsWith('-') && !l.StartsWith("---", StringComparison.Ordinal))
            || (l.StartsWith('+') && !l.StartsWith("+++", StringComparison.Ordinal)))];
    }

    [Fact]
    public void The_same_loads_in_N_and_mm_give_no_changed_listing_line()
    {
        // the data exercise conversion noise: 2800 mm × 0.001 in doubles is not the double 2.8
        Assert.NotEqual(2.8, 2800.0 * 0.001);
        using var t = new TempFolder();
        string a = t.Write("metres.loads.json", Metres(-12.3m));
        string b = t.Write("millimetres.loads.json", Millimetres(-12.3m));
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.Contains("Differences: 0 items changed, 0 added, 0 removed; 1 document setting changed.", run.Stdout);
        Assert.Empty(ListingChanges(run.Stdout));
        Assert.Contains("Canonical listings identical, both in the units of " + a + " (kN, m, kg), " + b
            + " converted with the exact NIST SP 811 factors, numbers rounded to 12 significant digits.", run.Stdout);
        Assert.DoesNotContain("2.8000000000000003", run.Stdout);

        CliRun json = CliProcess.Run("diff", a, b, "--format", "json");
        using JsonDocument doc = JsonDocument.Parse(json.Stdout);
        Assert.Equal("", doc.RootElement.GetProperty("listing_diff").GetString());
        Assert.Equal(12, doc.RootElement.GetProperty("listing_significant_digits").GetInt32());
    }

    [Fact]
    public void A_real_change_in_N_and_mm_gives_exactly_its_changed_line_in_the_old_units()
    {
        using var t = new TempFolder();
        string a = t.Write("metres.loads.json", Metres(-12.3m));
        string b = t.Write("millimetres.loads.json", Millimetres(-12.4m));
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.True(run.ExitCode == 1, run.ToString());
        Assert.Contains("Differences: 1 item changed, 0 added, 0 removed; 1 document setting changed.", run.Stdout);
        string[] changes = ListingChanges(run.Stdout);
        // the post's force, in kN: −12 400 N / 1000 = −12.4 kN (decimal), the other fields as the old file has them
        string[] expected =
        [
            "-        { \"id\": \"post\", \"kind\": \"force\", \"at\": [0.7, 0.1, 0], \"value\": [0, 0.03, -12.3] },",
            "+        { \"id\": \"post\", \"kind\": \"force\", \"at\": [0.7, 0.1, 0], \"value\": [0, 0.03, " + D(-12.4m * Force / 1000m) + "] },",
        ];
        Assert.True(expected.SequenceEqual(changes), string.Join('\n', expected) + "\n--- got\n" + run.Stdout);
    }

    [Fact]
    public void Same_units_keep_the_exact_listing()
    {
        using var t = new TempFolder();
        // a change of about 1 ulp (a different double, checked here): the exact listing shows all 17 digits of it
        Assert.NotEqual(-12.3, double.Parse("-12.300000000000002", CultureInfo.InvariantCulture));
        string a = t.Write("a.loads.json", Metres(-12.3m));
        string b = t.Write("b.loads.json", Metres(-12.3m).Replace("-12.3", "-12.300000000000002", StringComparison.Ordinal));
        CliRun run = CliProcess.Run("diff", a, b);
        Assert.Contains("Canonical listings (loaddiff fmt), 3 lines of context", run.Stdout);
        Assert.Contains(ListingChanges(run.Stdout), l => l.StartsWith('+') && l.Contains("-12.300000000000002", StringComparison.Ordinal));
    }
}
