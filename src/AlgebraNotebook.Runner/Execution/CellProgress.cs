using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Execution;

/// <summary>A progress report for one C# code cell, sent when it starts and when it has finished.</summary>
/// <param name="Position">One-based position of the cell among the notebook's C# code cells.</param>
/// <param name="Total">Number of C# code cells in the notebook.</param>
/// <param name="Cell">The cell (its <see cref="NotebookCell.Number"/> counts all cells).</param>
/// <param name="Result">Null in the report sent when the cell starts; the result in the report sent when it has finished.</param>
/// <param name="Elapsed">Wall-clock time the cell took (zero in the start report).</param>
public sealed record CellProgress(int Position, int Total, NotebookCell Cell, CellResult? Result, TimeSpan Elapsed);
