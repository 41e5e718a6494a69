namespace AlgebraNotebook.Runner.Documents;

/// <summary>
/// Thrown when a notebook file cannot be read or parsed. The message names the file and the problem
/// (missing file, unsupported extension, malformed JSON with line and position, ...).
/// </summary>
public sealed class NotebookLoadException : Exception
{
    /// <summary>Creates the exception for <paramref name="path"/> with a message describing the problem.</summary>
    /// <param name="path">The notebook path as the user gave it.</param>
    /// <param name="message">The complete message (it should already name the file).</param>
    /// <param name="inner">The underlying exception, if any.</param>
    public NotebookLoadException(string path, string message, Exception? inner = null)
        : base(message, inner)
    {
        NotebookPath = path;
    }

    /// <summary>The notebook path as the user gave it.</summary>
    public string NotebookPath { get; }
}
