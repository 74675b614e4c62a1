using System.Numerics;

namespace LoadDiff.Core.Loads;

/// <summary>A vertex of a polygon projected onto a coordinate plane.</summary>
internal readonly record struct PlanePoint(double U, double V)
{
    /// <summary>The sweep's order: by U, then by V (so an edge along V runs from its lower end).</summary>
    public int CompareTo(PlanePoint other)
    {
        int c = U.CompareTo(other.U);
        return c != 0 ? c : V.CompareTo(other.V);
    }
}

/// <summary>
/// Tests a plane polygon for self-intersection by a sweep over its vertices (after Shamos and Hoey): edges enter an
/// ordered status at their first end and leave at their last, and only edges that become neighbours in that order
/// are tested against each other. The first bad contact met by the sweep is always between two such neighbours, so
/// one is found if there is any; O(n log n) for n vertices.
/// </summary>
internal sealed class PolygonSweep
{
    private readonly PlanePoint[] _p;
    private readonly PlanePoint[] _first;
    private readonly PlanePoint[] _last;
    private readonly int _n;
    private Node? _root;
    private uint _random = 2463534242; // fixed: the same polygon always builds the same status tree

    public PolygonSweep(PlanePoint[] vertices)
    {
        _p = vertices;
        _n = vertices.Length;
        _first = new PlanePoint[_n];
        _last = new PlanePoint[_n];
        for (int i = 0; i < _n; i++)
        {
            PlanePoint a = _p[i], b = _p[Next(i)];
            (_first[i], _last[i]) = a.CompareTo(b) <= 0 ? (a, b) : (b, a);
        }
    }

    /// <summary>True when no two edges cross or touch, other than neighbours at their shared vertex.</summary>
    public bool IsSimple()
    {
        for (int i = 0; i < _n; i++)
        {
            // A repeated vertex: the edges on either side of the zero-length edge meet there (n ≥ 4) or fold back (n = 3).
            if (_p[i] == _p[Next(i)])
            {
                return false;
            }
        }
        // Each edge enters at its first end (event 2·i) and leaves at its last (2·i + 1); at one point, entries come
        // before exits, so edges that only touch there are in the status together and are tested.
        var events = new int[2 * _n];
        for (int k = 0; k < events.Length; k++)
        {
            events[k] = k;
        }
        Array.Sort(events, CompareEvents);
        foreach (int k in events)
        {
            int edge = k >> 1;
            if ((k & 1) == 0)
            {
                (int below, int above) = Insert(edge);
                if ((below >= 0 && Touch(below, edge)) || (above >= 0 && Touch(edge, above)))
                {
                    return false;
                }
            }
            else
            {
                (int below, int above) = Remove(edge);
                if (below >= 0 && above >= 0 && Touch(below, above))
                {
                    return false;
                }
            }
        }
        return true;
    }

    private int Next(int i) => i + 1 == _n ? 0 : i + 1;

    private int CompareEvents(int a, int b)
    {
        PlanePoint pa = (a & 1) == 0 ? _first[a >> 1] : _last[a >> 1];
        PlanePoint pb = (b & 1) == 0 ? _first[b >> 1] : _last[b >> 1];
        int c = pa.CompareTo(pb);
        if (c != 0)
        {
            return c;
        }
        c = (a & 1).CompareTo(b & 1); // entries (even) first
        return c != 0 ? c : a.CompareTo(b);
    }

    // A bad contact between edges i and j: for neighbours, folding back along each other at the shared vertex;
    // for any other pair, any common point.
    private bool Touch(int i, int j)
    {
        if (i > j)
        {
            (i, j) = (j, i);
        }
        if (j == i + 1)
        {
            return Overlap(_p[j], _p[i], _p[Next(j)]);
        }
        if (i == 0 && j == _n - 1)
        {
            return Overlap(_p[0], _p[_n - 1], _p[1]);
        }
        return Intersect(_p[i], _p[Next(i)], _p[j], _p[Next(j)]);
    }

    // Which of two edges in the status lies above the other where both are: the orientation of the later-starting
    // edge's first end (then its last end) against the other edge's line. Collinear edges are ordered by number.
    private int CompareEdges(int a, int b)
    {
        if (a == b)
        {
            return 0;
        }
        if (_first[a].CompareTo(_first[b]) < 0)
        {
            return -CompareEdges(b, a);
        }
        int s = Orient(_first[b], _last[b], _first[a]);
        if (s == 0)
        {
            s = Orient(_first[b], _last[b], _last[a]);
        }
        return s > 0 ? 1 : s < 0 ? -1 : a.CompareTo(b);
    }

    private (int Below, int Above) Insert(int edge)
    {
        Split(_root, edge, includeEqual: false, out Node? lower, out Node? upper);
        int below = Rightmost(lower), above = Leftmost(upper);
        _root = Merge(Merge(lower, new Node(edge, NextPriority())), upper);
        return (below, above);
    }

    private (int Below, int Above) Remove(int edge)
    {
        Split(_root, edge, includeEqual: false, out Node? lower, out Node? rest);
        Split(rest, edge, includeEqual: true, out _, out Node? upper); // the middle part is the edge itself
        int below = Rightmost(lower), above = Leftmost(upper); // before the merge joins the two parts
        _root = Merge(lower, upper);
        return (below, above);
    }

