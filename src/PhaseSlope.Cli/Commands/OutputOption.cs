using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;

namespace PhaseSlope.Cli.Commands;

/// <summary>--out/-o: where a command's result goes, standard output by default; files are
/// written by <see cref="AtomicFile"/>.</summary>
internal sealed class OutputOption
{
    /// <summary>The option.</summary>
    public Option<string> Option { get; } = new("--out", "-o")
    {
        Description = "Write the result to this file instead of the terminal (atomically; a symbolic link is followed, a device or pipe written through)",
    };

    /// <summary>Adds the option to a command.</summary>
    public void AddTo(Command command) => command.Options.Add(Option);

    /// <summary>The checked path, or null for standard output.</summary>
    public string? Path(ParseResult parse)
    {
        string? path = parse.GetValue(Option);
        return path is not null && string.IsNullOrWhiteSpace(path)
            ? throw new UsageException("--out: the file name is empty")
            : path;
    }

    /// <summary>Writes the result text to the --out file, or to standard output when none was given;
    /// after a file, one "phaseslope: wrote WHAT to PATH" line goes to standard error.</summary>
    public void Emit(CliIo io, ParseResult parse, string text, string what)
        => Emit(io, parse, output => output.Write(text), what);

    /// <summary>Streams the result to the --out file or standard output (see
    /// <see cref="Emit(CliIo, ParseResult, string, string)"/>).</summary>
    public void Emit(CliIo io, ParseResult parse, Action<TextWriter> write, string what)
    {
        if (Path(parse) is not string path)
        {
            write(io.Out);
            return;
        }

        AtomicFile.Write(path, write);
        io.Note($"wrote {what} to {path}");
    }
}
