using System.Text;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// A power product x1^e1 ... xk^ek of symbols with positive exponents; immutable and canonical
/// (factors sorted by <see cref="Symbol.Compare"/>, i.e. by name, no zero exponents). The empty product is <see cref="One"/>.
/// Every exponent and the total degree fit in an <see cref="int"/>, never wrapped around: a product whose exponents or
/// total degree would exceed <see cref="int.MaxValue"/> throws <see cref="OverflowException"/> (the parsers report it as
/// a parse error); <see cref="FromFactors"/> and <see cref="Pow"/> refuse such input with named exceptions.
/// </summary>
public sealed class Monomial : IEquatable<Monomial>
{
    private readonly Symbol[] _symbols;
    private readonly int[] _exponents;
    private readonly int _hash;

    private Monomial(Symbol[] symbols, int[] exponents)
    {
        _symbols = symbols;
        _exponents = exponents;
        var degree = 0;
        var hash = 17;
        for (var k = 0; k < symbols.Length; k++)
        {
            // Checked: a wrapped-around total degree would break the graded orders (a product of sorted terms would come
            // out unsorted, so equal polynomials would compare unequal).
            degree = checked(degree + exponents[k]);
            hash = unchecked((hash * 31 + symbols[k].Id) * 31 + exponents[k]);
        }

        TotalDegree = degree;
        _hash = hash;
    }

    /// <summary>The empty product 1.</summary>
    public static Monomial One { get; } = new([], []);

    /// <summary>Sum of the exponents.</summary>
    public int TotalDegree { get; }

    /// <summary>True for the empty product.</summary>
    public bool IsOne => _symbols.Length == 0;

    /// <summary>Number of distinct symbols with a positive exponent.</summary>
    public int FactorCount => _symbols.Length;

    /// <summary>The factors (symbol, exponent) in the canonical symbol order (by name, see <see cref="Symbol.Compare"/>).</summary>
    public IEnumerable<(Symbol Symbol, int Exponent)> Factors
    {
        get
        {
            for (var k = 0; k < _symbols.Length; k++)
            {
                yield return (_symbols[k], _exponents[k]);
            }
        }
    }

    /// <summary>The symbol of the k-th factor.</summary>
    public Symbol SymbolAt(int k) => _symbols[k];

    /// <summary>The exponent of the k-th factor.</summary>
    public int ExponentAt(int k) => _exponents[k];

