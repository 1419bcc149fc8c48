using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary>Options shared by several commands, and their checked values.</summary>
internal sealed class CommonOptions
{
    /// <summary>--eos: the cubic model.</summary>
    public Option<string> Eos { get; } = new("--eos")
    {
        Description = $"Cubic model: {string.Join(", ", ModelRegistry.Ids)}",
        DefaultValueFactory = _ => "pr",
    };

    /// <summary>--alpha: the alpha function.</summary>
    public Option<string> Alpha { get; } = new("--alpha")
    {
        Description = "Alpha function: default (the model's own), twu (the fluid's Twu 1991 constants, else the generalised 1995 set for pr), "
            + "mathias-copeman (the fluid's constants); twu and mathias-copeman apply to pr, pr78 and srk",
        DefaultValueFactory = _ => "default",
    };

    /// <summary>--volume-shift: Peneloux volume translation.</summary>
    public Option<string> VolumeShift { get; } = new("--volume-shift")
    {
        Description = "Volume translation c (v = v_eos - c): fluid (default: the fluid file's own volume_shift_pr/srk, fitted to its liquid densities, else none), "
            + "none, peneloux (the published correlation for pr or srk), "
            + "or a value in m3/mol, cm3/mol or L/mol (bare number: m3/mol); it shifts densities and leaves Psat and latent heats unchanged",
        DefaultValueFactory = _ => "fluid",
    };

    /// <summary>--format: table, csv or json.</summary>
    public Option<string> Format { get; } = new("--format")
    {
        Description = "Output format: table, csv or json",
        DefaultValueFactory = _ => "table",
    };

    /// <summary>--units: si or engineering (tables only).</summary>
    public Option<string> Units { get; } = new("--units")
    {
        Description = "Table units: si (K, kPa, mol/m3, J/mol) or engineering (degC, bar, kg/m3, kJ/kg)",
        DefaultValueFactory = _ => "si",
    };

    /// <summary>The FLUID argument every fluid command takes.</summary>
    public static Argument<string> FluidArgument()
        => new("FLUID") { Description = "Catalog name or synonym, the path of a .fluid file, or inline critical constants, e.g. inline:tc=369.89K,pc=4.2512MPa,omega=0.152[,molar_mass=44.1g/mol][,name=...]" };

    /// <summary>The --units description of a command whose CSV is converted too (coexist, curve).</summary>
    public const string UnitsWithCsvDescription =
        "Units of the table and the CSV: si (K, kPa, mol/m3, J/mol; CSV: the SI keys) or engineering (degC, bar, kg/m3, kJ/kg; CSV headers name each unit); JSON is always SI";

    /// <summary>The --units description of the mixture commands whose tables and CSV carry
    /// per-kilogram values (bubble, dew, flash), each with its own phase's molar mass.</summary>
    public const string MixtureUnitsDescription =
        "Units of the table and the CSV: si (K, kPa, mol/m3, J/mol; CSV: the SI keys) or engineering (degC, bar, kg/m3, kJ/kg, kJ/(kg K), "
        + "each phase per kg of its own composition, the feed's totals per kg of feed; CSV headers name each unit"
        + GlideUnitsNote + "); JSON is always SI";

    /// <summary>The clause bubble and dew add to <see cref="MixtureUnitsDescription"/>; a flash has no glide.</summary>
    private const string GlideUnitsNote = "; the glide stays a difference in K";

    /// <summary>The --units description of flash: <see cref="MixtureUnitsDescription"/> without the glide.</summary>
    public static string FlashUnitsDescription => MixtureUnitsDescription.Replace(GlideUnitsNote, "", StringComparison.Ordinal);

    /// <summary>The --units description of envelope and binary (temperatures, pressures and slopes only).</summary>
    public const string TemperaturePressureUnitsDescription =
        "Units of the table and the CSV: si (K, kPa, kPa/K; CSV: the SI keys) or engineering (degC, bar, bar/K; CSV headers name each unit); mole fractions unchanged; JSON is always SI";

    /// <summary>Adds the options a command honours: <paramref name="withEos"/> adds --eos, --alpha
    /// and --volume-shift; <paramref name="withUnits"/> adds --units (only for commands whose
    /// tables have a display unit choice). --format is always added.</summary>
    public void AddTo(Command command, bool withEos, bool withUnits = true)
    {
        if (withEos)
        {
            command.Options.Add(Eos);
            command.Options.Add(Alpha);
            command.Options.Add(VolumeShift);
        }

        command.Options.Add(Format);
        if (withUnits)
        {
            command.Options.Add(Units);
        }
    }

    /// <summary>Whether <paramref name="option"/> was given on the command line (not defaulted).</summary>
    public static bool Given(ParseResult parse, Option option) => parse.GetResult(option) is { Implicit: false };

    /// <summary>Whether the command being run offers <paramref name="option"/>.</summary>
    public static bool Offered(ParseResult parse, Option option) => parse.CommandResult.Command.Options.Contains(option);

