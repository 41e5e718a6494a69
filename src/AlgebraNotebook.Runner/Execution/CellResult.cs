using AlgebraNotebook.Runner.Documents;

namespace AlgebraNotebook.Runner.Execution;

/// <summary>A notebook cell together with what running it produced.</summary>
/// <param name="Cell">The cell as loaded.</param>
/// <param name="Outputs">Outputs in the order the kernel produced them, consecutive writes to the same console stream
/// joined into one output (empty for Markdown and raw cells).</param>
/// <param name="Failure">Null when the cell succeeded (or was not executed); otherwise the compiler diagnostics or
/// the exception type and message, as one text.</param>
public sealed record CellResult(NotebookCell Cell, IReadOnlyList<CellOutput> Outputs, string? Failure)
{
    /// <summary>True when the cell failed to compile, threw, or is in an unsupported language.</summary>
    public bool Failed => Failure is not null;

    /// <summary>A Markdown or raw cell's result: no outputs, no failure.</summary>
    /// <param name="cell">The Markdown or raw cell.</param>
    /// <returns>The result.</returns>
    public static CellResult Prose(NotebookCell cell) => new(cell, Array.Empty<CellOutput>(), null);
}
