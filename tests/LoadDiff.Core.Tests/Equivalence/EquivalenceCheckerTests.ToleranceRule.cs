using System.Collections.Immutable;
using CsCheck;
using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Loads;
using LoadDiff.Core.Model;
using LoadDiff.Core.Reduction;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The numbers of the tolerance rule of SPEC §4, each pinned against a value worked by hand or in exact arithmetic:
/// pass iff |ΔR| ≤ max(F, rel·G_F, noise_F) and |ΔM_Q| ≤ max(M, rel·G_M, noise_M) at every corner Q of the box of both
/// systems' loaded geometry, G_F = Σ|F| and G_M = Σ|C| + G_F·D of the original, D the diagonal of the original's box.
/// The default rel = 1e-3 is common practice, no published source (CHECK-VALUES, "Tolerance of a load-balance check").
/// </summary>
public partial class EquivalenceCheckerTests
{
    private static ExactRational X(double d) => ExactRational.FromDouble(d);

    // ---- the far reference point ----------------------------------------------------------------------------------

    // Original −10 kN at x = 0 and x = 2; substitute −20.01 kN at x = 1.0015 (kN, m). By hand (SPEC §2, §4):
    // G_F = 20, D = 2, moment allowance 1e-3·20·2 = 0.04; ΔR = −0.01 (allowance 0.02, passes);
    // ΔM_y(Q) = 20.01·(1.0015 − Q) − 10·(0 − Q) − 10·(2 − Q) → 0.040015 at Q = 0 and 0.020015 at Q = 2: FAIL at x = 0.
    private static readonly LoadItem[] FarOriginal =
        [new PointForce("a", V(0, 0, 0), V(0, 0, -10)), new PointForce("b", V(2, 0, 0), V(0, 0, -10))];

    private static readonly LoadItem[] FarSubstitute = [new PointForce("r", V(1.0015, 0, 0), V(0, 0, -20.01))];

    public static TheoryData<double, double, double> FarPoints => new()
    {
        { 1, 0, 0 }, // the original's load centroid Σ|F|x/Σ|F| = (10·0 + 10·2)/20 = 1 (asserted below)
        { -1e10, 0, 0 },
        { 3e8, 0, 0 },
        { 1e12, 1e12, 1e12 },
        { 1e13, 1e13, 1e13 },
    };

    [Theory]
    [MemberData(nameof(FarPoints))]
    public void Compare_referencePointFarAway_sameFailAndWorstMomentAsAtTheCentroid(double x, double y, double z)
    {
        Vector3 p = V(x, y, z);
        CaseComparison c = Check(ToleranceSpec.Default, p, FarOriginal, FarSubstitute);
        Assert.Equal(V(1, 0, 0), Reduce(p, FarOriginal).Centroid);

        // exact worst: |ΔM_y(0)| = |20.01·1.0015 − 20| with the doubles as written (≈ 0.040015)
        ExactRational worst = (X(20.01) * X(1.0015)) - X(20);
        Exact.Relative(worst, c.Residual!.WorstMomentNorm, 1e-12);
        Close.Relative(0.040015, c.Residual.WorstMomentNorm, 1e-12); // the decimal value by hand
        Assert.Equal(V(0, 0, 0), c.Residual.WorstCorner);
        Assert.Equal(0.04, c.Tolerance!.Moment, 15);
        Assert.True(c.ForcePasses);
        Assert.False(c.MomentPasses);
        Assert.False(c.Equivalent);

        // ΔM about p itself, moved exactly: ΔM_p = ΔM_0 + (0 − p) × ΔR (SPEC §2), rounded once.
        ExactVector dR = ExactVector.From(V(0, 0, -20.01)) - ExactVector.From(V(0, 0, -20));
        ExactVector dM0 = ExactVector.MomentAbout(V(0, 0, 0), [(V(1.0015, 0, 0), V(0, 0, -20.01))])
            - ExactVector.MomentAbout(V(0, 0, 0), [(V(0, 0, 0), V(0, 0, -10)), (V(2, 0, 0), V(0, 0, -10))]);
        ExactVector dMp = dM0 + ExactVector.Cross(ExactVector.Zero - ExactVector.From(p), dR);
        Exact.WithinUlps(dMp, c.Residual.System.Moment, 2, floor: 1e-300);
        Exact.WithinUlps(dR, c.Residual.System.Force, 1);
    }

