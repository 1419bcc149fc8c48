using System.CommandLine;
using System.CommandLine.Help;
using System.Globalization;
using System.Text;
using System.Text.Json;
using static PhaseSlope.Cli.Tests.CliHarness;

namespace PhaseSlope.Cli.Tests.Commands;

/// <summary>Every option a command offers is honoured: giving it changes what the command
/// produces (standard output, standard error, exit code or the files it writes), or it is
/// refused with the usage exit code (or the documented code for a missing model parameter).
/// The rows are checked against the command tree, so an option added without a row fails.</summary>
public sealed class OfferedOptionTests : IDisposable
{
    private static readonly string Csv = FitData.ExampleCsv;
    private static readonly string FluidFile = FitData.ExampleFluid;
    private const string LangeWater = "8.07131,1730.63,233.426";
    private const string BridgemanWater = "5.40221,1838.675,-31.737";

    // A data file whose headers give no units, so --temperature-unit and --pressure-unit apply
    // (values on ln P = A − 3000 K/T with P in kPa: rising, smooth, any unit choice gives a valid fit).
    private const string BareData = "T,P\n300,10\n310,13.81\n320,18.68\n330,24.82\n340,32.42\n";

    private readonly TempFolder _data = new();

    /// <summary>Which commands and options the rows cover, and how the option shows.</summary>
    /// <param name="Command">Command path, e.g. "fluids check".</param>
    /// <param name="Option">The option's name.</param>
    /// <param name="Baseline">A command line without the option (or with another value).</param>
    /// <param name="Variant">The same with the option (or its other value).</param>
    /// <param name="RefusedWith">Null when the variant must change the output; else its exit code.</param>
    public sealed record Row(string Command, string Option, string[] Baseline, string[] Variant, int? RefusedWith)
    {
        public override string ToString() => $"{Command} {Option}: {string.Join(' ', Variant)}";
    }

    /// <summary>--uncertainty adds uncertainties; --samples and --seed change the Monte Carlo
    /// numbers and are refused without monte-carlo.</summary>
    private static IEnumerable<Row> UncertaintyRows(string command, string[] baseline, bool linearByDefault = false)
    {
        string[] mc = [.. baseline, "--uncertainty", "monte-carlo", "--samples", "50"];
        if (!linearByDefault)
        {
            yield return Changes(command, "--uncertainty", baseline, "--uncertainty", "linear");
        }

        yield return Differs(command, "--uncertainty", [.. baseline, "--uncertainty", "linear"], [.. baseline, "--uncertainty", "monte-carlo", "--samples", "50"]);
        yield return Differs(command, "--samples", mc, [.. baseline, "--uncertainty", "monte-carlo", "--samples", "60"]);
        yield return Refused(command, "--samples", [.. baseline, "--samples", "60"]);
        yield return Changes(command, "--seed", mc, "--seed", "2");
        yield return Refused(command, "--seed", [.. baseline, "--uncertainty", "linear", "--seed", "2"]);
    }

    private static Row Changes(string command, string option, string[] baseline, params string[] extra)
        => new(command, option, baseline, [.. baseline, .. extra], null);

    private static Row Differs(string command, string option, string[] baseline, string[] variant)
        => new(command, option, baseline, variant, null);

    private static Row Refused(string command, string option, string[] variant, int code = ExitCodes.Usage)
        => new(command, option, [], variant, code);

