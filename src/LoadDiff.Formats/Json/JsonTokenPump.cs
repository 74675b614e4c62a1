using System.Buffers;
using System.Text.Json;

namespace LoadDiff.Formats.Json;

/// <summary>
/// Reads a JSON file token by token through a small buffer (Utf8JsonReader with its state carried across
/// refills), giving each token's absolute byte offset, so a file of any size is read in constant memory.
/// </summary>
internal sealed class JsonTokenPump : IDisposable
{
    private readonly Stream _stream;
    private byte[] _buffer;
    private int _start;
    private int _end;
    private long _bufferOffset;
    private bool _final;
    private JsonReaderState _state;

    public JsonTokenPump(Stream stream, int maxDepth, long skip)
    {
        _stream = stream;
        _buffer = ArrayPool<byte>.Shared.Rent(1 << 16);
        _state = new JsonReaderState(new JsonReaderOptions
        {
            CommentHandling = JsonCommentHandling.Skip,
            AllowTrailingCommas = true,
            MaxDepth = maxDepth,
        });
        // skip a byte-order mark: offsets count from the first byte after it, as the in-memory reader does
        _stream.Position = skip;
        _bufferOffset = 0;
    }

    public JsonTokenType Type { get; private set; }

    /// <summary>Offset of the current token from the start of the text (after a byte-order mark).</summary>
    public long Offset { get; private set; }

    public string? Text { get; private set; }

    public double Number { get; private set; }

    /// <summary>Reads the next token; false at the end of the text.</summary>
    public bool Read()
    {
        while (true)
        {
            var reader = new Utf8JsonReader(_buffer.AsSpan(_start, _end - _start), _final, _state);
            bool got;
            try
            {
                got = reader.Read();
                if (got)
                {
                    Capture(ref reader);
                }
            }
            catch (JsonException e)
            {
                // After white space was dropped the reader's line count is short: place the error at the token instead.
                throw _dropped ? JsonSyntaxError.From(e).At(_bufferOffset + FirstNonWhiteSpace()) : JsonSyntaxError.From(e);
            }
            if (got)
            {
                _start += (int)reader.BytesConsumed;
                _state = reader.CurrentState;
                return true;
            }
            if (_final)
            {
                return false;
            }
            Refill();
        }
    }

    /// <summary>Skips the value that starts at the current token (its whole subtree).</summary>
    public void SkipValue()
    {
        if (Type is not (JsonTokenType.StartObject or JsonTokenType.StartArray))
        {
            return;
        }
        int depth = 1;
        while (depth > 0 && Read())
        {
            if (Type is JsonTokenType.StartObject or JsonTokenType.StartArray)
            {
                depth++;
            }
            else if (Type is JsonTokenType.EndObject or JsonTokenType.EndArray)
            {
                depth--;
            }
        }
    }

    public void Dispose()
    {
        ArrayPool<byte>.Shared.Return(_buffer);
        _stream.Dispose();
    }

    private void Capture(ref Utf8JsonReader reader)
    {
        Type = reader.TokenType;
        Offset = _bufferOffset + _start + reader.TokenStartIndex;
        Text = null;
        switch (Type)
        {
            case JsonTokenType.PropertyName:
            case JsonTokenType.String:
                try
                {
                    Text = reader.GetString();
                }
                catch (InvalidOperationException)
                {
                    throw new JsonSyntaxError("a \\u escape in this string encodes a lone UTF-16 surrogate, which is not Unicode text", Offset)
                    {
                        InvalidText = true,
                    };
                }
                break;
            case JsonTokenType.Number:
                Text = System.Text.Encoding.UTF8.GetString(reader.ValueSpan);
                reader.TryGetDouble(out double v);
                Number = v;
                break;
            default:
                break;
        }
    }

    private bool _dropped;

    private int FirstNonWhiteSpace()
    {
        int i = _start;
        while (i < _end && _buffer[i] is (byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n')
        {
            i++;
        }
        return i;
    }

    private byte? SeparatorThenWhiteSpace()
    {
        int i = FirstNonWhiteSpace();
        if (i >= _end || _buffer[i] is not ((byte)',' or (byte)':'))
        {
            return null;
        }
        for (int j = i + 1; j < _end; j++)
        {
            if (_buffer[j] is not ((byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n'))
            {
                return null;
            }
        }
        return _buffer[i];
    }

    // Where the pending token's value begins: past white space and one separator the reader may not have consumed yet.
    private int ValueStart()
    {
        int i = FirstNonWhiteSpace();
        if (i < _end - 1 && _buffer[i] is (byte)',' or (byte)':')
        {
            i++;
            while (i < _end - 1 && _buffer[i] is (byte)' ' or (byte)'\t' or (byte)'\r' or (byte)'\n')
            {
                i++;
            }
        }
        return i;
    }

    private void ThrowIfMalformed()
    {
        var probe = new Utf8JsonReader(_buffer.AsSpan(_start, _end - _start), isFinalBlock: true, _state);
        try
        {
            probe.Read();
        }
        catch (JsonException e)
        {
            throw _dropped ? JsonSyntaxError.From(e).At(_bufferOffset + FirstNonWhiteSpace()) : JsonSyntaxError.From(e);
        }
    }

    private void Refill()
    {
        int pending = _end - _start;
        if (_start > 0)
        {
            Buffer.BlockCopy(_buffer, _start, _buffer, 0, pending);
            _bufferOffset += _start;
            _start = 0;
            _end = pending;
        }
        if (_end == _buffer.Length && FirstNonWhiteSpace() == _end)
        {
            // A buffer of nothing but white space between tokens: drop it rather than grow, so padding costs no memory.
            _bufferOffset += _end;
            _start = _end = 0;
            _dropped = true;
        }
        else if (_end == _buffer.Length && SeparatorThenWhiteSpace() is byte separator)
        {
            // A ',' or ':' the reader keeps until the next token, then only white space: keep the separator alone, as
            // the last byte read, so that the bytes still to come keep their offsets.
            _bufferOffset += _end - 1;
            _buffer[0] = separator;
            _start = 0;
            _end = 1;
            _dropped = true;
        }
        else if (_end == _buffer.Length && _buffer[ValueStart()] != (byte)'"')
        {
            // Only a string can be longer than the buffer; anything else that fills it is an error the reader finds at
            // once when told the text ends here (a file of NUL bytes, say) — reported instead of read to the end.
            ThrowIfMalformed();
        }
        if (_end == _buffer.Length)
        {
            // one token longer than the buffer: grow it
            byte[] bigger = ArrayPool<byte>.Shared.Rent(_buffer.Length * 2);
            Buffer.BlockCopy(_buffer, 0, bigger, 0, _end);
            ArrayPool<byte>.Shared.Return(_buffer);
            _buffer = bigger;
        }
        int read = _stream.Read(_buffer, _end, _buffer.Length - _end);
        if (read == 0)
        {
            _final = true;
        }
        _end += read;
    }
}
