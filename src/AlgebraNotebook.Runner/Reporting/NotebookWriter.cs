using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;
using System.Text.RegularExpressions;
using AlgebraNotebook.Runner.Documents;
using AlgebraNotebook.Runner.Execution;

namespace AlgebraNotebook.Runner.Reporting;

/// <summary>
/// Writes a run back as an nbformat 4.5 notebook (.ipynb JSON): every cell with an "id", code cells with their
/// outputs and execution counts. Built directly with System.Text.Json.
/// </summary>
/// <remarks>
/// <para>When the run came from an .ipynb file, its top-level fields and metadata, and each cell's id, metadata,
/// attachments and source are kept as they were; only outputs and execution counts of C# code cells are replaced.
/// Cells of other languages keep their stored outputs. Missing or invalid ids are replaced by "cell-N" (N the cell
/// number, made unique).</para>
/// <para>Outputs: the value of the last expression becomes <c>execute_result</c>, displayed values
/// <c>display_data</c>, both with <c>data</c> {"text/html", "text/plain"} (as far as the kernel produced them) and
/// empty <c>metadata</c>; console text becomes <c>stream</c> (stdout, or stderr for standard error and compiler
/// warnings); a failure becomes <c>error</c> (see <see cref="ToErrorOutput"/>). Execution counts number the executed
/// C# cells 1, 2, 3, ... in document order; empty cells get null.</para>
/// </remarks>
public static partial class NotebookWriter
{
    /// <summary>The nbformat major version written.</summary>
    public const int FormatVersion = 4;

    /// <summary>The nbformat minor version written (4.5 introduced cell ids); a newer minor version of the input is kept.</summary>
    public const int FormatMinorVersion = 5;

    /// <summary>The error name used for compilation failures.</summary>
    public const string CompilationErrorName = "CompilationError";

    /// <summary>The error name used for failures that are not exceptions (time limit, unsupported language).</summary>
    public const string CellFailedName = "CellFailed";

    private const string CompilationPrefix = "Compilation failed: ";

    /// <summary>Builds the notebook JSON (indented, UTF-8 text without byte-order mark when saved).</summary>
    /// <param name="results">The run, one result per cell in document order.</param>
    /// <param name="originalJson">The .ipynb text the cells were loaded from, to keep its metadata, ids and sources;
    /// null for a notebook read from .dib (or when the cell count does not match, which the writer then ignores).</param>
    /// <returns>The JSON text.</returns>
    /// <exception cref="ArgumentNullException"><paramref name="results"/> is null.</exception>
    public static string Write(IReadOnlyList<CellResult> results, string? originalJson)
    {
        ArgumentNullException.ThrowIfNull(results);
        JsonObject? original = null;
        if (originalJson is not null)
        {
            try
            {
                original = JsonNode.Parse(originalJson) as JsonObject;
            }
            catch (JsonException)
            {
                original = null;
            }
        }

        var originalCells = original?["cells"] as JsonArray;
        if (originalCells is not null && originalCells.Count != results.Count)
        {
            originalCells = null;
        }

        var root = new JsonObject();
        if (original is not null)
        {
            foreach (var (key, value) in original)
            {
                if (key is not ("cells" or "nbformat" or "nbformat_minor"))
                {
                    root[key] = value?.DeepClone();
                }
            }
        }

        var metadata = root["metadata"] as JsonObject ?? new JsonObject();
        root["metadata"] = metadata;
        if (metadata["kernelspec"] is not JsonObject)
        {
            metadata["kernelspec"] = new JsonObject
            {
                ["display_name"] = ".NET (C#)",
                ["language"] = "C#",
                ["name"] = ".net-csharp",
            };
        }

        if (metadata["language_info"] is not JsonObject)
        {
            metadata["language_info"] = new JsonObject { ["name"] = "csharp" };
        }

        var usedIds = new HashSet<string>(StringComparer.Ordinal);
        var cells = new JsonArray();
        var executionCount = 0;
        for (var k = 0; k < results.Count; k++)
        {
            cells.Add(WriteCell(results[k], originalCells?[k] as JsonObject, usedIds, ref executionCount));
        }

        var minor = original?["nbformat_minor"] is JsonValue m && m.TryGetValue<int>(out var given) && given > FormatMinorVersion
            && original["nbformat"] is JsonValue major && major.TryGetValue<int>(out var givenMajor) && givenMajor == FormatVersion
            ? given
            : FormatMinorVersion;
        root["cells"] = cells;
        root["nbformat"] = FormatVersion;
        root["nbformat_minor"] = minor;
        return root.ToJsonString(new JsonSerializerOptions { WriteIndented = true, Encoder = System.Text.Encodings.Web.JavaScriptEncoder.UnsafeRelaxedJsonEscaping })
               + "\n";
    }

