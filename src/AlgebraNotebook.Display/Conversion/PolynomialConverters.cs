using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Display.Conversion;

/// <summary>Display trees for symbols, monomials, polynomials and quotient-ring elements (written once for every coefficient type).</summary>
internal static class PolynomialConverters
{
    /// <summary>A symbol as an identifier (typeset by <see cref="SymbolNames"/>).</summary>
    public static MathNode FromSymbol(Symbol symbol) => MathNodes.Symbol(symbol.Name);

    /// <summary>A power product in the monomial's factor order, "x^2 y"; the empty product is 1.</summary>
    public static MathNode FromMonomial(Monomial monomial)
    {
        if (monomial.IsOne)
        {
            return MathNodes.One;
        }

        var factors = new MathNode[monomial.FactorCount];
        for (var k = 0; k < factors.Length; k++)
        {
            factors[k] = MathNodes.Power(FromSymbol(monomial.SymbolAt(k)), monomial.ExponentAt(k));
        }

        return MathNodes.Product(factors);
    }

    /// <summary>A polynomial as the sum of its terms in the order of <see cref="Polynomial{T}.Terms"/> (descending in the default monomial order).</summary>
    public static MathNode FromPolynomial<T>(Polynomial<T> polynomial)
        where T : IFieldElement<T> => LinearCombination(polynomial.Terms);

    /// <summary>An element of a quotient ring as its normal-form representative.</summary>
    public static MathNode FromQuotientElement<T>(QuotientElement<T> element)
        where T : IFieldElement<T> => LinearCombination(element.Representative.Terms);

    /// <summary>
    /// The sum of coefficient times monomial over <paramref name="terms"/> in the given order. Each coefficient is
    /// converted through the registry, so any renderable coefficient type works; its sign moves into the sum, a
    /// coefficient 1 is left out and a coefficient with several terms (a + b i) is parenthesised. Zero terms are
    /// skipped; an empty combination is 0.
    /// </summary>
    public static MathNode LinearCombination<T>(IEnumerable<(Monomial Monomial, T Coefficient)> terms)
        where T : notnull
    {
        var parts = new List<SumTerm>();
        foreach (var (monomial, coefficient) in terms)
        {
            parts.Add(new SumTerm(false, Term(monomial, coefficient)));
        }

        return MathNodes.Sum(parts);
    }

    /// <summary>One term coefficient times monomial.</summary>
    public static MathNode Term<T>(Monomial monomial, T coefficient)
        where T : notnull
    {
        var coefficientNode = ConverterRegistry.ToTree(coefficient);
        return monomial.IsOne ? coefficientNode : MathNodes.Product(coefficientNode, FromMonomial(monomial));
    }
}
