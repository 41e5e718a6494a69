using System.Text.Json.Nodes;
using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Tests;

/// <summary>End-to-end runs through <see cref="RunnerApp.RunAsync"/> with a real in-process kernel (about 2 s each).</summary>
[Collection(GlobalStateCollection.Name)]
public class RunnerAppTests
{
    private static async Task<(int Code, string Out, string Err)> Run(params string[] args)
    {
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = await RunnerApp.RunAsync(args, stdout, stderr);
        return (code, stdout.ToString(), stderr.ToString());
    }

    [Fact]
    public async Task Demo_notebook_runs_without_failures_and_the_report_shows_a_matrix_as_mathml()
    {
        using var temp = new TempNotebook();
        var report = Path.Combine(temp.Folder, "demo.html");
        var (code, stdout, stderr) = await Run("run", RepositoryPaths.DemoNotebook, "--output", report);
        Assert.True(code == 0, $"exit {code}; stderr: {stderr}");
        Assert.Equal(Path.GetFullPath(report), stdout.Trim());
        var html = File.ReadAllText(report);
        var math = html.IndexOf("<math", StringComparison.Ordinal);
        Assert.True(math >= 0, "no <math element in the report");
        Assert.True(html.IndexOf("<mtable", math, StringComparison.Ordinal) > math, "no <mtable inside a <math element");
        Assert.Contains("All code cells succeeded.", html);
        Assert.DoesNotContain("class=\"failure\"", html);
    }

    [Fact]
    public async Task Lie_theory_demo_notebook_runs_and_shows_its_exact_results()
    {
        using var temp = new TempNotebook();
        var report = Path.Combine(temp.Folder, "control.html");
        var (code, _, stderr) = await Run("run", RepositoryPaths.ControlAlgebraNotebook, "--output", report, "--quiet");
        Assert.True(code == 0, $"exit {code}; stderr: {stderr}");
        var html = File.ReadAllText(report);
        Assert.Contains("All code cells succeeded.", html);
        // 3 x 3 = 3bar + 6 for su(3) (Slansky, Physics Reports 79 (1981), Table of tensor products).
        Assert.Contains("data-latex=\"\\overline{3} + 6, \\text{dimension} = 9\"", html);
        // log(e^A e^B e^-A e^-B) = [A,B] + 1/2 [A,[A,B]] - 1/2 [[A,B],B] + ... (common practice, from BCH).
        Assert.Contains("s*t [P, Q] + 1/2*s^2*t [P, [P, Q]] - 1/2*s*t^2 [[P, Q], Q]", html);
    }

    [Fact]
    public async Task Compile_and_runtime_failures_are_numbered_and_later_cells_still_run()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("failing.ipynb",
            ("markdown", "# Failures", null),
            ("code", "var half = Rational.Parse(\"1/2\");\nint wrong = \"text\";", "csharp"),
            ("code", "Console.WriteLine(\"<script>alert(1)</script>\");\nthrow new InvalidOperationException(\"runtime <b>failure</b>\");", "csharp"),
            ("code", "Console.WriteLine(\"after: \" + (Rational.Parse(\"1/3\") + Rational.Parse(\"1/6\")));\n\"<script>returned</script>\"", null));
        var (code, stdout, stderr) = await Run("run", path);

        Assert.Equal(1, code);
        var report = Path.Combine(temp.Folder, "failing.html");
        Assert.Equal(report, stdout.Trim());
        // Compiler message for assigning a string to an int (CS0029, C# compiler diagnostics, common practice).
        Assert.Contains("cell 2: Compilation failed: (2,13): error CS0029: Cannot implicitly convert type 'string' to 'int'", stderr);
        Assert.Contains("cell 3: System.InvalidOperationException: runtime <b>failure</b>", stderr);
        Assert.DoesNotContain("cell 4:", stderr);

