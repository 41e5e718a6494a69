namespace AlgebraNotebook.Exact.Parsing;

/// <summary>
/// A text that could not be parsed. <see cref="Position"/> is the zero-based index of the offending character,
/// and <see cref="Exception.Message"/> shows the text with a caret under it.
/// </summary>
public sealed class ExactParseException : FormatException
{
    /// <summary>Creates the exception.</summary>
    /// <param name="input">The whole text being parsed.</param>
    /// <param name="position">Zero-based index of the offending character (may equal the length for "unexpected end").</param>
    /// <param name="problem">What is wrong, e.g. "expected a digit".</param>
    public ExactParseException(string input, int position, string problem)
        : base(Describe(input, position, problem))
    {
        Input = input;
        Position = position;
        Problem = problem;
    }

    /// <summary>The text that was being parsed.</summary>
    public string Input { get; }

    /// <summary>Zero-based index of the offending character.</summary>
    public int Position { get; }

    /// <summary>The problem, without the caret picture.</summary>
    public string Problem { get; }

    private static string Describe(string input, int position, string problem)
    {
        var shown = input.Replace('\n', ' ').Replace('\r', ' ');
        return $"Cannot parse \"{shown}\": {problem} at position {position + 1}.\n  {shown}\n  {new string(' ', Math.Clamp(position, 0, shown.Length))}^";
    }
}
