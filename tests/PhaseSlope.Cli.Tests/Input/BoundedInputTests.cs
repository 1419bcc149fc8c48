using PhaseSlope.Cli.Input;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Input;

/// <summary>Input files are read with a limit: size, line length and data rows.</summary>
public class BoundedInputTests
{
    [Fact]
    public void FluidFile_LargerThanOneMebibyte_RefusedBeforeReading()
    {
        using var folder = new TempFolder();
        string path = folder.File("huge.fluid");
        using (var file = File.Create(path))
        {
            file.SetLength(BoundedInput.FluidFileLimit + 1); // sparse: nothing is written
        }

        var result = Run("coexist", path, "-T", "300");

        AssertFailure(result, ExitCodes.Fluid, $"{path}: cannot read fluid file: the file is 1 MiB, larger than the limit of 1 MiB");
    }

    [Fact]
    public void DataFile_LargerThanTheLimit_RefusedBeforeReading()
    {
        using var folder = new TempFolder();
        string path = folder.File("huge.csv");
        using (var file = File.Create(path))
        {
            file.SetLength(BoundedInput.DataFileLimit + 1);
        }

        var result = Run("fit", path);

        AssertFailure(result, ExitCodes.DataFile, $"{path}: cannot read data file: the file is 256 MiB, larger than the limit of 256 MiB");
    }

    [Fact]
    public async Task DataFile_FifoWithAnEndlessLine_StopsAtTheLineLimit()
    {
        using var folder = new TempFolder();
        string fifo = folder.File("data.csv");
        Output.OutputFileTests.MakeFifo(fifo);
        var writer = Task.Run(() =>
        {
            try
            {
                using var stream = new FileStream(fifo, FileMode.Open, FileAccess.Write);
                byte[] block = new byte[4096];
                block.AsSpan().Fill((byte)'7');
                for (int i = 0; i < 1024; i++)
                {
                    stream.Write(block);
                }
            }
            catch (IOException)
            {
                // The reader stopped and closed its end: the expected outcome.
            }
        });

        var result = Run("fit", fifo, "--form", "antoine");

        AssertFailure(result, ExitCodes.DataFile, $"{fifo}: cannot read data file: a line is longer than the limit of 64 KiB");
        await writer.WaitAsync(TimeSpan.FromSeconds(30));
    }

    [Fact]
    public void Stream_LineBreakInsideABlock_LinesCountedAcrossBlocks()
    {
        using var folder = new TempFolder();
        string path = folder.File("lines.txt");
        // Lines of exactly the limit are allowed, one byte more is not, wherever the reads split them.
        string ok = new string('a', BoundedInput.LineLimit) + "\n" + new string('b', BoundedInput.LineLimit) + "\n";
        File.WriteAllText(path, ok);
        using (var reader = new StreamReader(BoundedInput.Open(path, BoundedInput.DataFileLimit)))
        {
            Assert.Equal(ok, reader.ReadToEnd());
        }

        File.WriteAllText(path, "short\n" + new string('c', BoundedInput.LineLimit + 1));
        using var tooLong = new StreamReader(BoundedInput.Open(path, BoundedInput.DataFileLimit));
        var ex = Assert.Throws<InputLimitException>(() => tooLong.ReadToEnd());
        Assert.Contains("a line is longer than the limit of 64 KiB", ex.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Stream_ExactlyTheLimit_ReadsAndOneMoreByteFails()
    {
        using var folder = new TempFolder();
        string path = folder.File("small.txt");
        File.WriteAllText(path, "12345\n");
        using (var reader = new StreamReader(BoundedInput.Open(path, 6)))
        {
            Assert.Equal("12345\n", reader.ReadToEnd());
        }

        Assert.Throws<InputLimitException>(() => BoundedInput.Open(path, 5).Dispose());
    }

    [Fact]
    public void DataFile_MoreRowsThanTheLimit_RefusedWithTheLine()
    {
        // The limit itself is 2 000 000; a small one shows the rule without a 40 MB input.
        const string text = "T [K],P [Pa]\n# a comment\n200,1000\n201,1100\n202,1200\n203,1300\n";
        Assert.Equal(3, VapourPressureCsv.Read(new StringReader(text[..^9]), "rows.csv", new VapourPressureCsvOptions(), maximumRows: 3).Count);

        var ex = Assert.Throws<DataFileException>(() => VapourPressureCsv.Read(new StringReader(text), "rows.csv", new VapourPressureCsvOptions(), maximumRows: 3));

        Assert.Equal("rows.csv:6: more than 3 data rows (the limit for data files)", ex.Message);
        Assert.True(VapourPressureCsv.MaximumRows >= 1_000_000, "the documented 1 000 000-point fit must stay possible");
    }
}
