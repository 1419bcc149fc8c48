using System.Runtime.InteropServices;

namespace PhaseSlope.Cli.Output;

/// <summary>What a path names on disk, as far as writing to it matters.</summary>
internal enum FileKind
{
    /// <summary>Nothing is there yet.</summary>
    Missing,

    /// <summary>A regular file: replaced atomically.</summary>
    Regular,

    /// <summary>A folder: refused.</summary>
    Directory,

    /// <summary>A character or block device, FIFO or socket: written through, never replaced.</summary>
    Special,
}

/// <summary>Finds the <see cref="FileKind"/> of a path (after symbolic links).</summary>
/// <remarks>.NET reports devices and FIFOs as ordinary files, so the kind comes from the C
/// library's <c>stat</c>; only the file-type bits of <c>st_mode</c> are read, at the offset the
/// Linux ABI gives them on x64 and Arm64. On any other platform every existing non-folder counts
/// as regular, which is what the tool did before.</remarks>
internal static class FileKinds
{
    private const uint TypeMask = 0xF000;
    private const uint RegularType = 0x8000;
    private const uint DirectoryType = 0x4000;

    /// <summary>The kind of <paramref name="fullPath"/>, following symbolic links.</summary>
    public static FileKind Of(string fullPath)
    {
        if (Directory.Exists(fullPath))
        {
            return FileKind.Directory;
        }

        if (!File.Exists(fullPath))
        {
            return FileKind.Missing;
        }

        return Mode(fullPath) is uint mode
            ? (mode & TypeMask) switch
            {
                RegularType => FileKind.Regular,
                DirectoryType => FileKind.Directory,
                _ => FileKind.Special,
            }
            : FileKind.Regular;
    }

    private static uint? Mode(string path)
    {
        int offset = RuntimeInformation.ProcessArchitecture switch
        {
            Architecture.X64 => 24,   // st_dev, st_ino, st_nlink (8 bytes each), then st_mode
            Architecture.Arm64 => 16, // st_dev, st_ino, then st_mode
            _ => -1,
        };
        if (!OperatingSystem.IsLinux() || offset < 0)
        {
            return null;
        }

        // struct stat is 144 (x64) or 128 (Arm64) bytes; the buffer is larger than either.
        byte[] buffer = new byte[256];
        try
        {
            return Stat(path, buffer) == 0 ? BitConverter.ToUInt32(buffer, offset) : null;
        }
        catch (Exception ex) when (ex is EntryPointNotFoundException or DllNotFoundException)
        {
            return null;
        }
    }

    [DllImport("libc", EntryPoint = "stat")]
    private static extern int Stat([MarshalAs(UnmanagedType.LPUTF8Str)] string path, [Out] byte[] buffer);
}
