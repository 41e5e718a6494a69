using System.Text;

namespace AlgebraNotebook.Exact.Polynomials;

public sealed partial class Polynomial<T>
{
    /// <summary>
    /// Plain text with terms in descending <see cref="MonomialOrder.Default"/> order, explicit '*' and '^':
    /// "x^2*y - 2*hbar", "1/2*x*y^3 + 1", "(1 - 2*i)*x + i". The text parses back to the same polynomial.
    /// </summary>
    public override string ToString()
    {
        if (IsZero)
        {
            return "0";
        }

        var text = new StringBuilder();
        for (var k = 0; k < _monomials.Length; k++)
        {
            var (negative, magnitude, isUnit) = CoefficientSupport<T>.Split(_coefficients[k]);
            if (k == 0)
            {
                if (negative)
                {
                    text.Append('-');
                }
            }
            else
            {
                text.Append(negative ? " - " : " + ");
            }

            var m = _monomials[k];
            if (m.IsOne)
            {
                text.Append(magnitude);
            }
            else if (isUnit)
            {
                text.Append(m);
            }
            else
            {
                text.Append(magnitude).Append('*').Append(m);
            }
        }

        return text.ToString();
    }
}
