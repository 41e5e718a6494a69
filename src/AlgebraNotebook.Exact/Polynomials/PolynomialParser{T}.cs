using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Polynomials;

/// <summary>
/// Recursive-descent reader of polynomial text. Grammar (spaces allowed between tokens):
/// <code>
/// sum     := product (('+' | '-') product)*
/// product := factor (('*' | '/' | juxtaposition) factor)*     division only by a non-zero constant
/// factor  := ('+' | '-') factor | primary ('^' digits)?
/// primary := number | name | '(' sum ')'                      name "i" is the imaginary unit for GaussianRational
/// </code>
/// Juxtaposition multiplies ("3x", "2 hbar t", "(x+1)(x-1)"); a number may not follow another factor without '*'.
/// </summary>
internal sealed class PolynomialParser<T>
    where T : IFieldElement<T>
{
    private const int MaxNesting = 200;

    private readonly string _text;
    private int _position;
    private int _depth;

    private PolynomialParser(string text)
    {
        _text = text;
    }

    /// <summary>Parses the whole text.</summary>
    public static Polynomial<T> ParseAll(string text)
    {
        var parser = new PolynomialParser<T>(text);
        parser.SkipSpaces();
        if (parser.AtEnd)
        {
            throw new ExactParseException(text, 0, "expected a polynomial but the text is empty");
        }

        var result = parser.ParseSum();
        parser.SkipSpaces();
        if (!parser.AtEnd)
        {
            var c = text[parser._position];
            throw new ExactParseException(
                text, parser._position, c == ')' ? "unmatched ')' (no '(' opens it)" : $"unexpected character '{c}'");
        }

        return result;
    }

    /// <summary>
    /// Parses text[start..end) as a polynomial, reporting errors with positions in the whole text.
    /// </summary>
    public static Polynomial<T> ParseRange(string text, int start, int end)
    {
        try
        {
            return ParseAll(text[start..end]);
        }
        catch (ExactParseException inner)
        {
            throw new ExactParseException(text, start + inner.Position, inner.Problem);
        }
    }

    private bool AtEnd => _position >= _text.Length;

    private char Current => _text[_position];

    private void SkipSpaces()
    {
        while (_position < _text.Length && char.IsWhiteSpace(_text[_position]))
        {
            _position++;
        }
    }

    private Polynomial<T> ParseSum()
    {
        var result = ParseProduct();
        while (true)
        {
            SkipSpaces();
            if (AtEnd || (Current != '+' && Current != '-'))
            {
                return result;
            }

            var op = Current;
            _position++;
            SkipSpaces();
            if (AtEnd)
            {
                throw new ExactParseException(_text, _position, $"unexpected end of text: expected a term after '{op}'");
            }

            var term = ParseProduct();
            result = op == '+' ? result + term : result - term;
        }
    }

    private Polynomial<T> ParseProduct()
    {
        var result = ParseFactor();
        while (true)
        {
            var save = _position;
            SkipSpaces();
            if (AtEnd)
            {
                return result;
            }

            var c = Current;
            if (c == '*')
            {
                _position++;
                SkipSpaces();
                if (AtEnd)
                {
                    throw new ExactParseException(_text, _position, "unexpected end of text: expected a factor after '*'");
                }

                if (Current == '*')
                {
                    throw new ExactParseException(_text, _position, "'**' is not an operator; write '^' for powers, e.g. x^2");
                }

                result *= ParseFactor();
            }
            else if (c == '/')
            {
                _position++;
                SkipSpaces();
                if (AtEnd)
                {
                    throw new ExactParseException(_text, _position, "unexpected end of text: expected a divisor after '/'");
                }

                var divisorStart = _position;
                var divisor = ParseFactor();
                if (!divisor.IsConstant)
                {
                    throw new ExactParseException(
                        _text, divisorStart, $"division by the non-constant {divisor}; polynomials can only be divided by non-zero numbers");
                }

                if (divisor.IsZero)
                {
                    throw new ExactParseException(_text, divisorStart, "division by zero");
                }

                result /= divisor.ConstantTerm;
            }
            else if (char.IsLetter(c) || c == '(')
            {
                result *= ParseFactor();
            }
            else if (char.IsAsciiDigit(c) || c == '.')
            {
                throw new ExactParseException(
                    _text, _position, "a number directly after a factor is ambiguous; write '*' between them (or put the number first)");
            }
            else
            {
                _position = save;
                return result;
            }
        }
    }

    private Polynomial<T> ParseFactor()
    {
        SkipSpaces();
        if (AtEnd)
        {
            throw new ExactParseException(_text, _position, "unexpected end of text: expected a term");
        }

        if (Current == '-' || Current == '+')
        {
            var negative = Current == '-';
            _position++;
            SkipSpaces();
            Enter();
            var inner = ParseFactor();
            _depth--;
            return negative ? -inner : inner;
        }

        var primary = ParsePrimary();
        var save = _position;
        SkipSpaces();
        if (AtEnd || Current != '^')
        {
            _position = save;
            return primary;
        }

        _position++;
        SkipSpaces();
        var exponent = ParseExponent();
        var after = _position;
        SkipSpaces();
        if (!AtEnd && Current == '^')
        {
            throw new ExactParseException(_text, _position, "repeated '^' is ambiguous; use parentheses, e.g. (x^2)^3");
        }

        _position = after;
        return primary.Pow(exponent);
    }

    private int ParseExponent()
    {
        if (AtEnd)
        {
            throw new ExactParseException(_text, _position, "unexpected end of text: expected an exponent after '^'");
        }

        if (Current == '-')
        {
            throw new ExactParseException(_text, _position, "negative exponents are not polynomials; exponents must be non-negative integers");
        }

        if (!char.IsAsciiDigit(Current))
        {
            throw new ExactParseException(_text, _position, $"expected a non-negative integer exponent after '^' but found '{Current}'");
        }

        var start = _position;
        var value = 0L;
        while (!AtEnd && char.IsAsciiDigit(Current))
        {
            value = value * 10 + (Current - '0');
            if (value > int.MaxValue)
            {
                throw new ExactParseException(_text, start, "the exponent is too large");
            }

            _position++;
        }

        // "x^2/3" means (x^2)/3, as in ordinary precedence; only a decimal point makes the exponent fractional.
        if (!AtEnd && Current == '.')
        {
            throw new ExactParseException(_text, _position, "exponents must be non-negative integers");
        }

        return (int)value;
    }

    private Polynomial<T> ParsePrimary()
    {
        var c = Current;
        if (c == '(')
        {
            var open = _position;
            _position++;
            SkipSpaces();
            if (AtEnd)
            {
                throw new ExactParseException(_text, open, "unmatched '(' (no ')' closes it)");
            }

            if (Current == ')')
            {
                throw new ExactParseException(_text, _position, "empty parentheses: expected a term");
            }

            Enter();
            var inner = ParseSum();
            _depth--;
            SkipSpaces();
            if (AtEnd || Current != ')')
            {
                if (AtEnd)
                {
                    throw new ExactParseException(_text, open, "unmatched '(' (no ')' closes it)");
                }

                throw new ExactParseException(_text, _position, $"expected ')' to close the '(' at position {open + 1} but found '{Current}'");
            }

            _position++;
            return inner;
        }

        if (char.IsAsciiDigit(c) || c == '.')
        {
            var value = Rational.ParseSignedDecimal(_text, ref _position, allowSign: false);
            return Polynomial<T>.Constant(T.FromRational(value));
        }

        if (char.IsLetter(c))
        {
            var start = _position;
            while (!AtEnd && (char.IsLetterOrDigit(Current) || Current == '_'))
            {
                _position++;
            }

            var name = _text[start.._position];
            if (name == "i")
            {
                if (!CoefficientSupport<T>.HasImaginaryUnit)
                {
                    throw new ExactParseException(
                        _text,
                        start,
                        $"'i' is the imaginary unit, but {CoefficientSupport<T>.FieldName} coefficients have no i; "
                        + "use GaussianRational coefficients for complex numbers (or another variable name)");
                }

                return Polynomial<T>.Constant(CoefficientSupport<T>.ImaginaryUnit);
            }

            return Polynomial<T>.Variable(Symbol.Of(name));
        }

        if (c == ')')
        {
            throw new ExactParseException(_text, _position, "expected a term but found ')'");
        }

        throw new ExactParseException(_text, _position, $"unexpected character '{c}': expected a number, a name or '('");
    }

    private void Enter()
    {
        if (++_depth > MaxNesting)
        {
            throw new ExactParseException(_text, _position, $"nesting deeper than {MaxNesting} levels");
        }
    }
}
