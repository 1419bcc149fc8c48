namespace PhaseSlope.Validation.Sections;

/// <summary>The sections of the page in their order. A new section is one
/// static class with a <c>Write(Page)</c> method and one line here.</summary>
internal static class SectionList
{
    public static readonly IReadOnlyList<Action<Page>> All =
    [
        Numerics.Write,
        PublishedData.Write,
        Trouton.Write,
        IdealGas.Write,
        VapourLines.Write,
        Cycle.Write,
        Flashes.Write,
        SolidLines.Write,
        Derivatives.Write,
        LatentHeatFromData.Write,
        Audit.Write,
        Tuning.Write,
        GroupContribution.Write,
        Mixtures.Write,
        MixtureCriticalRegion.Write,
        Envelopes.Write,
        KnownLimits.Write,
        Pointers.Write,
    ];
}
