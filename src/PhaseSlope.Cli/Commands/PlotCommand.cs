using System.CommandLine;
using OxyPlot;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Errors;
using PhaseSlope.Core.Properties;
using PhaseSlope.Core.Units;
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
            if (PlotOptions.IsEnvelope(parse.GetValue(options.Kind)))
            {
                var envelope = options.BindEnvelope(parse);
                using var drawn = new MemoryStream();
                FigureExporter.Export(envelope.Model, drawn, envelope.Format, envelope.Width, envelope.Height);
                Output.AtomicFile.WriteBytes(envelope.Path, file => drawn.WriteTo(file));
                return;
            }

            var request = options.Bind(parse);
            PlotModel model;
            try
            {
                model = request.Binary is { } binary ? binary.Chart(request.Kind, request.Options.Units) : Diagram.Build(request.Kind, request.Fluids, request.Options);
            }
            catch (InvalidInputException ex) when (PlotOptions.OptionOf(ex.Field) is string option)
            {
                // Found only with the fluid's numbers (a range below its lowest pressure, a cycle whose
                // throttled liquid misses the dome): still out of range (exit 4), named by its option.
                throw new InvalidInputException(ex.Field, ex.Value, $"{option}: {ex.Message}");
            }

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
/// <param name="Binary">For p-xy, t-xy and x-y: the binary mixture and its conditions (then <paramref name="Fluids"/> is empty).</param>
internal sealed record PlotRequest(DiagramKind Kind, string Path, FigureFormat Format, int Width, int Height,
    IReadOnlyList<PlotFluid> Fluids, DiagramOptions Options, BinaryRequest? Binary = null);

/// <summary>The checked inputs and drawn model of <c>plot MIXTURE --diagram envelope</c>.</summary>
/// <param name="Model">The envelope diagram.</param>
/// <param name="Path">The figure file.</param>
/// <param name="Format">PNG or SVG.</param>
/// <param name="Width">Width in pixels.</param>
/// <param name="Height">Height in pixels.</param>
internal sealed record EnvelopePlotRequest(PlotModel Model, string Path, FigureFormat Format, int Width, int Height);

/// <summary>The options of <c>plot</c>, bound to a <see cref="PlotRequest"/>.</summary>
internal sealed class PlotOptions
{
    /// <summary>--eos, --alpha, --volume-shift.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>FLUID[,FLUID...].</summary>
    public Argument<string> Fluids { get; } = new("FLUID") { Description = "Catalog name, fluid file or inline:... definition; several separated by commas (p-t, lnp-invt, t-rho, slope, latent); an inline definition keeps the key=value items that follow it. "
        + "For --diagram envelope a MIXTURE instead: NAME=FRACTION,NAME=FRACTION,... in mole fractions, or a mixture file; for p-xy, t-xy and x-y a MIXTURE of two components (its fractions are not used)" };

    /// <summary>--diagram.</summary>
    public Option<string> Kind { get; } = new("--diagram", "-d") { Description = $"Diagram: {string.Join(", ", DiagramKinds.Ids)}, or {EnvelopeId} (a MIXTURE's bubble and dew lines, critical point, cricondenbar and cricondentherm)", Required = true };

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

    /// <summary>--reference (p-h and t-s).</summary>
    public Option<string> Reference { get; } = ReferenceOption.Create();

    /// <summary>--isotherms (p-h).</summary>
    public Option<string> Isotherms { get; } = new("--isotherms")
    {
        Description = "Temperatures of the isotherms on p-h, comma-separated, one unit at the end for all (e.g. \"-20,0,20,40 degC\"); default: round values over the chart's temperatures",
    };

    /// <summary>--isobars (t-s).</summary>
    public Option<string> Isobars { get; } = new("--isobars")
    {
        Description = "Pressures of the isobars on t-s, comma-separated, one unit at the end for all (e.g. \"1,2,5,10 bar\"); default: round values (1, 2, 5 x 10^k) up to 2 Pc",
    };

    /// <summary>--isochores (p-h, t-s).</summary>
    public Option<string> Isochores { get; } = new("--isochores")
    {
        Description = "Draw isochores on p-h or t-s: 'auto' (round densities from the saturated vapour at the lowest temperature to the critical density) or a list such as \"5,20,100 kg/m3\"",
    };

    /// <summary>--t-range (p-h, t-s).</summary>
    public Option<string> TemperatureRange { get; } = new("--t-range")
    {
        Description = "Temperatures the chart spans, 'LOW,HIGH UNIT' (e.g. \"-40,120 degC\"): the dome starts at LOW; p-h draws isotherms up to HIGH, t-s's temperature axis ends there; phase: the temperature axis (containing the triple point)",
    };

