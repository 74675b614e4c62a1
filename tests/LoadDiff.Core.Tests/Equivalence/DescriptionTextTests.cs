using LoadDiff.Core.Equivalence;
using LoadDiff.Core.Model;
using LoadDiff.Core.Tests.Support;

namespace LoadDiff.Core.Tests.Equivalence;

/// <summary>
/// The one-line descriptions the result records give a library user (in a debugger, a log or an assertion message):
/// they must say the same as the record, in the invariant culture. Written out by hand from each record's fields.
/// </summary>
public class DescriptionTextTests
{
    [Fact]
    public void A_case_comparison_says_its_kind_name_verdict_and_which_file_is_missing_it()
    {
        Assert.Equal("Case dead: equivalent",
            new CaseComparison("dead", EntryKind.Case, null, null, null, null, OnlyIn.Both, true, []).ToString());
        Assert.Equal("Combination uls: not equivalent (only in Original)",
            new CaseComparison("uls", EntryKind.Combination, null, null, null, null, OnlyIn.Original, false, []).ToString());
        Assert.Equal("Case wind: not equivalent (only in Substitute)",
            new CaseComparison("wind", EntryKind.Case, null, null, null, null, OnlyIn.Substitute, false, []).ToString());
    }

    [Fact]
    public void A_suspect_item_says_which_file_which_case_and_factor_and_why()
    {
        using var culture = new CultureScope("de-DE");
        Assert.Equal("original item P3: LeftOut", new SuspectItem("P3", true, null, 1, SuspectKind.LeftOut).ToString());
        Assert.Equal("substitute item S1 of case live (×1.5): SignReversed",
            new SuspectItem("S1", false, "live", 1.5, SuspectKind.SignReversed).ToString());
    }

    [Fact]
    public void A_unit_hint_and_an_explanation_say_their_code_and_reading()
    {
        Assert.Equal("length-factor: lengths in mm read as m", new UnitHint("length-factor", "lengths in mm read as m", 1000).ToString());
        var e = new ResidualExplanation(ResidualReading.MissingForce, Vector3.Create(0, 0, -2), Vector3.Zero, Vector3.Create(1, 2, 0),
            null, null, null, [new SuspectItem("P3", true, null, 1, SuspectKind.LeftOut)], false);
        Assert.Equal("MissingForce: missing force (0, 0, -2), couple (0, 0, 0) at (1, 2, 0); 1 suspect(s)", e.ToString());
    }

    [Fact]
    public void Applied_tolerance_marks_a_stated_length()
    {
        using var culture = new CultureScope("de-DE");
        var taken = new AppliedTolerance(0.5, 2.5, AllowanceSource.Relative, AllowanceSource.Absolute, 50, 250, 4.5, false, RoundingNoise.None);
        Assert.Equal("allowed |ΔR| 0.5 (Relative), |ΔM| 2.5 (Absolute); G_F 50, G_M 250, D 4.5", taken.ToString());
        Assert.Equal("allowed |ΔR| 0.5 (Relative), |ΔM| 2.5 (Absolute); G_F 50, G_M 250, D 4.5 (stated)",
            (taken with { DiagonalStated = true }).ToString());
    }
}
