namespace LoadDiff.Core.Reduction;

/// <summary>Where a line of action crosses the coordinate plane through the reference point normal to one axis.</summary>
/// <param name="Axis">0, 1 or 2 for the plane normal to x, y or z.</param>
/// <param name="Point">The crossing point (length units).</param>
public sealed record PlaneCrossing(int Axis, Vector3 Point)
{
    /// <summary>The plane's name, such as <c>z</c> for the plane normal to z.</summary>
    public string AxisName => Axis switch { 0 => "x", 1 => "y", _ => "z" };
}
