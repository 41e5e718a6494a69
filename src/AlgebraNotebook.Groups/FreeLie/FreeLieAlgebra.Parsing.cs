using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.FreeLie;

public sealed partial class FreeLieAlgebra
{
    /// <summary>
    /// Parses a Lie expression and rewrites it into the Lyndon basis. Grammar: sums and differences of terms; a term is
    /// an optional rational coefficient ("1/2", "3", optionally followed by '*') times a generator, a bracket
    /// "[a, b]" of two expressions, or a parenthesised expression. Example: "X + Y + 1/2 [X, Y] - [Y, [X, Y]]".
    /// </summary>
    /// <exception cref="ExactParseException">Malformed text or an unknown generator; the exception points at the character.</exception>
    public LieSeries Parse(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var reader = new LieTextReader(text);
        reader.SkipSpaces();
        if (reader.AtEnd)
        {
            throw reader.Error("empty text, expected a Lie expression");
        }

        var result = ParseSum(reader);
        reader.SkipSpaces();
        if (!reader.AtEnd)
        {
            throw reader.Error("unexpected text after the expression");
        }

        return result;
    }

    private LieSeries ParseSum(LieTextReader reader)
    {
        reader.SkipSpaces();
        var negate = false;
        if (reader.TryConsume('-'))
        {
            negate = true;
        }
        else
        {
            reader.TryConsume('+');
        }

        var sum = ParseTerm(reader);
        if (negate)
        {
            sum = -sum;
        }

        while (true)
        {
            if (reader.TryConsume('+'))
            {
                sum += ParseTerm(reader);
            }
            else if (reader.TryConsume('-'))
            {
                sum -= ParseTerm(reader);
            }
            else
            {
                return sum;
            }
        }
    }

    private LieSeries ParseTerm(LieTextReader reader)
    {
        reader.SkipSpaces();
        var coefficient = Rational.One;
        if (!reader.AtEnd && char.IsDigit(reader.Current))
        {
            var start = reader.Position;
            while (!reader.AtEnd && (char.IsDigit(reader.Current) || reader.Current == '/'))
            {
                reader.Position++;
            }

            var token = reader.Text[start..reader.Position];
            if (!Rational.TryParse(token, out coefficient))
            {
                throw reader.ErrorAt(start, $"\"{token}\" is not a rational number");
            }

            reader.TryConsume('*');
        }

        return coefficient * ParseAtom(reader);
    }

    private LieSeries ParseAtom(LieTextReader reader)
    {
        reader.SkipSpaces();
        var open = reader.Position;
        if (reader.TryConsume('['))
        {
            reader.Enter();
            var left = ParseSum(reader);
            reader.Expect(',', "expected ',' between the two arguments of a bracket");
            var right = ParseSum(reader);
            reader.Expect(']', "expected ']' to close the bracket");
            reader.Leave();
            // Work budget of one parse: a bracket expands both sides in the free associative algebra, up to
            // 2^degree words, so text asking for many high-degree brackets is refused before it runs for minutes.
            var degree = Math.Max(0, left.MaxDegree) + Math.Max(0, right.MaxDegree);
            reader.Charge((double)left.Terms.Count * right.Terms.Count * Math.Pow(2, Math.Min(degree, 60)), open);
            try
            {
                return LieSeries.Bracket(left, right);
            }
            catch (ExactArgumentException e)
            {
                // The degree limit of the series, reported against the bracket that reaches it.
                throw reader.ErrorAt(open, e.Message.Split(" (Parameter", 2)[0]);
            }
        }

        if (reader.TryConsume('('))
        {
            reader.Enter();
            var inner = ParseSum(reader);
            reader.Expect(')', "expected ')'");
            reader.Leave();
            return inner;
        }

        var start = reader.Position;
        var name = reader.ReadIdentifier();
        if (name is null)
        {
            throw reader.Error(reader.AtEnd ? "unexpected end, expected a generator, a number, '[' or '('" : "expected a generator, a number, '[' or '('");
        }

        if (!Alphabet.Contains(name))
        {
            throw reader.ErrorAt(start, $"unknown generator \"{name}\" (the generators are {string.Join(", ", Alphabet.Names)})");
        }

        return Generator(name);
    }
}
