namespace LoadDiff.Core.Text;

/// <summary>
/// The characters a name (an item id, a case, combination or support-point name) may not hold: they would let a name
/// forge lines or reorder text on a terminal or in a report. Names are data, never markup.
/// </summary>
public static class NameCharacters
{
    /// <summary>True for a control character (Unicode Cc: C0, DEL, C1), U+2028/U+2029 and the bidi embeddings, overrides and isolates.</summary>
    public static bool IsForbidden(char c) =>
        char.IsControl(c)
        || c is '\u2028' or '\u2029'
        || c is >= '\u202A' and <= '\u202E'
        || c is >= '\u2066' and <= '\u2069';

    /// <summary>The index of the first forbidden character in <paramref name="name"/>, or −1 when it has none.</summary>
    public static int FirstForbidden(string name)
    {
        ArgumentNullException.ThrowIfNull(name);
        for (int i = 0; i < name.Length; i++)
        {
            if (IsForbidden(name[i]))
            {
                return i;
            }
        }
        return -1;
    }

    /// <summary>The message for a name whose first forbidden character is at <paramref name="index"/>.</summary>
    public static string Describe(string what, string name, int index) =>
        $"{what} must not contain control, line-separator or bidi-override characters (U+{(int)name[index]:X4} at character {index + 1})";
}
