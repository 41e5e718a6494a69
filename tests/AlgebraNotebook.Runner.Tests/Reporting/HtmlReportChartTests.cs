using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

public class HtmlReportChartTests
{
    private static readonly DateTimeOffset RunDate = new(2026, 12, 1, 21, 30, 5, TimeSpan.Zero);

    private static CellResult ChartCell(int number, string html) =>
        new(new NotebookCell(number, CellKind.Code, "csharp", "diagram"), new[] { new CellOutput(CellOutputKind.ReturnValue, CellOutput.Html, html) }, null);

    [Fact]
    public void A_report_with_charts_carries_the_chart_library_exactly_once_in_its_head()
    {
        // Two outputs that each brought a library copy (as from two sessions): the report keeps one, before </head>.
        var a = RootDiagram.Of("G2").ToHtml(includeLibrary: true);
        var b = WeightDiagram.Of(AlgebraNotebook.Roots.Representations.IrreducibleRepresentation.Of("A2", 1, 1)).ToHtml(includeLibrary: true);
        var html = HtmlReportWriter.Write("charts.ipynb", RunDate, new[] { ChartCell(1, a), ChartCell(2, b) });
        var first = html.IndexOf(ChartLibrary.MarkerAttribute, StringComparison.Ordinal);
        Assert.True(first > 0 && first < html.IndexOf("</head>", StringComparison.Ordinal));
        Assert.Equal(-1, html.IndexOf(ChartLibrary.MarkerAttribute, first + 1, StringComparison.Ordinal));
        Assert.Contains(RootDiagram.Of("G2").ToHtml(includeLibrary: false), html);
    }

    [Fact]
    public void The_content_security_policy_allows_inline_scripts_and_nothing_from_a_network()
    {
        // The policy our charts are measured to work under (Diagrams/README.md).
        var html = HtmlReportWriter.Write("charts.ipynb", RunDate, new[] { ChartCell(1, RootDiagram.Of("A2").ToHtml()) });
        Assert.Contains("content=\"default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:\"", html);
    }

    [Fact]
    public void A_report_without_charts_has_no_script()
    {
        var html = HtmlReportWriter.Write("plain.ipynb", RunDate, new[] { ChartCell(1, "<div class=\"algebranotebook-math\"><math></math></div>") });
        Assert.DoesNotContain("<script", html);
    }
}
