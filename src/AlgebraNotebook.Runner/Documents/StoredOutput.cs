namespace AlgebraNotebook.Runner.Documents;

/// <summary>
/// One output of a code cell as nbformat 4 stores it: <c>execute_result</c> and <c>display_data</c> carry
/// <see cref="Data"/> (MIME type to text), <c>stream</c> carries <see cref="StreamName"/> and <see cref="Text"/>,
/// <c>error</c> carries <see cref="ErrorName"/>, <see cref="ErrorValue"/> and <see cref="Traceback"/>.
/// </summary>
/// <param name="OutputType">"execute_result", "display_data", "stream" or "error" (other values are kept as read).</param>
/// <param name="Data">MIME bundle of results and displays (text values only; empty for other output types).</param>
/// <param name="StreamName">"stdout" or "stderr" for streams, otherwise null.</param>
/// <param name="Text">The text of a stream, otherwise null.</param>
/// <param name="ErrorName">The error's name (exception type) for errors, otherwise null.</param>
/// <param name="ErrorValue">The error's message for errors, otherwise null.</param>
/// <param name="Traceback">The traceback lines of an error (empty otherwise).</param>
public sealed record StoredOutput(
    string OutputType,
    IReadOnlyDictionary<string, string> Data,
    string? StreamName,
    string? Text,
    string? ErrorName,
    string? ErrorValue,
    IReadOnlyList<string> Traceback)
{
    /// <summary>nbformat output type of the value of a cell's last expression.</summary>
    public const string ExecuteResult = "execute_result";

    /// <summary>nbformat output type of a displayed value.</summary>
    public const string DisplayData = "display_data";

    /// <summary>nbformat output type of console text.</summary>
    public const string Stream = "stream";

    /// <summary>nbformat output type of a failure.</summary>
    public const string Error = "error";

    /// <summary>A result or display output with the given MIME bundle.</summary>
    /// <param name="outputType"><see cref="ExecuteResult"/> or <see cref="DisplayData"/>.</param>
    /// <param name="data">MIME type to text.</param>
    /// <returns>The output.</returns>
    public static StoredOutput ForData(string outputType, IReadOnlyDictionary<string, string> data) =>
        new(outputType, data, null, null, null, null, Array.Empty<string>());

    /// <summary>A stream output.</summary>
    /// <param name="name">"stdout" or "stderr".</param>
    /// <param name="text">The text written.</param>
    /// <returns>The output.</returns>
    public static StoredOutput ForStream(string name, string text) =>
        new(Stream, new Dictionary<string, string>(), name, text, null, null, Array.Empty<string>());

    /// <summary>An error output.</summary>
    /// <param name="name">The error's name.</param>
    /// <param name="value">The error's message.</param>
    /// <param name="traceback">The traceback lines.</param>
    /// <returns>The output.</returns>
    public static StoredOutput ForError(string name, string value, IReadOnlyList<string> traceback) =>
        new(Error, new Dictionary<string, string>(), null, null, name, value, traceback);
}
