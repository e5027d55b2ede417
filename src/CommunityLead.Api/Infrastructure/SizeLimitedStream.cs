namespace CommunityLead.Api.Infrastructure;

/// <summary>
/// Reads through to the request body and stops with <see cref="BodyTooLargeException"/> past the limit, so
/// a body without a Content-Length (chunked) can't be larger than the setting allows either.
/// </summary>
public sealed class SizeLimitedStream(Stream inner, long limit) : Stream
{
    private long read;

    public override int Read(byte[] buffer, int offset, int count) => Count(inner.Read(buffer, offset, count));

    public override async ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken = default) =>
        Count(await inner.ReadAsync(buffer, cancellationToken));

    public override Task<int> ReadAsync(byte[] buffer, int offset, int count, CancellationToken cancellationToken) =>
        ReadAsync(buffer.AsMemory(offset, count), cancellationToken).AsTask();

    private int Count(int n)
    {
        read += n;
        return read > limit ? throw new BodyTooLargeException(limit) : n;
    }

    public override bool CanRead => true;
    public override bool CanSeek => false;
    public override bool CanWrite => false;
    public override long Length => throw new NotSupportedException();
    public override long Position { get => read; set => throw new NotSupportedException(); }
    public override void Flush() { }
    public override long Seek(long offset, SeekOrigin origin) => throw new NotSupportedException();
    public override void SetLength(long value) => throw new NotSupportedException();
    public override void Write(byte[] buffer, int offset, int count) => throw new NotSupportedException();
}

public sealed class BodyTooLargeException(long limit) : Exception($"The body is larger than {limit} bytes.");
