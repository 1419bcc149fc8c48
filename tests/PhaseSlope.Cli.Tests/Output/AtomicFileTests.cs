using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Tests.Output;

public class AtomicFileTests
{
    [Fact]
    public void WriteAllText_NewFile_WholeContentAndNoTempFile()
    {
        using var folder = new TempFolder();
        string path = folder.File("a.csv");
        string content = string.Concat(Enumerable.Repeat("1.5,2.5\n", 10_000));

        AtomicFile.WriteAllText(path, content);

        Assert.Equal(content, File.ReadAllText(path));
        Assert.Equal(["a.csv"], folder.Entries());
    }

    [Fact]
    public void WriteAllText_ExistingFile_Replaced()
    {
        using var folder = new TempFolder();
        string path = folder.File("a.csv");
        File.WriteAllText(path, "old content that is longer than the new one");

        AtomicFile.WriteAllText(path, "new");

        Assert.Equal("new", File.ReadAllText(path));
        Assert.Equal(["a.csv"], folder.Entries());
    }

    [Fact]
    public void WriteAllText_MissingFolder_OutputFileExceptionAndNothingCreated()
    {
        using var folder = new TempFolder();
        string path = Path.Combine(folder.Path, "sub", "a.csv");

        var ex = Assert.Throws<OutputFileException>(() => AtomicFile.WriteAllText(path, "x"));

        Assert.Contains(path, ex.Message, StringComparison.Ordinal);
        Assert.Empty(folder.Entries());
    }

    [Fact]
    public void WriteAllText_PathIsFolder_OutputFileExceptionAndFolderKept()
    {
        using var folder = new TempFolder();
        string path = folder.File("d");
        Directory.CreateDirectory(path);

        Assert.Throws<OutputFileException>(() => AtomicFile.WriteAllText(path, "x"));

        Assert.True(Directory.Exists(path));
        Assert.Equal(["d"], folder.Entries());
    }
}
