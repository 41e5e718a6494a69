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

    private readonly string? plainContent;

    /// <summary>True when <see cref="MimeType"/> is text/html.</summary>
    public bool IsHtml => MimeType == Html;

    /// <summary>
    /// The text/plain form of the output: <see cref="Content"/> itself for plain-text outputs; for HTML outputs the
    /// kernel's text/plain rendering of the same value when it produced one, otherwise null. Written to notebooks
    /// beside the HTML and used by the <c>check</c> command to compare outputs.
    /// </summary>
    public string? PlainContent
    {
        get => IsHtml ? plainContent : Content;
        init => plainContent = value;
    }
}
