namespace AlgebraNotebook.Groups.Exponential;

/// <summary>The answer of <see cref="RealLogarithm.Decide"/>.</summary>
public enum RealLogarithmAnswer
{
    /// <summary>A real matrix X with exp(X) = g exists.</summary>
    Exists,

    /// <summary>No real matrix X has exp(X) = g.</summary>
    DoesNotExist,

    /// <summary>The exact methods available cannot settle the question (the explanation says why).</summary>
    Undecided,
}
