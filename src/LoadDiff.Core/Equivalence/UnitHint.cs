namespace LoadDiff.Core.Equivalence;

/// <summary>
/// A warning that the two load systems may have been read in different units. A hint never changes a verdict:
/// it only suggests where to look.
/// </summary>
/// <param name="Code">A short stable code: <c>no-units</c>, <c>partial-units</c>, <c>length-factor</c> or <c>force-factor</c>.</param>
/// <param name="Message">One plain sentence that states what was measured and the likely slip.</param>
/// <param name="Factor">
/// The measured ratio, substitute over original (box diagonals for <c>length-factor</c>, gross forces for
/// <c>force-factor</c>); null for hints about a file's units block.
/// </param>
public sealed record UnitHint(string Code, string Message, double? Factor = null)
{
    /// <summary>The code used for a file that states neither a force nor a length unit.</summary>
    public const string NoUnitsCode = "no-units";

    /// <summary>The code used for a file that states one of its force and length units but not the other.</summary>
    public const string PartialUnitsCode = "partial-units";

    /// <summary>The code used when the loaded regions differ in size by a length-unit factor.</summary>
    public const string LengthFactorCode = "length-factor";

    /// <summary>The code used when the gross forces differ by a force-unit factor.</summary>
    public const string ForceFactorCode = "force-factor";

    /// <inheritdoc/>
    public override string ToString() => $"{Code}: {Message}";
}
