using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Exponential;

// The spectral work is done once over Q(i); these maps carry inputs there and results back to the caller's field
// (Rational or GaussianRational). Narrowing to Rational checks that the imaginary part vanished, as it must for a
// real input, so a bug cannot silently drop an imaginary part.
internal static class FieldBridge<T>
    where T : IFieldElement<T>
{
    public static bool IsSupported => typeof(T) == typeof(Rational) || typeof(T) == typeof(GaussianRational);

    public static void RequireSupported(string what)
    {
        if (!IsSupported)
        {
            throw new ExactArgumentException(
                $"{what} is computed for matrices over Rational or GaussianRational; {typeof(T).Name} is not supported.", "T");
        }
    }

    public static GaussianRational Widen(T value) => value switch
    {
        Rational r => r,
        GaussianRational g => g,
        _ => throw new ExactArgumentException($"Scalar type {typeof(T).Name} is not supported here.", nameof(value)),
    };

    public static T Narrow(GaussianRational value)
    {
        if (typeof(T) == typeof(GaussianRational))
        {
            return (T)(object)value;
        }

        if (typeof(T) == typeof(Rational))
        {
            if (!value.Imaginary.IsZero)
            {
                throw new InvalidOperationException($"Internal error: a real result has the non-real coefficient {value}.");
            }

            return (T)(object)value.Real;
        }

        throw new ExactArgumentException($"Scalar type {typeof(T).Name} is not supported here.", nameof(value));
    }

    public static Matrix<GaussianRational> Widen(Matrix<T> matrix) => matrix.Map(Widen);

    public static Matrix<T> Narrow(Matrix<GaussianRational> matrix) => matrix.Map(Narrow);

    public static Polynomial<T> Narrow(Polynomial<GaussianRational> polynomial) =>
        Polynomial<T>.FromTerms(polynomial.Terms.Select(t => (t.Monomial, Narrow(t.Coefficient))));

    public static Polynomial<T> FromRationalPolynomial(Polynomial<Rational> polynomial) =>
        Polynomial<T>.FromTerms(polynomial.Terms.Select(t => (t.Monomial, T.FromRational(t.Coefficient))));

    public static System.Numerics.Complex ToComplex(T value)
    {
        var g = Widen(value);
        return new System.Numerics.Complex(g.Real.ToDouble(), g.Imaginary.ToDouble());
    }
}
