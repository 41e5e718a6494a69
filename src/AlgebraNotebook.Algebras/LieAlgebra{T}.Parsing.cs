using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    /// <summary>
    /// Reads a table of brackets, one per line (or separated by ';'):
    /// <code>
    /// [H, E] = 2 E
    /// [H, F] = -2 F
    /// [E, F] = H
    /// </code>
    /// Unspecified brackets are zero. A right-hand side is 0 or a sum of terms "coefficient name" with an optional '*':
    /// "2 E", "-1/2*F", "0.5 Z", "(1 + i) E" (a parenthesised coefficient is read as a scalar of the field T).
    /// Names start with a letter and continue with letters, digits, '_' and '\''. Blank lines and lines starting with '#'
    /// are ignored. An optional first line "basis: H, E, F" declares the basis and its order.
    /// </summary>
    /// <param name="table">The text.</param>
    /// <param name="basisNames">The basis in order; when null (and no "basis:" line) the names are taken in order of first appearance.</param>
    /// <exception cref="ExactParseException">The text is malformed or uses an undeclared name; the message gives the line and column and points at the character.</exception>
    /// <exception cref="ExactArgumentException">Antisymmetry is contradicted ([A, A] non-zero, or [A, B] and [B, A] given
    /// inconsistently; the message names the pair), or the Jacobi identity fails (the message names the triple and the Jacobiator).</exception>
    public static LieAlgebra<T> FromCommutatorTable(string table, IReadOnlyList<string>? basisNames = null)
    {
        ArgumentNullException.ThrowIfNull(table);
        var parser = new TableParser(table);
        var lines = parser.ParseAll();
        var declared = basisNames?.ToArray() ?? parser.DeclaredBasis;
        string[] names;
        if (declared is not null)
        {
            names = CheckNames(declared, nameof(basisNames));
            foreach (var line in lines)
            {
                foreach (var (name, position) in line.Names())
                {
                    if (Array.IndexOf(names, name) < 0)
                    {
                        throw new ExactParseException(table, position,
                            $"{parser.Where(position)}: \"{name}\" is not one of the declared basis names {string.Join(", ", names)}");
                    }
                }
            }
        }
        else
        {
            var inferred = new List<string>();
            foreach (var line in lines)
            {
                foreach (var (name, _) in line.Names())
                {
                    if (!inferred.Contains(name))
                    {
                        inferred.Add(name);
                    }
                }
            }

            if (inferred.Count == 0)
            {
                throw new ExactParseException(table, 0, "the table names no basis elements; write brackets like [A, B] = C or declare \"basis: A, B\"");
            }

            names = inferred.ToArray();
        }

        var n = names.Length;
        var c = new T[n * n * n];
        Array.Fill(c, T.Zero);
        var source = new Dictionary<(int, int), int>();
        foreach (var line in lines)
        {
            var a = Array.IndexOf(names, line.Left);
            var b = Array.IndexOf(names, line.Right);
            var v = Vectors<T>.Zero(n);
            foreach (var (coefficient, name, _) in line.Terms)
            {
                var k = Array.IndexOf(names, name);
                v[k] += coefficient;
            }

            if (a == b)
            {
                if (!Vectors<T>.IsZero(v))
                {
                    throw new ExactArgumentException(
                        $"Antisymmetry is contradicted on line {line.LineNumber}: [{names[a]}, {names[a]}] must be 0 but is given as {LieElement<T>.Format(names, v)}.",
                        nameof(table));
                }

                continue;
            }

            var key = a < b ? (a, b) : (b, a);
            var oriented = a < b ? v : Vectors<T>.Scale(-T.One, v);
            if (source.TryGetValue(key, out var earlierLine))
            {
                var existing = new T[n];
                Array.Copy(c, (key.Item1 * n + key.Item2) * n, existing, 0, n);
                if (!Vectors<T>.Equal(existing, oriented))
                {
                    throw new ExactArgumentException(
                        $"Antisymmetry is contradicted for the pair ({names[key.Item1]}, {names[key.Item2]}): line {earlierLine} gives [{names[key.Item1]}, {names[key.Item2]}] = {LieElement<T>.Format(names, existing)}, but line {line.LineNumber} implies [{names[key.Item1]}, {names[key.Item2]}] = {LieElement<T>.Format(names, oriented)}.",
                        nameof(table));
                }

                continue;
            }

            source[key] = line.LineNumber;
            for (var k = 0; k < n; k++)
            {
                c[(key.Item1 * n + key.Item2) * n + k] = oriented[k];
                c[(key.Item2 * n + key.Item1) * n + k] = -oriented[k];
            }
        }

        return CreateChecked(names, c, [], $"Lie algebra of dimension {n} from a bracket table", nameof(table));
    }

    private sealed record TableLine(int LineNumber, string Left, int LeftPosition, string Right, int RightPosition, List<(T Coefficient, string Name, int Position)> Terms)
    {
        public IEnumerable<(string Name, int Position)> Names()
        {
            yield return (Left, LeftPosition);
            yield return (Right, RightPosition);
            foreach (var t in Terms)
            {
                yield return (t.Name, t.Position);
            }
        }
    }

    private sealed class TableParser(string text)
    {
        private int _position;

        public string[]? DeclaredBasis { get; private set; }

        public string Where(int position)
        {
            var line = 1;
            var lineStart = 0;
            for (var i = 0; i < position && i < text.Length; i++)
            {
                if (text[i] == '\n')
                {
                    line++;
                    lineStart = i + 1;
                }
            }

            return $"line {line}, column {position - lineStart + 1}";
        }

        public List<TableLine> ParseAll()
        {
            var result = new List<TableLine>();
            var first = true;
            while (true)
            {
                SkipBlank(includeNewlines: true);
                if (_position >= text.Length)
                {
                    break;
                }

                if (text[_position] == '#')
                {
                    while (_position < text.Length && text[_position] != '\n')
                    {
                        _position++;
                    }

                    continue;
                }

                if (first && Peek("basis"))
                {
                    ParseBasisDeclaration();
                    first = false;
                    continue;
                }

                first = false;
                result.Add(ParseLine());
            }

            return result;
        }

        private bool Peek(string word) =>
            string.Compare(text, _position, word, 0, word.Length, StringComparison.OrdinalIgnoreCase) == 0
            && text.IndexOf(':', _position) is var colon && colon > 0
            && text[(_position + word.Length)..colon].Trim().Length == 0;

        private void ParseBasisDeclaration()
        {
            _position = text.IndexOf(':', _position) + 1;
            var names = new List<string>();
            while (true)
            {
                SkipBlank(includeNewlines: false);
                var (name, _) = ParseName("a basis name");
                names.Add(name);
                SkipBlank(includeNewlines: false);
                if (_position < text.Length && text[_position] == ',')
                {
                    _position++;
                    continue;
                }

                EndOfLine();
                break;
            }

            DeclaredBasis = names.ToArray();
        }

        private TableLine ParseLine()
        {
            var lineNumber = LineNumber(_position);
            Expect('[');
            SkipBlank(false);
            var (left, leftPosition) = ParseName("a basis name after '['");
            SkipBlank(false);
            Expect(',');
            SkipBlank(false);
            var (right, rightPosition) = ParseName("a basis name after ','");
            SkipBlank(false);
            Expect(']');
            SkipBlank(false);
            Expect('=');
            SkipBlank(false);
            var terms = new List<(T, string, int)>();
            var firstTerm = true;
            while (true)
            {
                SkipBlank(false);
                if (_position >= text.Length || text[_position] is '\n' or ';' or '\r')
                {
                    if (firstTerm)
                    {
                        throw Error("expected a right-hand side (a sum of terms, or 0) after '='");
                    }

                    break;
                }

                var sign = T.One;
                if (text[_position] is '+' or '-')
                {
                    sign = text[_position] == '-' ? -T.One : T.One;
                    _position++;
                    SkipBlank(false);
                }
                else if (!firstTerm)
                {
                    throw Error($"expected '+' or '-' between terms but found '{text[_position]}'");
                }

                var coefficient = T.One;
                var hasCoefficient = false;
                if (_position < text.Length && (char.IsDigit(text[_position]) || text[_position] == '.'))
                {
                    coefficient = ParseNumber();
                    hasCoefficient = true;
                }
                else if (_position < text.Length && text[_position] == '(')
                {
                    coefficient = ParseParenthesised();
                    hasCoefficient = true;
                }

                SkipBlank(false);
                if (hasCoefficient && _position < text.Length && text[_position] == '*')
                {
                    _position++;
                    SkipBlank(false);
                }

                if (hasCoefficient && (_position >= text.Length || !char.IsLetter(text[_position])))
                {
                    // A bare number is only allowed as the single right-hand side 0.
                    if (firstTerm && coefficient.IsZero && (_position >= text.Length || text[_position] is '\n' or ';' or '\r'))
                    {
                        break;
                    }

                    throw Error("expected a basis name after the coefficient");
                }

                var (name, namePosition) = ParseName("a basis name or a coefficient");
                terms.Add((sign * coefficient, name, namePosition));
                firstTerm = false;
            }

            EndOfLine();
            return new TableLine(lineNumber, left, leftPosition, right, rightPosition, terms);
        }

        private T ParseNumber()
        {
            var start = _position;
            while (_position < text.Length && (char.IsDigit(text[_position]) || text[_position] is '.' or '/'))
            {
                _position++;
            }

            var token = text[start.._position];
            try
            {
                return T.FromRational(Rational.Parse(token));
            }
            catch (ExactParseException e)
            {
                throw new ExactParseException(text, start + e.Position, $"{Where(start + e.Position)}: {e.Problem} in the coefficient \"{token}\"");
            }
            catch (DivideByZeroException)
            {
                throw new ExactParseException(text, start, $"{Where(start)}: the coefficient \"{token}\" has a zero denominator");
            }
        }

        private T ParseParenthesised()
        {
            var start = _position;
            var close = text.IndexOf(')', start);
            var newline = text.IndexOf('\n', start);
            if (close < 0 || (newline >= 0 && newline < close))
            {
                throw Error("the coefficient opened by '(' is not closed on this line");
            }

            var inner = text[(start + 1)..close];
            _position = close + 1;
            try
            {
                object value = typeof(T) == typeof(GaussianRational)
                    ? GaussianRational.Parse(inner)
                    : typeof(T) == typeof(Rational)
                        ? Rational.Parse(inner)
                        : throw new ExactParseException(text, start, $"{Where(start)}: parenthesised coefficients are read only for Rational and GaussianRational scalars");
                return (T)value;
            }
            catch (ExactParseException e) when (e.Input == inner)
            {
                var at = start + 1 + e.Position;
                throw new ExactParseException(text, at, $"{Where(at)}: {e.Problem} in the coefficient \"({inner})\"");
            }
            catch (DivideByZeroException)
            {
                throw new ExactParseException(text, start, $"{Where(start)}: the coefficient \"({inner})\" has a zero denominator");
            }
        }

        private (string Name, int Position) ParseName(string what)
        {
            var start = _position;
            if (_position >= text.Length || !char.IsLetter(text[_position]))
            {
                throw Error(_position >= text.Length ? $"expected {what} but the text ended" : $"expected {what} but found '{text[_position]}'");
            }

            while (_position < text.Length && (char.IsLetterOrDigit(text[_position]) || text[_position] is '_' or '\''))
            {
                _position++;
            }

            return (text[start.._position], start);
        }

        private void Expect(char c)
        {
            if (_position >= text.Length || text[_position] != c)
            {
                throw Error(_position >= text.Length ? $"expected '{c}' but the line ended" : $"expected '{c}' but found '{text[_position]}'");
            }

            _position++;
        }

        private void EndOfLine()
        {
            SkipBlank(false);
            if (_position < text.Length && text[_position] is not ('\n' or ';' or '\r'))
            {
                throw Error($"unexpected '{text[_position]}' after the end of the bracket");
            }

            if (_position < text.Length)
            {
                _position++;
            }
        }

        private void SkipBlank(bool includeNewlines)
        {
            while (_position < text.Length && (text[_position] is ' ' or '\t' || (includeNewlines && text[_position] is '\n' or '\r' or ';')))
            {
                _position++;
            }
        }

        private int LineNumber(int position) => 1 + text.Take(position).Count(ch => ch == '\n');

        private ExactParseException Error(string problem) => new(text, _position, $"{Where(_position)}: {problem}");
    }
}
