using System.Text.Json;

namespace LoadDiff.Formats.Json;

/// <summary>
/// Parses UTF-8 JSON held in memory (comments and trailing commas allowed) into a <see cref="JsonNode"/> tree with
/// offsets, rejecting duplicate keys; the same token reader and tree builder as the streamed path, keeping every item.
/// Syntax errors surface as <see cref="JsonSyntaxError"/> with the reader's position.
/// </summary>
internal static class JsonTreeParser
{
    public static JsonNode Parse(byte[] utf8, int maxDepth) =>
        StreamingJsonReader.Tree(() => new JsonTokenPump(new MemoryStream(utf8, writable: false), maxDepth, 0), streamLoads: false);
}

/// <summary>A JSON syntax error at a byte offset, or at a reader line/position.</summary>
internal sealed class JsonSyntaxError : Exception
{
    public JsonSyntaxError(string message, long offset)
        : base(message)
    {
        Offset = offset;
    }

    public JsonSyntaxError()
    {
    }

    public JsonSyntaxError(string message)
        : base(message)
    {
    }

    public JsonSyntaxError(string message, Exception inner)
        : base(message, inner)
    {
    }

    public long Offset { get; private init; } = -1;

    public int? ReaderLine { get; private init; }

    public long ReaderBytePosition { get; private init; }

    public bool TooDeep { get; private init; }

    /// <summary>The JSON is well formed but a string in it is not Unicode text.</summary>
    public bool InvalidText { get; init; }

    /// <summary>The same error placed at an offset of the text (when the reader's own line count cannot be used).</summary>
    public JsonSyntaxError At(long offset) => new(Message, offset) { TooDeep = TooDeep, InvalidText = InvalidText };

    public static JsonSyntaxError From(JsonException e)
    {
        string message = e.Message;
        int bar = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
        if (bar > 0)
        {
            message = message[..bar].TrimEnd(' ', '.', '|') + ".";
        }
        // The reader quotes the offending text, which can run over a line break: a diagnostic is one line.
        message = string.Join(' ', message.Split(['\r', '\n', '\t'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));
        bool deep = message.Contains("depth", StringComparison.OrdinalIgnoreCase);
        return new JsonSyntaxError(message, e)
        {
            ReaderLine = (int?)e.LineNumber,
            ReaderBytePosition = e.BytePositionInLine ?? 0,
            TooDeep = deep,
        };
    }
}

/// <summary>A key that appears twice in one object.</summary>
internal sealed class JsonDuplicateKey : Exception
{
    public JsonDuplicateKey(string key, long offset)
        : base($"duplicate key '{key}'")
    {
        Key = key;
        Offset = offset;
    }

    public JsonDuplicateKey()
    {
        Key = "";
    }

    public JsonDuplicateKey(string message)
        : base(message)
    {
        Key = "";
    }

    public JsonDuplicateKey(string message, Exception inner)
        : base(message, inner)
    {
        Key = "";
    }

    public string Key { get; }

    public long Offset { get; }
}
