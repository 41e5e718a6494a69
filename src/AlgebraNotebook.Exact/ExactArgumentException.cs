namespace AlgebraNotebook.Exact;

/// <summary>
/// Thrown when a value given to the exact core is mathematically unusable for the operation requested
/// (dimension mismatch, inconsistent relations, a request beyond an algorithm). The message names the input and the problem.
/// </summary>
public class ExactArgumentException : ArgumentException
{
    /// <summary>Creates the exception for a named parameter.</summary>
    public ExactArgumentException(string message, string? paramName = null)
        : base(message, paramName)
    {
    }
}

/// <summary>Thrown when a request is well formed but beyond what the implemented algorithm can decide or finish.</summary>
public sealed class BeyondCapabilityException : InvalidOperationException
{
    /// <summary>Creates the exception with a message that says what was asked and what limit was reached.</summary>
    public BeyondCapabilityException(string message)
        : base(message)
    {
    }
}
