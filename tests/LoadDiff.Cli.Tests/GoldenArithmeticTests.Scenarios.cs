namespace LoadDiff.Cli.Tests;

/// <summary>The two golden scenarios worked by hand from the fixture files.</summary>
public partial class GoldenArithmeticTests
{
    private static V P(decimal x, decimal y, decimal z) => new(x, y, z);

    private static Item Down(decimal f, V at) => new(P(0, 0, -f), at, f);

    private static List<Item> Scaled(decimal k, List<Item> items) => items.Select(i => new Item(k * i.Force, i.At, Math.Abs(k) * i.Gross)).ToList();

    [Fact]
    public void Every_number_of_the_reversed_wall_golden_is_the_hydrostatic_arithmetic()
    {
        // fixtures/tank-wall: wall x = 0, 0 ≤ y ≤ b = 6, 0 ≤ z ≤ h = 4, p = γ(h − z), γ = 9.81, pushing +x.
        // Pressure prism: F = γbh²/2 acting h/3 above the floor, centre of the width (Munson et al., Fundamentals of
        // Fluid Mechanics, hydrostatic force on a plane surface; CHECK-VALUES.md). p ≥ 0, so ∫|p| dA = F.
        decimal gamma = 9.81m, b = 6, h = 4;
        decimal force = gamma * b * h * h / 2;                           // 470.88
        var original = new List<Item> { new(P(force, 0, 0), P(0, b / 2, h / 3), force) };
        // Substitute line (0,3,0)→(0,3,4), w from 0 to 235.44 kN/m: R = L(w1 + w2)/2, acting 2L/3 from the w1 end (SPEC §2).
        decimal w2 = 235.44m;
        var substitute = new List<Item> { new(P(h * w2 / 2, 0, 0), P(0, 3, 2 * h / 3), h * w2 / 2) };
        var e = new Entry("water", "case", original, substitute, new Box(P(0, 0, 0), P(0, b, h)), new Box(P(0, 3, 0), P(0, 3, h)));
        // Load centroid ∫|p| r dA / ∫|p| dA = the centre of pressure here (SPEC §4 conventions).
        V p = P(0, b / 2, h / 3);
        Derived d = Derive(e, p);
        Assert.Equal(0m, Round6(d.DrNorm));
        // ΔR = 0, so the residual couple is the same at every corner: 470.88 × (2h/3 − h/3) = 627.84.
        Assert.Equal(627.84m, Round6(d.WorstDm));
        // A couple residual read as a shifted resultant: s = R × ΔM / |R|² (SPEC §4), the original's line through the
        // point nearest the box centre C: C + R × M_o(C) / |R|².
        V shift = (1 / d.Ro.Dot(d.Ro)) * V.Cross(d.Ro, d.DmAtCentre);
        V mOriginalAtCentre = Moment(original, d.CentreOfBox);
        V onLine = d.CentreOfBox + ((1 / d.Ro.Dot(d.Ro)) * V.Cross(d.Ro, mOriginalAtCentre));
        Assert.Equal(0m, Round6(shift.X));
        Assert.Equal(0m, Round6(shift.Y));
        Assert.True(shift.Z > 0);   // "too far in +z"

        var expected = new List<(decimal, string)>
        {
            (1, "failing entries"), (1, "entries (one case, no combinations)"),
            (p.X, "P.x"), (p.Y, "P.y = b/2"), (p.Z, "P.z = h/3"),
            (Rel, "rel"), (0, "F"), (0, "M"),
            (d.DrNorm, "|ΔR| = 470.88 − 4·235.44/2"), (d.AllowF, "rel·γbh²/2"),
            (d.WorstDm, "γbh²/2 · h/3"), (d.AllowM, "rel·γbh²/2·√(b² + h²)"),
            (d.WorstDm, "worst |ΔM| (sentence)"), (d.AllowM, "allowed (sentence)"),
            (shift.Length, "|s| = |R × ΔM|/|R|²"),
            (shift.X, "s.x"), (shift.Y, "s.y"), (shift.Z, "s.z"),
            (onLine.X, "line point x"), (onLine.Y, "line point y"), (onLine.Z, "line point z"),
            (1, "failing entries"), (1, "entries"),
        };
        string md = ReadGolden("check-tank-wall-reversed.verified.md");
        AssertNumbers(expected, NumbersOf(md));
        AssertVerdicts(md, [(e, d)]);
        AssertNotes(md, "fixtures/tank-wall/detailed.loads.json", "fixtures/tank-wall/simplified-reversed.loads.json");
    }

