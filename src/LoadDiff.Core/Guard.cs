using System.Runtime.CompilerServices;

namespace LoadDiff.Core;

/// <summary>Argument checks for programming errors; bad user input is reported by the readers, not here.</summary>
internal static class Guard
{
    public static double Finite(double value, [CallerArgumentExpression(nameof(value))] string? name = null)
    {
        if (!double.IsFinite(value))
        {
            throw new ArgumentException($"{name} must be a finite number, was {value.ToString(System.Globalization.CultureInfo.InvariantCulture)}.", name);
        }
        return value;
    }

    public static void Finite(double x, double y, double z, string? name)
    {
        if (!double.IsFinite(x) || !double.IsFinite(y) || !double.IsFinite(z))
        {
            throw new ArgumentException($"{name} must have finite components.", name);
        }
    }

    public static T NotNull<T>(T? value, [CallerArgumentExpression(nameof(value))] string? name = null)
        where T : class
        => value ?? throw new ArgumentNullException(name);

    public static void Positive(double value, [CallerArgumentExpression(nameof(value))] string? name = null)
    {
        if (!(value > 0) || !double.IsFinite(value))
        {
            throw new ArgumentException($"{name} must be a positive finite number.", name);
        }
    }

    public static void That(bool condition, string message, string? name)
    {
        if (!condition)
        {
            throw new ArgumentException(message, name);
        }
    }
}
