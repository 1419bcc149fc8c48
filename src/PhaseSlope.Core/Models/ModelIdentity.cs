using System.Globalization;

namespace PhaseSlope.Core.Models;

/// <summary>The whole name of a model, echoed by every result: the equation of state, the
/// alpha function with its parameters and source, and the volume translation.</summary>
/// <param name="Equation">Short identifier of the equation, as <c>--eos</c> takes it (for example "pr").</param>
/// <param name="Title">Readable title with its year (for example "Peng-Robinson (1976)").</param>
/// <param name="Alpha">The alpha function with its parameters and published source, or the
/// model's own temperature dependence when it has no alpha function to choose.</param>
/// <param name="VolumeShift">Volume translation c in m³/mol (v = v_cubic − c); 0 for none.</param>
public sealed record ModelIdentity(string Equation, string Title, string Alpha, double VolumeShift)
{
    /// <summary>One line: the title, then the alpha function when <paramref name="withAlpha"/>,
    /// then the volume shift when there is one.</summary>
    public string Describe(bool withAlpha = false)
    {
        string text = withAlpha ? $"{Title}, {Alpha}" : Title;
        return VolumeShift != 0
            ? text + string.Create(CultureInfo.InvariantCulture, $", volume shift {VolumeShift * 1e6:G6} cm3/mol")
            : text;
    }
}
