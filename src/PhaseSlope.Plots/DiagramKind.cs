namespace PhaseSlope.Plots;

/// <summary>The phase diagrams PhaseSlope draws.</summary>
public enum DiagramKind
{
    /// <summary>Saturation pressure against temperature, with the critical point.</summary>
    PressureTemperature,

    /// <summary>ln P against 1/T, where the Clausius–Clapeyron approximation is a straight line.</summary>
    LnPressureInverseTemperature,

    /// <summary>The coexistence dome in temperature–density with the rectilinear diameter.</summary>
    TemperatureDensity,

    /// <summary>The Clapeyron slope dPsat/dT along the saturation line.</summary>
    Slope,

    /// <summary>The enthalpy of vaporization against temperature.</summary>
    Latent,

    /// <summary>Isotherms in pressure–molar volume with their loops and the tie lines.</summary>
    PressureVolume,

    /// <summary>The temperature–entropy dome with isobars, lines of constant quality and optional isochores.</summary>
    TemperatureEntropy,

    /// <summary>The log pressure–enthalpy dome with isotherms, isentropes, lines of constant quality,
    /// optional isochores and an optional vapour-compression cycle.</summary>
    PressureEnthalpy,

    /// <summary>Deviations of the measured vapour pressures from fitted correlations (the forms
    /// with the lowest AICc), with the data's stated uncertainties.</summary>
    Residuals,

    /// <summary>Deviations of the measured vapour pressures from each fluid's model (for example a
    /// fluid before and after <c>phaseslope tune</c>), with the data's stated uncertainties.</summary>
    Deviations,

    /// <summary>A binary mixture's bubble and dew lines in pressure against mole fraction at a temperature.</summary>
    PressureComposition,

    /// <summary>A binary mixture's bubble and dew lines in temperature against mole fraction at a pressure.</summary>
    TemperatureComposition,

    /// <summary>A binary mixture's vapour against liquid mole fraction at a temperature or a pressure.</summary>
    Composition,

    /// <summary>The whole P–T phase diagram of one fluid on a logarithmic pressure axis: the
    /// vaporization, sublimation and melting lines, the triple and critical points and the regions
    /// (<see cref="Diagrams.PhaseDiagram"/>).</summary>
    Phase,
}

/// <summary>The command-line identifiers of the diagram kinds.</summary>
public static class DiagramKinds
{
    private static readonly (DiagramKind Kind, string Id)[] Table =
    [
        (DiagramKind.PressureTemperature, "p-t"),
        (DiagramKind.LnPressureInverseTemperature, "lnp-invt"),
        (DiagramKind.TemperatureDensity, "t-rho"),
        (DiagramKind.Slope, "slope"),
        (DiagramKind.Latent, "latent"),
        (DiagramKind.PressureVolume, "p-v"),
        (DiagramKind.TemperatureEntropy, "t-s"),
        (DiagramKind.PressureEnthalpy, "p-h"),
        (DiagramKind.Residuals, "residuals"),
        (DiagramKind.Deviations, "deviations"),
        (DiagramKind.PressureComposition, "p-xy"),
        (DiagramKind.TemperatureComposition, "t-xy"),
        (DiagramKind.Composition, "x-y"),
        (DiagramKind.Phase, "phase"),
    ];

    /// <summary>Every identifier, in the order of <see cref="DiagramKind"/>.</summary>
    public static IReadOnlyList<string> Ids { get; } = [.. Table.Select(t => t.Id)];

    /// <summary>The identifier of a kind.</summary>
    public static string Id(this DiagramKind kind) => Table.First(t => t.Kind == kind).Id;

    /// <summary>Parses an identifier (case-insensitive).</summary>
    public static bool TryParse(string? id, out DiagramKind kind)
    {
        foreach (var (k, i) in Table)
        {
            if (string.Equals(i, id?.Trim(), StringComparison.OrdinalIgnoreCase))
            {
                kind = k;
                return true;
            }
        }

        kind = default;
        return false;
    }

    /// <summary>Whether the kind is a binary mixture's diagram (drawn by <see cref="Diagrams.BinaryDiagramChart"/>).</summary>
    public static bool IsBinary(this DiagramKind kind)
        => kind is DiagramKind.PressureComposition or DiagramKind.TemperatureComposition or DiagramKind.Composition;

    /// <summary>Whether the kind can show several fluids on one chart.</summary>
    public static bool AllowsSeveralFluids(this DiagramKind kind)
        => kind is DiagramKind.PressureTemperature or DiagramKind.LnPressureInverseTemperature or DiagramKind.TemperatureDensity
            or DiagramKind.Slope or DiagramKind.Latent or DiagramKind.Deviations;

    /// <summary>Whether the kind has a reduced-coordinate (corresponding-states) form.</summary>
    public static bool AllowsReduced(this DiagramKind kind)
        => kind is DiagramKind.PressureTemperature or DiagramKind.LnPressureInverseTemperature or DiagramKind.TemperatureDensity
            or DiagramKind.Slope or DiagramKind.PressureVolume;

    /// <summary>Whether the kind has a choice of linear or logarithmic pressure axis
    /// (p-v and p-h always use a logarithmic axis where one is needed).</summary>
    public static bool AllowsLogScale(this DiagramKind kind)
        => kind is DiagramKind.PressureTemperature or DiagramKind.Slope;

    /// <summary>Whether the kind can overlay measured vapour pressures.</summary>
    public static bool AllowsData(this DiagramKind kind)
        => kind is DiagramKind.PressureTemperature or DiagramKind.LnPressureInverseTemperature or DiagramKind.Latent or DiagramKind.Residuals
            or DiagramKind.Deviations;
}
