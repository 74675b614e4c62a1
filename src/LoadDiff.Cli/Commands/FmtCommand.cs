using System.CommandLine;
using System.Text;
using LoadDiff.Formats;
using LoadDiff.Formats.Diagnostics;
using LoadDiff.Formats.Source;

namespace LoadDiff.Cli.Commands;

/// <summary><c>loaddiff fmt FILE</c>: the canonical form of a load description (lossless as a model).</summary>
public static class FmtCommand
{
    /// <summary>Builds the command.</summary>
    public static Command Build()
    {
        var file = new Argument<string>("FILE") { Description = "The .loads.json file, or - for standard input." };
        var write = new Option<bool>("--write") { Description = "Replace FILE with its canonical form (atomically: temporary file in the same folder, then rename)." };
        var check = new Option<bool>("--check") { Description = "Write nothing; exit 1 when FILE is not in canonical form (for a pre-commit gate)." };
        var dropComments = new Option<bool>("--drop-comments") { Description = "Let --write replace a file that holds comments (the canonical form has none)." };
        var command = new Command("fmt",
            "Print the canonical form of a load description: keys in a fixed order, each item on one line, numbers in the "
            + "shortest text that reads back as the same value. Reading the output gives exactly the same model. "
            + "Comments are not kept, so --write refuses a file with comments unless --drop-comments is given. "
            + "Exit code 0 on success (or canonical with --check), 1 when --check finds the file not canonical, 2 on input or usage errors.\n\n"
            + "Examples:\n  loaddiff fmt model.loads.json\n  loaddiff fmt --write model.loads.json\n  loaddiff fmt --check model.loads.json")
        {
            file, write, check, dropComments,
        };
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string path = parse.GetValue(file)!;
            bool doWrite = parse.GetValue(write), doCheck = parse.GetValue(check);
            if (doWrite && doCheck)
            {
                throw new UsageException("--write and --check exclude each other");
            }
            if (doWrite && path == "-")
            {
                throw new UsageException("--write needs a file, not standard input");
            }
            if (path.EndsWith(".csv", StringComparison.OrdinalIgnoreCase))
            {
                throw new UsageException($"'{path}': fmt formats .loads.json documents, not CSV data");
            }
            byte[] original;
            SourceReadResult read;
            if (path == "-")
            {
                using Stream stdin = Console.OpenStandardInput();
                using var ms = new MemoryStream();
                stdin.CopyTo(ms);
                original = ms.ToArray();
                read = LoadDocumentReader.ReadBytes(original, "-", Directory.GetCurrentDirectory());
            }
            else
            {
                read = LoadDocumentReader.Read(path);
                original = read.Succeeded ? File.ReadAllBytes(path) : [];
            }
            Report(read, error);
            string canonical = CanonicalWriter.Write(read.Document!);
            byte[] canonicalBytes = new UTF8Encoding(false).GetBytes(canonical);
            if (doCheck)
            {
                if (original.AsSpan().SequenceEqual(canonicalBytes))
                {
                    return ExitCodes.Success;
                }
                error.WriteLine($"{path}: not in canonical form{(read.HasComments ? " (it holds comments, which the canonical form does not)" : "")}; run 'loaddiff fmt --write {path}'");
                return ExitCodes.Different;
            }
            if (!doWrite)
            {
                if (read.HasComments)
                {
                    error.WriteLine($"{path}: note: the canonical form does not keep the file's comments");
                }
                output.Write(canonical);
                return ExitCodes.Success;
            }
            if (read.DroppedFields.Count > 0)
            {
                throw new UsageException($"'{path}' has fields the format does not define ({string.Join(", ", read.DroppedFields)}); fmt would drop them, so the file is left unchanged. Remove or rename them first.");
            }
            if (read.HasComments && !parse.GetValue(dropComments))
            {
                throw new UsageException($"'{path}' holds comments, which the canonical form does not keep; the file is left unchanged. Move what they say into titles, or give --drop-comments.");
            }
            if (original.AsSpan().SequenceEqual(canonicalBytes))
            {
                return ExitCodes.Success;
            }
            // lossless or nothing: the canonical text must read back as exactly the same model before it replaces the file
            SourceReadResult again = LoadDocumentReader.ReadBytes(canonicalBytes, path, Path.GetDirectoryName(Path.GetFullPath(path))!, new ReadOptions());
            if (!again.Succeeded || !again.Document!.Equals(read.Document))
            {
                throw new UsageException($"internal check failed: the canonical form of '{path}' does not read back as the same model; the file is left unchanged (please report this)");
            }
            AtomicReplace.Write(path, canonicalBytes);
            error.WriteLine($"{path}: rewritten in canonical form");
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>Prints warnings and the error; throws <see cref="InputFailureException"/> when the file was rejected.</summary>
    internal static void Report(SourceReadResult read, TextWriter error)
    {
        foreach (Diagnostic d in read.Diagnostics)
        {
            error.WriteLine(d.ToString());
        }
        if (!read.Succeeded)
        {
            throw new InputFailureException();
        }
    }
}
