namespace LoadDiff.Cli.Tests.Support;

/// <summary>One load case worked by hand: each item as its resultant force at its centroid, and the box of its loaded geometry.</summary>
/// <param name="Forces">Item resultants (kN) at their points of application (m).</param>
/// <param name="BoxMin">Least corner of the box of the items' geometry (polygon and segment ends, force points), m.</param>
/// <param name="BoxMax">Greatest corner of that box, m.</param>
public sealed record HandCase(IReadOnlyList<(Dec3 At, Dec3 Force)> Forces, Dec3 BoxMin, Dec3 BoxMax)
{
    public Dec3 Resultant => HandStatics.Resultant(Forces);

    public Dec3 MomentAbout(Dec3 point) => HandStatics.MomentAbout(point, Forces);

    /// <summary>G_F = Σ|F_i| (for a uniform distributed load ∫|w| = |total|).</summary>
    public decimal GrossForce => Forces.Sum(f => f.Force.Norm);

    /// <summary>D, the diagonal of the loaded box.</summary>
    public decimal Diagonal => (BoxMax - BoxMin).Norm;

    public IEnumerable<Dec3> Corners =>
        from x in new[] { BoxMin.X, BoxMax.X }
        from y in new[] { BoxMin.Y, BoxMax.Y }
        from z in new[] { BoxMin.Z, BoxMax.Z }
        select new Dec3(x, y, z);

    /// <summary>The box holding both boxes.</summary>
    public static (Dec3 Min, Dec3 Max) Union(HandCase a, HandCase b) => (
        new Dec3(Math.Min(a.BoxMin.X, b.BoxMin.X), Math.Min(a.BoxMin.Y, b.BoxMin.Y), Math.Min(a.BoxMin.Z, b.BoxMin.Z)),
        new Dec3(Math.Max(a.BoxMax.X, b.BoxMax.X), Math.Max(a.BoxMax.Y, b.BoxMax.Y), Math.Max(a.BoxMax.Z, b.BoxMax.Z)));

    /// <summary>A factored sum of cases (all factors non-zero, so every case's box counts).</summary>
    public static HandCase Combine(IEnumerable<(HandCase Case, decimal Factor)> parts)
    {
        var list = parts.ToList();
        HandCase box = list.Select(p => p.Case).Aggregate((a, b) =>
        {
            (Dec3 min, Dec3 max) = Union(a, b);
            return new HandCase([], min, max);
        });
        return new HandCase([.. list.SelectMany(p => p.Case.Forces.Select(f => (f.At, p.Factor * f.Force)))], box.BoxMin, box.BoxMax);
    }
}

/// <summary>
/// The footbridge demo files (fixtures/footbridge, an invented scenario) reduced by hand in kN and m, read off the files
/// by inspection. Uniform line and area loads are replaced by their totals at their centroids, which have the same
/// resultant and the same moment about every point (statics of distributed loads, e.g. Hibbeler, Engineering Mechanics:
/// Statics, distributed loadings — section from memory). Masses weigh m·g_n, g_n = 9.80665 m/s² (3rd CGPM, 1901).
/// </summary>
public static class FootbridgeByHand
{
    private static Dec3 V(decimal x, decimal y, decimal z) => new(x, y, z);

    private static Dec3 Down(decimal kn) => new(0, 0, -kn);

    // dead: deck plate 24 m × 3 m × 4 kN/m² = 288 kN at the plate's centre; parapets 0.8 kN/m × 24 m = 19.2 kN at
    // the middle of each edge y = ±1.5. Box: x 0…24, y −1.5…1.5, z = 0.
    private static readonly HandCase DetailedDead = new(
        [(V(12, 0, 0), Down(288)), (V(12, -1.5m, 0), Down(19.2m)), (V(12, 1.5m, 0), Down(19.2m))], V(0, -1.5m, 0), V(24, 1.5m, 0));

    // surfacing: 24 m × 2.6 m × 1.2 kN/m² = 74.88 kN at (12, 0, 0). Box: x 0…24, y −1.3…1.3, z = 0.
    private static readonly HandCase DetailedSurfacing = new([(V(12, 0, 0), Down(74.88m))], V(0, -1.3m, 0), V(24, 1.3m, 0));

    // vehicle: wheels 20, 20 at x = 10.5 and 10, 10 at x = 13.5, y = ±0.8; tank 800 kg × 9.80665 m/s² = 7.84532 kN at
    // (12, 0, 1.2). Box: x 10.5…13.5, y −0.8…0.8, z 0…1.2, so D = √(3² + 1.6² + 1.2²) = √13.
    private static HandCase DetailedVehicle(decimal rearWheel, decimal tankKg) => new(
        [(V(10.5m, -0.8m, 0), Down(rearWheel)), (V(10.5m, 0.8m, 0), Down(rearWheel)),
         (V(13.5m, -0.8m, 0), Down(10)), (V(13.5m, 0.8m, 0), Down(10)),
         (V(12, 0, 1.2m), Down(tankKg * 9.80665m / 1000))], V(10.5m, -0.8m, 0), V(13.5m, 0.8m, 1.2m));

