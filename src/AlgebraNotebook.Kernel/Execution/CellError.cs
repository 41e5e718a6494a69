namespace AlgebraNotebook.Kernel.Execution;

/// <summary>Why a cell failed, in the shape of the Jupyter "error" message.</summary>
/// <param name="Name">The error name (ename): "CompilationError", "Interrupted", or the exception's type name.</param>
/// <param name="Value">The error value (evalue): a one-line description.</param>
/// <param name="Traceback">Lines of detail: compiler diagnostics, or the exception text with its stack trace.</param>
public sealed record CellError(string Name, string Value, IReadOnlyList<string> Traceback);
