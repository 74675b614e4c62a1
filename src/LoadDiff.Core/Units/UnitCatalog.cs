namespace LoadDiff.Core.Units;

/// <summary>
/// The force, length and mass units LoadDiff accepts, with the exact factors of NIST SP 811 (2008),
/// Appendix B.8. Names are matched exactly (case-sensitive): <c>kN</c> is not <c>KN</c>.
/// </summary>
public static class UnitCatalog
{
    /// <summary>Newton.</summary>
    public static readonly Unit Newton = new("N", 1);

    /// <summary>Kilonewton.</summary>
    public static readonly Unit Kilonewton = new("kN", 1e3);

    /// <summary>Meganewton.</summary>
    public static readonly Unit Meganewton = new("MN", 1e6);

    /// <summary>Pound-force: 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N exactly.</summary>
    public static readonly Unit PoundForce = new("lbf", 4.4482216152605);

    /// <summary>Kip, 1000 lbf.</summary>
    public static readonly Unit Kip = new("kip", 4448.2216152605);

    /// <summary>Kilogram-force, 9.80665 N.</summary>
    public static readonly Unit KilogramForce = new("kgf", 9.80665);

    /// <summary>
    /// Metric ton-force (tonne-force), 1000 kgf = 9806.65 N exactly. Not the "ton-force" of NIST SP 811 (2008), B.8,
    /// which is 2000 lbf = 8896.443230521 N.
    /// </summary>
    public static readonly Unit TonneForce = new("tf", 9806.65);

    /// <summary>Metre.</summary>
    public static readonly Unit Metre = new("m", 1);

    /// <summary>Millimetre.</summary>
    public static readonly Unit Millimetre = new("mm", 1e-3);

    /// <summary>Centimetre.</summary>
    public static readonly Unit Centimetre = new("cm", 1e-2);

    /// <summary>International foot, 0.3048 m exactly.</summary>
    public static readonly Unit Foot = new("ft", 0.3048);

    /// <summary>International inch, 0.0254 m exactly.</summary>
    public static readonly Unit Inch = new("in", 0.0254);

    /// <summary>Kilogram.</summary>
    public static readonly Unit Kilogram = new("kg", 1);

    /// <summary>Tonne, 1000 kg.</summary>
    public static readonly Unit Tonne = new("t", 1e3);

    /// <summary>Avoirdupois pound, 0.45359237 kg exactly.</summary>
    public static readonly Unit Pound = new("lb", 0.45359237);

    /// <summary>Standard acceleration of gravity g_n = 9.80665 m/s² (3rd CGPM, 1901).</summary>
    public const double StandardGravity = 9.80665;

    /// <summary>Force units by symbol.</summary>
    public static IReadOnlyList<Unit> ForceUnits { get; } = [Newton, Kilonewton, Meganewton, PoundForce, Kip, KilogramForce, TonneForce];

    /// <summary>Length units by symbol.</summary>
    public static IReadOnlyList<Unit> LengthUnits { get; } = [Metre, Millimetre, Centimetre, Foot, Inch];

    /// <summary>Mass units by symbol.</summary>
    public static IReadOnlyList<Unit> MassUnits { get; } = [Kilogram, Tonne, Pound];

    /// <summary>Finds a force unit by its exact symbol.</summary>
    public static Unit? FindForce(string symbol) => Find(ForceUnits, symbol);

    /// <summary>Finds a length unit by its exact symbol.</summary>
    public static Unit? FindLength(string symbol) => Find(LengthUnits, symbol);

    /// <summary>Finds a mass unit by its exact symbol.</summary>
    public static Unit? FindMass(string symbol) => Find(MassUnits, symbol);

    private static Unit? Find(IReadOnlyList<Unit> units, string symbol)
    {
        foreach (Unit u in units)
        {
            if (u.Symbol == symbol)
            {
                return u;
            }
        }
        return null;
    }
}
