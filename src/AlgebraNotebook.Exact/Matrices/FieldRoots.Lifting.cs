using System.Numerics;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

internal static partial class FieldRoots
{
    /// <summary>The largest prime tried as the modulus of the lifting variant.</summary>
    public const int LiftingPrimeBound = 400;

    /// <summary>The distinct rational roots of a non-zero polynomial, in increasing order, by lifting.</summary>
    public static List<Rational> RationalRootsByLifting(UnivariatePolynomial<Rational> polynomial)
    {
        var squareFree = UnivariatePolynomial.SquareFreePart(polynomial);
        var integers = ClearDenominators(squareFree.Coefficients.Select(c => (c.Numerator, c.Denominator)).ToArray())
            .Select(a => new GaussianInteger(a, BigInteger.Zero))
            .ToArray();
        var leading = integers[^1].Real;
        var roots = GaussianIntegerRootsOfScaled(integers, squareFree.ToString("x"))
            .Where(y => y.Imaginary.IsZero)
            .Select(y => new Rational(y.Real, leading))
            .Where(x => squareFree.Evaluate(x).IsZero)
            .ToList();
        roots.Sort();
        return roots;
    }

    /// <summary>The distinct Gaussian-rational roots of a non-zero polynomial (real part, then imaginary part), by lifting.</summary>
    public static List<GaussianRational> GaussianRationalRootsByLifting(UnivariatePolynomial<GaussianRational> polynomial)
    {
        var squareFree = UnivariatePolynomial.SquareFreePart(polynomial);
        var integers = ToGaussianIntegers(squareFree);
        var leading = integers[^1].ToGaussianRational();
        var roots = GaussianIntegerRootsOfScaled(integers, squareFree.ToString("x"))
            .Select(y => y.ToGaussianRational() / leading)
            .Where(x => squareFree.Evaluate(x).IsZero)
            .ToList();
        roots.Sort(CompareGaussian);
        return roots;
    }

    private static GaussianInteger[] ToGaussianIntegers(UnivariatePolynomial<GaussianRational> polynomial)
    {
        var lcm = polynomial.Coefficients
            .SelectMany(c => new[] { c.Real.Denominator, c.Imaginary.Denominator })
            .Aggregate(BigInteger.One, (l, d) => l / BigInteger.GreatestCommonDivisor(l, d) * d);
        return polynomial.Coefficients
            .Select(c => new GaussianInteger(c.Real.Numerator * (lcm / c.Real.Denominator), c.Imaginary.Numerator * (lcm / c.Imaginary.Denominator)))
            .ToArray();
    }

    /// <summary>
    /// For f with Gaussian-integer coefficients a_0..a_d (lowest first, a_d non-zero, f square-free) returns the roots
    /// y in Z[i] of the monic g(y) = a_d^(d-1) f(y / a_d); the roots of f in Q(i) are exactly y / a_d, because Z[i] is
    /// integrally closed. The roots of g are found modulo a prime p = 3 (mod 4) (so that Z[i]/p is a field with p^2
    /// elements) by trying every residue, lifted by Newton's iteration to p^(2^k) beyond twice Cauchy's root bound, then
    /// read off as symmetric residues and verified exactly. Complete when every root modulo p is simple.
    /// </summary>
    private static List<GaussianInteger> GaussianIntegerRootsOfScaled(GaussianInteger[] f, string description)
    {
        var d = f.Length - 1;
        if (d < 1)
        {
            return [];
        }

        var leading = f[^1];
        var g = new GaussianInteger[d + 1];
        var power = GaussianInteger.One;
        for (var k = d - 1; k >= 0; k--)
        {
            g[k] = f[k] * power;
            power *= leading;
        }

        g[d] = GaussianInteger.One;

        // Cauchy's bound on f: a root x has |x| <= 1 + max |a_k| / |a_d| (k < d), so y = a_d x has |y| <= |a_d| + max |a_k|,
        // and each component of y is within it. (Cauchy's bound on the monic g, 1 + max |g_k|, is about |a_d|^(d-1)
        // times larger and made the lifting run to thousands of digits for degree-20 characteristic polynomials.)
        var bound = IntegerFactoring.IntegerRoot(leading.Norm, 2) + 1 + f.Take(d).Select(c => IntegerFactoring.IntegerRoot(c.Norm, 2) + 1).Max();
        var derivative = Enumerable.Range(1, d).Select(k => new GaussianInteger(g[k].Real * k, g[k].Imaginary * k)).ToArray();

        for (var p = 3; p <= LiftingPrimeBound; p += 4)
        {
            if (!IsSmallPrime(p))
            {
                continue;
            }

            var prime = new BigInteger(p);
            var residues = FindSimpleRootsModulo(g, derivative, prime, out var allSimple);
            if (!allSimple)
            {
                continue;
            }

            var roots = new List<GaussianInteger>();
            foreach (var residue in residues)
            {
                var lifted = Lift(g, derivative, residue, prime, bound);
                if (lifted is { } y && Evaluate(g, y).IsZero)
                {
                    roots.Add(y);
                }
            }

            return roots;
        }

        throw new BeyondCapabilityException(
            $"Root search for {description}: no prime p = 3 (mod 4) below {LiftingPrimeBound} keeps the roots of the polynomial distinct modulo p.");
    }

