using System.Collections.Immutable;
using LoadDiff.Core;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Tests.Equivalence;

// The factors below come from outside the project, never from UnitCatalog:
//   1000 mm = 1 m, 100 cm = 1 m, 10 mm = 1 cm: SI prefixes milli (10⁻³) and centi (10⁻²), NIST SP 330 (2008);
//   1 in = 0.0254 m and 1 ft = 0.3048 m exactly, NIST SP 811 (2008) Appendix B.8, so 25.4 mm per in,
//   304.8 mm per ft and 0.3048 / 0.0254 = 12 in per ft;
//   g_n = 9.80665 m/s² (3rd CGPM, 1901; NIST SP 330 (2008)), so 1 kgf = 9.80665 N;
//   1 lbf = 4.4482216152605 N, NIST SP 811 (2008) Appendix B.8 (1 kip = 1000 lbf, so kip/kN is the same ratio).
// The load layouts are invented scenarios (a floor bay, a canopy on site coordinates).
public class UnitSlipHintsTests
{
    private const double MillimetresPerMetre = 1000;          // SI prefix milli, NIST SP 330
    private const double CentimetresPerMetre = 100;           // SI prefix centi, NIST SP 330
    private const double MillimetresPerCentimetre = 10;       // SI prefixes, NIST SP 330
    private const double MillimetresPerInch = 25.4;           // 1 in = 0.0254 m exactly, NIST SP 811 B.8
    private const double MillimetresPerFoot = 304.8;          // 1 ft = 0.3048 m exactly, NIST SP 811 B.8
    private const double InchesPerFoot = 12;                  // 0.3048 m / 0.0254 m, NIST SP 811 B.8
    private const double NewtonsPerKilonewton = 1000;         // SI prefix kilo, NIST SP 330
    private const double StandardGravity = 9.80665;           // m/s², 3rd CGPM (1901), NIST SP 330
    private const double NewtonsPerPoundForce = 4.4482216152605; // NIST SP 811 B.8

    private static Vector3 V(double x, double y, double z) => Vector3.Create(x, y, z);

    // A floor bay 6 m × 4 m with one corner at the origin (kN, m): a uniform deck pressure, a parapet line load along
    // the back edge and a post load at a front corner.
    private static LoadItem[] FloorBay(Vector3 offset) =>
    [
        new AreaLoad("deck", [offset, offset + V(6, 0, 0), offset + V(6, 4, 0), offset + V(0, 4, 0)], 2.5, V(0, 0, -1), Vector3.Zero, offset),
        new LineLoad("parapet", offset + V(0, 4, 0), offset + V(6, 4, 0), V(0, 0, -1.2), V(0, 0, -1.2)),
        new PointForce("post", offset + V(6, 0, 0), V(0, 0, -8)),
    ];

    // The bay lumped to nodal forces: a quarter of the deck's 2.5 × 24 = 60 kN at each corner, half of the parapet's
    // 1.2 × 6 = 7.2 kN at each end, the post as it is. Uniform loads lumped this way keep the resultant and its line
    // (centroid of a rectangle at its centre, of a segment at its middle), and the nodes span the same box.
    private static PointForce[] LumpedBay(Vector3 offset) =>
    [
        new("n1", offset, V(0, 0, -15)),
        new("n2", offset + V(6, 0, 0), V(0, 0, -15 - 8)),
        new("n3", offset + V(6, 4, 0), V(0, 0, -15 - 3.6)),
        new("n4", offset + V(0, 4, 0), V(0, 0, -15 - 3.6)),
    ];

    // A canopy on survey coordinates (metres): far from the origin, so scaling about the origin moves it far away.
    private static readonly Vector3 Site = V(512_300, 6_104_800, 42);

    private static LoadReduction Reduce(IEnumerable<LoadItem> items) => Support.Reduce.About(Vector3.Zero, items);

    // Positions multiplied by k, forces unchanged: the file's lengths were written in a unit k times smaller than read.
    private static IEnumerable<LoadItem> LengthsTimes(IEnumerable<PointForce> items, double k) =>
        items.Select(f => (LoadItem)new PointForce(f.Id, f.At * k, f.Value));

    // Forces multiplied by k, positions unchanged.
    private static IEnumerable<LoadItem> ForcesTimes(IEnumerable<PointForce> items, double k) =>
        items.Select(f => (LoadItem)new PointForce(f.Id, f.At, f.Value * k));

