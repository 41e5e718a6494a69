using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;

namespace AlgebraNotebook.Groups.FreeLie;

/// <summary>Character reader shared by the bracket and Lie-expression parsers.</summary>
internal sealed class LieTextReader(string text)
{
    public string Text { get; } = text;

    public int Position { get; set; }

    public bool AtEnd => Position >= Text.Length;

    public char Current => Text[Position];

    public void SkipSpaces()
    {
        while (!AtEnd && char.IsWhiteSpace(Current))
        {
            Position++;
        }
    }

    public bool TryConsume(char c)
    {
        SkipSpaces();
        if (!AtEnd && Current == c)
        {
            Position++;
            return true;
        }

        return false;
    }

    public void Expect(char c, string problem)
    {
        if (!TryConsume(c))
        {
            throw Error(AtEnd ? $"unexpected end, {problem}" : problem);
        }
    }

    public string? ReadIdentifier()
    {
        SkipSpaces();
        if (AtEnd || !char.IsLetter(Current))
        {
            return null;
        }

        var start = Position;
        while (!AtEnd && (char.IsLetterOrDigit(Current) || Current == '_'))
        {
            Position++;
        }

        return Text[start..Position];
    }

    /// <summary>Brackets and parentheses may nest this deep; deeper text is refused instead of exhausting the stack.</summary>
    public const int MaxNesting = 200;

    private int depth;

    /// <summary>Enters one more level of nesting; throws when the text nests deeper than <see cref="MaxNesting"/>.</summary>
    public void Enter()
    {
        if (++depth > MaxNesting)
        {
            throw Error($"nesting deeper than {MaxNesting} levels");
        }
    }

    /// <summary>Work budget of one parse (see <see cref="Charge"/>).</summary>
    /// <remarks>Measured (Release, processor time, best of 3, 2026-12-02, generators X, Y, Z): the slowest admitted
    /// input of the families tried is the alternating bracket [X, [Y, [X, ... Z]]] with 13 brackets, about 0.18 s and
    /// 85 MB allocated; [X, [X, ... [X, Y]]] is admitted up to 20 brackets (3 ms); a sum of 3 771 degree-9 brackets
    /// (159 000 characters) takes 0.5 s. Table:
    /// tests/AlgebraNotebook.Fuzz/README.md, "Work budgets".</remarks>
    public const double MaxWork = 1 << 22;

    private double work;

    /// <summary>
    /// Charges work against the budget; throws <see cref="BeyondCapabilityException"/> naming the text when the
    /// budget is spent. The same element can still be built with the series API, which has no such limit.
    /// </summary>
    public void Charge(double amount, int position)
    {
        work += Math.Min(amount, MaxWork + 1);
        if (work > MaxWork)
        {
            var shown = (Text.Length > 200 ? Text[..200] + "..." : Text).Replace('\n', ' ').Replace('\r', ' ');
            throw new BeyondCapabilityException(
                $"Cannot parse \"{shown}\": the brackets up to position {position + 1} would take too long to expand "
                + $"(limit {MaxWork:N0} units of work per text, about 2^degree per bracket). Build the element with "
                + "LieSeries.Bracket on parsed pieces, which has no such limit.");
        }
    }

    /// <summary>Leaves a level entered with <see cref="Enter"/>.</summary>
    public void Leave() => depth--;

    public ExactParseException Error(string problem) => new(Text, Position, problem);

    public ExactParseException ErrorAt(int position, string problem) => new(Text, position, problem);
}
