namespace LoadDiff.Core.Model;

/// <summary>Whether a result belongs to a load case or a combination.</summary>
public enum EntryKind
{
    /// <summary>A load case as given in the file.</summary>
    Case,

    /// <summary>A factored sum of load cases.</summary>
    Combination,
}
