namespace LoadDiff.Core.Equivalence;

/// <summary>Which part of the tolerance rule set an allowance.</summary>
public enum AllowanceSource
{
    /// <summary>The absolute tolerance F or M given by the user.</summary>
    Absolute,

    /// <summary>rel · G_F or rel · G_M of the original.</summary>
    Relative,

    /// <summary>The rounding noise of the two reductions (the allowance never falls below it).</summary>
    Rounding,
}
