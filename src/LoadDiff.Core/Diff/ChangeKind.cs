namespace LoadDiff.Core.Diff;

/// <summary>How an item or setting differs between two versions of a load description.</summary>
public enum ChangeKind
{
    /// <summary>Only in the new version.</summary>
    Added,

    /// <summary>Only in the old version.</summary>
    Removed,

    /// <summary>In both, with different content.</summary>
    Changed,
}
