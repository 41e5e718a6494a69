using System.Text.Json.Nodes;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;
using AlgebraNotebook.Runner.Reporting;

namespace AlgebraNotebook.Runner.Tests.Reporting;

public class NotebookWriterTests
{
    private const string MathHtml = "<div class=\"algebranotebook-math\" data-latex=\"\\frac{1}{2}\"><math display=\"block\"><mfrac><mn>1</mn><mn>2</mn></mfrac></math></div>";

    private static IReadOnlyList<CellResult> SampleRun(IReadOnlyList<NotebookCell> cells) =>
    [
        CellResult.Prose(cells[0]),
        new CellResult(cells[1], [
            new CellOutput(CellOutputKind.StandardOutput, CellOutput.PlainText, "first\nsecond\n"),
            new CellOutput(CellOutputKind.ReturnValue, CellOutput.Html, MathHtml) { PlainContent = "1/2" },
        ], null),
        new CellResult(cells[2], [
            new CellOutput(CellOutputKind.DisplayedValue, CellOutput.PlainText, "shown"),
            new CellOutput(CellOutputKind.Diagnostic, CellOutput.PlainText, "(1,1): warning CS0168: unused"),
        ], "System.InvalidOperationException: no <way>\nsecond line"),
        CellResult.Prose(cells[3]),
        new CellResult(cells[4], [], null),
    ];

    private static (TempNotebook Temp, string Path, IReadOnlyList<NotebookCell> Cells) Sample()
    {
        var temp = new TempNotebook();
        var path = temp.WriteIpynb("sample.ipynb",
            ("markdown", "# Sample", null),
            ("code", "Console.WriteLine(\"first\\nsecond\");\nRational.Parse(\"1/2\")", "csharp"),
            ("code", "display(\"shown\");\nthrow new InvalidOperationException(\"no <way>\");", null),
            ("raw", "raw text", null),
            ("code", "   ", null));
        return (temp, path, NotebookFile.Load(path));
    }

    [Fact]
    public void Written_notebook_has_the_nbformat_4_5_structure()
    {
        var (temp, path, cells) = Sample();
        using var _ = temp;
        var json = NotebookWriter.Write(SampleRun(cells), File.ReadAllText(path));
        // Required keys, forbidden extra keys, id pattern: nbformat 4.5 JSON schema (jupyter/nbformat).
        Assert.Empty(NbformatStructure.Problems(json));
    }

    [Fact]
    public void Outputs_are_written_as_execute_result_display_data_stream_and_error()
    {
        var (temp, path, cells) = Sample();
        using var _ = temp;
        var root = JsonNode.Parse(NotebookWriter.Write(SampleRun(cells), File.ReadAllText(path)))!;
        var first = root["cells"]![1]!;
        Assert.Equal(1, first["execution_count"]!.GetValue<int>());
        var outputs = first["outputs"]!.AsArray();
        Assert.Equal("stream", outputs[0]!["output_type"]!.GetValue<string>());
        Assert.Equal("stdout", outputs[0]!["name"]!.GetValue<string>());
        Assert.Equal(new[] { "first\n", "second\n" }, outputs[0]!["text"]!.AsArray().Select(l => l!.GetValue<string>()));
        Assert.Equal("execute_result", outputs[1]!["output_type"]!.GetValue<string>());
        Assert.Equal(1, outputs[1]!["execution_count"]!.GetValue<int>());
        Assert.Equal(MathHtml, outputs[1]!["data"]!["text/html"]!.AsArray().Single()!.GetValue<string>());
        Assert.Equal("1/2", outputs[1]!["data"]!["text/plain"]!.AsArray().Single()!.GetValue<string>());

        var second = root["cells"]![2]!;
        Assert.Equal(2, second["execution_count"]!.GetValue<int>());
        var secondOutputs = second["outputs"]!.AsArray();
        Assert.Equal(new[] { "display_data", "stream", "error" }, secondOutputs.Select(o => o!["output_type"]!.GetValue<string>()));
        Assert.Equal("stderr", secondOutputs[1]!["name"]!.GetValue<string>());
        Assert.Equal("System.InvalidOperationException", secondOutputs[2]!["ename"]!.GetValue<string>());
        Assert.Equal("no <way>\nsecond line", secondOutputs[2]!["evalue"]!.GetValue<string>());

        // A blank code cell is not executed: no execution count.
        Assert.Null(root["cells"]![4]!["execution_count"]);
    }

