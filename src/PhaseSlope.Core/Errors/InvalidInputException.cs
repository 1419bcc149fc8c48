namespace PhaseSlope.Core.Errors;

/// <summary>A value given to the core is outside what the method accepts (misuse, or a
/// state outside the model's range such as a temperature at or above the critical one).</summary>
public sealed class InvalidInputException : PhaseSlopeException
{
    /// <summary>Creates the exception for a named input and the offending value.</summary>
    public InvalidInputException(string field, double value, string message)
        : base(message)
    {
        Field = field;
        Value = value;
    }

    /// <summary>The name of the input that was rejected (for example "temperature").</summary>
    public string Field { get; }

    /// <summary>The rejected value, in SI units.</summary>
    public double Value { get; }
}
