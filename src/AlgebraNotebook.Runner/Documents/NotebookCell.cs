namespace AlgebraNotebook.Runner.Documents;

/// <summary>One cell of a loaded notebook.</summary>
/// <param name="Number">One-based position of the cell among ALL cells of the notebook (Markdown cells count too);
/// this is the number used in the report and in "cell N: ..." failure lines.</param>
/// <param name="Kind">Whether the cell is executed, rendered as prose, or unsupported.</param>
/// <param name="Language">Kernel name of the cell as stored in the notebook ("csharp", "markdown", "fsharp", ...);
/// cells without language metadata are taken as "csharp".</param>
/// <param name="Source">The cell text exactly as stored.</param>
public sealed record NotebookCell(int Number, CellKind Kind, string Language, string Source);