    /// <summary>Binds --eos, --alpha and --volume-shift to a typed choice, checking their spelling
    /// before any fluid is read.</summary>
    public ModelChoice BindModel(ParseResult parse)
    {
        var kind = ModelKind(parse);
        string alphaText = parse.GetValue(Alpha) ?? "default";
        var alpha = alphaText.Trim().ToLowerInvariant() switch
        {
            "default" => AlphaForm.Default,
            "twu" => AlphaForm.Twu,
            "mathias-copeman" => AlphaForm.MathiasCopeman,
            _ => throw new UsageException($"--alpha: unknown alpha function '{alphaText}' (use default, twu or mathias-copeman)"),
        };
        // Where --volume-shift is not offered (the shift cannot change the result) the fluid's own is kept.
        string shiftText = Offered(parse, VolumeShift) ? parse.GetValue(VolumeShift) ?? "fluid" : "fluid";
        _ = ParseShift(shiftText, kind, fluid: null);
        return new ModelChoice(kind, alpha, shiftText);
    }

    /// <summary>Binds --format and, when offered, --units. --units changes table units (and, where
    /// <paramref name="csvUnits"/>, CSV units); giving it with an output that is always SI (JSON,
    /// and CSV elsewhere) is refused rather than ignored.</summary>
    public OutputChoice BindOutput(ParseResult parse, OutputFormat format, bool csvUnits = false)
    {
        var units = Offered(parse, Units) ? UnitSystem(parse) : Cli.Units.UnitSystem.Si;
        bool honoured = format == Output.OutputFormat.Table || (csvUnits && format == Output.OutputFormat.Csv);
        if (!honoured && Offered(parse, Units) && Given(parse, Units))
        {
            throw new UsageException(csvUnits
                ? $"--units: applies to tables and CSV only; {format.ToString().ToLowerInvariant()} output is always in SI units"
                : $"--units: applies to tables only; {format.ToString().ToLowerInvariant()} output is always in SI units");
        }

        return new OutputChoice(format, units);
    }

    /// <summary>Binds --format and, when offered, --units (see <see cref="BindOutput(ParseResult, OutputFormat, bool)"/>).</summary>
    public OutputChoice BindOutput(ParseResult parse, bool csvUnits = false) => BindOutput(parse, OutputFormat(parse), csvUnits);

    /// <summary>The chosen model.</summary>
    public CubicModelKind ModelKind(ParseResult parse)
    {
        string id = parse.GetValue(Eos) ?? "pr";
        return ModelRegistry.TryParse(id, out var kind)
            ? kind
            : throw new UsageException($"--eos: unknown model '{id}' (use {string.Join(", ", ModelRegistry.Ids)})");
    }

    /// <summary>The chosen model with its alpha function and volume shift, for a fluid.</summary>
    public CubicModel Model(ParseResult parse, Fluid fluid) => BindModel(parse).For(fluid);

    /// <summary>The volume shift c in m³/mol named by <paramref name="text"/>; with no fluid,
    /// only the spelling is checked (peneloux then gives 0).</summary>
    internal static double ParseShift(string text, CubicModelKind kind, Fluid? fluid)
    {
        string t = text.Trim();
        if (string.Equals(t, "none", StringComparison.OrdinalIgnoreCase))
        {
            return 0;
        }

        if (string.Equals(t, "fluid", StringComparison.OrdinalIgnoreCase))
        {
            // Translations are fitted for Peng–Robinson and Soave–Redlich–Kwong; Peng–Robinson 1978
            // shares Peng–Robinson's (the same cubic form). Other models have none.
            if (fluid is null || !kind.Entry().AcceptsAlphaChoice)
            {
                return 0;
            }

            var own = kind.Entry().Form == CubicForm.PengRobinson ? CubicModelKind.PengRobinson : CubicModelKind.SoaveRedlichKwong;
            return fluid.VolumeShifts.FirstOrDefault(s => s.Model == own)?.Shift.Value ?? 0;
        }

        if (string.Equals(t, "peneloux", StringComparison.OrdinalIgnoreCase))
        {
            return fluid is null ? 0 : Core.Models.VolumeShift.Peneloux(kind, fluid.CriticalTemperature.Value, fluid.CriticalPressure.Value,
                Core.Models.VolumeShift.RackettCompressibility(fluid.AcentricFactor.Value));
        }

        return QuantityParser.ParseVolumeShift(t, "--volume-shift");
    }

    /// <summary>The chosen output format.</summary>
    public OutputFormat OutputFormat(ParseResult parse) => ParseFormat(parse.GetValue(Format) ?? "table");

    /// <summary>Whether --format was given explicitly.</summary>
    public bool FormatGiven(ParseResult parse) => parse.GetResult(Format) is { Implicit: false };

    /// <summary>Parses a format name.</summary>
    public static OutputFormat ParseFormat(string text) => text.ToLowerInvariant() switch
    {
        "table" => Output.OutputFormat.Table,
        "csv" => Output.OutputFormat.Csv,
        "json" => Output.OutputFormat.Json,
        _ => throw new UsageException($"--format: unknown format '{text}' (use table, csv or json)"),
    };

    /// <summary>The chosen table unit system.</summary>
    public UnitSystem UnitSystem(ParseResult parse)
    {
        string text = parse.GetValue(Units) ?? "si";
        return text.ToLowerInvariant() switch
        {
            "si" => Cli.Units.UnitSystem.Si,
            "engineering" => Cli.Units.UnitSystem.Engineering,
            _ => throw new UsageException($"--units: unknown unit system '{text}' (use si or engineering)"),
        };
    }
}