    [Fact]
    public void Every_number_of_the_forgotten_tank_golden_is_the_footbridge_arithmetic()
    {
        // fixtures/footbridge, detailed: uniform loads act at the centroids of their rectangles and segments.
        var dead = new List<Item>
        {
            Down(4 * 24 * 3m, P(12, 0, 0)),          // deck plate 4 kN/m² on 24 × 3 m
            Down(0.8m * 24, P(12, -1.5m, 0)),         // parapets 0.8 kN/m over 24 m
            Down(0.8m * 24, P(12, 1.5m, 0)),
        };
        var surfacing = new List<Item> { Down(1.2m * 24 * 2.6m, P(12, 0, 0)) };
        // 800 kg × 9.80665 m/s² = 7845.32 N = 7.84532 kN (mass × standard gravity, kN = 1000 N).
        decimal tank = 800 * Gn / 1000;
        var vehicle = new List<Item>
        {
            Down(20, P(10.5m, -0.8m, 0)), Down(20, P(10.5m, 0.8m, 0)), Down(10, P(13.5m, -0.8m, 0)), Down(10, P(13.5m, 0.8m, 0)),
            Down(tank, P(12, 0, 1.2m)),
        };
        var wind = new List<Item> { new(P(0, 0.9m * 24 * 1.1m, 0), P(12, -1.5m, 0.55m), 0.9m * 24 * 1.1m) };
        // Substitute (girder-line model).
        var deadS = new List<Item> { Down(6.8m * 24, P(12, -0.75m, 0)), Down(6.8m * 24, P(12, 0.75m, 0)) };
        var surfacingS = new List<Item> { Down(3.12m * 24, P(12, 0, 0)) };
        var vehicleS = new List<Item> { Down(40, P(10.5m, 0, 0)), Down(20, P(13.5m, 0, 0)) };
        var windS = new List<Item> { new(P(0, 0.99m * 24, 0), P(12, -1.5m, 0.55m), 0.99m * 24) };
        // Loaded boxes read off the fixtures' coordinates.
        var cases = new List<Entry>
        {
            new("dead", "case", dead, deadS, new Box(P(0, -1.5m, 0), P(24, 1.5m, 0)), new Box(P(0, -0.75m, 0), P(24, 0.75m, 0))),
            new("surfacing", "case", surfacing, surfacingS, new Box(P(0, -1.3m, 0), P(24, 1.3m, 0)), new Box(P(0, 0, 0), P(24, 0, 0))),
            new("vehicle", "case", vehicle, vehicleS, new Box(P(10.5m, -0.8m, 0), P(13.5m, 0.8m, 1.2m)), new Box(P(10.5m, 0, 0), P(13.5m, 0, 0))),
            new("wind", "case", wind, windS, new Box(P(0, -1.5m, 0), P(24, -1.5m, 1.1m)), new Box(P(0, -1.5m, 0.55m), P(24, -1.5m, 0.55m))),
        };
        Entry Combine(string name, decimal[] factors)
        {
            var o = cases.Zip(factors).SelectMany(x => Scaled(x.Second, x.First.Original)).ToList();
            var s = cases.Zip(factors).SelectMany(x => Scaled(x.Second, x.First.Substitute)).ToList();
            return new Entry(name, "combination", o, s,
                cases.Select(c => c.OriginalBox).Aggregate((a, x) => a.Union(x)), cases.Select(c => c.SubstituteBox).Aggregate((a, x) => a.Union(x)));
        }
        // The fixtures' combinations (every factor non-zero, so every case's box counts).
        var entries = new List<Entry>(cases) { Combine("uls-vehicle", [1.35m, 1.35m, 1.5m, 0.9m]), Combine("characteristic", [1, 1, 1, 1]) };

        // Reference: the original's load centroid Σ|F_i| r_i / Σ|F_i| over all its cases (SPEC §4 conventions).
        var all = cases.SelectMany(c => c.Original).ToList();
        decimal gross = all.Sum(i => i.Gross);
        V p = (1 / gross) * all.Aggregate(V.Zero, (a, i) => a + (i.Gross * i.At));
        var derived = entries.Select(x => (E: x, D: Derive(x, p))).ToList();

        var expected = new List<(decimal, string)>();
        int failing = derived.Count(x => !x.D.Pass);
        expected.AddRange([(failing, "failing entries"), (entries.Count, "4 cases + 2 combinations")]);
        expected.AddRange([(p.X, "P.x = Σ|F|x/Σ|F|"), (p.Y, "P.y"), (p.Z, "P.z"), (Rel, "rel"), (0, "F"), (0, "M")]);
        foreach ((Entry e, Derived d) in derived)
        {
            expected.AddRange([
                (d.DrNorm, $"{e.Name}: |ΔR|"), (d.AllowF, $"{e.Name}: rel·G_F"),
                (d.WorstDm, $"{e.Name}: max over box corners |ΔM_Q|"), (d.AllowM, $"{e.Name}: rel·G_F·D"),
            ]);
        }
        foreach ((Entry e, Derived d) in derived.Where(x => !x.D.Pass))
        {
            expected.AddRange([(d.DrNorm, $"{e.Name}: |ΔR|"), (d.AllowF, "allowed"), (d.WorstDm, "worst |ΔM|"), (d.AllowM, "allowed")]);
            // The missing force is −ΔR along the residual's central axis; the point printed is the axis point nearest
            // the box centre C: C + (ΔR × ΔM_C)/|ΔR|² (SPEC §2 central axis, taken about C).
            V lack = -d.Dr;
            V axis = d.CentreOfBox + ((1 / d.Dr.Dot(d.Dr)) * V.Cross(d.Dr, d.DmAtCentre));
            V dir = (1 / lack.Length) * lack;
            expected.AddRange([(lack.X, "lacking force x"), (lack.Y, "y"), (lack.Z, "z = −factor·800 kg·g")]);
            expected.AddRange([(axis.X, "axis point x (tank's x)"), (axis.Y, "y"), (axis.Z, "z (box centre height)")]);
            expected.AddRange([(dir.X, "direction x"), (dir.Y, "y"), (dir.Z, "z")]);
            if (e.Kind == "combination")
            {
                // "of case 'vehicle' (×factor)": the factor of the vehicle case in the fixture's combination.
                expected.Add((e.Name == "uls-vehicle" ? 1.5m : 1m, "vehicle factor"));
            }
        }
        expected.AddRange([(failing, "failing entries"), (entries.Count, "entries")]);

        string md = ReadGolden("check-footbridge-no-tank.verified.md");
        AssertNumbers(expected, NumbersOf(md));
        AssertVerdicts(md, derived);
        AssertNotes(md, "fixtures/footbridge/detailed.loads.json", "fixtures/footbridge/simplified-no-tank.loads.json");
        // Hand values beside the derivation, so a slip in the helpers above shows too (worked on paper):
        Assert.Equal(7.84532m, tank);
        Assert.Equal(13.3370m, Round6(tank * Sqrt(1.5m * 1.5m + 0.8m * 0.8m)));        // corner (10.5|13.5, ±0.8): √2.89 = 1.7
        Assert.Equal(142.315m, Round6(1.5m * tank * Sqrt(12 * 12 + 1.5m * 1.5m)));     // corner (0|24, ±1.5)
        Assert.Equal(7.89456m, Round6(Rel * 326.4m * Sqrt(585)));                      // 326.4 kN × √(24² + 3²)
    }
}