    /// <summary>--p-range (p-h).</summary>
    public Option<string> PressureRange { get; } = new("--p-range") { Description = "Pressure axis of p-h or phase (containing the triple point), 'LOW,HIGH UNIT' (e.g. \"0.5,50 bar\")" };

    /// <summary>--h-range (p-h).</summary>
    public Option<string> EnthalpyRange { get; } = new("--h-range") { Description = "Enthalpy axis of p-h on the chosen --reference, 'LOW,HIGH UNIT' (e.g. \"100,480 kJ/kg\"; bare numbers J/mol)" };

    /// <summary>--s-range (t-s).</summary>
    public Option<string> EntropyRange { get; } = new("--s-range") { Description = "Entropy axis of t-s on the chosen --reference, 'LOW,HIGH UNIT' (e.g. \"0.8,2.0 kJ/(kg K)\"; bare numbers J/(mol K))" };

    /// <summary>--cycle (p-h).</summary>
    public Option<string> Cycle { get; } = new(CycleOption.Name)
    {
        Description = "Draw a simple vapour-compression cycle on p-h with its COP: \"evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=0.75\" "
            + "(evaporating and condensing saturation temperatures required; superheat and subcooling in K, default 0; compressor isentropic efficiency, default 1)",
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
        command.Options.Add(Reference);
        command.Options.Add(Isotherms);
        command.Options.Add(Isobars);
        command.Options.Add(Isochores);
        command.Options.Add(TemperatureRange);
        command.Options.Add(PressureRange);
        command.Options.Add(EnthalpyRange);
        command.Options.Add(EntropyRange);
        command.Options.Add(Cycle);
        Binary.AddTo(command);
    }

    /// <summary>--temperature, --pressure, --points, --kij (the binary diagrams only).</summary>
    public BinaryPlotOptions Binary { get; } = new();

    /// <summary>The option a field of a refusal by <see cref="Diagram"/> comes from, or null.</summary>
    public static string? OptionOf(string field) => FieldOptions.GetValueOrDefault(field);

    /// <summary>The option each field of <see cref="Diagram.Check"/>'s property-chart checks comes from.</summary>
    private static readonly Dictionary<string, string> FieldOptions = new(StringComparer.Ordinal)
    {
        ["reference"] = "--reference",
        ["isotherms"] = "--isotherms",
        ["isobars"] = "--isobars",
        ["isochores"] = "--isochores",
        ["temperature range"] = "--t-range",
        ["pressure range"] = "--p-range",
        ["enthalpy range"] = "--h-range",
        ["entropy range"] = "--s-range",
        ["cycle"] = CycleOption.Name,
    };

    /// <summary>The identifier of the envelope diagram, drawn for a MIXTURE instead of fluids.</summary>
    public const string EnvelopeId = "envelope";

    /// <summary>Whether --diagram names the envelope diagram.</summary>
    public static bool IsEnvelope(string? kind) => string.Equals(kind?.Trim(), EnvelopeId, StringComparison.OrdinalIgnoreCase);

    /// <summary>For <c>--diagram envelope</c>: the FLUID argument is a MIXTURE (NAME=FRACTION,… in
    /// mole fractions, or a mixture file); --out, --width, --height, --log, --units, --eos, --alpha
    /// and --volume-shift apply, the other options are refused. Traces the envelope and draws it.</summary>
    public EnvelopePlotRequest BindEnvelope(ParseResult parse)
    {
        var (path, figureFormat, w, h) = Figure(parse);
        var axisUnits = AxisUnits(parse);
        foreach (var option in new Option[] { Data, Reduced, TemperatureUnit, PressureUnit, Reference, Isotherms, Isobars, Isochores, TemperatureRange, PressureRange, EnthalpyRange, EntropyRange, Cycle, Binary.Temperature, Binary.Pressure, Binary.Points, Binary.Kij })
        {
            if (CommonOptions.Given(parse, option))
            {
                throw new UsageException($"{option.Name}: the envelope diagram does not take it (it draws the bubble and dew lines of a MIXTURE; --log and --units apply)");
            }
        }

        var modelChoice = Common.BindModel(parse);
        if (!modelChoice.ShiftSuitsMixture)
        {
            throw new UsageException($"--volume-shift: a mixture takes fluid, none or peneloux (each component's own), not one volume '{modelChoice.VolumeShiftText}' for every component");
        }

        var resolved = MixtureResolver.Resolve(parse.GetValue(Fluids) ?? "", false, []);
        var input = new MixtureInput(resolved.Mixture, resolved.Name, resolved.Origin, modelChoice, resolved.Remarks);
        if (input.Mixture.Count < 2)
        {
            throw new UsageException($"MIXTURE: a phase envelope needs at least two components, got only '{input.Mixture.Components[0].Name}' (a pure fluid's saturation line is the p-t diagram)");
        }

        var model = input.CreateModel();
        var envelope = new Core.Mixtures.EnvelopeTracer(model).Trace(input.Mixture.MoleFractions);
        string name = input.Name ?? string.Join(", ", input.Mixture.Components.Select((c, i) => $"{c.Name} {Output.NumberText.Table(input.Mixture.MoleFractions[i])}"));
        var diagram = EnvelopeDiagram.Build(envelope, name, Core.Models.ModelRegistry.Title(modelChoice.Kind), new DiagramOptions { Units = axisUnits, Logarithmic = parse.GetValue(Log) });
        return new EnvelopePlotRequest(diagram, path, figureFormat, w, h);
    }

