namespace LoadDiff.Core.Tests.Support;

/// <summary>The exact reference must itself be right, or the accuracy tests prove nothing.</summary>
public class ExactRationalTests
{
    [Fact]
    public void Add_pointOnePlusPointTwo_differsFromRoundedDoubleSum()
    {
        ExactRational exact = ExactRational.FromDouble(0.1) + ExactRational.FromDouble(0.2);
        Assert.NotEqual(ExactRational.FromDouble(0.1 + 0.2), exact);
        // 0.1 = 3602879701896397·2^-55 and 0.2 = 3602879701896397·2^-54, so the sum is 10808639105689191·2^-55.
        Assert.Equal(ExactRational.FromDouble(3602879701896397) * ExactRational.FromDouble(Math.ScaleB(1, -55)) * ExactRational.FromDouble(3), exact);
    }

    [Fact]
    public void FromDouble_subnormalAndNegative_exact()
    {
        ExactRational tiny = ExactRational.FromDouble(double.Epsilon);
        Assert.Equal(ExactRational.FromDouble(2 * double.Epsilon), tiny + tiny);
        Assert.Equal(ExactRational.Zero, ExactRational.FromDouble(-1.5) + ExactRational.FromDouble(1.5));
        Assert.True(ExactRational.FromDouble(-1) < ExactRational.FromDouble(-0.5));
    }
}
