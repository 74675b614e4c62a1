namespace LoadDiff.Formats.Json;

/// <summary>Finds line and column of an offset by reading the file up to it (used for streamed files, where errors are rare).</summary>
internal sealed class FileLineLocator : ILineLocator
{
    private readonly string _path;
    private readonly long _skip;

    public FileLineLocator(string path, long skip)
    {
        _path = path;
        _skip = skip;
    }

    public (int Line, int Column) Locate(long offset)
    {
        using var s = new FileStream(_path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
        s.Position = _skip;
        byte[] buffer = new byte[1 << 16];
        long pos = 0;
        int line = 1, column = 1;
        while (pos < offset)
        {
            int n = s.Read(buffer, 0, (int)Math.Min(buffer.Length, offset - pos));
            if (n == 0)
            {
                break;
            }
            for (int i = 0; i < n; i++)
            {
                byte b = buffer[i];
                if (b == (byte)'\n')
                {
                    line++;
                    column = 1;
                }
                else if ((b & 0xC0) != 0x80)
                {
                    column++; // one per character: count lead bytes only
                }
            }
            pos += n;
        }
        return (line, column);
    }

    /// <summary>The offset (after the skip) of the first byte that is not valid UTF-8, or −1.</summary>
    public static long FirstInvalidUtf8(string path, long skip)
    {
        using var s = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
        s.Position = skip;
        byte[] buffer = new byte[(1 << 20) + 4];
        int carry = 0;
        long blockStart = 0;
        while (true)
        {
            int n = s.Read(buffer, carry, buffer.Length - 4 - carry);
            int length = carry + n;
            bool last = n == 0;
            // keep a possibly incomplete last sequence for the next block
            int complete = last ? length : CompleteLength(buffer.AsSpan(0, length));
            long bad = LineIndex.FirstInvalidUtf8(buffer.AsSpan(0, complete));
            if (bad >= 0)
            {
                return blockStart + bad;
            }
            if (last)
            {
                return -1;
            }
            carry = length - complete;
            Buffer.BlockCopy(buffer, complete, buffer, 0, carry);
            blockStart += complete;
        }
    }

    /// <summary>True when the file holds nothing but white space after the skip.</summary>
    public static bool IsBlank(string path, long skip)
    {
        using var s = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.Read, 1 << 16, FileOptions.SequentialScan);
        s.Position = skip;
        byte[] buffer = new byte[1 << 16];
        int n;
        while ((n = s.Read(buffer, 0, buffer.Length)) > 0)
        {
            if (!buffer.AsSpan(0, n).Trim((ReadOnlySpan<byte>)[(byte)' ', (byte)'\t', (byte)'\r', (byte)'\n']).IsEmpty)
            {
                return false;
            }
        }
        return true;
    }

    private static int CompleteLength(ReadOnlySpan<byte> b)
    {
        for (int back = 1; back <= 3 && back <= b.Length; back++)
        {
            byte x = b[^back];
            if ((x & 0xC0) == 0x80)
            {
                continue; // continuation byte: look further back for its lead
            }
            int need = x >= 0xF0 ? 4 : x >= 0xE0 ? 3 : x >= 0xC0 ? 2 : 1;
            return need > back ? b.Length - back : b.Length;
        }
        return b.Length;
    }
}
