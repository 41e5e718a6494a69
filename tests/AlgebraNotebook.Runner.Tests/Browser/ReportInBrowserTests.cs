using System.Text.Json;
using AlgebraNotebook.Display;
using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Display.Tree;
using AlgebraNotebook.Notebook;
using AlgebraNotebook.Roots.Representations;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;
using Microsoft.DotNet.Interactive.Formatting;
using Xunit.Abstractions;

namespace AlgebraNotebook.Runner.Tests.Browser;

/// <summary>
/// Opens an HTML report with MathML, charts and a Dynkin drawing in headless Chromium (nothing reachable on a network:
/// the report's Content-Security-Policy allows no fetch and the test machine has none), lets a measuring script write
/// what the page laid out into the DOM, and reads it back with --dump-dom. Screenshots and the measured DOM are saved
/// under the test output folder (browser-artifacts/).
/// </summary>
[Collection(GlobalStateCollection.Name)]
public class ReportInBrowserTests
{
    // Runs after the charts' own scripts; records CSP violations from the start (a listener placed first in <head>).
    private const string ViolationListener =
        "<script>window.anViolations=[];document.addEventListener('securitypolicyviolation',function(e){window.anViolations.push(e.violatedDirective+' '+e.blockedURI);});</script>";

    private const string MeasuringScript = """
        <script>
        (function () {
          var out = { charts: [], fractions: [], subscripts: [], dynkinNodes: 0 };
          function finish() {
            out.violations = window.anViolations;
            out.libraryElements = document.querySelectorAll('script[data-algebranotebook-library]').length;
            var pre = document.createElement('pre');
            pre.id = 'browser-measurements';
            pre.textContent = JSON.stringify(out);
            document.body.appendChild(pre);
          }
          function measureCharts(i, charts) {
            if (i >= charts.length) { finish(); return; }
            var el = charts[i];
            var entry = { drawn: el.classList.contains('js-plotly-plot'), points: el.querySelectorAll('.scatterlayer path.point').length,
                          canvases: el.querySelectorAll('canvas').length, hover: '' };
            out.charts.push(entry);
            if (entry.points > 0) {
              Plotly.Fx.hover(el, [{ curveNumber: 0, pointNumber: 0 }]);
              setTimeout(function () {
                var h = el.querySelector('.hoverlayer .hovertext');
                entry.hover = h ? h.textContent : '';
                Plotly.Fx.unhover(el);
                measureCharts(i + 1, charts);
              }, 300);
            } else {
              measureCharts(i + 1, charts);
            }
          }
          setTimeout(function () {
            document.querySelectorAll('mfrac').forEach(function (f) {
              var n = f.children[0].getBoundingClientRect(), d = f.children[1].getBoundingClientRect();
              out.fractions.push({ numeratorBottom: n.bottom, denominatorTop: d.top });
            });
            document.querySelectorAll('msub').forEach(function (s) {
              var b = s.children[0].getBoundingClientRect(), x = s.children[1].getBoundingClientRect();
              out.subscripts.push({ baseBottom: b.bottom, subscriptBottom: x.bottom, baseHeight: b.height });
            });
            out.dynkinNodes = document.querySelectorAll('svg.algebranotebook-dynkin g.node circle').length;
            measureCharts(0, Array.prototype.slice.call(document.querySelectorAll('.algebranotebook-chart')));
          }, 3000);
        })();
        </script>
        """;

    private readonly ITestOutputHelper _output;

    public ReportInBrowserTests(ITestOutputHelper output)
    {
        _output = output;
    }

    [BrowserFact]
    public void Report_lays_out_mathml_draws_every_chart_point_and_shows_hover_text_offline()
    {
        Assert.True(Chromium.Installed, $"Chromium is needed for this test and was not found at {Chromium.Path}. Install it with: {Chromium.Install}");
        var folder = Path.Combine(AppContext.BaseDirectory, "browser-artifacts");
        Directory.CreateDirectory(folder);

        // Outputs as the notebook formatters make them: the first chart of the session carries the library.
        AlgebraNotebookFormatters.Register();
        DiagramFormatters.ResetLibrary();
        var math = MathNodes.Row(MathNodes.Fraction(MathNodes.Integer(1), MathNodes.Integer(2)), MathNodes.Operator("+"), MathNodes.Symbol("J_x"));
        var mathHtml = MathDisplay.ToHtml(math);
        Assert.Contains("<msub>", mathHtml);
        object[] values =
        [
            RootDiagram.Of("G2", chamberWalls: true),
            WeightDiagram.Of(IrreducibleRepresentation.Of("A2", 1, 1)),
            WeightDiagram.OfTensorProduct(IrreducibleRepresentation.Of("A2", 1, 0), IrreducibleRepresentation.Of("A2", 0, 1)),
            RootDiagram.Of("E8"),
            RootDiagram.Of("B3"),
            DynkinDrawing.Extended("E8"),
        ];
        // Expected marker counts: G2 12 roots; A2 adjoint 7 distinct weights; 3 x 3bar = 8 + 1 gives 7 + 1 rings; E8 240 roots
        // (Humphreys, Introduction to Lie Algebras, 12.2 and 21-22; Georgi, Lie Algebras in Particle Physics, ch. 7).
        int[] expectedPoints = [12, 7, 8, 240];
        var results = new List<CellResult>
        {
            CellResult.Prose(new NotebookCell(1, CellKind.Markdown, "markdown", "# Diagrams in a browser")),
            Cell(2, "math", (CellOutput.Html, mathHtml)),
        };
        for (var i = 0; i < values.Length; i++)
        {
            results.Add(Cell(3 + i, $"diagram {i}", (CellOutput.Html, values[i].ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType))));
        }