    [Fact]
    public void Compare_referencePointMovedFromTheCentroidOutTo1e12_sameVerdictAndWorstMoment()
    {
        // The verdict is a property of the two systems, not of the point the residual is stated about (SPEC §2: moments
        // transfer exactly, so equivalence at one point is equivalence at every point). Substitutes are the original
        // shifted by up to 5 cm and scaled by up to ±0.2 %, so both verdicts occur.
        int passed = 0, failed = 0;
        Gen.Select(Systems.System, Systems.Vec(-0.05, 0.05), Gen.Double[0.998, 1.002], Systems.Vec(-1, 1), Gen.Double[0, 12])
            .SampleSeeded((items, shift, k, direction, exponent) =>
            {
                LoadItem[] substitute = [.. items.Select(i => Systems.Map(i, v => v, shift, k))];
                Vector3 centroid = Reduce(Vector3.Zero, items).Centroid ?? Vector3.Zero;
                Vector3 far = centroid + (direction * Math.Pow(10, exponent));
                CaseComparison near = Check(ToleranceSpec.Default, centroid, items, substitute);
                CaseComparison away = Check(ToleranceSpec.Default, far, items, substitute);
                Assert.Equal(near.Equivalent, away.Equivalent);
                Close.Relative(near.Residual!.WorstMomentNorm, away.Residual!.WorstMomentNorm, 1e-12);
                Close.Relative(near.Residual.ForceNorm, away.Residual.ForceNorm, 1e-12);
                Assert.Equal(near.Tolerance!.Moment, away.Tolerance!.Moment);
                _ = near.Equivalent ? passed++ : failed++;
            }, iter: 300);
        Assert.True(passed > 0 && failed > 0, $"{passed} passed, {failed} failed: the property must see both verdicts");
    }

    // ---- the rule's numbers --------------------------------------------------------------------------------------

    // Original: (0,0,−10) at the origin and 5·(−2,−3,−6) (|F| = 35, Pythagorean quadruple 2² + 3² + 6² = 7²) at (3,4,12),
    // and a couple (1,4,8) (|C| = 9). By hand: G_F = 45, D = |(3,4,12)| = 13, G_M = 9 + 45·13 = 594.
    private static LoadItem[] RuleOriginal() =>
    [
        new PointForce("a", V(0, 0, 0), V(0, 0, -10)),
        new PointForce("b", V(3, 4, 12), V(-10, -15, -30)),
        new FreeCouple("c", V(1, 4, 8)),
    ];

    // The same, with force a slid along its own line of action to z = −1 (transmissibility: same moment about every
    // point). Its box reaches below the original's, so the union box (diagonal √194) is not the original's (13).
    private static LoadItem[] RuleSubstitute() =>
    [
        new PointForce("a", V(0, 0, -1), V(0, 0, -10)),
        new PointForce("b", V(3, 4, 12), V(-10, -15, -30)),
        new FreeCouple("c", V(1, 4, 8)),
    ];

    // Noise by the formula of SPEC §4 / RoundingNoise (1e-12 of the gross magnitudes, the smaller of the two systems;
    // the moment one over each system's own box, reach = its diagonal plus its largest corner distance from the
    // origin): original (0,0,0)…(3,4,12), 13 + 13, so 9 + 45·26 = 1179; substitute (0,0,−1)…(3,4,12), √194 + 13,
    // larger; the original's governs.
    private static readonly double RuleNoiseForce = 1e-12 * 45;
    private static readonly double RuleNoiseMoment = 1e-12 * (9 + (45 * 26));