    [Fact]
    public void Find_lumped_substitute_in_the_same_units_gives_no_hint()
    {
        Assert.Empty(UnitSlipHints.Find(Reduce(FloorBay(Vector3.Zero)), Reduce(LumpedBay(Vector3.Zero))));
        Assert.Empty(UnitSlipHints.Find(Reduce(FloorBay(Site)), Reduce(LumpedBay(Site))));
    }

    [Fact]
    public void Find_substitute_in_mm_read_as_m_hints_a_length_factor_of_1000()
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        LoadReduction substitute = Reduce(LengthsTimes(LumpedBay(Vector3.Zero), MillimetresPerMetre));
        UnitHint hint = Assert.Single(UnitSlipHints.Find(original, substitute));
        Assert.Equal("length-factor", hint.Code);
        Close.Relative(MillimetresPerMetre, hint.Factor!.Value, 1e-12);
        Assert.Contains("1000×", hint.Message, StringComparison.Ordinal);
        Assert.Contains("mm read as m?", hint.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(MillimetresPerMetre, "lengths in mm read as m", "lengths in m read as mm")]
    [InlineData(CentimetresPerMetre, "lengths in cm read as m", "lengths in m read as cm")]
    [InlineData(MillimetresPerCentimetre, "lengths in mm read as cm", "lengths in cm read as mm")]
    [InlineData(MillimetresPerInch, "lengths in mm read as in", "lengths in in read as mm")]
    [InlineData(MillimetresPerFoot, "lengths in mm read as ft", "lengths in ft read as mm")]
    [InlineData(InchesPerFoot, "lengths in in read as ft", "lengths in ft read as in")]
    public void Find_substitute_scaled_by_a_length_unit_ratio_hints_it_either_way_round(double k, string larger, string smaller)
    {
        // The bay at the origin corner shrinks into its own box (found by rescaling); on site it moves away (found as outside).
        foreach (Vector3 offset in new[] { Vector3.Zero, Site })
        {
            // Site coordinates near 6·10⁶ m times k round at about 10⁻¹⁶ of 10⁹ m: the measured ratio of diagonals of a few
            // metres (times k) then carries about 10⁻¹⁰ relative error.
            double tolerance = offset == Vector3.Zero ? 1e-12 : 1e-9;
            LoadReduction original = Reduce(FloorBay(offset));
            UnitHint up = Assert.Single(UnitSlipHints.Find(original, Reduce(LengthsTimes(LumpedBay(offset), k))));
            Assert.Equal("length-factor", up.Code);
            Close.Relative(k, up.Factor!.Value, tolerance);
            Assert.Contains(larger + "?", up.Message, StringComparison.Ordinal);
            Assert.Contains("larger", up.Message, StringComparison.Ordinal);

            UnitHint down = Assert.Single(UnitSlipHints.Find(original, Reduce(LengthsTimes(LumpedBay(offset), 1 / k))));
            Assert.Equal("length-factor", down.Code);
            Close.Relative(1 / k, down.Factor!.Value, tolerance);
            Assert.Contains(smaller + "?", down.Message, StringComparison.Ordinal);
            Assert.Contains("smaller", down.Message, StringComparison.Ordinal);
        }
    }

    [Fact]
    public void Find_substitute_shifted_by_0_3_m_gives_no_hint()
    {
        foreach (Vector3 offset in new[] { Vector3.Zero, Site })
        {
            Assert.Empty(UnitSlipHints.Find(Reduce(FloorBay(offset)), Reduce(LumpedBay(offset + V(0.3, 0, 0)))));
        }
    }

    [Fact]
    public void Find_substitute_moved_wholly_outside_at_the_same_size_gives_no_hint()
    {
        // Misplaced by 20 m (the wrong bay): mostly outside, but the sizes agree, so no unit slip is suggested.
        Assert.Empty(UnitSlipHints.Find(Reduce(FloorBay(Vector3.Zero)), Reduce(LumpedBay(V(20, 0, 0)))));
    }