    // wind: parapet face 24 m × 1.1 m × 0.9 kN/m² = 23.76 kN towards +y at the face's centre (12, −1.5, 0.55).
    // Box: x 0…24, y = −1.5, z 0…1.1.
    private static readonly HandCase DetailedWind = new([(V(12, -1.5m, 0.55m), V(0, 23.76m, 0))], V(0, -1.5m, 0), V(24, -1.5m, 1.1m));

    /// <summary>detailed.loads.json.</summary>
    public static IReadOnlyDictionary<string, HandCase> Detailed { get; } = new Dictionary<string, HandCase>
    {
        ["dead"] = DetailedDead,
        ["surfacing"] = DetailedSurfacing,
        ["vehicle"] = DetailedVehicle(20, 800),
        ["wind"] = DetailedWind,
    };

    /// <summary>
    /// detailed-rev-b.loads.json: rear wheels 22 kN, tank 1000 kg (9.80665 kN), and a 1.8 kN lighting column at
    /// (12, 1.5, 0) in dead, inside dead's box.
    /// </summary>
    public static IReadOnlyDictionary<string, HandCase> RevisionB { get; } = new Dictionary<string, HandCase>
    {
        ["dead"] = DetailedDead with { Forces = [.. DetailedDead.Forces, (V(12, 1.5m, 0), Down(1.8m))] },
        ["surfacing"] = DetailedSurfacing,
        ["vehicle"] = DetailedVehicle(22, 1000),
        ["wind"] = DetailedWind,
    };

    // simplified dead: two girder lines 6.8 kN/m × 24 m = 163.2 kN each at (12, ±0.75, 0). Box: x 0…24, y −0.75…0.75, z = 0.
    // surfacing: 3.12 kN/m × 24 m = 74.88 kN at (12, 0, 0); box x 0…24 on the centre line.
    // vehicle: axles 40 kN at x = 10.5 and 20 kN at x = 13.5 on the centre line, the tank as 7.84532 kN at (12, 0, 0).
    // wind: 0.99 kN/m × 24 m = 23.76 kN towards +y at (12, −1.5, 0.55); box x 0…24 at y = −1.5, z = 0.55.
    private static Dictionary<string, HandCase> Girders(bool withTank) => new()
    {
        ["dead"] = new([(V(12, -0.75m, 0), Down(163.2m)), (V(12, 0.75m, 0), Down(163.2m))], V(0, -0.75m, 0), V(24, 0.75m, 0)),
        ["surfacing"] = new([(V(12, 0, 0), Down(74.88m))], V(0, 0, 0), V(24, 0, 0)),
        ["vehicle"] = new(withTank
            ? [(V(10.5m, 0, 0), Down(40)), (V(13.5m, 0, 0), Down(20)), (V(12, 0, 0), Down(7.84532m))]
            : [(V(10.5m, 0, 0), Down(40)), (V(13.5m, 0, 0), Down(20))], V(10.5m, 0, 0), V(13.5m, 0, 0)),
        ["wind"] = new([(V(12, -1.5m, 0.55m), V(0, 23.76m, 0))], V(0, -1.5m, 0.55m), V(24, -1.5m, 0.55m)),
    };

    /// <summary>simplified.loads.json.</summary>
    public static IReadOnlyDictionary<string, HandCase> Simplified { get; } = Girders(withTank: true);

    /// <summary>simplified-no-tank.loads.json: the vehicle without its tank.</summary>
    public static IReadOnlyDictionary<string, HandCase> NoTank { get; } = Girders(withTank: false);

    /// <summary>The combinations of every footbridge file (EN 1990 (6.10) factors as the files state them).</summary>
    public static IReadOnlyList<(string Name, (string Case, decimal Factor)[] Factors)> Combinations { get; } =
    [
        ("uls-vehicle", [("dead", 1.35m), ("surfacing", 1.35m), ("vehicle", 1.5m), ("wind", 0.9m)]),
        ("characteristic", [("dead", 1), ("surfacing", 1), ("vehicle", 1), ("wind", 1)]),
    ];

    /// <summary>Every case and then every combination of a file, by name, in the files' order.</summary>
    public static IEnumerable<(string Name, string Kind, HandCase Case)> Entries(IReadOnlyDictionary<string, HandCase> file) =>
        new[] { "dead", "surfacing", "vehicle", "wind" }.Select(n => (n, "case", file[n]))
            .Concat(Combinations.Select(c => (c.Name, "combination", HandCase.Combine(c.Factors.Select(f => (file[f.Case], f.Factor))))));

    /// <summary>
    /// The load centroid Σ|F_i| r_i / Σ|F_i| over every item of every case of a file (for uniform loads ∫|w| r = |total|
    /// × centroid): the point <c>check</c> and <c>diff</c> take by default (SPEC §4).
    /// </summary>
    public static Dec3 LoadCentroid(IReadOnlyDictionary<string, HandCase> file)
    {
        var all = file.Values.SelectMany(c => c.Forces).ToList();
        decimal gross = all.Sum(f => f.Force.Norm);
        return all.Aggregate(Dec3.Zero, (s, f) => s + (f.Force.Norm * f.At)) / gross;
    }
}
