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

    public ExactParseException Error(string problem) => new(Text, Position, problem);

    public ExactParseException ErrorAt(int position, string problem) => new(Text, position, problem);
}
