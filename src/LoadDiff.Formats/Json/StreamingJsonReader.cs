using System.Text.Json;

namespace LoadDiff.Formats.Json;

/// <summary>
/// Reads a large load description in two forward passes over the file: the first builds the whole tree
/// except the <c>loads</c> arrays of the cases (so units, points and combinations are known wherever they
/// stand in the file), the second hands the load items to the walker one at a time. Memory stays that of
/// the largest single item.
/// </summary>
internal static class StreamingJsonReader
{
    /// <summary>The tree without load items; their arrays are <see cref="JsonNode.Streamed"/> placeholders.</summary>
    public static JsonNode Skeleton(Func<JsonTokenPump> open) => Tree(open, streamLoads: true);

    /// <summary>The whole tree; with <paramref name="streamLoads"/> the cases' <c>loads</c> arrays are left as placeholders.</summary>
    public static JsonNode Tree(Func<JsonTokenPump> open, bool streamLoads)
    {
        using JsonTokenPump pump = open();
        if (!pump.Read())
        {
            throw new JsonSyntaxError("the file holds no JSON value", 0);
        }
        // depth 9 marks "not on the way to a loads array", so nothing is streamed
        JsonNode root = Value(pump, streamLoads ? 0 : 9);
        if (pump.Read())
        {
            throw new JsonSyntaxError("unexpected content after the end of the JSON document", pump.Offset);
        }
        return root;
    }

    /// <summary>The load items of every case with the case's name, in file order, each as its own small tree.</summary>
    public static IEnumerable<(string Case, JsonNode Item)> Loads(JsonTokenPump pump)
    {
        pump.Read(); // the root object
        while (pump.Read() && pump.Type == JsonTokenType.PropertyName)
        {
            if (pump.Text != "cases")
            {
                pump.Read();
                pump.SkipValue();
                continue;
            }
            pump.Read();
            if (pump.Type != JsonTokenType.StartObject)
            {
                pump.SkipValue();
                continue;
            }
            while (pump.Read() && pump.Type == JsonTokenType.PropertyName)
            {
                string name = pump.Text!;
                pump.Read();
                if (pump.Type != JsonTokenType.StartObject)
                {
                    pump.SkipValue();
                    continue;
                }
                while (pump.Read() && pump.Type == JsonTokenType.PropertyName)
                {
                    bool loads = pump.Text == "loads";
                    pump.Read();
                    if (!loads || pump.Type != JsonTokenType.StartArray)
                    {
                        pump.SkipValue();
                        continue;
                    }
                    while (pump.Read() && pump.Type != JsonTokenType.EndArray)
                    {
                        yield return (name, Value(pump, 3));
                    }
                }
            }
        }
    }

    // depth: 0 root, 1 inside root, 2 inside cases, 3 inside one case (where 'loads' is streamed)
    private static JsonNode Value(JsonTokenPump pump, int depth)
    {
        long start = pump.Offset;
        switch (pump.Type)
        {
            case JsonTokenType.StartObject:
            {
                var members = new List<JsonMember>();
                var seen = new HashSet<string>(StringComparer.Ordinal);
                while (pump.Read() && pump.Type != JsonTokenType.EndObject)
                {
                    long keyOffset = pump.Offset;
                    string key = pump.Text!;
                    if (!seen.Add(key))
                    {
                        throw new JsonDuplicateKey(key, keyOffset);
                    }
                    pump.Read();
                    bool streamHere = depth == 2 && key == "loads" && pump.Type == JsonTokenType.StartArray;
                    if (streamHere)
                    {
                        long arrayOffset = pump.Offset;
                        pump.SkipValue();
                        members.Add(new JsonMember(key, keyOffset, JsonNode.StreamedArray(arrayOffset)));
                        continue;
                    }
                    int next = depth switch
                    {
                        0 => key == "cases" ? 1 : 9,
                        1 => 2,
                        _ => 9,
                    };
                    members.Add(new JsonMember(key, keyOffset, Value(pump, next)));
                }
                return JsonNode.Object(start, members);
            }
            case JsonTokenType.StartArray:
            {
                var elements = new List<JsonNode>();
                while (pump.Read() && pump.Type != JsonTokenType.EndArray)
                {
                    elements.Add(Value(pump, 9));
                }
                return JsonNode.Array(start, elements);
            }
            case JsonTokenType.String:
                return JsonNode.String(start, pump.Text!);
            case JsonTokenType.Number:
                return JsonNode.NumberNode(start, pump.Number, pump.Text!);
            case JsonTokenType.True:
                return JsonNode.Literal(JsonKind.True, start);
            case JsonTokenType.False:
                return JsonNode.Literal(JsonKind.False, start);
            case JsonTokenType.Null:
                return JsonNode.Literal(JsonKind.Null, start);
            default:
                throw new JsonSyntaxError($"unexpected token {pump.Type}", start);
        }
    }

    /// <summary>Hands out the streamed items case by case (the walker visits cases in file order).</summary>
    internal sealed class CaseFeed : IDisposable
    {
        private readonly JsonTokenPump _pump;
        private readonly IEnumerator<(string Case, JsonNode Item)> _items;
        private bool _has;

        public CaseFeed(JsonTokenPump pump)
        {
            _pump = pump;
            _items = Loads(pump).GetEnumerator();
            _has = _items.MoveNext();
        }

        public IEnumerable<JsonNode> ForCase(string name)
        {
            while (_has && _items.Current.Case == name)
            {
                JsonNode item = _items.Current.Item;
                _has = _items.MoveNext();
                yield return item;
            }
        }

        public void Dispose()
        {
            _items.Dispose();
            _pump.Dispose();
        }
    }
}
