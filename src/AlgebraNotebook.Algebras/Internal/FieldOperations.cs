using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// The few operations the exact core offers per field rather than generically (exact eigenvalues), dispatched once here.
/// </summary>
internal static class FieldOperations<T>
    where T : IFieldElement<T>
{
    public static EigenDecomposition<T> Eigen(Matrix<T> matrix)
    {
        if (typeof(T) == typeof(Rational))
        {
            return (EigenDecomposition<T>)(object)Eigenvalues.OverRationals((Matrix<Rational>)(object)matrix);
        }

        if (typeof(T) == typeof(GaussianRational))
        {
            return (EigenDecomposition<T>)(object)Eigenvalues.OverGaussianRationals((Matrix<GaussianRational>)(object)matrix);
        }

        throw new Exact.BeyondCapabilityException(
            $"Exact eigenvalues are available over Rational and GaussianRational only, not over {typeof(T).Name}.");
    }

    public static string FieldName => typeof(T) == typeof(Rational) ? "Q" : typeof(T) == typeof(GaussianRational) ? "Q(i)" : typeof(T).Name;
}

/// <summary>Conversions between a field and the rationals inside it.</summary>
internal static class RationalPart<T>
    where T : IFieldElement<T>
{
    /// <summary>The value as a rational, or null when it is not rational (a Gaussian rational with non-zero imaginary part).</summary>
    public static Rational? TryToRational(T value) => value switch
    {
        Rational r => r,
        GaussianRational g when g.IsReal => g.Real,
        _ => null,
    };
}
