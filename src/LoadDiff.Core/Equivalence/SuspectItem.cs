namespace LoadDiff.Core.Equivalence;

/// <summary>What an item would have to have gone wrong to account for a residual.</summary>
public enum SuspectKind
{
    /// <summary>An original item whose contribution equals −residual: left out of the substitute?</summary>
    LeftOut,

    /// <summary>A substitute item equal to +residual: no counterpart in the original (extra, or counted twice)?</summary>
    NoCounterpart,

    /// <summary>An item whose doubled contribution equals the residual: sign reversed?</summary>
    SignReversed,
}

/// <summary>An item that accounts for a residual within the tolerance.</summary>
/// <param name="Id">The item's id.</param>
/// <param name="InOriginal">True for an item of the original, false for one of the substitute.</param>
/// <param name="Case">For a combination, the component case the item belongs to; null for a case.</param>
/// <param name="Factor">The item's load factor in the combination (1 for a case).</param>
/// <param name="Kind">What would have gone wrong.</param>
public sealed record SuspectItem(string Id, bool InOriginal, string? Case, double Factor, SuspectKind Kind)
{
    /// <inheritdoc/>
    public override string ToString()
    {
        // the nested part is formatted on its own, so it needs the invariant culture of its own
        string where = Case is null ? "" : string.Create(System.Globalization.CultureInfo.InvariantCulture, $" of case {Case} (×{Factor:R})");
        return $"{(InOriginal ? "original" : "substitute")} item {Id}{where}: {Kind}";
    }
}
