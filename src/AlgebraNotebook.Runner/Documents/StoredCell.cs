namespace AlgebraNotebook.Runner.Documents;

/// <summary>One cell of an .ipynb file as stored, with the outputs of the run that wrote it.</summary>
/// <param name="Number">One-based position among all cells (the same numbering as <see cref="NotebookCell.Number"/>).</param>
/// <param name="CellType">nbformat cell type: "code", "markdown" or "raw".</param>
/// <param name="Id">The cell id, or null when the file has none.</param>
/// <param name="IsVolatile">True when the cell's metadata holds <c>{"algebranotebook": {"volatile": true}}</c>: its
/// outputs are expected to change from run to run (times, random numbers) and are not compared.</param>
/// <param name="ExecutionCount">The stored execution count, or null when the cell was not run.</param>
/// <param name="Outputs">The stored outputs in order (empty for prose cells).</param>
public sealed record StoredCell(
    int Number,
    string CellType,
    string? Id,
    bool IsVolatile,
    int? ExecutionCount,
    IReadOnlyList<StoredOutput> Outputs)
{
    /// <summary>True when the file records a run of this cell: an execution count or at least one output.</summary>
    public bool HasStoredRun => ExecutionCount is not null || Outputs.Count > 0;
}
