namespace PhaseSlope.Cli.Output;

/// <summary>Writes a file so that readers see either the old content or the whole new content:
/// the text goes to a temporary file in the same folder, which is then renamed over the target.</summary>
internal static class AtomicFile
{
    /// <summary>Writes <paramref name="content"/> to <paramref name="path"/> atomically.</summary>
    /// <exception cref="OutputFileException">The folder is missing or not writable, or the path
    /// names a folder; the target is left untouched and no temporary file remains.</exception>
    public static void WriteAllText(string path, string content)
    {
        string full;
        try
        {
            full = Path.GetFullPath(path);
        }
        catch (Exception ex) when (ex is ArgumentException or NotSupportedException or PathTooLongException)
        {
            throw new OutputFileException($"cannot write output file '{path}': {ex.Message}", ex);
        }

        if (Directory.Exists(full))
        {
            throw new OutputFileException($"cannot write output file '{path}': it is a directory", new IOException(full));
        }

        string folder = Path.GetDirectoryName(full) ?? ".";
        string temp = Path.Combine(folder, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.tmp");
        try
        {
            File.WriteAllText(temp, content);
            File.Move(temp, full, overwrite: true);
        }
        catch (Exception ex) when (ex is IOException or UnauthorizedAccessException)
        {
            TryDelete(temp);
            string reason = ex is DirectoryNotFoundException ? "folder does not exist" : ex.Message;
            throw new OutputFileException($"cannot write output file '{path}': {reason}", ex);
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
