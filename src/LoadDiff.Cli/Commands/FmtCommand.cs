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
        var replaceReadOnly = new Option<bool>(FmtOptionNames.ReplaceReadOnly)
        {
            Description = "Let --write replace a file without write permission for its owner (refused by default; the permissions are kept).",
        };
        var splitHardLinks = new Option<bool>(FmtOptionNames.SplitHardLinks)
        {
            Description = "Let --write replace a file with more than one hard link: this name gets the canonical form, the other names keep "
                + "the old content (refused by default). A symbolic link is always followed and stays a link.",
        };
        var commentsToNotes = new Option<bool>("--comments-to-notes")
        {
            Description = "Move each comment into the note of the document, case or item it directly precedes (appended to a note "
                + "already there, after a line break); refuses, leaving the file unchanged, a comment that stands anywhere else.",
        };
        var command = new Command("fmt",
            "Print the canonical form of a load description: keys in a fixed order, each item on one line, numbers in the "
            + "shortest text that reads back as the same value. Reading the output gives exactly the same model. "
            + "Comments are not kept, so --write refuses a file with comments unless --comments-to-notes moves them into notes "
            + "or --drop-comments drops them. "
            + "Exit code 0 on success (or canonical with --check), 1 when --check finds the file not canonical, 2 on input or usage errors.\n\n"
            + "Examples:\n  loaddiff fmt model.loads.json\n  loaddiff fmt --write model.loads.json\n  loaddiff fmt --write --comments-to-notes model.loads.json\n  loaddiff fmt --check model.loads.json")
        {
            file, write, check, dropComments, commentsToNotes, replaceReadOnly, splitHardLinks,
        };
        command.SetAction(parse =>
        {
            TextWriter output = parse.InvocationConfiguration.Output;
            TextWriter error = parse.InvocationConfiguration.Error;
            string path = parse.GetValue(file)!;
            bool doWrite = parse.GetValue(write), doCheck = parse.GetValue(check), toNotes = parse.GetValue(commentsToNotes);
            if (doWrite && doCheck)
            {
                throw new UsageException("--write and --check exclude each other");
            }
            if (toNotes && doCheck)
            {
                throw new UsageException("--comments-to-notes changes the text; --check only tests it (a file with comments is never canonical)");
            }
            if (toNotes && parse.GetValue(dropComments))
            {
                throw new UsageException("--comments-to-notes and --drop-comments exclude each other");
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
                original = InputFiles.ReadStandardInput(new ReadOptions().MaxJsonBytes);
                read = LoadDocumentReader.ReadBytes(original, "-", Directory.GetCurrentDirectory());
            }
            else
            {
                read = LoadDocumentReader.Read(path);
                original = read.Succeeded ? File.ReadAllBytes(path) : [];
            }
            Report(read, error);
            LoadDocument document = read.Document!;
            if (toNotes)
            {
                if (CommentNotes.FirstUnplaced(read.Comments) is { } stray)
                {
                    throw new UsageException($"{path}:{stray.Line}:{stray.Column}: this comment cannot become a note: {stray.Problem}; "
                        + $"{SourceComment.Rule}. The file is left unchanged: move the comment directly before the item, case or document it describes, or remove it.");
                }
                document = CommentNotes.MoveIntoNotes(document, read.Comments);
            }
            string canonical = CanonicalWriter.Write(document);
            byte[] canonicalBytes = new UTF8Encoding(false).GetBytes(canonical);
            if (doCheck)
            {
                if (original.AsSpan().SequenceEqual(canonicalBytes))
                {
                    return ExitCodes.Success;
                }
                error.WriteLine($"{path}: not in canonical form{Advice(path, read)}");
                return ExitCodes.Different;
            }
            if (!doWrite)
            {
                if (read.HasComments && !toNotes)
                {
                    error.WriteLine($"{path}: note: the canonical form does not keep the file's comments (--comments-to-notes moves them into notes)");
                }
                output.Write(canonical);
                return ExitCodes.Success;
            }
            if (read.DroppedFields.Count > 0)
            {
                throw new UsageException($"'{path}' has fields the format does not define ({string.Join(", ", read.DroppedFields)}); fmt would drop them, so the file is left unchanged. Remove or rename them first.");
            }
            if (read.HasComments && !toNotes && !parse.GetValue(dropComments))
            {
                throw new UsageException($"'{path}' holds comments, which the canonical form does not keep; the file is left unchanged. "
                    + "Give --comments-to-notes to move them into notes, or --drop-comments to drop them.");
            }
            if (original.AsSpan().SequenceEqual(canonicalBytes))
            {
                return ExitCodes.Success;
            }
            // lossless or nothing: the canonical text must read back as exactly the same model before it replaces the file
            SourceReadResult again = LoadDocumentReader.ReadBytes(canonicalBytes, path, Path.GetDirectoryName(Path.GetFullPath(path))!, new ReadOptions());
            if (!again.Succeeded || !again.Document!.Equals(document))
            {
                throw new UsageException($"internal check failed: the canonical form of '{path}' does not read back as the same model; the file is left unchanged (please report this)");
            }
            AtomicReplace.Write(path, canonicalBytes, parse.GetValue(replaceReadOnly), parse.GetValue(splitHardLinks));
            error.WriteLine($"{path}: rewritten in canonical form");
            return ExitCodes.Success;
        });
        return command;
    }

    /// <summary>What to run to make the file canonical: a command that works on this file, after the edits it needs if any.</summary>
    private static string Advice(string path, SourceReadResult read)
    {
        string options = read.HasComments ? " --comments-to-notes" : "";
        string command = path == "-" ? $"loaddiff fmt{options} -" : $"loaddiff fmt --write{options} {ShellWord(path)}";
        string does = path == "-" ? " to print the canonical form" : "";
        var steps = new List<string>();
        if (read.DroppedFields.Count > 0)
        {
            steps.Add($"remove or rename the fields the format does not define ({string.Join(", ", read.DroppedFields)}), which fmt will not drop");
        }
        SourceComment? stray = CommentNotes.FirstUnplaced(read.Comments);
        if (stray is not null)
        {
            steps.Add($"the comment at line {stray.Line}, column {stray.Column} cannot become a note ({stray.Problem}): "
                + "move it directly before the item, case or document it describes, or remove it");
        }
        string text = (read.HasComments ? " (it holds comments, which the canonical form does not)" : "")
            + "; " + (steps.Count > 0 ? string.Join("; ", steps) + "; then run" : "run") + $" '{command}'"
            + (read.HasComments ? (path == "-" ? " to print it with the comments moved into notes" : " to move them into notes") : does);
        if (stray is not null && read.DroppedFields.Count == 0 && path != "-")
        {
            text += $", or drop every comment with 'loaddiff fmt --write --drop-comments {ShellWord(path)}'";
        }
        return text;
    }

    // The path as one word for a POSIX shell, quoted only when it needs to be.
    // A leading '-' would read as an option, so such a relative path gets './'.
    private static string ShellWord(string path)
    {
        string p = path.StartsWith('-') ? "./" + path : path;
        return p.Length > 0 && p.All(c => char.IsAsciiLetterOrDigit(c) || c is '/' or '.' or '_' or '-' or '+' or ':' or '@' or '%' or ',')
            ? p
            : "'" + p.Replace("'", "'\\''", StringComparison.Ordinal) + "'";
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
