using System.CommandLine;
using System.Text;
using System.Text.Json;
using PhaseSlope.Cli.Output;
using PhaseSlope.Core.Fluids;

namespace PhaseSlope.Cli.Commands;

/// <summary><c>phaseslope fluids check FILE</c>: validate a fluid file and check its data against a
/// model, without using it for anything else.</summary>
internal static class FluidsCheckCommand
{
    /// <summary>Builds the command; its action writes to <paramref name="io"/>.</summary>
    public static Command Create(CliIo io)
    {
        var options = new FluidsCheckOptions();
        var command = new Command("check", "Validate a fluid file (line, field and value checks) and test its data against a model");
        options.AddTo(command);
        command.SetAction(parse =>
        {
            FluidCheck? check = null;
            string path = options.PathOf(parse);
            int code = io.Guard(() =>
            {
                var request = options.Bind(parse);
                check = FluidCheck.Run(request.Fluid, request.Model.For(request.Fluid));
                options.Out.Emit(io, parse, request.Format == OutputFormat.Json ? Json(request.Path, check) : Table(request.Path, check), "the check report");
            });
            // The report is the result either way; an inconsistency found in it fails the run
            // (exit 8, as a failed audit check), named on one stderr line, so a script can gate on it.
            return code == ExitCodes.Success && check is not null && Inconsistency(check) is string problem
                ? io.Fail($"{path}: {problem}", ExitCodes.AuditFailed)
                : code;
        });
        return command;
    }

    /// <summary>The first failed check of the report, or null when every check passed.</summary>
    private static string? Inconsistency(FluidCheck check)
    {
        if (!check.SolvesToCriticalPoint)
        {
            return $"check failed: coexistence does not converge from the lowest valid temperature to Tc ({check.Failure})";
        }

        if (check.Fluid.NormalBoilingPoint is { } tb && check.PredictedBoilingPoint is double predicted && !check.BoilingPointConsistent)
        {
            return $"check failed: the model's normal boiling point {NumberText.Table(predicted)} K is {NumberText.Table(Math.Abs(check.BoilingPointDeviation!.Value) * 100)} % from the file's {NumberText.Table(tb.Value)} K (more than {NumberText.Table(FluidCheck.BoilingPointTolerance * 100)} %): check Tc, Pc, omega and Tb";
        }

        return null;
    }

    private static string Table(string path, FluidCheck check)
    {
        var fluid = check.Fluid;
        var table = new TextTable(["check", "result"], [false, false]);
        table.Add("file", $"valid: {fluid.Name}, schema {FluidFile.FormatTag} {FluidFile.FormatVersion}");
        table.Add("normal boiling point", BoilingPointText(check));
        table.Add("coexistence", check.SolvesToCriticalPoint
            ? $"converges from the lowest valid temperature to Tc (1 - 1e-8) with {check.Model.Describe(withAlpha: true)}"
            : $"FAILS: {check.Failure}");
        table.Add("ideal-gas heat capacity", fluid.IdealGasHeatCapacity is { } cp
            ? $"present, {NumberText.Table(cp.MinimumTemperature)}-{NumberText.Table(cp.MaximumTemperature)} K; cp0(298.15 K) = {NumberText.Table(cp.HeatCapacity(298.15))} J/(mol K)"
            : "absent: absolute h, s, u, cp, cv, the speed of sound and derivatives through cv or s are unavailable; coexistence, residual properties, density, alpha and kappaT work without it");
        if (fluid.MolarMass is null)
        {
            table.Add("molar mass", "absent: per-kilogram units, mass densities and the speed of sound are unavailable; molar results work without it");
        }

        var text = new StringBuilder();
        text.AppendLine(Input.DataFileException.OneLine(path)); // user text: control and bidi characters escaped
        text.AppendLine();
        text.Append(table.Render());
        return text.ToString();
    }

