using LoadDiff.Core.Units;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests;

public class UnitCatalogTests
{
    // Conversion factors: NIST Special Publication 811 (2008), Appendix B.8.
    [Theory]
    [InlineData("lbf", "4.4482216152605")] // NIST SP 811 (2008), B.8: 0.45359237 kg × 9.80665 m/s²
    [InlineData("kip", "4448.2216152605")] // NIST SP 811 (2008), B.8: 1000 lbf
    [InlineData("kgf", "9.80665")]         // NIST SP 811 (2008), B.8
    [InlineData("tf", "9806.65")]          // metric ton-force, 1000 kgf (kgf from NIST SP 811 B.8); not SP 811's 2000-lbf "ton-force"
    [InlineData("kN", "1000")]
    [InlineData("MN", "1000000")]
    [InlineData("N", "1")]
    public void FindForce_symbol_exactSp811Factor(string symbol, string newtons)
    {
        Unit? unit = UnitCatalog.FindForce(symbol);
        Assert.NotNull(unit);
        Assert.Equal(double.Parse(newtons, System.Globalization.CultureInfo.InvariantCulture), unit.ToSi);
    }

    [Theory]
    [InlineData("ft", "0.3048")] // NIST SP 811 (2008), B.8: exact
    [InlineData("in", "0.0254")] // NIST SP 811 (2008), B.8: exact
    [InlineData("mm", "0.001")]
    [InlineData("cm", "0.01")]
    [InlineData("m", "1")]
    public void FindLength_symbol_exactSp811Factor(string symbol, string metres)
    {
        Unit? unit = UnitCatalog.FindLength(symbol);
        Assert.NotNull(unit);
        Assert.Equal(double.Parse(metres, System.Globalization.CultureInfo.InvariantCulture), unit.ToSi);
    }

    [Theory]
    [InlineData("lb", "0.45359237")] // NIST SP 811 (2008), B.8: avoirdupois pound, exact
    [InlineData("t", "1000")]        // NIST SP 811 (2008): tonne
    [InlineData("kg", "1")]
    public void FindMass_symbol_exactSp811Factor(string symbol, string kilograms)
    {
        Unit? unit = UnitCatalog.FindMass(symbol);
        Assert.NotNull(unit);
        Assert.Equal(double.Parse(kilograms, System.Globalization.CultureInfo.InvariantCulture), unit.ToSi);
    }

    [Fact]
    public void PoundForce_definition_equalsPoundTimesStandardGravityExactly()
    {
        // NIST SP 811 (2008), B.8 footnote: lbf = 0.45359237 kg × 9.80665 m/s²; checked in decimal, which is exact here.
        Assert.Equal(4.4482216152605m, 0.45359237m * 9.80665m);
        Assert.Equal((double)(0.45359237m * 9.80665m), UnitCatalog.PoundForce.ToSi);
        Assert.Equal((double)(1000m * 0.45359237m * 9.80665m), UnitCatalog.Kip.ToSi);
    }

    [Fact]
    public void TonneForce_isTheMetricTonForceOf1000Kgf_notThe2000LbfTonForce()
    {
        // "tf" is 1000 kgf = 1000 × 9.80665 N (kgf: NIST SP 811 (2008), B.8), exact in decimal. NIST SP 811 B.8's
        // "ton-force (2000 lbf)" is 2000 × 4.4482216152605 N = 8896.443230521 N (SP 811 lists 8.896443 E+03): a
        // different unit, about 9.3 % smaller, which "tf" must not be.
        Assert.Equal(9806.65m, 1000m * 9.80665m);
        Assert.Equal((double)(1000m * 9.80665m), UnitCatalog.TonneForce.ToSi);
        Assert.Equal(8896.443230521m, 2000m * 4.4482216152605m);
        Assert.NotEqual((double)(2000m * 4.4482216152605m), UnitCatalog.TonneForce.ToSi);
        Assert.Equal("tf", UnitCatalog.TonneForce.Symbol);
        Assert.Same(UnitCatalog.TonneForce, UnitCatalog.FindForce("tf"));
    }

    [Fact]
    public void FactorTo_tonneForceToKilonewton_is980665Thousandths()
    {
        // 1000 kgf / 1000 N = 9.80665 (NIST SP 811 B.8 kgf): three roundings of at most 2⁻⁵³ relative (both factors, the
        // quotient) against the double nearest the exact value.
        Close.Relative(9.80665, UnitCatalog.TonneForce.FactorTo(UnitCatalog.Kilonewton), 4.5e-16);
        Close.Relative(1 / 9.80665, UnitCatalog.Kilonewton.FactorTo(UnitCatalog.TonneForce), 4.5e-16);
    }

