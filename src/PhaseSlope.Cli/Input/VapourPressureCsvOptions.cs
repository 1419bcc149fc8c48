namespace PhaseSlope.Cli.Input;

/// <summary>Units for the columns of a vapour-pressure file whose header gives none.</summary>
/// <param name="TemperatureUnit">Unit of a temperature column written without a unit (the
/// command-line option <c>--temperature-unit</c>), for example <c>K</c> or <c>degC</c>; null when
/// not given, in which case such a column is an error.</param>
/// <param name="PressureUnit">Unit of a pressure or absolute-uncertainty column written without a
/// unit (the command-line option <c>--pressure-unit</c>), for example <c>kPa</c>; null when not
/// given, in which case such a column is an error.</param>
/// <param name="MinimumRows">The fewest data rows accepted: two for a fit (a line needs two
/// points), one for <c>tune</c>, which takes the acentric factor from one point.</param>
internal sealed record VapourPressureCsvOptions(string? TemperatureUnit = null, string? PressureUnit = null, int MinimumRows = VapourPressureCsv.MinimumRows);
