using System.Text;

namespace AlgebraNotebook.Exact.Series;

public sealed partial class TruncatedSeries<T>
{
    /// <summary>
    /// Plain text in the order of <see cref="Terms"/>, then the unknown tail: "1 + t + 1/2*t^2 + O(t^3)".
    /// With several parameters the tail is written as a power of the ideal they generate: "O((x, y)^3)", "O(x, y)" for
    /// order 1; "O(1)" for order 0. Coefficients whose text contains a sign or a space inside are put in parentheses:
    /// "(1 + 2 i)*t". An exact series shows no tail; the exact zero is "0".
    /// </summary>
    public override string ToString()
    {
        var text = new StringBuilder();
        foreach (var (monomial, coefficient) in _terms)
        {
            var (negative, body) = SplitSign(coefficient.ToString() ?? string.Empty);
            string term;
            if (monomial.IsOne)
            {
                term = body;
            }
            else if (body == "1")
            {
                term = monomial.ToString();
            }
            else
            {
                term = $"{body}*{monomial}";
            }

            if (text.Length == 0)
            {
                text.Append(negative ? "-" : string.Empty).Append(term);
            }
            else
            {
                text.Append(negative ? " - " : " + ").Append(term);
            }
        }

        if (!IsExact)
        {
            var tail = BigOText();
            if (text.Length == 0)
            {
                text.Append(tail);
            }
            else
            {
                text.Append(" + ").Append(tail);
            }
        }

        return text.Length == 0 ? "0" : text.ToString();
    }

    private string BigOText()
    {
        if (Order == 0 || _parameters.Length == 0)
        {
            return "O(1)";
        }

        if (_parameters.Length == 1)
        {
            var name = _parameters[0].Name;
            return Order == 1 ? $"O({name})" : $"O({name}^{Order})";
        }

        var list = string.Join(", ", _parameters.Select(p => p.Name));
        return Order == 1 ? $"O({list})" : $"O(({list})^{Order})";
    }

    /// <summary>Splits a leading minus sign off a simple coefficient; wraps compound coefficients in parentheses.</summary>
    private static (bool Negative, string Body) SplitSign(string coefficient)
    {
        var negative = coefficient.StartsWith('-');
        var rest = negative ? coefficient[1..] : coefficient;
        var compound = rest.IndexOfAny([' ', '+', '-', '*']) >= 0;
        if (!compound)
        {
            return (negative, rest);
        }

        return (false, $"({coefficient})");
    }
}
