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
        var (code, _, stderr) = await Run("run", path, "--cell-timeout", "1");
        Assert.Equal(1, code);
        Assert.Contains("cell 2: The cell did not finish within the time limit of 1 s.", stderr);
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
    public async Task Usage_errors_give_exit_code_2_and_say_what_is_wrong(string[] args, string expected)
    {
        var (code, _, stderr) = await Run(args);
        Assert.Equal(2, code);
        Assert.Contains(expected, stderr);
    }

    [Fact]
    public async Task Help_prints_usage_and_exit_codes()
    {
        var (code, stdout, _) = await Run("--help");
        Assert.Equal(0, code);
        Assert.Contains("algebra-notebook run <notebook.ipynb|notebook.dib> [--output <report.html>]", stdout);
        Assert.Contains("Exit codes: 0", stdout);
    }
}
