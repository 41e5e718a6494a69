using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Operations on <see cref="UnivariatePolynomial{T}"/> that need a field of coefficients: division with remainder,
/// monic gcd, square-free part, construction from roots.
/// </summary>
public static class UnivariatePolynomial
{
    /// <summary>The polynomial with the given coefficients, lowest degree first.</summary>
    public static UnivariatePolynomial<T> FromCoefficients<T>(params T[] coefficients)
        where T : IRingElement<T> => UnivariatePolynomial<T>.FromCoefficients(coefficients);

    /// <summary>The monic polynomial (λ - r1)(λ - r2)... with the given roots (repeat a root for multiplicity).</summary>
    public static UnivariatePolynomial<T> FromRoots<T>(params T[] roots)
        where T : IRingElement<T>
    {
        ArgumentNullException.ThrowIfNull(roots);
        var result = UnivariatePolynomial<T>.One;
        foreach (var r in roots)
        {
            result *= UnivariatePolynomial<T>.FromCoefficients(-r, T.One);
        }

        return result;
    }

    /// <summary>
    /// Euclidean division: returns (q, r) with <c>dividend == q * divisor + r</c> and deg r &lt; deg divisor.
    /// </summary>
    /// <exception cref="DivideByZeroException">The divisor is the zero polynomial.</exception>
    public static (UnivariatePolynomial<T> Quotient, UnivariatePolynomial<T> Remainder) DivideWithRemainder<T>(
        UnivariatePolynomial<T> dividend,
        UnivariatePolynomial<T> divisor)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(dividend);
        ArgumentNullException.ThrowIfNull(divisor);
        if (divisor.IsZero)
        {
            throw new DivideByZeroException($"Cannot divide the polynomial {dividend} by the zero polynomial.");
        }

        var remainder = dividend.Coefficients.ToArray();
        var d = divisor.Degree;
        if (dividend.Degree < d)
        {
            return (UnivariatePolynomial<T>.Zero, dividend);
        }

        var quotient = new T[dividend.Degree - d + 1];
        var inverseLead = divisor.LeadingCoefficient.Reciprocal();
        for (var k = dividend.Degree - d; k >= 0; k--)
        {
            var factor = remainder[k + d] * inverseLead;
            quotient[k] = factor;
            if (factor.IsZero)
            {
                continue;
            }

            for (var j = 0; j <= d; j++)
            {
                remainder[k + j] -= factor * divisor.Coefficients[j];
            }
        }

        return (UnivariatePolynomial<T>.FromOwned(quotient), UnivariatePolynomial<T>.FromOwned(remainder[..d]));
    }

    /// <summary>The polynomial divided by its leading coefficient; zero stays zero.</summary>
    public static UnivariatePolynomial<T> Monic<T>(UnivariatePolynomial<T> polynomial)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        if (polynomial.IsZero || polynomial.IsMonic)
        {
            return polynomial;
        }

        return polynomial.LeadingCoefficient.Reciprocal() * polynomial;
    }

    /// <summary>The monic greatest common divisor (zero when both are zero), by the Euclidean algorithm.</summary>
    public static UnivariatePolynomial<T> Gcd<T>(UnivariatePolynomial<T> a, UnivariatePolynomial<T> b)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        while (!b.IsZero)
        {
            var r = DivideWithRemainder(a, b).Remainder;
            a = b;
            b = Monic(r);
        }

        return Monic(a);
    }

    /// <summary>
    /// The monic square-free part p / gcd(p, p'): the product of the distinct irreducible factors of p, each once
    /// (characteristic zero). Zero for the zero polynomial; one for constants.
    /// </summary>
    public static UnivariatePolynomial<T> SquareFreePart<T>(UnivariatePolynomial<T> polynomial)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        if (polynomial.IsZero)
        {
            return polynomial;
        }

        var g = Gcd(polynomial, polynomial.Derivative());
        return Monic(DivideWithRemainder(polynomial, g).Quotient);
    }

    /// <summary>
    /// How many times (λ - root) divides the non-zero polynomial, and the cofactor after removing that power.
    /// </summary>
    /// <exception cref="ExactArgumentException">The polynomial is zero.</exception>
    public static (int Multiplicity, UnivariatePolynomial<T> Cofactor) RootMultiplicity<T>(UnivariatePolynomial<T> polynomial, T root)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(polynomial);
        if (polynomial.IsZero)
        {
            throw new ExactArgumentException("Every value is a root of the zero polynomial with unbounded multiplicity.", nameof(polynomial));
        }

        var linear = UnivariatePolynomial<T>.FromCoefficients(-root, T.One);
        var multiplicity = 0;
        while (true)
        {
            var (q, r) = DivideWithRemainder(polynomial, linear);
            if (!r.IsZero)
            {
                return (multiplicity, polynomial);
            }

            multiplicity++;
            polynomial = q;
        }
    }
}
