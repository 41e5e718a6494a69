namespace AlgebraNotebook.Kernel.Execution;

/// <summary>One output of an executed cell, in the form the iopub channel publishes it.</summary>
/// <param name="Kind">Which iopub message carries it.</param>
/// <param name="Data">MIME type to text (for results and displays); for a stream, the single entry "text/plain".</param>
/// <param name="StreamName">"stdout" or "stderr" for <see cref="CellOutputKind.Stream"/>; null otherwise.</param>
/// <param name="DisplayId">The display identifier of a displayed value (transient display_id), or null.</param>
public sealed record CellOutput(CellOutputKind Kind, IReadOnlyDictionary<string, string> Data, string? StreamName = null,
    string? DisplayId = null);