    /// <summary>
    /// The nbformat outputs of one executed cell, in order: results, displays and console text as produced, then the
    /// failure (if any) as an error output. Prose cells have none.
    /// </summary>
    /// <param name="result">The cell's result.</param>
    /// <returns>The outputs.</returns>
    public static IReadOnlyList<StoredOutput> ToStoredOutputs(CellResult result)
    {
        ArgumentNullException.ThrowIfNull(result);
        var outputs = new List<StoredOutput>();
        foreach (var output in result.Outputs)
        {
            switch (output.Kind)
            {
                case CellOutputKind.ReturnValue or CellOutputKind.DisplayedValue:
                    var data = new Dictionary<string, string>(StringComparer.Ordinal);
                    if (output.IsHtml)
                    {
                        data[CellOutput.Html] = output.Content;
                    }

                    if (output.PlainContent is { } plain)
                    {
                        data[CellOutput.PlainText] = plain;
                    }

                    outputs.Add(StoredOutput.ForData(
                        output.Kind == CellOutputKind.ReturnValue ? StoredOutput.ExecuteResult : StoredOutput.DisplayData, data));
                    break;
                case CellOutputKind.StandardOutput:
                    outputs.Add(StoredOutput.ForStream("stdout", output.Content));
                    break;
                default:
                    // Standard error and compiler warnings.
                    var text = output.Kind == CellOutputKind.Diagnostic && !output.Content.EndsWith('\n') ? output.Content + "\n" : output.Content;
                    outputs.Add(StoredOutput.ForStream("stderr", text));
                    break;
            }
        }

        if (result.Failure is { } failure)
        {
            outputs.Add(ToErrorOutput(failure));
        }

        return outputs;
    }

    /// <summary>
    /// The error output for a failure text of <see cref="CellResult.Failure"/>: "Compilation failed: ..." gives the
    /// name <see cref="CompilationErrorName"/>; "Namespace.SomeException: message" gives that type name and the message;
    /// anything else gives <see cref="CellFailedName"/>. The traceback is the failure text split into lines.
    /// </summary>
    /// <param name="failure">The failure text.</param>
    /// <returns>The error output.</returns>
    public static StoredOutput ToErrorOutput(string failure)
    {
        ArgumentNullException.ThrowIfNull(failure);
        var traceback = failure.Replace("\r\n", "\n").Split('\n');
        if (failure.StartsWith(CompilationPrefix, StringComparison.Ordinal))
        {
            return StoredOutput.ForError(CompilationErrorName, failure[CompilationPrefix.Length..], traceback);
        }

        var exception = ExceptionPattern().Match(failure);
        return exception.Success
            ? StoredOutput.ForError(exception.Groups[1].Value, exception.Groups[2].Value, traceback)
            : StoredOutput.ForError(CellFailedName, failure, traceback);
    }

    /// <summary>The failure text that <see cref="ToErrorOutput"/> maps to the given error, for reports from stored outputs.</summary>
    /// <param name="errorName">The stored error name.</param>
    /// <param name="errorValue">The stored error message.</param>
    /// <returns>The failure text.</returns>
    public static string ToFailureText(string? errorName, string? errorValue) => errorName switch
    {
        CompilationErrorName => CompilationPrefix + errorValue,
        CellFailedName or null or "" => errorValue ?? "The cell failed.",
        _ => $"{errorName}: {errorValue}",
    };

