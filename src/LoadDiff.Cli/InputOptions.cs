using System.CommandLine;
using System.Globalization;
using LoadDiff.Formats;

namespace LoadDiff.Cli;

/// <summary>The options that say how input files are read, shared by every command that reads load files.</summary>
public sealed class InputOptions
{
    private readonly Option<int> _threads = new("--threads")
    {
        Description = "Threads that parse large CSV files (default: one per core). The result is identical for any number.",
        HelpName = "N",
        DefaultValueFactory = _ => Environment.ProcessorCount,
        CustomParser = r => Whole(r, "--threads", 1, 256, 1),
    };

    private readonly Option<long> _maxItems = new("--max-items")
    {
        Description = "Refuse a file with more load items than this (default 1000000000; CSV rows and mesh triangles count).",
        HelpName = "N",
        DefaultValueFactory = _ => new ReadOptions().MaxItems,
        CustomParser = r => Whole(r, "--max-items", 1, long.MaxValue, 1),
    };

    private readonly Option<bool> _allowOutside = new("--allow-outside")
    {
        Description = "Read CSV files that a load file references outside its own folder (absolute paths or ..).",
    };

    private readonly Option<bool> _strict = new("--strict")
    {
        Description = "Treat unknown fields in load files as errors, not warnings.",
    };

    /// <summary>Adds the options to a command.</summary>
    public void AddTo(Command command)
    {
        ArgumentNullException.ThrowIfNull(command);
        command.Add(_threads);
        command.Add(_maxItems);
        command.Add(_allowOutside);
        command.Add(_strict);
    }

    /// <summary>The reader options chosen on the command line.</summary>
    public ReadOptions From(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        return new ReadOptions
        {
            Threads = parse.GetValue(_threads),
            MaxItems = parse.GetValue(_maxItems),
            AllowOutside = parse.GetValue(_allowOutside),
            Strict = parse.GetValue(_strict),
        };
    }

    private static T Whole<T>(System.CommandLine.Parsing.ArgumentResult r, string name, T min, T max, T fallback)
        where T : struct, System.Numerics.IBinaryInteger<T>
    {
        string s = r.Tokens.Count > 0 ? r.Tokens[0].Value : "";
        if (T.TryParse(s, NumberStyles.None, CultureInfo.InvariantCulture, out T n) && n >= min && n <= max)
        {
            return n;
        }
        r.AddError($"{name} '{s}': expected a whole number from {min} to {max}");
        return fallback;
    }
}