    // Splits a treap into the edges below `edge` (or below and equal to it) and the rest.
    private void Split(Node? t, int edge, bool includeEqual, out Node? lower, out Node? upper)
    {
        if (t is null)
        {
            (lower, upper) = (null, null);
            return;
        }
        int c = CompareEdges(t.Edge, edge);
        if (c < 0 || (includeEqual && c == 0))
        {
            Split(t.Right, edge, includeEqual, out Node? l, out upper);
            t.Right = l;
            lower = t;
        }
        else
        {
            Split(t.Left, edge, includeEqual, out lower, out Node? r);
            t.Left = r;
            upper = t;
        }
    }

    private static Node? Merge(Node? a, Node? b)
    {
        if (a is null)
        {
            return b;
        }
        if (b is null)
        {
            return a;
        }
        if (a.Priority > b.Priority)
        {
            a.Right = Merge(a.Right, b);
            return a;
        }
        b.Left = Merge(a, b.Left);
        return b;
    }

    private static int Rightmost(Node? t)
    {
        if (t is null)
        {
            return -1;
        }
        while (t.Right is not null)
        {
            t = t.Right;
        }
        return t.Edge;
    }

    private static int Leftmost(Node? t)
    {
        if (t is null)
        {
            return -1;
        }
        while (t.Left is not null)
        {
            t = t.Left;
        }
        return t.Edge;
    }

    private uint NextPriority()
    {
        // xorshift32: random priorities keep the treap's depth logarithmic on any input order
        _random ^= _random << 13;
        _random ^= _random >> 17;
        _random ^= _random << 5;
        return _random;
    }

    // The sign of the turn a → b → c (positive: counter-clockwise), exact: a floating-point value far enough
    // from zero is taken as it is (the error bound of Shewchuk's orientation filter), the rest is decided in
    // integers. Exact signs keep the status order consistent and make touching and collinear cases certain.
    internal static int Orient(PlanePoint a, PlanePoint b, PlanePoint c)
    {
        double left = (b.U - a.U) * (c.V - a.V), right = (b.V - a.V) * (c.U - a.U);
        double det = left - right;
        double bound = 3.3306690738754716e-16 * (Math.Abs(left) + Math.Abs(right)); // (3 + 16ε)ε, ε = 2⁻⁵³
        // Below about 1e-290 the products may have underflowed and the bound does not hold.
        if ((det > bound || -det > bound) && bound > 1e-290)
        {
            return det > 0 ? 1 : -1;
        }
        return ExactOrient(a, b, c);
    }

    private static int ExactOrient(PlanePoint a, PlanePoint b, PlanePoint c)
    {
        // Every double is m·2^e with integer m; on the smallest exponent of the six the coordinates are integers.
        Span<double> values = [a.U, a.V, b.U, b.V, c.U, c.V];
        int low = int.MaxValue;
        foreach (double v in values)
        {
            low = Math.Min(low, Decompose(v).Exponent);
        }
        BigInteger Whole(double v)
        {
            (long m, int e) = Decompose(v);
            return new BigInteger(m) << (e - low);
        }
        BigInteger au = Whole(a.U), av = Whole(a.V), bu = Whole(b.U), bv = Whole(b.V), cu = Whole(c.U), cv = Whole(c.V);
        return (((bu - au) * (cv - av)) - ((bv - av) * (cu - au))).Sign;
    }

    private static (long Mantissa, int Exponent) Decompose(double v)
    {
        long bits = BitConverter.DoubleToInt64Bits(v);
        int biased = (int)((bits >> 52) & 0x7FF);
        long m = bits & 0xFFFFFFFFFFFFFL;
        (m, int e) = biased == 0 ? (m, -1074) : (m | (1L << 52), biased - 1075);
        return (bits < 0 ? -m : m, e);
    }

    private static bool OnSegment(PlanePoint a, PlanePoint b, PlanePoint c) =>
        Math.Min(a.U, b.U) <= c.U && c.U <= Math.Max(a.U, b.U) && Math.Min(a.V, b.V) <= c.V && c.V <= Math.Max(a.V, b.V);

    private static bool Intersect(PlanePoint a, PlanePoint b, PlanePoint c, PlanePoint d)
    {
        int d1 = Orient(c, d, a), d2 = Orient(c, d, b), d3 = Orient(a, b, c), d4 = Orient(a, b, d);
        if (d1 * d2 < 0 && d3 * d4 < 0)
        {
            return true;
        }
        return (d1 == 0 && OnSegment(c, d, a)) || (d2 == 0 && OnSegment(c, d, b))
            || (d3 == 0 && OnSegment(a, b, c)) || (d4 == 0 && OnSegment(a, b, d));
    }

    // Two edges meeting at `shared` and ending at x and y overlap when they are collinear and leave it the same way.
    private static bool Overlap(PlanePoint shared, PlanePoint x, PlanePoint y) =>
        Orient(shared, x, y) == 0 && x.CompareTo(shared) == y.CompareTo(shared);

    private sealed class Node(int edge, uint priority)
    {
        public int Edge { get; } = edge;
        public uint Priority { get; } = priority;
        public Node? Left { get; set; }
        public Node? Right { get; set; }
    }
}
