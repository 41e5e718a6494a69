namespace AlgebraNotebook.Runner.Documents;

/// <summary>What the runner does with a notebook cell.</summary>
public enum CellKind
{
    /// <summary>C# source, executed in order by the in-process kernel.</summary>
    Code,

    /// <summary>Markdown prose, rendered into the report and never executed.</summary>
    Markdown,

    /// <summary>An nbformat "raw" cell: shown as preformatted text in the report, never executed.</summary>
    Raw,

    /// <summary>A cell in a language the runner cannot execute (for example F# or PowerShell); reported as a failure.</summary>
    Unsupported,
}
