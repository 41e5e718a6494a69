namespace AlgebraNotebook.Kernel.Execution;

/// <summary>The outcome of running one cell.</summary>
/// <param name="Outputs">Outputs in the order the kernel produced them (consecutive console writes merged).</param>
/// <param name="Error">The failure, or null when the cell succeeded.</param>
public sealed record CellExecution(IReadOnlyList<CellOutput> Outputs, CellError? Error);