    [Fact]
    public void Ids_metadata_and_sources_of_the_input_are_kept()
    {
        var (temp, path, cells) = Sample();
        using var _ = temp;
        var original = JsonNode.Parse(File.ReadAllText(path))!;
        original["cells"]![2]!["metadata"] = new JsonObject { ["algebranotebook"] = new JsonObject { ["volatile"] = true } };
        original["metadata"]!["custom"] = "kept";
        var root = JsonNode.Parse(NotebookWriter.Write(SampleRun(cells), original.ToJsonString()))!;
        Assert.Equal(new[] { "cell-1", "cell-2", "cell-3", "cell-4", "cell-5" },
            root["cells"]!.AsArray().Select(c => c!["id"]!.GetValue<string>()));
        Assert.Equal("kept", root["metadata"]!["custom"]!.GetValue<string>());
        Assert.True(root["cells"]![2]!["metadata"]!["algebranotebook"]!["volatile"]!.GetValue<bool>());
        Assert.Equal(original["cells"]![1]!["source"]!.ToJsonString(), root["cells"]![1]!["source"]!.ToJsonString());
    }

    [Fact]
    public void Round_trip_through_our_loaders_gives_the_same_cells_and_the_outputs()
    {
        var (temp, path, cells) = Sample();
        using var _ = temp;
        var json = NotebookWriter.Write(SampleRun(cells), File.ReadAllText(path));
        var reloaded = NotebookFile.ParseIpynb("written.ipynb", json);
        Assert.Equal(cells.Select(c => (c.Kind, c.Language, c.Source)), reloaded.Select(c => (c.Kind, c.Language, c.Source)));
        var stored = StoredNotebook.Parse("written.ipynb", json);
        Assert.True(stored.HasStoredRuns);
        Assert.Equal(NotebookWriter.ToStoredOutputs(SampleRun(cells)[1]).Select(o => o.OutputType),
            stored.Cells[1].Outputs.Select(o => o.OutputType));
        Assert.Equal("1/2", stored.Cells[1].Outputs[1].Data["text/plain"]);
    }

    [Fact]
    public void Notebook_from_dib_cells_gets_fresh_unique_ids_and_kernel_metadata()
    {
        var cells = NotebookFile.ParseDib("x.dib", "#!markdown\n\n# Title\n\n#!csharp\n\n1 + 1\n");
        var results = new[] { CellResult.Prose(cells[0]), new CellResult(cells[1], [new CellOutput(CellOutputKind.ReturnValue, CellOutput.PlainText, "2")], null) };
        var json = NotebookWriter.Write(results, null);
        Assert.Empty(NbformatStructure.Problems(json));
        var root = JsonNode.Parse(json)!;
        Assert.Equal(new[] { "cell-1", "cell-2" }, root["cells"]!.AsArray().Select(c => c!["id"]!.GetValue<string>()));
        Assert.Equal("csharp", root["cells"]![1]!["metadata"]!["polyglot_notebook"]!["kernelName"]!.GetValue<string>());
        Assert.Equal(".net-csharp", root["metadata"]!["kernelspec"]!["name"]!.GetValue<string>());
    }

    [Fact]
    public void Invalid_and_duplicate_ids_are_replaced()
    {
        var (temp, path, cells) = Sample();
        using var _ = temp;
        var original = JsonNode.Parse(File.ReadAllText(path))!;
        original["cells"]![0]!["id"] = "has space";
        original["cells"]![2]!["id"] = "cell-2";
        var json = NotebookWriter.Write(SampleRun(cells), original.ToJsonString());
        Assert.Empty(NbformatStructure.Problems(json));
        var ids = JsonNode.Parse(json)!["cells"]!.AsArray().Select(c => c!["id"]!.GetValue<string>()).ToArray();
        Assert.Equal("cell-1", ids[0]);
        Assert.Equal("cell-3", ids[2]);
    }

    [Theory]
    [InlineData("Compilation failed: (1,5): error CS0103: The name 'y' does not exist", "CompilationError", "(1,5): error CS0103: The name 'y' does not exist")]
    [InlineData("System.DivideByZeroException: Attempted to divide by zero.", "System.DivideByZeroException", "Attempted to divide by zero.")]
    [InlineData("The cell did not finish within the time limit of 1 s.", "CellFailed", "The cell did not finish within the time limit of 1 s.")]
    public void Failures_map_to_error_name_and_value_and_back(string failure, string name, string value)
    {
        var error = NotebookWriter.ToErrorOutput(failure);
        Assert.Equal(name, error.ErrorName);
        Assert.Equal(value, error.ErrorValue);
        Assert.Equal(failure, NotebookWriter.ToFailureText(error.ErrorName, error.ErrorValue));
    }
}