    private (string Path, FigureFormat Format, int Width, int Height) Figure(ParseResult parse)
    {
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

        return (path, figureFormat, w, h);
    }

    private PlotUnits AxisUnits(ParseResult parse)
    {
        string unitsText = parse.GetValue(Units) ?? "si";
        return unitsText.ToLowerInvariant() switch
        {
            "si" => PlotUnits.Si,
            "engineering" => PlotUnits.Engineering,
            _ => throw new UsageException($"--units: unknown unit system '{unitsText}' (use si or engineering)"),
        };
    }

    /// <summary>Parses and checks every option, resolves the fluids, checks that the diagram can
    /// be drawn for them, then reads the data file.</summary>
    public PlotRequest Bind(ParseResult parse)
    {
        // Everything that is a usage error is checked before any fluid is read or computed.
        string kindText = parse.GetValue(Kind)!;
        if (!DiagramKinds.TryParse(kindText, out var kind))
        {
            throw new UsageException($"--diagram: unknown diagram '{kindText}' (use {string.Join(", ", DiagramKinds.Ids)} or {EnvelopeId})");
        }

        var (path, figureFormat, w, h) = Figure(parse);
        var axisUnits = AxisUnits(parse);

        if (kind.IsBinary())
        {
            var binary = Binary.Bind(parse, kind, parse.GetValue(Fluids)!, Common,
                [Data, Reduced, Log, TemperatureUnit, PressureUnit, Common.VolumeShift, Reference, Isotherms, Isobars, Isochores, TemperatureRange, PressureRange, EnthalpyRange, EntropyRange, Cycle]);
            return new PlotRequest(kind, path, figureFormat, w, h, [], new DiagramOptions { Units = axisUnits }, binary);
        }

        Binary.RefuseFor(kind, parse);
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

        if (CommonOptions.Given(parse, Reference) && kind is not (DiagramKind.PressureEnthalpy or DiagramKind.TemperatureEntropy))
        {
            throw new UsageException($"--reference: the {kind.Id()} diagram draws no enthalpy or entropy (p-h and t-s do)");
        }

        var reference = ReferenceOption.Parse(parse.GetValue(Reference) ?? ReferenceState.IdealGas.Id);
        var lines = Lines.Bind(this, parse);
        var probe = new DiagramOptions
        {
            Reduced = parse.GetValue(Reduced),
            Logarithmic = parse.GetValue(Log),
            Units = axisUnits,
            Data = dataPath is null ? null : [],
            Reference = reference,
            Isotherms = lines.Isotherms,
            Isobars = lines.Isobars,
            TemperatureRange = lines.Temperatures,
            PressureRange = lines.Pressures,
            Cycle = lines.Cycle,
            // Densities, enthalpies and entropies may be per mass: set once the fluid is known.
            Isochores = lines.Isochores is null ? null : [],
            EnthalpyRange = lines.Enthalpies is null ? null : new ValueRange(0, 1),
            EntropyRange = lines.Entropies is null ? null : new ValueRange(0, 1),
        };
        var fluids = names.Select(FluidResolver.Resolve).Select(f => new PlotFluid(f, Common.Model(parse, f)) { Alpha = Common.BindModel(parse).Alpha }).ToList();
        try
        {
            probe = lines.WithFluid(probe, fluids[0].Fluid);
            Diagram.Check(kind, fluids, probe);
        }
        catch (InvalidInputException ex)
        {
            throw new UsageException(FieldOptions.TryGetValue(ex.Field, out string? option) ? $"{option}: {ex.Message}" : ex.Message);
        }

        var diagramOptions = probe with
        {
            Data = dataPath is null ? null : CorrelationOptions.ReadDataFile(dataPath, parse.GetValue(TemperatureUnit), parse.GetValue(PressureUnit)),
            DataLabel = dataPath is null ? "data" : Path.GetFileName(dataPath),
        };
        return new PlotRequest(kind, path, figureFormat, w, h, fluids, diagramOptions);
    }
}

