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
}
