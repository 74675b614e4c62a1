namespace LoadDiff.Core.Units;

/// <summary>The units a load description is written in; moments are force × length.</summary>
/// <param name="Force">Force unit.</param>
/// <param name="Length">Length unit.</param>
/// <param name="Mass">Mass unit.</param>
public sealed record UnitSystem(Unit Force, Unit Length, Unit Mass)
{
    /// <summary>SI: N, m, kg.</summary>
    public static UnitSystem Si { get; } = new(UnitCatalog.Newton, UnitCatalog.Metre, UnitCatalog.Kilogram);

    /// <summary>The moment unit's symbol, for example <c>kN·m</c>.</summary>
    public string MomentSymbol => Force.Symbol + "·" + Length.Symbol;

    /// <inheritdoc/>
    public override string ToString() => $"{Force.Symbol}, {Length.Symbol}, {Mass.Symbol}";
}
