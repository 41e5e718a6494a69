using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>
/// Turns the outputs stored in a notebook back into <see cref="CellResult"/>s, so that a report can be written without
/// executing anything (the <c>export</c> command).
/// </summary>
/// <remarks>
/// A stored notebook may come from someone else, so stored text/html is embedded in a report only when it has the
/// shape of an AlgebraNotebook math fragment (<see cref="IsMathFragment"/>). A stored chart is drawn again from its
/// figure data only (<see cref="ChartFragment.Rebuild"/>: the JSON is parsed and re-serialised, its scripts and other
/// markup are discarded), and a stored Dynkin drawing from its Cartan type only (<see cref="DynkinDrawing.Rebuild"/>). Any other output is shown as its escaped text/plain form (or, without one, as the escaped HTML
/// source). Stored errors become the cell's failure text.
/// </remarks>
public static class StoredResults
{
    private static readonly string[] ForbiddenMarkup =
        ["<script", "<style", "<link", "<meta", "<iframe", "<object", "<embed", "<base", "<form", "<img", "<svg", "<a ", "javascript:"];

    /// <summary>Pairs the loaded cells with their stored outputs, one result per cell in document order.</summary>
    /// <param name="cells">The cells as loaded by <see cref="NotebookFile.Load"/>.</param>
    /// <param name="stored">The same notebook's stored outputs.</param>
    /// <returns>The results.</returns>
    /// <exception cref="ArgumentException">The two lists have different lengths.</exception>
    public static IReadOnlyList<CellResult> ToCellResults(IReadOnlyList<NotebookCell> cells, StoredNotebook stored)
    {
        ArgumentNullException.ThrowIfNull(cells);
        ArgumentNullException.ThrowIfNull(stored);
        if (cells.Count != stored.Cells.Count)
        {
            throw new ArgumentException(
                $"The notebook has {cells.Count} cells but {stored.Cells.Count} stored cell entries.", nameof(stored));
        }

        var results = new List<CellResult>(cells.Count);
        for (var k = 0; k < cells.Count; k++)
        {
            var cell = cells[k];
            if (cell.Kind is CellKind.Markdown or CellKind.Raw)
            {
                results.Add(CellResult.Prose(cell));
                continue;
            }

            var outputs = new List<CellOutput>();
            var failures = new List<string>();
            foreach (var output in stored.Cells[k].Outputs)
            {
                switch (output.OutputType)
                {
                    case StoredOutput.Error:
                        failures.Add(NotebookWriter.ToFailureText(output.ErrorName, output.ErrorValue));
                        break;
                    case StoredOutput.Stream:
                        outputs.Add(new CellOutput(output.StreamName == "stderr" ? CellOutputKind.StandardError : CellOutputKind.StandardOutput,
                            CellOutput.PlainText, output.Text ?? string.Empty));
                        break;
                    default:
                        var kind = output.OutputType == StoredOutput.ExecuteResult ? CellOutputKind.ReturnValue : CellOutputKind.DisplayedValue;
                        output.Data.TryGetValue(CellOutput.PlainText, out var plain);
                        output.Data.TryGetValue(CellOutput.Html, out var html);
                        if (html is not null && IsMathFragment(html))
                        {
                            outputs.Add(new CellOutput(kind, CellOutput.Html, html) { PlainContent = plain });
                        }
                        else if (html is not null && ChartFragment.Rebuild(html) is { } chart)
                        {
                            outputs.Add(new CellOutput(kind, CellOutput.Html, chart) { PlainContent = plain });
                        }
                        else if (html is not null && DynkinDrawing.Rebuild(html) is { } drawing)
                        {
                            outputs.Add(new CellOutput(kind, CellOutput.Html, drawing.ToHtml()) { PlainContent = plain });
                        }
                        else if ((plain ?? html) is { } text)
                        {
                            outputs.Add(new CellOutput(kind, CellOutput.PlainText, text));
                        }

                        break;
                }
            }

            results.Add(new CellResult(cell, outputs, failures.Count == 0 ? null : string.Join("\n", failures)));
        }

        return results;
    }

    /// <summary>
    /// True when <paramref name="html"/> looks like the output of AlgebraNotebook's display layer: a single
    /// <c>&lt;div class="algebranotebook-math" ...&gt;</c> element with MathML inside and no scripts, styles, links,
    /// frames, images, forms or embedded objects.
    /// </summary>
    /// <param name="html">A stored text/html output.</param>
    /// <returns>Whether it may be embedded in a report as it is.</returns>
    public static bool IsMathFragment(string html)
    {
        ArgumentNullException.ThrowIfNull(html);
        var trimmed = html.Trim();
        return trimmed.StartsWith("<div class=\"" + AlgebraNotebook.Display.MathDisplay.HtmlClass + "\"", StringComparison.Ordinal)
               && trimmed.EndsWith("</math></div>", StringComparison.Ordinal)
               && !ForbiddenMarkup.Any(m => trimmed.Contains(m, StringComparison.OrdinalIgnoreCase));
    }
}
