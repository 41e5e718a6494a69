using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Operators;

public sealed partial class DifferentialOperator<T>
{
    /// <summary>
    /// Reads operator text over a ring: sums, differences, products (composition, with '*' or by juxtaposition),
    /// non-negative integer powers '^', parentheses, rational numbers, division by a non-zero number, declared
    /// symbols (multiplication operators), d_x for the partial derivative in coordinate x, and i for the imaginary unit
    /// (GaussianRational only). Products are compositions, so "d_x*x" is x*d_x + 1.
    /// </summary>
    /// <example><c>DifferentialOperator&lt;GaussianRational&gt;.Parse(ring, "-i*hbar*(y*d_z - z*d_y)")</c></example>
    /// <exception cref="ExactParseException">The text cannot be read, names an undeclared symbol, or differentiates
    /// in something that is not a coordinate of the ring; the position points at the offending character.</exception>
    public static DifferentialOperator<T> Parse(CoefficientRing<T> ring, string text)
    {
        ArgumentNullException.ThrowIfNull(ring);
        ArgumentNullException.ThrowIfNull(text);
        var parser = new OperatorParser(ring, text);
        return parser.ParseAll();
    }

    private sealed class OperatorParser(CoefficientRing<T> ring, string text)
    {
        private const int MaxNesting = 200;

        // Work budget of one parse: compositions and powers written in the text are charged (term products weighted
        // by derivative order and coefficient size) so that a short text cannot ask for an expansion that runs for
        // minutes. Operators built from parsed pieces with '*' and Pow have no such limit. Measured (Release, processor
        // time, best of 3, 2026-12-02): the slowest admitted input of the families tried is the multiplication operator
        // (x+1)^1023, about 0.2 s; d_x^1677, d_x^797 x^797, (x d_x)^47 and (x + d_x)^25 take under 0.1 s
        // (table: tests/AlgebraNotebook.Fuzz/README.md, "Work budgets").
        private const double MaxWork = 30_000;
        private int _pos;
        private int _depth;
        private double _work;

        public DifferentialOperator<T> ParseAll()
        {
            SkipSpaces();
            if (_pos >= text.Length)
            {
                throw new ExactParseException(text, _pos, "expected an operator");
            }

            var result = ParseSum();
            SkipSpaces();
            if (_pos < text.Length)
            {
                throw new ExactParseException(text, _pos, $"unexpected '{text[_pos]}'");
            }

            return result;
        }

        private DifferentialOperator<T> ParseSum()
        {
            SkipSpaces();
            var negate = false;
            if (Peek() is '+' or '-')
            {
                negate = text[_pos] == '-';
                _pos++;
            }

            var result = ParseProduct();
            if (negate)
            {
                result = -result;
            }

            while (true)
            {
                SkipSpaces();
                if (Peek() is '+' or '-')
                {
                    var minus = text[_pos] == '-';
                    _pos++;
                    var next = ParseProduct();
                    result = minus ? result - next : result + next;
                }
                else
                {
                    return result;
                }
            }
        }

        private DifferentialOperator<T> ParseProduct()
        {
            var result = ParsePower();
            while (true)
            {
                SkipSpaces();
                var c = Peek();
                if (c == '*')
                {
                    _pos++;
                    result = Compose(result, ParsePower());
                }
                else if (c == '/')
                {
                    _pos++;
                    SkipSpaces();
                    var start = _pos;
                    var divisor = ParsePower();
                    if (!divisor.HasConstantCoefficients || divisor.Order != 0)
                    {
                        throw new ExactParseException(text, start, "only division by a non-zero number is allowed");
                    }

                    result = divisor.RawTerms[0].Coefficient.ConstantTerm.Reciprocal() * result;
                }
                else if (c is '(' || (c is not null && (char.IsLetterOrDigit(c.Value) || c == '.')))
                {
                    result = Compose(result, ParsePower());
                }
                else
                {
                    return result;
                }
            }
        }

        private DifferentialOperator<T> ParsePower()
        {
            var atom = ParseAtom();
            SkipSpaces();
            if (Peek() == '^')
            {
                _pos++;
                SkipSpaces();
                var start = _pos;
                while (_pos < text.Length && char.IsDigit(text[_pos]))
                {
                    _pos++;
                }

                if (start == _pos || !int.TryParse(text.AsSpan(start, _pos - start), out var exponent))
                {
                    throw new ExactParseException(text, start, "expected a non-negative integer exponent");
                }

                // Powers by repeated squaring, each composition charged against the budget.
                var power = Identity(ring);
                var square = atom;
                for (var n = exponent; n > 0; n >>= 1)
                {
                    if ((n & 1) == 1)
                    {
                        power = Compose(power, square);
                    }

                    if (n > 1)
                    {
                        square = Compose(square, square);
                    }
                }

                return power;
            }

            return atom;
        }

