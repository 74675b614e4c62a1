using System.Globalization;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Units;

namespace LoadDiff.Core.Equivalence;

/// <summary>
/// Hints at unit slips between an original and a substitute: a substitute written in millimetres and read as metres,
/// forces in newtons read as kilonewtons, a file with no units at all. Hints are warnings only; they never change a
/// verdict, and they are guesses from sizes, so a hint can be wrong and a slip can go unhinted.
/// </summary>
/// <remarks>
/// Every factor is the ratio of two units of <see cref="UnitCatalog"/> (the exact factors of NIST SP 811):
/// lengths 1000 (mm and m), 100 (cm and m), 10 (mm and cm), 25.4 (mm and in), 304.8 (mm and ft), 12 (in and ft);
/// forces 1000 (N and kN, kN and MN), 9.80665 (N and kgf, kN and tf, or a mass in kg given as a force in N),
/// 4.4482216152605 (N and lbf, kN and kip). A measured ratio is <em>near</em> a factor k when it lies within
/// [k/(1+t), k·(1+t)], either way round (the substitute k times larger or k times smaller).
/// </remarks>
public static class UnitSlipHints
{
    /// <summary>
    /// How near a ratio of box sizes must be to a length factor: 3 % either way. The closest two length factors
    /// (10 and 12) are 20 % apart, so at most one can match; the margin leaves room for a slipped substitute whose
    /// layout differs a little from the original's.
    /// </summary>
    public const double LengthNearness = 0.03;

    /// <summary>
    /// How near a ratio of gross forces must be to a force factor: 1 % either way. It is tighter than
    /// <see cref="LengthNearness"/> because 9.80665 lies within 2 % of 10: a wider window would name a plain
    /// decimal slip as a gravity slip. A unit slip scales every force exactly, so 1 % is ample.
    /// </summary>
    public const double ForceNearness = 0.01;

    /// <summary>
    /// The substitute's box lies mostly outside the original's when the diagonal of the two boxes' intersection is
    /// less than this fraction (one half) of the substitute's own diagonal; disjoint boxes have no intersection.
    /// </summary>
    public const double MostlyOutsideFraction = 0.5;

    /// <summary>
    /// The substitute's box, divided by the factor about the origin, matches the original's when the diagonal of
    /// their intersection is at least this fraction (nine tenths) of the larger of the two diagonals.
    /// </summary>
    public const double RescaledMatchFraction = 0.9;

    /// <summary>
    /// Below this fraction of its gross force (one hundredth) a resultant is mostly cancellation, and the ratio of
    /// two such resultants says nothing about units.
    /// </summary>
    public const double SignificantResultantFraction = 0.01;

    private static readonly Slip[] LengthSlips =
    [
        LengthSlip(UnitCatalog.Millimetre, UnitCatalog.Metre),
        LengthSlip(UnitCatalog.Centimetre, UnitCatalog.Metre),
        LengthSlip(UnitCatalog.Millimetre, UnitCatalog.Centimetre),
        LengthSlip(UnitCatalog.Millimetre, UnitCatalog.Inch),
        LengthSlip(UnitCatalog.Millimetre, UnitCatalog.Foot),
        LengthSlip(UnitCatalog.Inch, UnitCatalog.Foot),
    ];

    private static readonly Slip[] ForceSlips =
    [
        new(UnitCatalog.Kilonewton.ToSi / UnitCatalog.Newton.ToSi,
            "forces in N read as kN, or kN as MN", "forces in kN read as N, or MN as kN"),
        new(UnitCatalog.KilogramForce.ToSi / UnitCatalog.Newton.ToSi,
            "forces in N read as kgf, or the original's masses given as newtons", "forces in kgf read as N, or masses in kg given as newtons"),
        new(UnitCatalog.PoundForce.ToSi / UnitCatalog.Newton.ToSi,
            "forces in N read as lbf, or kN as kip", "forces in lbf read as N, or kip as kN"),
    ];

