namespace AlgebraNotebook.Runner.Execution;

/// <summary>Where a cell output came from.</summary>
public enum CellOutputKind
{
    /// <summary>The value of the cell's last expression.</summary>
    ReturnValue,

    /// <summary>A value shown with <c>display(...)</c>.</summary>
    DisplayedValue,

    /// <summary>Text written to standard output.</summary>
    StandardOutput,

    /// <summary>Text written to standard error.</summary>
    StandardError,

    /// <summary>A compiler warning (errors are part of the failure instead).</summary>
    Diagnostic,
}
