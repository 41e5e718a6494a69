using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Operators;

public sealed partial class DifferentialOperator<T>
{
    /// <summary>Sum of two operators over the same ring.</summary>
    /// <exception cref="ExactArgumentException">The operators are over different rings.</exception>
    public static DifferentialOperator<T> operator +(DifferentialOperator<T> left, DifferentialOperator<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.RequireSameRing(right, nameof(right));
        var sum = new Dictionary<Monomial, Polynomial<T>>();
        foreach (var (d, c) in left._terms)
        {
            Accumulate(sum, d, c);
        }

        foreach (var (d, c) in right._terms)
        {
            Accumulate(sum, d, c);
        }

        return FromUnreduced(left.Ring, sum);
    }

    /// <summary>Negation.</summary>
    public static DifferentialOperator<T> operator -(DifferentialOperator<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return new(value.Ring, value._terms.Select(t => (t.Derivative, -t.Coefficient)));
    }

    /// <summary>Difference of two operators over the same ring.</summary>
    /// <exception cref="ExactArgumentException">The operators are over different rings.</exception>
    public static DifferentialOperator<T> operator -(DifferentialOperator<T> left, DifferentialOperator<T> right) => left + -right;

    /// <summary>The operator multiplied on the left by a constant.</summary>
    public static DifferentialOperator<T> operator *(T factor, DifferentialOperator<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return factor.IsZero ? Zero(value.Ring) : new(value.Ring, value._terms.Select(t => (t.Derivative, t.Coefficient * factor)));
    }

    /// <summary>The operator multiplied on the left by a coefficient: (c*A) f = c (A f).</summary>
    /// <exception cref="ExactArgumentException">The coefficient belongs to another ring.</exception>
    public static DifferentialOperator<T> operator *(Coefficient<T> factor, DifferentialOperator<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return Multiplication(value.Ring, factor) * value;
    }

    /// <summary>Composition (A*B) f = A(B f), normal-ordered by the Leibniz rule and reduced.</summary>
    /// <exception cref="ExactArgumentException">The operators are over different rings.</exception>
    public static DifferentialOperator<T> operator *(DifferentialOperator<T> left, DifferentialOperator<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.RequireSameRing(right, nameof(right));
        var ring = left.Ring;
        var sum = new Dictionary<Monomial, Polynomial<T>>();
        foreach (var (alpha, a) in left._terms)
        {
            foreach (var (gamma, binomial) in SubIndices(alpha))
            {
                var rest = alpha.DivideBy(gamma);
                foreach (var (beta, b) in right._terms)
                {
                    var db = ring.Differentiate(b, gamma);
                    if (db.IsZero)
                    {
                        continue;
                    }

                    Accumulate(sum, rest * beta, a * db * T.FromInteger(binomial));
                }
            }
        }

        return FromUnreduced(ring, sum);
    }

    /// <summary>The commutator [A, B] = A*B - B*A.</summary>
    /// <exception cref="ExactArgumentException">The operators are over different rings.</exception>
    public static DifferentialOperator<T> Commutator(DifferentialOperator<T> left, DifferentialOperator<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        left.RequireSameRing(right, nameof(right));
        return left * right - right * left;
    }

    /// <summary>
    /// Conservation check: does this operator A commute with <paramref name="generator"/> H? The result carries the
    /// remainder [H, A] = H*A - A*H in normal form.
    /// </summary>
    /// <exception cref="ExactArgumentException">The operators are over different rings.</exception>
    public ConservationCheck<T> CommutesWith(DifferentialOperator<T> generator)
    {
        RequireSameRing(generator, nameof(generator));
        return new ConservationCheck<T>(this, generator);
    }

