using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Elements of the universal enveloping algebra in its PBW basis: a sum of coefficient times ordered products of the
/// algebra's basis names with powers (H^2 E F), in the element's own term order (higher degree first).
/// </summary>
internal static class EnvelopingDisplay
{
    public static MathNode FromEnvelopingElement<T>(EnvelopingElement<T> element)
        where T : IFieldElement<T>
    {
        var names = element.Enveloping.Algebra.BasisNames;
        var terms = new List<SumTerm>();
        foreach (var (monomial, coefficient) in element.Terms)
        {
            var factors = new List<MathNode>();
            for (var i = 0; i < monomial.Exponents.Count; i++)
            {
                if (monomial.Exponents[i] > 0)
                {
                    factors.Add(MathNodes.Power(MathNodes.Symbol(names[i]), monomial.Exponents[i]));
                }
            }

            if (factors.Count == 0)
            {
                terms.Add(new SumTerm(false, ConverterRegistry.ToTree(coefficient)));
                continue;
            }

            var product = MathNodes.Product(factors.ToArray());
            terms.Add(new SumTerm(false, coefficient.IsOne ? product : MathNodes.Product(ConverterRegistry.ToTree(coefficient), product)));
        }

        return MathNodes.Sum(terms);
    }
}