    private static List<GaussianInteger> FindSimpleRootsModulo(GaussianInteger[] g, GaussianInteger[] derivative, BigInteger p, out bool allSimple)
    {
        var reduced = g.Select(c => Reduce(c, p)).ToArray();
        var reducedDerivative = derivative.Select(c => Reduce(c, p)).ToArray();
        var roots = new List<GaussianInteger>();
        allSimple = true;
        for (var a = BigInteger.Zero; a < p; a++)
        {
            for (var b = BigInteger.Zero; b < p; b++)
            {
                var x = new GaussianInteger(a, b);
                if (!EvaluateModulo(reduced, x, p).IsZero)
                {
                    continue;
                }

                if (EvaluateModulo(reducedDerivative, x, p).IsZero)
                {
                    allSimple = false;
                    return roots;
                }

                roots.Add(x);
            }
        }

        return roots;
    }

    // Newton lifting r <- r - g(r) / g'(r) modulo p^(2^k) until the modulus exceeds 2 * bound, then the symmetric residue.
    private static GaussianInteger? Lift(GaussianInteger[] g, GaussianInteger[] derivative, GaussianInteger root, BigInteger p, BigInteger bound)
    {
        var modulus = p;
        while (modulus <= 2 * bound)
        {
            modulus *= modulus;
            var value = EvaluateModulo(g, root, modulus);
            var slope = EvaluateModulo(derivative, root, modulus);
            var step = Reduce(value * Inverse(slope, p, modulus), modulus);
            root = Reduce(root - step, modulus);
        }

        var symmetric = new GaussianInteger(Symmetric(root.Real, modulus), Symmetric(root.Imaginary, modulus));
        return BigInteger.Abs(symmetric.Real) <= bound && BigInteger.Abs(symmetric.Imaginary) <= bound ? symmetric : null;
    }

    // (a + b i)^-1 = (a - b i) / (a^2 + b^2); the norm is a unit modulo p^k because a + b i is a unit modulo p.
    private static GaussianInteger Inverse(GaussianInteger z, BigInteger p, BigInteger modulus)
    {
        var normInverse = UnitInverse(z.Norm, p, modulus);
        return Reduce(new GaussianInteger(z.Real * normInverse, -z.Imaginary * normInverse), modulus);
    }

    /// <summary>
    /// The inverse of n modulo a power <paramref name="modulus"/> of the prime p, for n a unit modulo p: Fermat's inverse
    /// modulo p, then Newton's iteration x &lt;- x (2 - n x), which doubles the exponent of p each step (common practice,
    /// Hensel lifting). Euler's x = n^(phi - 1) with phi of the size of the modulus took minutes at thousands of digits.
    /// </summary>
    internal static BigInteger UnitInverse(BigInteger n, BigInteger p, BigInteger modulus)
    {
        var x = BigInteger.ModPow(Positive(n, p), p - 2, p);
        var m = p;
        while (m < modulus)
        {
            m = BigInteger.Min(m * m, modulus);
            var reduced = Positive(n, m);
            x = Positive(x * (2 - (reduced * x)), m);
        }

        return x;
    }

    private static BigInteger Positive(BigInteger value, BigInteger modulus)
    {
        var r = BigInteger.Remainder(value, modulus);
        return r.Sign < 0 ? r + modulus : r;
    }

    private static GaussianInteger EvaluateModulo(GaussianInteger[] coefficients, GaussianInteger x, BigInteger modulus)
    {
        var value = new GaussianInteger(BigInteger.Zero, BigInteger.Zero);
        for (var k = coefficients.Length - 1; k >= 0; k--)
        {
            var product = value * x;
            value = Reduce(new GaussianInteger(product.Real + coefficients[k].Real, product.Imaginary + coefficients[k].Imaginary), modulus);
        }

        return value;
    }

    private static GaussianInteger Evaluate(GaussianInteger[] coefficients, GaussianInteger x)
    {
        var value = new GaussianInteger(BigInteger.Zero, BigInteger.Zero);
        for (var k = coefficients.Length - 1; k >= 0; k--)
        {
            var product = value * x;
            value = new GaussianInteger(product.Real + coefficients[k].Real, product.Imaginary + coefficients[k].Imaginary);
        }

        return value;
    }

    private static GaussianInteger Reduce(GaussianInteger z, BigInteger modulus) => new(Mod(z.Real, modulus), Mod(z.Imaginary, modulus));

    private static BigInteger Mod(BigInteger value, BigInteger modulus)
    {
        var r = BigInteger.Remainder(value, modulus);
        return r.Sign < 0 ? r + modulus : r;
    }

    private static BigInteger Symmetric(BigInteger residue, BigInteger modulus) => residue > modulus / 2 ? residue - modulus : residue;

    private static bool IsSmallPrime(int n)
    {
        for (var d = 2; d * d <= n; d++)
        {
            if (n % d == 0)
            {
                return false;
            }
        }

        return n >= 2;
    }
}
