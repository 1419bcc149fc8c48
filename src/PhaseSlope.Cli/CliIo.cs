using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;

namespace PhaseSlope.Cli;

/// <summary>The tool's output streams and the one place where exceptions become exit codes.</summary>
internal sealed class CliIo(TextWriter output, TextWriter error)
{
    /// <summary>Standard output: results only.</summary>
    public TextWriter Out { get; } = output;

    /// <summary>Standard error: one-line messages.</summary>
    public TextWriter Error { get; } = error;

    /// <summary>True when the error stream is the process's own standard error and that is a
    /// terminal (not redirected): only then may a progress bar be drawn on it. Tests and CI pass
    /// their own writers or redirect the stream, so they never see one.</summary>
    public bool ErrorIsTerminal => ReferenceEquals(Error, Console.Error) && !Console.IsErrorRedirected;

    /// <summary>Runs a command body and maps failures to one stderr line and an exit code.</summary>
    /// <remarks>The body writes its result to <see cref="Out"/> only after all computation is
    /// done, so a failure leaves standard output empty.</remarks>
    public int Guard(Action body) => Guard(() =>
    {
        body();
        return ExitCodes.Success;
    });

    /// <summary>As <see cref="Guard(Action)"/> for a body that decides its own exit code (a batch
    /// with refused rows).</summary>
    public int Guard(Func<int> body)
    {
        try
        {
            return body();
        }
        catch (UsageException ex)
        {
            return Fail(ex.Message, ExitCodes.Usage);
        }
        catch (Exception ex) when (ex is UnknownFluidException or FluidDataException)
        {
            return Fail(ex.Message, ExitCodes.Fluid);
        }
        catch (InvalidInputException ex)
        {
            return Fail(ex.Message, ExitCodes.OutOfRange);
        }
        catch (Output.NonFiniteResultException ex)
        {
            return Fail(ex.Message, ExitCodes.OutOfRange);
        }
        catch (ConvergenceException ex)
        {
            return Fail(ex.Message, ExitCodes.NotConverged);
        }
        catch (OutputFileException ex)
        {
            return Fail(ex.Message, ExitCodes.OutputFile);
        }
        catch (Plots.FigureFileException ex)
        {
            return Fail(ex.Message, ExitCodes.OutputFile);
        }
        catch (Input.DataFileException ex)
        {
            return Fail(ex.Message, ExitCodes.DataFile);
        }
        catch (Exception ex)
        {
            return Fail($"internal error ({ex.GetType().Name}): {ex.Message}", ExitCodes.InternalError);
        }
    }

    /// <summary>Writes "phaseslope: error: message" on one line of standard error and returns the code.</summary>
    public int Fail(string message, int code)
    {
        // Every error may echo user text (a name, a path, a file's field): escaped here, once.
        Error.WriteLine($"{ErrorPrefix}{Input.DataFileException.OneLine(message.ReplaceLineEndings(" "))}");
        return code;
    }

    /// <summary>Writes a success or progress message, "phaseslope: message", on one line of
    /// standard error (never starting with <see cref="ErrorPrefix"/>).</summary>
    public void Note(string message) => Error.WriteLine($"phaseslope: {message.ReplaceLineEndings(" ")}");

    /// <summary>The start of every error line; success and progress lines lack the "error:".</summary>
    public const string ErrorPrefix = "phaseslope: error: ";
}
