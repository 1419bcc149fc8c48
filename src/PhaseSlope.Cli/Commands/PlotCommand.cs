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
        var common = new CommonOptions();
        var fluidsArgument = new Argument<string>("FLUID") { Description = "Catalog name or fluid file; several separated by commas (p-t, lnp-invt, t-rho, slope, latent)" };
        var diagram = new Option<string>("--diagram", "-d") { Description = $"Diagram: {string.Join(", ", DiagramKinds.Ids)}", Required = true };
        var output = new Option<string>("--out", "-o") { Description = "Figure file; .png or .svg chooses the format", Required = true };
        var width = new Option<int>("--width") { Description = $"Width in pixels, {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize}", DefaultValueFactory = _ => HouseStyle.DefaultWidth };
        var height = new Option<int>("--height") { Description = $"Height in pixels, {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize}", DefaultValueFactory = _ => HouseStyle.DefaultHeight };
        var data = new Option<string>("--data") { Description = "CSV of measured vapour pressures (as for fit): overlaid on p-t and lnp-invt; on latent, the Clapeyron estimate with its +-u band" };
        var reduced = new Option<bool>("--reduced") { Description = "Reduced coordinates T/Tc, P/Pc, rho/rhoc for corresponding-states comparison (p-t, lnp-invt, t-rho, slope, p-v)" };
        var log = new Option<bool>("--log") { Description = "Logarithmic pressure axis (p-t) or slope axis (slope)" };
        var temperatureUnit = new Option<string>("--temperature-unit") { Description = "Unit of a data temperature column whose header gives none: K, degC, degF or degR (data cells are bare numbers in this unit)" };
        var pressureUnit = new Option<string>("--pressure-unit") { Description = "Unit of a data pressure column whose header gives none: Pa, kPa, MPa, bar, psi, atm, mmHg, torr, ... (data cells are bare numbers in this unit)" };
        var units = new Option<string>("--units")
        {
            Description = "Axis units: si (K, kPa, mol/m3, cm3/mol, kJ/mol) or engineering (degC, bar, kg/m3, m3/kg, kJ/kg)",
            DefaultValueFactory = _ => "si",
        };

        var command = new Command("plot", "Draw a phase diagram from the model as a PNG or SVG figure");
        command.Arguments.Add(fluidsArgument);
        command.Options.Add(diagram);
        command.Options.Add(output);
        command.Options.Add(width);
        command.Options.Add(height);
        command.Options.Add(data);
        command.Options.Add(reduced);
        command.Options.Add(log);
        command.Options.Add(temperatureUnit);
        command.Options.Add(pressureUnit);
        command.Options.Add(common.Eos);
        command.Options.Add(common.Alpha);
        command.Options.Add(common.VolumeShift);
        command.Options.Add(units);
        command.SetAction(parse => io.Guard(() =>
        {
            // Everything that is a usage error is checked before any fluid is read or computed.
            string kindText = parse.GetValue(diagram)!;
            if (!DiagramKinds.TryParse(kindText, out var kind))
            {
                throw new UsageException($"--diagram: unknown diagram '{kindText}' (use {string.Join(", ", DiagramKinds.Ids)})");
            }

            string path = parse.GetValue(output)!;
            if (!FigureFormats.TryFromPath(path, out var figureFormat))
            {
                throw new UsageException($"--out: '{path}' must end in .png or .svg");
            }

            int w = parse.GetValue(width);
            int h = parse.GetValue(height);
            foreach (var (value, name) in new[] { (w, "--width"), (h, "--height") })
            {
                if (value < HouseStyle.MinimumSize || value > HouseStyle.MaximumSize)
                {
                    throw new UsageException($"{name}: must be {HouseStyle.MinimumSize} to {HouseStyle.MaximumSize} pixels, got {value}");
                }
            }

            string unitsText = parse.GetValue(units) ?? "si";
            var axisUnits = unitsText.ToLowerInvariant() switch
            {
                "si" => PlotUnits.Si,
                "engineering" => PlotUnits.Engineering,
                _ => throw new UsageException($"--units: unknown unit system '{unitsText}' (use si or engineering)"),
            };

            string[] names = [.. parse.GetValue(fluidsArgument)!.Split(',').Select(n => n.Trim())];
            if (names.Any(n => n.Length == 0))
            {
                throw new UsageException("FLUID: an empty name in the comma-separated list");
            }

            string? dataPath = parse.GetValue(data);
            foreach (var unitOption in new Option[] { temperatureUnit, pressureUnit })
            {
                if (dataPath is null && CommonOptions.Given(parse, unitOption))
                {
                    throw new UsageException($"{unitOption.Name}: the unit of a --data column; needs --data");
                }
            }

            var probe = new DiagramOptions { Reduced = parse.GetValue(reduced), Logarithmic = parse.GetValue(log), Units = axisUnits, Data = dataPath is null ? null : [] };
            var fluids = names.Select(FluidResolver.Resolve).Select(f => new PlotFluid(f, common.Model(parse, f))).ToList();
            try
            {
                Diagram.Check(kind, fluids, probe);
            }
            catch (InvalidInputException ex)
            {
                throw new UsageException(ex.Message);
            }

            var options = probe with
            {
                Data = dataPath is null ? null : CorrelationOptions.ReadDataFile(dataPath, parse.GetValue(temperatureUnit), parse.GetValue(pressureUnit)),
                DataLabel = dataPath is null ? "data" : Path.GetFileName(dataPath),
            };
            var model = Diagram.Build(kind, fluids, options);
            // Rendered into memory first: a rendering failure never touches the file system.
            using var figure = new MemoryStream();
            FigureExporter.Export(model, figure, figureFormat, w, h);
            Output.AtomicFile.WriteBytes(path, file => figure.WriteTo(file));
        }));
        return command;
    }
}
