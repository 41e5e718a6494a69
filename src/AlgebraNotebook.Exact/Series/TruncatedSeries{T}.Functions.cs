using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Series;

// The elementary functions use the Euler operator E = sum_i x_i d/dx_i, which multiplies a homogeneous part of
// degree k by k. Each function g(f) satisfies a first-order equation E g = (something) * E f, so its homogeneous
// parts follow from the lower ones: the cost is that of about one series product (O(N^2) coefficient products for one
// parameter at order N), not the O(N^3) of summing powers.
public sealed partial class TruncatedSeries<T>
{
    /// <summary>
    /// exp(f) for a series f with zero constant term, by the recurrence k g_k = sum_{j=1..k} j f_j g_{k-j} on homogeneous
    /// parts. Same order and parameters as f. Cost: about one series product.
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// The constant term is not zero (exp of it is not in the coefficient ring), or unknown, or f is exact but not a constant
    /// (the result would have infinitely many terms: truncate first).
    /// </exception>
    public TruncatedSeries<T> Exp()
    {
        if (IsZero)
        {
            return Create([(Monomial.One, T.One)], ExactOrder, _parameters);
        }

        RequireZeroConstantTerm("exp", "exp(c) of a non-zero constant term c is not in the coefficient ring; only exp(0) = 1 is");
        var n = Order;
        var f = HomogeneousParts(n);
        var g = new List<(Monomial Monomial, T Coefficient)>[n];
        g[0] = [(Monomial.One, T.One)];
        var ef = EulerScaled(f);
        for (var k = 1; k < n; k++)
        {
            var sums = new Dictionary<Monomial, T>();
            for (var j = 1; j <= k; j++)
            {
                AddProducts(sums, ef[j], g[k - j]);
            }

            g[k] = ScaledPart(sums, new Rational(1, k));
        }

        return Create(g.SelectMany(part => part), n, _parameters);
    }

    /// <summary>
    /// log(f) for a series f with constant term 1, by the recurrence g_k = f_k - (1/k) sum_{j=1..k-1} j g_j f_{k-j}.
    /// Same order and parameters as f; the constant term of the result is 0. Cost: about one series product.
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// The constant term is not 1 (log of it is not in the coefficient ring), or unknown, or f is exact but not 1.
    /// </exception>
    public TruncatedSeries<T> Log()
    {
        if (IsOne)
        {
            return Create([], ExactOrder, _parameters);
        }

        RequireConstantTermOne("log", "log(c) of a constant term c other than 1 is not in the coefficient ring; divide by the constant term first");
        var n = Order;
        var f = HomogeneousParts(n);
        var g = new List<(Monomial Monomial, T Coefficient)>[n];
        var eg = new List<(Monomial Monomial, T Coefficient)>[n];
        g[0] = [];
        eg[0] = [];
        for (var k = 1; k < n; k++)
        {
            var sums = new Dictionary<Monomial, T>();
            for (var j = 1; j < k; j++)
            {
                AddProducts(sums, eg[j], f[k - j]);
            }

            var part = new Dictionary<Monomial, T>();
            foreach (var (m, c) in f[k])
            {
                part[m] = c;
            }

            var factor = new Rational(-1, k);
            foreach (var (m, c) in sums)
            {
                var scaled = c.Scale(factor);
                part[m] = part.TryGetValue(m, out var old) ? old + scaled : scaled;
            }

            g[k] = ScaledPart(part, Rational.One);
            eg[k] = g[k].Select(t => (t.Monomial, t.Coefficient.Scale(k))).ToList();
        }

        return Create(g.SelectMany(part => part), n, _parameters);
    }

    /// <summary>sin(f) for a series f with zero constant term (see <see cref="SineAndCosine()"/>).</summary>
    /// <exception cref="ExactArgumentException">As for <see cref="Exp"/>.</exception>
    public TruncatedSeries<T> Sin() => SineAndCosineCore("sin").Sine;

    /// <summary>cos(f) for a series f with zero constant term (see <see cref="SineAndCosine()"/>).</summary>
    /// <exception cref="ExactArgumentException">As for <see cref="Exp"/>.</exception>
    public TruncatedSeries<T> Cos() => SineAndCosineCore("cos").Cosine;

    /// <summary>
    /// sin(f) and cos(f) together, for f with zero constant term, by the coupled recurrences
    /// k s_k = sum_j j f_j c_{k-j} and k c_k = -sum_j j f_j s_{k-j}. Cost: about two series products.
    /// </summary>
    /// <exception cref="ExactArgumentException">As for <see cref="Exp"/>.</exception>
    public (TruncatedSeries<T> Sine, TruncatedSeries<T> Cosine) SineAndCosine() => SineAndCosineCore("sin and cos");

