using System.Text;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

/// <summary>
/// The result of applying a differential operator to an arbitrary, unspecified function f of the coordinates: a
/// combination sum of c_alpha * d^alpha[f] of the partial derivatives of f. Text: "x*d_y[f] - y*d_x[f]",
/// "d_x^2[f] + 2*f" (the zeroth derivative is f itself).
/// </summary>
/// <typeparam name="T">The field of constants.</typeparam>
public sealed class FunctionDerivatives<T>
    where T : IFieldElement<T>
{
    internal FunctionDerivatives(DifferentialOperator<T> source, string functionName)
    {
        Operator = source;
        FunctionName = functionName;
    }

    /// <summary>The operator that was applied; its terms are the coefficients of the partial derivatives of f.</summary>
    public DifferentialOperator<T> Operator { get; }

    /// <summary>The name of the function (e.g. "f").</summary>
    public string FunctionName { get; }

    /// <summary>The coefficient of the partial derivative of f named by coordinates with repetition ("x", "x" for d_x^2[f]); none for f itself.</summary>
    public Coefficient<T> CoefficientOf(params string[] coordinates) => Operator.CoefficientOf(coordinates);

    /// <summary>Plain text such as "x*d_y[f] - y*d_x[f]"; "0" when the combination vanishes.</summary>
    public override string ToString()
    {
        var terms = Operator.RawTerms;
        if (terms.Count == 0)
        {
            return "0";
        }

        var text = new StringBuilder();
        for (var k = 0; k < terms.Count; k++)
        {
            var (d, c) = terms[k];
            var term = d.IsOne
                ? (c.IsOne ? FunctionName : (-c).IsOne ? "-" + FunctionName : c.TermCount == 1 ? $"{c}*{FunctionName}" : $"({c})*{FunctionName}")
                : DifferentialOperator<T>.TermText(Operator.Ring, d, c, $"[{FunctionName}]");
            if (k == 0)
            {
                text.Append(term);
            }
            else if (term.StartsWith('-'))
            {
                text.Append(" - ").Append(term.AsSpan(1));
            }
            else
            {
                text.Append(" + ").Append(term);
            }
        }

        return text.ToString();
    }
}