    [Fact]
    public void FactorTo_sameSymbolOtherInstance_exactlyOne()
    {
        // A unit equal by symbol converts by exactly 1, even when its factor was written differently (no rounding step).
        var kip = new Unit("kip", 1000 * 4.4482216152605);
        Assert.Equal(1.0, kip.FactorTo(UnitCatalog.Kip));
        Assert.Equal(1.0, UnitCatalog.Kip.FactorTo(kip));
        Assert.Throws<ArgumentNullException>(() => UnitCatalog.Kip.FactorTo(null!));
        Assert.Equal(1e-3, UnitCatalog.Millimetre.FactorTo(UnitCatalog.Metre));
        Assert.Equal(1000, UnitCatalog.Metre.FactorTo(UnitCatalog.Millimetre));
    }

    [Fact]
    public void UnitSystem_symbolsAndSi_asWritten()
    {
        var imperial = new UnitSystem(UnitCatalog.Kip, UnitCatalog.Foot, UnitCatalog.Pound);
        Assert.Equal("kip·ft", imperial.MomentSymbol);
        Assert.Equal("kip, ft, lb", imperial.ToString());
        Assert.Equal("kip", UnitCatalog.Kip.ToString());
        Assert.Equal(new UnitSystem(UnitCatalog.Newton, UnitCatalog.Metre, UnitCatalog.Kilogram), UnitSystem.Si);
        Assert.Equal("N·m", UnitSystem.Si.MomentSymbol);
    }

    [Fact]
    public void Catalog_lists_exactlyTheUnitsOfSpecSection3()
    {
        // SPEC §3: force N, kN, MN, lbf, kip, kgf, tf; length m, mm, cm, ft, in; mass kg, t, lb.
        Assert.Equal(["N", "kN", "MN", "lbf", "kip", "kgf", "tf"], UnitCatalog.ForceUnits.Select(u => u.Symbol));
        Assert.Equal(["m", "mm", "cm", "ft", "in"], UnitCatalog.LengthUnits.Select(u => u.Symbol));
        Assert.Equal(["kg", "t", "lb"], UnitCatalog.MassUnits.Select(u => u.Symbol));
        Assert.Null(UnitCatalog.FindLength("kN"));
        Assert.Null(UnitCatalog.FindMass("m"));
        Assert.Null(UnitCatalog.FindMass("T"));
    }

    [Fact]
    public void StandardGravity_value_is980665()
    {
        // 3rd CGPM (1901); NIST SP 330 (2008).
        Assert.Equal(9.80665, UnitCatalog.StandardGravity);
        Assert.Equal(UnitCatalog.StandardGravity, UnitCatalog.KilogramForce.ToSi);
    }

    [Theory]
    [InlineData("ft", "1.3558179483314004")] // lbf·ft: product of the exact definitions (NIST SP 811 lists 1.355818)
    [InlineData("in", "0.11298482902761670")] // lbf·in (NIST SP 811 lists 1.129848 E-01)
    public void MomentFactor_poundForceTimesLength_matchesSp811Product(string length, string newtonMetres)
    {
        double product = UnitCatalog.PoundForce.ToSi * UnitCatalog.FindLength(length)!.ToSi;
        // One rounding of the product of two rounded factors: within two ulps.
        Close.Relative(double.Parse(newtonMetres, System.Globalization.CultureInfo.InvariantCulture), product, 4.5e-16);
        Assert.Equal(1.3558179483314004m, 4.4482216152605m * 0.3048m);
        Assert.Equal(0.1129848290276167m, 4.4482216152605m * 0.0254m);
    }

    [Fact]
    public void FactorTo_kipToPoundForce_isOneThousand()
    {
        Close.Relative(1000, UnitCatalog.Kip.FactorTo(UnitCatalog.PoundForce), 2.3e-16);
        Close.Relative(12, UnitCatalog.Foot.FactorTo(UnitCatalog.Inch), 2.3e-16);
        Assert.Equal(1.0, UnitCatalog.Kip.FactorTo(UnitCatalog.Kip));
    }

    [Theory]
    [InlineData("KN")]
    [InlineData("kn")]
    [InlineData("lbs")]
    [InlineData("")]
    public void FindForce_unknownOrMiscasedSymbol_null(string symbol)
    {
        Assert.Null(UnitCatalog.FindForce(symbol));
    }
}
