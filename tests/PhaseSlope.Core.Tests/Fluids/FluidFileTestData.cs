namespace PhaseSlope.Core.Tests.Fluids;

/// <summary>A valid fluid file used as the starting point of the parser tests, one string per line.</summary>
internal static class FluidFileTestData
{
    internal const string Origin = "test/propane-sample.fluid";

    // Values from Lemmon, McLinden & Wagner, J. Chem. Eng. Data 54, 3141 (2009), from memory,
    // and Poling, Prausnitz & O'Connell, 5th ed. (2001), Appendix A, from memory (acentric factor).
    internal static string[] ValidLines() =>
    [
        "# sample file for parser tests",                                        // 1
        "format                    phaseslope-fluid 1",                          // 2
        "name                      propane",                                     // 3
        "synonyms                  R-290; n-propane",                            // 4
        "formula                   C3H8",                                        // 5
        "cas                       74-98-6",                                     // 6
        "family                    alkane",                                      // 7
        "",                                                                      // 8
        "molar_mass                44.09562 g/mol       | Lemmon et al. 2009",   // 9
        "critical_temperature      369.89 K ± 0.015     | Lemmon et al. 2009",   // 10
        "critical_pressure         4.2512 MPa           | Lemmon et al. 2009",   // 11
        "critical_density          5.000 mol/L          | Lemmon et al. 2009",   // 12
        "acentric_factor           0.152                | Poling et al. 2001",   // 13
        "normal_boiling_point      231.036 K            | Lemmon et al. 2009",   // 14
        "triple_point_temperature  85.525 K             | Lemmon et al. 2009",   // 15
        "remarks                   sample",                                      // 16
    ];

    internal static string Join(IEnumerable<string> lines, string newline = "\n") =>
        string.Join(newline, lines) + newline;

    /// <summary>The valid file with line <paramref name="lineNumber"/> (1-based) replaced.</summary>
    internal static string WithLine(int lineNumber, string replacement)
    {
        string[] lines = ValidLines();
        lines[lineNumber - 1] = replacement;
        return Join(lines);
    }

    /// <summary>The valid file with an extra line appended (it becomes line 17).</summary>
    internal static string WithExtraLine(string extra) => Join([.. ValidLines(), extra]);

    /// <summary>The valid file with the line starting with <paramref name="key"/> blanked out.</summary>
    internal static string Without(string key) =>
        Join(ValidLines().Select(l => l.StartsWith(key + " ", StringComparison.Ordinal) ? "" : l));
}
