using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Tests.Documents;

public class NotebookFileTests
{
    [Fact]
    public void Ipynb_cells_keep_order_kind_and_language_and_cells_without_metadata_are_csharp()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteIpynb("a.ipynb",
            ("markdown", "# Title", null),
            ("code", "var a = 1;", "csharp"),
            ("code", "a + 1", null),
            ("raw", "plain raw text", null),
            ("code", "1 + 1", "fsharp"));
        var cells = NotebookFile.Load(path);
        Assert.Equal(new[] { 1, 2, 3, 4, 5 }, cells.Select(c => c.Number));
        Assert.Equal(new[] { CellKind.Markdown, CellKind.Code, CellKind.Code, CellKind.Raw, CellKind.Unsupported }, cells.Select(c => c.Kind));
        Assert.Equal("csharp", cells[2].Language);
        Assert.Equal("fsharp", cells[4].Language);
        Assert.Equal("var a = 1;", cells[1].Source);
    }

    [Fact]
    public void Dib_cells_are_split_on_kernel_lines()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteText("b.dib", "#!markdown\n\n# Heading\n\n#!csharp\n\nvar q = 2;\n\n#!csharp\n\nq * q\n");
        var cells = NotebookFile.Load(path);
        Assert.Equal(new[] { CellKind.Markdown, CellKind.Code, CellKind.Code }, cells.Select(c => c.Kind));
        Assert.Equal("# Heading", cells[0].Source.Trim());
        Assert.Equal("q * q", cells[2].Source.Trim());
    }

    [Fact]
    public void Missing_file_is_reported_with_its_name()
    {
        var path = Path.Combine(Path.GetTempPath(), "no-such-notebook-" + Guid.NewGuid().ToString("N") + ".ipynb");
        var e = Assert.Throws<NotebookLoadException>(() => NotebookFile.Load(path));
        Assert.Contains(path, e.Message);
        Assert.Contains("not found", e.Message);
    }

    [Fact]
    public void Malformed_json_is_reported_with_line_and_position()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteText("bad.ipynb", "{\n  \"cells\": [\n    {\"cell_type\": \"code\",, }\n  ]\n}\n");
        var e = Assert.Throws<NotebookLoadException>(() => NotebookFile.Load(path));
        Assert.Contains("bad.ipynb", e.Message);
        Assert.Contains("not valid JSON (line 3, position", e.Message);
    }

    [Fact]
    public void Json_without_a_cells_array_is_rejected()
    {
        using var temp = new TempNotebook();
        var path = temp.WriteText("empty.ipynb", "{\"metadata\": {}}");
        var e = Assert.Throws<NotebookLoadException>(() => NotebookFile.Load(path));
        Assert.Contains("\"cells\" array", e.Message);
    }

    [Fact]
    public void Other_extensions_are_rejected_by_name()
    {
        var e = Assert.Throws<NotebookLoadException>(() => NotebookFile.Load("notes.txt"));
        Assert.Contains("'.txt'", e.Message);
    }
}
