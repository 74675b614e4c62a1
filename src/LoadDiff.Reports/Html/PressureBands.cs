namespace LoadDiff.Reports.Html;

/// <summary>
/// Pressure shading in five bands each side of zero: blues for positive, oranges for negative, darker for larger
/// magnitude, so the shading reads in grey too. The legend prints the band limits.
/// </summary>
internal sealed class PressureBands
{
    public const int Steps = 5;

    private static readonly string[] Positive = ["#e4eef8", "#c8dcf0", "#a4c6e4", "#7eaed6", "#5a94c6"];
    private static readonly string[] Negative = ["#fde8d4", "#fbd2a8", "#f8b679", "#f1964e", "#e0772d"];

    public PressureBands(double max) => Max = max;

    /// <summary>Largest |p| of the case, both systems.</summary>
    public double Max { get; }

    /// <summary>The band edges from −Max to +Max.</summary>
    public IEnumerable<double> Edges => Enumerable.Range(-Steps, (2 * Steps) + 1).Select(j => Max * j / Steps);

    /// <summary>The band index of a value: 1 … Steps by |p|, negative for suction.</summary>
    public int Band(double p)
    {
        if (Max <= 0)
        {
            return 1;
        }
        int k = Math.Clamp((int)Math.Ceiling((Math.Abs(p) / Max * Steps) - 1e-9), 1, Steps);
        return p < 0 ? -k : k;
    }

    public string Colour(double p)
    {
        int b = Band(p);
        return b > 0 ? Positive[b - 1] : Negative[-b - 1];
    }

    public static string BandColour(int band) => band > 0 ? Positive[band - 1] : Negative[-band - 1];

    public string Label(double v) => NumberText.Readable(v, Max * 1e-12);
}
