using System.CommandLine;
using LoadDiff.Cli.Commands;

namespace LoadDiff.Cli;

/// <summary>The command tree and the one place that turns failures into messages and exit codes.</summary>
public static class LoadDiffApp
{
    /// <summary>Builds the root command with every subcommand.</summary>
    public static RootCommand BuildRoot()
    {
        var root = new RootCommand(
            "LoadDiff: proves that a substitute load set is statically equivalent to a detailed one (same resultant "
            + "force and moment per load case and combination, within a stated tolerance).")
        {
            ReduceCommand.Build(),
            CheckCommand.Build(),
            DiffCommand.Build(), FmtCommand.Build(),
            SectionsCommand.Build(),
            DistributeCommand.Build(),
        };
        return root;
    }

    /// <summary>Runs the tool: parse errors and input errors exit with 2 and one message each on <paramref name="error"/>.</summary>
    public static int Run(string[] args, TextWriter output, TextWriter error)
    {
        ArgumentNullException.ThrowIfNull(output);
        ArgumentNullException.ThrowIfNull(error);
        if (ReferenceEquals(output, Console.Out) && LoadDiff.Formats.InputFiles.StandardOutputIsClosed())
        {
            // Results written nowhere would look like a run that found nothing: refuse before any work.
            error.WriteLine($"loaddiff: error {OutputCodes.OutputClosed}: standard output is closed; nothing could be written (redirect it to a file, or to /dev/null when only the exit code matters)");
            return ExitCodes.InputError;
        }
        RootCommand root = BuildRoot();
        ParseResult parse = root.Parse(args);
        if (parse.Errors.Count > 0)
        {
            foreach (var e in parse.Errors)
            {
                error.WriteLine("loaddiff: " + e.Message);
            }
            string command = parse.CommandResult.Command == root ? "" : " " + parse.CommandResult.Command.Name;
            error.WriteLine($"Try 'loaddiff{command} --help'.");
            return ExitCodes.InputError;
        }
        try
        {
            return parse.Invoke(new InvocationConfiguration { Output = output, Error = error, EnableDefaultExceptionHandler = false });
        }
        catch (InputFailureException)
        {
            return ExitCodes.InputError;
        }
        catch (LoadDiff.Formats.Diagnostics.UnreadableInputException e)
        {
            error.WriteLine(e.Diagnostic.ToString());
            return ExitCodes.InputError;
        }
        catch (UsageException e)
        {
            error.WriteLine("loaddiff: " + e.Message);
            return ExitCodes.InputError;
        }
        catch (OverflowException e)
        {
            // Inputs are limited to 1e100, but products of them (moments, factored combinations, tolerances) can still
            // pass the range of double; Core's message names the case or combination where it knows it.
            string where = e.Message.StartsWith("the ", StringComparison.Ordinal) ? e.Message + ": " : "a result overflowed the range of double: ";
            error.WriteLine($"loaddiff: error {LoadDiff.Formats.Diagnostics.Codes.OutOfRange}: {where}the loads or coordinates are too large for the units used; choose units that bring the numbers nearer to 1");
            return ExitCodes.InputError;
        }
        catch (IOException e)
        {
            error.WriteLine("loaddiff: " + e.Message);
            return ExitCodes.InputError;
        }
        finally
        {
            GitSource.DisposeAll();
        }
    }
}