    private static IEnumerable<Row> AllRows()
    {
        string[] coexist = ["coexist", "propane", "-T", "300"];
        yield return Differs("coexist", "--temperature", coexist, ["coexist", "propane", "-T", "310"]);
        yield return Differs("coexist", "--pressure", coexist, ["coexist", "propane", "-P", "1MPa"]);
        yield return Refused("coexist", "--pressure", [.. coexist, "-P", "1MPa"]);
        foreach (var row in ModelAndOutputRows("coexist", coexist, units: true))
        {
            yield return row;
        }

        yield return Changes("coexist", "--units", [.. coexist, "--format", "csv"], "--units", "engineering");
        yield return Changes("coexist", "--reference", coexist, "--reference", "nbp");
        yield return Changes("coexist", "--diagnostics", coexist, "--diagnostics");
        foreach (var row in UncertaintyRows("coexist", coexist))
        {
            yield return row;
        }

        foreach (var row in OutRows())
        {
            yield return row;
        }

        string[] curve = ["curve", "propane", "--points", "5"];
        yield return Changes("curve", "--from", curve, "--from", "250");
        yield return Changes("curve", "--to", curve, "--to", "350");
        yield return Differs("curve", "--points", curve, ["curve", "propane", "--points", "6"]);
        yield return Changes("curve", "--out", curve, "--out", "{dir}/out.csv");
        // --units converts CSV too (headers carry the unit); JSON stays SI and refuses it (ModelAndOutputRows).
        yield return Changes("curve", "--units", [.. curve, "--out", "{dir}/out.csv"], "--units", "engineering");
        string[] range = ["curve", "propane", "--from", "250", "--to", "300"];
        yield return Changes("curve", "--step", range, "--step", "10");
        yield return Refused("curve", "--step", [.. curve, "--step", "10"]);
        yield return Refused("curve", "--step", [.. range, "--step", "0"]);
        yield return Differs("curve", "--temperatures", curve, ["curve", "propane", "--temperatures", "250,300"]);
        yield return Refused("curve", "--temperatures", [.. range, "--temperatures", "250,300"]);
        yield return Refused("curve", "--temperatures", ["curve", "propane", "--temperatures", "300,250"]);
        yield return Differs("curve", "--pressures", curve, ["curve", "propane", "--pressures", "1,2 bar"]);
        yield return Refused("curve", "--pressures", ["curve", "propane", "--temperatures", "250,300", "--pressures", "1,2 bar"]);
        // --line: the solid lines of water (IAPWS 2011 ice Ih equations in its catalog file).
        string[] waterCurve = ["curve", "water", "--points", "5"];
        yield return Changes("curve", "--line", waterCurve, "--line", "sublimation");
        yield return Differs("curve", "--line", [.. waterCurve, "--line", "sublimation"], [.. waterCurve, "--line", "melting"]);
        yield return Refused("curve", "--line", [.. waterCurve, "--line", "sublimation", "--pressures", "1,2 bar"]);
        yield return Refused("curve", "--line", [.. waterCurve, "--line", "melting", "--uncertainty", "linear"]);
        yield return Refused("curve", "--line", [.. waterCurve, "--line", "solid"]);
        yield return Changes("curve", "--from", [.. waterCurve, "--line", "melting"], "--from", "260");
        yield return Changes("curve", "--units", [.. waterCurve, "--line", "melting"], "--units", "engineering");
        yield return Changes("curve", "--step", ["curve", "water", "--line", "sublimation"], "--step", "20");
        yield return Changes("curve", "--reference", curve, "--reference", "nbp");
        yield return Changes("curve", "--diagnostics", curve, "--diagnostics");
        foreach (var row in UncertaintyRows("curve", curve))
        {
            yield return row;
        }
        foreach (var row in ModelAndOutputRows("curve", curve, units: true))
        {
            yield return row;
        }

        string[] state = ["state", "propane", "-T", "300", "-P", "1MPa"];
        foreach (var row in StateRows("state", state))
        {
            yield return row;
        }

        foreach (var row in ModelAndOutputRows("state", state, units: true))
        {
            yield return row;
        }

        foreach (var row in UncertaintyRows("state", state))
        {
            yield return row;
        }

        string[] cycle = ["cycle", "r-134a", "evaporating=-10 degC,condensing=40 degC"];
        yield return Changes("cycle", "--reference", cycle, "--reference", "refrigeration");
        yield return Changes("cycle", "--out", cycle, "--out", "{dir}/cycle.txt");
        foreach (var row in ModelAndOutputRows("cycle", cycle, units: true))
        {
            yield return row;
        }

        yield return Differs("state", "--batch", ["state", "propane", "--batch", "{states1}"], ["state", "propane", "--batch", "{states2}"]);
        yield return Refused("state", "--batch", ["state", "propane", "--batch", "{states1}", "-T", "300"]);

        string[] derive = ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1MPa"];
        yield return Differs("derive", "--of", derive, ["derive", "propane", "--of", "H", "--by", "V", "--hold", "T", "-T", "300", "-P", "1MPa"]);
        yield return Differs("derive", "--by", derive, ["derive", "propane", "--of", "U", "--by", "P", "--hold", "T", "-T", "300", "-P", "1MPa"]);
        yield return Differs("derive", "--hold", derive, ["derive", "propane", "--of", "U", "--by", "V", "--hold", "S", "-T", "300", "-P", "1MPa"]);
        yield return Refused("derive", "--hold", ["derive", "propane", "--of", "U", "--by", "V", "--hold", "V", "-T", "300", "-P", "1MPa"]);
        yield return Changes("derive", "--explain", derive, "--explain");
        // --from-measured: the user's values instead of a model (no FLUID); their T, P, v, s, M.
        string[] measured = ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9,cp=100", "--of", "T", "--by", "P", "--hold", "H", "-T", "300", "-P", "1MPa", "--molar-volume", "1e-4"];
        yield return Differs("derive", "--from-measured", measured, Replace(measured, "alpha=1e-3,kappa_t=1e-9,cp=100", "alpha=2e-3,kappa_t=1e-9,cp=100"));
        yield return Refused("derive", "--from-measured", [.. derive, "--from-measured", "alpha=1e-3"]);
        yield return Differs("derive", "--molar-volume", measured, Replace(measured, "1e-4", "2e-4"));
        yield return Refused("derive", "--molar-volume", [.. derive, "--molar-volume", "1e-4"]);
        string[] sound = ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9,cp=100", "--of", "w", "-T", "300", "--molar-volume", "1e-4", "--molar-mass", "50 g/mol"];
        yield return Differs("derive", "--molar-mass", sound, Replace(sound, "50 g/mol", "60 g/mol"));
        yield return Refused("derive", "--molar-mass", [.. derive, "--molar-mass", "44 g/mol"]);
        string[] gibbsMeasured = ["derive", "--from-measured", "alpha=1e-3", "--of", "G", "--by", "T", "--hold", "P", "--entropy", "100"];
        yield return Differs("derive", "--entropy", gibbsMeasured, Replace(gibbsMeasured, "100", "200"));
        yield return Refused("derive", "--entropy", Replace(Replace(gibbsMeasured, "--entropy", "--density"), "100", "5"));
        string[] gibbs = ["derive", "propane", "--of", "G", "--by", "T", "--hold", "P", "-T", "300", "-P", "1MPa"];
        yield return Changes("derive", "--reference", gibbs, "--reference", "nbp");
        foreach (var row in StateRows("derive", derive).Where(r => r.Option != "--reference"))
        {
            yield return row;
        }

        foreach (var row in ModelAndOutputRows("derive", derive, units: false))
        {
            yield return row;
        }

        string[] fit = ["fit", Csv, "--form", "antoine"];
        string[] fitAuto = ["fit", Csv];
        string[] fitBare = ["fit", "{bare}", "--form", "clausius-clapeyron", "--temperature-unit", "K", "--pressure-unit", "kPa"];
        yield return Differs("fit", "--form", fit, ["fit", Csv, "--form", "kirchhoff"]);
        yield return Changes("fit", "--fluid", fitAuto, "--fluid", FluidFile);
        yield return Refused("fit", "--fluid", [.. fit, "--fluid", FluidFile]);
        yield return Changes("fit", "--tc", fitAuto, "--tc", "540", "--pc", "3.1MPa");
        yield return Refused("fit", "--tc", [.. fitAuto, "--tc", "540"]);
        yield return Refused("fit", "--tc", [.. fitAuto, "--fluid", FluidFile, "--tc", "540", "--pc", "3.1MPa"]);
        yield return Changes("fit", "--pc", fitAuto, "--pc", "3.1MPa", "--tc", "540");
        yield return Refused("fit", "--pc", [.. fitAuto, "--fluid", FluidFile, "--pc", "3.1MPa"]);
        yield return Differs("fit", "--temperature-unit", fitBare, [.. fitBare[..4], "--temperature-unit", "degC", "--pressure-unit", "kPa"]);
        yield return Differs("fit", "--pressure-unit", fitBare, [.. fitBare[..4], "--temperature-unit", "K", "--pressure-unit", "bar"]);
        yield return Changes("fit", "--format", fit, "--format", "json");
        // The printed convention: each part shows in the coefficients printed for it, and the
        // algebra's limits (no degC for Kirchhoff, e only for Wagner, no CSV) are refused.
        string[] fitPrinted = [.. fit, "--log-base", "10"];
        yield return Changes("fit", "--log-base", fit, "--log-base", "10");
        yield return Differs("fit", "--log-base", fitPrinted, Replace(fitPrinted, "10", "e"));
        yield return Refused("fit", "--log-base", [.. fitAuto, "--form", "wagner-3-6", "--tc", "540", "--pc", "3.1MPa", "--log-base", "10"]);
        yield return Refused("fit", "--log-base", [.. fitPrinted, "--format", "csv"]);
        yield return Changes("fit", "--correlation-pressure-unit", fit, "--correlation-pressure-unit", "mmHg");
        yield return Differs("fit", "--correlation-pressure-unit", [.. fitPrinted, "--correlation-pressure-unit", "bar"], [.. fitPrinted, "--correlation-pressure-unit", "atm"]);
        yield return Changes("fit", "--correlation-temperature-unit", fit, "--correlation-temperature-unit", "degF");
        yield return Differs("fit", "--correlation-temperature-unit", [.. fitPrinted, "--correlation-temperature-unit", "degC"], [.. fitPrinted, "--correlation-temperature-unit", "degR"]);
        yield return Refused("fit", "--correlation-temperature-unit", ["fit", Csv, "--form", "kirchhoff", "--correlation-temperature-unit", "degC"]);

        string[] latent = ["latent", Csv, "--form", "antoine"];
        string[] latentFluid = [.. latent, "--fluid", FluidFile];
        string[] latentBare = ["latent", "{bare}", "--form", "clausius-clapeyron", "--temperature-unit", "K", "--pressure-unit", "kPa"];
        yield return Differs("latent", "--form", latent, ["latent", Csv, "--form", "kirchhoff"]);
        yield return Changes("latent", "--fluid", latent, "--fluid", FluidFile);
        yield return Refused("latent", "--fluid", [.. latent, "--volume-model", "ideal-gas", "--fluid", FluidFile]);
        yield return Changes("latent", "--tc", latent, "--tc", "540", "--pc", "3.1MPa");
        yield return Refused("latent", "--tc", [.. latentFluid, "--tc", "540", "--pc", "3.1MPa"]);
        yield return Changes("latent", "--pc", latent, "--pc", "3.1MPa", "--tc", "540");
        yield return Refused("latent", "--pc", [.. latent, "--pc", "3.1MPa"]);
        yield return Differs("latent", "--temperature-unit", latentBare, [.. latentBare[..4], "--temperature-unit", "degC", "--pressure-unit", "kPa"]);
        yield return Differs("latent", "--pressure-unit", latentBare, [.. latentBare[..4], "--temperature-unit", "K", "--pressure-unit", "bar"]);
        yield return Changes("latent", "--volume-model", latentFluid, "--volume-model", "haggenmacher");
        yield return Changes("latent", "--temperature", latent, "--temperature", "350");
        yield return Refused("latent", "--temperature", [.. latent, "--temperature", "350", "--from", "320"]);
        yield return Changes("latent", "--from", latent, "--from", "320");
        yield return Changes("latent", "--to", latent, "--to", "400");
        yield return Changes("latent", "--points", latent, "--points", "5");
        yield return Refused("latent", "--points", [.. latent, "--temperature", "350", "--points", "5"]);
        foreach (var row in UncertaintyRows("latent", latentFluid, linearByDefault: true))
        {
            yield return row;
        }

        yield return Changes("latent", "--eos", latentFluid, "--eos", "srk");
        yield return Refused("latent", "--eos", [.. latent, "--eos", "srk"]);
        yield return Changes("latent", "--alpha", latentFluid, "--alpha", "twu");
        yield return Refused("latent", "--alpha", [.. latent, "--tc", "540", "--pc", "3.1MPa", "--alpha", "twu"]);
        yield return Changes("latent", "--format", latent, "--format", "json");

        string[] tune = ["tune", Csv, "--fluid", FluidFile, "--out", "{dir}/tuned.fluid"];
        string[] tuneBare = ["tune", Csv, "--tc", "540", "--pc", "3.1MPa", "--molar-mass", "100g/mol", "--name", "frc-x", "--out", "{dir}/tuned.fluid"];
        string[] tuneUnits = ["tune", "{bare}", "--tc", "700", "--pc", "4MPa", "--molar-mass", "100g/mol", "--name", "bare", "--out", "{dir}/tuned.fluid", "--temperature-unit", "K", "--pressure-unit", "kPa"];
        yield return Differs("tune", "--fluid", tuneBare, tune);
        yield return Refused("tune", "--fluid", [.. tune, "--tc", "540"]);
        yield return Differs("tune", "--tc", tuneBare, Replace(tuneBare, "540", "545"));
        yield return Differs("tune", "--pc", tuneBare, Replace(tuneBare, "3.1MPa", "3.2MPa"));
        yield return Changes("tune", "--omega", tuneBare, "--omega", "0.3");
        yield return Differs("tune", "--molar-mass", tuneBare, Replace(tuneBare, "100g/mol", "120g/mol"));
        yield return Changes("tune", "--name", tune, "--name", "frc-y");
        yield return Changes("tune", "--alpha", tune, "--alpha", "twu");
        yield return Changes("tune", "--eos", tune, "--eos", "srk");
        yield return Refused("tune", "--eos", [.. tune, "--eos", "vdw"]);
        yield return Differs("tune", "--temperature-unit", tuneUnits, Replace(tuneUnits, "K", "degF"));
        yield return Differs("tune", "--pressure-unit", tuneUnits, Replace(tuneUnits, "kPa", "mbar"));
        yield return Changes("tune", "--format", tune, "--format", "json");
        yield return Differs("tune", "--out", tune, Replace(tune, "{dir}/tuned.fluid", "{dir}/other.fluid"));

        string[] audit = ["audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--log-base", "10",
            "--correlation-pressure-unit", "mmHg", "--correlation-temperature-unit", "degC"];
        string[] auditFluid = [.. audit, "--fluid", "water"];
        string[] against = [.. audit, "--against", "antoine", "--coefficients2", BridgemanWater, "--log-base2", "10",
            "--correlation-pressure-unit2", "bar", "--correlation-temperature-unit2", "K"];
        yield return Differs("audit", "--form", audit, ["audit", "--form", "clausius-clapeyron", "--coefficients", "8.8,2000", "--range", "1,100", "--log-base", "10",
            "--correlation-pressure-unit", "mmHg", "--correlation-temperature-unit", "K"]);
        yield return Differs("audit", "--coefficients", audit, Replace(audit, LangeWater, "8.2,1730.63,233.426"));
        yield return Differs("audit", "--log-base", audit, Replace(audit, "10", "e"));
        yield return Differs("audit", "--correlation-pressure-unit", audit, Replace(audit, "mmHg", "kPa"));
        yield return Differs("audit", "--correlation-temperature-unit", audit, Replace(audit, "degC", "K"));
        yield return Differs("audit", "--correlation-temperature-unit", audit, Replace(audit, "degC", "degF"));
        yield return Refused("audit", "--correlation-temperature-unit", ["audit", "--form", "kirchhoff", "--coefficients", "60,-6000,-20", "--range", "250,350", "--correlation-temperature-unit", "degF"]);
        yield return Refused("audit", "--log-base", ["audit", "--form", "wagner-3-6", "--coefficients", "-7.6,1.6,-3,-3.4,540,31", "--range", "300,400", "--log-base", "10"]);
        yield return Differs("audit", "--range", audit, Replace(audit, "1,100", "10,90"));
        yield return Changes("audit", "--data", audit, "--data", Csv);
        yield return Changes("audit", "--fluid", audit, "--fluid", "water");
        yield return Changes("audit", "--eos", auditFluid, "--eos", "vdw");
        yield return Refused("audit", "--eos", [.. audit, "--eos", "srk"]);
        yield return Refused("audit", "--eos", [.. auditFluid, "--eos", "nonesuch"]);
        yield return Differs("audit", "--against", audit, against);
        yield return Refused("audit", "--coefficients2", [.. audit, "--coefficients2", BridgemanWater]);
        yield return Differs("audit", "--coefficients2", against, Replace(against, BridgemanWater, "5.3,1838.675,-31.737"));
        yield return Differs("audit", "--log-base2", against, Replace(against, "10", "e", skip: 1));
        yield return Differs("audit", "--correlation-pressure-unit2", against, Replace(against, "bar", "MPa"));
        yield return Differs("audit", "--correlation-temperature-unit2", against, Replace(against, "K", "degC"));
        yield return Changes("audit", "--threshold", against, "--threshold", "50");
        yield return Refused("audit", "--threshold", [.. audit, "--threshold", "5"]);
        yield return Changes("audit", "--format", audit, "--format", "json");

        string[] plot = ["plot", "propane", "--diagram", "p-t", "--out", "{dir}/out.svg"];
        string[] dome = ["plot", "propane", "--diagram", "t-rho", "--out", "{dir}/out.svg"];
        string[] plotBare = [.. plot, "--data", "{bare}", "--temperature-unit", "K", "--pressure-unit", "kPa"];
        yield return Differs("plot", "--diagram", plot, Replace(plot, "p-t", "slope"));
        // The whole phase diagram of water (its triple point and solid lines are in the catalog):
        // --t-range and --p-range set its window, --units and --alpha change its numbers, --log is refused.
        string[] phase = ["plot", "water", "--diagram", "phase", "--out", "{dir}/out.svg"];
        yield return Differs("plot", "--diagram", Replace(phase, "phase", "p-t"), phase);
        yield return Changes("plot", "--t-range", phase, "--t-range", "240,420 K");
        yield return Changes("plot", "--p-range", phase, "--p-range", "0.1,1000 kPa");
        yield return Changes("plot", "--units", phase, "--units", "engineering");
        yield return Changes("plot", "--alpha", phase, "--alpha", "mathias-copeman");
        yield return Refused("plot", "--log", [.. phase, "--log"]);
        yield return Refused("plot", "--t-range", [.. phase, "--t-range", "280,700 K"]);
        // The binary diagrams: benzene + cyclohexane, 5 compositions.
        string[] txy = ["plot", "benzene=0.5,cyclohexane=0.5", "--diagram", "t-xy", "--pressure", "1atm", "--points", "5", "--out", "{dir}/out.svg"];
        yield return Differs("plot", "--diagram", txy, Replace(txy, "t-xy", "x-y"));
        yield return Differs("plot", "--pressure", txy, Replace(txy, "1atm", "50kPa"));
        yield return Refused("plot", "--pressure", [.. plot, "--pressure", "1atm"]);
        yield return Differs("plot", "--temperature", Replace(txy, "t-xy", "x-y"), ["plot", "benzene=0.5,cyclohexane=0.5", "--diagram", "x-y", "--temperature", "340", "--points", "5", "--out", "{dir}/out.svg"]);
        yield return Refused("plot", "--temperature", [.. txy, "--temperature", "340"]);
        yield return Differs("plot", "--points", txy, Replace(txy, "5", "7"));
        yield return Refused("plot", "--points", [.. plot, "--points", "7"]);
        yield return Changes("plot", "--kij", txy, "--kij", "benzene,cyclohexane=0.02");
        yield return Refused("plot", "--kij", [.. plot, "--kij", "benzene,cyclohexane=0.02"]);
        yield return Refused("plot", "--reduced", [.. txy, "--reduced"]);
        yield return Differs("plot", "--out", plot, Replace(plot, "{dir}/out.svg", "{dir}/out.png"));
        yield return Changes("plot", "--width", plot, "--width", "800");
        yield return Changes("plot", "--height", plot, "--height", "600");
        yield return Changes("plot", "--data", plot, "--data", Csv);
        yield return Changes("plot", "--reduced", plot, "--reduced");
        yield return Changes("plot", "--log", plot, "--log");
        yield return Differs("plot", "--temperature-unit", plotBare, Replace(plotBare, "K", "degC"));
        yield return Refused("plot", "--temperature-unit", [.. plot, "--temperature-unit", "K"]);
        yield return Differs("plot", "--pressure-unit", plotBare, Replace(plotBare, "kPa", "bar"));
        yield return Refused("plot", "--pressure-unit", [.. plot, "--pressure-unit", "kPa"]);
        yield return Changes("plot", "--eos", plot, "--eos", "srk");
        yield return Changes("plot", "--alpha", plot, "--alpha", "twu");
        yield return Changes("plot", "--volume-shift", dome, "--volume-shift", "peneloux");
        yield return Changes("plot", "--units", plot, "--units", "engineering");
        // The p-h and t-s options (each changes the SVG; each refused where it would change nothing).
        string[] ph = ["plot", "r-134a", "--diagram", "p-h", "--out", "{dir}/out.svg"];
        string[] ts = ["plot", "r-134a", "--diagram", "t-s", "--out", "{dir}/out.svg"];
        yield return Changes("plot", "--reference", ph, "--reference", "refrigeration");
        yield return Changes("plot", "--reference", ts, "--reference", "minus40");
        yield return Refused("plot", "--reference", [.. plot, "--reference", "nbp"]);
        yield return Changes("plot", "--isotherms", ph, "--isotherms", "-20,0,20,40 degC");
        yield return Refused("plot", "--isotherms", [.. ts, "--isotherms", "-20,0,20 degC"]);
        yield return Changes("plot", "--isobars", ts, "--isobars", "1,2,5,10 bar");
        yield return Refused("plot", "--isobars", [.. ph, "--isobars", "1,2 bar"]);
        yield return Changes("plot", "--isochores", ph, "--isochores", "auto");
        yield return Changes("plot", "--isochores", ts, "--isochores", "5,20,100 kg/m3");
        yield return Refused("plot", "--isochores", [.. plot, "--isochores", "auto"]);
        yield return Changes("plot", "--t-range", ph, "--t-range", "-40,120 degC");
        yield return Changes("plot", "--t-range", ts, "--t-range", "-40,120 degC");
        yield return Refused("plot", "--t-range", [.. plot, "--t-range", "-40,120 degC"]);
        yield return Changes("plot", "--p-range", ph, "--p-range", "0.5,50 bar");
        yield return Refused("plot", "--p-range", [.. ts, "--p-range", "0.5,50 bar"]);
        yield return Changes("plot", "--h-range", ph, "--h-range", "100,480 kJ/kg");
        yield return Refused("plot", "--h-range", [.. ts, "--h-range", "100,480 kJ/kg"]);
        yield return Changes("plot", "--s-range", ts, "--s-range", "-1,1 kJ/(kg*K)");
        yield return Refused("plot", "--s-range", [.. ph, "--s-range", "-1,1 kJ/(kg*K)"]);
        yield return Changes("plot", "--cycle", ph, "--cycle", "evaporating=-10 degC,condensing=40 degC");
        yield return Differs("plot", "--cycle", [.. ph, "--cycle", "evaporating=-10 degC,condensing=40 degC"],
            [.. ph, "--cycle", "evaporating=-10 degC,condensing=40 degC,superheat=5 K,subcooling=3 K,efficiency=0.75"]);
        yield return Refused("plot", "--cycle", [.. ts, "--cycle", "evaporating=-10 degC,condensing=40 degC"]);

        string[] list = ["fluids", "list"];
        yield return Changes("fluids list", "--family", list, "--family", "alkane");
        yield return Changes("fluids list", "--name", list, "--name", "prop");
        yield return Changes("fluids list", "--format", list, "--format", "json");
        yield return Changes("fluids list", "--units", list, "--units", "engineering");
        yield return Refused("fluids list", "--units", [.. list, "--format", "csv", "--units", "si"]);

        string[] show = ["fluids", "show", "propane"];
        yield return Changes("fluids show", "--format", show, "--format", "json");
        yield return Changes("fluids show", "--units", show, "--units", "engineering");
        yield return Refused("fluids show", "--units", [.. show, "--format", "json", "--units", "engineering"]);

        string[] check = ["fluids", "check", FluidFile];
        yield return Changes("fluids check", "--eos", check, "--eos", "srk");
        yield return Changes("fluids check", "--alpha", check, "--alpha", "twu");
        yield return Refused("fluids check", "--alpha", [.. check, "--alpha", "mathias-copeman"], ExitCodes.OutOfRange);
        yield return Changes("fluids check", "--volume-shift", check, "--volume-shift", "peneloux");
        yield return Changes("fluids check", "--format", check, "--format", "json");

        string[] estimate = ["fluids", "estimate", "--name", "test-fluid", "--molar-mass", "100 g/mol", "--tc", "500", "--pc", "3MPa", "--tb", "350"];
        yield return Differs("fluids estimate", "--name", estimate, Replace(estimate, "test-fluid", "other-fluid"));
        yield return Changes("fluids estimate", "--formula", estimate, "--formula", "C7H16");
        yield return Changes("fluids estimate", "--cas", estimate, "--cas", "142-82-5");
        yield return Changes("fluids estimate", "--family", estimate, "--family", "alkane");
        yield return Changes("fluids estimate", "--synonyms", estimate, "--synonyms", "tf;test");
        yield return Differs("fluids estimate", "--molar-mass", estimate, Replace(estimate, "100 g/mol", "120 g/mol"));
        yield return Changes("fluids estimate", "--groups", estimate, "--groups", "CH3:2,CH2:5");
        yield return Differs("fluids estimate", "--tc", estimate, Replace(estimate, "500", "510"));
        yield return Differs("fluids estimate", "--pc", estimate, Replace(estimate, "3MPa", "3.2MPa"));
        yield return Differs("fluids estimate", "--tb", estimate, Replace(estimate, "350", "360"));
        yield return Changes("fluids estimate", "--omega", estimate, "--omega", "0.3");
        yield return Changes("fluids estimate", "--vapour-pressure", estimate, "--vapour-pressure", "400 K, 300 kPa");
        yield return Refused("fluids estimate", "--vapour-pressure", [.. estimate, "--omega", "0.3", "--vapour-pressure", "400 K, 300 kPa"]);
        yield return Changes("fluids estimate", "--omega-method", estimate, "--omega-method", "edmister");
        yield return Refused("fluids estimate", "--omega-method", [.. estimate, "--omega", "0.3", "--omega-method", "edmister"]);
        yield return Changes("fluids estimate", "--format", estimate, "--format", "table");
        yield return Changes("fluids estimate", "--format", estimate, "--format", "json");
        yield return Refused("fluids estimate", "--format", [.. estimate, "--format", "xml"]);
        yield return Changes("fluids estimate", "--out", estimate, "--out", "{dir}/out.fluid");

        // mixture: methane + CO2 has a published Peng-Robinson k_ij, so --eos srk changes it to an
        // assumed zero; --alpha and --volume-shift change each component's model constants.
        string[] mixture = ["mixture", "methane=0.8,carbon dioxide=0.2"];
        yield return Changes("mixture", "--mass-fractions", mixture, "--mass-fractions");
        yield return Refused("mixture", "--mass-fractions", ["mixture", "{dir}/blend.mixture", "--mass-fractions"]);
        yield return Changes("mixture", "--kij", mixture, "--kij", "methane,CO2=0.1");
        yield return Differs("mixture", "--kij", [.. mixture, "--kij", "methane,CO2=0.1"], [.. mixture, "--kij", "CO2,methane=0.12"]);
        yield return Refused("mixture", "--kij", [.. mixture, "--kij", "methane,propane=0.1"]);
        yield return Refused("mixture", "--kij", [.. mixture, "--kij", "methane=0.1"]);
        yield return Changes("mixture", "--eos", mixture, "--eos", "srk");
        yield return Refused("mixture", "--eos", [.. mixture, "--eos", "nonesuch"]);
        yield return Changes("mixture", "--alpha", mixture, "--alpha", "twu");
        yield return Changes("mixture", "--alpha", mixture, "--alpha", "mathias-copeman");
        yield return Changes("mixture", "--volume-shift", mixture, "--volume-shift", "peneloux");
        yield return Refused("mixture", "--volume-shift", [.. mixture, "--volume-shift", "1 cm3/mol"]);
        yield return Changes("mixture", "--format", mixture, "--format", "json");
        yield return Refused("mixture", "--format", [.. mixture, "--format", "csv"]);
        yield return Changes("mixture", "--out", mixture, "--out", "{dir}/out.txt");

        // binary: benzene + cyclohexane, a T-x-y diagram at 1 atm on 5 compositions (it has an
        // azeotrope with k_ij = 0); every option moves the bubble points or the output's form.
        string[] binary = ["binary", "benzene=0.5,cyclohexane=0.5", "-P", "1atm", "--points", "5"];
        yield return Differs("binary", "--temperature", binary, ["binary", "benzene=0.5,cyclohexane=0.5", "-T", "340", "--points", "5"]);
        yield return Differs("binary", "--pressure", binary, Replace(binary, "1atm", "50kPa"));
        yield return Refused("binary", "--pressure", [.. binary, "-T", "340"]);
        yield return Differs("binary", "--points", binary, Replace(binary, "5", "7"));
        yield return Refused("binary", "--points", Replace(binary, "5", "2"));
        yield return Changes("binary", "--kij", binary, "--kij", "benzene,cyclohexane=0.02");
        yield return Refused("binary", "--kij", [.. binary, "--kij", "benzene,propane=0.02"]);
        yield return Changes("binary", "--eos", binary, "--eos", "srk");
        yield return Refused("binary", "--eos", [.. binary, "--eos", "nonesuch"]);
        yield return Changes("binary", "--alpha", binary, "--alpha", "twu");
        yield return Changes("binary", "--format", binary, "--format", "json");
        yield return Changes("binary", "--format", binary, "--format", "csv");
        yield return Refused("binary", "--format", [.. binary, "--format", "xml"]);
        yield return Changes("binary", "--out", binary, "--out", "{dir}/out.txt");
        // --units converts table and CSV (T in degC, P in bar, slopes in bar/K); JSON stays SI and refuses it.
        yield return Changes("binary", "--units", binary, "--units", "engineering");
        yield return Changes("binary", "--units", [.. binary, "--format", "csv"], "--units", "engineering");
        yield return Refused("binary", "--units", [.. binary, "--format", "json", "--units", "engineering"]);

        // fit-kij: three ethanol-water points at 1 atm (Carey and Lewis 1932 via Perry's, from
        // memory) fitted and written to {dir}/fit.mixture.
        string[] fitKij = ["fit-kij", "{vle}", "--components", "ethanol,water", "--out", "{dir}/fit.mixture"];
        yield return Differs("fit-kij", "--components", fitKij, Replace(fitKij, "ethanol,water", "1-propanol,water"));
        yield return Refused("fit-kij", "--components", Replace(fitKij, "ethanol,water", "ethanol"));
        yield return Changes("fit-kij", "--eos", fitKij, "--eos", "srk");
        yield return Refused("fit-kij", "--eos", [.. fitKij, "--eos", "nonesuch"]);
        yield return Changes("fit-kij", "--alpha", fitKij, "--alpha", "twu");
        yield return Changes("fit-kij", "--format", fitKij, "--format", "json");
        yield return Refused("fit-kij", "--format", [.. fitKij, "--format", "csv"]);
        yield return Differs("fit-kij", "--out", fitKij, Replace(fitKij, "{dir}/fit.mixture", "{dir}/other.mixture"));

        // envelope: the same mixture options move the envelope; the Péneloux shift moves no
        // equilibrium temperature or pressure, only the critical density the JSON gives.
        string[] envelope = ["envelope", "methane=0.8,carbon dioxide=0.2"];
        string[] envelopeJson = [.. envelope, "--format", "json"];
        yield return Changes("envelope", "--mass-fractions", envelope, "--mass-fractions");
        yield return Changes("envelope", "--kij", envelope, "--kij", "methane,CO2=0.1");
        yield return Refused("envelope", "--kij", [.. envelope, "--kij", "methane,propane=0.1"]);
        yield return Changes("envelope", "--eos", envelope, "--eos", "srk");
        yield return Refused("envelope", "--eos", [.. envelope, "--eos", "nonesuch"]);
        yield return Changes("envelope", "--alpha", envelope, "--alpha", "twu");
        yield return Changes("envelope", "--volume-shift", envelopeJson, "--volume-shift", "peneloux");
        yield return Refused("envelope", "--volume-shift", [.. envelope, "--volume-shift", "1 cm3/mol"]);
        yield return Changes("envelope", "--min-pressure", envelope, "--min-pressure", "50 kPa");
        yield return Refused("envelope", "--min-pressure", [.. envelope, "--min-pressure", "5 K"]);
        yield return Changes("envelope", "--format", envelope, "--format", "json");
        yield return Changes("envelope", "--format", envelope, "--format", "csv");
        yield return Changes("envelope", "--out", envelope, "--out", "{dir}/out.txt");
        yield return Changes("envelope", "--units", envelope, "--units", "engineering");
        yield return Changes("envelope", "--units", [.. envelope, "--format", "csv"], "--units", "engineering");
        yield return Refused("envelope", "--units", [.. envelopeJson, "--units", "engineering"]);
        // bubble, dew and flash: methane + propane (no k_ij in the table, 0 assumed, so --kij
        // changes the numbers); --volume-shift changes the phase densities.
        foreach (string point in new[] { "bubble", "dew" })
        {
            string[] atT = [point, "methane=0.2,propane=0.8", "-T", "250"];
            yield return Differs(point, "--temperature", atT, [point, "methane=0.2,propane=0.8", "-T", "260"]);
            yield return Differs(point, "--pressure", atT, [point, "methane=0.2,propane=0.8", "-P", "1MPa"]);
            yield return Refused(point, "--pressure", [.. atT, "-P", "1MPa"]);
            yield return Refused(point, "--temperature", [point, "methane=0.2,propane=0.8"]);
            yield return Changes(point, "--mass-fractions", atT, "--mass-fractions");
            yield return Changes(point, "--kij", atT, "--kij", "methane,propane=0.05");
            yield return Changes(point, "--eos", atT, "--eos", "srk");
            yield return Changes(point, "--alpha", atT, "--alpha", "twu");
            yield return Changes(point, "--volume-shift", atT, "--volume-shift", "peneloux");
            yield return Refused(point, "--volume-shift", [.. atT, "--volume-shift", "1 cm3/mol"]);
            yield return Changes(point, "--format", atT, "--format", "json");
            yield return Changes(point, "--format", atT, "--format", "csv");
            yield return Changes(point, "--out", atT, "--out", "{dir}/out.txt");
            yield return Changes(point, "--units", atT, "--units", "engineering");
            yield return Changes(point, "--units", [.. atT, "--format", "csv"], "--units", "engineering");
            yield return Refused(point, "--units", [.. atT, "--format", "json", "--units", "engineering"]);
        }

        string[] flash = ["flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "1MPa"];
        string[] flashH = ["flash", "methane=0.2,propane=0.8", "-P", "1MPa", "--enthalpy", "-15000 J/mol"];
        string[] flashS = ["flash", "methane=0.2,propane=0.8", "-P", "1MPa", "--entropy", "-70 J/(mol*K)"];
        yield return Differs("flash", "--temperature", flash, ["flash", "methane=0.2,propane=0.8", "-T", "260", "-P", "1MPa"]);
        yield return Differs("flash", "--pressure", flash, ["flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "2MPa"]);
        yield return Refused("flash", "--pressure", ["flash", "methane=0.2,propane=0.8", "-T", "250"]);
        yield return Differs("flash", "--enthalpy", flashH, ["flash", "methane=0.2,propane=0.8", "-P", "1MPa", "--enthalpy", "-14000 J/mol"]);
        yield return Refused("flash", "--enthalpy", [.. flash, "--enthalpy", "-15000 J/mol"]);
        yield return Differs("flash", "--entropy", flashS, ["flash", "methane=0.2,propane=0.8", "-P", "1MPa", "--entropy", "-65 J/(mol*K)"]);
        yield return Refused("flash", "--entropy", [.. flashH, "--entropy", "-70 J/(mol*K)"]);
        yield return Changes("flash", "--mass-fractions", flash, "--mass-fractions");
        yield return Changes("flash", "--kij", flash, "--kij", "methane,propane=0.05");
        yield return Changes("flash", "--eos", flash, "--eos", "srk");
        yield return Changes("flash", "--alpha", flash, "--alpha", "twu");
        yield return Changes("flash", "--volume-shift", flash, "--volume-shift", "peneloux");
        yield return Refused("flash", "--volume-shift", [.. flash, "--volume-shift", "1 cm3/mol"]);
        yield return Changes("flash", "--format", flash, "--format", "json");
        yield return Changes("flash", "--format", flash, "--format", "csv");
        yield return Changes("flash", "--out", flash, "--out", "{dir}/out.txt");
        yield return Changes("flash", "--units", flash, "--units", "engineering");
        yield return Changes("flash", "--units", [.. flash, "--format", "csv"], "--units", "engineering");
        yield return Refused("flash", "--units", [.. flash, "--format", "json", "--units", "engineering"]);

        // report: each option changes the HTML page (the page lists the choices it was made with,
        // and each also changes its numbers: ReportCommandTests checks --eos, --step and --units
        // against the tables themselves).
        string[] report = ["report", "propane", "--out", "{dir}/out.html"];
        string[] reportData = ["report", FluidFile, "--data", Csv, "--out", "{dir}/out.html"];
        string[] reportBare = ["report", "propane", "--data", "{bare}", "--temperature-unit", "K", "--pressure-unit", "kPa", "--out", "{dir}/out.html"];
        string[] reportBlend = ["report", "methane=0.8,ethane=0.2", "--out", "{dir}/out.html"];
        yield return Differs("report", "--out", report, Replace(report, "{dir}/out.html", "{dir}/out.htm"));
        yield return Refused("report", "--out", Replace(report, "{dir}/out.html", "{dir}/out.txt"));
        yield return Changes("report", "--data", [.. reportData[..2], .. reportData[4..]], "--data", Csv);
        yield return Refused("report", "--data", [.. reportBlend, "--data", Csv]);
        yield return Differs("report", "--temperature-unit", reportBare, Replace(reportBare, "K", "degR"));
        yield return Refused("report", "--temperature-unit", [.. report, "--temperature-unit", "K"]);
        yield return Differs("report", "--pressure-unit", reportBare, Replace(reportBare, "kPa", "Pa"));
        yield return Refused("report", "--pressure-unit", [.. report, "--pressure-unit", "kPa"]);
        yield return Changes("report", "--step", report, "--step", "10");
        yield return Refused("report", "--step", [.. reportBlend, "--step", "10"]);
        yield return Changes("report", "--eos", report, "--eos", "srk");
        yield return Changes("report", "--eos", reportBlend, "--eos", "srk");
        yield return Changes("report", "--alpha", report, "--alpha", "twu");
        yield return Changes("report", "--volume-shift", report, "--volume-shift", "peneloux");
        yield return Refused("report", "--volume-shift", [.. reportBlend, "--volume-shift", "1 cm3/mol"]);
        yield return Changes("report", "--units", report, "--units", "engineering");
        yield return Changes("report", "--units", reportBlend, "--units", "engineering");
    }

    /// <summary>--eos, --alpha, --volume-shift, --format and (where offered) --units.</summary>
    /// <summary>--out on the commands that print one result: the result goes to the file, so
    /// standard output changes (to nothing).</summary>
    private static IEnumerable<Row> OutRows()
    {
        yield return Changes("coexist", "--out", ["coexist", "propane", "-T", "300"], "--out", "{dir}/out.txt");
        yield return Changes("state", "--out", ["state", "propane", "-T", "300", "-P", "1MPa"], "--out", "{dir}/out.txt");
        yield return Changes("derive", "--out", ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1MPa"], "--out", "{dir}/out.txt");
        yield return Changes("fit", "--out", ["fit", Csv, "--form", "antoine"], "--out", "{dir}/out.txt");
        yield return Changes("latent", "--out", ["latent", Csv, "--form", "antoine"], "--out", "{dir}/out.txt");
        yield return Changes("audit", "--out", ["audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--log-base", "10"], "--out", "{dir}/out.txt");
        yield return Changes("fluids list", "--out", ["fluids", "list"], "--out", "{dir}/out.txt");
        yield return Changes("fluids show", "--out", ["fluids", "show", "propane"], "--out", "{dir}/out.txt");
        yield return Changes("fluids check", "--out", ["fluids", "check", FluidFile], "--out", "{dir}/out.txt");
    }

    private static IEnumerable<Row> ModelAndOutputRows(string command, string[] baseline, bool units)
    {
        yield return Changes(command, "--eos", baseline, "--eos", "srk");
        yield return Refused(command, "--eos", [.. baseline, "--eos", "nonesuch"]);
        yield return Changes(command, "--alpha", baseline, "--alpha", "twu");
        // Propane carries tuned Mathias-Copeman constants (derived from its published vapour-pressure
        // equation); a fluid without them is refused, exit 4 (see MathiasCopeman_* below).
        yield return Changes(command, "--alpha", baseline, "--alpha", "mathias-copeman");
        yield return Changes(command, "--volume-shift", baseline, "--volume-shift", "peneloux");
        yield return Changes(command, "--format", baseline, "--format", "json");
        if (units)
        {
            yield return Changes(command, "--units", baseline, "--units", "engineering");
            yield return Refused(command, "--units", [.. baseline, "--format", "json", "--units", "engineering"]);
        }
    }

    /// <summary>--temperature, --pressure, --density, --phase and --reference on a state at 300 K, 1 MPa.</summary>
    private static IEnumerable<Row> StateRows(string command, string[] baseline)
    {
        yield return Differs(command, "--temperature", baseline, Replace(baseline, "300", "310"));
        yield return Differs(command, "--pressure", baseline, Replace(baseline, "1MPa", "2MPa"));
        yield return Differs(command, "--density", baseline, [.. baseline[..^2], "--density", "100"]);
        yield return Refused(command, "--density", [.. baseline, "--density", "100"]);
        yield return Changes(command, "--phase", baseline, "--phase", "vapour");
        // With a density, --phase picks the branch: a dilute density asked for as a liquid is on
        // the vapour branch, which is refused as out of range (exit 4), naming what it is.
        yield return Refused(command, "--phase", [.. baseline[..^2], "--density", "100", "--phase", "liquid"], ExitCodes.OutOfRange);
        yield return Changes(command, "--reference", baseline, "--reference", "nbp");
        // Any two properties: each replaces the temperature (propane at 1 MPa is liquid at 300 K;
        // these values give superheated vapour on the ideal-gas reference).
        string[] onIsobar = Replace(Replace(baseline, "-T", "--enthalpy"), "300", "2000");
        yield return Differs(command, "--enthalpy", baseline, onIsobar);
        yield return Differs(command, "--entropy", baseline, Replace(Replace(baseline, "-T", "--entropy"), "300", "-20"));
        yield return Differs(command, "--internal-energy", baseline, Replace(Replace(baseline, "-T", "--internal-energy"), "300", "0"));
        yield return Differs(command, "--volume", baseline, [.. baseline[..^2], "--volume", "0.01 m3/mol"]);
        yield return Refused(command, "--volume", [.. baseline[..^2], "--volume", "0.01 m3/mol", "--density", "100"]);
        // For derive, quality 0 and 1 are the saturated liquid and vapour (inside the dome a
        // derivative is refused: it needs one phase).
        yield return Differs(command, "--quality", [.. baseline[..^2], "--quality", command == "state" ? "0.2" : "0"], [.. baseline[..^2], "--quality", command == "state" ? "0.8" : "1"]);
        yield return Refused(command, "--quality", [.. baseline, "--quality", "0.5"]);
    }

    private static string[] Replace(string[] args, string from, string to, int skip = 0)
    {
        var result = (string[])args.Clone();
        int seen = 0;
        for (int i = 0; i < result.Length; i++)
        {
            if (result[i] == from && seen++ == skip)
            {
                result[i] = to;
                return result;
            }
        }

        throw new ArgumentException($"'{from}' not in the command line {string.Join(' ', args)}");
    }

    public static TheoryData<Row> Rows()
    {
        var data = new TheoryData<Row>();
        foreach (var row in AllRows())
        {
            data.Add(row);
        }

        return data;
    }

    /// <summary>Every leaf command and the options it offers, from the command tree itself.</summary>
    private static IEnumerable<(string Command, string Option)> OfferedOptions()
    {
        var root = CliApp.Root(new CliIo(TextWriter.Null, TextWriter.Null));
        var pending = new Stack<(Command Command, string Path)>(root.Subcommands.Select(c => (c, c.Name)));
        while (pending.Count > 0)
        {
            var (command, path) = pending.Pop();
            foreach (var sub in command.Subcommands)
            {
                pending.Push((sub, $"{path} {sub.Name}"));
            }

            foreach (var option in command.Options.Where(o => o is not HelpOption and not VersionOption))
            {
                yield return (path, option.Name);
            }
        }
    }

    [Fact]
    public void EveryOfferedOption_HasARowThatChangesTheOutput()
    {
        var changing = AllRows().Where(r => r.RefusedWith is null).Select(r => (r.Command, r.Option)).ToHashSet();
        var missing = OfferedOptions().Where(o => !changing.Contains(o)).Select(o => $"{o.Command} {o.Option}").ToArray();
        Assert.True(missing.Length == 0, "options offered with no row showing their effect: " + string.Join(", ", missing));
    }

    [Fact]
    public void EveryRow_NamesAnOptionTheCommandOffers()
    {
        var offered = OfferedOptions().ToHashSet();
        var stray = AllRows().Where(r => !offered.Contains((r.Command, r.Option))).Select(r => r.ToString()).ToArray();
        Assert.True(stray.Length == 0, "rows for options not offered: " + string.Join("; ", stray));
    }

    [Theory]
    [MemberData(nameof(Rows))]
    public void OfferedOption_ChangesTheOutputOrIsRefused(Row row)
    {
        if (row.RefusedWith is int code)
        {
            using var folder = new TempFolder();
            var refused = Run(Expand(row.Variant, folder));
            AssertFailure(refused, code);
            Assert.Empty(folder.Entries());
            return;
        }

        string before = Outcome(row.Baseline);
        string after = Outcome(row.Variant);
        Assert.True(before != after, $"{row.Option} on {row.Command} changed nothing: {after}");
    }

    [Theory]
    [InlineData("derive", "--units")]
    [InlineData("fit", "--units")]
    [InlineData("latent", "--units")]
    [InlineData("latent", "--volume-shift")]
    [InlineData("fluids check", "--units")]
    [InlineData("audit", "--temperature-unit")]
    [InlineData("audit", "--pressure-unit")]
    public void OptionACommandCannotHonour_IsNotOffered(string command, string option)
        => Assert.DoesNotContain((command, option), OfferedOptions());

    [Fact]
    public void MathiasCopeman_CatalogFluidWithoutConstants_RefusalNamesTheFluidAndTheLineToAdd()
    {
        // n-butane has no published vapour-pressure equation in the catalog, hence no constants.
        var result = Run("coexist", "n-butane", "-T", "300", "--alpha", "mathias-copeman");
        AssertFailure(result, ExitCodes.OutOfRange, "no Mathias-Copeman parameters for n-butane");
        Assert.Contains("alpha_mathias_copeman_pr", result.Stderr, StringComparison.Ordinal);
        Assert.Contains("docs/fluid-files.md", result.Stderr, StringComparison.Ordinal);
    }

    [Fact]
    public void MathiasCopeman_FluidFileWithConstants_IsUsedByFluidsCheck()
    {
        // The FRC-7 example file with invented Mathias-Copeman constants added (c1 close to the
        // Soave m of its omega, so the model stays near the default one and converges).
        string path = _data.File("frc-7-mc.fluid");
        File.WriteAllText(path, File.ReadAllText(FluidFile) + "alpha_mathias_copeman_pr  0.88 0.05 0.0  | invented for this test\n");
        var json = RunJson("fluids", "check", path, "--alpha", "mathias-copeman", "--format", "json");
        Assert.Contains("Mathias", json.GetProperty("model").GetProperty("alpha").GetString(), StringComparison.Ordinal);
        Assert.True(json.GetProperty("solves_to_critical_point").GetBoolean());
    }

    [Theory]
    [InlineData("coexist", "propane", "-T", "300", "--format", "json")]
    [InlineData("curve", "propane", "--points", "4", "--format", "json")]
    [InlineData("state", "propane", "-T", "300", "-P", "1MPa", "--format", "json")]
    [InlineData("derive", "propane", "--of", "V", "--by", "P", "--hold", "T", "-T", "300", "-P", "1MPa", "--format", "json")]
    [InlineData("derive", "propane", "--of", "T", "--by", "P", "--hold", "H", "-T", "300", "-P", "1MPa", "--explain", "--format", "json")]
    [InlineData("derive", "--from-measured", "alpha=1e-3 ± 1e-5,kappa_t=1e-9,cp=100", "--of", "w", "-T", "300", "--molar-volume", "1e-4", "--molar-mass", "50 g/mol", "--format", "json")]
    [InlineData("fit", "{csv}", "--format", "json")]
    [InlineData("latent", "{csv}", "--fluid", "{fluid}", "--format", "json")]
    [InlineData("audit", "--form", "antoine", "--coefficients", LangeWater, "--range", "1,100", "--fluid", "water", "--format", "json")]
    [InlineData("fluids", "list", "--format", "json")]
    [InlineData("fluids", "show", "water", "--format", "json")]
    [InlineData("fluids", "check", "{fluid}", "--format", "json")]
    public void Json_EveryObject_HasDistinctPropertyNames(params string[] args)
    {
        var result = Run([.. args.Select(a => a.Replace("{csv}", Csv, StringComparison.Ordinal).Replace("{fluid}", FluidFile, StringComparison.Ordinal))]);
        Assert.True(result.ExitCode is 0 or ExitCodes.AuditFailed, result.ToString());
        AssertStrictJson(result.Stdout);
    }

    [Fact]
    public void Latent_Json_CountIsPointCountAndPointsIsTheArray()
    {
        var result = Run("latent", Csv, "--fluid", FluidFile, "--points", "4", "--format", "json");
        AssertStrictJson(result.Stdout);
        using var document = StrictJson.Parse(result.Stdout);
        var root = document.RootElement;
        Assert.Equal(JsonValueKind.Array, root.GetProperty("points").ValueKind);
        Assert.Equal(4, root.GetProperty("points").GetArrayLength());
        // point_count is the number of data points fitted, not of temperatures printed.
        Assert.Equal(File.ReadLines(Csv).Count(l => l.Length > 0 && char.IsAsciiDigit(l[0])), root.GetProperty("point_count").GetInt32());
    }

    [Fact]
    public void StrictJson_RepeatedNameOrNaN_IsCaught()
    {
        Assert.ThrowsAny<JsonException>(() => AssertStrictJson("{\"a\": 1, \"b\": {\"c\": 2, \"c\": 3}}"));
        Assert.ThrowsAny<JsonException>(() => AssertStrictJson("{\"a\": NaN}"));
        AssertStrictJson("{\"a\": 1, \"b\": {\"a\": 2}}"); // the same name in different objects is fine
    }

    /// <summary>Parses <paramref name="json"/> strictly: no object may repeat a property name.</summary>
    private static void AssertStrictJson(string json)
    {
        using var document = StrictJson.Parse(json);
    }

    private string[] Expand(string[] args, TempFolder folder)
    {
        string bare = _data.File("bare.csv");
        if (!File.Exists(bare))
        {
            File.WriteAllText(bare, BareData);
        }

        // Two invented batches of states for state --batch.
        string states1 = _data.File("states1.csv"), states2 = _data.File("states2.csv");
        if (!File.Exists(states1))
        {
            File.WriteAllText(states1, "T [K],P [bar]\n300,1\n");
            File.WriteAllText(states2, "T [K],P [bar]\n300,2\n");
        }

        string vle = _data.File("vle.csv");
        if (!File.Exists(vle))
        {
            File.WriteAllText(vle, "T [degC],P [kPa],x1,y1\n86.7,101.325,0.0966,0.4375\n81.5,101.325,0.3273,0.5826\n78.41,101.325,0.7472,0.7815\n");
        }

        return [.. args.Select(a => a.Replace("{dir}", folder.Path, StringComparison.Ordinal).Replace("{bare}", bare, StringComparison.Ordinal).Replace("{vle}", vle, StringComparison.Ordinal)
            .Replace("{states1}", states1, StringComparison.Ordinal).Replace("{states2}", states2, StringComparison.Ordinal))];
    }

    /// <summary>What a successful run produced: exit code, stdout, stderr without timings, and
    /// the bytes of every file it wrote.</summary>
    private string Outcome(string[] args)
    {
        using var folder = new TempFolder();
        var result = Run(Expand(args, folder));
        Assert.True(result.ExitCode is 0 or ExitCodes.AuditFailed, $"{string.Join(' ', args)}: {result}");
        var text = new StringBuilder();
        text.Append(CultureInfo.InvariantCulture, $"exit {result.ExitCode}\n{result.Stdout.Replace(folder.Path, "{dir}", StringComparison.Ordinal)}\n--stderr--\n");
        text.Append(result.Stderr.Replace(folder.Path, "{dir}", StringComparison.Ordinal));
        foreach (string name in folder.Entries())
        {
            text.Append(CultureInfo.InvariantCulture, $"\n--{name}--\n{Convert.ToBase64String(File.ReadAllBytes(folder.File(name)))}");
        }

        return text.ToString();
    }

    public void Dispose() => _data.Dispose();
}
