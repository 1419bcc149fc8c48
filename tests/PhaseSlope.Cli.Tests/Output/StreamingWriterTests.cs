using System.Globalization;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Output;

namespace PhaseSlope.Cli.Tests.Output;

/// <summary>The writers that stream long results (a fit to a million points) must write exactly
/// the text the whole-string writers did.</summary>
public class StreamingWriterTests
{
    /// <summary>Counts the writes that reach it and whether it was disposed.</summary>
    private sealed class CountingWriter : StringWriter
    {
        public CountingWriter()
            : base(CultureInfo.InvariantCulture)
        {
        }

        public int Writes { get; private set; }

        public bool Disposed { get; private set; }

        public override void Write(char value)
        {
            Writes++;
            base.Write(value);
        }

        public override void Write(string? value)
        {
            Writes++;
            base.Write(value);
        }

        public override void Write(char[] buffer, int index, int count)
        {
            Writes++;
            base.Write(buffer, index, count);
        }

        public override void Write(ReadOnlySpan<char> buffer)
        {
            Writes++;
            base.Write(buffer);
        }

        public override void Write(StringBuilder? value)
        {
            Writes++;
            base.Write(value?.ToString());
        }

        protected override void Dispose(bool disposing)
        {
            Disposed = true;
            base.Dispose(disposing);
        }
    }

    [Fact]
    public void ChunkedTextWriter_ManySmallWrites_ArriveWholeInOrderInFewWrites()
    {
        var inner = new CountingWriter();
        var expected = new StringBuilder();
        using (var chunked = new ChunkedTextWriter(inner))
        {
            for (int i = 0; i < 100_000; i++)
            {
                string line = $"row {i},{i * 0.5}\n";
                chunked.Write(line);
                chunked.Write('.');
                expected.Append(line).Append('.');
            }
        }

        Assert.Equal(expected.ToString(), inner.ToString());
        // ~1.6 M characters in chunks of 64 K: about 25 writes, against 200 000 unchunked.
        Assert.InRange(inner.Writes, 1, expected.Length / 65_536 + 2);
        Assert.False(inner.Disposed, "the inner writer (standard output) must stay open");
    }

    [Fact]
    public void TextTableWrite_RowsOnDemand_EqualsRenderOfTheSameRows()
    {
        string[] headers = ["T [K]", "name", "value"];
        bool[] numeric = [true, false, true];
        string[] Row(int i) => [(250 + i * 0.125).ToString("G7", CultureInfo.InvariantCulture), new string('x', i % 7), (Math.PI * i * i).ToString("G7", CultureInfo.InvariantCulture)];
        var table = new TextTable(headers, numeric);
        for (int i = 0; i < 500; i++)
        {
            table.Add(Row(i));
        }

        int calls = 0;
        using var streamed = new StringWriter(CultureInfo.InvariantCulture);
        TextTable.Write(streamed, headers, numeric, 500, i =>
        {
            calls++;
            return Row(i);
        });

        Assert.Equal(table.Render(), streamed.ToString());
        Assert.Equal(1000, calls); // each row made twice (widths, then text), none kept
    }

    [Fact]
    public void TextTableWrite_RowWithWrongCellCount_Throws()
    {
        using var text = new StringWriter(CultureInfo.InvariantCulture);
        var ex = Assert.Throws<ArgumentException>(() => TextTable.Write(text, ["a", "b"], [false, false], 3, i => i == 2 ? ["only one"] : ["x", "y"]));
        Assert.Contains("row 2 has 1 cells", ex.Message);
    }

    [Fact]
    public void JsonTextWrite_LongNonAsciiTextAcrossBlocks_EqualsTheWholeStringWriter()
    {
        // Multi-byte UTF-8 (é: 2 bytes, €: 3, 𝜏: 4 as a surrogate pair) in strings longer than the
        // 16 KB blocks, so that characters are split between blocks and must be decoded whole.
        string text = string.Concat(Enumerable.Range(0, 40_000).Select(i => (i % 3) switch { 0 => "é", 1 => "€", _ => "𝜏" }));
        void Write(Utf8JsonWriter json)
        {
            json.WriteStartObject();
            for (int k = 0; k < 5; k++)
            {
                json.WriteString($"key {k} ü", text[k..]);
                json.WriteNumber($"n{k}", 1.0 / (k + 3));
            }

            json.WriteEndObject();
        }

        // The reference: the whole text through a memory stream, as the writer worked before.
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, JsonText.Options))
        {
            Write(json);
        }

        string expected = Encoding.UTF8.GetString(stream.ToArray()) + Environment.NewLine;
        using var streamed = new StringWriter(CultureInfo.InvariantCulture);
        JsonText.Write(streamed, Write);

        Assert.Equal(expected, streamed.ToString());
        Assert.Equal(expected, JsonText.Write(Write));
    }
}
