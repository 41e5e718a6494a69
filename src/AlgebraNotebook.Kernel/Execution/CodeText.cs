using Microsoft.DotNet.Interactive;

namespace AlgebraNotebook.Kernel.Execution;

/// <summary>
/// Position arithmetic on a cell's text: Jupyter counts cursor offsets in Unicode code points, .NET strings and the
/// C# kernel in UTF-16 units and (line, character) pairs.
/// </summary>
internal sealed class CodeText
{
    private readonly string text;

    public CodeText(string text)
    {
        this.text = text;
    }

    /// <summary>UTF-16 index of a code-point offset, clamped to the text.</summary>
    public int ToUtf16(int codePoints)
    {
        var index = 0;
        for (var seen = 0; seen < codePoints && index < text.Length; seen++)
        {
            index += char.IsHighSurrogate(text[index]) && index + 1 < text.Length && char.IsLowSurrogate(text[index + 1]) ? 2 : 1;
        }

        return index;
    }

    /// <summary>Code-point offset of a UTF-16 index.</summary>
    public int ToCodePoints(int utf16)
    {
        var count = 0;
        for (var i = 0; i < utf16 && i < text.Length; i++)
        {
            if (!char.IsLowSurrogate(text[i]) || i == 0 || !char.IsHighSurrogate(text[i - 1]))
            {
                count++;
            }
        }

        return count;
    }

    public LinePosition ToLinePosition(int utf16)
    {
        var line = 0;
        var lineStart = 0;
        for (var i = 0; i < utf16 && i < text.Length; i++)
        {
            if (text[i] == '\n')
            {
                line++;
                lineStart = i + 1;
            }
        }

        return new LinePosition(line, utf16 - lineStart);
    }

    public int FromLinePosition(LinePosition position)
    {
        var index = 0;
        for (var line = 0; line < position.Line && index < text.Length; index++)
        {
            if (text[index] == '\n')
            {
                line++;
            }
        }

        return Math.Min(text.Length, index + position.Character);
    }

    /// <summary>Start of the identifier that ends at the cursor (the cursor itself when there is none).</summary>
    public int IdentifierStart(int utf16)
    {
        var start = Math.Min(utf16, text.Length);
        while (start > 0 && (char.IsLetterOrDigit(text[start - 1]) || text[start - 1] == '_'))
        {
            start--;
        }

        return start;
    }
}
