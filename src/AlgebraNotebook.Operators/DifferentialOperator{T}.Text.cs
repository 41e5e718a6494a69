using System.Text;
using AlgebraNotebook.Exact.Polynomials;

namespace AlgebraNotebook.Operators;

public sealed partial class DifferentialOperator<T>
{
    /// <summary>
    /// Plain text in normal form, e.g. "-i*hbar*y*d_z + i*hbar*z*d_y", "(x^2 + 1)*d_x^2 - 3", "0" for zero. The text
    /// parses back (<see cref="Parse"/>) to the same operator over the same ring.
    /// </summary>
    public override string ToString()
    {
        if (_terms.Length == 0)
        {
            return "0";
        }

        var text = new StringBuilder();
        for (var k = 0; k < _terms.Length; k++)
        {
            var term = TermText(Ring, _terms[k].Derivative, _terms[k].Coefficient);
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

    /// <summary>"d_x^2*d_y" for the multi-index, in the ring's coordinate order; empty for the zeroth order.</summary>
    internal static string DerivativeText(CoefficientRing<T> ring, Monomial derivative) =>
        string.Join("*", ring.Coordinates
            .Where(x => derivative.ExponentOf(x) > 0)
            .Select(x => derivative.ExponentOf(x) == 1 ? $"d_{x}" : $"d_{x}^{derivative.ExponentOf(x)}"));

    internal static string TermText(CoefficientRing<T> ring, Monomial derivative, Polynomial<T> coefficient, string suffix = "")
    {
        var d = DerivativeText(ring, derivative) + suffix;
        var c = coefficient.ToString();
        if (d.Length == 0)
        {
            return c;
        }

        if (coefficient.IsOne)
        {
            return d;
        }

        if ((-coefficient).IsOne)
        {
            return "-" + d;
        }

        return coefficient.TermCount == 1 ? $"{c}*{d}" : $"({c})*{d}";
    }
}
