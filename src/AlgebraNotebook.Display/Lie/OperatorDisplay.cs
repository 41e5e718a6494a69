using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Operators;

namespace AlgebraNotebook.Display.Lie;

/// <summary>
/// Display trees for differential operators and their companions (<see cref="DifferentialOperator{T}"/>,
/// <see cref="VectorField{T}"/>, <see cref="Coefficient{T}"/>, <see cref="ConservationCheck{T}"/>), written once for every
/// field of constants.
/// </summary>
/// <remarks>
/// Conventions. A partial derivative is a ∂ with the coordinate as subscript: ∂ₓ (MathML <c>&lt;msub&gt;&lt;mo&gt;∂&lt;/mo&gt;…</c>,
/// LaTeX <c>\partial_{x}</c>, plain text <c>d_x</c> as in the operators' own text syntax); a repeated derivative is a power,
/// ∂ₓ²∂ᵧ, with the coordinates in the ring's declaration order. Operators are shown in their normal form: every
/// coefficient stands to the LEFT of the derivatives, so x ∂ᵧ means "differentiate, then multiply by x"; terms come by
/// decreasing order, then in the ring's coordinate order (the order of <see cref="DifferentialOperator{T}.Terms"/>).
/// Coefficients are their normal-form polynomials (<see cref="Coefficient{T}.Polynomial"/>) shown by the polynomial
/// converter, parenthesised when they are sums.
/// </remarks>
internal static class OperatorDisplay
{
    /// <summary>The operator as the sum of coefficient times derivative monomial; the zero operator is 0.</summary>
    public static MathNode FromDifferentialOperator<T>(DifferentialOperator<T> op)
        where T : IFieldElement<T>
    {
        var terms = new List<SumTerm>();
        foreach (var (derivative, coefficient) in op.Terms)
        {
            terms.Add(new SumTerm(false, MathNodes.Product(FromCoefficient(coefficient), Derivative(op.Ring, derivative))));
        }

        return MathNodes.Sum(terms);
    }

    /// <summary>The vector field as its first-order operator, sum of v^x ∂ₓ.</summary>
    public static MathNode FromVectorField<T>(VectorField<T> field)
        where T : IFieldElement<T> => FromDifferentialOperator(field.ToOperator());

    /// <summary>The coefficient's normal-form polynomial.</summary>
    public static MathNode FromCoefficient<T>(Coefficient<T> coefficient)
        where T : IFieldElement<T> => MathDisplay.ToTree(coefficient.Polynomial);

    /// <summary>
    /// "A = quantity, H = generator, [H, A] = remainder", then in words whether A commutes with H (is conserved).
    /// </summary>
    public static MathNode FromConservationCheck<T>(ConservationCheck<T> check)
        where T : IFieldElement<T>
    {
        var h = MathNodes.Symbol("H");
        var a = MathNodes.Symbol("A");
        return MathNodes.Row(
            a, MathNodes.Operator("="), FromDifferentialOperator(check.Quantity),
            MathNodes.Operator(","),
            h, MathNodes.Operator("="), FromDifferentialOperator(check.Generator),
            MathNodes.Operator(","),
            MathNodes.Fenced(MathNodes.Row(h, MathNodes.Operator(","), a), FenceKind.Brackets),
            MathNodes.Operator("="),
            FromDifferentialOperator(check.Commutator),
            MathNodes.Operator(","),
            MathNodes.Text(check.Commutes ? "A commutes with H (conserved)" : "A does not commute with H"));
    }

    /// <summary>The product of ∂ₓ^k over the coordinates in the ring's order; the empty multi-index gives 1.</summary>
    private static MathNode Derivative<T>(CoefficientRing<T> ring, Monomial derivative)
        where T : IFieldElement<T>
    {
        var factors = new List<MathNode>();
        foreach (var coordinate in ring.Coordinates)
        {
            var exponent = derivative.ExponentOf(coordinate);
            if (exponent > 0)
            {
                factors.Add(MathNodes.Power(Partial(coordinate.Name), exponent));
            }
        }

        return MathNodes.Product(factors);
    }

    /// <summary>∂ with the coordinate name (typeset by the symbol-name convention) as subscript.</summary>
    private static MathNode Partial(string coordinate) =>
        new SubscriptNode(MathNodes.Operator("∂"), MathNodes.Symbol(coordinate));
}
