using System.Buffers;
using System.Text;

namespace PhaseSlope.Cli.Output;

/// <summary>An <see cref="IBufferWriter{T}"/> of UTF-8 bytes that decodes each committed block
/// and writes it to a <see cref="TextWriter"/>, so that a <see cref="System.Text.Json.Utf8JsonWriter"/>
/// streams its text instead of holding all of it.</summary>
/// <remarks>The decoder keeps a character split between two blocks; <see cref="Complete"/> ends
/// the text (and throws on a dangling partial character, which the JSON writer never leaves).</remarks>
internal sealed class Utf8TextBufferWriter(TextWriter output) : IBufferWriter<byte>
{
    private const int MinimumLength = 1 << 14;
    private readonly Decoder _decoder = new UTF8Encoding(false, true).GetDecoder();
    private byte[] _bytes = new byte[MinimumLength];
    private char[] _chars = new char[MinimumLength];

    /// <inheritdoc />
    public void Advance(int count)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(count);
        ArgumentOutOfRangeException.ThrowIfGreaterThan(count, _bytes.Length);
        // At most one character per byte, plus what the decoder held back from the last block.
        if (_chars.Length < count + 4)
        {
            _chars = new char[_bytes.Length + 4];
        }

        int length = _decoder.GetChars(_bytes, 0, count, _chars, 0, flush: false);
        output.Write(_chars, 0, length);
    }

    /// <inheritdoc />
    public Memory<byte> GetMemory(int sizeHint = 0)
    {
        if (_bytes.Length < sizeHint)
        {
            _bytes = new byte[Math.Max(sizeHint, 2 * _bytes.Length)];
        }

        return _bytes;
    }

    /// <inheritdoc />
    public Span<byte> GetSpan(int sizeHint = 0) => GetMemory(sizeHint).Span;

    /// <summary>Ends the text: writes what the decoder still holds.</summary>
    public void Complete()
    {
        int length = _decoder.GetChars([], 0, 0, _chars, 0, flush: true);
        output.Write(_chars, 0, length);
    }
}
