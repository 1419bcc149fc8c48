using PhaseSlope.Core.Estimation;

namespace PhaseSlope.Cli.Output;

/// <summary>One cross-check of <c>fluids estimate</c>: the comparison, and whether the Joback
/// value is the one written (a value given by the user is not an estimate, so its disagreement
/// is no finding).</summary>
/// <param name="Item">The comparison from the core.</param>
/// <param name="Used">True when the fluid takes the Joback-based value.</param>
internal sealed record EstimateCheck(CrossCheckItem Item, bool Used)
{
    /// <summary>The quantity in words.</summary>
    public string Label => Item.Quantity switch
    {
        "critical_temperature" => "critical temperature",
        "critical_pressure" => "critical pressure",
        "critical_volume" => "critical volume",
        _ => "acentric factor",
    };

    /// <summary>The SI unit of the values ("" for the acentric factor).</summary>
    public string Unit => Item.Quantity switch
    {
        "critical_temperature" => "K",
        "critical_pressure" => "Pa",
        "critical_volume" => "m3/mol",
        _ => "",
    };

    /// <summary>The JSON key suffix with the unit.</summary>
    public string Key => Item.Quantity switch
    {
        "critical_temperature" => "critical_temperature_K",
        "critical_pressure" => "critical_pressure_Pa",
        "critical_volume" => "critical_volume_m3_per_mol",
        _ => "acentric_factor",
    };

    /// <summary>The difference as text: "+1.2 %" or "+0.013".</summary>
    public string DifferenceText => Item.Difference is double d
        ? Item.Relative ? $"{Signed(d * 100)} %" : Signed(d)
        : "";

    /// <summary>The threshold as text: "5 %" or "0.05".</summary>
    public string ThresholdText => Item.Relative ? $"{NumberText.Table(Item.Threshold * 100)} %" : NumberText.Table(Item.Threshold);

    /// <summary>One line saying that the methods disagree on a value written, or null.</summary>
    public string? Finding => Used && Item.Exceeds
        ? $"Joback and the Lydersen cross-check differ by {DifferenceText} in the {Label} (more than {ThresholdText}): at least one method is probably off for this molecule; {Advice}"
        : null;

    /// <summary>A value for a table or comment: the acentric factor to three decimals, the rest
    /// with the table's seven significant digits.</summary>
    public static string Number(double value, string quantity) => quantity == "acentric_factor"
        ? FiniteNumbers.Check(value, quantity).ToString("0.000", System.Globalization.CultureInfo.InvariantCulture)
        : NumberText.Table(value);

    /// <summary>"VALUE UNIT" (just the value for the acentric factor).</summary>
    public string WithUnit(double value) => Unit.Length == 0 ? Number(value, Item.Quantity) : $"{Number(value, Item.Quantity)} {Unit}";

    private string Advice => Item.Quantity switch
    {
        "critical_temperature" => "measure Tc or give --tc",
        "critical_pressure" => "measure Pc or give --pc",
        "critical_volume" => "the critical density written is uncertain accordingly",
        _ => "give --omega from measured vapour pressures",
    };

    // Relative differences to 0.1 % and acentric factors to 0.001: the methods are good to a few
    // percent and a few hundredths at best.
    private string Signed(double value)
    {
        string text = FiniteNumbers.Check(value, "difference").ToString(Item.Relative ? "0.0" : "0.000", System.Globalization.CultureInfo.InvariantCulture);
        return value >= 0 && !text.StartsWith('-') ? "+" + text : text;
    }
}
