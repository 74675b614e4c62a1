using System.Collections.Immutable;
using LoadDiff.Core.Model;
using LoadDiff.Core.Tests.Support;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests;

public class DocumentHeaderTests
{
    private static DocumentHeader Header(bool force, bool length, bool mass) =>
        new("bay 2", UnitSystem.Si, UnitSystem.Si, ImmutableSortedDictionary<string, Vector3>.Empty.Add("A", Vector3.Create(1, 2, 3)))
        {
            ForceUnitStated = force,
            LengthUnitStated = length,
            MassUnitStated = mass,
        };

    [Fact]
    public void Equality_counts_which_units_were_stated()
    {
        EqualityContract.Check(Header(true, false, false), Header(true, false, false), Header(true, true, false), (a, b) => a == b, (a, b) => a != b);
        Assert.NotEqual(Header(false, false, false), Header(true, false, false));
        Assert.NotEqual(Header(false, false, false), Header(false, false, true));
    }

    [Fact]
    public void Constructor_without_the_flags_says_no_unit_was_stated()
    {
        var h = new DocumentHeader(null, UnitSystem.Si, UnitSystem.Si, ImmutableSortedDictionary<string, Vector3>.Empty);
        Assert.False(h.ForceUnitStated || h.LengthUnitStated || h.MassUnitStated);
    }
}
