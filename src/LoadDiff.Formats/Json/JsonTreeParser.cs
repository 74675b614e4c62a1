using System.Text.Json;

namespace LoadDiff.Formats.Json;

/// <summary>
/// Parses UTF-8 JSON (comments and trailing commas allowed) into a <see cref="JsonNode"/> tree with offsets,
/// rejecting duplicate keys. Syntax errors surface as <see cref="JsonSyntaxError"/> with the reader's position.
/// </summary>
internal static class JsonTreeParser
{
    public static JsonNode Parse(ReadOnlySpan<byte> utf8, int maxDepth)
    {
        var reader = new Utf8JsonReader(utf8, new JsonReaderOptions
        {
            CommentHandling = JsonCommentHandling.Skip,
            AllowTrailingCommas = true,
            MaxDepth = maxDepth,
        });
        try
        {
            if (!reader.Read())
            {
                throw new JsonSyntaxError("the file holds no JSON value", reader.TokenStartIndex);
            }
            JsonNode root = ReadValue(ref reader);
            if (reader.Read())
            {
                throw new JsonSyntaxError("unexpected content after the end of the JSON document", reader.TokenStartIndex);
            }
            return root;
        }
        catch (JsonException e)
        {
            throw JsonSyntaxError.From(e);
        }
    }

    // A \u escape of a lone surrogate is valid JSON grammar but not Unicode text; report it where it is.
    private static string Text(ref Utf8JsonReader reader, long start)
    {
        try
        {
            return reader.GetString()!;
        }
        catch (InvalidOperationException)
        {
            throw new JsonSyntaxError("a \\u escape in this string encodes a lone UTF-16 surrogate, which is not Unicode text", start)
            {
                InvalidText = true,
            };
        }
    }

    private static JsonNode ReadValue(ref Utf8JsonReader reader)
    {
        long start = reader.TokenStartIndex;
        switch (reader.TokenType)
        {
            case JsonTokenType.StartObject:
            {
                var members = new List<JsonMember>();
                var seen = new HashSet<string>(StringComparer.Ordinal);
                while (reader.Read() && reader.TokenType != JsonTokenType.EndObject)
                {
                    long keyOffset = reader.TokenStartIndex;
                    string key = Text(ref reader, keyOffset);
                    if (!seen.Add(key))
                    {
                        throw new JsonDuplicateKey(key, keyOffset);
                    }
                    reader.Read();
                    members.Add(new JsonMember(key, keyOffset, ReadValue(ref reader)));
                }
                return JsonNode.Object(start, members);
            }
            case JsonTokenType.StartArray:
            {
                var elements = new List<JsonNode>();
                while (reader.Read() && reader.TokenType != JsonTokenType.EndArray)
                {
                    elements.Add(ReadValue(ref reader));
                }
                return JsonNode.Array(start, elements);
            }
            case JsonTokenType.String:
                return JsonNode.String(start, Text(ref reader, start));
            case JsonTokenType.Number:
            {
                string raw = System.Text.Encoding.UTF8.GetString(reader.ValueSpan);
                reader.TryGetDouble(out double value);
                return JsonNode.NumberNode(start, value, raw);
            }
            case JsonTokenType.True:
                return JsonNode.Literal(JsonKind.True, start);
            case JsonTokenType.False:
                return JsonNode.Literal(JsonKind.False, start);
            case JsonTokenType.Null:
                return JsonNode.Literal(JsonKind.Null, start);
            default:
                throw new JsonSyntaxError($"unexpected token {reader.TokenType}", start);
        }
    }
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
