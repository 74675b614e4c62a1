namespace LoadDiff.Core.Loads;

/// <summary>One load of a load case. Positions are in length units, global axes; forces in force units.</summary>
/// <param name="Id">Identifier, unique within its case; the diff matches on it.</param>
public abstract record LoadItem(string Id)
{
    /// <summary>The kind of this item.</summary>
    public abstract LoadKind Kind { get; }

    /// <summary>The exact (closed-form) contribution of this item to a reduction about <paramref name="point"/>.</summary>
    public abstract Contribution ContributionAbout(Vector3 point);

    /// <summary>
    /// True when the item's gross magnitude is not zero (Σ|F| or ∫|w| of its forces, or |C| of a couple). An item that is
    /// not loaded (a zero nodal force of a whole-model export, a line or area of zero intensity) is no loaded geometry:
    /// it widens no box, no tolerance and no section range.
    /// </summary>
    public virtual bool IsLoaded
    {
        get
        {
            Vector3 origin = Vector3.Zero;
            bool found = false;
            VisitGeometry(p =>
            {
                if (!found)
                {
                    origin = p;
                    found = true;
                }
            });
            Contribution c = ContributionAbout(origin);
            return c.GrossForce > 0 || c.GrossCouple > 0;
        }
    }

    /// <summary>Calls <paramref name="visit"/> for every point that bounds this item's geometry (none for a couple).</summary>
    public abstract void VisitGeometry(Action<Vector3> visit);

    /// <summary>True when every force this item applies has the same line direction as <paramref name="direction"/> (unit vector).</summary>
    internal abstract bool IsParallelTo(Vector3 direction, double relativeTolerance);

    /// <summary>A representative direction of the force this item applies, or zero for couples and zero loads.</summary>
    internal abstract Vector3 ForceDirection { get; }

    internal static bool Parallel(Vector3 v, Vector3 unit, double rel)
    {
        // Compared as lengths, not squares: squares of a tiny force underflow to 0 and would call any direction parallel.
        double n = v.Length;
        return n == 0 || Vector3.Cross(v, unit).Length <= rel * n;
    }
}
