using LoadDiff.Core.Units;

namespace LoadDiff.Core.Diff;

/// <summary>
/// The semantic difference between two versions of a load description, in the old version's units, with the
/// canonical listings of both for a line diff.
/// </summary>
/// <param name="OldName">The old version as named by the user.</param>
/// <param name="NewName">The new version as named by the user.</param>
/// <param name="Units">The units of every value (the old version's).</param>
/// <param name="NewUnits">The units the new version is written in; when they differ it was converted exactly.</param>
/// <param name="ReferencePoint">The point moments are taken about, in <paramref name="Units"/>.</param>
/// <param name="ReferenceDescription">How the point was chosen.</param>
/// <param name="Settings">Document-level differences.</param>
/// <param name="Items">Item differences, case by case.</param>
/// <param name="Resultants">Every case's and combination's resultant before and after.</param>
/// <param name="OldListing">The canonical listing of the old version.</param>
/// <param name="NewListing">The canonical listing of the new version (in the old version's units when converted).</param>
/// <param name="Notes">Remarks on how the comparison was made (conversions, derived keys, referenced files).</param>
public sealed record DocumentDiff(
    string OldName, string NewName, UnitSystem Units, UnitSystem NewUnits, Vector3 ReferencePoint, string ReferenceDescription,
    IReadOnlyList<SettingChange> Settings, IReadOnlyList<ItemChange> Items, IReadOnlyList<ResultantChange> Resultants,
    string OldListing, string NewListing, IReadOnlyList<string> Notes)
{
    /// <summary>
    /// Null when both listings are exact canonical listings (same units); otherwise the significant digits their numbers
    /// were rounded to after the new version was converted into <see cref="Units"/>, so conversion noise makes no changed line.
    /// </summary>
    public int? ListingSignificantDigits { get; init; }

    /// <summary>False when the operands were CSV tables, which have no canonical listing (their rows are diffed instead).</summary>
    public bool HasListings { get; init; } = true;

    /// <summary>True when the new version was written in other units and converted into <see cref="Units"/>.</summary>
    public bool UnitsConverted => NewUnits != Units;

    /// <summary>True when anything differs (order, spelling, whitespace and comments never do).</summary>
    public bool HasDifferences => Settings.Count > 0 || Items.Count > 0;

    /// <inheritdoc/>
    public override string ToString() => $"{OldName} → {NewName}: {Settings.Count} setting and {Items.Count} item differences";
}
