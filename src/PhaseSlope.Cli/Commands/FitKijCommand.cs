using System.CommandLine;
using System.Globalization;
using System.Security.Cryptography;
using System.Text;
using PhaseSlope.Cli.Input;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Mixtures;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fit-kij DATA.csv --components A,B [--eos …] [--alpha …] --out FILE.mixture</c>:
/// k_ij of a binary fitted to measured VLE points, written to a mixture file with its source; the
/// report (k_ij, standard error, deviations per point) goes to standard output.</summary>
internal static class FitKijCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io) => Create(io, DateTime.UtcNow);

    /// <summary>Builds the command with a fixed date for the source line (tests).</summary>
    internal static Command Create(CliIo io, DateTime now)
    {
        var options = new FitKijOptions();
        var command = new Command("fit-kij", "Fit the interaction parameter k_ij of a binary to measured VLE points (T, P, x1 and y1 where measured) "
            + "by weighted least squares; write it to a mixture file with its source and report its standard error");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var result = InteractionFit.Fit(request.Components, request.Model.Kind, request.Data, request.Model.Alpha);
            string source = string.Create(CultureInfo.InvariantCulture,
                $"fitted by phaseslope to {Path.GetFileName(request.DataPath)} (sha256 {request.Checksum[..16]}, {now:yyyy-MM-dd}, {request.Data.Count} points, "
                + $"AAD(P) {result.PressureDeviation * 100:0.###} %{(result.VapourDeviation is double y ? $", AAD(y1) {y:0.####}" : "")}) with {request.Model.Kind.Title()}, "
                + $"standard error {NumberText.Uncertainty(result.StandardError)}");
            var mixture = Mixture.Create(request.Components, [0.5, 0.5], [new GivenInteraction(0, 1, result.Kij, source)]);
            var file = new StringWriter(CultureInfo.InvariantCulture);
            MixtureFileWriter.Write(file, mixture, $"{request.Components[0].Name} + {request.Components[1].Name} (k_ij fitted)",
                [$"k_ij fitted for {request.Model.Kind.Title()} only; the equimolar composition is a placeholder: change the fractions to your mixture's"]);
            string report = FitKijWriter.Render(request, result, source);
            AtomicFile.WriteAllText(request.OutPath, file.ToString());
            io.Note($"wrote k_ij of {request.Components[0].Name}, {request.Components[1].Name} to {request.OutPath}");
            io.Out.Write(report);
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>fit-kij</c>.</summary>
/// <param name="DataPath">The data file.</param>
/// <param name="Checksum">SHA-256 of the data file's bytes, hexadecimal.</param>
/// <param name="Data">The measured points.</param>
/// <param name="Components">The two fluids, in the order of x1.</param>
/// <param name="Model">--eos and --alpha.</param>
/// <param name="Format">Table or json.</param>
/// <param name="OutPath">The mixture file to write.</param>
internal sealed record FitKijRequest(string DataPath, string Checksum, IReadOnlyList<BinaryVlePoint> Data, IReadOnlyList<Fluid> Components,
    ModelChoice Model, OutputFormat Format, string OutPath);

/// <summary>The options of <c>fit-kij</c>.</summary>
internal sealed class FitKijOptions
{
    /// <summary>DATA.</summary>
    public Argument<string> Data { get; } = new("DATA")
    {
        Description = "CSV of measured VLE points: columns 'T [unit]', 'P [unit]', 'x1' and optionally 'y1' (empty cell: not measured); component 1 is the first of --components (docs/data-files.md)",
    };

    /// <summary>--components.</summary>
    public Option<string> Components { get; } = new("--components")
    {
        Description = "The two components, A,B (catalog names or .fluid paths); x1 and y1 are A's mole fractions",
        Required = true,
    };

    /// <summary>--eos, --alpha.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--format.</summary>
    public Option<string> Format { get; } = new("--format") { Description = "Report format: table or json (the mixture file goes to --out)", DefaultValueFactory = _ => "table" };

    /// <summary>--out.</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "The mixture file to write (atomically), e.g. pair.mixture", Required = true };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Data);
        command.Options.Add(Components);
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        command.Options.Add(Format);
        command.Options.Add(Out);
    }

    /// <summary>Checks the options, then resolves the components and reads the data file.</summary>
    public FitKijRequest Bind(ParseResult parse)
    {
        var format = CommonOptions.ParseFormat(parse.GetValue(Format) ?? "table");
        if (format == OutputFormat.Csv)
        {
            throw new UsageException("--format: fit-kij reports as table or json (the fitted k_ij goes to the mixture file)");
        }

        var model = Common.BindModel(parse);
        string outPath = parse.GetValue(Out) ?? "";
        if (string.IsNullOrWhiteSpace(outPath))
        {
            throw new UsageException("--out: give the mixture file to write");
        }

        string[] names = (parse.GetValue(Components) ?? "").Split(',', StringSplitOptions.TrimEntries);
        if (names.Length != 2 || names.Any(n => n.Length == 0))
        {
            throw new UsageException($"--components: '{parse.GetValue(Components)}' is not two component names A,B");
        }

        var fluids = names.Select(FluidResolver.Resolve).ToArray();
        if (FluidNames.Normalise(fluids[0].Name) == FluidNames.Normalise(fluids[1].Name))
        {
            throw new UsageException($"--components: '{fluids[0].Name}' is given twice; a binary needs two different components");
        }

        string path = parse.GetValue(Data) ?? "";
        // The bytes once, within the data-file limit: the checksum and the reader see the same text.
        byte[] bytes = BoundedInput.ReadDataFile(path, reader =>
        {
            using var copy = new MemoryStream();
            ((StreamReader)reader).BaseStream.CopyTo(copy);
            return copy.ToArray();
        });
        string checksum = Convert.ToHexStringLower(SHA256.HashData(bytes));
        using var reader = new StreamReader(new MemoryStream(bytes), new UTF8Encoding(false), detectEncodingFromByteOrderMarks: true);
        var data = BinaryVleCsv.Read(reader, path);
        return new FitKijRequest(path, checksum, data, fluids, model, format, outPath);
    }
}
