namespace PhaseSlope.Cli.Tests;

/// <summary>The bad-input catalogue: inputs a new user gives by mistake (wrong-case units, values
/// out of range, conflicting options, files that are not what they claim), each refused with the
/// documented exit code, one "phaseslope: error:" line on standard error naming the problem and
/// where, nothing on standard output, no stack trace, and the --out file left exactly as it was
/// (no temporary file left beside it). Together with <see cref="CliIoTests"/> (58 cases) over 130.</summary>
public class BadInputCatalogueTests
{
    public static TheoryData<string[], int, string> Cases => new()
    {
        { ["coexist", "propane", "-T", "300 k"], ExitCodes.Usage, "--temperature: unknown temperature unit 'k' in '300 k'; did" },
        { ["coexist", "propane", "-P", "1 mpa"], ExitCodes.Usage, "--pressure: unknown pressure unit 'mpa' in '1 mpa'; did you" },
        { ["coexist", "propane", "-P", "1 MPA"], ExitCodes.Usage, "--pressure: unknown pressure unit 'MPA' in '1 MPA'; did you" },
        { ["coexist", "propane", "-T", "25 DEGC"], ExitCodes.Usage, "--temperature: unknown temperature unit 'DEGC' in '25 DEGC';" },
        { ["coexist", "propane", "-T", "300 furlong"], ExitCodes.Usage, "--temperature: unknown temperature unit 'furlong' in '300 fu" },
        { ["coexist", "propane", "-T", "-5"], ExitCodes.Usage, "--temperature: temperature is -5 K, not above absolute zero" },
        { ["coexist", "propane", "-T", "NaN"], ExitCodes.Usage, "--temperature: NaN and infinity are not accepted in 'NaN' (g" },
        { ["coexist", "propane", "-T", "1e400"], ExitCodes.Usage, "--temperature: number is too large in '1e400' (give a finite" },
        { ["coexist", "propane", "-P", "-1 bar"], ExitCodes.Usage, "--pressure: pressure is not above zero in '-1 bar' (an absol" },
        { ["coexist", "propane", "-P", "50 bar"], ExitCodes.OutOfRange, "pressure 5000000 Pa is at or above the critical pressure 425" },
        { ["coexist", "propane", "-T", "369.89"], ExitCodes.OutOfRange, "temperature 369.89 K is at or above the critical temperature" },
        { ["coexist", "propane", "-T", "50"], ExitCodes.OutOfRange, "temperature 50 K is below the triple point 85.525 K of propane: no liquid exists there" },
        // 3e-4 Pa: below Peng-Robinson's own 3.64e-4 Pa at propane's triple point, above the sourced
        // triple-point pressure (about 1.7e-4 Pa, Lemmon et al. 2009, from memory) where the catalog gives it.
        { ["coexist", "propane", "-P", "3e-4 Pa"], ExitCodes.OutOfRange, "the model's saturation temperature at 0.0003 Pa falls below the triple point 85.525 K of propane: the model's vapour pressure at the triple point is 0.0003642" },
        { ["coexist", "helium", "-P", "1e-30 Pa"], ExitCodes.OutOfRange, "pressure 1E-30 Pa is below the saturation pressure 462.0135 Pa at the lowest valid temperature 1.55859 K" },
        { ["coexist", "propane", "-T", "300", "--eos", "xyz"], ExitCodes.Usage, "--eos: unknown model 'xyz' (use pr, pr78, srk, rk, vdw)" },
        { ["coexist", "propane", "-T", "300", "--alpha", "bogus"], ExitCodes.Usage, "--alpha: unknown alpha function 'bogus' (use default, twu or" },
        { ["coexist", "n-butane", "-T", "300", "--alpha", "mathias-copeman"], ExitCodes.OutOfRange, "no Mathias-Copeman parameters for n-butane with Peng-Robinson" },
        { ["coexist", "propane", "-T", "300", "--volume-shift", "1 m3/mol"], ExitCodes.OutOfRange, "volume shift 1 m3/mol must be below the co-volume b = 5.6279" },
        { ["coexist", "propane", "-T", "300", "--volume-shift", "abc"], ExitCodes.Usage, "--volume-shift: expected a molar volume starting with a numb" },
        { ["coexist", "propane", "-T", "300", "--reference", "nowhere"], ExitCodes.Usage, "--reference: unknown reference 'nowhere' (use ideal-gas, nbp" },
        { ["coexist", "methane", "-T", "150", "--reference", "refrigeration"], ExitCodes.OutOfRange, "reference state 'refrigeration' (saturated liquid at 0 degC:" },
        { ["coexist", "propane", "-T", "300", "--format", "xml"], ExitCodes.Usage, "--format: unknown format 'xml' (use table, csv or json)" },
        { ["coexist", "propane", "-T", "300", "--format", "json", "--units", "engineering"], ExitCodes.Usage, "--units: applies to tables and CSV only; json output is alwa" },
        { ["coexist", "/dev/zero", "-T", "300"], ExitCodes.Fluid, "cannot read fluid file: a line is longer than the limit of 6" },
        { ["coexist", "{dir}/no-such.fluid", "-T", "300"], ExitCodes.Fluid, "fluid file not found" },
        { ["coexist", "{dir}/hugemass.fluid", "-T", "300"], ExitCodes.Fluid, "field 'molar_mass': implausible value 1E+308 g/mol; expected" },
        { ["report", "{dir}/badhazard.fluid"], ExitCodes.Fluid, "badhazard.fluid:22: field 'hazard_class': 'A4' is not a hazard class; write one ASHRAE Standard 34 safety group" },
        { ["coexist", "{dir}/lowomega.fluid", "-T", "300", "--alpha", "twu"], ExitCodes.OutOfRange, "acentric factor -0.5 of lowomega is outside -0.1344178 to an" },
        { ["curve", "propane", "--points", "1"], ExitCodes.Usage, "--points: must be between 2 and 100000, got 1" },
        { ["curve", "propane", "--points", "200000"], ExitCodes.Usage, "--points: must be between 2 and 100000, got 200000" },
        { ["curve", "propane", "--from", "400"], ExitCodes.OutOfRange, "--from: 400 K is at or above the critical temperature 369.89" },
        { ["curve", "propane", "--to", "50"], ExitCodes.OutOfRange, "--to: 50 K is below the triple point 85.525 K of propane: no liquid exists below it" },
        { ["curve", "propane", "--from", "300", "--to", "250"], ExitCodes.Usage, "--from (300 K) must be below --to (250 K)" },
        { ["state", "propane", "-T", "300"], ExitCodes.Usage, "give exactly two of --temperature, --pressure, --density (or" },
        { ["state", "propane", "-T", "300", "-P", "1e6", "--density", "100"], ExitCodes.Usage, "give exactly two of --temperature, --pressure, --density (or" },
        { ["state", "propane"], ExitCodes.Usage, "give exactly two of --temperature, --pressure, --density (or" },
        { ["cycle", "r-134a", "evaporating=40 degC,condensing=-10 degC"], ExitCodes.Usage, "CYCLE: the evaporating temperature 313.15 K must be below the" },
        { ["cycle", "r-134a", "evaporating=-10 degC,boiling=40 degC"], ExitCodes.Usage, "CYCLE: 'boiling=40 degC' is not key=value with a key of evapo" },
        { ["cycle", "r-134a", "evaporating=-10 degC,condensing=110 degC"], ExitCodes.OutOfRange, "condensing" },
        { ["state", "propane", "--batch", "no-such-states.csv"], ExitCodes.DataFile, "no-such-states.csv: data file not found" },
        { ["state", "propane", "--batch", "no-such-states.csv", "-T", "300"], ExitCodes.Usage, "--batch: the states come from the file; give no property opti" },
        { ["state", "propane", "--batch", "no-such-states.csv", "--uncertainty", "linear"], ExitCodes.Usage, "--batch: --uncertainty applies to a single state, not to a b" },
        { ["state", "propane", "-T", "300", "--density", "100", "--volume", "1 m3/kg"], ExitCodes.Usage, "--volume: give the density or the volume, not both (they are" },
        { ["state", "propane", "-P", "1e6", "--enthalpy", "2000", "--phase", "liquid"], ExitCodes.Usage, "--phase: chooses a branch only for a state given by --temper" },
        { ["state", "propane", "-P", "1e6", "--quality", "1.5"], ExitCodes.Usage, "--quality: quality is outside 0 to 1 in '1.5' (the vapour fr" },
        { ["state", "propane", "-P", "1e6", "--quality", "half"], ExitCodes.Usage, "--quality: not a number in 'half' (a quality is a vapour fra" },
        { ["state", "propane", "-P", "1e6", "--enthalpy", "20 kJ/kmol"], ExitCodes.Usage, "--enthalpy: unknown energy unit 'kJ/kmol'" },
        { ["state", "propane", "-P", "1e6", "--entropy", "1 kJ/kg"], ExitCodes.Usage, "--entropy: unknown entropy unit 'kJ/kg'" },
        { ["state", "propane", "-P", "1e6", "--volume", "-1 m3/kg"], ExitCodes.Usage, "--volume: volume is not above zero in '-1 m3/kg' (a volume mu" },
        { ["state", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "-P", "1e6", "--volume", "1 m3/kg"], ExitCodes.Usage, "--volume: a value in m3/kg needs the fluid's molar mass, whic" },
        { ["state", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "-P", "1e6", "--enthalpy", "100"], ExitCodes.Fluid, "inline fluid: field 'ideal_gas_cp': fluid 'inline-fluid' has" },
        { ["state", "propane", "-T", "400", "--quality", "0.5"], ExitCodes.OutOfRange, "a quality needs liquid and vapour, which coexist only below " },
        { ["state", "propane", "-P", "5MPa", "--quality", "0.5"], ExitCodes.OutOfRange, "a quality needs liquid and vapour, which coexist only below " },
        { ["state", "propane", "-P", "1e5", "--enthalpy", "1e7"], ExitCodes.OutOfRange, "no state at 100000 Pa has enthalpy 1E+07 J/mol: between 230" },
        { ["state", "propane", "--enthalpy", "1e4", "--internal-energy", "8e3"], ExitCodes.OutOfRange, "enthalpy and internal energy together do not fix a state: fo" },
        { ["state", "propane", "-P", "1e6", "--enthalpy", "2000", "--uncertainty", "linear"], ExitCodes.Usage, "--uncertainty: propagates to a state given by --temperature " },
        { ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-P", "1e6", "--quality", "0.5"], ExitCodes.OutOfRange, "a partial derivative needs a single phase; this state is two" },
        { ["curve", "propane", "--from", "250", "--to", "300", "--step", "0"], ExitCodes.Usage, "--step: the step is not above zero in '0' (give a positive t" },
        { ["curve", "propane", "--from", "250", "--to", "300", "--step", "-5 K"], ExitCodes.Usage, "--step: the step is not above zero in '-5 K' (give a positi" },
        { ["curve", "propane", "--step", "5", "--points", "10"], ExitCodes.Usage, "--step: conflicts with --points (give the number of states" },
        { ["curve", "propane", "--step", "1e-4 K"], ExitCodes.Usage, "--step: 0.0001 K from 85.525 K to 369.89 K gives more than" },
        { ["curve", "propane", "--step", "1e-300 K"], ExitCodes.Usage, "--step: 1E-300 K from 85.525 K to 369.89 K gives more than" },
        { ["curve", "propane", "--step", "5 furlong"], ExitCodes.Usage, "--step: unknown temperature difference unit 'furlong' in '5" },
        { ["curve", "propane", "--temperatures", "250,300", "--from", "200"], ExitCodes.Usage, "--temperatures: conflicts with --from (the list gives every" },
        { ["curve", "propane", "--temperatures", "300,250"], ExitCodes.Usage, "--temperatures: the values must increase, but value 2 (250 K" },
        { ["curve", "propane", "--temperatures", "250,250"], ExitCodes.Usage, "--temperatures: the values must increase, but value 2 (250 K" },
        { ["curve", "propane", "--temperatures", "250,,300"], ExitCodes.Usage, "--temperatures: empty entry in the temperature list in '250" },
        { ["curve", "propane", "--temperatures", "-40,100 degC"], ExitCodes.OutOfRange, "--temperatures: 373.15 K is above the critical temperature 3" },
        { ["curve", "propane", "--temperatures", "50,300"], ExitCodes.OutOfRange, "--temperatures: 50 K is below the triple point 85.525 K of propane" },

        // No liquid where the fluid's own data say there is none (water: IAPWS-95 triple point
        // 273.16 K, 611.657 Pa, and the IAPWS (2011) ice Ih lines; carbon dioxide: Span & Wagner
        // 1996; all from memory, in the catalog files).
        { ["coexist", "water", "--pressure", "500 Pa"], ExitCodes.OutOfRange, "no liquid exists below the triple-point pressure 611.657 Pa of water (Wagner & Pruß" },
        { ["coexist", "water", "--temperature", "260 K"], ExitCodes.OutOfRange, "temperature 260 K is below the triple point 273.16 K of water: no liquid exists there, the condensed phase is the solid" },
        { ["curve", "water", "--pressures", "500,1000 Pa"], ExitCodes.OutOfRange, "--pressures: no liquid exists below the triple-point pressure 611.657 Pa of water" },
        { ["curve", "water", "--from", "260 K"], ExitCodes.OutOfRange, "--from: 260 K is below the triple point 273.16 K of water: no liquid exists below it" },
        { ["state", "water", "-P", "500 Pa", "--quality", "0.5"], ExitCodes.OutOfRange, "no liquid exists below the triple-point pressure 611.657 Pa of water" },
        { ["state", "water", "-T", "260 K", "--quality", "0"], ExitCodes.OutOfRange, "temperature 260 K is below the triple point 273.16 K of water" },
        { ["state", "water", "-T", "260 K", "-P", "1 atm"], ExitCodes.OutOfRange, "water at 260 K and 101325 Pa is solid by its own data: below its triple point 273.16 K and above its sublimation pressure 195.8" },
        { ["state", "water", "-T", "260 K", "-P", "1 atm", "--phase", "liquid"], ExitCodes.OutOfRange, "water at 260 K and 101325 Pa is solid by its own data" },
        { ["state", "water", "-T", "265 K", "-P", "50 MPa"], ExitCodes.OutOfRange, "and below its melting pressure 9.233" },
        { ["state", "water", "-T", "273.2 K", "-P", "550 Pa"], ExitCodes.OutOfRange, "no liquid exists below the triple-point pressure 611.657 Pa of water" },
        { ["state", "carbon-dioxide", "-T", "200 K", "-P", "1 MPa"], ExitCodes.OutOfRange, "carbon dioxide at 200 K and 1000000 Pa is solid by its own data: below its triple point 216.592 K and above its sublimation pressure 1550" },
        { ["state", "carbon-dioxide", "-T", "250 K", "-P", "300 MPa"], ExitCodes.OutOfRange, "carbon dioxide at 250 K and 3E+08 Pa is solid by its own data: above its melting pressure 1.82" },
        { ["state", "{dir}/tonly.fluid", "-T", "80 K", "-P", "1 bar"], ExitCodes.OutOfRange, "tonly at 80 K and 100000 Pa is below its triple point 85.525 K, where the condensed phase is the solid" },
        { ["cycle", "water", "evaporating=-10 degC,condensing=40 degC"], ExitCodes.OutOfRange, "the evaporating temperature 263.15 K is below the triple point 273.16 K of water: no liquid exists there" },
        { ["curve", "propane", "--pressures", "1,2 bar", "--temperatures", "250"], ExitCodes.Usage, "--pressures: conflicts with --temperatures (a table is by te" },
        { ["curve", "propane", "--pressures", "1,2 bar", "--step", "5"], ExitCodes.Usage, "--pressures: conflicts with --step (the list gives every row" },
        { ["curve", "propane", "--pressures", "2,1 bar"], ExitCodes.Usage, "--pressures: the values must increase, but value 2 (100000 P" },
        { ["curve", "propane", "--pressures", "1,50 bar"], ExitCodes.OutOfRange, "--pressures: pressure 5000000 Pa is at or above the critical" },
        { ["curve", "propane", "--pressures", "1,2 psig"], ExitCodes.Usage, "--pressures: gauge pressures are not accepted ('psig') in '1 psig'" },
        { ["curve", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "--format", "csv", "--units", "engineering"], ExitCodes.Fluid, "inline fluid: field 'molar_mass': fluid 'inline-fluid' gives" },
        { ["curve", "water", "--line", "solid"], ExitCodes.Usage, "--line: unknown line 'solid' (use vaporization, sublimation or melting)" },
        { ["curve", "water", "--line", "sublimation", "--pressures", "1,2 bar"], ExitCodes.Usage, "--pressures: applies to --line vaporization only, not to the sublimation line" },
        { ["curve", "water", "--line", "melting", "--reference", "nbp"], ExitCodes.Usage, "--reference: applies to --line vaporization only, not to the melting line" },
        { ["curve", "water", "--line", "melting", "--diagnostics"], ExitCodes.Usage, "--diagnostics: applies to --line vaporization only, not to the melting line" },
        { ["curve", "water", "--line", "sublimation", "--uncertainty", "linear"], ExitCodes.Usage, "--uncertainty: applies to --line vaporization only, not to the sublimation line" },
        { ["curve", "water", "--line", "melting", "--from", "200"], ExitCodes.OutOfRange, "--from: 200 K is outside the melting line of water, 251.165-273.16 K (the published melting equation's stated range)" },
        { ["curve", "water", "--line", "sublimation", "--to", "300"], ExitCodes.OutOfRange, "--to: 300 K is outside the sublimation line of water, 50-273.16 K" },
        { ["curve", "water", "--line", "sublimation", "--temperatures", "40,200"], ExitCodes.OutOfRange, "--temperatures: 40 K is outside the sublimation line of water, 50-273.16 K" },
        { ["curve", "water", "--line", "melting", "--from", "270", "--to", "260"], ExitCodes.Usage, "--from (270 K) must be below --to (260 K)" },
        { ["curve", "{dir}/water-nopt.fluid", "--line", "sublimation"], ExitCodes.Fluid, "field 'triple_point_pressure': fluid 'water' gives no triple_point_pressure, which the sublimation line starts from" },
        { ["curve", "{dir}/water-nofusion.fluid", "--line", "melting"], ExitCodes.Fluid, "field 'enthalpy_of_fusion': fluid 'water' gives no enthalpy_of_fusion, which the Clapeyron route to the melting line needs" },
        { ["curve", "{dir}/water-nodv.fluid", "--line", "melting"], ExitCodes.Fluid, "field 'fusion_volume_change': fluid 'water' gives no fusion_volume_change" },
        { ["curve", "{dir}/water-nofusion.fluid", "--line", "sublimation", "--from", "300"], ExitCodes.OutOfRange, "--from: 300 K is outside the sublimation line of water" },
        { ["state", "propane", "-T", "300", "-D", "100"], ExitCodes.Usage, "Unrecognized command or argument '-D'." },
        { ["state", "propane", "-T", "300", "-P", "1e6", "--phase", "gas"], ExitCodes.Usage, "--phase: unknown phase 'gas' (use stable, liquid or vapour)" },
        { ["state", "propane", "-T", "400", "-P", "1e6", "--phase", "liquid"], ExitCodes.OutOfRange, "at 400 K, at or above the critical temperature 369.89 K, the" },
        { ["state", "propane", "-T", "300", "--density", "1e9 mol/m3"], ExitCodes.OutOfRange, "density 1E+09 mol/m3 is at or above the model's limit 1/b =" },
        { ["state", "propane", "-T", "300", "--density", "-5"], ExitCodes.Usage, "--density: density is not above zero in '-5' (a density must" },
        { ["derive", "propane", "--of", "V", "--by", "P", "--hold", "T", "-T", "369.89", "-P", "4.2512MPa"], ExitCodes.OutOfRange, "(dV/dP) at constant T is undefined at this state: P cannot v" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "T", "-T", "300", "-P", "1e6"], ExitCodes.Usage, "--hold: the variable held constant (T) must differ from --by" },
        { ["derive", "propane", "--of", "X", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e6"], ExitCodes.Usage, "--of: unknown variable 'X' (use T, P, V, U, H, S, A or G; or cp, cv, w)" },
        { ["derive", "propane", "--of", "H", "--by", "T", "-T", "300", "-P", "1e6"], ExitCodes.Usage, "--hold: required (the variable Z held constant" },
        { ["coexist", "inline:tc=369.89,pc=4.2512MPa,omega=0.152", "-T", "300"], ExitCodes.Usage, "FLUID: inline fluid: 'tc': missing unit; allowed: K" },
        { ["coexist", "inline:tc=369.89K,pc=4.2512MPa", "-T", "300"], ExitCodes.Usage, "FLUID: inline fluid: 'omega': required key is missing" },
        { ["coexist", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "-T", "300", "--units", "engineering"], ExitCodes.Fluid, "inline fluid: field 'molar_mass': fluid 'inline-fluid' gives" },
        { ["derive", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e6"], ExitCodes.Fluid, "inline fluid: field 'ideal_gas_cp': fluid 'inline-fluid' has" },
        { ["state", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "-T", "300", "-P", "1e6", "--reference", "nbp"], ExitCodes.Fluid, "inline fluid: field 'ideal_gas_cp': fluid 'inline-fluid' has" },
        { ["fit", "{dir}/ok.csv", "--form", "antoine", "--tc", "540"], ExitCodes.Usage, "--tc: needs --pc too (the critical point is both)" },
        { ["fit", "{dir}/ok.csv", "--fluid", "propane", "--tc", "540", "--pc", "31"], ExitCodes.Usage, "--tc: conflicts with --fluid, which gives the critical point" },
        { ["fit", "{dir}/ok.csv", "--tc", "540", "--pc", "31"], ExitCodes.OutOfRange, "the critical pressure 31 Pa is not above the data point at 2" },
        { ["fit", "{dir}/falling.csv", "--form", "antoine"], ExitCodes.OutOfRange, "the vapour pressure falls with temperature, from 1802700 Pa" },
        { ["fit", "{dir}/dup.csv", "--form", "antoine"], ExitCodes.DataFile, "column 'T [K]': temperature 250 K is the same as on line 2 (" },
        { ["fit", "{dir}/badnum.csv", "--form", "antoine"], ExitCodes.DataFile, "column 'P [kPa]': 'abc' is not a number (use a dot as the de" },
        { ["fit", "{dir}/nounits.csv", "--form", "antoine"], ExitCodes.DataFile, "column 'T': no temperature unit: write it in brackets (e.g." },
        { ["fit", "/dev/zero", "--form", "antoine"], ExitCodes.DataFile, "cannot read data file: a line is longer than the limit of 64" },
        { ["fit", "{dir}/no-such.csv", "--form", "antoine"], ExitCodes.DataFile, "data file not found" },
        { ["fit", "{dir}/ok.csv", "--form", "nonsense"], ExitCodes.Usage, "--form: unknown form 'nonsense' (use clausius-clapeyron, ant" },
        { ["fit", "{dir}/ok.csv", "--form", "wagner-3-6"], ExitCodes.Usage, "--form wagner-3-6: needs Tc and Pc: give --fluid, or --tc an" },
        { ["fit", "{dir}/ok.csv", "--form", "kirchhoff", "--correlation-temperature-unit", "degC"], ExitCodes.Usage, "--correlation-temperature-unit: the kirchhoff form has terms" },
        { ["fit", "{dir}/ok.csv", "--form", "wagner-3-6", "--tc", "540", "--pc", "3.1MPa", "--log-base", "10"], ExitCodes.Usage, "--log-base: the wagner-3-6 form is published as ln(P/Pc) in" },
        { ["fit", "{dir}/ok.csv", "--form", "antoine", "--correlation-pressure-unit", "bar", "--format", "csv"], ExitCodes.Usage, "--correlation-pressure-unit: the CSV output holds the residu" },
        { ["fit", "{dir}/no-such.csv", "--form", "antoine", "--correlation-temperature-unit", "degc"], ExitCodes.Usage, "--correlation-temperature-unit: unknown temperature unit 'de" },
        { ["latent", "{dir}/ok.csv", "--tc", "540", "--pc", "31"], ExitCodes.OutOfRange, "the critical pressure 31 Pa is not above the data point at 2" },
        { ["latent", "{dir}/falling.csv", "--form", "antoine"], ExitCodes.OutOfRange, "the vapour pressure falls with temperature, from 1802700 Pa" },
        { ["latent", "{dir}/ok.csv", "--fluid", "propane", "--form", "antoine", "--temperature", "600"], ExitCodes.OutOfRange, "temperature 600 K is at or above the critical temperature 36" },
        { ["latent", "{dir}/no-such.csv", "--from", "300", "--to", "200"], ExitCodes.Usage, "--from (300 K) must be below --to (200 K)" },
        { ["tune", "{dir}/ok.csv", "--tc", "540", "--pc", "3.1MPa", "--name", "x", "--omega", "5"], ExitCodes.Usage, "--omega: unphysical value 5; expected between -0.5 and 2" },
        { ["tune", "{dir}/ok.csv", "--tc", "370", "--pc", "4.25MPa", "--name", "x", "--molar-mass", "100"], ExitCodes.Usage, "--molar-mass: no molar-mass unit in '100'" },
        { ["tune", "{dir}/ok.csv", "--tc", "370", "--pc", "4.25MPa", "--name", "Upper"], ExitCodes.Usage, "--name: the canonical name must be lower case" },
        { ["tune", "{dir}/ok.csv", "--fluid", "propane", "--eos", "vdw"], ExitCodes.Usage, "--eos: van der Waals (1873) has no alpha function to tune" },
        { ["fluids", "check", "inline:tc=300K,pc=4MPa,omega=0.1"], ExitCodes.Usage, "FILE: fluids check checks a fluid file; an inline definition has no file" },
        { ["audit", "--form", "antoine", "--coefficients", "1,2"], ExitCodes.Usage, "--coefficients: the antoine form takes 3 coefficients (A,B,C), got 2" },
        { ["audit", "--form", "antoine", "--coefficients", "9.1,1872,-25", "--log-base", "7"], ExitCodes.Usage, "--log-base: unknown log base '7' (use 10 or e)" },
        { ["audit", "--form", "antoine", "--coefficients", "9.1,1872,-25", "--correlation-pressure-unit", "mmhg"], ExitCodes.Usage, "--correlation-pressure-unit: unknown pressure unit 'mmhg'; d" },
        { ["audit", "--form", "antoine", "--coefficients", "9.1,1872,-25", "--eos", "pr"], ExitCodes.Usage, "--eos: needs --fluid (the model's vapour pressure is compute" },
        { ["audit", "--form", "nonsense", "--coefficients", "9.1,1872,-25"], ExitCodes.Usage, "--form: unknown form 'nonsense' (use antoine, clausius-clape" },
        { ["audit", "--form", "riedel", "--coefficients", "60,-6000,-5,1e-17", "--range", "300,400", "--correlation-temperature-unit", "degF"], ExitCodes.Usage, "--correlation-temperature-unit: the riedel form has terms in" },
        { ["audit", "--form", "wagner-2.5-5", "--coefficients", "-7.62,1.6,-3,-3.4,540,31", "--range", "300,400", "--log-base", "10"], ExitCodes.Usage, "--log-base: the wagner-2.5-5 form is published as ln(P/Pc) " },
        { ["audit", "--form", "wagner-2.5-5", "--coefficients", "-7.62,1.6,-3,-3.4,540,0", "--range", "300,400", "--correlation-pressure-unit", "bar"], ExitCodes.OutOfRange, "the wagner-2.5-5 form needs Tc > 0 K and Pc > 0 Pa; read as" },
        { ["audit", "--form", "antoine-extended", "--coefficients", "73.649,-7258.2,0,0,-7.3037", "--range", "300,400"], ExitCodes.Usage, "--coefficients: the antoine-extended form takes 7 coefficien" },
        { ["fluids", "show", "nosuchfluid"], ExitCodes.Fluid, "unknown fluid 'nosuchfluid'; 'phaseslope fluids list' shows" },
        { ["fluids", "show", "propanne"], ExitCodes.Fluid, "unknown fluid 'propanne'; did you mean 'propane', 'acetone'," },
        { ["fluids", "check", "{dir}/lowomega.fluid", "--alpha", "twu"], ExitCodes.OutOfRange, "acentric factor -0.5 of lowomega is outside -0.1344178 to an" },
        { ["fluids", "estimate", "--name", "x", "--molar-mass", "100 g/mol", "--tc", "500", "--pc", "3MPa", "--vapour-pressure", "1 K, 1 Pa"], ExitCodes.OutOfRange, "the Ambrose-Walton relation for the acentric factor holds fo" },
        { ["fluids", "estimate", "--name", "Bad Name", "--molar-mass", "100 g/mol", "--tc", "500", "--pc", "3MPa", "--omega", "0.2"], ExitCodes.Usage, "--name: the canonical name must be lower case ('bad name')" },
        { ["fluids", "estimate", "--name", "x", "--molar-mass", "100 g/mol", "--tc", "500", "--pc", "3MPa", "--omega", "0.2", "--vapour-pressure", "400 K, 1 bar"], ExitCodes.Usage, "--vapour-pressure: conflicts with --omega (it estimates the" },
        { ["fluids", "estimate", "--name", "x", "--formula", "C3H8", "--groups", "CH3:2,CH2:2"], ExitCodes.Usage, "--formula: C3H8 is not the molecule of --groups (C4H10): C 3 vs 4, H 8 vs 10" },
        { ["fluids", "estimate", "--name", "x", "--groups", "CH3:2,CH4:1"], ExitCodes.Usage, "--groups: unknown group 'CH4' (use CH3, CH2," },
        { ["fluids", "estimate", "--name", "x", "--groups", "CH3:2,CH2:2", "--molar-mass", "44.1 g/mol"], ExitCodes.Usage, "--molar-mass: 44.1 g/mol is not the molar mass of C4H10, 58.1222 g/mol" },
        { ["plot", "propane", "--diagram", "nonsense"], ExitCodes.Usage, "--diagram: unknown diagram 'nonsense' (use p-t, lnp-invt, t-" },
        { ["plot", "propane", "--diagram", "p-t", "--width", "5"], ExitCodes.Usage, "--width: must be 300 to 8000 pixels, got 5" },
        { ["plot", "r-134a", "--diagram", "p-t", "--reference", "refrigeration"], ExitCodes.Usage, "--reference: the p-t diagram draws no enthalpy or entropy (p-" },
        { ["plot", "methane", "--diagram", "p-h", "--reference", "refrigeration"], ExitCodes.OutOfRange, "reference state 'refrigeration' (saturated liquid at 0 degC:" },
        { ["plot", "r-134a", "--diagram", "t-s", "--isotherms", "0,20 degC"], ExitCodes.Usage, "--isotherms: the t-s diagram has no isotherms (p-h has; t-s d" },
        { ["plot", "r-134a", "--diagram", "p-h", "--isotherms", "0,,20 degC"], ExitCodes.Usage, "--isotherms: an empty value in the comma-separated list '0,,2" },
        { ["plot", "r-134a", "--diagram", "p-h", "--isotherms", "-250,20 degC"], ExitCodes.Usage, "--isotherms: the isotherm at 23.15 K is below the lowest vali" },
        { ["plot", "r-134a", "--diagram", "p-h", "--isotherms", "0,20 degc"], ExitCodes.Usage, "--isotherms: unknown temperature unit 'degc' in '0 degc'; did" },
        { ["plot", "r-134a", "--diagram", "t-s", "--isobars", "1,-2 bar"], ExitCodes.Usage, "--isobars: pressure is not above zero in '-2 bar' (an absolut" },
        { ["plot", "r-134a", "--diagram", "p-h", "--isochores", "sometimes"], ExitCodes.Usage, "--isochores: expected a density starting with a number in 'so" },
        { ["plot", "r-134a", "--diagram", "p-h", "--t-range", "120,-40 degC"], ExitCodes.Usage, "--t-range: the low end '120 degC' must be below the high end" },
        { ["plot", "r-134a", "--diagram", "p-h", "--t-range", "-40 degC"], ExitCodes.Usage, "--t-range: give the low and the high end separated by a comma" },
        { ["plot", "r-134a", "--diagram", "p-h", "--t-range", "110,150 degC"], ExitCodes.Usage, "--t-range: the temperature range starts at 383.1 K, at or abo" },
        { ["plot", "r-134a", "--diagram", "p-h", "--p-range", "0.0001,50 bar"], ExitCodes.OutOfRange, "--p-range: the pressure range starts at 0.01 kPa, below the s" },
        { ["plot", "r-134a", "--diagram", "p-h", "--h-range", "100 kJ/kg,0.5 kJ/mol"], ExitCodes.Usage, "--h-range: the low end '100 kJ/kg' must be below the high end" },
        { ["plot", "r-134a", "--diagram", "t-s", "--s-range", "1,2 kJ/kg"], ExitCodes.Usage, "--s-range: unknown entropy unit 'kJ/kg' in '1 kJ/kg' (use J/(" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC"], ExitCodes.Usage, "--cycle: 'condensing' (a saturation temperature) is required" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC,condensing=110 degC"], ExitCodes.Usage, "--cycle: the condensing temperature 383.1 K is at or above th" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=40 degC,condensing=-10 degC"], ExitCodes.Usage, "--cycle: the evaporating temperature 313.15 K must be below t" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC,condensing=40 degC,efficiency=1.5"], ExitCodes.Usage, "--cycle: the compressor's isentropic efficiency must be above" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC,condensing=40 degC,superheat=-5 K"], ExitCodes.Usage, "--cycle superheat: the temperature difference is negative in" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC,condensing=40 degC,colour=red"], ExitCodes.Usage, "--cycle: 'colour=red' is not key=value with a key of evaporat" },
        { ["plot", "r-134a", "--diagram", "p-h", "--cycle", "evaporating=-10 degC,condensing=40 degC,subcooling=55 K"], ExitCodes.OutOfRange, "--cycle: the throttled liquid (h = -25081.72 J/mol) is not a t" },
        { ["plot", "{dir}/notriple.fluid", "--diagram", "phase"], ExitCodes.Fluid, "field 'triple_point_pressure': fluid 'notriple' gives no trip" },
        { ["plot", "inline:tc=400K,pc=4MPa,omega=0.2", "--diagram", "phase"], ExitCodes.Fluid, "field 'triple_point_temperature': fluid 'inline-fluid' gives" },
        { ["plot", "{dir}/nosublimation.fluid", "--diagram", "phase"], ExitCodes.Fluid, "field 'enthalpy_of_fusion': fluid 'nosublimation' gives neith" },
        { ["plot", "water", "--diagram", "phase", "--log"], ExitCodes.Usage, "the phase diagram has no log option (p-t and slope have; p-v," },
        { ["plot", "water", "--diagram", "phase", "--reduced"], ExitCodes.Usage, "the phase diagram has no reduced form (p-t, lnp-invt, t-rho, " },
        { ["plot", "water,carbon-dioxide", "--diagram", "phase"], ExitCodes.Usage, "the phase diagram shows one fluid, got 2" },
        { ["plot", "water", "--diagram", "phase", "--t-range", "280,700 K"], ExitCodes.Usage, "--t-range: the phase diagram's temperature range 280 to 700 K" },
        { ["plot", "carbon-dioxide", "--diagram", "phase", "--p-range", "10,100 bar"], ExitCodes.Usage, "--p-range: the phase diagram's pressure range 1e+06 to 1e+07 " },
        { ["plot", "water", "--diagram", "phase", "--isotherms", "300 K"], ExitCodes.Usage, "--isotherms: the phase diagram has no isotherms (p-h has; t-s" },
        { ["audit", "--form", "antoine", "--coefficients", "1e300,1e300,1", "--log-base", "10", "--range", "250,330"], ExitCodes.OutOfRange, "the correlation's antoine coefficients 1E+300, 1E+300, 1 ove" },
        { ["coexist", "propane", "-T", "300", "--eos", "srk", "--alpha", "twu"], ExitCodes.OutOfRange, "no Twu parameters for propane with Soave-Redlich-Kwong (1972" },
        { ["coexist", "propane"], ExitCodes.Usage, "coexist: give exactly one of --temperature and --pressure" },
        { ["coexist", "propane", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "coexist: give exactly one of --temperature and --pressure" },
        { ["curve", "propane", "--points", "abc"], ExitCodes.Usage, "Cannot parse argument 'abc' for option '--points' as expecte" },
        { ["coexist", "propane", "-T", "300", "--uncertainty", "monte-carlo", "--samples", "0"], ExitCodes.Usage, "--samples: must be between 2 and 10000000, got 0" },
        { ["coexist", "propane", "-T", "300", "--uncertainty", "monte-carlo", "--seed", "abc"], ExitCodes.Usage, "Cannot parse argument 'abc' for option '--seed' as expected" },
        { ["coexist", "propane", "-T", "300", "--uncertainty", "monte-carlo", "--seed", "-4"], ExitCodes.Usage, "--seed: must be 0 or more, got -4" },
        { ["coexist", "propane", "-T", "300", "--uncertainty", "nonsense"], ExitCodes.Usage, "--uncertainty: unknown method 'nonsense' (use linear or mon" },
        { ["coexist", "propane", "-T", "300", "--samples", "100"], ExitCodes.Usage, "--samples: applies only with --uncertainty monte-carlo" },
        { ["curve", "propane", "--uncertainty", "linear", "--seed", "3"], ExitCodes.Usage, "--seed: applies only with --uncertainty monte-carlo" },
        { ["curve", "propane", "--uncertainty", "monte-carlo", "--samples", "1"], ExitCodes.Usage, "--samples: must be between 2 and 10000000, got 1" },
        { ["state", "propane", "-T", "300", "-P", "1MPa", "--uncertainty", "exact"], ExitCodes.Usage, "--uncertainty: unknown method 'exact' (use linear or monte-" },
        { ["latent", "{dir}/ok.csv", "--form", "antoine", "--samples", "10"], ExitCodes.Usage, "--samples: applies only with --uncertainty monte-carlo" },
        { ["derive", "propane", "--of", "H", "--by", "T", "--hold", "P", "-T", "300", "-P", "1e6", "--units", "engineering"], ExitCodes.Usage, "Unrecognized command or argument '--units'." },
        { ["fit", "{dir}/ok.csv", "--form", "antoine", "--units", "engineering"], ExitCodes.Usage, "Unrecognized command or argument '--units'." },
        { ["latent", "{dir}/ok.csv", "--form", "antoine", "--volume-model", "eos"], ExitCodes.Usage, "--volume-model eos: needs --fluid (the coexisting volumes co" },
        { ["fluids", "list", "--units", "furlongs"], ExitCodes.Usage, "--units: unknown unit system 'furlongs' (use si or engineeri" },
        { ["coexist", "propane", "-T", "300", "--diagnostics", "yes"], ExitCodes.Usage, "Unrecognized command or argument 'yes'." },        { ["fit", "{dir}/ok.csv", "--form", "antoine", "--temperature-unit", "degC"], ExitCodes.DataFile, "the header gives the unit 'K' but --temperature-unit says 'degC'" },
        { ["fit", "{dir}/ok.csv", "--form", "antoine", "--pressure-unit", "bar"], ExitCodes.DataFile, "the header gives the unit 'kPa' but --pressure-unit says 'bar'" },
        { ["mixture", "methane=0.5,metane=0.5"], ExitCodes.Fluid, "MIXTURE: component 2: unknown fluid 'metane'; did you mean 'methane'" },
        { ["envelope", "methane=1"], ExitCodes.Usage, "MIXTURE: a phase envelope needs at least two components, got only 'methane'" },
        { ["envelope", "methane=0.5,ethane=0.5", "--min-pressure", "20 MPa"], ExitCodes.Usage, "--min-pressure: '20 MPa' is above 10 MPa; the envelope is trac" },
        { ["envelope", "methane=0.5,ethane=0.4"], ExitCodes.Usage, "MIXTURE: the mole fractions of methane (0.5), ethane (0.4) sum to 0.9, not 1" },
        { ["mixture", "methane=0.5,CH4=0.5"], ExitCodes.Usage, "MIXTURE: component 'methane' is given twice (components 1 and 2)" },
        { ["mixture", "methane=1.2,ethane=-0.2"], ExitCodes.Usage, "MIXTURE: the mole fraction of 'ethane' is -0.2; a fraction must" },
        { ["mixture", "methane=0.5,ethane=0.4"], ExitCodes.Usage, "MIXTURE: the mole fractions of methane (0.5), ethane (0.4) sum to 0.9, not 1" },
        { ["mixture", "r-32=0.23,r-125=0.25,r-134a=0.5", "--mass-fractions"], ExitCodes.Usage, "MIXTURE: the mass fractions of r-32 (0.23), r-125 (0.25), r-134a (0.5) sum to 0.98" },
        { ["mixture", "methane=0.5,ethane"], ExitCodes.Usage, "MIXTURE: item 2: 'ethane' is not NAME=FRACTION" },
        { ["mixture", "methane=0.5,ethane=half"], ExitCodes.Usage, "MIXTURE: item 2: the fraction of 'ethane' is 'half', not a number" },
        { ["mixture", "methane=0.5,,ethane=0.5"], ExitCodes.Usage, "MIXTURE: item 2 is empty" },
        { ["mixture", "inline:tc=300K,pc=4MPa,omega=0.1=0.5,methane=0.5"], ExitCodes.Usage, "MIXTURE: an inline fluid cannot be a component" },
        { ["mixture", "methane=0.5,{dir}/nomass.fluid=0.5", "--mass-fractions"], ExitCodes.Fluid, "MIXTURE: --mass-fractions: fluid 'nomass' gives no molar mass" },
        { ["binary", "benzene=0.5,cyclohexane=0.5"], ExitCodes.Usage, "binary: give exactly one of --temperature (P-x-y) and --pressure (T-x-y)" },
        { ["binary", "benzene=0.5,cyclohexane=0.5", "-T", "300", "-P", "1 atm"], ExitCodes.Usage, "binary: give exactly one of --temperature (P-x-y) and --pressure (T-x-y)" },
        { ["binary", "benzene=0.5,cyclohexane=0.5", "-P", "1 atm", "--points", "2"], ExitCodes.Usage, "--points: '2' is not a whole number from 3 to 10001" },
        { ["binary", "benzene=0.5,cyclohexane=0.5", "-P", "1 atm", "--points", "ten"], ExitCodes.Usage, "--points: 'ten' is not a whole number from 3 to 10001" },
        { ["binary", "methane=0.3,ethane=0.3,propane=0.4", "-T", "150"], ExitCodes.Usage, "MIXTURE: binary needs a binary (two components); got 3" },
        { ["binary", "methane=0.5,propane=0.5", "-T", "250"], ExitCodes.OutOfRange, "250 K is not below the critical temperature of methane" },
        { ["binary", "methane=0.5,propane=0.5", "-P", "50 bar"], ExitCodes.OutOfRange, "5000000 Pa is not below the critical pressure of methane" },
        { ["binary", "benzene=0.5,cyclohexane=0.5", "-P", "1 atm", "--format", "xml"], ExitCodes.Usage, "--format: unknown format 'xml'" },
        { ["fit-kij", "{dir}/no-such.csv", "--components", "ethanol,water"], ExitCodes.DataFile, "no-such.csv: data file not found" },
        { ["fit-kij", "{dir}/ok.csv", "--components", "ethanol,water"], ExitCodes.DataFile, "the header needs columns 'T [unit]', 'P [unit]' and 'x1'" },
        { ["fit-kij", "{dir}/vlenounits.csv", "--components", "ethanol,water"], ExitCodes.DataFile, "the temperature column needs its unit in the header" },
        { ["fit-kij", "{dir}/vlebad.csv", "--components", "ethanol,water"], ExitCodes.DataFile, "x1 = 1.5 is not a mole fraction from 0 to 1" },
        { ["fit-kij", "{dir}/vleone.csv", "--components", "ethanol,water"], ExitCodes.DataFile, "1 data row after the header; at least 2 are needed" },
        { ["fit-kij", "{dir}/vlebad.csv", "--components", "ethanol"], ExitCodes.Usage, "--components: 'ethanol' is not two component names A,B" },
        { ["fit-kij", "{dir}/vlebad.csv", "--components", "ethanol,etanol"], ExitCodes.Fluid, "unknown fluid 'etanol'" },
        { ["fit-kij", "{dir}/vlebad.csv", "--components", "ethanol,C2H5OH"], ExitCodes.Usage, "--components: 'ethanol' is given twice" },
        { ["fit-kij", "{dir}/vlebad.csv", "--components", "ethanol,water", "--format", "csv"], ExitCodes.Usage, "--format: fit-kij reports as table or json" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane,ethane=abc"], ExitCodes.Usage, "--kij: the k_ij of 'methane,ethane' is 'abc', not a number" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane;ethane=0.1"], ExitCodes.Usage, "--kij: 'methane;ethane=0.1' is not A,B=VALUE" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane,ethane=1.5"], ExitCodes.Usage, "--kij: k_ij of methane, ethane is 1.5; it must be between -1 and 1" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane,ethane=0.1", "--kij", "C2H6,CH4=0.2"], ExitCodes.Usage, "--kij: k_ij of methane, ethane is given twice" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane,methane=0.1"], ExitCodes.Usage, "--kij: interaction parameter 1 is for components 1 and 1" },
        { ["mixture", "methane=0.5,ethane=0.5", "--kij", "methane,propane=0.1"], ExitCodes.Usage, "--kij 'methane,propane=0.1': 'propane' is not a component of the mixture (components: methane, ethane)" },
        { ["mixture", "methane=1", "--volume-shift", "1 cm3/mol"], ExitCodes.Usage, "--volume-shift: a mixture takes fluid, none or peneloux" },
        { ["mixture", "methane=1", "--format", "csv"], ExitCodes.Usage, "--format: mixture writes table or json" },
        { ["mixture", "methane=0.5,n-butane=0.5", "--alpha", "mathias-copeman"], ExitCodes.OutOfRange, "no Mathias-Copeman parameters for n-butane with Peng-Robinson" },
        { ["mixture", "{dir}/blend.mixture", "--mass-fractions"], ExitCodes.Usage, "--mass-fractions: applies to a MIXTURE written NAME=FRACTION" },
        { ["mixture", "{dir}/no-such.mixture"], ExitCodes.Fluid, "no-such.mixture: mixture file not found" },
        { ["mixture", "methane"], ExitCodes.Usage, "MIXTURE: 'methane' is neither NAME=FRACTION,NAME=FRACTION,... (e.g. methane=1" },
        { ["mixture", "R-32=23,R-125=25,R-134a=52", "--mass-fractions"], ExitCodes.Usage, "sum to 100, not 1 (tolerance 1E-06); these look like percentages" },
        { ["mixture", "{dir}/no-such.mixture", "--kij", "a,b=2"], ExitCodes.Usage, "--kij: k_ij of a, b is 2; it must be between -1 and 1" },
        { ["bubble", "methane=0.2,propane=0.8"], ExitCodes.Usage, "bubble: give exactly one of --temperature and --pressure" },
        { ["dew", "methane=0.2,propane=0.8", "-T", "250", "-P", "1 MPa"], ExitCodes.Usage, "dew: give exactly one of --temperature and --pressure" },
        { ["bubble", "methane=0.9,propane=0.1", "-T", "300"], ExitCodes.NotConverged, "no bubble point found at 300 K" },
        { ["flash", "methane=0.2,propane=0.8", "-T", "250"], ExitCodes.Usage, "flash: give --pressure with one of --temperature, --enthalpy" },
        { ["flash", "methane=0.2,propane=0.8", "-P", "1 MPa", "-T", "250", "--entropy", "1 J/(mol*K)"], ExitCodes.Usage, "flash: give exactly one of --temperature, --enthalpy and --entropy" },
        { ["flash", "methane=1,propane=0", "-P", "1 MPa", "-T", "250"], ExitCodes.OutOfRange, "mole fraction 0 of component 1: a flash or stability test needs every component present" },
        { ["flash", "methane=0.2,propane=0.8", "-P", "1 MPa", "--enthalpy", "1e9 J/mol"], ExitCodes.OutOfRange, "no temperature between" },
        { ["flash", "methane=0.2,propane=0.8", "-P", "1 MPa", "--enthalpy", "1 kJ/mole"], ExitCodes.Usage, "--enthalpy: unknown" },
        { ["mixture", "{dir}/sum.mixture"], ExitCodes.Fluid, "sum.mixture:3: field 'component': the mole fractions of methane (0.5), ethane (0.4) sum to 0.9" },
        { ["mixture", "{dir}/badfluid.mixture"], ExitCodes.Fluid, "badfluid.mixture:2: field 'component': component 'hugemass.fluid': " },
        { ["mixture", "/dev/zero"], ExitCodes.Fluid, "cannot read mixture file: a line is longer than the limit" },
        // --units on the mixture commands: a misspelt system, JSON (always SI), and per-kilogram
        // units for a component without a molar mass (each phase's Σ x_i M_i needs every M_i).
        { ["bubble", "methane=0.2,propane=0.8", "-T", "250", "--units", "imperial"], ExitCodes.Usage, "--units: unknown unit system 'imperial' (use si or engineer" },
        { ["dew", "methane=0.2,propane=0.8", "-T", "250", "--units", "Engineering "], ExitCodes.Usage, "--units: unknown unit system 'Engineering ' (use si or eng" },
        { ["flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "1MPa", "--units", "eng"], ExitCodes.Usage, "--units: unknown unit system 'eng' (use si or engineering)" },
        { ["envelope", "methane=0.8,ethane=0.2", "--units", "metric"], ExitCodes.Usage, "--units: unknown unit system 'metric' (use si or engineerin" },
        { ["binary", "benzene=0.5,cyclohexane=0.5", "-P", "1atm", "--units", "us"], ExitCodes.Usage, "--units: unknown unit system 'us' (use si or engineering)" },
        { ["flash", "methane=0.2,propane=0.8", "-T", "250", "-P", "1MPa", "--format", "json", "--units", "engineering"], ExitCodes.Usage, "--units: applies to tables and CSV only; json output is alwa" },
        { ["bubble", "methane=0.5,{dir}/nomass.fluid=0.5", "-T", "250", "--units", "engineering"], ExitCodes.Fluid, "field 'molar_mass': fluid 'nomass' gives no molar mass, whic" },
        { ["flash", "methane=0.5,{dir}/nomass.fluid=0.5", "-T", "250", "-P", "1MPa", "--format", "csv", "--units", "engineering"], ExitCodes.Fluid, "field 'molar_mass': fluid 'nomass' gives no molar mass, whic" },
        // report (its --out is the HTML file; each case refuses before anything is written).
        { ["report", "no-such-fluid"], ExitCodes.Fluid, "no-such-fluid" },
        { ["report", "propane", "--step", "0"], ExitCodes.Usage, "--step:" },
        { ["report", "propane", "--step", "500 K"], ExitCodes.Usage, "--step: 500 K is not below the range" },
        { ["report", "propane", "--eos", "xyz"], ExitCodes.Usage, "--eos: unknown model 'xyz'" },
        { ["report", "propane", "--units", "metric"], ExitCodes.Usage, "--units: unknown unit system 'metric'" },
        { ["report", "propane", "--temperature-unit", "K"], ExitCodes.Usage, "--temperature-unit: is the unit of a --data column; give --data too" },
        { ["report", "propane", "--data", "{dir}/falling.csv"], ExitCodes.OutOfRange, "the vapour pressure falls with temperature, from 1802700 Pa" },
        { ["report", "propane", "--data", "{dir}/no-such.csv"], ExitCodes.DataFile, "no-such.csv: data file not found" },
        { ["report", "methane=0.5,ethane=0.5", "--data", "{dir}/ok.csv"], ExitCodes.Usage, "--data: measured vapour pressures belong to a pure fluid" },
        { ["report", "methane=0.5,ethane=0.5", "--step", "10"], ExitCodes.Usage, "--step: the saturation table is a pure fluid's" },
        { ["report", "{dir}/nomass.fluid", "--units", "engineering"], ExitCodes.Fluid, "field 'molar_mass': fluid 'nomass' gives no molar mass" },
        { ["report", "{dir}/sum.mixture"], ExitCodes.Fluid, "sum.mixture:3: field 'component': the mole fractions" },
        // derive --from-measured, --explain and the second derivatives (docs/derivatives.md).
        { ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300 ± 1", "-P", "1e5"], ExitCodes.Usage, "--temperature: a ± uncertainty is taken with --from-measured only" },
        { ["derive", "--from-measured", "beta=1e-3", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured: unknown key 'beta' (use alpha, kappa_t, cp" },
        { ["derive", "--from-measured", "alpha=1e-3,alpha=2e-3", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured: alpha is given twice" },
        { ["derive", "--from-measured", "alpha 1e-3", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured: 'alpha 1e-3' is not key=value" },
        { ["derive", "--from-measured", "alpha=", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured alpha: no value after '='" },
        { ["derive", "--from-measured", "alpha=1e-3 1/degC", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured alpha: unknown expansivity unit '1/degC'" },
        { ["derive", "--from-measured", "kappa_t=-1e-9", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured kappa_t: the value in '-1e-9' must be above zero" },
        { ["derive", "--from-measured", "alpha=1e-3 ± -1e-5", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured alpha: the standard uncertainty in '1e-3 ± -1e-5' must be" },
        { ["derive", "--from-measured", "cp=1.7 kJ/(kg*K)", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured cp: a value in kJ/(kg·K) needs --molar-mass" },
        { ["derive", "--from-measured", "", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured: empty list" },
        { ["derive", "propane", "--from-measured", "alpha=1e-3", "--of", "U", "--by", "V", "--hold", "T"], ExitCodes.Usage, "--from-measured: takes no FLUID (got 'propane')" },
        { ["derive", "--from-measured", "alpha=1e-3", "--of", "U", "--by", "V", "--hold", "T", "--density", "100"], ExitCodes.Usage, "--density: does not apply with --from-measured" },
        { ["derive", "--from-measured", "alpha=1e-3", "--of", "U", "--by", "V", "--hold", "T", "--eos", "srk"], ExitCodes.Usage, "--eos: does not apply with --from-measured" },
        { ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9,cp=100", "--of", "G", "--by", "T", "--hold", "P", "-T", "300"], ExitCodes.Usage, "--entropy: (dG/dT)_P = -s needs the absolute molar entropy s" },
        { ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9", "--of", "U", "--by", "V", "--hold", "T", "-P", "1e5"], ExitCodes.Usage, "--temperature: (dU/dV)_T = T*alpha/kappa_T - P needs the temperature T" },
        { ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9", "--of", "U", "--by", "V", "--hold", "T", "-T", "300 ± 1 ± 2", "-P", "1e5"], ExitCodes.Usage, "--temperature: more than one uncertainty" },
        { ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9,cp=100", "--of", "w", "-T", "300", "--molar-volume", "1e-4"], ExitCodes.Usage, "--molar-mass: the speed of sound w" },
        { ["derive", "--from-measured", "alpha=1e-3,kappa_t=1e-9,cp=100", "--of", "w", "--by", "P", "-T", "300", "--molar-volume", "1e-4"], ExitCodes.Usage, "--by: the speed of sound w is not a partial derivative" },
        { ["derive", "--from-measured", "alpha=1e-2,kappa_t=1e-11,cp=10", "--of", "w", "-T", "300", "--molar-volume", "1e-4", "--molar-mass", "0.1 kg/mol"], ExitCodes.OutOfRange, "no speed of sound" },
        { ["derive", "--from-measured", "alpha=1e-3", "--of", "cp", "--by", "P", "--hold", "T"], ExitCodes.Usage, "--of: (dcp/dP)_T needs a second derivative of the equation of state" },
        { ["derive", "propane", "--of", "w", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "--of: w (the speed of sound) is computed here from --from-measured values" },
        { ["derive", "propane", "--of", "cp", "--by", "V", "--hold", "T", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "--of: cp is offered as (dcp/dP)_T only" },
        { ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1e5", "--molar-volume", "1e-4"], ExitCodes.Usage, "--molar-volume: applies with --from-measured only" },
        { ["derive", "propane", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1e5", "--molar-mass", "44 g/mol"], ExitCodes.Usage, "--molar-mass: applies with --from-measured only" },
        { ["derive", "--of", "U", "--by", "V", "--hold", "T", "-T", "300", "-P", "1e5"], ExitCodes.Usage, "FLUID: required" },
        { ["derive", "inline:tc=369.89K,pc=4.2512MPa,omega=0.152", "--of", "T", "--by", "P", "--hold", "H", "-T", "300", "-P", "2e6", "--explain"], ExitCodes.Fluid, "ideal_gas_cp" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void BadInput_RefusedCleanly_OutputFileUntouched(string[] args, int expectedCode, string messagePart)
    {
        using var folder = new TempFolder();
        WriteFixtures(folder);
        string output = folder.File(args[0] switch { "plot" => "out.png", "report" => "out.html", _ => "out.txt" });
        const string sentinel = "sentinel: a failed run must leave this file as it was\n";
        File.WriteAllText(output, sentinel);
        string[] before = folder.Entries();
        string[] resolved = [.. args.Select(a => a.Replace("{dir}", folder.Path, StringComparison.Ordinal)), "--out", output];

        var result = CliHarness.Run(resolved);

        CliHarness.AssertFailure(result, expectedCode, messagePart);
        Assert.Equal(sentinel, File.ReadAllText(output));
        Assert.Equal(before, folder.Entries());
    }

    /// <summary>Small data and fluid files, each with one thing wrong (invented values, for tests only).</summary>
    private static void WriteFixtures(TempFolder folder)
    {
        File.WriteAllText(folder.File("ok.csv"), "T [K],P [kPa]\n250,218.4\n270,415.6\n290,722.4\n310,1172.6\n330,1802.7\n");
        File.WriteAllText(folder.File("falling.csv"), "T [K],P [kPa]\n250,1802.7\n270,1172.6\n290,722.4\n310,415.6\n330,218.4\n");
        File.WriteAllText(folder.File("dup.csv"), "T [K],P [kPa]\n250,218.4\n250,300\n290,722.4\n310,1172.6\n330,1802.7\n");
        File.WriteAllText(folder.File("badnum.csv"), "T [K],P [kPa]\n250,abc\n");
        File.WriteAllText(folder.File("nounits.csv"), "T,P\n250,218.4\n");
        string propane = CliHarness.CatalogFileText("propane.fluid");
        File.WriteAllText(folder.File("hugemass.fluid"), ReplaceLine(propane, "molar_mass", "molar_mass 1e308 g/mol | invented for a test"));
        File.WriteAllText(folder.File("badhazard.fluid"), ReplaceLine(propane, "hazard_class", "hazard_class A4 | invented for a test"));
        File.WriteAllText(folder.File("lowomega.fluid"), ReplaceLine(ReplaceLine(ReplaceLine(propane, "acentric_factor", "acentric_factor -0.5 | invented for a test"),
            "name", "name lowomega"), "synonyms", ""));
        // Water without its triple-point pressure, and without any way to its sublimation line.
        string water = CliHarness.CatalogFileText("water.fluid");
        File.WriteAllText(folder.File("notriple.fluid"), ReplaceLine(ReplaceLine(ReplaceLine(water, "triple_point_pressure", ""), "name", "name notriple"), "synonyms", ""));
        File.WriteAllText(folder.File("nosublimation.fluid"), ReplaceLine(ReplaceLine(ReplaceLine(ReplaceLine(water, "sublimation_pressure_equation", ""), "enthalpy_of_fusion", ""),
            "name", "name nosublimation"), "synonyms", ""));
        // Propane with its triple-point temperature only (no triple-point pressure or solid lines).
        string tonly = ReplaceLine(ReplaceLine(propane, "name", "name tonly"), "synonyms", "");
        foreach (string key in new[] { "triple_point_pressure", "enthalpy_of_fusion", "solid_density", "triple_point_liquid_density", "fusion_volume_change",
                     "solid_heat_capacity", "melting_pressure_equation", "sublimation_pressure_equation" })
        {
            tonly = ReplaceLine(tonly, key, "");
        }

        File.WriteAllText(folder.File("tonly.fluid"), tonly);
        File.WriteAllText(folder.File("nomass.fluid"), ReplaceLine(ReplaceLine(ReplaceLine(propane, "molar_mass", ""), "name", "name nomass"), "synonyms", ""));
        // Water's file with one solid-phase key (or the melting equation with it) taken out.
        File.WriteAllText(folder.File("water-nopt.fluid"), ReplaceLine(water, "triple_point_pressure", ""));
        File.WriteAllText(folder.File("water-nofusion.fluid"), ReplaceLine(ReplaceLine(water, "enthalpy_of_fusion", ""), "melting_pressure_equation", ""));
        File.WriteAllText(folder.File("water-nodv.fluid"), ReplaceLine(ReplaceLine(ReplaceLine(water, "solid_density", ""), "triple_point_liquid_density", ""), "melting_pressure_equation", ""));
        File.WriteAllText(folder.File("vlenounits.csv"), "T,P [kPa],x1,y1\n351,101.325,0.5,0.6\n352,101.325,0.4,0.55\n");
        File.WriteAllText(folder.File("vlebad.csv"), "T [K],P [kPa],x1,y1\n351,101.325,1.5,0.6\n352,101.325,0.4,0.55\n");
        File.WriteAllText(folder.File("vleone.csv"), "T [K],P [kPa],x1,y1\n351,101.325,0.5,0.6\n");
        File.WriteAllText(folder.File("blend.mixture"), "format phaseslope-mixture 1\ncomponent methane = 0.5\ncomponent ethane = 0.5\n");
        File.WriteAllText(folder.File("sum.mixture"), "format phaseslope-mixture 1\ncomponent methane = 0.5\ncomponent ethane = 0.4\n");
        File.WriteAllText(folder.File("badfluid.mixture"), "format phaseslope-mixture 1\ncomponent hugemass.fluid = 1\n");
    }

    private static string ReplaceLine(string text, string key, string line)
        => string.Join('\n', text.Split('\n').Select(l => l.StartsWith(key + " ", StringComparison.Ordinal) ? line : l));
}
