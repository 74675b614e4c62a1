using System.Globalization;

namespace LoadDiff.Core.Tests.Support;

/// <summary>Sets the current culture for the lifetime of the scope and restores the previous one.</summary>
public sealed class CultureScope : IDisposable
{
    private readonly CultureInfo _previous;
    private readonly CultureInfo _previousUi;

    public CultureScope(string name)
    {
        _previous = CultureInfo.CurrentCulture;
        _previousUi = CultureInfo.CurrentUICulture;
        CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(name);
        CultureInfo.CurrentUICulture = CultureInfo.GetCultureInfo(name);
    }

    public void Dispose()
    {
        CultureInfo.CurrentCulture = _previous;
        CultureInfo.CurrentUICulture = _previousUi;
    }
}
