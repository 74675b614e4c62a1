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
    [InlineData("tf", "9806.65")]          // 1 tf = 1000 kgf (CHECK-VALUES, NIST SP 811 B.8)
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
