using System.Text;

namespace AlgebraNotebook.Runner.Checking;

/// <summary>
/// A line diff in unified style: lines only in the old text start with "-", lines only in the new text with "+",
/// unchanged context lines with a space; hunks are separated by "@@" lines. Computed from a longest common
/// subsequence (quadratic in the number of lines, so both texts are cut to <see cref="MaxLines"/> lines first).
/// </summary>
public static class LineDiff
{
    /// <summary>Lines of each text taken into account; further lines are summarised in one note.</summary>
    public const int MaxLines = 2000;

    /// <summary>Unchanged lines shown before and after each change.</summary>
    public const int ContextLines = 2;

    /// <summary>Longest shown line; longer ones are cut and end in "…".</summary>
    public const int MaxLineLength = 160;

    /// <summary>
    /// The diff of <paramref name="oldLines"/> against <paramref name="newLines"/> with headings "--- oldName" and
    /// "+++ newName", at most <paramref name="maxOutputLines"/> diff lines (a final "... N more diff lines" says what
    /// was left out). Empty when the texts are equal.
    /// </summary>
    /// <param name="oldLines">The old text as lines.</param>
    /// <param name="newLines">The new text as lines.</param>
    /// <param name="oldName">Heading of the old side.</param>
    /// <param name="newName">Heading of the new side.</param>
    /// <param name="maxOutputLines">Most diff lines printed (headings not counted); at least 1.</param>
    /// <returns>The diff text, lines ending in "\n".</returns>
    /// <exception cref="ArgumentOutOfRangeException"><paramref name="maxOutputLines"/> is less than 1.</exception>
    public static string Unified(IReadOnlyList<string> oldLines, IReadOnlyList<string> newLines, string oldName, string newName,
        int maxOutputLines = 40)
    {
        ArgumentNullException.ThrowIfNull(oldLines);
        ArgumentNullException.ThrowIfNull(newLines);
        ArgumentOutOfRangeException.ThrowIfLessThan(maxOutputLines, 1);
        if (oldLines.SequenceEqual(newLines, StringComparer.Ordinal))
        {
            return string.Empty;
        }

        var a = oldLines.Take(MaxLines).ToArray();
        var b = newLines.Take(MaxLines).ToArray();
        var script = EditScript(a, b);

        var show = new bool[script.Count];
        for (var k = 0; k < script.Count; k++)
        {
            if (script[k].Tag != ' ')
            {
                for (var j = Math.Max(0, k - ContextLines); j <= Math.Min(script.Count - 1, k + ContextLines); j++)
                {
                    show[j] = true;
                }
            }
        }

        var lines = new List<string>();
        var previous = -2;
        for (var k = 0; k < script.Count; k++)
        {
            if (!show[k])
            {
                continue;
            }

            if (k != previous + 1)
            {
                lines.Add("@@");
            }

            lines.Add(script[k].Tag + Shorten(script[k].Line));
            previous = k;
        }

        var text = new StringBuilder();
        text.Append("--- ").Append(oldName).Append('\n').Append("+++ ").Append(newName).Append('\n');
        foreach (var line in lines.Take(maxOutputLines))
        {
            text.Append(line).Append('\n');
        }

        if (lines.Count > maxOutputLines)
        {
            text.Append("... ").Append(lines.Count - maxOutputLines).Append(" more diff lines\n");
        }

        var cut = Math.Max(oldLines.Count - a.Length, newLines.Count - b.Length);
        if (cut > 0)
        {
            text.Append("... the last ").Append(cut).Append(" lines were not compared line by line\n");
        }

        return text.ToString();
    }

    private static string Shorten(string line) =>
        line.Length <= MaxLineLength ? line : line[..(MaxLineLength - 1)] + "…";

    private static List<(char Tag, string Line)> EditScript(string[] a, string[] b)
    {
        // common[i, j] = length of the longest common subsequence of a[i..] and b[j..].
        var common = new int[a.Length + 1, b.Length + 1];
        for (var i = a.Length - 1; i >= 0; i--)
        {
            for (var j = b.Length - 1; j >= 0; j--)
            {
                common[i, j] = a[i] == b[j] ? common[i + 1, j + 1] + 1 : Math.Max(common[i + 1, j], common[i, j + 1]);
            }
        }

        var script = new List<(char, string)>();
        int x = 0, y = 0;
        while (x < a.Length || y < b.Length)
        {
            if (x < a.Length && y < b.Length && a[x] == b[y])
            {
                script.Add((' ', a[x++]));
                y++;
            }
            else if (x < a.Length && (y == b.Length || common[x + 1, y] >= common[x, y + 1]))
            {
                // Deletions before insertions, as unified diffs show a replaced line.
                script.Add(('-', a[x++]));
            }
            else
            {
                script.Add(('+', b[y++]));
            }
        }

        return script;
    }
}