    /// <summary>The monomial consisting of one symbol to a power (power 0 gives <see cref="One"/>).</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    public static Monomial Of(Symbol symbol, int exponent = 1)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} of {symbol} is negative; monomials have non-negative exponents.", nameof(exponent));
        }

        return exponent == 0 ? One : new Monomial([symbol], [exponent]);
    }

    /// <summary>Builds a monomial from factors in any order; repeated symbols add their exponents, zero exponents vanish.</summary>
    /// <exception cref="ExactArgumentException">An exponent is negative, or an exponent or the total degree would exceed
    /// <see cref="int.MaxValue"/>.</exception>
    public static Monomial FromFactors(IEnumerable<(Symbol Symbol, int Exponent)> factors)
    {
        ArgumentNullException.ThrowIfNull(factors);
        var collected = new SortedDictionary<Symbol, (Symbol Symbol, int Exponent)>();
        foreach (var (symbol, exponent) in factors)
        {
            if (exponent < 0)
            {
                throw new ExactArgumentException($"Exponent {exponent} of {symbol} is negative; monomials have non-negative exponents.", nameof(factors));
            }

            var sum = collected.TryGetValue(symbol, out var old) ? (long)old.Exponent + exponent : exponent;
            if (sum > int.MaxValue)
            {
                throw new ExactArgumentException(
                    $"The exponents of {symbol} add up to {sum}, more than the largest exponent a monomial holds ({int.MaxValue}).", nameof(factors));
            }

            collected[symbol] = (symbol, (int)sum);
        }

        var kept = collected.Values.Where(f => f.Exponent != 0).ToArray();
        var total = kept.Sum(f => (long)f.Exponent);
        if (total > int.MaxValue)
        {
            throw new ExactArgumentException(
                $"The factors {string.Join(", ", kept.Select(f => $"{f.Symbol}^{f.Exponent}"))} have total degree {total}, more than a monomial holds ({int.MaxValue}).", nameof(factors));
        }

        return kept.Length == 0 ? One : new Monomial(kept.Select(f => f.Symbol).ToArray(), kept.Select(f => f.Exponent).ToArray());
    }

    /// <summary>The exponent of <paramref name="symbol"/> (0 when absent).</summary>
    public int ExponentOf(Symbol symbol)
    {
        for (var k = 0; k < _symbols.Length; k++)
        {
            if (ReferenceEquals(_symbols[k], symbol))
            {
                return _exponents[k];
            }

            if (Symbol.Compare(_symbols[k], symbol) > 0)
            {
                break;
            }
        }

        return 0;
    }

    /// <summary>The product of two monomials.</summary>
    public static Monomial operator *(Monomial left, Monomial right)
    {
        if (left.IsOne)
        {
            return right;
        }

        if (right.IsOne)
        {
            return left;
        }

        return Merge(left, right, MergeKind.Add);
    }

    /// <summary>True when this monomial divides <paramref name="other"/>.</summary>
    public bool Divides(Monomial other)
    {
        int i = 0, j = 0;
        while (i < _symbols.Length)
        {
            while (j < other._symbols.Length && Symbol.Compare(other._symbols[j], _symbols[i]) < 0)
            {
                j++;
            }

            if (j == other._symbols.Length || !ReferenceEquals(other._symbols[j], _symbols[i]) || other._exponents[j] < _exponents[i])
            {
                return false;
            }

            i++;
            j++;
        }

        return true;
    }

    /// <summary>The quotient this / divisor.</summary>
    /// <exception cref="ExactArgumentException">The divisor does not divide this monomial.</exception>
    public Monomial DivideBy(Monomial divisor)
    {
        if (!divisor.Divides(this))
        {
            throw new ExactArgumentException($"{divisor} does not divide {this}.", nameof(divisor));
        }

        return divisor.IsOne ? this : Merge(this, divisor, MergeKind.Subtract);
    }

    /// <summary>The quotient this / divisor when the caller knows the divisor divides this monomial.</summary>
    internal Monomial DivideByUnchecked(Monomial divisor) => divisor.IsOne ? this : Merge(this, divisor, MergeKind.Subtract);

    /// <summary>Least common multiple (componentwise maximum of exponents).</summary>
    public static Monomial Lcm(Monomial left, Monomial right) => Merge(left, right, MergeKind.Max);

    /// <summary>Greatest common divisor (componentwise minimum of exponents).</summary>
    public static Monomial Gcd(Monomial left, Monomial right) => Merge(left, right, MergeKind.Min);

    /// <summary>True when the two monomials share no symbol.</summary>
    public static bool AreCoprime(Monomial left, Monomial right)
    {
        int i = 0, j = 0;
        while (i < left._symbols.Length && j < right._symbols.Length)
        {
            var c = Symbol.Compare(left._symbols[i], right._symbols[j]);
            if (c == 0)
            {
                return false;
            }

            if (c < 0)
            {
                i++;
            }
            else
            {
                j++;
            }
        }

        return true;
    }

    /// <summary>This monomial to a non-negative power.</summary>
    /// <exception cref="ExactArgumentException">The exponent is negative.</exception>
    /// <exception cref="BeyondCapabilityException">The total degree of the result would exceed <see cref="int.MaxValue"/>.</exception>
    public Monomial Pow(int exponent)
    {
        if (exponent < 0)
        {
            throw new ExactArgumentException($"Exponent {exponent} is negative; monomials have non-negative exponents.", nameof(exponent));
        }

        if (exponent == 0)
        {
            return One;
        }

        var degree = (long)TotalDegree * exponent;
        if (degree > int.MaxValue)
        {
            throw new BeyondCapabilityException(
                $"({this})^{exponent} would have total degree {degree}, beyond the largest exponent and total degree a monomial holds ({int.MaxValue}).");
        }

        // Each exponent is at most the total degree, so no product below overflows.
        return new Monomial((Symbol[])_symbols.Clone(), _exponents.Select(e => e * exponent).ToArray());
    }

    /// <summary>The monomial with <paramref name="symbol"/> removed.</summary>
    public Monomial Without(Symbol symbol) =>
        ExponentOf(symbol) == 0 ? this : FromFactors(Factors.Where(f => !ReferenceEquals(f.Symbol, symbol)));

    // Kept allocation-light: Groebner computations multiply and divide monomials in their inner loops.
    private enum MergeKind
    {
        Add,
        Subtract,
        Max,
        Min,
    }

    internal Symbol[] SymbolArray => _symbols;

    internal int[] ExponentArray => _exponents;

    private static Monomial Merge(Monomial left, Monomial right, MergeKind kind)
    {
        var ls = left._symbols;
        var rs = right._symbols;
        var le = left._exponents;
        var re = right._exponents;
        var capacity = ls.Length + rs.Length;
        var symbols = new Symbol[capacity];
        var exponents = new int[capacity];
        var count = 0;
        int i = 0, j = 0;
        while (i < ls.Length || j < rs.Length)
        {
            Symbol symbol;
            int a = 0, b = 0;
            if (j == rs.Length || (i < ls.Length && Symbol.Compare(ls[i], rs[j]) < 0))
            {
                symbol = ls[i];
                a = le[i++];
            }
            else if (i == ls.Length || Symbol.Compare(rs[j], ls[i]) < 0)
            {
                symbol = rs[j];
                b = re[j++];
            }
            else
            {
                symbol = ls[i];
                a = le[i++];
                b = re[j++];
            }

            var e = kind switch
            {
                MergeKind.Add => checked(a + b),
                MergeKind.Subtract => a - b,
                MergeKind.Max => Math.Max(a, b),
                _ => Math.Min(a, b),
            };
            if (e != 0)
            {
                symbols[count] = symbol;
                exponents[count] = e;
                count++;
            }
        }

        if (count == 0)
        {
            return One;
        }

        if (count < capacity)
        {
            Array.Resize(ref symbols, count);
            Array.Resize(ref exponents, count);
        }

        return new Monomial(symbols, exponents);
    }

    /// <inheritdoc />
    public bool Equals(Monomial? other)
    {
        if (ReferenceEquals(this, other))
        {
            return true;
        }

        if (other is null || other._hash != _hash || other._symbols.Length != _symbols.Length)
        {
            return false;
        }

        for (var k = 0; k < _symbols.Length; k++)
        {
            if (!ReferenceEquals(_symbols[k], other._symbols[k]) || _exponents[k] != other._exponents[k])
            {
                return false;
            }
        }

        return true;
    }

    /// <inheritdoc />
    public override bool Equals(object? obj) => Equals(obj as Monomial);

    /// <inheritdoc />
    public override int GetHashCode() => _hash;

    /// <summary>Plain text such as "x^2*y", or "1".</summary>
    public override string ToString()
    {
        if (IsOne)
        {
            return "1";
        }

        var text = new StringBuilder();
        for (var k = 0; k < _symbols.Length; k++)
        {
            if (k > 0)
            {
                text.Append('*');
            }

            text.Append(_symbols[k].Name);
            if (_exponents[k] != 1)
            {
                text.Append('^').Append(_exponents[k]);
            }
        }

        return text.ToString();
    }
}