    /// <summary>
    /// The unit-slip hints for one case or combination: at most one about lengths, then at most one about forces.
    /// Both reductions must be in the same units (as the readers deliver them).
    /// </summary>
    /// <remarks>
    /// <para>
    /// <b>Lengths</b> (<c>length-factor</c>). The size of a system is the diagonal of its box
    /// (<see cref="LoadReduction.Bounds"/>), the length the tolerance rule uses too. A box of zero size (one point,
    /// or none) has no factor, so a substitute that is a single force never gets this hint. The hint is given when
    /// the ratio of the diagonals, substitute over original, is near a length factor k (within
    /// <see cref="LengthNearness"/>) and either the substitute's box lies mostly outside the original's (see
    /// <see cref="MostlyOutsideFraction"/>), or the substitute's box divided by the signed factor about the origin
    /// matches the original's (see <see cref="RescaledMatchFraction"/>). The second case catches a substitute that
    /// shrank towards an origin that lies inside the original's box, which then stays inside it. A substitute that
    /// is merely misplaced, or smaller but well placed, does not get the hint.
    /// </para>
    /// <para>
    /// <b>Forces</b> (<c>force-factor</c>). The hint is given when the gross forces
    /// (<see cref="LoadReduction.GrossForce"/>), substitute over original, differ by a ratio near a force factor
    /// (within <see cref="ForceNearness"/>) and, when both resultants are significant (at least
    /// <see cref="SignificantResultantFraction"/> of their gross forces), the ratio of the resultants' magnitudes is
    /// near the same factor. A unit slip scales every force, and so the resultant; a well-made substitute keeps the
    /// original's resultant even where its gross force differs (one force for a pressure map with suction). When
    /// exactly one resultant is significant the systems are not scaled copies and there is no hint.
    /// </para>
    /// </remarks>
    /// <param name="original">The original's reduction.</param>
    /// <param name="substitute">The substitute's reduction, in the same units.</param>
    /// <exception cref="ArgumentNullException">Either reduction is null.</exception>
    public static IReadOnlyList<UnitHint> Find(LoadReduction original, LoadReduction substitute)
    {
        Guard.NotNull(original);
        Guard.NotNull(substitute);
        var hints = new List<UnitHint>(2);
        if (LengthHint(original.Bounds, substitute.Bounds) is { } length)
        {
            hints.Add(length);
        }
        if (ForceHint(original, substitute) is { } force)
        {
            hints.Add(force);
        }
        return hints;
    }

    /// <summary>
    /// The hint for a file whose units were left to the defaults: <c>no-units</c> when it states neither a force nor
    /// a length unit, <c>partial-units</c> when it states one of them; null when it states both. The mass unit alone
    /// is not hinted: most files hold no masses.
    /// </summary>
    /// <param name="whichFile">How the sentence names the file, for example <c>the original</c> or <c>b.loads.json</c>.</param>
    /// <param name="header">The file's header, as its reader delivered it.</param>
    /// <exception cref="ArgumentNullException">Either argument is null.</exception>
    public static UnitHint? NoUnits(string whichFile, DocumentHeader header)
    {
        Guard.NotNull(whichFile);
        Guard.NotNull(header);
        UnitSystem read = header.SourceUnits;
        return (header.ForceUnitStated, header.LengthUnitStated) switch
        {
            (false, false) => new UnitHint(UnitHint.NoUnitsCode,
                $"no {(header.MassUnitStated ? "force or length unit" : "units")} given in {whichFile}: its values were read as {read}"),
            (true, false) => new UnitHint(UnitHint.PartialUnitsCode,
                $"{whichFile} states a force unit but no length unit: its lengths were read as {read.Length.Symbol}"),
            (false, true) => new UnitHint(UnitHint.PartialUnitsCode,
                $"{whichFile} states a length unit but no force unit: its forces were read as {read.Force.Symbol}"),
            _ => null,
        };
    }

