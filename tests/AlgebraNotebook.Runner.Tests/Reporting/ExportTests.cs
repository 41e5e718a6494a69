using System.Text.Json.Nodes;
using AlgebraNotebook.Display;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

/// <summary>Exports from stored outputs (no kernel): LaTeX and HTML, through the writers and through the command line.</summary>
public class ExportTests
{
    private static readonly Matrix<AlgebraNotebook.Exact.Scalars.Rational> Half = Matrix.ParseRational("[[1, 1/2], [0, -3/4]]");

    /// <summary>A notebook as `run --write-notebook` writes it: prose, a matrix result, console text, an error.</summary>
    internal static string WriteStoredNotebook(TempNotebook temp, string name = "stored.ipynb")
    {
        var path = temp.WriteIpynb(name,
            ("markdown", "# Results & notes\n\nCost: 100% of *x_1*.", null),
            ("code", "var m = Matrix.ParseRational(\"[[1, 1/2], [0, -3/4]]\");\nConsole.WriteLine(\"done\");\nm", "csharp"),
            ("code", "throw new InvalidOperationException(\"stop\");", "csharp"));
        var root = JsonNode.Parse(File.ReadAllText(path))!;
        root["cells"]![1]!["execution_count"] = 1;
        root["cells"]![1]!["outputs"] = new JsonArray(
            new JsonObject { ["output_type"] = "stream", ["name"] = "stdout", ["text"] = new JsonArray("done\n") },
            new JsonObject
            {
                ["output_type"] = "execute_result",
                ["execution_count"] = 1,
                ["data"] = new JsonObject { ["text/html"] = MathDisplay.ToHtml(Half), ["text/plain"] = MathDisplay.ToPlainText(Half) },
                ["metadata"] = new JsonObject(),
            });
        root["cells"]![2]!["execution_count"] = 2;
        root["cells"]![2]!["outputs"] = new JsonArray(new JsonObject
        {
            ["output_type"] = "error", ["ename"] = "System.InvalidOperationException", ["evalue"] = "stop", ["traceback"] = new JsonArray(),
        });
        return temp.WriteJson(name, root);
    }