    [Fact]
    public void Compare_grossMagnitudesAndDiagonal_areTheOriginalsNotTheUnionBox()
    {
        CaseComparison c = Check(ToleranceSpec.Default, V(0, 0, 0), RuleOriginal(), RuleSubstitute());
        AppliedTolerance t = c.Tolerance!;
        Assert.Equal(45, t.GrossForce);
        Assert.Equal(13, t.Diagonal);
        Assert.Equal(594, t.GrossMoment);
        Assert.False(t.DiagonalStated);
        Assert.Equal(1e-3 * 45, t.Force);
        Assert.Equal(1e-3 * 594, t.Moment);
        Assert.Equal(AllowanceSource.Relative, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Relative, t.MomentGovernedBy);
        Assert.True(t.ForceGovernedByRelative);
        Assert.True(t.MomentGovernedByRelative);
        Close.Relative(RuleNoiseForce, t.Noise.Force, 1e-15);
        Close.Relative(RuleNoiseMoment, t.Noise.Moment, 1e-15);
        // transmissibility: the residual is exactly zero, at every corner
        Assert.Equal(0, c.Residual!.WorstMomentNorm);
        Assert.Equal(0, c.Residual.ForceNorm);
        Assert.True(c.Equivalent);
        Assert.Equal(OnlyIn.Both, c.Presence);
    }

