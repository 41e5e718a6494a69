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
/// Products and powers written in the text are charged against a work budget (<see cref="MaxWork"/>, counted as
/// term products weighted by coefficient size) so that a short text cannot ask for an expansion that runs for minutes;
/// over the budget the parser throws <see cref="BeyondCapabilityException"/> and the same product can still be built
/// with '*' and <see cref="Polynomial{T}.Pow(int, PowerLimits)"/> on polynomial objects, whose limits the caller sets.
/// </summary>
internal sealed class PolynomialParser<T>
    where T : IFieldElement<T>
{
    private const int MaxNesting = 200;

    /// <summary>Work budget of one parse: the sum over products of (terms x terms x coefficient words).</summary>
    /// <remarks>The unit is a cost model, not a time. Measured (Release, processor time, best of 3, shared 2-core
    /// machine, 2026-12-02): the largest admitted members of the families tried are (x+1)^174, (x+y+z)^23,
    /// (3/7 x + 5/11 y)^118, (x+1)(x+2)...(x+111), ((1+2 i) x + (3 - i) y)^141 over Q(i) and (c x + 1)^15 with a 1000-digit c,
    /// each under 0.1 s (the slowest, (3/7 x + 5/11 y)^118, 42-77 ms); one more factor or power is
    /// refused. Table: tests/AlgebraNotebook.Fuzz/README.md, "Work budgets".</remarks>
    private const long MaxWork = 100_000;

    /// <summary>
    /// Largest coefficient, in bits (numerators and denominators together), that a power, product or division written
    /// in the text may produce. Printing a number takes time quadratic in its length: a coefficient of 950 000 bits
    /// (152781768116319540713737349890813^8890, admitted by the earlier limit of 2^20 bits) took 26 s to print.
    /// </summary>
    private const long MaxPowerBits = 1 << 16;

    /// <summary>Bits of the coefficient 1 as <see cref="Bits"/> counts them.</summary>
    private static readonly long OneBits = CoefficientSupport<T>.OneBits;

    private readonly string _text;
    private int _position;
    private int _depth;
    private long _work;

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

                var factor = ParseFactor();
                result = Multiply(result, factor);
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

                CheckCoefficientBits(Bits(result) + Bits(divisor), "the division");
                result /= divisor.ConstantTerm;
            }
            else if (char.IsLetter(c) || c == '(')
            {
                var factor = ParseFactor();
                result = Multiply(result, factor);
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
        ChargePower(primary, exponent);
        if (primary.TermCount == 1 && (long)primary.TotalDegree * exponent > int.MaxValue)
        {
            // Pow refuses this too (BeyondCapabilityException); in text it is a parse error at the exponent.
            throw new ExactParseException(_text, after, $"the power ^{exponent} makes an exponent or a total degree larger than {int.MaxValue}");
        }

        try
        {
            return primary.Pow(exponent);
        }
        catch (OverflowException)
        {
            throw new ExactParseException(_text, after, $"the power ^{exponent} makes an exponent or a total degree larger than {int.MaxValue}");
        }
        catch (BeyondCapabilityException e)
        {
            // Pow's own size estimate (PowerLimits) names the polynomial; the parser's refusal names the text.
            throw new BeyondCapabilityException($"Cannot parse \"{Shorten(_text)}\" as a polynomial: {e.Message}");
        }
    }

    private Polynomial<T> Multiply(Polynomial<T> left, Polynomial<T> right)
    {
        CheckCoefficientBits(Bits(left) + Bits(right), "the product");
        Charge((double)left.TermCount * right.TermCount * (2 + (Bits(left) + Bits(right)) / 64.0));
        try
        {
            return left * right;
        }
        catch (OverflowException)
        {
            throw new ExactParseException(_text, _position, $"the product makes an exponent or a total degree larger than {int.MaxValue}");
        }
    }

    private void ChargePower(Polynomial<T> primary, int exponent)
    {
        if (exponent <= 1 || primary.IsZero)
        {
            return;
        }

        // Bits beyond those of the coefficient 1 (over Q numerator 1 and denominator 1; over Q(i) also the imaginary
        // part 0/1), so powers of x or -x cost nothing over either field.
        var bits = Math.Max(0, Bits(primary) - OneBits);
        var growth = primary.TermCount == 1 ? bits : bits + Math.Log2(primary.TermCount) + 1;
        var resultBits = exponent * growth;
        if (resultBits > MaxPowerBits)
        {
            throw Beyond($"the power ^{exponent} would make coefficients of about {resultBits:G3} bits (at most {MaxPowerBits:N0} allowed)");
        }

        if (primary.TermCount == 1)
        {
            Charge(resultBits / 64);
            return;
        }

        // The expansion has at most C(e + t - 1, t - 1) terms; squaring costs about terms^2 coefficient products.
        var terms = Math.Min(1e18, Binomial(exponent + primary.TermCount - 1, primary.TermCount - 1));
        Charge(terms * terms * (1 + resultBits / 64) / 2);
    }

    private void CheckCoefficientBits(long bits, string what)
    {
        if (bits > MaxPowerBits)
        {
            throw Beyond($"{what} would make coefficients of about {bits:N0} bits (at most {MaxPowerBits:N0} allowed)");
        }
    }

    private void Charge(double work)
    {
        _work += (long)Math.Min(work, MaxWork + 1.0);
        if (_work > MaxWork)
        {
            throw Beyond("the products and powers written in the text would take too long to expand");
        }
    }

    private BeyondCapabilityException Beyond(string problem) => new(
        $"Cannot parse \"{Shorten(_text)}\" as a polynomial: {problem} (limit {MaxWork:N0} units of work per text). "
        + "Build it from smaller parsed pieces with '*' and Pow(exponent, PowerLimits) on the polynomial objects.");

    private static string Shorten(string text) => (text.Length > 200 ? text[..200] + "..." : text).Replace('\n', ' ').Replace('\r', ' ');

    private static double Binomial(int n, int k)
    {
        var result = 1.0;
        for (var j = 1; j <= k && result < 1e18; j++)
        {
            result = result * (n - k + j) / j;
        }

        return result;
    }

    /// <summary>The largest coefficient of the polynomial in bits (numerator plus denominator, all rational parts).</summary>
    private static long Bits(Polynomial<T> polynomial) => CoefficientSupport<T>.LargestBits(polynomial.Terms.Select(t => t.Coefficient));

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
