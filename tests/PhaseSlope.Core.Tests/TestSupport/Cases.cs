using PhaseSlope.Core.Fluids;
using PhaseSlope.Core.Models;

namespace PhaseSlope.Core.Tests.TestSupport;

/// <summary>Shared theory data: every model, and every catalog fluid with every model.</summary>
public static class Cases
{
    /// <summary>Every <see cref="CubicModelKind"/>.</summary>
    public static TheoryData<CubicModelKind> EveryModel()
    {
        var data = new TheoryData<CubicModelKind>();
        foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
        {
            data.Add(kind);
        }

        return data;
    }

    /// <summary>Every fluid of the embedded catalog with every model.</summary>
    public static TheoryData<string, CubicModelKind> EveryFluidAndModel()
    {
        var data = new TheoryData<string, CubicModelKind>();
        foreach (Fluid fluid in FluidCatalog.Embedded.All)
        {
            foreach (CubicModelKind kind in Enum.GetValues<CubicModelKind>())
            {
                data.Add(fluid.Name, kind);
            }
        }

        return data;
    }
}
