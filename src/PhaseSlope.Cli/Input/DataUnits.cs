using PhaseSlope.Core.Units;

namespace PhaseSlope.Cli.Input;

/// <summary>The temperature and pressure units of data-file headers and of the
/// <c>--temperature-unit</c>/<c>--pressure-unit</c> options: a view of the one unit table of the
/// core (<see cref="UnitTable"/>), with its case-sensitive spellings and its exact decimal
/// conversion.</summary>
/// <remarks>A cell is converted in decimal arithmetic from its decimal reading and rounded to a
/// double once (<see cref="Unit.ToSi(decimal)"/>), so a file in degC or kPa gives the double
/// nearest to the exact converted value, the same as the command line: 25 degC is the double
/// 298.15 and 101.325 kPa is 101325 Pa. A cell that does not fit a decimal is converted in double
/// arithmetic.</remarks>
internal static class DataUnits
{
    /// <summary>Looks a temperature unit up (case-sensitive); false when the spelling is unknown.</summary>
    internal static bool TryTemperature(string symbol, out Unit unit)
    {
        bool found = UnitTable.TryFind(symbol, out Unit? u, Dimension.Temperature);
        unit = u!;
        return found;
    }

    /// <summary>Looks an absolute-pressure unit up (case-sensitive); false when the spelling is
    /// unknown or a gauge unit.</summary>
    internal static bool TryPressure(string symbol, out Unit unit)
    {
        bool found = UnitTable.TryFind(symbol, out Unit? u, Dimension.Pressure);
        unit = u!;
        return found;
    }

    /// <summary>Whether the spelling is a gauge-pressure unit, which is never accepted.</summary>
    internal static bool IsGauge(string symbol) => UnitTable.IsGauge(symbol);

    /// <summary>"unknown temperature unit 'x'; did you mean …?" or with the list of units.</summary>
    internal static string UnknownTemperature(string symbol)
        => UnitTable.UnknownMessage(symbol, "temperature", Dimension.Temperature);

    /// <summary>"unknown pressure unit 'x'; did you mean …?" or with the list of units.</summary>
    internal static string UnknownPressure(string symbol)
        => UnitTable.UnknownMessage(symbol, "pressure", Dimension.Pressure);

    /// <summary>The list of absolute-pressure units for messages.</summary>
    internal static string PressureChoices
        => UnitTable.JoinOr([.. UnitTable.Of(Dimension.Pressure).Select(unit => unit.Symbol)]);

    /// <summary>Converts a cell to the SI unit of <paramref name="unit"/>: in decimal from the
    /// cell's text where it fits a decimal, in double otherwise.</summary>
    internal static double ToSi(Unit unit, double value, string text) => QuantityText.Convert(text, value, unit);
}
