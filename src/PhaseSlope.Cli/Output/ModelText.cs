using System.Text.Json;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Output;

/// <summary>How a model is named in tables (one line) and in JSON (the <c>model</c> object).</summary>
internal static class ModelText
{
    /// <summary>"Peng-Robinson (1976)", plus the alpha function when it is not the model's own
    /// (its description carries its parameters and source) and the volume shift when there is one.</summary>
    public static string Describe(IResidualModel model)
    {
        var inner = model is CountingModel counting ? counting.Inner : model;
        bool chosenAlpha = inner is CubicModel cubic && cubic.Alpha is TwuAlpha or GeneralisedTwuAlpha or MathiasCopemanAlpha or SoaveAlpha { FluidSpecific: true };
        return model.Identity.Describe(withAlpha: chosenAlpha);
    }

    /// <summary>Writes <c>"eos"</c> (the short identifier, as <c>--eos</c> takes it) and the
    /// <c>"model"</c> object naming the whole model: equation, title, alpha function with its
    /// parameters and source, and volume shift in m³/mol.</summary>
    public static void WriteJson(Utf8JsonWriter json, ModelIdentity identity)
    {
        json.WriteString("eos", identity.Equation);
        json.WriteStartObject("model");
        json.WriteString("equation", identity.Equation);
        json.WriteString("title", identity.Title);
        json.WriteString("alpha", identity.Alpha);
        json.WriteFinite("volume_shift_m3_mol", identity.VolumeShift);
        json.WriteEndObject();
    }
}