    private (TruncatedSeries<T> Sine, TruncatedSeries<T> Cosine) SineAndCosineCore(string name)
    {
        if (IsZero)
        {
            return (this, Create([(Monomial.One, T.One)], ExactOrder, _parameters));
        }

        RequireZeroConstantTerm(name, $"{name} of a non-zero constant term is not in the coefficient ring");
        var n = Order;
        var ef = EulerScaled(HomogeneousParts(n));
        var s = new List<(Monomial Monomial, T Coefficient)>[n];
        var c = new List<(Monomial Monomial, T Coefficient)>[n];
        s[0] = [];
        c[0] = [(Monomial.One, T.One)];
        for (var k = 1; k < n; k++)
        {
            var sineSums = new Dictionary<Monomial, T>();
            var cosineSums = new Dictionary<Monomial, T>();
            for (var j = 1; j <= k; j++)
            {
                AddProducts(sineSums, ef[j], c[k - j]);
                AddProducts(cosineSums, ef[j], s[k - j]);
            }

            s[k] = ScaledPart(sineSums, new Rational(1, k));
            c[k] = ScaledPart(cosineSums, new Rational(-1, k));
        }

        return (Create(s.SelectMany(p => p), n, _parameters), Create(c.SelectMany(p => p), n, _parameters));
    }

    /// <summary>
    /// 1/f, given the inverse of the constant term (useful when the coefficients are not a field but the constant term is
    /// a unit), by g_0 = u, g_k = -u sum_{j=1..k} f_j g_{k-j}. Same order and parameters. Cost: about one series product.
    /// For field coefficients, <see cref="TruncatedSeries.Reciprocal{TField}(TruncatedSeries{TField})"/> finds u itself.
    /// </summary>
    /// <param name="constantTermInverse">u with u * c = 1 for the constant term c.</param>
    /// <exception cref="ExactArgumentException">
    /// u * c is not 1, the constant term is unknown, or the series is exact but not a constant.
    /// </exception>
    public TruncatedSeries<T> Reciprocal(T constantTermInverse)
    {
        ArgumentNullException.ThrowIfNull(constantTermInverse);
        if (Order == 0)
        {
            throw new ExactArgumentException($"Cannot invert {this}: its constant term is unknown (order 0).", nameof(constantTermInverse));
        }

        var c = ConstantTermCore;
        if (!(constantTermInverse * c).IsOne || !(c * constantTermInverse).IsOne)
        {
            throw new ExactArgumentException(
                $"Cannot invert {this}: {constantTermInverse} is not the inverse of the constant term {c}.", nameof(constantTermInverse));
        }

        if (Order == ExactOrder)
        {
            if (_terms.Length == 1)
            {
                return Constant(constantTermInverse);
            }

            throw new ExactArgumentException(
                $"The reciprocal of the exact series {this} has infinitely many terms; choose a working order with Truncate(order) first.",
                nameof(constantTermInverse));
        }

        return ReciprocalCore(constantTermInverse);
    }

    internal TruncatedSeries<T> ReciprocalCore(T u)
    {
        var n = Order;
        var f = HomogeneousParts(n);
        var g = new List<(Monomial Monomial, T Coefficient)>[n];
        g[0] = [(Monomial.One, u)];
        var minusU = -u;
        for (var k = 1; k < n; k++)
        {
            var sums = new Dictionary<Monomial, T>();
            for (var j = 1; j <= k; j++)
            {
                AddProducts(sums, f[j], g[k - j]);
            }

            g[k] = sums.Where(t => !t.Value.IsZero).Select(t => (t.Key, minusU * t.Value)).Where(t => !t.Item2.IsZero).ToList();
        }

        return Create(g.SelectMany(p => p), n, _parameters);
    }

