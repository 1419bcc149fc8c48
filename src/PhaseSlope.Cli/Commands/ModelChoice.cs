using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Cli.Commands;

/// <summary>The model named by --eos, --alpha and --volume-shift, checked for spelling; the
/// fluid turns it into a <see cref="CubicModel"/>.</summary>
/// <param name="Kind">The cubic model (--eos).</param>
/// <param name="Alpha">The alpha function (--alpha).</param>
/// <param name="VolumeShiftText">The --volume-shift text: none, peneloux or a volume.</param>
internal sealed record ModelChoice(CubicModelKind Kind, AlphaForm Alpha, string VolumeShiftText)
{
    /// <summary>The model for <paramref name="fluid"/>.</summary>
    public CubicModel For(Fluid fluid)
        => CubicModel.For(Kind, fluid, Alpha, CommonOptions.ParseShift(VolumeShiftText, Kind, fluid));

    /// <summary>Whether the --volume-shift text suits a mixture: fluid, none or peneloux (each
    /// component's own), not one volume for every component.</summary>
    public bool ShiftSuitsMixture => VolumeShiftText.Trim().ToLowerInvariant() is "fluid" or "none" or "peneloux";

    /// <summary>The cubic mixture model of <paramref name="mixture"/>: each component's model built
    /// as <see cref="For(Fluid)"/> builds a pure fluid's, with the mixture's k_ij for this model.</summary>
    /// <exception cref="Units.UsageException">The volume shift is one volume (see <see cref="ShiftSuitsMixture"/>).</exception>
    public CubicMixtureModel ForMixture(Core.Mixtures.Mixture mixture)
        => ShiftSuitsMixture
            ? mixture.CreateModel(Kind, Alpha, fluid => CommonOptions.ParseShift(VolumeShiftText, Kind, fluid))
            : throw new Units.UsageException($"--volume-shift: a mixture takes fluid, none or peneloux (each component's own), not one volume '{VolumeShiftText}' for every component");
}
