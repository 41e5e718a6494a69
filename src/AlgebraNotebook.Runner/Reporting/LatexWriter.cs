using System.Net;
using System.Text;
using System.Text.RegularExpressions;
using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>
/// Writes a notebook with its stored outputs as a LaTeX document (class article, packages amsmath and amssymb),
/// without executing anything.
/// </summary>
/// <remarks>
/// <para>Markdown cells become plain paragraphs with every LaTeX special character escaped; "#" headings become
/// unnumbered sections and fenced code blocks become verbatim. Only this minimal Markdown is understood: emphasis
/// markers, links and lists stay as text.</para>
/// <para>Code cells: the source in a verbatim block, then each output. A stored text/html output that carries a
/// <c>data-latex</c> attribute (as <c>MathDisplay.ToHtml</c> writes it) is typeset as display math
/// <c>\[ ... \]</c> from that attribute (HTML-unescaped); every other output (plain values, console text, errors)
/// goes into a verbatim block. A verbatim block cannot contain its own end marker, so "\end{verbatim}" inside code or
/// text is written as "\end {verbatim}".</para>
/// <para>Non-ASCII characters (λ, ℏ in plain text or code) are written as they are: compile with LuaLaTeX or XeLaTeX,
/// or with pdfLaTeX after declaring those characters.</para>
/// </remarks>
public static partial class LatexWriter
{
    /// <summary>Builds the LaTeX document.</summary>
    /// <param name="title">Document title, usually the notebook file name (escaped).</param>
    /// <param name="cells">The cells as loaded by <see cref="NotebookFile.Load"/>.</param>
    /// <param name="stored">The same notebook's stored outputs.</param>
    /// <returns>The document text.</returns>
    /// <exception cref="ArgumentException">The two cell lists have different lengths.</exception>
    public static string Write(string title, IReadOnlyList<NotebookCell> cells, StoredNotebook stored)
    {
        ArgumentNullException.ThrowIfNull(title);
        ArgumentNullException.ThrowIfNull(cells);
        ArgumentNullException.ThrowIfNull(stored);
        if (cells.Count != stored.Cells.Count)
        {
            throw new ArgumentException(
                $"The notebook has {cells.Count} cells but {stored.Cells.Count} stored cell entries.", nameof(stored));
        }

        var tex = new StringBuilder();
        tex.Append("% Written by algebra-notebook export from the outputs stored in the notebook (not re-executed).\n")
            .Append("% Non-ASCII characters are kept: compile with lualatex or xelatex.\n")
            .Append("\\documentclass{article}\n\\usepackage{amsmath}\n\\usepackage{amssymb}\n")
            .Append("\\title{").Append(EscapeText(title)).Append("}\n\\date{}\n")
            .Append("\\begin{document}\n\\maketitle\n\n");
        for (var k = 0; k < cells.Count; k++)
        {
            var cell = cells[k];
            switch (cell.Kind)
            {
                case CellKind.Markdown:
                    WriteMarkdown(tex, cell.Source);
                    break;
                case CellKind.Raw:
                    WriteVerbatim(tex, cell.Source);
                    break;
                default:
                    WriteCode(tex, cell, stored.Cells[k]);
                    break;
            }
        }

        tex.Append("\\end{document}\n");
        return tex.ToString();
    }

    /// <summary>
    /// The LaTeX kept in the <c>data-latex</c> attribute of an HTML output, HTML-unescaped, or null when the output has
    /// no such attribute.
    /// </summary>
    /// <param name="html">A text/html output.</param>
    /// <returns>The LaTeX fragment or null.</returns>
    public static string? LatexFromHtml(string html)
    {
        ArgumentNullException.ThrowIfNull(html);
        var match = DataLatexPattern().Match(html);
        return match.Success ? WebUtility.HtmlDecode(match.Groups[1].Value) : null;
    }

