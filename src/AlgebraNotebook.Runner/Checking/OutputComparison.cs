using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Checking;

/// <summary>
/// Turns a cell's outputs into the lines that the <c>check</c> command compares, so that stored and new outputs are
/// compared the same way.
/// </summary>
/// <remarks>
/// Each output becomes a heading line ("[result]", "[display]", "[stdout]", "[stderr]", "[error]") followed by its
/// text: the text/plain form of results and displays (text/html only when there is no plain form), the text of
/// streams, and "name: message" of errors (tracebacks are not compared: they hold paths and line numbers of the
/// machine that ran the cell). Consecutive stream outputs of the same stream are joined first. Line endings are
/// normalised to "\n", trailing whitespace is removed from every line, and blank lines at the end of each output
/// are dropped. Execution counts are not compared.
/// </remarks>
public static class OutputComparison
{
    /// <summary>The comparable lines of a list of outputs (see the remarks on <see cref="OutputComparison"/>).</summary>
    /// <param name="outputs">The outputs in order.</param>
    /// <returns>The lines.</returns>
    public static IReadOnlyList<string> ComparableLines(IEnumerable<StoredOutput> outputs)
    {
        ArgumentNullException.ThrowIfNull(outputs);
        var blocks = new List<(string Heading, string Text)>();
        foreach (var output in outputs)
        {
            switch (output.OutputType)
            {
                case StoredOutput.Stream:
                    var heading = $"[{output.StreamName ?? "stdout"}]";
                    var text = output.Text ?? string.Empty;
                    if (blocks.Count > 0 && blocks[^1].Heading == heading)
                    {
                        blocks[^1] = (heading, blocks[^1].Text + text);
                    }
                    else
                    {
                        blocks.Add((heading, text));
                    }

                    break;
                case StoredOutput.Error:
                    blocks.Add(("[error]", $"{output.ErrorName}: {output.ErrorValue}"));
                    break;
                default:
                    var label = output.OutputType switch
                    {
                        StoredOutput.ExecuteResult => "[result]",
                        StoredOutput.DisplayData => "[display]",
                        _ => $"[{output.OutputType}]",
                    };
                    var content = output.Data.TryGetValue("text/plain", out var plain) ? plain
                        : output.Data.TryGetValue("text/html", out var html) ? html
                        : string.Join("\n", output.Data.OrderBy(p => p.Key, StringComparer.Ordinal).Select(p => $"{p.Key}: {p.Value}"));
                    blocks.Add((label, content));
                    break;
            }
        }

        var lines = new List<string>();
        foreach (var (heading, text) in blocks)
        {
            lines.Add(heading);
            var body = text.Replace("\r\n", "\n").Replace('\r', '\n').Split('\n').Select(l => l.TrimEnd()).ToList();
            while (body.Count > 0 && body[^1].Length == 0)
            {
                body.RemoveAt(body.Count - 1);
            }

            lines.AddRange(body);
        }

        return lines;
    }

    /// <summary>True when the two output lists compare equal (their <see cref="ComparableLines"/> agree).</summary>
    /// <param name="stored">The outputs stored in the notebook.</param>
    /// <param name="current">The outputs of the new run.</param>
    /// <returns>Whether they agree.</returns>
    public static bool Agree(IEnumerable<StoredOutput> stored, IEnumerable<StoredOutput> current) =>
        ComparableLines(stored).SequenceEqual(ComparableLines(current), StringComparer.Ordinal);
}
