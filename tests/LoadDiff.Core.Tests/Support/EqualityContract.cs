namespace LoadDiff.Core.Tests.Support;

/// <summary>Checks that Equals(T), Equals(object), GetHashCode and the == / != operators of a type agree.</summary>
public static class EqualityContract
{
    /// <param name="value">A value.</param>
    /// <param name="equal">A distinct instance (or differently built value) that must equal <paramref name="value"/>.</param>
    /// <param name="different">A value that must not equal <paramref name="value"/>.</param>
    /// <param name="op">The type's == operator.</param>
    /// <param name="notOp">The type's != operator.</param>
    public static void Check<T>(T value, T equal, T different, Func<T, T, bool> op, Func<T, T, bool> notOp)
        where T : IEquatable<T>
    {
        Assert.True(value.Equals(value), "reflexive Equals(T)");
        Assert.True(value.Equals(equal), "Equals(T) on equal values");
        Assert.True(equal.Equals(value), "symmetric Equals(T)");
        Assert.True(value.Equals((object?)equal), "Equals(object) on equal values");
        Assert.Equal(value.GetHashCode(), equal.GetHashCode());
        Assert.True(op(value, equal), "== on equal values");
        Assert.False(notOp(value, equal), "!= on equal values");

        Assert.False(value.Equals(different), "Equals(T) on different values");
        Assert.False(different.Equals(value), "symmetric Equals(T) on different values");
        Assert.False(value.Equals((object?)different), "Equals(object) on different values");
        Assert.False(op(value, different), "== on different values");
        Assert.True(notOp(value, different), "!= on different values");

        Assert.False(value.Equals((object?)null), "Equals(null)");
        Assert.False(value.Equals(new object()), "Equals(object of another type)");
    }
}
