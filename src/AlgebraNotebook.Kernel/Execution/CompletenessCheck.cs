namespace AlgebraNotebook.Kernel.Execution;

/// <summary>
/// The answer to a Jupyter is_complete_request: a bracket-balance heuristic, not a parse.
/// </summary>
/// <remarks>
/// The code is scanned once, skipping // and /* */ comments, "..." and '...' literals, verbatim @"..." strings and raw
/// """...""" strings (interpolation holes are not entered). Round, square and curly brackets are counted:
/// <list type="bullet">
/// <item>a closing bracket with no matching opener, or one that closes a different kind, gives "invalid";</item>
/// <item>brackets still open, or an unterminated block comment, verbatim or raw string, give "incomplete", with an
/// indent of four spaces per open curly bracket;</item>
/// <item>an ordinary string or character literal left open at the end of a line gives "invalid" (C# does not continue
/// them);</item>
/// <item>otherwise "complete" (a missing semicolon is not detected: the C# kernel accepts a final expression without one).</item>
/// </list>
/// </remarks>
public static class CompletenessCheck
{
    /// <summary>Status "complete": the cell can be executed.</summary>
    public const string Complete = "complete";

    /// <summary>Status "incomplete": more lines are expected.</summary>
    public const string Incomplete = "incomplete";

    /// <summary>Status "invalid": the brackets or literals cannot be balanced by adding lines.</summary>
    public const string Invalid = "invalid";

    /// <summary>Classifies a cell.</summary>
    /// <param name="code">The cell text.</param>
    /// <returns>The status and, for "incomplete", the suggested indent of the next line (otherwise empty).</returns>
    public static (string Status, string Indent) Check(string code)
    {
        ArgumentNullException.ThrowIfNull(code);
        var open = new Stack<char>();
        var i = 0;
        while (i < code.Length)
        {
            var c = code[i];
            var next = i + 1 < code.Length ? code[i + 1] : '\0';
            if (c == '/' && next == '/')
            {
                i = SkipTo(code, i, "\n");
                continue;
            }

            if (c == '/' && next == '*')
            {
                var end = code.IndexOf("*/", i + 2, StringComparison.Ordinal);
                if (end < 0)
                {
                    return IncompleteWith(open);
                }

                i = end + 2;
                continue;
            }

            if (c == '"' && next == '"' && i + 2 < code.Length && code[i + 2] == '"')
            {
                var quotes = CountRun(code, i, '"');
                var end = code.IndexOf(new string('"', quotes), i + quotes, StringComparison.Ordinal);
                if (end < 0)
                {
                    return IncompleteWith(open);
                }

                i = end + quotes;
                continue;
            }

            if (c == '@' && next == '"' || c == '$' && next == '@' || c == '@' && next == '$')
            {
                var quote = code.IndexOf('"', i);
                if (quote < 0 || quote > i + 2)
                {
                    i++;
                    continue;
                }

                var end = EndOfVerbatim(code, quote + 1);
                if (end < 0)
                {
                    return IncompleteWith(open);
                }

                i = end;
                continue;
            }

            if (c == '"' || c == '\'')
            {
                var end = EndOfLiteral(code, i + 1, c);
                if (end < 0)
                {
                    return (Invalid, string.Empty);
                }

                i = end;
                continue;
            }

            switch (c)
            {
                case '(' or '[' or '{':
                    open.Push(c);
                    break;
                case ')' or ']' or '}':
                    if (open.Count == 0 || open.Pop() != Opener(c))
                    {
                        return (Invalid, string.Empty);
                    }

                    break;
            }

            i++;
        }

        return open.Count == 0 ? (Complete, string.Empty) : IncompleteWith(open);
    }

    private static (string, string) IncompleteWith(Stack<char> open) =>
        (Incomplete, new string(' ', 4 * open.Count(c => c == '{')));

    private static char Opener(char closer) => closer switch
    {
        ')' => '(',
        ']' => '[',
        _ => '{',
    };

    private static int SkipTo(string code, int from, string marker)
    {
        var end = code.IndexOf(marker, from, StringComparison.Ordinal);
        return end < 0 ? code.Length : end + marker.Length;
    }

    private static int CountRun(string code, int from, char c)
    {
        var n = 0;
        while (from + n < code.Length && code[from + n] == c)
        {
            n++;
        }

        return n;
    }

    /// <summary>Index after the closing quote of a verbatim string whose body starts at <paramref name="from"/>; -1 if unterminated.</summary>
    private static int EndOfVerbatim(string code, int from)
    {
        for (var i = from; i < code.Length; i++)
        {
            if (code[i] != '"')
            {
                continue;
            }

            if (i + 1 < code.Length && code[i + 1] == '"')
            {
                i++;
                continue;
            }

            return i + 1;
        }

        return -1;
    }

    /// <summary>Index after the closing quote of a regular literal; -1 if the line or text ends first.</summary>
    private static int EndOfLiteral(string code, int from, char quote)
    {
        for (var i = from; i < code.Length; i++)
        {
            if (code[i] == '\\')
            {
                i++;
                continue;
            }

            if (code[i] == '\n')
            {
                return -1;
            }

            if (code[i] == quote)
            {
                return i + 1;
            }
        }

        return -1;
    }
}
