using System.CommandLine;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Plots;
using PhaseSlope.Plots.Diagrams;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope plot FLUID[,FLUID...] --diagram KIND --out FILE.png|FILE.svg</c>: a
/// phase diagram computed by the solver, written as PNG or SVG.</summary>
internal static class PlotCommand
{
    /// <summary>Builds the command; its action writes messages to <paramref name="io"/> and the
    /// figure to the --out file only.</summary>
    public static Command Create(CliIo io)
    {
        var options = new PlotOptions();
        var command = new Command("plot", "Draw a phase diagram from the model as a PNG or SVG figure");
        options.AddTo(command);
        command.SetAction(parse => io.Guard(() =>
        {
            var request = options.Bind(parse);
            var model = Diagram.Build(request.Kind, request.Fluids, request.Options);
            // Rendered into memory first: a rendering failure never touches the file system.
            using var figure = new MemoryStream();
            FigureExporter.Export(model, figure, request.Format, request.Width, request.Height);
            Output.AtomicFile.WriteBytes(request.Path, file => figure.WriteTo(file));
        }));
        return command;
    }
}

/// <summary>The checked inputs of <c>plot</c>.</summary>
/// <param name="Kind">The diagram.</param>
/// <param name="Path">The figure file.</param>
/// <param name="Format">PNG or SVG, from the file's extension.</param>
/// <param name="Width">Width in pixels.</param>
/// <param name="Height">Height in pixels.</param>
/// <param name="Fluids">The fluids with their models.</param>
/// <param name="Options">Axis choices and the measured data, if any.</param>
internal sealed record PlotRequest(DiagramKind Kind, string Path, FigureFormat Format, int Width, int Height,
    IReadOnlyList<PlotFluid> Fluids, DiagramOptions Options);

/// <summary>The options of <c>plot</c>, bound to a <see cref="PlotRequest"/>.</summary>
internal sealed class PlotOptions
{
    /// <summary>--eos, --alpha, --volume-shift.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>FLUID[,FLUID...].</summary>
    public Argument<string> Fluids { get; } = new("FLUID") { Description = "Catalog name, fluid file or inline:... definition; several separated by commas (p-t, lnp-invt, t-rho, slope, latent); an inline definition keeps the key=value items that follow it" };

    /// <summary>--diagram.</summary>
    public Option<string> Kind { get; } = new("--diagram", "-d") { Description = $"Diagram: {string.Join(", ", DiagramKinds.Ids)}", Required = true };

    /// <summary>--out (the figure file).</summary>
    public Option<string> Out { get; } = new("--out", "-o") { Description = "Figure file; .png or .svg chooses the format", Required = true };

    /// <summary>--width.</summary>
    public Option<int> Width { get; } = new("--width") { Description = $"Width in pixels, {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize}", DefaultValueFactory = _ => HouseStyle.DefaultWidth };

    /// <summary>--height.</summary>
    public Option<int> Height { get; } = new("--height") { Description = $"Height in pixels, {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize}", DefaultValueFactory = _ => HouseStyle.DefaultHeight };

    /// <summary>--data.</summary>
    public Option<string> Data { get; } = new("--data") { Description = "CSV of measured vapour pressures (as for fit): overlaid on p-t and lnp-invt; on latent, the Clapeyron estimate with its +-u band" };

    /// <summary>--reduced.</summary>
    public Option<bool> Reduced { get; } = new("--reduced") { Description = "Reduced coordinates T/Tc, P/Pc, rho/rhoc for corresponding-states comparison (p-t, lnp-invt, t-rho, slope, p-v)" };

    /// <summary>--log.</summary>
    public Option<bool> Log { get; } = new("--log") { Description = "Logarithmic pressure axis (p-t) or slope axis (slope)" };

    /// <summary>--temperature-unit.</summary>
    public Option<string> TemperatureUnit { get; } = new("--temperature-unit") { Description = "Unit of a data temperature column whose header gives none: K, degC, degF or degR (data cells are bare numbers in this unit)" };

