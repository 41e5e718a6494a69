namespace AlgebraNotebook.Groups.Exponential;

/// <summary>How a matrix exponential exp(t X) was obtained (see <see cref="MatrixExponential{T}"/>).</summary>
public enum ExponentialForm
{
    /// <summary>X is nilpotent: exp(t X) is a finite sum, a matrix of polynomials in t.</summary>
    Polynomial,

    /// <summary>Eigenvalues in Q(i): exact closed form in function symbols (cos, sin, exp, cosh, sinh of multiples of t) with their relations.</summary>
    ClosedForm,

    /// <summary>Some eigenvalue outside Q(i): truncated Taylor series in t.</summary>
    TruncatedSeries,
}