    private static async Task<(int Code, string Out, string Err)> Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = await RunnerApp.RunAsync(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    [Fact]
    public void Latex_export_typesets_stored_math_from_its_data_latex_attribute()
    {
        using var temp = new TempNotebook();
        var path = WriteStoredNotebook(temp);
        var tex = LatexWriter.Write("stored.ipynb", NotebookFile.Load(path), StoredNotebook.Load(path));
        Assert.StartsWith("% Written by algebra-notebook", tex);
        Assert.Contains("\\documentclass{article}", tex);
        // The matrix LaTeX of MathDisplay (amsmath pmatrix), between display-math brackets.
        Assert.Contains("\\[\n" + MathDisplay.ToLatex(Half) + "\n\\]\n", tex);
        Assert.Contains(@"\begin{pmatrix} 1 & \frac{1}{2} \\ 0 & -\frac{3}{4} \end{pmatrix}", tex);
        Assert.Contains("\\section*{Results \\& notes}", tex);
        Assert.Contains("Cost: 100\\% of *x\\_1*.", tex);
        Assert.Contains("\\begin{verbatim}\ndone\n\\end{verbatim}", tex);
        Assert.Contains("\\begin{verbatim}\nSystem.InvalidOperationException: stop\n\\end{verbatim}", tex);
        Assert.EndsWith("\\end{document}\n", tex);
    }

    [Fact]
    public void Latex_from_html_is_html_unescaped()
    {
        Assert.Equal("a < b & \"c\"", LatexWriter.LatexFromHtml("<div data-latex=\"a &lt; b &amp; &quot;c&quot;\"></div>"));
        Assert.Null(LatexWriter.LatexFromHtml("<div>no latex</div>"));
    }

    [Fact]
    public void Verbatim_blocks_cannot_be_closed_from_inside()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("v.ipynb", ("code", "// \\end{verbatim} \\input{x}", null));
        var root = JsonNode.Parse(File.ReadAllText(path))!;
        root["cells"]![0]!["execution_count"] = 1;
        path = temp.WriteJson("v.ipynb", root);
        var tex = LatexWriter.Write("v", NotebookFile.Load(path), StoredNotebook.Load(path));
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(tex, @"\\begin\{verbatim\}"));
        Assert.Single(System.Text.RegularExpressions.Regex.Matches(tex, @"\\end\{verbatim\}"));
    }

    [Fact]
    public void Only_math_fragments_of_the_display_layer_are_embedded_as_html()
    {
        Assert.True(StoredResults.IsMathFragment(MathDisplay.ToHtml(Half)));
        Assert.False(StoredResults.IsMathFragment("<table><tr><td>1</td></tr></table>"));
        Assert.False(StoredResults.IsMathFragment("<div class=\"algebranotebook-math\"><script>alert(1)</script><math></math></div>"));
    }

    [Fact]
    public async Task Html_export_from_stored_outputs_works_offline_and_shows_the_stored_results()
    {
        using var temp = new TempNotebook();
        var path = WriteStoredNotebook(temp);
        var output = Path.Combine(temp.Folder, "out", "stored-report.html");
        var (code, stdout, stderr) = await Run("export", path, "--format", "html", "--output", output);
        Assert.True(code == 0, $"exit {code}; stderr: {stderr}");
        Assert.Equal(output, stdout.Trim());
        var html = File.ReadAllText(output);
        Assert.Contains(MathDisplay.ToHtml(Half), html);
        Assert.Contains("<pre>done</pre>", html);
        Assert.Contains("System.InvalidOperationException: stop", html);
        Assert.Contains("not re-executed", html);
        // Offline: no scripts or links, and the only URL is the MathML namespace name (never fetched).
        Assert.DoesNotContain("<script", html);
        Assert.DoesNotContain("<link", html);
        var withoutNamespace = html.Replace("xmlns=\"" + MathDisplay.MathMLNamespace + "\"", string.Empty);
        Assert.DoesNotContain("http://", withoutNamespace);
        Assert.DoesNotContain("https://", withoutNamespace);
    }

    [Fact]
    public async Task Foreign_html_in_a_stored_notebook_is_shown_as_text()
    {
        using var temp = new TempNotebook();
        var path = WriteStoredNotebook(temp);
        var root = JsonNode.Parse(File.ReadAllText(path))!;
        root["cells"]![1]!["outputs"]![1]!["data"] = new JsonObject
        {
            ["text/html"] = "<img src=\"https://example.org/x.png\" onerror=\"alert(1)\">",
            ["text/plain"] = "plain form",
        };
        temp.WriteJson("stored.ipynb", root);
        var (code, _, _) = await Run("export", path, "--format", "html");
        Assert.Equal(0, code);
        var html = File.ReadAllText(Path.ChangeExtension(path, ".html"));
        Assert.DoesNotContain("<img", html);
        Assert.Contains("<pre>plain form</pre>", html);
    }

    [Fact]
    public async Task A_stored_chart_is_exported_from_its_figure_data_with_one_library_copy()
    {
        using var temp = new TempNotebook();
        var path = WriteStoredNotebook(temp);
        var root = JsonNode.Parse(File.ReadAllText(path))!;
        var chart = AlgebraNotebook.Display.Diagrams.RootDiagram.Of("B2");
        root["cells"]![1]!["outputs"]![1]!["data"] = new JsonObject
        {
            ["text/html"] = "<script>alert(1)</script>" + chart.ToHtml(includeLibrary: true),
            ["text/plain"] = chart.ToString(),
        };
        temp.WriteJson("stored.ipynb", root);
        var (code, _, _) = await Run("export", path, "--format", "html");
        Assert.Equal(0, code);
        var html = File.ReadAllText(Path.ChangeExtension(path, ".html"));
        Assert.DoesNotContain("alert(1)", html);
        Assert.Contains(chart.ToHtml(includeLibrary: false), html);
        var library = AlgebraNotebook.Display.Diagrams.ChartLibrary.MarkerAttribute;
        Assert.Equal(html.IndexOf(library, StringComparison.Ordinal), html.LastIndexOf(library, StringComparison.Ordinal));
    }

    [Fact]
    public async Task Latex_export_command_writes_a_tex_file_beside_the_notebook()
    {
        using var temp = new TempNotebook();
        var path = WriteStoredNotebook(temp);
        var (code, stdout, _) = await Run("export", path, "--format", "latex");
        Assert.Equal(0, code);
        Assert.Equal(Path.ChangeExtension(path, ".tex"), stdout.Trim());
        Assert.Contains("\\begin{pmatrix}", File.ReadAllText(Path.ChangeExtension(path, ".tex")));
    }

    [Fact]
    public async Task Export_of_a_notebook_without_outputs_exits_2_and_says_to_run_it_first()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("fresh.ipynb", ("code", "1 + 1", null));
        var (code, _, stderr) = await Run("export", path, "--format", "latex");
        Assert.Equal(2, code);
        Assert.Contains("fresh.ipynb' has no stored outputs; nothing to export: run it with --write-notebook first.", stderr);
        Assert.False(File.Exists(Path.ChangeExtension(path, ".tex")));
    }
}
