namespace PhaseSlope.Cli;

/// <summary>Exit codes of the phaseslope tool; the README documents the same table.</summary>
internal static class ExitCodes
{
    /// <summary>The command did what was asked.</summary>
    public const int Success = 0;

    /// <summary>An unexpected internal error (a bug: please report it).</summary>
    public const int InternalError = 1;

    /// <summary>Bad command line: unknown command or option, malformed number, unknown unit,
    /// missing or conflicting options, non-positive absolute value; for <c>derive --from-measured</c>
    /// a bad key, value, unit or uncertainty, or a quantity the derivative needs that was not given.</summary>
    public const int Usage = 2;

    /// <summary>Unknown fluid name, or a fluid file that cannot be read or fails validation.</summary>
    public const int Fluid = 3;

    /// <summary>A state outside the model's range: T at or above Tc, P at or above Pc, or below
    /// the lowest valid temperature; or no liquid where the fluid's own data say there is none
    /// (coexistence below the triple point or the sourced triple-point pressure, a state in the
    /// solid region).</summary>
    public const int OutOfRange = 4;

    /// <summary>A solver did not converge.</summary>
    public const int NotConverged = 5;

    /// <summary>The output file could not be written (nothing was written or replaced).</summary>
    public const int OutputFile = 6;

    /// <summary>A data file (measured vapour pressures) cannot be read or fails validation.</summary>
    public const int DataFile = 7;

    /// <summary>An audit check failed (<c>audit</c>): the correlation, as declared, should not be used.</summary>
    public const int AuditFailed = 8;

    /// <summary><c>state --batch</c>: at least one row was refused (each named on standard error
    /// and in its output row); every other row was computed and written.</summary>
    public const int BatchRowsFailed = 9;
}
