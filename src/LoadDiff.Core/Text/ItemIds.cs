namespace LoadDiff.Core.Text;

/// <summary>
/// The rule an item id of a load description obeys: non-empty, not starting with <see cref="DerivedPrefix"/> (reserved for
/// the ids a reader derives for items that have none), and free of the characters <see cref="NameCharacters"/> forbids.
/// </summary>
public static class ItemIds
{
    /// <summary>The first character of every derived id; no id given in a file may start with it.</summary>
    public const char DerivedPrefix = '~';

    /// <summary>Why <paramref name="id"/> cannot be an item id, in words beginning with <paramref name="what"/>; null when it can.</summary>
    public static string? Problem(string id, string what)
    {
        ArgumentNullException.ThrowIfNull(id);
        if (id.Length == 0 || id[0] == DerivedPrefix)
        {
            return $"{what} must be non-empty and must not start with '{DerivedPrefix}' (reserved for derived ids)";
        }
        int bad = NameCharacters.FirstForbidden(id);
        return bad >= 0 ? NameCharacters.Describe(what, id, bad) : null;
    }
}
