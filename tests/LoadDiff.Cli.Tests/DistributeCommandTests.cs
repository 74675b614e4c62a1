using System.Text.Json;
using LoadDiff.Cli.Tests.Support;

namespace LoadDiff.Cli.Tests;

public partial class DistributeCommandTests
{
    private static readonly string Skid = CliProcess.Fixture("equipment-skid", "vendor-anchor-loads.loads.json");
    private static readonly string Supports = CliProcess.Fixture("equipment-skid", "support-points.csv");

    [Fact]
    public void Distributed_skid_loads_pass_check_for_every_case_and_combination()
    {
        using var dir = new TempFolder();
        string output = Path.Combine(dir.Path, "supports.loads.json");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", Supports, "-o", output);
        Assert.True(run.ExitCode == 0, run.ToString());
        Assert.Contains("rank 6 of 6", run.Stdout);
        CliRun check = CliProcess.Run("check", Skid, output, "--rel-tol", "1e-9", "--format", "json");
        Assert.True(check.ExitCode == 0, check.ToString());
        using JsonDocument doc = JsonDocument.Parse(check.Stdout);
        Assert.Equal(5, doc.RootElement.GetProperty("cases").GetArrayLength());
    }

    // Closed form of the weighted minimum norm for the skid's four supports, derived by hand from support-points.csv:
    // S1, S2 at (0.5, ∓0.8, 0) with w = 1, S3, S4 at (3.5, ∓0.8, 0) with w = 1.5. The plain centroid is c = (2, 0, 0), so
    // d_i = (∓1.5, ∓0.8, 0) and ℓ² = 1.5² + 0.8² = 2.89. The optimum is F_i = w_i (λ + μ × d_i), C_i = w_i ℓ² μ (Lagrange
    // condition of min Σ|F_i|²/w_i + Σ|C_i|²/(w_i ℓ²) subject to equilibrium about c). With Σw = 5, Σw d_x = 1.5, Σw d_y = 0,
    // Σw d_x² = 11.25, Σw d_y² = 3.2, Σw d_x d_y = 0 and K = Σw ℓ² = 14.45 with couples (0 without), the six equations split:
    //   5 λ_x = R_x;   (3.2 + K) μ_x = M_x;
    //   5 λ_y + 1.5 μ_z = R_y,   1.5 λ_y + (14.45 + K) μ_z = M_z;
    //   5 λ_z − 1.5 μ_y = R_z,  −1.5 λ_z + (11.25 + K) μ_y = M_y.
    // R and M_c come from the fixture's loads, summed here in decimal.
    private static readonly (string Id, decimal X, decimal Y, decimal W)[] SkidSupports =
        [("S1", 0.5m, -0.8m, 1m), ("S2", 0.5m, 0.8m, 1m), ("S3", 3.5m, -0.8m, 1.5m), ("S4", 3.5m, 0.8m, 1.5m)];

    private static decimal[] Dec(JsonElement array) => [.. array.EnumerateArray().Select(e => e.GetDecimal())];

    // R and the moment about c = (2, 0, 0) of each case of the skid file, in decimal (the loads are written in kN and m).
    private static Dictionary<string, (decimal[] R, decimal[] M)> SkidCaseResultants()
    {
        using JsonDocument doc = JsonDocument.Parse(File.ReadAllText(Skid));
        var result = new Dictionary<string, (decimal[], decimal[])>();
        foreach (JsonProperty c in doc.RootElement.GetProperty("cases").EnumerateObject())
        {
            decimal[] r = new decimal[3], m = new decimal[3];
            foreach (JsonElement item in c.Value.GetProperty("loads").EnumerateArray())
            {
                decimal[] v = Dec(item.GetProperty("value"));
                if (item.GetProperty("kind").GetString() == "couple")
                {
                    m = [m[0] + v[0], m[1] + v[1], m[2] + v[2]];
                    continue;
                }
                Assert.Equal("force", item.GetProperty("kind").GetString());
                decimal[] at = Dec(item.GetProperty("at"));
                decimal dx = at[0] - 2, dy = at[1], dz = at[2];
                r = [r[0] + v[0], r[1] + v[1], r[2] + v[2]];
                m = [m[0] + (dy * v[2]) - (dz * v[1]), m[1] + (dz * v[0]) - (dx * v[2]), m[2] + (dx * v[1]) - (dy * v[0])];
            }
            result[c.Name] = (r, m);
        }
        return result;
    }