    private static UnitHint? LengthHint(Box? original, Box? substitute)
    {
        if (original is null || substitute is null || !(original.Diagonal > 0) || !(substitute.Diagonal > 0))
        {
            return null;
        }
        double ratio = substitute.Diagonal / original.Diagonal;
        if (Match(LengthSlips, ratio, LengthNearness) is not { } slip)
        {
            return null;
        }
        bool mostlyOutside = IntersectionDiagonal(substitute, original) < MostlyOutsideFraction * substitute.Diagonal;
        double scale = ratio >= 1 ? 1 / slip.Factor : slip.Factor;
        var rescaled = new Box(substitute.Min * scale, substitute.Max * scale);
        bool rescaledMatches = IntersectionDiagonal(rescaled, original) >= RescaledMatchFraction * Math.Max(rescaled.Diagonal, original.Diagonal);
        if (!mostlyOutside && !rescaledMatches)
        {
            return null;
        }
        string how = ratio >= 1 ? "larger" : "smaller";
        return new UnitHint(UnitHint.LengthFactorCode,
            $"the substitute's loads span a region about {Shown(ratio)}× {how} than the original's ({slip.Cause(ratio)}?)", ratio);
    }

    private static UnitHint? ForceHint(LoadReduction original, LoadReduction substitute)
    {
        double go = original.GrossForce, gs = substitute.GrossForce;
        if (!(go > 0) || !(gs > 0))
        {
            return null;
        }
        double ratio = gs / go;
        if (Match(ForceSlips, ratio, ForceNearness) is not { } slip)
        {
            return null;
        }
        double ro = original.Force.Length, rs = substitute.Force.Length;
        bool originalSignificant = ro >= SignificantResultantFraction * go;
        bool substituteSignificant = rs >= SignificantResultantFraction * gs;
        if (originalSignificant != substituteSignificant)
        {
            return null;
        }
        if (originalSignificant && Match([slip], rs / ro, ForceNearness) is null)
        {
            return null;
        }
        string how = ratio >= 1 ? "larger" : "smaller";
        return new UnitHint(UnitHint.ForceFactorCode,
            $"the substitute's gross force is about {Shown(ratio)}× {how} than the original's ({slip.Cause(ratio)}?)", ratio);
    }

    // The slip whose factor the ratio is near, either way round; the factors are far enough apart that at most one matches.
    private static Slip? Match(Slip[] slips, double ratio, double nearness)
    {
        double folded = ratio >= 1 ? ratio : 1 / ratio;
        double window = Math.Log(1 + nearness);
        foreach (Slip s in slips)
        {
            if (Math.Abs(Math.Log(folded / s.Factor)) <= window)
            {
                return s;
            }
        }
        return null;
    }

    // The diagonal of a ∩ b; zero when they do not meet. A flat or line-like intersection still has a diagonal.
    private static double IntersectionDiagonal(Box a, Box b)
    {
        Vector3 lo = Vector3.Max(a.Min, b.Min);
        Vector3 hi = Vector3.Min(a.Max, b.Max);
        if (hi.X < lo.X || hi.Y < lo.Y || hi.Z < lo.Z)
        {
            return 0;
        }
        return (hi - lo).Length;
    }

    // The measured factor, folded to at least 1, to four significant digits ("1000", "25.4", "9.807").
    private static string Shown(double ratio) => (ratio >= 1 ? ratio : 1 / ratio).ToString("G4", CultureInfo.InvariantCulture);

    private static Slip LengthSlip(Unit small, Unit large) =>
        new(large.ToSi / small.ToSi, $"lengths in {small.Symbol} read as {large.Symbol}", $"lengths in {large.Symbol} read as {small.Symbol}");

    // A unit-factor slip: the cause when the substitute is the factor larger, and when it is the factor smaller.
    private sealed record Slip(double Factor, string WhenLarger, string WhenSmaller)
    {
        public string Cause(double ratio) => ratio >= 1 ? WhenLarger : WhenSmaller;
    }
}
