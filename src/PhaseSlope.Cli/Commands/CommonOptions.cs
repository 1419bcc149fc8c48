using System.CommandLine;
using PhaseSlope.Cli.Output;
using PhaseSlope.Cli.Units;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary>Options shared by several commands, and their checked values.</summary>
internal sealed class CommonOptions
{
    /// <summary>--eos: the cubic model.</summary>
    public Option<string> Eos { get; } = new("--eos")
    {
        Description = $"Cubic model: {string.Join(", ", CubicModelKinds.Ids)}",
        DefaultValueFactory = _ => "pr",
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
        => new("FLUID") { Description = "Catalog name or synonym, or the path of a .fluid file" };

    /// <summary>Adds the options to a command; <paramref name="withEos"/> adds --eos too.</summary>
    public void AddTo(Command command, bool withEos)
    {
        if (withEos)
        {
            command.Options.Add(Eos);
        }

        command.Options.Add(Format);
        command.Options.Add(Units);
    }

    /// <summary>The chosen model.</summary>
    public CubicModelKind ModelKind(ParseResult parse)
    {
        string id = parse.GetValue(Eos) ?? "pr";
        return CubicModelKinds.TryParse(id, out var kind)
            ? kind
            : throw new UsageException($"--eos: unknown model '{id}' (use {string.Join(", ", CubicModelKinds.Ids)})");
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