    /// <summary>The n-th power (composition with itself); power 0 is the identity.</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public DifferentialOperator<T> Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} is negative; differential operators have no inverses here.", nameof(exponent));
        }

        var result = Identity(Ring);
        var square = this;
        for (var n = exponent; n > 0; n >>= 1)
        {
            if ((n & 1) == 1)
            {
                result = result * square;
            }

            if (n > 1)
            {
                square = square * square;
            }
        }

        return result;
    }

    /// <summary>Applies the operator to a coefficient: sum of c_alpha * d^alpha(value), in normal form.</summary>
    /// <exception cref="ExactArgumentException">The coefficient belongs to another ring.</exception>
    public Coefficient<T> Apply(Coefficient<T> value)
    {
        Ring.RequireMine(value, nameof(value));
        var sum = Polynomial<T>.Zero;
        foreach (var (alpha, c) in _terms)
        {
            sum += c * Ring.Differentiate(value.Polynomial, alpha);
        }

        return new Coefficient<T>(Ring, Ring.Reduce(sum));
    }

    /// <summary>
    /// Applies the operator to an arbitrary (unspecified) function of the coordinates, e.g. f(x, y, z): the result is
    /// the combination of the partial derivatives of f with the operator's coefficients.
    /// </summary>
    /// <exception cref="ExactArgumentException">The function name is not an identifier or is a declared symbol of the ring.</exception>
    public FunctionDerivatives<T> ApplyToFunction(string functionName)
    {
        ArgumentNullException.ThrowIfNull(functionName);
        if (!Symbol.IsValidName(functionName) || Ring.Symbols.Any(s => s.Name == functionName))
        {
            throw new ExactArgumentException(
                $"\"{functionName}\" cannot name an arbitrary function here: use an identifier that is not a symbol of ring \"{Ring.Name}\".",
                nameof(functionName));
        }

        return new FunctionDerivatives<T>(this, functionName);
    }

    /// <summary>
    /// The formal transpose without conjugation: sum of (-1)^|alpha| d^alpha o c_alpha, normal-ordered; with respect to
    /// the bilinear pairing integral(g * f) under the flat measure dx1...dxn in this ring's coordinates.
    /// </summary>
    public DifferentialOperator<T> FormalTranspose() => TransposeCore(conjugate: false);

    /// <summary>
    /// The formal adjoint A^dagger with respect to the flat measure dx1...dxn in this ring's coordinates (NOT the
    /// curvilinear volume element, e.g. not r^2 sin theta dr dtheta dphi): integral(conj(g) * A f) =
    /// integral(conj(A^dagger g) * f) for compactly supported f, g. Computed as sum of (-1)^|alpha| d^alpha o conj(c_alpha);
    /// coordinates and parameters are real, functions real unless declared in a conjugate pair.
    /// </summary>
    public DifferentialOperator<T> FormalAdjoint() => TransposeCore(conjugate: true);

    private DifferentialOperator<T> TransposeCore(bool conjugate)
    {
        var result = Zero(Ring);
        foreach (var (alpha, c) in _terms)
        {
            var coefficient = conjugate ? Ring.Reduce(Ring.ConjugateRaw(c)) : c;
            var sign = alpha.TotalDegree % 2 == 0 ? T.One : -T.One;
            var derivative = new DifferentialOperator<T>(Ring, [(alpha, Polynomial<T>.Constant(sign))]);
            result += derivative * new DifferentialOperator<T>(Ring, [(Monomial.One, coefficient)]);
        }

        return result;
    }

    /// <summary>Sub-multi-indices gamma &lt;= alpha with the product of binomial coefficients C(alpha_i, gamma_i).</summary>
    private static IEnumerable<(Monomial Gamma, BigInteger Binomial)> SubIndices(Monomial alpha)
    {
        var factors = alpha.Factors.ToArray();
        var current = new int[factors.Length];
        while (true)
        {
            BigInteger binomial = BigInteger.One;
            for (var k = 0; k < factors.Length; k++)
            {
                binomial *= Binomial(factors[k].Exponent, current[k]);
            }

            yield return (Monomial.FromFactors(factors.Select((f, k) => (f.Symbol, current[k]))), binomial);
            var index = 0;
            while (index < factors.Length && current[index] == factors[index].Exponent)
            {
                current[index] = 0;
                index++;
            }

            if (index == factors.Length)
            {
                yield break;
            }

            current[index]++;
        }
    }

    private static BigInteger Binomial(int n, int k)
    {
        BigInteger result = BigInteger.One;
        for (var j = 1; j <= k; j++)
        {
            result = result * (n - k + j) / j;
        }

        return result;
    }
}
