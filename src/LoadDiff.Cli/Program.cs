using LoadDiff.Cli;

try
{
    return LoadDiffApp.Run(args, Console.Out, Console.Error);
}
#pragma warning disable CA1031 // the last line of defence: never show a stack trace to the user
catch (Exception e)
#pragma warning restore CA1031
{
    Console.Error.WriteLine($"loaddiff: internal error: {e.GetType().Name}: {e.Message} (please report this with the input that caused it)");
    if (Environment.GetEnvironmentVariable("LOADDIFF_TRACE") == "1")
    {
        Console.Error.WriteLine(e.ToString()); // for developers only: never shown unless asked for
    }
    return ExitCodes.InputError;
}