    private static JsonObject WriteCell(CellResult result, JsonObject? original, HashSet<string> usedIds, ref int executionCount)
    {
        var cell = result.Cell;
        var cellType = cell.Kind switch
        {
            CellKind.Markdown => "markdown",
            CellKind.Raw => "raw",
            _ => "code",
        };
        var json = new JsonObject
        {
            ["cell_type"] = cellType,
            ["id"] = UniqueId(original?["id"] is JsonValue id && id.TryGetValue<string>(out var given) ? given : null, cell.Number, usedIds),
            ["metadata"] = original?["metadata"] is JsonObject metadata ? metadata.DeepClone() : DefaultMetadata(cell),
        };
        if (original?["attachments"] is JsonObject attachments && cellType != "code")
        {
            json["attachments"] = attachments.DeepClone();
        }

        json["source"] = original?["source"] is { } source && StoredNotebook.MultilineText(source) is not null
            ? source.DeepClone()
            : Lines(cell.Source);
        if (cellType != "code")
        {
            return json;
        }

        if (cell.Kind == CellKind.Unsupported)
        {
            // Not executed: keep what the file had.
            json["execution_count"] = original?["execution_count"]?.DeepClone();
            json["outputs"] = original?["outputs"] is JsonArray kept ? kept.DeepClone() : new JsonArray();
            return json;
        }

        int? count = string.IsNullOrWhiteSpace(cell.Source) ? null : ++executionCount;
        json["execution_count"] = count;
        var outputs = new JsonArray();
        foreach (var output in ToStoredOutputs(result))
        {
            outputs.Add(WriteOutput(output, count));
        }

        json["outputs"] = outputs;
        return json;
    }

    private static JsonObject WriteOutput(StoredOutput output, int? executionCount)
    {
        var json = new JsonObject { ["output_type"] = output.OutputType };
        switch (output.OutputType)
        {
            case StoredOutput.Stream:
                json["name"] = output.StreamName;
                json["text"] = Lines(output.Text ?? string.Empty);
                break;
            case StoredOutput.Error:
                json["ename"] = output.ErrorName;
                json["evalue"] = output.ErrorValue;
                json["traceback"] = new JsonArray(output.Traceback.Select(l => (JsonNode?)JsonValue.Create(l)).ToArray());
                break;
            default:
                var data = new JsonObject();
                foreach (var (mime, text) in output.Data.OrderBy(p => p.Key, StringComparer.Ordinal))
                {
                    data[mime] = Lines(text);
                }

                if (output.OutputType == StoredOutput.ExecuteResult)
                {
                    json["execution_count"] = executionCount;
                }

                json["data"] = data;
                json["metadata"] = new JsonObject();
                break;
        }

        return json;
    }

    private static JsonObject DefaultMetadata(NotebookCell cell) => cell.Kind is CellKind.Code or CellKind.Unsupported
        ? new JsonObject
        {
            ["dotnet_interactive"] = new JsonObject { ["language"] = cell.Language },
            ["polyglot_notebook"] = new JsonObject { ["kernelName"] = cell.Language },
        }
        : new JsonObject();

    /// <summary>An nbformat multiline string as an array of lines, each but the last ending in "\n".</summary>
    private static JsonArray Lines(string text)
    {
        var lines = new JsonArray();
        var start = 0;
        while (start < text.Length)
        {
            var end = text.IndexOf('\n', start);
            var next = end < 0 ? text.Length : end + 1;
            lines.Add(text[start..next]);
            start = next;
        }

        return lines;
    }

    private static string UniqueId(string? given, int number, HashSet<string> used)
    {
        if (given is not null && IdPattern().IsMatch(given) && used.Add(given))
        {
            return given;
        }

        var candidate = $"cell-{number}";
        for (var suffix = 2; !used.Add(candidate); suffix++)
        {
            candidate = $"cell-{number}-{suffix}";
        }

        return candidate;
    }

    // nbformat 4.5 cell id: 1 to 64 characters from letters, digits, '-' and '_'.
    [GeneratedRegex("^[a-zA-Z0-9_-]{1,64}$")]
    private static partial Regex IdPattern();

    [GeneratedRegex(@"^([A-Za-z_][\w.`+]*(?:Exception|Error)): (.*)$", RegexOptions.Singleline)]
    private static partial Regex ExceptionPattern();
}
