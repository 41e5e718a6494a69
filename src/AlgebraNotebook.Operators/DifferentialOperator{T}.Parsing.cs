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
        private int _pos;

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
                    result *= ParsePower();
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
                    result *= ParsePower();
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

                return atom.Pow(exponent);
            }

            return atom;
        }

        private DifferentialOperator<T> ParseAtom()
        {
            SkipSpaces();
            var c = Peek() ?? throw new ExactParseException(text, _pos, "expected a number, symbol, derivative or '('");
            if (c == '(')
            {
                _pos++;
                var inner = ParseSum();
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

                var number = Rational.Parse(text[start.._pos]);
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
