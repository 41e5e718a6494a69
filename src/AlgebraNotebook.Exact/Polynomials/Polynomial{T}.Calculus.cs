using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Polynomials;

public sealed partial class Polynomial<T>
{
    /// <summary>The partial derivative with respect to <paramref name="symbol"/> (zero when the symbol does not occur).</summary>
    public Polynomial<T> Derivative(Symbol symbol)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        var single = Monomial.Of(symbol);
        var monomials = new List<Monomial>();
        var coefficients = new List<T>();
        for (var k = 0; k < _monomials.Length; k++)
        {
            var e = _monomials[k].ExponentOf(symbol);
            if (e > 0)
            {
                // Dividing every term by the same symbol keeps the descending order (orders respect multiplication).
                monomials.Add(_monomials[k].DivideByUnchecked(single));
                coefficients.Add(_coefficients[k] * CoefficientSupport<T>.FromInt(e));
            }
        }

        return FromArrays((monomials.ToArray(), coefficients.ToArray()));
    }

    /// <summary>
    /// Replaces every occurrence of <paramref name="symbol"/> by <paramref name="replacement"/> and expands.
    /// </summary>
    public Polynomial<T> Substitute(Symbol symbol, Polynomial<T> replacement)
    {
        ArgumentNullException.ThrowIfNull(symbol);
        ArgumentNullException.ThrowIfNull(replacement);
        var powers = new List<Polynomial<T>> { OneInstance };
        var result = ZeroInstance;
        var untouched = new Dictionary<Monomial, T>();
        for (var k = 0; k < _monomials.Length; k++)
        {
            var e = _monomials[k].ExponentOf(symbol);
            if (e == 0)
            {
                untouched[_monomials[k]] = _coefficients[k];
                continue;
            }

            while (powers.Count <= e)
            {
                powers.Add(powers[^1] * replacement);
            }

            result += powers[e].MultiplyByTerm(_coefficients[k], _monomials[k].Without(symbol));
        }

        return result + FromArrays(TermArithmetic<T>.FromUnsorted(untouched, MonomialOrder.Default));
    }

    /// <summary>
    /// The value at the point given by <paramref name="values"/> (a value for every symbol that occurs).
    /// </summary>
    /// <exception cref="ExactArgumentException">A symbol of the polynomial has no value.</exception>
    public T Evaluate(IReadOnlyDictionary<Symbol, T> values)
    {
        ArgumentNullException.ThrowIfNull(values);
        var total = T.Zero;
        for (var k = 0; k < _monomials.Length; k++)
        {
            var term = _coefficients[k];
            var m = _monomials[k];
            for (var f = 0; f < m.FactorCount; f++)
            {
                var s = m.SymbolAt(f);
                if (!values.TryGetValue(s, out var v))
                {
                    throw new ExactArgumentException(
                        $"Cannot evaluate {this}: no value is given for the symbol {s}.", nameof(values));
                }

                term *= PowScalar(v, m.ExponentAt(f));
            }

            total += term;
        }

        return total;
    }
}
