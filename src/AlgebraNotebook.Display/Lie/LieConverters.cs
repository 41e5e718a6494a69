using AlgebraNotebook.Algebras;
using AlgebraNotebook.Display.Conversion;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display trees for Lie-algebra elements, written once for every scalar type. Register with
/// <c>AddGeneric(typeof(LieElement&lt;&gt;), Method(typeof(LieConverters), nameof(LieConverters.FromLieElement)))</c>.
/// </summary>
internal static class LieConverters
{
    /// <summary>
    /// An element as the sum of coefficient times basis name in basis order ("2 H - E - 1/2 F"); names with an
    /// underscore are typeset with a subscript (J_x); coefficients go through the registry; the zero element is 0.
    /// </summary>
    public static MathNode FromLieElement<T>(LieElement<T> element)
        where T : IFieldElement<T>
    {
        var terms = new List<SumTerm>();
        for (var i = 0; i < element.Coefficients.Count; i++)
        {
            var c = element.Coefficients[i];
            if (c.IsZero)
            {
                continue;
            }

            var name = MathNodes.Symbol(element.Algebra.BasisNames[i]);
            terms.Add(new SumTerm(false, c.IsOne ? name : MathNodes.Product(ConverterRegistry.ToTree(c), name)));
        }

        return MathNodes.Sum(terms);
    }
}
