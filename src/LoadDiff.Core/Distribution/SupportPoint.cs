namespace LoadDiff.Core.Distribution;

/// <summary>A point that receives part of a load in a distribution.</summary>
/// <param name="Id">Identifier, used as the id of the force placed there.</param>
/// <param name="At">Position (length units, global axes).</param>
/// <param name="Weight">Relative stiffness (&gt; 0): the distribution minimises Σ|F_i|²/w_i, so a stiffer point takes more.</param>
public sealed record SupportPoint(string Id, Vector3 At, double Weight);
