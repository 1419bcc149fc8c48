using System.Text;

namespace PhaseSlope.Cli.Output;

/// <summary>Collects text and hands it to another writer in chunks of about 64 K characters.</summary>
/// <remarks>Standard output flushes on every write; a result of a million rows written line by
/// line would cost a million system calls, and built whole it would cost memory in proportion
/// (a 1 000 000-point fit table is ~100 MB of text, held several times over while it is built
/// and copied). Disposing writes the rest and flushes the inner writer, which stays open.</remarks>
internal sealed class ChunkedTextWriter(TextWriter inner) : TextWriter(inner.FormatProvider)
{
    private const int ChunkLength = 1 << 16;
    private readonly StringBuilder _pending = new(ChunkLength + 1024);

    /// <inheritdoc />
    public override Encoding Encoding => inner.Encoding;

    /// <inheritdoc />
    public override void Write(char value)
    {
        _pending.Append(value);
        if (_pending.Length >= ChunkLength)
        {
            Pass();
        }
    }

    /// <inheritdoc />
    public override void Write(string? value)
    {
        _pending.Append(value);
        if (_pending.Length >= ChunkLength)
        {
            Pass();
        }
    }

    /// <inheritdoc />
    public override void Write(char[] buffer, int index, int count)
    {
        _pending.Append(buffer, index, count);
        if (_pending.Length >= ChunkLength)
        {
            Pass();
        }
    }

    /// <inheritdoc />
    public override void Write(ReadOnlySpan<char> buffer)
    {
        _pending.Append(buffer);
        if (_pending.Length >= ChunkLength)
        {
            Pass();
        }
    }

    /// <inheritdoc />
    public override void Flush()
    {
        Pass();
        inner.Flush();
    }

    /// <inheritdoc />
    protected override void Dispose(bool disposing)
    {
        if (disposing)
        {
            Flush();
        }

        base.Dispose(disposing);
    }

    private void Pass()
    {
        if (_pending.Length > 0)
        {
            inner.Write(_pending);
            _pending.Clear();
        }
    }
}