    /// <summary>
    /// f^a for a rational exponent a and a series f with constant term 1 (the binomial series; a = 1/2 is the square root
    /// with constant term 1), by the recurrence k g_k = sum_{j=1..k} (a j - (k - j)) f_j g_{k-j}. An integer exponent
    /// gives the same as <see cref="Pow(int)"/>. Cost: about one series product.
    /// </summary>
    /// <exception cref="ExactArgumentException">The exponent is not an integer and the constant term is not 1, or f is exact.</exception>
    public TruncatedSeries<T> Pow(Rational exponent)
    {
        if (exponent.IsInteger && exponent.Numerator >= int.MinValue + 1 && exponent.Numerator <= int.MaxValue)
        {
            return Pow((int)exponent.Numerator);
        }

        if (IsOne)
        {
            return this;
        }

        RequireConstantTermOne($"the power {exponent}", $"a non-integer power of a constant term other than 1 is not in the coefficient ring");
        var n = Order;
        var f = HomogeneousParts(n);
        var g = new List<(Monomial Monomial, T Coefficient)>[n];
        g[0] = [(Monomial.One, T.One)];
        for (var k = 1; k < n; k++)
        {
            var sums = new Dictionary<Monomial, T>();
            for (var j = 1; j <= k; j++)
            {
                var weight = exponent * j - (k - j);
                if (!weight.IsZero)
                {
                    AddProducts(sums, f[j].Select(t => (t.Monomial, t.Coefficient.Scale(weight))).ToList(), g[k - j]);
                }
            }

            g[k] = ScaledPart(sums, new Rational(1, k));
        }

        return Create(g.SelectMany(p => p), n, _parameters);
    }

    private void RequireZeroConstantTerm(string function, string reason)
    {
        if (Order == 0)
        {
            throw new ExactArgumentException($"Cannot take {function} of {this}: its constant term is unknown (order 0).", "series");
        }

        var c = ConstantTermCore;
        if (!c.IsZero)
        {
            throw new ExactArgumentException(
                $"Cannot take {function} of {this}: the constant term is {c}, but it must be 0 ({reason}).", "series");
        }

        RequireFiniteOrder(function);
    }

    private void RequireConstantTermOne(string function, string reason)
    {
        if (Order == 0)
        {
            throw new ExactArgumentException($"Cannot take {function} of {this}: its constant term is unknown (order 0).", "series");
        }

        var c = ConstantTermCore;
        if (!c.IsOne)
        {
            throw new ExactArgumentException(
                $"Cannot take {function} of {this}: the constant term is {c}, but it must be 1 ({reason}).", "series");
        }

        RequireFiniteOrder(function);
    }

    private void RequireFiniteOrder(string function)
    {
        if (Order == ExactOrder)
        {
            throw new ExactArgumentException(
                $"{function} of the exact series {this} has infinitely many terms; choose a working order with Truncate(order) first.", "series");
        }
    }

    /// <summary>The known homogeneous parts of degree 0 .. limit-1 (terms are already sorted by degree).</summary>
    private List<(Monomial Monomial, T Coefficient)>[] HomogeneousParts(int limit)
    {
        var parts = new List<(Monomial Monomial, T Coefficient)>[limit];
        for (var k = 0; k < limit; k++)
        {
            parts[k] = [];
        }

        foreach (var term in _terms)
        {
            if (term.Monomial.TotalDegree >= limit)
            {
                break;
            }

            parts[term.Monomial.TotalDegree].Add(term);
        }

        return parts;
    }

    /// <summary>E f: the homogeneous part of degree j multiplied by j.</summary>
    private static List<(Monomial Monomial, T Coefficient)>[] EulerScaled(List<(Monomial Monomial, T Coefficient)>[] parts)
    {
        var scaled = new List<(Monomial Monomial, T Coefficient)>[parts.Length];
        for (var j = 0; j < parts.Length; j++)
        {
            var factor = new Rational(j);
            scaled[j] = parts[j].Select(t => (t.Monomial, t.Coefficient.Scale(factor))).Where(t => !t.Item2.IsZero).ToList();
        }

        return scaled;
    }

    private static void AddProducts(Dictionary<Monomial, T> sums, List<(Monomial Monomial, T Coefficient)> left, List<(Monomial Monomial, T Coefficient)> right)
    {
        foreach (var (ml, cl) in left)
        {
            foreach (var (mr, cr) in right)
            {
                var m = ml * mr;
                var c = cl * cr;
                sums[m] = sums.TryGetValue(m, out var old) ? old + c : c;
            }
        }
    }

    private static List<(Monomial Monomial, T Coefficient)> ScaledPart(Dictionary<Monomial, T> sums, Rational factor)
    {
        var part = new List<(Monomial Monomial, T Coefficient)>(sums.Count);
        foreach (var (m, c) in sums)
        {
            if (!c.IsZero)
            {
                var scaled = factor.IsOne ? c : c.Scale(factor);
                if (!scaled.IsZero)
                {
                    part.Add((m, scaled));
                }
            }
        }

        return part;
    }
}
