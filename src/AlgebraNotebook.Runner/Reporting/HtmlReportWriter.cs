using System.Globalization;
using System.Text;
using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>
/// Writes a standalone HTML report of a notebook run: title, run date, a summary line, then every cell in order —
/// Markdown cells rendered as prose, code cells with their escaped source and outputs, failed cells with their cell
/// number and the compiler diagnostics or exception message.
/// </summary>
/// <remarks>
/// The report opens offline: the only style is the inline stylesheet below, nothing is loaded from a network and the
/// <see cref="ContentSecurityPolicy"/> meta tag blocks every network load (inline scripts and styles, data: images and
/// fonts only; inline scripts are allowed because charts are drawn by them). Plain text (sources, standard output,
/// plain-text values, failure messages) is always HTML-escaped; text/html outputs are formatter output and embedded as
/// they are (MathML renders natively in current browsers). When an output holds a chart, the report carries exactly one
/// copy of the chart library (<see cref="ChartLibrary"/>) in its head: copies that outputs brought along are removed.
/// </remarks>
public static class HtmlReportWriter
{
    /// <summary>
    /// The Content-Security-Policy of every report (a meta tag in its head): nothing may be fetched from anywhere;
    /// inline scripts and styles, and images and fonts written as data: URLs, are the only content allowed.
    /// </summary>
    public const string ContentSecurityPolicy =
        "default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:";

    private const string Stylesheet = """
        :root { color-scheme: light; }
        body { margin: 0; background: #f4f3ef; color: #1d1f21; font: 16px/1.5 system-ui, sans-serif; }
        main { max-width: 60rem; margin: 0 auto; padding: 1.5rem 1.25rem 4rem; }
        header.report { border-bottom: 3px solid #2f5d50; margin-bottom: 1.5rem; }
        header.report h1 { margin: 0 0 .25rem; font-size: 1.6rem; }
        header.report p { margin: .2rem 0; color: #4a4f55; }
        .summary.ok { color: #2f5d50; font-weight: 600; }
        .summary.failed { color: #9b2c1f; font-weight: 600; }
        section.cell { margin: 1rem 0; }
        section.prose { padding: 0 .25rem; }
        section.raw pre { color: #4a4f55; }
        section.code { background: #fff; border: 1px solid #d6d3ca; border-left: 4px solid #2f5d50; border-radius: 4px; }
        section.code.failed { border-left-color: #9b2c1f; }
        .cell-label { font: 600 .75rem/1 system-ui, sans-serif; letter-spacing: .04em; text-transform: uppercase;
                      color: #6b7077; padding: .5rem .75rem 0; }
        pre { margin: 0; padding: .5rem .75rem; overflow-x: auto; font: 14px/1.45 ui-monospace, "DejaVu Sans Mono", monospace;
              white-space: pre-wrap; word-break: break-word; }
        pre.source { background: #fbfaf7; border-bottom: 1px solid #e6e3da; }
        .output { padding: .25rem .75rem; border-top: 1px dashed #e6e3da; overflow-x: auto; }
        .output:first-of-type { border-top: none; }
        .output pre { padding: .25rem 0; }
        .output.stderr pre, .output.diagnostic pre { color: #8a5a00; }
        .failure { margin: .5rem .75rem .75rem; padding: .5rem .75rem; background: #fbeae7; border: 1px solid #e5b5ad; border-radius: 4px; }
        .failure strong { color: #9b2c1f; }
        .failure pre { padding: .25rem 0 0; color: #5e1a12; }
        code { font-family: ui-monospace, "DejaVu Sans Mono", monospace; background: #ebe8df; padding: 0 .2em; border-radius: 3px; }
        pre code { background: none; padding: 0; }
        math[display="block"] { margin: .35rem 0; }
        footer { margin-top: 2rem; color: #6b7077; font-size: .85rem; }
        """;