    private static string BoilingPointText(FluidCheck check)
    {
        if (check.Fluid.NormalBoilingPoint is not { } tb)
        {
            return "not given";
        }

        if (check.PredictedBoilingPoint is not double predicted)
        {
            return $"file {NumberText.Table(tb.Value)} K; the model has no saturation state at 101325 Pa in the valid range";
        }

        string verdict = check.BoilingPointConsistent
            ? "consistent"
            : $"WARNING: more than {NumberText.Table(FluidCheck.BoilingPointTolerance * 100)} % apart; check Tc, Pc, omega and Tb";
        return $"file {NumberText.Table(tb.Value)} K, model {NumberText.Table(predicted)} K ({NumberText.Table(check.BoilingPointDeviation!.Value * 100)} %): {verdict}";
    }

    private static string Json(string path, FluidCheck check)
    {
        return JsonText.Write(json =>
        {
            json.WriteStartObject();
            json.WriteString("file", path);
            json.WriteString("name", check.Fluid.Name);
            json.WriteBoolean("valid", true);
            ModelText.WriteJson(json, check.Model);
            if (check.Fluid.NormalBoilingPoint is { } tb)
            {
                json.WriteFinite("normal_boiling_point_K", tb.Value);
            }
            else
            {
                json.WriteNull("normal_boiling_point_K");
            }

            if (check.PredictedBoilingPoint is double p)
            {
                json.WriteFinite("predicted_normal_boiling_point_K", p);
                json.WriteFinite("boiling_point_deviation", check.BoilingPointDeviation!.Value);
            }
            else
            {
                json.WriteNull("predicted_normal_boiling_point_K");
                json.WriteNull("boiling_point_deviation");
            }

            json.WriteBoolean("boiling_point_consistent", check.BoilingPointConsistent);
            json.WriteBoolean("solves_to_critical_point", check.SolvesToCriticalPoint);
            json.WriteBoolean("has_ideal_gas_heat_capacity", check.Fluid.IdealGasHeatCapacity is not null);
            json.WriteEndObject();
        });
    }
}

/// <summary>The checked inputs of <c>fluids check</c>.</summary>
/// <param name="Path">The fluid file as given.</param>
/// <param name="Fluid">The fluid read from it (validated).</param>
/// <param name="Model">The model the data is checked against.</param>
/// <param name="Format">The report format (table or JSON; CSV gives the table).</param>
internal sealed record FluidsCheckRequest(string Path, Fluid Fluid, ModelChoice Model, OutputFormat Format);

/// <summary>The options of <c>fluids check</c>, bound to a <see cref="FluidsCheckRequest"/>.</summary>
internal sealed class FluidsCheckOptions
{
    /// <summary>FILE.</summary>
    public Argument<string> File { get; } = new("FILE") { Description = "Path of the .fluid file to check" };

    /// <summary>--eos, --alpha, --volume-shift, --format.</summary>
    public CommonOptions Common { get; } = new();

    /// <summary>--out.</summary>
    public OutputOption Out { get; } = new();

    /// <summary>Adds every option to the command.</summary>
    public void AddTo(Command command)
    {
        command.Arguments.Add(File);
        Common.AddTo(command, withEos: true, withUnits: false);
        Out.AddTo(command);
    }

    /// <summary>The FILE argument as given (named in the failure line even when binding fails).</summary>
    public string PathOf(ParseResult parse) => parse.GetValue(File)!;

    /// <summary>Parses the options, then reads and validates the file.</summary>
    public FluidsCheckRequest Bind(ParseResult parse)
    {
        var format = Common.OutputFormat(parse);
        var model = Common.BindModel(parse);
        string path = PathOf(parse);
        if (Core.Fluids.InlineFluid.IsInline(path))
        {
            throw new Units.UsageException("FILE: fluids check checks a fluid file; an inline definition has no file (its values are checked as it is read; use fluids show to see them)");
        }

        return new FluidsCheckRequest(path, FluidResolver.ReadFile(path), model, format);
    }
}
