namespace LoadDiff.Core.Loads;

/// <summary>The kinds of load item of the load description.</summary>
public enum LoadKind
{
    /// <summary>A concentrated force at a point.</summary>
    Force,

    /// <summary>A free couple (moment vector), independent of position.</summary>
    Couple,

    /// <summary>A line load with intensity varying linearly along a straight segment.</summary>
    Line,

    /// <summary>A pressure on a planar polygon, uniform or varying linearly in space.</summary>
    Area,

    /// <summary>A mass at a point under gravity.</summary>
    Mass,

    /// <summary>One triangle of a pressure mesh, pressure given at each vertex.</summary>
    MeshTriangle,
}
