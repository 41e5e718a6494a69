using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

/// <summary>
/// Roots of univariate polynomials inside Q and Q(i). Two variants: by divisors (the rational root theorem: clear
/// denominators, enumerate quotients of divisors of the constant and leading coefficients within a root bound, verify
/// exactly, deflate; needs the two coefficients factored) and by lifting (roots modulo a prime lifted p-adically; no
/// factoring, see FieldRoots.Lifting.cs).
/// </summary>
internal static partial class FieldRoots
{
    /// <summary>The largest number of (numerator, denominator) divisor pairs the search will enumerate.</summary>
    public const long MaximumCandidatePairs = 2_000_000;

    /// <summary>The distinct rational roots of a non-zero polynomial, in increasing order, by the divisor method.</summary>
    public static List<Rational> RationalRootsByDivisors(UnivariatePolynomial<Rational> polynomial)
    {
        return FindRoots(polynomial, RationalCandidates, (a, b) => a.CompareTo(b));
    }

    /// <summary>The distinct Gaussian-rational roots of a non-zero polynomial (real part, then imaginary part), by the divisor method.</summary>
    public static List<GaussianRational> GaussianRationalRootsByDivisors(UnivariatePolynomial<GaussianRational> polynomial)
    {
        return FindRoots(polynomial, GaussianCandidates, CompareGaussian);
    }

    /// <summary>Orders Gaussian rationals by real part, then imaginary part.</summary>
    public static int CompareGaussian(GaussianRational a, GaussianRational b)
    {
        var byReal = a.Real.CompareTo(b.Real);
        return byReal != 0 ? byReal : a.Imaginary.CompareTo(b.Imaginary);
    }

    private static List<T> FindRoots<T>(
        UnivariatePolynomial<T> polynomial,
        Func<UnivariatePolynomial<T>, IEnumerable<T>> candidates,
        Comparison<T> order)
        where T : IFieldElement<T>
    {
        var roots = new List<T>();
        var current = UnivariatePolynomial.SquareFreePart(polynomial);
        if (current.Degree >= 1 && current.Coefficients[0].IsZero)
        {
            roots.Add(T.Zero);
            current = UnivariatePolynomial<T>.FromOwned(current.Coefficients.Skip(1).ToArray());
        }

        if (current.Degree >= 2)
        {
            foreach (var candidate in candidates(current))
            {
                if (current.Evaluate(candidate).IsZero)
                {
                    roots.Add(candidate);
                    current = UnivariatePolynomial.DivideWithRemainder(current, UnivariatePolynomial<T>.FromCoefficients(-candidate, T.One)).Quotient;
                    if (current.Degree < 2)
                    {
                        break;
                    }
                }
            }
        }

        // A linear factor always has its root in the field.
        if (current.Degree == 1)
        {
            roots.Add(-current.Coefficients[0] / current.Coefficients[1]);
        }

        roots.Sort(order);
        return roots;
    }

    private static IEnumerable<Rational> RationalCandidates(UnivariatePolynomial<Rational> polynomial)
    {
        var integers = ClearDenominators(polynomial.Coefficients.Select(c => (c.Numerator, c.Denominator)).ToArray());
        var constant = integers[0];
        var leading = integers[^1];
        var purpose = "Searching rational roots of " + polynomial.ToString("x");
        var numerators = IntegerFactoring.Divisors(constant, purpose);
        var denominators = IntegerFactoring.Divisors(leading, purpose);
        CheckPairCount(numerators.Count, denominators.Count, 2, polynomial);

        // Cauchy's bound: every root has |r| <= 1 + max |a_k / a_d|.
        var bound = Rational.One + integers.Take(integers.Length - 1).Select(a => new Rational(BigInteger.Abs(a), BigInteger.Abs(leading))).Max();
        return Enumerate();

        IEnumerable<Rational> Enumerate()
        {
            foreach (var q in denominators)
            {
                foreach (var p in numerators)
                {
                    var candidate = new Rational(p, q);
                    if (candidate > bound)
                    {
                        break;
                    }

                    if (!BigInteger.GreatestCommonDivisor(p, q).IsOne)
                    {
                        continue;
                    }

                    yield return candidate;
                    yield return -candidate;
                }
            }
        }
    }