/// <summary>The line and range options of the p-h and t-s charts, parsed before any fluid is
/// read; the per-mass ones are converted with the fluid's molar mass in <see cref="WithFluid"/>.</summary>
internal sealed record Lines(IReadOnlyList<double>? Isotherms, IReadOnlyList<double>? Isobars, IReadOnlyList<ParsedQuantity>? Isochores,
    ValueRange? Temperatures, ValueRange? Pressures, (ParsedQuantity Low, ParsedQuantity High)? Enthalpies, (ParsedQuantity Low, ParsedQuantity High)? Entropies,
    Core.Cycles.VapourCompressionSpecification? Cycle)
{
    /// <summary>Parses the options (syntax, units and order; the fluid-dependent checks are
    /// <see cref="Diagram.Check"/>'s).</summary>
    public static Lines Bind(PlotOptions options, ParseResult parse)
    {
        IReadOnlyList<double>? List(Option<string> option, Func<string, string, double> read)
            => parse.GetValue(option) is string text ? [.. QuantityList.Items(text, option.Name, Diagram.MaximumLines).Select(i => read(i, option.Name))] : null;
        ValueRange? Range(Option<string> option, Func<string, string, double> read)
            => parse.GetValue(option) is string text ? QuantityList.Range(text, option.Name, read) is var (low, high) ? new ValueRange(low, high) : null : null;
        (ParsedQuantity, ParsedQuantity)? Caloric(Option<string> option, string quantity, Dimension molar, Dimension perMass)
        {
            if (parse.GetValue(option) is not string text)
            {
                return null;
            }

            var items = QuantityList.Items(text, option.Name, 3);
            if (items.Count != 2)
            {
                throw new UsageException($"{option.Name}: give the low and the high end separated by a comma, such as '100,480 kJ/kg', got '{Input.DataFileException.OneLine(text)}'");
            }

            var low = QuantityList.Parse(items[0], option.Name, quantity, molar, perMass);
            var high = QuantityList.Parse(items[1], option.Name, quantity, molar, perMass);
            if (low.Unit.Dimension != high.Unit.Dimension || !(low.Value < high.Value))
            {
                throw new UsageException($"{option.Name}: the low end '{items[0]}' must be below the high end '{items[1]}', both molar or both per mass");
            }

            return (low, high);
        }

        IReadOnlyList<ParsedQuantity>? isochores = null;
        if (parse.GetValue(options.Isochores) is string rho)
        {
            isochores = string.Equals(rho.Trim(), "auto", StringComparison.OrdinalIgnoreCase) ? []
                : [.. QuantityList.Items(rho, options.Isochores.Name, Diagram.MaximumLines)
                    .Select(i => QuantityList.Parse(i, options.Isochores.Name, "density", Dimension.AmountDensity, Dimension.MassDensity))];
        }

        return new Lines(
            List(options.Isotherms, QuantityParser.ParseTemperature),
            List(options.Isobars, QuantityParser.ParsePressure),
            isochores,
            Range(options.TemperatureRange, QuantityParser.ParseTemperature),
            Range(options.PressureRange, QuantityParser.ParsePressure),
            Caloric(options.EnthalpyRange, "enthalpy", Dimension.MolarEnergy, Dimension.SpecificEnergy),
            Caloric(options.EntropyRange, "entropy", Dimension.MolarEntropy, Dimension.SpecificEntropy),
            parse.GetValue(options.Cycle) is string cycle ? CycleOption.Parse(cycle) : null);
    }

    /// <summary>The options with the densities, enthalpies and entropies in molar SI units.</summary>
    /// <exception cref="FluidDataException">A per-mass value and a fluid without molar mass.</exception>
    public DiagramOptions WithFluid(DiagramOptions options, Core.Fluids.Fluid fluid)
    {
        double MolarMass() => fluid.RequireMolarMass("a per-mass value on a plot option");
        static ValueRange? Molar((ParsedQuantity Low, ParsedQuantity High)? range, Dimension perMass, Func<double> mass)
            => range is { } r ? new ValueRange(QuantityList.Molar(r.Low, perMass, mass), QuantityList.Molar(r.High, perMass, mass)) : null;
        return options with
        {
            Isochores = Isochores is null ? null
                : [.. Isochores.Select(q => q.Unit.Dimension == Dimension.MassDensity ? q.Value / MolarMass() : q.Value)],
            EnthalpyRange = Molar(Enthalpies, Dimension.SpecificEnergy, MolarMass),
            EntropyRange = Molar(Entropies, Dimension.SpecificEntropy, MolarMass),
        };
    }
}
