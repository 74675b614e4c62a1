namespace LoadDiff.Formats.Json;

/// <summary>The kind of a parsed JSON value.</summary>
internal enum JsonKind
{
    Object,
    Array,
    String,
    Number,
    True,
    False,
    Null,
}

/// <summary>
/// A parsed JSON value that remembers where it started in the file (byte offset), so that semantic errors
/// found later can name the line and column. Objects keep their members in file order.
/// </summary>
internal sealed class JsonNode
{
    private JsonNode(JsonKind kind, long offset)
    {
        Kind = kind;
        Offset = offset;
    }

    public JsonKind Kind { get; }

    public long Offset { get; }

    public string? Text { get; private init; }

    public double Number { get; private init; }

    public List<JsonMember>? Members { get; private init; }

    public List<JsonNode>? Elements { get; private init; }

    public static JsonNode Object(long offset, List<JsonMember> members) => new(JsonKind.Object, offset) { Members = members };

    public static JsonNode Array(long offset, List<JsonNode> elements) => new(JsonKind.Array, offset) { Elements = elements };

    /// <summary>An array whose elements are read later, one at a time, from the file (large load lists).</summary>
    public static JsonNode StreamedArray(long offset) => new(JsonKind.Array, offset) { Elements = [], Streamed = true };

    public bool Streamed { get; private init; }

    public static JsonNode String(long offset, string text) => new(JsonKind.String, offset) { Text = text };

    public static JsonNode NumberNode(long offset, double value, string raw) => new(JsonKind.Number, offset) { Number = value, Text = raw };

    public static JsonNode Literal(JsonKind kind, long offset) => new(kind, offset);

    public JsonNode? this[string key] => Members?.Find(m => m.Key == key)?.Value;

    public string KindName => Kind switch
    {
        JsonKind.Object => "an object",
        JsonKind.Array => "an array",
        JsonKind.String => "a string",
        JsonKind.Number => "a number",
        JsonKind.True or JsonKind.False => "a boolean",
        _ => "null",
    };
}

/// <summary>An object member with the offset of its key.</summary>
internal sealed record JsonMember(string Key, long KeyOffset, JsonNode Value);
