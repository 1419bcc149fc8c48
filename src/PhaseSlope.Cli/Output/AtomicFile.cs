using System.Collections.Concurrent;
using System.Runtime.InteropServices;
using System.Text;

namespace PhaseSlope.Cli.Output;

/// <summary>Writes output files so that readers see either the old content or the whole new
/// content: the text goes to a temporary file in the target's folder, which is then renamed over
/// the target.</summary>
/// <remarks>
/// <para>A symbolic link is followed to its final target, and the target is replaced (the link
/// stays a link). A device node, FIFO or socket is written through, never replaced: <c>--out
/// /dev/null</c> stays a device, <c>--out FIFO</c> feeds the reader. A replaced file keeps the
/// permission bits of the file it replaces.</para>
/// <para>The temporary file is removed when writing fails and when the process receives SIGINT or
/// SIGTERM while it writes. Every error names the path the user gave, never the temporary file.</para>
/// </remarks>
internal static class AtomicFile
{
    private static readonly UTF8Encoding Utf8 = new(encoderShouldEmitUTF8Identifier: false);
    private static readonly ConcurrentDictionary<string, byte> Pending = new();
    private static readonly Lock SignalLock = new();
    private static List<PosixSignalRegistration>? _signals;

    /// <summary>Writes <paramref name="content"/> to <paramref name="path"/> atomically.</summary>
    /// <exception cref="OutputFileException">The file cannot be written; the target is left
    /// untouched and no temporary file remains.</exception>
    public static void WriteAllText(string path, string content) => Write(path, text => text.Write(content));

    /// <summary>Streams text to <paramref name="path"/> atomically: <paramref name="write"/> writes
    /// it (UTF-8, no byte-order mark) and the target is replaced only when it has returned.</summary>
    /// <exception cref="OutputFileException">The file cannot be written; the target is left
    /// untouched and no temporary file remains.</exception>
    public static void Write(string path, Action<TextWriter> write)
        => WriteBytes(path, stream =>
        {
            using var text = new StreamWriter(stream, Utf8, bufferSize: 1 << 16, leaveOpen: true);
            write(text);
        });

    /// <summary>Streams bytes to <paramref name="path"/> atomically (see the remarks on the type).</summary>
    /// <exception cref="OutputFileException">The file cannot be written; the target is left
    /// untouched and no temporary file remains.</exception>
    public static void WriteBytes(string path, Action<Stream> write)
    {
        string target = Target(path);
        switch (FileKinds.Of(target))
        {
            case FileKind.Directory:
                throw Fail(path, "it is a directory", new IOException(target));
            case FileKind.Special:
                WriteThrough(path, target, write);
                return;
        }

        string folder = Path.GetDirectoryName(target) ?? ".";
        string temp = Path.Combine(folder, $".{Path.GetFileName(target)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        HandleSignals();
        Pending[temp] = 0;
        try
        {
            using (var file = new FileStream(temp, FileMode.CreateNew, FileAccess.Write, FileShare.None, bufferSize: 1 << 16))
            {
                write(file);
            }

            KeepMode(target, temp);
            File.Move(temp, target, overwrite: true);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            throw Fail(path, Reason(ex, temp, path), ex);
        }
        catch
        {
            TryDelete(temp);
            throw;
        }
        finally
        {
            Pending.TryRemove(temp, out _);
        }
    }

    /// <summary>The temporary files being written now (for the tests).</summary>
    internal static IReadOnlyCollection<string> PendingFiles => [.. Pending.Keys];

    /// <summary>The absolute path to write: the final target of a symbolic link, else the path itself.</summary>
    private static string Target(string path)
    {
        if (string.IsNullOrWhiteSpace(path))
        {
            throw Fail(path, "the file name is empty", new ArgumentException(path));
        }

        try
        {
            string full = Path.GetFullPath(path);
            var info = new FileInfo(full);
            if (info.LinkTarget is null)
            {
                return full;
            }

            // A dangling link gives the path it points to, which is then created.
            return info.ResolveLinkTarget(returnFinalTarget: true)?.FullName ?? full;
        }
        catch (Exception ex) when (ex is ArgumentException or NotSupportedException or IOException or UnauthorizedAccessException)
        {
            throw Fail(path, ex is PathTooLongException ? "the path is too long" : $"cannot follow the path: {Reason(ex, null, path)}", ex);
        }
    }

    private static void WriteThrough(string path, string target, Action<Stream> write)
    {
        try
        {
            // No truncation and no rename: a device or a pipe is used as it is.
            using var stream = new FileStream(target, FileMode.Open, FileAccess.Write, FileShare.ReadWrite, bufferSize: 1 << 16);
            write(stream);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            throw Fail(path, Reason(ex, null, path), ex);
        }
    }

    private static void KeepMode(string target, string temp)
    {
        if (!OperatingSystem.IsWindows() && File.Exists(target))
        {
            File.SetUnixFileMode(temp, File.GetUnixFileMode(target));
        }
    }

    private static string Reason(Exception ex, string? temp, string path) => ex switch
    {
        DirectoryNotFoundException => "folder does not exist",
        UnauthorizedAccessException => "permission denied",
        _ when temp is not null => ex.Message.Replace(temp, path, StringComparison.Ordinal),
        _ => ex.Message,
    };

    private static OutputFileException Fail(string path, string reason, Exception inner)
        => new($"cannot write output file '{path}': {reason}", inner);

    /// <summary>Removes the temporary files on SIGINT and SIGTERM; the signal then has its usual
    /// effect (the process ends).</summary>
    private static void HandleSignals()
    {
        lock (SignalLock)
        {
            if (_signals is not null)
            {
                return;
            }

            _signals = [];
            foreach (var signal in new[] { PosixSignal.SIGINT, PosixSignal.SIGTERM })
            {
                try
                {
                    _signals.Add(PosixSignalRegistration.Create(signal, _ => RemovePending()));
                }
                catch (PlatformNotSupportedException)
                {
                    // No signals here: the failure path above still removes the file.
                }
            }
        }
    }

    private static void RemovePending()
    {
        foreach (string temp in Pending.Keys)
        {
            TryDelete(temp);
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            // The temporary file may never have been created; nothing else to do.
        }
    }
}