    /// <summary>Builds the complete HTML document.</summary>
    /// <param name="title">Report title, usually the notebook file name (escaped).</param>
    /// <param name="runDate">When the run happened; written in UTC as yyyy-MM-dd HH:mm:ss.</param>
    /// <param name="results">The cells and their results, in document order.</param>
    /// <param name="dateLabel">The words before the date in the header: "Run on" for a run, something like
    /// "Outputs stored in the notebook, saved on" for a report made from stored outputs.</param>
    /// <returns>The HTML document text.</returns>
    /// <exception cref="ArgumentNullException">An argument is null.</exception>
    public static string Write(string title, DateTimeOffset runDate, IReadOnlyList<CellResult> results, string dateLabel = "Run on")
    {
        ArgumentNullException.ThrowIfNull(title);
        ArgumentNullException.ThrowIfNull(results);
        ArgumentNullException.ThrowIfNull(dateLabel);
        var failures = results.Count(r => r.Failed);
        var codeCells = results.Count(r => r.Cell.Kind is CellKind.Code or CellKind.Unsupported);
        var hasCharts = results.Any(r => r.Outputs.Any(o => o.IsHtml && ChartLibrary.ContainsChart(o.Content)));
        var html = new StringBuilder();
        html.Append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
            .Append($"<meta http-equiv=\"Content-Security-Policy\" content=\"{ContentSecurityPolicy}\">\n")
            .Append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
            .Append("<title>").Append(HtmlText.Escape(title)).Append("</title>\n")
            .Append("<style>\n").Append(Stylesheet).Append("\n</style>\n");
        if (hasCharts)
        {
            html.Append(ChartLibrary.ScriptElement).Append('\n');
        }

        html.Append("</head>\n<body>\n<main>\n");

        html.Append("<header class=\"report\">\n<h1>").Append(HtmlText.Escape(title)).Append("</h1>\n")
            .Append("<p>").Append(HtmlText.Escape(dateLabel)).Append(' ')
            .Append(HtmlText.Escape(runDate.ToUniversalTime().ToString("yyyy-MM-dd HH:mm:ss", CultureInfo.InvariantCulture)))
            .Append(" UTC &middot; ").Append(results.Count).Append(" cells, ").Append(codeCells).Append(" code cells</p>\n")
            .Append(failures == 0
                ? "<p class=\"summary ok\">All code cells succeeded.</p>\n"
                : $"<p class=\"summary failed\">{failures} {(failures == 1 ? "cell" : "cells")} failed: "
                  + string.Join(", ", results.Where(r => r.Failed).Select(r => $"cell {r.Cell.Number}")) + ".</p>\n")
            .Append("</header>\n");

        foreach (var result in results)
        {
            WriteCell(html, result);
        }

        html.Append("<footer>Written by algebra-notebook.</footer>\n</main>\n</body>\n</html>\n");
        return html.ToString();
    }

    private static void WriteCell(StringBuilder html, CellResult result)
    {
        var cell = result.Cell;
        var id = $"cell-{cell.Number}";
        if (cell.Kind == CellKind.Markdown)
        {
            html.Append("<section class=\"cell prose\" id=\"").Append(id).Append("\">\n")
                .Append(MarkdownToHtml.Convert(cell.Source))
                .Append("</section>\n");
            return;
        }

        if (cell.Kind == CellKind.Raw)
        {
            html.Append("<section class=\"cell raw\" id=\"").Append(id).Append("\">\n<pre>")
                .Append(HtmlText.Escape(cell.Source)).Append("</pre>\n</section>\n");
            return;
        }

        html.Append("<section class=\"cell code").Append(result.Failed ? " failed" : string.Empty)
            .Append("\" id=\"").Append(id).Append("\">\n")
            .Append("<div class=\"cell-label\">Cell ").Append(cell.Number).Append(" &middot; ")
            .Append(HtmlText.Escape(cell.Language)).Append("</div>\n")
            .Append("<pre class=\"source\"><code>").Append(HtmlText.Escape(cell.Source)).Append("</code></pre>\n");

        foreach (var output in result.Outputs)
        {
            var kind = output.Kind switch
            {
                CellOutputKind.ReturnValue => "value",
                CellOutputKind.DisplayedValue => "display",
                CellOutputKind.StandardOutput => "stdout",
                CellOutputKind.StandardError => "stderr",
                _ => "diagnostic",
            };
            html.Append("<div class=\"output ").Append(kind).Append("\">");
            if (output.IsHtml)
            {
                html.Append(ChartLibrary.RemoveCopies(output.Content));
            }
            else
            {
                html.Append("<pre>").Append(HtmlText.Escape(output.Content.TrimEnd('\r', '\n'))).Append("</pre>");
            }

            html.Append("</div>\n");
        }

        if (result.Failure is not null)
        {
            html.Append("<div class=\"failure\"><strong>Cell ").Append(cell.Number).Append(" failed</strong>\n<pre>")
                .Append(HtmlText.Escape(result.Failure)).Append("</pre></div>\n");
        }

        html.Append("</section>\n");
    }
}