    /// <summary>--pressure-unit.</summary>
    public Option<string> PressureUnit { get; } = new("--pressure-unit") { Description = "Unit of a data pressure column whose header gives none: Pa, kPa, MPa, bar, psi, atm, mmHg, torr, ... (data cells are bare numbers in this unit)" };

    /// <summary>--units (axis units).</summary>
    public Option<string> Units { get; } = new("--units")
    {
        Description = "Axis units: si (K, kPa, mol/m3, cm3/mol, kJ/mol) or engineering (degC, bar, kg/m3, m3/kg, kJ/kg)",
        DefaultValueFactory = _ => "si",
    };

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(Fluids);
        command.Options.Add(Kind);
        command.Options.Add(Out);
        command.Options.Add(Width);
        command.Options.Add(Height);
        command.Options.Add(Data);
        command.Options.Add(Reduced);
        command.Options.Add(Log);
        command.Options.Add(TemperatureUnit);
        command.Options.Add(PressureUnit);
        command.Options.Add(Common.Eos);
        command.Options.Add(Common.Alpha);
        command.Options.Add(Common.VolumeShift);
        command.Options.Add(Units);
    }

    /// <summary>Parses and checks every option, resolves the fluids, checks that the diagram can
    /// be drawn for them, then reads the data file.</summary>
    public PlotRequest Bind(ParseResult parse)
    {
        // Everything that is a usage error is checked before any fluid is read or computed.
        string kindText = parse.GetValue(Kind)!;
        if (!DiagramKinds.TryParse(kindText, out var kind))
        {
            throw new UsageException($"--diagram: unknown diagram '{kindText}' (use {string.Join(", ", DiagramKinds.Ids)})");
        }

        string path = parse.GetValue(Out)!;
        if (!FigureFormats.TryFromPath(path, out var figureFormat))
        {
            throw new UsageException($"--out: '{path}' must end in .png or .svg");
        }

        int w = parse.GetValue(Width);
        int h = parse.GetValue(Height);
        foreach (var (value, name) in new[] { (w, "--width"), (h, "--height") })
        {
            if (value < HouseStyle.MinimumSize || value > HouseStyle.MaximumSize)
            {
                throw new UsageException($"{name}: must be {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize} pixels, got {value}");
            }
        }

        string unitsText = parse.GetValue(Units) ?? "si";
        var axisUnits = unitsText.ToLowerInvariant() switch
        {
            "si" => PlotUnits.Si,
            "engineering" => PlotUnits.Engineering,
            _ => throw new UsageException($"--units: unknown unit system '{unitsText}' (use si or engineering)"),
        };

        string[] names = [.. FluidResolver.SplitList(parse.GetValue(Fluids)!)];
        if (names.Any(n => n.Length == 0))
        {
            throw new UsageException("FLUID: an empty name in the comma-separated list");
        }

        string? dataPath = parse.GetValue(Data);
        foreach (var unitOption in new Option[] { TemperatureUnit, PressureUnit })
        {
            if (dataPath is null && CommonOptions.Given(parse, unitOption))
            {
                throw new UsageException($"{unitOption.Name}: the unit of a --data column; needs --data");
            }
        }

        var probe = new DiagramOptions { Reduced = parse.GetValue(Reduced), Logarithmic = parse.GetValue(Log), Units = axisUnits, Data = dataPath is null ? null : [] };
        var fluids = names.Select(FluidResolver.Resolve).Select(f => new PlotFluid(f, Common.Model(parse, f)) { Alpha = Common.BindModel(parse).Alpha }).ToList();
        try
        {
            Diagram.Check(kind, fluids, probe);
        }
        catch (InvalidInputException ex)
        {
            throw new UsageException(ex.Message);
        }

        var diagramOptions = probe with
        {
            Data = dataPath is null ? null : CorrelationOptions.ReadDataFile(dataPath, parse.GetValue(TemperatureUnit), parse.GetValue(PressureUnit)),
            DataLabel = dataPath is null ? "data" : Path.GetFileName(dataPath),
        };
        return new PlotRequest(kind, path, figureFormat, w, h, fluids, diagramOptions);
    }
}