        var html = File.ReadAllText(report);
        Assert.Contains("2 cells failed: cell 2, cell 3.", html);
        Assert.Contains("<strong>Cell 2 failed</strong>", html);
        Assert.Contains("runtime &lt;b&gt;failure&lt;/b&gt;", html);
        Assert.Contains("&lt;script&gt;alert(1)&lt;/script&gt;", html);
        Assert.DoesNotContain("<script>", html);
        // 1/3 + 1/6 = 1/2: the cell after the failures ran.
        Assert.Contains("after: 1/2", html);
        Assert.Contains("&lt;script&gt;returned&lt;/script&gt;", html);
    }

    [Fact]
    public async Task Dib_notebooks_run_and_markdown_is_rendered()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteText("small.dib",
            "#!markdown\n\n## Gaussian *check*\n\n#!csharp\n\nvar z = GaussianRational.Parse(\"1/2 + 1/2 i\");\n\n#!csharp\n\nConsole.WriteLine(z * z);\nConsole.WriteLine(\"second line\");\n");
        var report = Path.Combine(temp.Folder, "out", "small-report.html");
        var (code, _, stderr) = await Run("run", path, "-o", report);
        Assert.True(code == 0, $"exit {code}; stderr: {stderr}");
        var html = File.ReadAllText(report);
        Assert.Contains("<h2>Gaussian <em>check</em></h2>", html);
        // (1/2 + i/2)^2 = i/2 (from memory: (1+i)^2 = 2i).
        // Consecutive console writes are joined into one output block.
        Assert.Contains("<pre>1/2 i\nsecond line</pre>", html);
    }

    [Fact]
    public async Task A_cell_over_the_time_limit_fails_and_later_code_cells_are_reported_as_not_run()
    {
        using var temp = new TempNotebook();
        // The sleeping cell costs no processor time; its thread is abandoned when the limit passes.
        var path = temp.WriteIpynb("slow.ipynb",
            ("code", "Console.WriteLine(\"before\");", null),
            ("code", "System.Threading.Thread.Sleep(System.Threading.Timeout.Infinite);", null),
            ("code", "Console.WriteLine(\"after\");", null),
            ("markdown", "closing *prose*", null));
        // 5 s, not 1 s: the first cell compiles cold (about 2 s measured) and a busy machine multiplies that.
        var (code, _, stderr) = await Run("run", path, "--cell-timeout", "5");
        Assert.Equal(1, code);
        Assert.Contains("cell 2: The cell did not finish within the time limit of 5 s.", stderr);
        Assert.Contains("cell 3: Not run: cell 2 did not finish within its time limit", stderr);
        var html = File.ReadAllText(Path.Combine(temp.Folder, "slow.html"));
        Assert.Contains("<pre>before</pre>", html);
        Assert.DoesNotContain("<pre>after</pre>", html);
        Assert.Contains("closing <em>prose</em>", html);
    }

    [Fact]
    public async Task Missing_notebook_gives_exit_code_2_and_names_the_file()
    {
        var path = Path.Combine(Path.GetTempPath(), "absent-" + Guid.NewGuid().ToString("N") + ".ipynb");
        var (code, _, stderr) = await Run("run", path);
        Assert.Equal(2, code);
        Assert.Contains($"Notebook '{path}' was not found.", stderr);
    }

    [Fact]
    public async Task Malformed_json_gives_exit_code_2_with_line_and_position()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteText("broken.ipynb", "{\"cells\": [\n  {\"cell_type\": \"code\" \"source\": \"1\"}\n]}");
        var (code, _, stderr) = await Run("run", path);
        Assert.Equal(2, code);
        Assert.Contains("broken.ipynb", stderr);
        Assert.Contains("not valid JSON (line 2, position", stderr);
        Assert.False(File.Exists(Path.Combine(temp.Folder, "broken.html")));
    }

    [Theory]
    [InlineData(new string[0], "missing command")]
    [InlineData(new[] { "execute", "x.ipynb" }, "unknown command 'execute'")]
    [InlineData(new[] { "run" }, "missing notebook path")]
    [InlineData(new[] { "run", "a.ipynb", "--output" }, "option '--output' needs a file path")]
    [InlineData(new[] { "run", "a.ipynb", "--fast" }, "unknown option '--fast'")]
    [InlineData(new[] { "run", "a.ipynb", "b.ipynb" }, "unexpected extra argument 'b.ipynb'")]
    [InlineData(new[] { "run", "a.ipynb", "--cell-timeout", "0" }, "option '--cell-timeout' needs a positive number of seconds, got '0'")]
    [InlineData(new[] { "run", "a.ipynb", "--cell-timeout" }, "option '--cell-timeout' needs a positive number of seconds, got nothing")]
    [InlineData(new[] { "check" }, "missing notebook path (.ipynb)")]
    [InlineData(new[] { "check", "a.ipynb", "--fast" }, "unknown option '--fast'")]
    [InlineData(new[] { "export", "a.ipynb" }, "missing '--format html' or '--format latex'")]
    [InlineData(new[] { "export", "a.ipynb", "--format", "pdf" }, "unknown format 'pdf'; expected 'html' or 'latex'")]
    [InlineData(new[] { "export", "a.ipynb", "--format" }, "option '--format' needs 'html' or 'latex'")]
    public async Task Usage_errors_give_exit_code_2_and_say_what_is_wrong(string[] args, string expected)
    {
        var (code, _, stderr) = await Run(args);
        Assert.Equal(2, code);
        Assert.Contains(expected, stderr);
    }

    [Fact]
    public async Task Run_writes_the_notebook_back_and_check_confirms_it_reproduces_until_an_output_is_edited()
    {
        using var temp = new TempNotebook();
        var input = temp.WriteIpynb("derivation.ipynb",
            ("markdown", "# Rotation generator", null),
            ("code", "var a = Matrix.ParseRational(\"[[2, 1], [1, 2]]\");\nConsole.WriteLine(\"trace \" + a.Trace());\na", "csharp"),
            ("code", "Eigenvalues.OverRationals(a)", "csharp"),
            ("code", "Console.WriteLine(Guid.NewGuid());", "csharp"),
            ("code", "throw new InvalidOperationException(\"deliberate\");", "csharp"));
        // Cell 4 prints a fresh value each run: declared volatile, so check must not compare it.
        var root = JsonNode.Parse(File.ReadAllText(input))!;
        root["cells"]![3]!["metadata"]!["algebranotebook"] = new JsonObject { ["volatile"] = true };
        temp.WriteJson("derivation.ipynb", root);
        var inputText = File.ReadAllText(input);
        var written = Path.Combine(temp.Folder, "derivation.run.ipynb");

        var (code, stdout, stderr) = await Run("run", input, "--write-notebook", written);
        Assert.Equal(1, code);
        Assert.Contains("cell 5: System.InvalidOperationException: deliberate", stderr);
        Assert.Contains("[1/4] cell 2 ... ok ", stderr);
        Assert.Contains("[4/4] cell 5 ... failed ", stderr);
        Assert.Equal(new[] { Path.Combine(temp.Folder, "derivation.html"), written }, stdout.Trim().Split(Environment.NewLine));
        // The input is never overwritten without --in-place.
        Assert.Equal(inputText, File.ReadAllText(input));

        var json = File.ReadAllText(written);
        // Required keys and id pattern: nbformat 4.5 JSON schema (jupyter/nbformat).
        Assert.Empty(NbformatStructure.Problems(json));
        var cells = NotebookFile.Load(written);
        Assert.Equal(NotebookFile.Load(input).Select(c => (c.Kind, c.Source)), cells.Select(c => (c.Kind, c.Source)));
        var stored = StoredNotebook.Load(written);
        Assert.Equal(new[] { "cell-1", "cell-2", "cell-3", "cell-4", "cell-5" }, stored.Cells.Select(c => c.Id));
        Assert.Equal(new int?[] { null, 1, 2, 3, 4 }, stored.Cells.Select(c => c.ExecutionCount));
        // The eigen-decomposition is stored as MathML (a table inside <math>) plus its plain text.
        var eigen = stored.Cells[2].Outputs.Single();
        Assert.Equal("execute_result", eigen.OutputType);
        Assert.Contains("<math", eigen.Data["text/html"]);
        Assert.Contains("<mtext>eigenspace basis</mtext>", eigen.Data["text/html"]);
        Assert.StartsWith("[[eigenvalue, algebraic multiplicity, eigenspace basis], [1, 1, ", eigen.Data["text/plain"]);
        Assert.Equal("trace 4\n", stored.Cells[1].Outputs[0].Text);
        Assert.Equal(("System.InvalidOperationException", "deliberate"), (stored.Cells[4].Outputs.Single().ErrorName, stored.Cells[4].Outputs.Single().ErrorValue));

        (code, stdout, stderr) = await Run("check", written, "--quiet");
        Assert.True(code == 0, $"exit {code}; stdout: {stdout}; stderr: {stderr}");
        Assert.Equal("check: 3 code cells compared, 1 volatile cell skipped: every output reproduces.", stdout.Trim());
        Assert.Equal(string.Empty, stderr);

        // Someone edits a stored result by hand: check must notice and show where.
        var edited = JsonNode.Parse(json)!;
        edited["cells"]![1]!["outputs"]![1]!["data"]!["text/plain"] = new JsonArray("[[2, 1], [1, 3]]");
        temp.WriteJson("derivation.run.ipynb", edited);
        (code, stdout, _) = await Run("check", written, "-q");
        Assert.Equal(1, code);
        Assert.Contains("cell 2 differs:\n--- stored outputs of cell 2\n+++ outputs of this run\n", stdout.Replace("\r\n", "\n"));
        Assert.Contains("\n-[[2, 1], [1, 3]]\n+[[2, 1], [1, 2]]\n", stdout.Replace("\r\n", "\n"));
        Assert.EndsWith("1 differs (cell 2).", stdout.Trim());
    }

    [Fact]
    public async Task In_place_saves_the_outputs_into_the_input_notebook_keeping_its_ids()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("inplace.ipynb", ("code", "Rational.Parse(\"1/3\") + Rational.Parse(\"1/6\")", "csharp"));
        var (code, stdout, stderr) = await Run("run", path, "--in-place", "--quiet");
        Assert.True(code == 0, $"exit {code}; stderr: {stderr}");
        Assert.Equal(string.Empty, stderr);
        Assert.EndsWith(path, stdout.Trim());
        var stored = StoredNotebook.Load(path);
        Assert.Equal("cell-1", stored.Cells[0].Id);
        // 1/3 + 1/6 = 1/2 (common practice).
        Assert.Equal("1/2", stored.Cells[0].Outputs.Single().Data["text/plain"]);
        Assert.Empty(Directory.GetFiles(temp.Folder, "*.tmp-*"));
    }

    [Fact]
    public async Task Check_of_a_notebook_without_stored_outputs_exits_2_and_says_to_run_it_first()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("fresh.ipynb", ("markdown", "# Fresh", null), ("code", "1 + 1", null));
        var (code, _, stderr) = await Run("check", path);
        Assert.Equal(2, code);
        Assert.Contains($"Notebook '{path}' has no stored outputs; nothing to compare: run it with --write-notebook first.", stderr);
    }

    [Fact]
    public async Task Check_of_a_missing_notebook_or_a_dib_file_exits_2_with_the_file_named()
    {
        var missing = Path.Combine(Path.GetTempPath(), "absent-" + Guid.NewGuid().ToString("N") + ".ipynb");
        var (code, _, stderr) = await Run("check", missing);
        Assert.Equal(2, code);
        Assert.Contains($"Notebook '{missing}' was not found.", stderr);

        using var temp = new TempNotebook();
        var dib = temp.WriteText("a.dib", "#!csharp\n\n1 + 1\n");
        (code, _, stderr) = await Run("check", dib);
        Assert.Equal(2, code);
        Assert.Contains("is a .dib file, which stores no outputs; nothing to compare: run it with --write-notebook", stderr);
    }

    [Fact]
    public async Task In_place_needs_an_ipynb_input_and_excludes_write_notebook()
    {
        using var temp = new TempNotebook();
        var dib = temp.WriteText("a.dib", "#!csharp\n\n1 + 1\n");
        var (code, _, stderr) = await Run("run", dib, "--in-place");
        Assert.Equal(2, code);
        Assert.Contains("'--in-place' needs an .ipynb notebook", stderr);
        (code, _, stderr) = await Run("run", "a.ipynb", "--in-place", "--write-notebook", "b.ipynb");
        Assert.Equal(2, code);
        Assert.Contains("give either '--write-notebook <path>' or '--in-place', not both", stderr);
        (code, _, stderr) = await Run("run", "a.ipynb", "--write-notebook", "b.json");
        Assert.Equal(2, code);
        Assert.Contains("'b.json', must end in .ipynb", stderr);
    }

    [Fact]
    public async Task Help_prints_usage_and_exit_codes()
    {
        var (code, stdout, _) = await Run("--help");
        Assert.Equal(0, code);
        Assert.Contains("algebra-notebook run <notebook.ipynb|notebook.dib> [--output <report.html>]", stdout);
        Assert.Contains("Exit codes: 0", stdout);
        Assert.Contains("algebra-notebook check <notebook.ipynb>", stdout);
        Assert.Contains("algebra-notebook export <notebook.ipynb> --format html|latex [--output <file>]", stdout);
        Assert.Contains("--write-notebook <path>", stdout);
    }
}