    [Fact]
    public void Compare_statedLength_replacesTheDiagonal()
    {
        // --length 100: G_M = 9 + 45·100 = 4509 (SPEC §4)
        CaseComparison c = Check(ToleranceSpec.Create(1e-3, 0, 0, length: 100), V(0, 0, 0), RuleOriginal(), RuleSubstitute());
        AppliedTolerance t = c.Tolerance!;
        Assert.Equal(100, t.Diagonal);
        Assert.True(t.DiagonalStated);
        Assert.Equal(4509, t.GrossMoment);
        Assert.Equal(1e-3 * 4509, t.Moment);
        Assert.Equal(1e-3 * 45, t.Force);

        // a stated length of 0 is a length too: G_M = Σ|C| = 9
        AppliedTolerance zero = Check(ToleranceSpec.Create(1e-3, 0, 0, length: 0), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(0, zero.Diagonal);
        Assert.True(zero.DiagonalStated);
        Assert.Equal(9, zero.GrossMoment);
    }

    [Fact]
    public void Compare_absoluteTolerancesAboveTheRelative_governAndAreTheAllowances()
    {
        AppliedTolerance t = Check(ToleranceSpec.Create(1e-3, 1, 2), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(1, t.Force);
        Assert.Equal(2, t.Moment);
        Assert.Equal(AllowanceSource.Absolute, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Absolute, t.MomentGovernedBy);
        Assert.False(t.ForceGovernedByRelative);
        Assert.False(t.MomentGovernedByRelative);
    }

    [Fact]
    public void Compare_absoluteEqualToRelative_tieGoesToAbsolute()
    {
        // "ties go to the user's parts, absolute first" (AppliedTolerance): F = rel·G_F and M = rel·G_M exactly
        AppliedTolerance t = Check(ToleranceSpec.Create(1e-3, 1e-3 * 45, 1e-3 * 594), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(AllowanceSource.Absolute, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Absolute, t.MomentGovernedBy);
        Assert.Equal(1e-3 * 45, t.Force);
        Assert.Equal(1e-3 * 594, t.Moment);
    }

    [Fact]
    public void Compare_noToleranceAtAll_roundingNoiseGoverns()
    {
        // rel = F = M = 0: neither allowance falls below the rounding noise (SPEC §4)
        AppliedTolerance t = Check(ToleranceSpec.Create(0, 0, 0), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(AllowanceSource.Rounding, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Rounding, t.MomentGovernedBy);
        Close.Relative(RuleNoiseForce, t.Force, 1e-15);
        Close.Relative(RuleNoiseMoment, t.Moment, 1e-15);
    }

    [Fact]
    public void Compare_absoluteAboveRelativeButBelowNoise_roundingNoiseGoverns()
    {
        // F = 1e-15 > rel·G_F = 0 but below the noise 4.5e-11: the noise is the larger part
        AppliedTolerance t = Check(ToleranceSpec.Create(0, 1e-15, 1e-15), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(AllowanceSource.Rounding, t.ForceGovernedBy);
        Assert.Equal(AllowanceSource.Rounding, t.MomentGovernedBy);
        Close.Relative(RuleNoiseForce, t.Force, 1e-15);
    }

    [Fact]
    public void Compare_relativeEqualToNoise_tieGoesToRelative_andNoiseAboveRelativeGoverns()
    {
        // rel = 1e-12: rel·G_F = 1e-12·45 is the force noise exactly (tie → the user's part); rel·G_M = 1e-12·594 is
        // below the moment noise 1e-12·(9 + 45·26) = 1.179e-9, which then governs.
        AppliedTolerance t = Check(ToleranceSpec.Create(1e-12, 0, 0), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(AllowanceSource.Relative, t.ForceGovernedBy);
        Assert.Equal(1e-12 * 45, t.Force);
        Assert.Equal(AllowanceSource.Rounding, t.MomentGovernedBy);
        Close.Relative(RuleNoiseMoment, t.Moment, 1e-15);
    }

    [Fact]
    public void Compare_absoluteEqualToNoiseAndRelativeZero_tieGoesToAbsolute()
    {
        AppliedTolerance t = Check(ToleranceSpec.Create(0, 1e-12 * 45, 0), V(0, 0, 0), RuleOriginal(), RuleSubstitute()).Tolerance!;
        Assert.Equal(AllowanceSource.Absolute, t.ForceGovernedBy);
        Assert.Equal(1e-12 * 45, t.Force);
    }

    [Fact]
    public void Compare_residualExactlyAtTheAllowance_passes()
    {
        // "pass iff |ΔR| ≤ …" (SPEC §4): equal is a pass. |ΔR| = 2 exactly with F = 2; the box is one point, so ΔM = 0.
        CaseComparison force = Check(ToleranceSpec.Create(0, 2, 0), V(0, 0, 0),
            [new PointForce("a", V(1, 1, 1), V(0, 0, -100))], [new PointForce("a", V(1, 1, 1), V(0, 0, -102))]);
        Assert.Equal(2, force.Residual!.ForceNorm);
        Assert.Equal(2, force.Tolerance!.Force);
        Assert.True(force.ForcePasses);
        Assert.True(force.Equivalent);

        // |ΔM| = 5 exactly with M = 5 (couples: no geometry, ΔM is taken at the reference point)
        CaseComparison moment = Check(ToleranceSpec.Create(0, 0, 5), V(0, 0, 0), [new FreeCouple("c", V(0, 0, 40))], [new FreeCouple("c", V(0, 3, 44))]);
        Assert.Equal(5, moment.Residual!.WorstMomentNorm);
        Assert.True(moment.MomentPasses);
        Assert.True(moment.Equivalent);
    }

    [Fact]
    public void Compare_substituteForceFarOutsideTheOriginalsBox_failsThroughTheFarCorner()
    {
        // Original as in the far-point case (D = 2). The substitute puts 19.99 at x = 1 and 1e-5 at x = 1000 (both down).
        // By hand: ΔM_y(Q) = −[(1 − Q)(−19.99) + (1000 − Q)(−1e-5)] − (20 − 20Q) = (0.01 − 1e-5)·Q (decimal values):
        // 0 at Q = 0, 0.01998 at Q = 2 (both within 0.04), 9.99 at Q = 1000, a corner of the union box only.
        LoadItem[] substitute = [new PointForce("r", V(1, 0, 0), V(0, 0, -19.99)), new PointForce("s", V(1000, 0, 0), V(0, 0, -1e-5))];
        CaseComparison c = Check(ToleranceSpec.Default, V(1, 0, 0), FarOriginal, substitute);
        Assert.Equal(2, c.Tolerance!.Diagonal);
        Assert.Equal(40, c.Tolerance.GrossMoment);
        Assert.True(c.ForcePasses);
        Assert.False(c.MomentPasses);
        Assert.False(c.Equivalent);
        Assert.Equal(V(1000, 0, 0), c.Residual!.WorstCorner);
        (Vector3, Vector3)[] o = [(V(0, 0, 0), V(0, 0, -10)), (V(2, 0, 0), V(0, 0, -10))];
        (Vector3, Vector3)[] s = [(V(1, 0, 0), V(0, 0, -19.99)), (V(1000, 0, 0), V(0, 0, -1e-5))];
        ExactVector atFar = ExactVector.MomentAbout(V(1000, 0, 0), s) - ExactVector.MomentAbout(V(1000, 0, 0), o);
        Exact.Relative(atFar.Y, c.Residual.WorstMomentNorm, 1e-12);
        Close.Relative(9.99, c.Residual.WorstMomentNorm, 1e-12);
    }

    [Fact]
    public void Compare_residualForceOffTheBox_worstCornerIsTheExactArgmax()
    {
        // Original: one force at the origin. Substitute: the same plus ΔF = (1, −2, 2) at B = (5, −3, 1) (arbitrary by
        // hand). ΔM_Q = (B − Q) × ΔF; the exact |ΔM_Q|² is computed at all eight corners of the union box
        // (0,−3,0)…(5,0,1) and its largest must be the one reported.
        Vector3 b = V(5, -3, 1), dF = V(1, -2, 2);
        LoadItem[] original = [new PointForce("a", V(0, 0, 0), V(0, 0, -30))];
        LoadItem[] substitute = [new PointForce("a", V(0, 0, 0), V(0, 0, -30)), new PointForce("d", b, dF)];
        CaseComparison c = Check(ToleranceSpec.Default, V(2, 2, 2), original, substitute);
        var box = new Box(V(0, -3, 0), V(5, 0, 1));
        Assert.Equal(box, Box.Union(c.Original!.Bounds, c.Substitute!.Bounds));
        (Vector3 Q, ExactRational M2)[] corners = [.. box.Corners.Select(q =>
            (q, ExactVector.Cross(ExactVector.From(b) - ExactVector.From(q), ExactVector.From(dF)).LengthSquared))];
        (Vector3 worstQ, ExactRational worstM2) = corners.MaxBy(x => x.M2);
        Assert.Single(corners, x => x.M2 == worstM2); // the argmax is unique here
        Assert.Equal(worstQ, c.Residual!.WorstCorner);
        Exact.NormRelative(worstM2, c.Residual.WorstMomentNorm, 1e-15);
        Assert.Equal(3, c.Residual.ForceNorm); // |(1, −2, 2)| = 3
        Assert.False(c.Equivalent);
    }

    [Fact]
    public void Compare_residualZeroEverywhere_worstCornerIsStillACornerOfTheBox()
    {
        // "the corner where it occurs (the reference point when there is no geometry)" (ResidualAnalysis): with geometry,
        // a corner even when every corner's |ΔM| is 0, and the reference point (7, 7, 7) here is outside the box.
        CaseComparison c = Check(ToleranceSpec.Default, V(7, 7, 7), RuleOriginal(), RuleOriginal());
        Assert.Equal(0, c.Residual!.WorstMomentNorm);
        Assert.Contains(c.Residual.WorstCorner, new Box(V(0, 0, 0), V(3, 4, 12)).Corners);
    }

    [Fact]
    public void Compare_couplesOnly_noBox_worstIsTheResidualAtTheReferencePoint()
    {
        // no loaded geometry: D = 0, G_M = Σ|C| = 13, ΔM = (0, 3, 4) about any point (a couple), |ΔM| = 5
        CaseComparison c = Check(ToleranceSpec.Default, V(4, 5, 6), [new FreeCouple("c", V(0, 5, 12))], [new FreeCouple("c", V(0, 8, 16))]);
        Assert.Null(Box.Union(c.Original!.Bounds, c.Substitute!.Bounds));
        Assert.Equal(5, c.Residual!.WorstMomentNorm);
        Assert.Equal(V(4, 5, 6), c.Residual.WorstCorner);
        Assert.Equal(V(4, 5, 6), c.Residual.AtBoxCentre.ReferencePoint);
        Assert.Equal(0, c.Tolerance!.Diagonal);
        Assert.Equal(13, c.Tolerance.GrossMoment);
        Assert.Equal(SystemKind.Couple, c.Residual.Wrench.Kind);
    }

    [Fact]
    public void Compare_originalWithoutGeometry_diagonalIsZeroEvenWhenTheSubstituteHasABox()
    {
        // D is the original's: a couple (0,0,6) only (no box), against two opposite forces 2 apart forming the same
        // couple, by hand M = r × F = (1,0,0) × (0,3,0) + (−1,0,0) × (0,−3,0) = (0,0,3) + (0,0,3) = (0,0,6).
        LoadItem[] substitute = [new PointForce("p", V(1, 0, 0), V(0, 3, 0)), new PointForce("q", V(-1, 0, 0), V(0, -3, 0))];
        CaseComparison c = Check(ToleranceSpec.Default, V(0, 0, 0), [new FreeCouple("c", V(0, 0, 6))], substitute);
        Assert.Equal(0, c.Tolerance!.Diagonal);
        Assert.Equal(0, c.Tolerance.GrossForce);
        Assert.Equal(6, c.Tolerance.GrossMoment);
        Assert.Equal(0, c.Residual!.WorstMomentNorm);
        Assert.True(c.Equivalent);
        // the box is the substitute's, so the residual is stated at its centre
        Assert.Equal(V(0, 0, 0), c.Residual.AtBoxCentre.ReferencePoint);
    }

    [Fact]
    public void Compare_residualAtBoxCentre_isTheResidualMovedToTheCentreOfTheUnionBox()
    {
        // Union box (0,0,0)…(2,0,0) with the far-point systems: centre (1,0,0); ΔM_y(1) = 20.01·0.0015 − 0 (by hand
        // ΔM_y(Q) = 20.01(1.0015 − Q) + 20Q − 20), exactly from the doubles as written.
        CaseComparison c = Check(ToleranceSpec.Default, V(-1e10, 0, 0), FarOriginal, FarSubstitute);
        Assert.Equal(V(1, 0, 0), c.Residual!.AtBoxCentre.ReferencePoint);
        ExactRational atCentre = (X(20.01) * (X(1.0015) - X(1))) + X(20) - X(20);
        Exact.Relative(atCentre, c.Residual.AtBoxCentre.Moment.Y, 1e-12);
        Assert.Equal(0, c.Residual.AtBoxCentre.Moment.X);
        Assert.Equal(0, c.Residual.AtBoxCentre.Moment.Z);
        Exact.Relative(X(-20.01) + X(20), c.Residual.AtBoxCentre.Force.Z, 1e-15);
        // the residual's own axis (the line of the missing force) passes where ΔM vanishes: ΔM_y(Q) = 0 at
        // Q = (20.01·1.0015 − 20)/(20.01 − 20) ≈ 4.0015, found from the box centre, not from −1e10. Compared to 1e-9
        // because 20.01 − 20 is 0.01 only to about 1.6e-16 in doubles (the ×100 below).
        ExactRational axisX = ((X(20.01) * X(1.0015)) - X(20)) * X(100);
        Exact.Relative(axisX, c.Residual.Wrench.AxisPoint!.Value.X, 1e-9);
    }

    // ---- combinations with a factor of 0 -------------------------------------------------------------------------

    [Fact]
    public void Compare_combinationWithAFarCaseAtFactorZero_thatCaseIsNoLoadedGeometry()
    {
        // "wind" sits 3000 m away and enters the combination with factor 0, first: it must set neither the anchor nor the
        // box (SPEC §4: loaded geometry only). Dead: −10 at x = 0 and 2 (D = 2); the substitute's dead misplaces the
        // resultant to x = 1.0015 (the far-point case, factored: worst 1.35·0.040015 = 0.05402 against
        // 1e-3·(1.35·20)·2 = 0.054 → fails). Had the wind case widened the box, D would be about 3000 and it would pass.
        ReductionAccumulator Case(params (Vector3 At, Vector3 F)[] forces)
        {
            var acc = new ReductionAccumulator();
            foreach ((Vector3 at, Vector3 f) in forces)
            {
                acc.AddPointForce(at, f);
            }
            return acc;
        }
        var combination = new LoadCombination("uls", ImmutableArray.Create(
            new KeyValuePair<string, double>("wind", 0), new KeyValuePair<string, double>("dead", 1.35)));
        ReductionAccumulator wind = Case((V(3000, 30, 0), V(500, 0, 0)), (V(3000, 60, 40), V(0, 500, 0)));
        ReductionAccumulator Combined(ReductionAccumulator dead) =>
            combination.Combine(new Dictionary<string, ReductionAccumulator> { ["wind"] = wind, ["dead"] = dead }, out _);
        ReductionAccumulator original = Combined(Case((V(0, 0, 0), V(0, 0, -10)), (V(2, 0, 0), V(0, 0, -10))));
        ReductionAccumulator substitute = Combined(Case((V(1.0015, 0, 0), V(0, 0, -20.01))));

        Assert.Equal(V(0, 0, 0), original.Anchor);
        Assert.Equal(V(1.0015, 0, 0), substitute.Anchor);
        Assert.Equal(4, original.Count); // counted, nothing more
        LoadReduction o = original.ResultAt(V(1, 0, 0)), s = substitute.ResultAt(V(1, 0, 0));
        Assert.Equal(new Box(V(0, 0, 0), V(2, 0, 0)), o.Bounds);
        Assert.Equal(new Box(V(1.0015, 0, 0), V(1.0015, 0, 0)), s.Bounds);
        Assert.Equal(1.35 * 20, o.GrossForce, 14);

        CaseComparison c = EquivalenceChecker.Compare("uls", EntryKind.Combination, o, s, ToleranceSpec.Default);
        Assert.Equal(2, c.Tolerance!.Diagonal);
        Assert.Equal(1e-3 * 1.35 * 20 * 2, c.Tolerance.Moment, 15);
        // ΔM_y(0) = 1.35·(20.01·1.0015 − 20): each case's sums scaled by 1.35 exactly in double-double
        Exact.Relative(X(1.35) * ((X(20.01) * X(1.0015)) - X(20)), c.Residual!.WorstMomentNorm, 1e-12);
        Assert.False(c.Equivalent);
        Assert.Equal(EntryKind.Combination, c.Kind);
    }

    // ---- arguments and missing cases -----------------------------------------------------------------------------

    [Fact]
    public void Compare_reductionsAboutDifferentPoints_refused()
    {
        LoadReduction a = Reduce(V(0, 0, 0), FarOriginal), b = Reduce(V(1, 0, 0), FarSubstitute);
        ArgumentException e = Assert.Throws<ArgumentException>(() => EquivalenceChecker.Compare("x", EntryKind.Case, a, b, ToleranceSpec.Default));
        Assert.Equal("substitute", e.ParamName);
        Assert.Contains("same point", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Compare_nullArguments_refusedByName()
    {
        LoadReduction a = Reduce(V(0, 0, 0), FarOriginal);
        Assert.Equal("original", Assert.Throws<ArgumentNullException>(() => EquivalenceChecker.Compare("x", EntryKind.Case, null!, a, ToleranceSpec.Default)).ParamName);
        Assert.Equal("substitute", Assert.Throws<ArgumentNullException>(() => EquivalenceChecker.Compare("x", EntryKind.Case, a, null!, ToleranceSpec.Default)).ParamName);
        Assert.Equal("tolerance", Assert.Throws<ArgumentNullException>(() => EquivalenceChecker.Compare("x", EntryKind.Case, a, a, null!)).ParamName);
    }

    [Fact]
    public void Compare_notes_passedThrough_andNoneWhenNull()
    {
        LoadReduction a = Reduce(V(0, 0, 0), FarOriginal);
        Assert.Equal(["lacks wind"], EquivalenceChecker.Compare("x", EntryKind.Case, a, a, ToleranceSpec.Default, ["lacks wind"]).Notes);
        Assert.Empty(EquivalenceChecker.Compare("x", EntryKind.Case, a, a, ToleranceSpec.Default).Notes);
        Assert.Equal("x", EquivalenceChecker.Compare("x", EntryKind.Case, a, a, ToleranceSpec.Default).Name);
    }

    [Fact]
    public void Missing_case_hasNoResidualNoTolerance_andNeitherPartPasses()
    {
        LoadReduction r = Reduce(V(0, 0, 0), FarOriginal);
        CaseComparison m = EquivalenceChecker.Missing("snow", EntryKind.Case, null, r, ["only in the substitute"]);
        Assert.Null(m.Residual);
        Assert.Null(m.Tolerance);
        Assert.False(m.ForcePasses);
        Assert.False(m.MomentPasses);
        Assert.Same(r, m.Substitute);
        Assert.Null(m.Original);
        Assert.Equal(["only in the substitute"], m.Notes);
        Assert.Empty(EquivalenceChecker.Missing("snow", EntryKind.Case, r, null).Notes);
    }

    [Fact]
    public void Missing_bothOrNeitherReduction_refused()
    {
        LoadReduction r = Reduce(V(0, 0, 0), FarOriginal);
        ArgumentException both = Assert.Throws<ArgumentException>(() => EquivalenceChecker.Missing("x", EntryKind.Case, r, r));
        ArgumentException neither = Assert.Throws<ArgumentException>(() => EquivalenceChecker.Missing("x", EntryKind.Case, null, null));
        Assert.Equal("original", both.ParamName);
        Assert.Contains("Exactly one", neither.Message, StringComparison.Ordinal);
    }
}