    private static IEnumerable<GaussianRational> GaussianCandidates(UnivariatePolynomial<GaussianRational> polynomial)
    {
        var denominators = polynomial.Coefficients
            .SelectMany(c => new[] { c.Real.Denominator, c.Imaginary.Denominator })
            .Aggregate(BigInteger.One, (l, d) => l / BigInteger.GreatestCommonDivisor(l, d) * d);
        var integers = polynomial.Coefficients
            .Select(c => new GaussianInteger(c.Real.Numerator * (denominators / c.Real.Denominator), c.Imaginary.Numerator * (denominators / c.Imaginary.Denominator)))
            .ToArray();
        var purpose = "Searching Gaussian-rational roots of " + polynomial.ToString("x");
        var numerators = GaussianDivisors(integers[0], purpose);
        var denominatorsOfRoots = GaussianDivisors(integers[^1], purpose);
        CheckPairCount(numerators.Count, denominatorsOfRoots.Count, 4, polynomial);

        // |r| <= 1 + M with M = max |a_k / a_d|, hence |r|^2 <= 2 + 2 M^2, compared through norms without square roots.
        var leadingNorm = integers[^1].Norm;
        var squaredBound = 2 + 2 * integers.Take(integers.Length - 1).Select(a => new Rational(a.Norm, leadingNorm)).Max();
        return Enumerate();

        IEnumerable<GaussianRational> Enumerate()
        {
            var seen = new HashSet<GaussianRational>();
            foreach (var v in denominatorsOfRoots)
            {
                var vNorm = v.Norm;
                var inverse = v.ToGaussianRational().Reciprocal();
                foreach (var u in numerators)
                {
                    if (new Rational(u.Norm, vNorm) > squaredBound)
                    {
                        continue;
                    }

                    foreach (var unit in GaussianInteger.Units)
                    {
                        var candidate = (u * unit).ToGaussianRational() * inverse;
                        if (seen.Add(candidate))
                        {
                            yield return candidate;
                        }
                    }
                }
            }
        }
    }

    /// <summary>The divisors of a non-zero Gaussian integer, one from each class of associates.</summary>
    internal static List<GaussianInteger> GaussianDivisors(GaussianInteger z, string purpose)
    {
        var primePowers = new List<(GaussianInteger Prime, int Exponent)>();
        foreach (var (p, _) in IntegerFactoring.Factor(z.Norm, purpose))
        {
            GaussianInteger[] primes;
            if (p == 2)
            {
                primes = [new GaussianInteger(BigInteger.One, BigInteger.One)];
            }
            else if (p % 4 == 3)
            {
                primes = [new GaussianInteger(p, BigInteger.Zero)];
            }
            else
            {
                var pi = GaussianInteger.PrimeAbove(p);
                primes = [pi, pi.Conjugate()];
            }

            foreach (var prime in primes)
            {
                var exponent = 0;
                while (GaussianInteger.TryDivide(z, prime, out var quotient))
                {
                    z = quotient;
                    exponent++;
                }

                if (exponent > 0)
                {
                    primePowers.Add((prime, exponent));
                }
            }
        }

        var divisors = new List<GaussianInteger> { GaussianInteger.One };
        foreach (var (prime, exponent) in primePowers)
        {
            var count = divisors.Count;
            var power = GaussianInteger.One;
            for (var e = 1; e <= exponent; e++)
            {
                power *= prime;
                for (var k = 0; k < count; k++)
                {
                    divisors.Add(divisors[k] * power);
                }
            }
        }

        return divisors;
    }

    private static BigInteger[] ClearDenominators((BigInteger Numerator, BigInteger Denominator)[] coefficients)
    {
        var lcm = coefficients.Aggregate(BigInteger.One, (l, c) => l / BigInteger.GreatestCommonDivisor(l, c.Denominator) * c.Denominator);
        var integers = coefficients.Select(c => c.Numerator * (lcm / c.Denominator)).ToArray();
        var content = integers.Aggregate(BigInteger.Zero, BigInteger.GreatestCommonDivisor);
        return integers.Select(a => a / content).ToArray();
    }

    private static void CheckPairCount<T>(int numerators, int denominators, int unitCount, UnivariatePolynomial<T> polynomial)
        where T : IRingElement<T>
    {
        var pairs = (long)numerators * denominators * unitCount;
        if (pairs > MaximumCandidatePairs)
        {
            throw new BeyondCapabilityException(
                $"Root search for {polynomial.ToString("x")}: the constant and leading coefficients have {numerators} and {denominators} divisors, giving {pairs} candidates, above the limit of {MaximumCandidatePairs}.");
        }
    }
}
