using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

public class HtmlReportWriterTests
{
    private static readonly DateTimeOffset RunDate = new(2026, 12, 1, 21, 30, 5, TimeSpan.Zero);

    private static string Write(params CellResult[] results) => HtmlReportWriter.Write("demo <1>.ipynb", RunDate, results);

    [Fact]
    public void Title_run_date_and_success_summary_are_written()
    {
        var html = Write(new CellResult(new NotebookCell(1, CellKind.Code, "csharp", "1 + 1"),
            new[] { new CellOutput(CellOutputKind.ReturnValue, CellOutput.PlainText, "2") }, null));
        Assert.StartsWith("<!DOCTYPE html>", html);
        Assert.Contains("<title>demo &lt;1&gt;.ipynb</title>", html);
        Assert.Contains("2026-12-01 21:30:05 UTC", html);
        Assert.Contains("All code cells succeeded.", html);
        Assert.Contains("<pre>2</pre>", html);
    }

    [Fact]
    public void Sources_plain_outputs_and_failures_are_escaped()
    {
        var cell = new NotebookCell(3, CellKind.Code, "csharp", "Console.WriteLine(\"<script>\");");
        var html = Write(new CellResult(cell,
            new[] { new CellOutput(CellOutputKind.StandardOutput, CellOutput.PlainText, "<script>alert(1)</script>\n") },
            "System.Exception: <img src=x>"));
        Assert.DoesNotContain("<script>", html);
        Assert.DoesNotContain("<img", html);
        Assert.Contains("Console.WriteLine(&quot;&lt;script&gt;&quot;);", html);
        Assert.Contains("<pre>&lt;script&gt;alert(1)&lt;/script&gt;</pre>", html);
        Assert.Contains("System.Exception: &lt;img src=x&gt;", html);
    }

    [Fact]
    public void Html_outputs_are_embedded_unchanged()
    {
        const string mathml = "<math display=\"block\"><mtable><mtr><mtd><mn>1</mn></mtd></mtr></mtable></math>";
        var html = Write(new CellResult(new NotebookCell(1, CellKind.Code, "csharp", "m"),
            new[] { new CellOutput(CellOutputKind.ReturnValue, CellOutput.Html, mathml) }, null));
        Assert.Contains(mathml, html);
    }

    [Fact]
    public void Failed_cells_are_numbered_in_the_summary_and_in_the_cell()
    {
        var ok = new CellResult(new NotebookCell(1, CellKind.Markdown, "markdown", "# Intro"), Array.Empty<CellOutput>(), null);
        var bad = new CellResult(new NotebookCell(2, CellKind.Code, "csharp", "int x = \"s\";"), Array.Empty<CellOutput>(),
            "Compilation failed: (1,9): error CS0029: Cannot implicitly convert type 'string' to 'int'");
        var html = Write(ok, bad);
        Assert.Contains("1 cell failed: cell 2.", html);
        Assert.Contains("<strong>Cell 2 failed</strong>", html);
        Assert.Contains("CS0029", html);
        Assert.Contains("<h1>Intro</h1>", html);
    }

    [Fact]
    public void Report_loads_nothing_from_outside_the_file()
    {
        var html = Write(new CellResult(new NotebookCell(1, CellKind.Code, "csharp", "1"), Array.Empty<CellOutput>(), null));
        Assert.DoesNotContain("<script", html);
        Assert.DoesNotContain("<link", html);
        Assert.DoesNotContain("http://", html);
        Assert.DoesNotContain("https://", html);
        Assert.Contains("default-src 'none'", html);
    }

    [Fact]
    public void A_small_report_matches_the_approved_file()
    {
        var html = Write(
            new CellResult(new NotebookCell(1, CellKind.Markdown, "markdown", "# Small *report*\n\nTwo `cells`:\n- one\n- two"),
                Array.Empty<CellOutput>(), null),
            new CellResult(new NotebookCell(2, CellKind.Code, "csharp", "var a = Rational.Parse(\"1/2\");\nConsole.WriteLine(a < 1);\na"),
                new[]
                {
                    new CellOutput(CellOutputKind.StandardOutput, CellOutput.PlainText, "True\n"),
                    new CellOutput(CellOutputKind.ReturnValue, CellOutput.Html, "<math display=\"block\"><mfrac><mn>1</mn><mn>2</mn></mfrac></math>"),
                },
                null),
            new CellResult(new NotebookCell(3, CellKind.Raw, "raw", "raw <text>"), Array.Empty<CellOutput>(), null),
            new CellResult(new NotebookCell(4, CellKind.Code, "csharp", "throw new Exception(\"no\");"),
                Array.Empty<CellOutput>(), "System.Exception: no"));
        Approvals.Verify("small_report", "html", html);
    }
}
