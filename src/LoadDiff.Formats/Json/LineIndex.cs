using System.Text;

namespace LoadDiff.Formats.Json;

/// <summary>Maps byte offsets of a UTF-8 text to 1-based line and character column.</summary>
internal sealed class LineIndex : ILineLocator
{
    private readonly byte[] _bytes;
    private readonly List<long> _lineStarts = [0];

    public LineIndex(byte[] bytes)
    {
        _bytes = bytes;
        for (int i = 0; i < bytes.Length; i++)
        {
            if (bytes[i] == (byte)'\n')
            {
                _lineStarts.Add(i + 1);
            }
        }
    }

    public (int Line, int Column) Locate(long offset)
    {
        offset = Math.Clamp(offset, 0, _bytes.Length);
        int idx = _lineStarts.BinarySearch(offset);
        int line = idx >= 0 ? idx : ~idx - 1;
        long start = _lineStarts[line];
        int column = CharCount(start, offset) + 1;
        return (line + 1, column);
    }

    public long OffsetOf(int zeroBasedLine, long bytePositionInLine) =>
        zeroBasedLine < _lineStarts.Count ? _lineStarts[zeroBasedLine] + bytePositionInLine : _bytes.Length;

    private int CharCount(long from, long to)
    {
        int n = 0;
        for (long i = from; i < to; i++)
        {
            if ((_bytes[i] & 0xC0) != 0x80)
            {
                n++; // count lead bytes only: one per character
            }
        }
        return n;
    }

    public static long FirstInvalidUtf8(ReadOnlySpan<byte> bytes)
    {
        if (System.Text.Unicode.Utf8.IsValid(bytes))
        {
            return -1;
        }
        int pos = 0;
        while (pos < bytes.Length)
        {
            var status = Rune.DecodeFromUtf8(bytes[pos..], out _, out int consumed);
            if (status != System.Buffers.OperationStatus.Done)
            {
                return pos;
            }
            pos += consumed;
        }
        return -1;
    }
}
