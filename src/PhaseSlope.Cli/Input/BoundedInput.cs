namespace PhaseSlope.Cli.Input;

/// <summary>Opens input files (fluid files, data files) so that no input can make the tool read
/// without end: a regular file larger than the limit is refused before it is read, and any other
/// file (a device such as /dev/zero, a FIFO, a file that grows while it is read) is read through a
/// stream that fails once the limit or the longest allowed line is passed.</summary>
/// <remarks>The limits (README, "Input files"): a fluid file is at most <see cref="FluidFileLimit"/>
/// bytes (the largest catalog file is a few kilobytes); a data file is at most
/// <see cref="DataFileLimit"/> bytes (a 1 000 000-row file of temperature, pressure and uncertainty
/// is about 40 MB) and <see cref="VapourPressureCsv.MaximumRows"/> data rows; no line of either may
/// be longer than <see cref="LineLimit"/> bytes.</remarks>
internal static class BoundedInput
{
    /// <summary>Largest fluid file, in bytes (1 MiB).</summary>
    public const long FluidFileLimit = 1L << 20;

    /// <summary>Largest data file, in bytes (256 MiB).</summary>
    public const long DataFileLimit = 256L << 20;

    /// <summary>Longest line of any input file, in bytes (64 KiB).</summary>
    public const int LineLimit = 1 << 16;

    /// <summary>Opens <paramref name="path"/> for reading with a limit of <paramref name="limit"/> bytes.</summary>
    /// <exception cref="InputLimitException">A regular file is larger than the limit.</exception>
    /// <exception cref="IOException">The file cannot be opened.</exception>
    /// <exception cref="UnauthorizedAccessException">The file may not be read.</exception>
    public static Stream Open(string path, long limit)
    {
        var file = new FileStream(path, FileMode.Open, FileAccess.Read, FileShare.ReadWrite, bufferSize: 1 << 16, FileOptions.SequentialScan);
        try
        {
            if (file.CanSeek && file.Length > limit)
            {
                throw new InputLimitException($"the file is {Size(file.Length)}, larger than the limit of {Size(limit)}");
            }

            return new LimitedStream(file, limit);
        }
        catch
        {
            file.Dispose();
            throw;
        }
    }

    /// <summary>Opens a data file within <see cref="DataFileLimit"/> and reads it with
    /// <paramref name="read"/>; a missing or unreadable file is a <see cref="DataFileException"/>.</summary>
    public static T ReadDataFile<T>(string path, Func<TextReader, T> read)
    {
        try
        {
            using var reader = new StreamReader(Open(path, DataFileLimit));
            return read(reader);
        }
        catch (Exception ex) when (ex is FileNotFoundException or DirectoryNotFoundException)
        {
            throw new DataFileException(path, null, null, "data file not found", ex);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw new DataFileException(path, null, null, $"cannot read data file: {ex.Message}", ex);
        }
    }

    /// <summary>A byte count in the largest binary unit that keeps it whole enough to read.</summary>
    public static string Size(long bytes) => bytes switch
    {
        >= 1L << 30 => $"{bytes / (double)(1L << 30):0.#} GiB",
        >= 1L << 20 => $"{bytes / (double)(1L << 20):0.#} MiB",
        >= 1L << 10 => $"{bytes / (double)(1L << 10):0.#} KiB",
        _ => $"{bytes} bytes",
    };

    /// <summary>A read-only stream that throws <see cref="InputLimitException"/> when more than the
    /// limit has been read or a line grows longer than <see cref="LineLimit"/>.</summary>
    private sealed class LimitedStream(Stream inner, long limit) : Stream
    {
        private long _read;
        private long _lineLength;

        public override bool CanRead => true;

        public override bool CanSeek => false;

        public override bool CanWrite => false;

        public override long Length => throw new NotSupportedException();

        public override long Position
        {
            get => _read;
            set => throw new NotSupportedException();
        }

        public override int Read(byte[] buffer, int offset, int count) => Read(buffer.AsSpan(offset, count));

        public override int Read(Span<byte> buffer)
        {
            // Ask for at most one byte past the limit: that byte proves the file is too long.
            long room = limit - _read + 1;
            if (buffer.Length > room)
            {
                buffer = buffer[..(int)room];
            }

            int n = inner.Read(buffer);
            _read += n;
            if (_read > limit)
            {
                throw new InputLimitException($"the input is longer than the limit of {Size(limit)}");
            }

            ReadOnlySpan<byte> rest = buffer[..n];
            while (true)
            {
                int lineBreak = rest.IndexOf((byte)'\n');
                long length = _lineLength + (lineBreak < 0 ? rest.Length : lineBreak);
                if (length > LineLimit)
                {
                    throw new InputLimitException($"a line is longer than the limit of {Size(LineLimit)} (is this a text file?)");
                }

                if (lineBreak < 0)
                {
                    _lineLength = length;
                    break;
                }

                _lineLength = 0;
                rest = rest[(lineBreak + 1)..];
            }

            return n;
        }

        public override Task<int> ReadAsync(byte[] buffer, int offset, int count, CancellationToken cancellationToken)
            => Task.FromResult(Read(buffer, offset, count));

        public override ValueTask<int> ReadAsync(Memory<byte> buffer, CancellationToken cancellationToken = default)
            => ValueTask.FromResult(Read(buffer.Span));

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
                inner.Dispose();
            }

            base.Dispose(disposing);
        }
    }
}
