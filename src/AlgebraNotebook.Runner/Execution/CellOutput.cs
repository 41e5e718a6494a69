namespace AlgebraNotebook.Runner.Execution;

/// <summary>One output of an executed cell, already formatted.</summary>
/// <param name="Kind">Where the output came from.</param>
/// <param name="MimeType">"text/html" (trusted formatter output, embedded as is) or "text/plain" (escaped in the report).</param>
/// <param name="Content">The formatted value.</param>
public sealed record CellOutput(CellOutputKind Kind, string MimeType, string Content)
{
    /// <summary>MIME type of HTML fragments.</summary>
    public const string Html = "text/html";

    /// <summary>MIME type of plain text.</summary>
    public const string PlainText = "text/plain";

    /// <summary>True when <see cref="MimeType"/> is text/html.</summary>
    public bool IsHtml => MimeType == Html;
}