    /// <summary>Escapes the characters that are special in LaTeX text.</summary>
    /// <param name="text">Any text.</param>
    /// <returns>The escaped text.</returns>
    public static string EscapeText(string text)
    {
        ArgumentNullException.ThrowIfNull(text);
        var output = new StringBuilder(text.Length + 16);
        foreach (var c in text)
        {
            output.Append(c switch
            {
                '\\' => @"\textbackslash{}",
                '{' or '}' or '$' or '&' or '#' or '_' or '%' => "\\" + c,
                '^' => @"\^{}",
                '~' => @"\~{}",
                '<' => @"\textless{}",
                '>' => @"\textgreater{}",
                '|' => @"\textbar{}",
                _ => c.ToString(),
            });
        }

        return output.ToString();
    }

    private static void WriteCode(StringBuilder tex, NotebookCell cell, StoredCell stored)
    {
        tex.Append("\\paragraph{Cell ").Append(cell.Number).Append("}\n");
        WriteVerbatim(tex, cell.Source);
        foreach (var output in stored.Outputs)
        {
            switch (output.OutputType)
            {
                case StoredOutput.Stream:
                    WriteVerbatim(tex, output.Text ?? string.Empty);
                    break;
                case StoredOutput.Error:
                    WriteVerbatim(tex, NotebookWriter.ToFailureText(output.ErrorName, output.ErrorValue));
                    break;
                default:
                    output.Data.TryGetValue("text/html", out var html);
                    output.Data.TryGetValue("text/plain", out var plain);
                    if (html is not null && LatexFromHtml(html) is { } latex)
                    {
                        tex.Append("\\[\n").Append(latex).Append("\n\\]\n");
                    }
                    else if ((plain ?? html) is { } text)
                    {
                        WriteVerbatim(tex, text);
                    }

                    break;
            }
        }

        tex.Append('\n');
    }

    private static void WriteVerbatim(StringBuilder tex, string text)
    {
        var body = text.Replace("\r\n", "\n").TrimEnd('\n').Replace(@"\end{verbatim}", @"\end {verbatim}", StringComparison.Ordinal);
        if (body.Trim().Length == 0)
        {
            return;
        }

        tex.Append("\\begin{verbatim}\n").Append(body).Append("\n\\end{verbatim}\n");
    }

    private static void WriteMarkdown(StringBuilder tex, string markdown)
    {
        var paragraph = new List<string>();
        var fence = (StringBuilder?)null;

        void Flush()
        {
            if (paragraph.Count > 0)
            {
                tex.Append(EscapeText(string.Join(" ", paragraph))).Append("\n\n");
                paragraph.Clear();
            }
        }

        foreach (var raw in markdown.Replace("\r\n", "\n").Split('\n'))
        {
            var line = raw.TrimEnd();
            if (fence is not null)
            {
                if (line.TrimStart().StartsWith("```", StringComparison.Ordinal))
                {
                    WriteVerbatim(tex, fence.ToString());
                    fence = null;
                }
                else
                {
                    fence.Append(raw).Append('\n');
                }

                continue;
            }

            if (line.TrimStart().StartsWith("```", StringComparison.Ordinal))
            {
                Flush();
                fence = new StringBuilder();
                continue;
            }

            if (line.Length == 0)
            {
                Flush();
                continue;
            }

            var heading = HeadingPattern().Match(line);
            if (heading.Success)
            {
                Flush();
                var command = heading.Groups[1].Value.Length switch
                {
                    1 => "section",
                    2 => "subsection",
                    3 => "subsubsection",
                    _ => "paragraph",
                };
                tex.Append('\\').Append(command).Append("*{").Append(EscapeText(heading.Groups[2].Value.TrimEnd('#', ' ')))
                    .Append("}\n");
                continue;
            }

            paragraph.Add(line.Trim());
        }

        if (fence is not null)
        {
            WriteVerbatim(tex, fence.ToString());
        }

        Flush();
    }

    [GeneratedRegex("data-latex=\"([^\"]*)\"")]
    private static partial Regex DataLatexPattern();

    [GeneratedRegex(@"^\s{0,3}(#{1,6})\s+(.*)$")]
    private static partial Regex HeadingPattern();
}
