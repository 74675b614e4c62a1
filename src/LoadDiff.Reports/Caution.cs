namespace LoadDiff.Reports;

/// <summary>The caution every report carries (static equivalence is about rigid-body effect only).</summary>
public static class Caution
{
    /// <summary>One paragraph, plain text.</summary>
    public const string Text =
        "Caution: static equivalence means the same resultant force and moment, that is the same effect on a rigid body. "
        + "Internal forces, local stresses and deflections can still differ (Saint-Venant's principle). "
        + "This result does not replace the governing design codes or licensed engineering judgement.";
}