    [Theory]
    [InlineData(2)]
    [InlineData(0.5)]
    [InlineData(5)]
    public void Find_lengths_or_forces_scaled_by_a_factor_that_is_no_unit_ratio_give_no_hint(double k)
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        Assert.Empty(UnitSlipHints.Find(original, Reduce(LengthsTimes(LumpedBay(Vector3.Zero), k))));
        Assert.Empty(UnitSlipHints.Find(original, Reduce(ForcesTimes(LumpedBay(Vector3.Zero), k))));
    }

    [Theory]
    [InlineData(1.04)] // 4 % beyond the factor: outside the 3 % window
    [InlineData(0.96)]
    public void Find_box_ratio_just_outside_the_nearness_window_gives_no_hint(double beyond)
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        Assert.Empty(UnitSlipHints.Find(original, Reduce(LengthsTimes(LumpedBay(Vector3.Zero), MillimetresPerMetre * beyond))));
    }

    [Fact]
    public void Find_compact_well_placed_substitute_a_tenth_of_the_size_gives_no_hint()
    {
        // Four forces on a 0.6 m × 0.4 m square at the middle of the 6 m × 4 m bay: a tenth of the size, but inside the
        // original's box and nowhere near where the bay would shrink to; a different but plausible layout carrying the
        // bay's 75.2 kN.
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        PointForce[] compact =
        [
            new("c1", V(2.7, 1.8, 0), V(0, 0, -18.8)), new("c2", V(3.3, 1.8, 0), V(0, 0, -18.8)),
            new("c3", V(3.3, 2.2, 0), V(0, 0, -18.8)), new("c4", V(2.7, 2.2, 0), V(0, 0, -18.8)),
        ];
        LoadReduction substitute = Reduce(compact);
        Close.Relative(0.1, substitute.Bounds!.Diagonal / original.Bounds!.Diagonal, 1e-12); // 0.72/7.2 by construction
        Assert.Empty(UnitSlipHints.Find(original, substitute));
    }

    [Fact]
    public void Find_single_force_substitute_has_no_size_and_so_no_length_hint()
    {
        // The bay's resultant 60 + 7.2 + 8 = 75.2 kN as one force, even placed as if its millimetres were read as metres:
        // a box of one point has no size and so no factor.
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        LoadReduction single = Reduce([new PointForce("R", V(3_000, 2_000, 0), V(0, 0, -75.2))]);
        Assert.Empty(UnitSlipHints.Find(original, single));
    }

    [Fact]
    public void Find_substitute_forces_in_N_read_as_kN_hints_a_force_factor_of_1000()
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        LoadReduction substitute = Reduce(ForcesTimes(LumpedBay(Vector3.Zero), NewtonsPerKilonewton));
        UnitHint hint = Assert.Single(UnitSlipHints.Find(original, substitute));
        Assert.Equal("force-factor", hint.Code);
        Close.Relative(NewtonsPerKilonewton, hint.Factor!.Value, 1e-12);
        Assert.Contains("1000×", hint.Message, StringComparison.Ordinal);
        Assert.Contains("forces in N read as kN", hint.Message, StringComparison.Ordinal);
    }

    [Theory]
    [InlineData(NewtonsPerKilonewton, "forces in N read as kN", "forces in kN read as N")]
    [InlineData(StandardGravity, "forces in N read as kgf", "forces in kgf read as N")]
    [InlineData(NewtonsPerPoundForce, "forces in N read as lbf, or kN as kip", "forces in lbf read as N, or kip as kN")]
    public void Find_substitute_forces_scaled_by_a_force_unit_ratio_hint_it_either_way_round(double k, string larger, string smaller)
    {
        LoadReduction original = Reduce(FloorBay(Site));
        UnitHint up = Assert.Single(UnitSlipHints.Find(original, Reduce(ForcesTimes(LumpedBay(Site), k))));
        Assert.Equal("force-factor", up.Code);
        Close.Relative(k, up.Factor!.Value, 1e-12);
        Assert.Contains(larger, up.Message, StringComparison.Ordinal);

        UnitHint down = Assert.Single(UnitSlipHints.Find(original, Reduce(ForcesTimes(LumpedBay(Site), 1 / k))));
        Assert.Equal("force-factor", down.Code);
        Close.Relative(1 / k, down.Factor!.Value, 1e-12);
        Assert.Contains(smaller, down.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Find_masses_in_kg_given_as_forces_in_N_hints_standard_gravity()
    {
        // Original: a 1200 kg tank and two 350 kg pumps under standard gravity (N, m). Substitute: the same masses
        // typed as forces of 1200 N and 350 N, so every weight is g_n = 9.80665 times too small (3rd CGPM, 1901).
        Vector3 g = V(0, 0, -StandardGravity);
        LoadItem[] original =
        [
            new PointMass("tank", V(0, 0, 0.8), 1200, g),
            new PointMass("pump-a", V(2.5, 0, 0.3), 350, g),
            new PointMass("pump-b", V(2.5, 1.5, 0.3), 350, g),
        ];
        LoadItem[] substitute =
        [
            new PointForce("tank", V(0, 0, 0.8), V(0, 0, -1200)),
            new PointForce("pump-a", V(2.5, 0, 0.3), V(0, 0, -350)),
            new PointForce("pump-b", V(2.5, 1.5, 0.3), V(0, 0, -350)),
        ];
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Reduce(original), Reduce(substitute)));
        Assert.Equal("force-factor", hint.Code);
        Close.Relative(1 / StandardGravity, hint.Factor!.Value, 1e-12);
        Assert.Contains("9.807×", hint.Message, StringComparison.Ordinal);
        Assert.Contains("masses in kg given as newtons", hint.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Find_forces_ten_times_larger_are_not_taken_for_a_gravity_slip()
    {
        // 10 lies 2 % from g_n = 9.80665, outside the 1 % force window: a decimal slip is no unit slip named here.
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        Assert.Empty(UnitSlipHints.Find(original, Reduce(ForcesTimes(LumpedBay(Vector3.Zero), 10))));
    }

    [Fact]
    public void Find_gross_force_ratio_near_a_factor_with_the_same_resultant_gives_no_hint()
    {
        // Invented: pressure 2.724 down and suction 1.724 up on two halves of a panel (gross 4.448, net 1 kN down),
        // replaced by the one net force. The gross ratio is 4.448 (within 1 % of lbf/N), but a unit slip would scale
        // the resultant as well, and here the resultant is kept.
        LoadItem[] original =
        [
            new PointForce("windward", V(0, 0, 0), V(0, 0, -2.724)),
            new PointForce("leeward", V(1, 0, 0), V(0, 0, 1.724)),
        ];
        LoadItem[] substitute = [new PointForce("net", V(-1.724, 0, 0), V(0, 0, -1))];
        LoadReduction o = Reduce(original), s = Reduce(substitute);
        Close.Relative(4.448, o.GrossForce / s.GrossForce, 1e-12); // (2.724 + 1.724) / 1, by hand
        Assert.Empty(UnitSlipHints.Find(o, s));
    }

    [Fact]
    public void Find_self_balanced_systems_are_compared_by_gross_force_alone()
    {
        // A couple made of two opposite forces 2 m apart; the substitute's forces are 1000 times larger (N read as kN).
        // Neither has a significant resultant, so the gross forces decide.
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 5, 0)), new PointForce("b", V(2, 0, 0), V(0, -5, 0))];
        LoadItem[] substitute = [new PointForce("a", V(0, 0, 0), V(0, 5000, 0)), new PointForce("b", V(2, 0, 0), V(0, -5000, 0))];
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Reduce(original), Reduce(substitute)));
        Assert.Equal("force-factor", hint.Code);
        Close.Relative(NewtonsPerKilonewton, hint.Factor!.Value, 1e-12);
    }

    [Fact]
    public void Find_both_lengths_and_forces_slipped_gives_both_hints_lengths_first()
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        IEnumerable<PointForce> both = LumpedBay(Vector3.Zero).Select(f => new PointForce(f.Id, f.At * MillimetresPerFoot, f.Value * NewtonsPerPoundForce));
        IReadOnlyList<UnitHint> hints = UnitSlipHints.Find(original, Reduce(both));
        Assert.Equal(["length-factor", "force-factor"], hints.Select(h => h.Code));
    }

    [Fact]
    public void Find_empty_or_couple_only_reductions_give_no_hint()
    {
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        LoadReduction couples = Reduce([new FreeCouple("c", V(0, 1000, 0))]);
        LoadReduction empty = new ReductionAccumulator().ResultAt(Vector3.Zero);
        Assert.Empty(UnitSlipHints.Find(original, couples));
        Assert.Empty(UnitSlipHints.Find(couples, original));
        Assert.Empty(UnitSlipHints.Find(original, empty));
        Assert.Empty(UnitSlipHints.Find(empty, empty));
    }

    [Fact]
    public void Find_flat_and_line_like_boxes_are_measured_along_their_diagonals()
    {
        // A line load along x (a box of no width or height) against its nodal forces written in mm and read as m.
        LoadItem[] beam = [new LineLoad("w", V(0, 0, 0), V(8, 0, 0), V(0, 0, -3), V(0, 0, -3))];
        PointForce[] ends = [new("a", V(0, 0, 0), V(0, 0, -12)), new("b", V(8, 0, 0), V(0, 0, -12))];
        Assert.Empty(UnitSlipHints.Find(Reduce(beam), Reduce(ends)));
        UnitHint hint = Assert.Single(UnitSlipHints.Find(Reduce(beam), Reduce(LengthsTimes(ends, MillimetresPerMetre))));
        Close.Relative(MillimetresPerMetre, hint.Factor!.Value, 1e-12);
    }

    [Fact]
    public void Find_messages_are_invariant_under_another_culture()
    {
        using var culture = new CultureScope("de-DE");
        LoadReduction original = Reduce(FloorBay(Vector3.Zero));
        UnitHint hint = Assert.Single(UnitSlipHints.Find(original, Reduce(LengthsTimes(LumpedBay(Vector3.Zero), MillimetresPerInch))));
        Assert.Contains("25.4×", hint.Message, StringComparison.Ordinal); // a point, not a decimal comma
    }

    [Fact]
    public void Find_null_reduction_throws()
    {
        LoadReduction r = Reduce(FloorBay(Vector3.Zero));
        Assert.Throws<ArgumentNullException>(() => UnitSlipHints.Find(null!, r));
        Assert.Throws<ArgumentNullException>(() => UnitSlipHints.Find(r, null!));
    }

    private static DocumentHeader Header(bool force, bool length, bool mass, UnitSystem? units = null) =>
        new(null, units ?? UnitSystem.Si, units ?? UnitSystem.Si, ImmutableSortedDictionary<string, Vector3>.Empty)
        {
            ForceUnitStated = force,
            LengthUnitStated = length,
            MassUnitStated = mass,
        };

    [Fact]
    public void NoUnits_file_stating_no_units_hints_that_it_was_read_as_N_m_kg()
    {
        // SPEC §3: units are optional and SI (N, m, kg) by default.
        UnitHint hint = UnitSlipHints.NoUnits("the substitute", Header(false, false, false))!;
        Assert.Equal("no-units", hint.Code);
        Assert.Equal("no units given in the substitute: its values were read as N, m, kg", hint.Message);
        Assert.Null(hint.Factor);
    }

    [Fact]
    public void NoUnits_file_stating_force_and_length_gives_no_hint_whether_or_not_it_states_mass()
    {
        Assert.Null(UnitSlipHints.NoUnits("the original", Header(true, true, false)));
        Assert.Null(UnitSlipHints.NoUnits("the original", Header(true, true, true)));
    }

    [Fact]
    public void NoUnits_file_stating_only_one_of_force_and_length_hints_the_other()
    {
        var kip = new UnitSystem(UnitCatalog.Kip, UnitCatalog.Metre, UnitCatalog.Kilogram);
        UnitHint lengthMissing = UnitSlipHints.NoUnits("a.loads.json", Header(true, false, false, kip))!;
        Assert.Equal("partial-units", lengthMissing.Code);
        Assert.Equal("a.loads.json states a force unit but no length unit: its lengths were read as m", lengthMissing.Message);
        UnitHint forceMissing = UnitSlipHints.NoUnits("a.loads.json", Header(false, true, true))!;
        Assert.Equal("partial-units", forceMissing.Code);
        Assert.Contains("its forces were read as N", forceMissing.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void NoUnits_file_stating_only_a_mass_unit_is_a_file_without_force_and_length_units()
    {
        var tonnes = new UnitSystem(UnitCatalog.Newton, UnitCatalog.Metre, UnitCatalog.Tonne);
        UnitHint hint = UnitSlipHints.NoUnits("the original", Header(false, false, true, tonnes))!;
        Assert.Equal("no-units", hint.Code);
        Assert.Equal("no force or length unit given in the original: its values were read as N, m, t", hint.Message);
    }
}
