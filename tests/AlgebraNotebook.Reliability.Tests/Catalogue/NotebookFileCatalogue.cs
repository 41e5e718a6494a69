using AlgebraNotebook.Runner.Documents;
using Xunit.Abstractions;

namespace AlgebraNotebook.Reliability.Tests.Catalogue;

/// <summary>
/// Bad notebook files for the runner's readers (NotebookFile, StoredNotebook). What makes each file bad follows the
/// nbformat 4 specification (open standard: a JSON object with "nbformat": 4, "nbformat_minor", "metadata" and a
/// "cells" array of objects with "cell_type" and "source"); the expected exception is NotebookLoadException as documented.
/// </summary>
public sealed class NotebookFileCatalogue(ITestOutputHelper output)
{
    private const string Cell = """{"cell_type": "code", "source": "1 + 1", "metadata": {}, "outputs": [], "execution_count": null}""";

    private static string Notebook(string nbformat, string cells) =>
        "{\"nbformat\": " + nbformat + ", \"nbformat_minor\": 5, \"metadata\": {}, \"cells\": " + cells + "}";

    /// <summary>The entries of this area.</summary>
    public static readonly BadInput[] Entries =
    [
        Entry.Of("load_missing_file", "NotebookFile.Load", "missing.ipynb", typeof(NotebookLoadException),
            () => NotebookFile.Load(Path.Combine(Path.GetTempPath(), "algebranotebook-no-such-dir", "missing.ipynb")), "missing.ipynb", "not found"),
        Entry.Of("load_wrong_extension", "NotebookFile.Load", "notes.txt", typeof(NotebookLoadException), () => NotebookFile.Load("notes.txt"), "notes.txt", ".txt"),
        Entry.Of("load_no_extension", "NotebookFile.Load", "notebook", typeof(NotebookLoadException), () => NotebookFile.Load("notebook"), "notebook", "extension"),
        Entry.Of("ipynb_not_json", "NotebookFile.ParseIpynb", "\"this is not json\"", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("a.ipynb", "this is not json"), "a.ipynb", "JSON"),
        Entry.Of("ipynb_empty_text", "NotebookFile.ParseIpynb", "\"\"", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("e.ipynb", ""), "e.ipynb"),
        Entry.Of("ipynb_truncated", "NotebookFile.ParseIpynb", "first half of a notebook", typeof(NotebookLoadException),
            () => NotebookFile.ParseIpynb("t.ipynb", Notebook("4", "[" + Cell + "]")[..40]), "t.ipynb"),
        Entry.Of("ipynb_top_level_array", "NotebookFile.ParseIpynb", "\"[]\"", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("arr.ipynb", "[]"), "arr.ipynb", "cells"),
        Entry.Of("ipynb_no_cells", "NotebookFile.ParseIpynb", "{\"nbformat\": 4}", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("nc.ipynb", "{\"nbformat\": 4}"), "nc.ipynb", "cells"),
        Entry.Of("ipynb_cells_not_array", "NotebookFile.ParseIpynb", "cells: \"x\"", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("cs.ipynb", Notebook("4", "\"x\"")), "cs.ipynb", "cells"),
        Entry.Of("ipynb_nbformat_3", "NotebookFile.ParseIpynb", "nbformat 3", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("old.ipynb", Notebook("3", "[" + Cell + "]")), "old.ipynb", "\"nbformat\": 3"),
        Entry.Of("ipynb_nbformat_text", "NotebookFile.ParseIpynb", "nbformat \"four\"", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("txt.ipynb", Notebook("\"four\"", "[" + Cell + "]")), "txt.ipynb", "\"nbformat\": \"four\""),
        Entry.Of("ipynb_cell_not_object", "NotebookFile.ParseIpynb", "cells: [42]", typeof(NotebookLoadException), () => NotebookFile.ParseIpynb("c42.ipynb", Notebook("4", "[42]")), "c42.ipynb", "cell 1", "42"),
        Entry.Of("ipynb_cell_without_type", "NotebookFile.ParseIpynb", "cells: [{source: \"x\"}]", typeof(NotebookLoadException),
            () => NotebookFile.ParseIpynb("nt.ipynb", Notebook("4", "[{\"source\": \"x\"}]")), "nt.ipynb", "cell 1", "cell_type"),
        Entry.Of("stored_not_json", "StoredNotebook.Parse", "\"{{{\"", typeof(NotebookLoadException), () => StoredNotebook.Parse("s.ipynb", "{{{"), "s.ipynb"),
        Entry.Of("stored_missing_file", "StoredNotebook.Load", "gone.ipynb", typeof(NotebookLoadException),
            () => StoredNotebook.Load(Path.Combine(Path.GetTempPath(), "algebranotebook-no-such-dir", "gone.ipynb")), "gone.ipynb"),
        Entry.Of("stored_outputs_not_array", "StoredNotebook.Parse", "outputs: 7", typeof(NotebookLoadException),
            () => StoredNotebook.Parse("o.ipynb", Notebook("4", """[{"cell_type": "code", "source": "1", "metadata": {}, "outputs": 7}]""")), "o.ipynb", "outputs", "cell 1", "7"),
    ];

    /// <summary>The case names.</summary>
    public static TheoryData<string> Names => CatalogueCheck.Names(Entries);

    /// <summary>Each entry is refused with its documented exception and a message naming the file.</summary>
    [Theory]
    [MemberData(nameof(Names))]
    public void Bad_notebook_file_is_refused_with_a_named_error(string name) => CatalogueCheck.Refuses(CatalogueCheck.Find(Entries, name), output);
}
