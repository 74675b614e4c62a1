namespace LoadDiff.Formats.Diagnostics;

/// <summary>How serious a diagnostic is.</summary>
public enum Severity
{
    /// <summary>The input is accepted; something may be unintended.</summary>
    Warning,

    /// <summary>The input is rejected.</summary>
    Error,
}