        private DifferentialOperator<T> Compose(DifferentialOperator<T> left, DifferentialOperator<T> right)
        {
            // The composition visits every sub-derivative of each left term (Leibniz's rule, prod(alpha_i + 1) of them,
            // with binomial coefficients of about order bits) for every right term.
            var leibniz = 0.0;
            foreach (var (alpha, _) in left.Terms)
            {
                var count = 1.0;
                foreach (var (_, exponent) in alpha.Factors)
                {
                    count *= exponent + 1.0;
                }

                leibniz += count * (1 + alpha.TotalDegree / 64.0);
            }

            var work = 1.0 + leibniz * right.Terms.Count * (Size(left) + Size(right));
            _work += Math.Min(work, MaxWork + 1);
            if (_work > MaxWork)
            {
                var shown = (text.Length > 200 ? text[..200] + "..." : text).Replace('\n', ' ').Replace('\r', ' ');
                throw new BeyondCapabilityException(
                    $"Cannot parse \"{shown}\" as an operator: the compositions and powers written in the text would take too long "
                    + $"to expand (limit {MaxWork:N0} units of work per text). Build it from smaller parsed pieces with '*' and Pow "
                    + "on the operator objects, which have no such limit.");
            }

            try
            {
                return left * right;
            }
            catch (OverflowException)
            {
                throw new ExactParseException(text, Math.Min(_pos, text.Length), $"the product makes a derivative order larger than {int.MaxValue}");
            }
        }

        private static double Size(DifferentialOperator<T> value)
        {
            // Terms of the largest coefficient polynomial times its largest number in 64-bit words.
            var largest = 1.0;
            foreach (var (_, coefficient) in value.Terms)
            {
                var words = 1.0;
                foreach (var (_, number) in coefficient.Polynomial.Terms)
                {
                    words = Math.Max(words, 1 + Bits(number) / 64.0);
                }

                largest = Math.Max(largest, coefficient.Polynomial.TermCount * words);
            }

            return largest;
        }

        private static long Bits(T number) => number switch
        {
            // Magnitudes: GetBitLength of a negative number counts two's-complement bits (0 for -1).
            Rational r => System.Numerics.BigInteger.Abs(r.Numerator).GetBitLength() + r.Denominator.GetBitLength(),
            GaussianRational g => System.Numerics.BigInteger.Abs(g.Real.Numerator).GetBitLength() + g.Real.Denominator.GetBitLength()
                                  + System.Numerics.BigInteger.Abs(g.Imaginary.Numerator).GetBitLength() + g.Imaginary.Denominator.GetBitLength(),
            _ => 64,
        };

        private DifferentialOperator<T> ParseAtom()
        {
            SkipSpaces();
            var c = Peek() ?? throw new ExactParseException(text, _pos, "expected a number, symbol, derivative or '('");
            if (c == '(')
            {
                if (++_depth > MaxNesting)
                {
                    throw new ExactParseException(text, _pos, $"parentheses nested deeper than {MaxNesting} levels");
                }

                _pos++;
                var inner = ParseSum();
                _depth--;
                SkipSpaces();
                if (Peek() != ')')
                {
                    throw new ExactParseException(text, _pos, "expected ')'");
                }

                _pos++;
                return inner;
            }

            if (char.IsDigit(c) || c == '.')
            {
                var start = _pos;
                while (_pos < text.Length && (char.IsDigit(text[_pos]) || text[_pos] == '.'))
                {
                    _pos++;
                }

                Rational number;
                try
                {
                    number = Rational.Parse(text[start.._pos]);
                }
                catch (ExactParseException inner)
                {
                    throw new ExactParseException(text, start + inner.Position, inner.Problem);
                }
                return Constant(T.FromRational(number));
            }

            if (char.IsLetter(c))
            {
                var start = _pos;
                while (_pos < text.Length && (char.IsLetterOrDigit(text[_pos]) || text[_pos] == '_'))
                {
                    _pos++;
                }

                var name = text[start.._pos];
                if (name.StartsWith("d_", StringComparison.Ordinal))
                {
                    var coordinate = name[2..];
                    if (coordinate.Length == 0)
                    {
                        throw new ExactParseException(text, _pos,
                            $"d_ must be followed by a coordinate of ring \"{ring.Name}\" (coordinates: {string.Join(", ", ring.Coordinates)})");
                    }

                    if (!ring.Coordinates.Any(x => x.Name == coordinate))
                    {
                        throw new ExactParseException(text, start,
                            $"{name}: {coordinate} is not a coordinate of ring \"{ring.Name}\" (coordinates: {string.Join(", ", ring.Coordinates)})");
                    }

                    return Partial(ring, coordinate);
                }

                if (name == "i")
                {
                    if (!Polynomial<T>.TryParse("i", out var unit) || !unit.IsConstant)
                    {
                        throw new ExactParseException(text, start, "the imaginary unit i needs GaussianRational coefficients");
                    }

                    return Constant(unit.ConstantTerm);
                }

                var symbol = ring.Symbols.FirstOrDefault(s => s.Name == name)
                    ?? throw new ExactParseException(text, start,
                        $"{name} is not declared in ring \"{ring.Name}\" (declared: {string.Join(", ", ring.Symbols)})");
                return Multiplication(ring, ring.Element(Polynomial<T>.Variable(symbol)));
            }

            throw new ExactParseException(text, _pos, $"unexpected '{c}'");
        }

        private DifferentialOperator<T> Constant(T value) =>
            value.IsZero ? Zero(ring) : new DifferentialOperator<T>(ring, [(Monomial.One, Polynomial<T>.Constant(value))]);

        private char? Peek() => _pos < text.Length ? text[_pos] : null;

        private void SkipSpaces()
        {
            while (_pos < text.Length && char.IsWhiteSpace(text[_pos]))
            {
                _pos++;
            }
        }
    }
}
