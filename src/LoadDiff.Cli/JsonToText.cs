namespace LoadDiff.Cli;

/// <summary>Writes a UTF-8 JSON document, produced on a stream, to a command's text output.</summary>
internal static class JsonToText
{
    public static void Write(TextWriter output, Action<Stream> write)
    {
        using var ms = new MemoryStream();
        write(ms);
        output.Write(System.Text.Encoding.UTF8.GetString(ms.ToArray()));
    }
}
