namespace LoadDiff.Formats.Csv;

/// <summary>A read-only pass-through stream that reports how many bytes each read returned (for progress displays).</summary>
internal sealed class CountingStream : Stream
{
    private readonly Stream _inner;
    private readonly Action<long> _bytesRead;

    public CountingStream(Stream inner, Action<long> bytesRead)
    {
        _inner = inner;
        _bytesRead = bytesRead;
    }

    public override bool CanRead => true;

    public override bool CanSeek => false;

    public override bool CanWrite => false;

    public override long Length => _inner.Length;

    public override long Position
    {
        get => _inner.Position;
        set => throw new NotSupportedException();
    }

    public override int Read(byte[] buffer, int offset, int count) => Counted(_inner.Read(buffer, offset, count));

    public override int Read(Span<byte> buffer) => Counted(_inner.Read(buffer));

    public override async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken = default) =>
        Counted(await _inner.ReadAsync(buffer, cancellationToken).ConfigureAwait(false));

    public override Task<int> ReadAsync(byte[] buffer, int offset, int count, CancellationToken cancellationToken) =>
        ReadAsync(buffer.AsMemory(offset, count), cancellationToken).AsTask();

    public override void Flush()
    {
    }

    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();

    public override void SetLength(long value) => throw new NotSupportedException();

    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();

    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            _inner.Dispose();
        }
        base.Dispose(disposing);
    }

    private int Counted(int n)
    {
        if (n > 0)
        {
            _bytesRead(n);
        }
        return n;
    }
}
