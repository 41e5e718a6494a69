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

    /// <summary>
    /// Plain text with the common factor of all coefficients pulled out in front: the constant of the first coefficient's
    /// first term times the greatest common monomial divisor, e.g. "i*hbar*(z*d_y - y*d_z)" for
    /// -i*hbar*(y*d_z - z*d_y). Equal to <see cref="ToString"/> when there is no such factor or only one coefficient term.
    /// The text parses back to the same operator.
    /// </summary>
    public string ToFactoredString()
    {
        var coefficientTerms = _terms.SelectMany(t => t.Coefficient.Terms).ToList();
        if (coefficientTerms.Count < 2)
        {
            return ToString();
        }

        var common = coefficientTerms.Select(t => t.Monomial).Aggregate(Monomial.Gcd);
        var constant = _terms[0].Coefficient.Terms[0].Coefficient;
        if (common.IsOne && constant.IsOne)
        {
            return ToString();
        }

        // Dividing a normal form by a monomial keeps it a normal form (no term becomes divisible by a leading monomial).
        var inner = new DifferentialOperator<T>(Ring, _terms.Select(t => (
            t.Derivative,
            Polynomial<T>.FromTerms(t.Coefficient.Terms.Select(c => (c.Monomial.DivideBy(common), c.Coefficient / constant))))));
        var factor = Polynomial<T>.Term(constant, common);
        if (factor.IsOne)
        {
            return inner.ToString();
        }

        var factorText = (-factor).IsOne ? "-" : factor.TermCount == 1 && !factor.ToString().StartsWith('(') ? $"{factor}*" : $"({factor})*";
        return $"{factorText}({inner})";
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
