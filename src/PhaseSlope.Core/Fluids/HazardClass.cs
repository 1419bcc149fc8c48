namespace PhaseSlope.Core.Fluids;

/// <summary>A hazard of a fluid named in its <c>hazard_class</c> entry (not an ASHRAE safety group).</summary>
[Flags]
public enum HazardTrait
{
    /// <summary>No trait (only with a safety group).</summary>
    None = 0,

    /// <summary>Burns in air.</summary>
    Flammable = 1,

    /// <summary>Poisonous when breathed or touched.</summary>
    Toxic = 2,

    /// <summary>Displaces the oxygen of the air in a closed space.</summary>
    Asphyxiant = 4,

    /// <summary>Feeds a fire (makes other materials burn more readily).</summary>
    Oxidizer = 8,
}

/// <summary>The sourced hazard classification of a fluid from its <c>hazard_class</c> entry:
/// either a refrigerant safety group in the sense of ASHRAE Standard 34 (A1 … B3, with the
/// lower-flammability subclasses A2L and B2L), or one or more plain traits (flammable, toxic,
/// asphyxiant, oxidizer), each with the source it was taken from.</summary>
/// <remarks>The meaning of the safety group letters and digits is that of ASHRAE Standard 34
/// (from memory): A = lower toxicity, B = higher toxicity; 1 = no flame propagation, 2L = lower
/// flammability with a burning velocity of at most 10 cm/s, 2 = lower flammability, 3 = higher
/// flammability. The tool does not judge hazards: it only repeats what the file states.</remarks>
public sealed record HazardClass
{
    /// <summary>The safety groups a <c>hazard_class</c> entry may name, in the standard's order.</summary>
    public static IReadOnlyList<string> SafetyGroups { get; } = ["A1", "A2L", "A2", "A3", "B1", "B2L", "B2", "B3"];

    /// <summary>The trait words a <c>hazard_class</c> entry may use, in the order they are written.</summary>
    public static IReadOnlyList<string> TraitWords { get; } = ["flammable", "toxic", "asphyxiant", "oxidizer"];

    /// <summary>The ASHRAE Standard 34 safety group (e.g. "A3"), or null when the entry gives traits.</summary>
    public string? SafetyGroup { get; init; }

    /// <summary>The plain traits, or <see cref="HazardTrait.None"/> when the entry gives a safety group.</summary>
    public HazardTrait Traits { get; init; }

    /// <summary>The published source of the classification, as written after the '|'.</summary>
    public required string Source { get; init; }

    /// <summary>The value as a fluid file writes it: the group, or the trait words separated by spaces.</summary>
    public string Code => SafetyGroup ?? string.Join(' ', TraitWords.Where((_, i) => Traits.HasFlag((HazardTrait)(1 << i))));

    /// <summary>The classification in words, e.g. "A3 (lower toxicity, higher flammability)" or
    /// "flammable and toxic" or "toxic and an oxidizer".</summary>
    public string Description
    {
        get
        {
            if (SafetyGroup is { } group)
            {
                string toxicity = group[0] == 'A' ? "lower toxicity" : "higher toxicity";
                string flammability = group[1..] switch
                {
                    "1" => "no flame propagation",
                    "2L" => "lower flammability, burning velocity at most 10 cm/s",
                    "2" => "flammable",
                    _ => "higher flammability",
                };
                return $"{group} ({toxicity}, {flammability})";
            }

            var words = Code.Split(' ').Select(w => w is "asphyxiant" or "oxidizer" ? "an " + w : w).ToArray();
            return words.Length == 1 ? words[0] : $"{string.Join(", ", words[..^1])} and {words[^1]}";
        }
    }

    /// <summary>Reads the value before the '|': one safety group, or one or more distinct trait
    /// words. Null when the text is neither (the caller names the key and line).</summary>
    public static HazardClass? TryParse(string value, string source)
    {
        string[] tokens = value.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries);
        if (tokens.Length == 1 && SafetyGroups.Contains(tokens[0]))
        {
            return new HazardClass { SafetyGroup = tokens[0], Source = source };
        }

        var traits = HazardTrait.None;
        foreach (string token in tokens)
        {
            int index = TraitWords.ToList().IndexOf(token);
            var trait = (HazardTrait)(1 << index);
            if (index < 0 || traits.HasFlag(trait))
            {
                return null;
            }

            traits |= trait;
        }

        return traits == HazardTrait.None ? null : new HazardClass { Traits = traits, Source = source };
    }
}
