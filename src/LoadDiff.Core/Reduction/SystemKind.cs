namespace LoadDiff.Core.Reduction;

/// <summary>What a force-couple system reduces to (Poinsot).</summary>
public enum SystemKind
{
    /// <summary>R = 0 and M = 0.</summary>
    Null,

    /// <summary>R = 0, M ≠ 0: a pure couple, the same about every point.</summary>
    Couple,

    /// <summary>R ≠ 0 and R·M = 0: a single force along the central axis.</summary>
    Force,

    /// <summary>R ≠ 0 and R·M ≠ 0: a force along the central axis plus a couple parallel to it.</summary>
    Wrench,
}
