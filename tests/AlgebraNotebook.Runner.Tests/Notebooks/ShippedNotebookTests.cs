using System.Text.Json.Nodes;
using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Tests.Notebooks;

/// <summary>
/// Every notebook shipped in notebooks/ reproduces: `algebra-notebook check` re-executes it and compares each code
/// cell's outputs with the outputs stored in the file (volatile cells, declared in the cell metadata, are skipped).
/// One test case per notebook, so a failing notebook is named in the test list.
/// </summary>
[Collection(GlobalStateCollection.Name)]
public class ShippedNotebookTests
{
    /// <summary>The file names of notebooks/*.ipynb, sorted.</summary>
    public static TheoryData<string> ShippedNotebooks()
    {
        var data = new TheoryData<string>();
        foreach (var path in Directory.GetFiles(Path.Combine(RepositoryPaths.Root, "notebooks"), "*.ipynb").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(path));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(ShippedNotebooks))]
    public async Task Shipped_notebook_reproduces_its_stored_outputs(string fileName)
    {
        var path = Path.Combine(RepositoryPaths.Root, "notebooks", fileName);
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = await RunnerApp.RunAsync(new[] { "check", path, "--quiet" }, stdout, stderr);
        Assert.True(code == RunnerApp.ExitSuccess,
            $"check {fileName} exited with {code}.{Environment.NewLine}{stdout}{Environment.NewLine}{stderr}");
        Assert.Contains("every output reproduces", stdout.ToString());
    }

    [Theory]
    [MemberData(nameof(ShippedNotebooks))]
    public void Shipped_notebook_stores_outputs_and_cell_ids_for_every_code_cell(string fileName)
    {
        // nbformat 4.5 (the Jupyter nbformat specification) requires a unique "id" on every cell; the runner's
        // --in-place write stores an execution count and the outputs of each code cell.
        var path = Path.Combine(RepositoryPaths.Root, "notebooks", fileName);
        var root = JsonNode.Parse(File.ReadAllText(path))!.AsObject();
        Assert.Equal(4, (int)root["nbformat"]!);
        Assert.True((int)root["nbformat_minor"]! >= 5, $"{fileName}: nbformat_minor {(int)root["nbformat_minor"]!} is below 5, so cell ids are not allowed.");
        var cells = root["cells"]!.AsArray();
        var ids = cells.Select(c => (string?)c!["id"]).ToList();
        Assert.DoesNotContain(null, ids);
        Assert.Equal(ids.Count, ids.Distinct().Count());
        var stored = StoredNotebook.Load(path);
        var codeCells = stored.Cells.Where(c => c.CellType == "code").ToList();
        Assert.NotEmpty(codeCells);
        Assert.All(codeCells, c => Assert.True(c.HasStoredRun, $"{fileName}: code cell {c.Number} has no stored run."));
        Assert.All(codeCells, c => Assert.DoesNotContain(c.Outputs, o => o.OutputType == StoredOutput.Error));
        Assert.Contains(codeCells.SelectMany(c => c.Outputs), o => o.Data.TryGetValue("text/html", out var html) && html.Contains("<math", StringComparison.Ordinal));
    }

    /// <summary>The file names of notebooks/*.dib, sorted.</summary>
    public static TheoryData<string> ShippedDibNotebooks()
    {
        var data = new TheoryData<string>();
        foreach (var path in Directory.GetFiles(Path.Combine(RepositoryPaths.Root, "notebooks"), "*.dib").Order(StringComparer.Ordinal))
        {
            data.Add(Path.GetFileName(path));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(ShippedDibNotebooks))]
    public async Task Shipped_dib_notebook_runs_and_its_written_outputs_reproduce(string fileName)
    {
        // A .dib file stores no outputs: run it, write the outputs to an .ipynb, and check that file.
        using var temp = new TempNotebook();
        var written = Path.Combine(temp.Folder, Path.ChangeExtension(fileName, ".ipynb"));
        var source = Path.Combine(RepositoryPaths.Root, "notebooks", fileName);
        var stdout = new StringWriter();
        var stderr = new StringWriter();
        var code = await RunnerApp.RunAsync(new[] { "run", source, "--output", Path.Combine(temp.Folder, "report.html"), "--write-notebook", written, "--quiet" }, stdout, stderr);
        Assert.True(code == RunnerApp.ExitSuccess, $"run {fileName} exited with {code}.{Environment.NewLine}{stderr}");
        var stored = StoredNotebook.Load(written);
        Assert.Contains(stored.Cells.SelectMany(c => c.Outputs), o => o.Data.TryGetValue("text/html", out var html) && html.Contains("<math", StringComparison.Ordinal));
        stdout = new StringWriter();
        code = await RunnerApp.RunAsync(new[] { "check", written, "--quiet" }, stdout, stderr);
        Assert.True(code == RunnerApp.ExitSuccess, $"check of the outputs written from {fileName} exited with {code}.{Environment.NewLine}{stdout}{Environment.NewLine}{stderr}");
    }

    [Fact]
    public void Between_four_and_six_notebooks_are_shipped_and_the_quick_start_one_is_among_them()
    {
        var names = Directory.GetFiles(Path.Combine(RepositoryPaths.Root, "notebooks"))
            .Where(p => p.EndsWith(".ipynb", StringComparison.Ordinal) || p.EndsWith(".dib", StringComparison.Ordinal))
            .Select(Path.GetFileName).ToList();
        Assert.InRange(names.Count, 4, 6);
        Assert.Contains(Path.GetFileName(RepositoryPaths.DemoNotebook), names);
    }
}
