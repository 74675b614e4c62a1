using LoadDiff.Core.Units;

namespace LoadDiff.Formats;

/// <summary>Exact factors from a file's units to the units items are delivered in (1 exactly where they agree).</summary>
internal sealed record UnitConversion(UnitSystem Source, UnitSystem Target)
{
    public double Length { get; } = Source.Length.FactorTo(Target.Length);

    public double Force { get; } = Source.Force.FactorTo(Target.Force);

    public double Mass { get; } = Source.Mass.FactorTo(Target.Mass);

    public double Moment => Force * Length;

    public double LineIntensity => Force / Length;

    public double Pressure => Force / (Length * Length);

    public double PressureGradient => Force / (Length * Length * Length);

    /// <summary>
    /// From an acceleration in source length units per s² to force per unit mass in target units:
    /// a[m/s²] × m[kg] = F[N], so the factor is L_src·M_tgt / F_tgt in SI factors.
    /// </summary>
    public double GravityToForcePerMass { get; } = Source.Length.ToSi * Target.Mass.ToSi / Target.Force.ToSi;
}
