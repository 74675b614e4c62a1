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

    private readonly Option<long> _maxFileSize = new("--max-file-size")
    {
        Description = "Refuse an input file larger than this many bytes (default 512 MiB for a JSON file read whole, 64 GiB for streamed files).",
        HelpName = "BYTES",
        CustomParser = r => Whole(r, "--max-file-size", 1, long.MaxValue, 1),
    };

    private readonly Option<int> _maxDepth = new("--max-depth")
    {
        Description = "Refuse JSON nested deeper than this (default 64).",
        HelpName = "N",
        DefaultValueFactory = _ => new ReadOptions().MaxDepth,
        CustomParser = r => Whole(r, "--max-depth", 1, 1024, 64),
    };

    private readonly Option<int> _maxLineLength = new("--max-line-length")
    {
        Description = "Refuse a CSV line longer than this many characters (default 1048576).",
        HelpName = "N",
        DefaultValueFactory = _ => new ReadOptions().MaxLineLength,
        CustomParser = r => Whole(r, "--max-line-length", 16, 1 << 28, 1 << 20),
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
        command.Add(_maxFileSize);
        command.Add(_maxDepth);
        command.Add(_maxLineLength);
        command.Add(_allowOutside);
        command.Add(_strict);
    }

    /// <summary>The reader options chosen on the command line.</summary>
    public ReadOptions From(ParseResult parse)
    {
        ArgumentNullException.ThrowIfNull(parse);
        var options = new ReadOptions
        {
            Threads = parse.GetValue(_threads),
            MaxItems = parse.GetValue(_maxItems),
            MaxDepth = parse.GetValue(_maxDepth),
            MaxLineLength = parse.GetValue(_maxLineLength),
            AllowOutside = parse.GetValue(_allowOutside),
            Strict = parse.GetValue(_strict),
        };
        // one limit for both: a file read whole and a streamed one
        return parse.GetResult(_maxFileSize) is null ? options
            : options with { MaxJsonBytes = parse.GetValue(_maxFileSize), MaxCsvBytes = parse.GetValue(_maxFileSize) };
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
