using System.Globalization;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>A one-line description of a model for table titles.</summary>
internal static class ModelText
{
    /// <summary>"Peng-Robinson (1976)", plus the alpha function and volume shift when they are not the defaults.</summary>
    public static string Describe(CubicModel model)
    {
        string text = model.Kind.Title();
        if (model.Alpha is TwuAlpha or GeneralisedTwuAlpha or MathiasCopemanAlpha)
        {
            text += $", {model.Alpha.Description}";
        }

        if (model.VolumeShift != 0)
        {
            text += string.Create(CultureInfo.InvariantCulture, $", volume shift {model.VolumeShift * 1e6:G6} cm3/mol");
        }

        return text;
    }
}