    private static (decimal[] F, decimal[] C)[] SkidClosedForm(decimal[] r, decimal[] m, bool couples)
    {
        decimal k = couples ? 14.45m : 0m;
        decimal lx = r[0] / 5, mx = m[0] / (3.2m + k);
        decimal dz = (5 * (11.25m + k)) - 2.25m, lz = ((r[2] * (11.25m + k)) + (1.5m * m[1])) / dz, my = ((5 * m[1]) + (1.5m * r[2])) / dz;
        decimal dy = (5 * (14.45m + k)) - 2.25m, ly = ((r[1] * (14.45m + k)) - (1.5m * m[2])) / dy, mz = ((5 * m[2]) - (1.5m * r[1])) / dy;
        return [.. SkidSupports.Select(s =>
        {
            decimal x = s.X - 2, y = s.Y;
            decimal[] f = [s.W * (lx - (mz * y)), s.W * (ly + (mz * x)), s.W * (lz + (mx * y) - (my * x))];
            decimal[] c = couples ? [s.W * 2.89m * mx, s.W * 2.89m * my, s.W * 2.89m * mz] : [0m, 0m, 0m];
            return (f, c);
        })];
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Skid_support_forces_match_the_closed_form_and_carry_each_case_resultant(bool couples)
    {
        // The layout the closed form above assumes.
        Assert.Equal("id,x,y,z,weight\nS1,0.5,-0.8,0,1\nS2,0.5,0.8,0,1\nS3,3.5,-0.8,0,1.5\nS4,3.5,0.8,0,1.5\n",
            File.ReadAllText(Supports).ReplaceLineEndings("\n"));
        string[] args = couples ? ["distribute", Skid, "--onto", Supports, "--couples"] : ["distribute", Skid, "--onto", Supports];
        CliRun run = CliProcess.Run(args);
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument output = JsonDocument.Parse(run.Stdout);
        var resultants = SkidCaseResultants();
        Assert.Equal(["weight", "operating", "seismic-y"], output.RootElement.GetProperty("cases").EnumerateObject().Select(c => c.Name));
        foreach (JsonProperty c in output.RootElement.GetProperty("cases").EnumerateObject())
        {
            (decimal[] r, decimal[] m) = resultants[c.Name];
            var expected = SkidClosedForm(r, m, couples);
            JsonElement[] loads = [.. c.Value.GetProperty("loads").EnumerateArray()];
            decimal scale = expected.Max(e => e.F.Concat(e.C).Max(Math.Abs));
            decimal allowed = 1e-12m * scale;
            decimal[] sumF = new decimal[3], sumM = new decimal[3];
            for (int i = 0; i < 4; i++)
            {
                JsonElement force = loads[i];
                Assert.Equal(SkidSupports[i].Id, force.GetProperty("id").GetString());
                Assert.Equal("force", force.GetProperty("kind").GetString());
                decimal[] f = Dec(force.GetProperty("value"));
                for (int k = 0; k < 3; k++)
                {
                    Assert.True(Math.Abs(f[k] - expected[i].F[k]) <= allowed, $"{c.Name} {SkidSupports[i].Id} F[{k}] = {f[k]}, expected {expected[i].F[k]}");
                }
                decimal dx = SkidSupports[i].X - 2, dy = SkidSupports[i].Y;
                sumF = [sumF[0] + f[0], sumF[1] + f[1], sumF[2] + f[2]];
                sumM = [sumM[0] + (dy * f[2]), sumM[1] - (dx * f[2]), sumM[2] + (dx * f[1]) - (dy * f[0])];
            }
            // Couples follow the forces, only the non-zero ones, named after their point.
            foreach (JsonElement couple in loads.Skip(4))
            {
                Assert.True(couples, "a couple without --couples");
                Assert.Equal("couple", couple.GetProperty("kind").GetString());
                int i = Array.FindIndex(SkidSupports, s => s.Id + "-couple" == couple.GetProperty("id").GetString());
                decimal[] v = Dec(couple.GetProperty("value"));
                for (int k = 0; k < 3; k++)
                {
                    Assert.True(Math.Abs(v[k] - expected[i].C[k]) <= allowed, $"{c.Name} couple {i} [{k}] = {v[k]}, expected {expected[i].C[k]}");
                }
                sumM = [sumM[0] + v[0], sumM[1] + v[1], sumM[2] + v[2]];
            }
            Assert.Equal(couples ? 8 : 4, loads.Length);
            // The case's resultant, summed here from the written numbers (decimal), against the fixture's.
            for (int k = 0; k < 3; k++)
            {
                Assert.True(Math.Abs(sumF[k] - r[k]) <= allowed, $"{c.Name} ΣF[{k}] = {sumF[k]}, fixture {r[k]}");
                Assert.True(Math.Abs(sumM[k] - m[k]) <= allowed * 4, $"{c.Name} ΣM[{k}] = {sumM[k]}, fixture {m[k]}");
            }
        }
        // Combinations are carried over as factors of the distributed cases.
        Assert.Equal("{ \"weight\": 1, \"operating\": 1 }".Replace(" ", ""),
            output.RootElement.GetProperty("combinations").GetProperty("operating-total").GetRawText().Replace(" ", ""));
    }

    [Fact]
    public void Skid_weight_case_without_couples_has_the_hand_values()
    {
        // By hand from the fixture (kN, m): R_z = −(6.9 + 7.3 + 11.8 + 12.4 + 5.1 + 5.5) = −49; about c = (2, 0, 0)
        // M_x = Σ y F_z = 0.7 (−0.4 − 0.6 − 0.4) = −0.98, M_y = −Σ (x − 2) F_z = −(1.8·14.2 − 1.8·10.6) = −6.48.
        // With the closed form above: μ_x = −0.98/3.2 = −0.30625; 5λ_z − 1.5μ_y = −49, −1.5λ_z + 11.25μ_y = −6.48 give
        // λ_z = −560.97/54, μ_y = −105.9/54; F_z = w (λ_z + μ_x y − μ_y (x − 2)):
        // S1 −13.085, S2 −13.575, S3 −10.8025, S4 −11.5375 (sum −49). Equal weights would give S1 −12.25 + 0.30625 − 1.08 = −13.02375 instead (μ_x = −0.98/2.56, μ_y = −6.48/9).
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", Supports, "--case", "weight");
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument output = JsonDocument.Parse(run.Stdout);
        JsonElement[] loads = [.. output.RootElement.GetProperty("cases").GetProperty("weight").GetProperty("loads").EnumerateArray()];
        double[][] expected = [[0, 0, -13.085], [0, 0, -13.575], [0, 0, -10.8025], [0, 0, -11.5375]];
        Assert.Equal(4, loads.Length);
        for (int i = 0; i < 4; i++)
        {
            double[] v = [.. loads[i].GetProperty("value").EnumerateArray().Select(e => e.GetDouble())];
            for (int k = 0; k < 3; k++)
            {
                Assert.True(Math.Abs(v[k] - expected[i][k]) <= 1e-12 * 49, $"S{i + 1}[{k}] = {v[k]:R}, expected {expected[i][k]}");
            }
        }
    }

    [Fact]
    public void The_written_substitute_is_canonical_and_reads_back_the_forces_printed_to_standard_output()
    {
        using var dir = new TempFolder();
        string output = Path.Combine(dir.Path, "supports.loads.json");
        Assert.Equal(0, CliProcess.Run("distribute", Skid, "--onto", Supports, "--couples", "-o", output).ExitCode);
        CliRun fmt = CliProcess.Run("fmt", "--check", output);
        Assert.True(fmt.ExitCode == 0, fmt.ToString());
        // without -o the same text goes to standard output
        CliRun stdout = CliProcess.Run("distribute", Skid, "--onto", Supports, "--couples");
        Assert.Equal(File.ReadAllText(output), stdout.Stdout);
        // what the file says about itself is a note, not a comment (the canonical form has none)
        string text = File.ReadAllText(output);
        Assert.DoesNotContain("/*", text, StringComparison.Ordinal);
        Assert.Contains("\"note\": \"Written by loaddiff", text, StringComparison.Ordinal);
    }

    [Fact]
    public void Bolt_group_on_a_square_gets_the_elastic_method_forces()
    {
        // AISC Manual Part 7 / Salmon, Johnson & Malhas, Steel Structures, 5th ed., eccentric shear, elastic method
        // (section details from memory): 100 kN parallel to one side of a 100 mm square group at 200 mm from its
        // centroid: two bolts carry 90.14 kN, two 55.90 kN.
        using var dir = new TempFolder();
        string load = dir.Write("bracket.loads.json", """
            { "units": { "force": "kN", "length": "mm" }, "cases": { "shear": { "loads": [
              { "id": "P", "kind": "force", "at": [200, 0, 0], "value": [0, -100, 0] } ] } } }
            """);
        string bolts = dir.Write("bolts.csv", "id,x,y,z\nb1,-50,-50,0\nb2,50,-50,0\nb3,50,50,0\nb4,-50,50,0\n");
        CliRun run = CliProcess.Run("distribute", load, "--onto", bolts);
        Assert.True(run.ExitCode == 0, run.ToString());
        using JsonDocument doc = JsonDocument.Parse(run.Stdout, new JsonDocumentOptions { CommentHandling = JsonCommentHandling.Skip });
        double[] magnitudes = [.. doc.RootElement.GetProperty("cases").GetProperty("shear").GetProperty("loads").EnumerateArray()
            .Select(l => Math.Sqrt(l.GetProperty("value").EnumerateArray().Sum(c => c.GetDouble() * c.GetDouble())))];
        Assert.Equal([55.90, 90.14, 90.14, 55.90], magnitudes.Select(m => Math.Round(m, 2)));
    }

    [Fact]
    public void Collinear_points_refuse_a_twist_about_their_line_with_exit_2_and_accept_it_with_couples()
    {
        using var dir = new TempFolder();
        string line = CliProcess.Fixture("equipment-skid", "support-points-in-line.csv");
        string output = Path.Combine(dir.Path, "out.loads.json");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", line, "-o", output);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("rank 5 of 6", run.Stderr);
        Assert.Contains("lie on one line", run.Stderr);
        Assert.False(File.Exists(output));
        CliRun couples = CliProcess.Run("distribute", Skid, "--onto", line, "--couples", "-o", output);
        Assert.True(couples.ExitCode == 0, couples.ToString());
        Assert.Equal(0, CliProcess.Run("check", Skid, output).ExitCode);
    }

    [Fact]
    public void Output_over_an_input_is_refused_and_the_input_is_unchanged()
    {
        using var dir = new TempFolder();
        string copy = dir.Write("skid.loads.json", File.ReadAllText(Skid));
        byte[] before = File.ReadAllBytes(copy);
        CliRun run = CliProcess.Run("distribute", copy, "--onto", Supports, "-o", copy);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("input file", run.Stderr);
        Assert.Equal(before, File.ReadAllBytes(copy));
    }

    [Fact]
    public void Bad_points_file_names_the_file_line_and_column()
    {
        using var dir = new TempFolder();
        string bad = dir.Write("points.csv", "id,x,y,z,weight\nS1,0,0,0,1\nS2,1,0,zero,1\n");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", bad);
        Assert.Equal(2, run.ExitCode);
        Assert.Contains("points.csv:3:8: error LD062", run.Stderr);
        string negative = dir.Write("weights.csv", "id,x,y,z,weight\nS1,0,0,0,-1\n");
        CliRun w = CliProcess.Run("distribute", Skid, "--onto", negative);
        Assert.Equal(2, w.ExitCode);
        Assert.Contains("LD021", w.Stderr);
        string missing = dir.Write("nocol.csv", "id,x,y\nS1,0,0\n");
        Assert.Contains("LD060", CliProcess.Run("distribute", Skid, "--onto", missing).Stderr);
    }

    [Fact]
    public void A_points_file_with_no_rows_exits_2_with_LD073()
    {
        using var dir = new TempFolder();
        string empty = dir.Write("points.csv", "id,x,y,z\n");
        CliRun run = CliProcess.Run("distribute", Skid, "--onto", empty);
        Assert.Equal(2, run.ExitCode);
        string line = Assert.Single(run.StderrLines);
        Assert.Contains("points.csv", line);
        Assert.Contains("LD073", line);
        Assert.DoesNotContain("   at ", run.Stderr);
    }
}
