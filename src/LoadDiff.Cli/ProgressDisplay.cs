using System.Diagnostics;
using System.Globalization;

namespace LoadDiff.Cli;

/// <summary>
/// One self-overwriting line on standard error while a long read runs: bytes and items so far and their rates.
/// Shown only when standard error is a terminal, never in CI (the CI variable is set) or when standard error is
/// redirected, and only once the work has taken longer than a short delay, so quick runs print nothing.
/// </summary>
public sealed class ProgressDisplay : IDisposable
{
    /// <summary>Default delay before the line first appears.</summary>
    public static readonly TimeSpan DefaultDelay = TimeSpan.FromMilliseconds(700);

    private static readonly TimeSpan Interval = TimeSpan.FromMilliseconds(200);
    private readonly TextWriter _error;
    private readonly string _label;
    private readonly Func<TimeSpan> _clock;
    private readonly TimeSpan _delay;
    private TimeSpan _next;
    private long _bytes;
    private long _items;
    private int _width;

    /// <summary>Creates a display writing to <paramref name="error"/>.</summary>
    /// <param name="error">Standard error (a terminal).</param>
    /// <param name="label">What is being read, usually the file name.</param>
    /// <param name="delay">How long to wait before the first line.</param>
    /// <param name="clock">Elapsed time since the start; a stopwatch when null.</param>
    public ProgressDisplay(TextWriter error, string label, TimeSpan delay, Func<TimeSpan>? clock = null)
    {
        ArgumentNullException.ThrowIfNull(error);
        _error = error;
        _label = label;
        _delay = delay;
        if (clock is null)
        {
            var watch = Stopwatch.StartNew();
            clock = () => watch.Elapsed;
        }
        _clock = clock;
        _next = delay;
    }

    /// <summary>True when a progress line belongs on standard error: it is a terminal, CI is not set, TERM is not dumb.</summary>
    public static bool Wanted() =>
        !Console.IsErrorRedirected
        && string.IsNullOrEmpty(Environment.GetEnvironmentVariable("CI"))
        && Environment.GetEnvironmentVariable("TERM") != "dumb";

    /// <summary>A display for standard error when <see cref="Wanted"/>, otherwise null.</summary>
    public static ProgressDisplay? ForStandardError(TextWriter error, string label)
    {
        if (!Wanted())
        {
            return null;
        }
        TimeSpan delay = DefaultDelay;
        if (int.TryParse(Environment.GetEnvironmentVariable("LOADDIFF_PROGRESS_DELAY_MS"), NumberStyles.None, CultureInfo.InvariantCulture, out int ms))
        {
            delay = TimeSpan.FromMilliseconds(ms);
        }
        return new ProgressDisplay(error, label, delay);
    }

    /// <summary>True once a line has been written (and not yet cleared).</summary>
    public bool Showing => _width > 0;

    /// <summary>Counts bytes read.</summary>
    public void AddBytes(long count)
    {
        _bytes += count;
        Tick();
    }

    /// <summary>Counts one item; the clock is looked at every 1024 items only.</summary>
    public void AddItem()
    {
        if ((++_items & 1023) == 0)
        {
            Tick();
        }
    }

    /// <summary>Counts a block of items reduced elsewhere.</summary>
    public void AddItems(long count)
    {
        _items += count;
        Tick();
    }

    /// <summary>Clears the line, so what follows starts on a clean line.</summary>
    public void Dispose()
    {
        if (_width > 0)
        {
            _error.Write("\r" + new string(' ', _width) + "\r");
            _error.Flush();
            _width = 0;
        }
    }

    /// <summary>The line for the counts so far after <paramref name="elapsed"/>.</summary>
    public static string Line(string label, long bytes, long items, TimeSpan elapsed)
    {
        double s = Math.Max(elapsed.TotalSeconds, 1e-3);
        return string.Create(CultureInfo.InvariantCulture,
            $"{label}: {bytes / 1e6:0.0} MB, {items:N0} items read ({bytes / 1e6 / s:0.0} MB/s, {items / s:N0} items/s)");
    }

    private void Tick()
    {
        TimeSpan now = _clock();
        if (now < _next)
        {
            return;
        }
        _next = now + Interval;
        string line = Line(_label, _bytes, _items, now);
        _error.Write("\r" + line.PadRight(_width));
        _error.Flush();
        _width = Math.Max(_width, line.Length);
    }
}