        var report = HtmlReportWriter.Write("browser-check.ipynb", DateTimeOffset.UnixEpoch, results);
        var reportPath = Path.Combine(folder, "report.html");
        File.WriteAllText(reportPath, report);
        var measured = report.Replace("<meta charset=\"utf-8\">\n", "<meta charset=\"utf-8\">\n" + ViolationListener + "\n", StringComparison.Ordinal)
            .Replace("</body>", MeasuringScript + "</body>", StringComparison.Ordinal);
        var measuredPath = Path.Combine(folder, "report-measured.html");
        File.WriteAllText(measuredPath, measured);

        var dom = Chromium.DumpDom(measuredPath, 30_000);
        File.WriteAllText(Path.Combine(folder, "report-measured.dom.html"), dom);
        Chromium.Screenshot(reportPath, Path.Combine(folder, "report.png"), 1000, 4200, 15_000);

        const string open = "<pre id=\"browser-measurements\">";
        var at = dom.IndexOf(open, StringComparison.Ordinal);
        Assert.True(at >= 0, "The measuring script wrote nothing; the page's scripts did not finish.");
        var text = System.Net.WebUtility.HtmlDecode(dom[(at + open.Length)..dom.IndexOf("</pre>", at, StringComparison.Ordinal)]);
        _output.WriteLine(text);
        using var json = JsonDocument.Parse(text);
        var root = json.RootElement;

        Assert.Equal(0, root.GetProperty("violations").GetArrayLength());
        Assert.Equal(1, root.GetProperty("libraryElements").GetInt32());

        // MathML: the numerator sits above the denominator, the subscript is lowered below its base's baseline area
        // (MathML Core, mfrac and msub layout).
        var fraction = root.GetProperty("fractions")[0];
        Assert.True(fraction.GetProperty("numeratorBottom").GetDouble() <= fraction.GetProperty("denominatorTop").GetDouble() + 0.5, text);
        var subscript = root.GetProperty("subscripts")[0];
        Assert.True(subscript.GetProperty("subscriptBottom").GetDouble() > subscript.GetProperty("baseBottom").GetDouble(), text);

        var charts = root.GetProperty("charts");
        Assert.Equal(5, charts.GetArrayLength());
        for (var i = 0; i < expectedPoints.Length; i++)
        {
            var chart = charts[i];
            Assert.True(chart.GetProperty("drawn").GetBoolean(), $"chart {i} was not drawn: {text}");
            Assert.Equal(expectedPoints[i], chart.GetProperty("points").GetInt32());
            Assert.Contains("multiplicity", i is 1 or 2 ? chart.GetProperty("hover").GetString() : "multiplicity");
            Assert.False(string.IsNullOrEmpty(chart.GetProperty("hover").GetString()), $"chart {i} showed no hover text: {text}");
        }

        Assert.Contains("root", charts[0].GetProperty("hover").GetString());
        Assert.Contains("|β|²", charts[0].GetProperty("hover").GetString());
        // The rank-3 chart is drawn in space on a WebGL canvas.
        Assert.True(charts[4].GetProperty("drawn").GetBoolean(), text);
        Assert.True(charts[4].GetProperty("canvases").GetInt32() > 0, text);
        // Extended E8: 9 nodes, the extra one a double circle (10 circles).
        Assert.Equal(10, root.GetProperty("dynkinNodes").GetInt32());
        Assert.True(new FileInfo(Path.Combine(folder, "report.png")).Length > 10_000);
    }

    private static CellResult Cell(int number, string source, params (string Mime, string Content)[] outputs) =>
        new(new NotebookCell(number, CellKind.Code, "csharp", source),
            outputs.Select(o => new CellOutput(CellOutputKind.ReturnValue, o.Mime, o.Content)).ToArray(), null);
}
