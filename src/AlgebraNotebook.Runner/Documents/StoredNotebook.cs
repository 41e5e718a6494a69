using System.Text;
using System.Text.Json;
using System.Text.Json.Nodes;

namespace AlgebraNotebook.Runner.Documents;

/// <summary>
/// The outputs stored in an .ipynb file (nbformat 4), cell by cell, read without executing anything. Used by the
/// <c>check</c> command (compare with a new run) and the <c>export</c> command (report from stored outputs).
/// </summary>
public sealed class StoredNotebook
{
    /// <summary>The metadata key under which AlgebraNotebook keeps its per-cell settings.</summary>
    public const string MetadataKey = "algebranotebook";

    /// <summary>The setting, inside <see cref="MetadataKey"/>, that marks a cell's outputs as volatile.</summary>
    public const string VolatileKey = "volatile";

    private StoredNotebook(string path, IReadOnlyList<StoredCell> cells)
    {
        NotebookPath = path;
        Cells = cells;
    }

    /// <summary>The notebook path as given.</summary>
    public string NotebookPath { get; }

    /// <summary>Every cell in document order, numbered from 1 like <see cref="NotebookCell.Number"/>.</summary>
    public IReadOnlyList<StoredCell> Cells { get; }

    /// <summary>True when at least one code cell records a run (an execution count or an output).</summary>
    public bool HasStoredRuns => Cells.Any(c => c.CellType == "code" && c.HasStoredRun);

    /// <summary>Reads the .ipynb file at <paramref name="path"/>.</summary>
    /// <param name="path">Path of the notebook; it must end in .ipynb (a .dib file stores no outputs).</param>
    /// <returns>The stored cells and outputs.</returns>
    /// <exception cref="NotebookLoadException">The file is missing, unreadable, not .ipynb, or not an nbformat notebook.</exception>
    public static StoredNotebook Load(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var extension = Path.GetExtension(path).ToLowerInvariant();
        if (extension == ".dib")
        {
            throw new NotebookLoadException(path,
                $"Notebook '{path}' is a .dib file, which stores no outputs; nothing to compare: run it with --write-notebook <file.ipynb> first.");
        }

        if (extension != ".ipynb")
        {
            throw new NotebookLoadException(path, $"Notebook '{path}': unsupported file extension '{extension}'; expected .ipynb.");
        }

        if (!File.Exists(path))
        {
            throw new NotebookLoadException(path, $"Notebook '{path}' was not found.");
        }

        string text;
        try
        {
            text = File.ReadAllText(path, Encoding.UTF8);
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new NotebookLoadException(path, $"Notebook '{path}' could not be read: {e.Message}", e);
        }

        return Parse(path, text);
    }

    /// <summary>Reads nbformat 4 JSON text.</summary>
    /// <param name="path">Name used in error messages.</param>
    /// <param name="json">The notebook JSON.</param>
    /// <returns>The stored cells and outputs.</returns>
    /// <exception cref="NotebookLoadException">The text is not JSON, not an object with a "cells" array of objects, has an
    /// "nbformat" other than 4, or a cell whose "outputs" is not an array.</exception>
    public static StoredNotebook Parse(string path, string json)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(json);
        JsonNode? root;
        try
        {
            root = JsonNode.Parse(json, documentOptions: new JsonDocumentOptions { AllowDuplicateProperties = false });
        }
        catch (JsonException e)
        {
            var line = e.LineNumber is long l ? (l + 1).ToString() : "?";
            var position = e.BytePositionInLine is long p ? (p + 1).ToString() : "?";
            throw new NotebookLoadException(path, $"Notebook '{path}' is not valid JSON (line {line}, position {position}).", e);
        }
        catch (ArgumentException e)
        {
            // A lone UTF-16 surrogate in the text (possible through this API, never from a file read as UTF-8).
            throw new NotebookLoadException(path, $"Notebook '{path}' is not valid JSON text: {e.Message}", e);
        }

        if (root is not JsonObject rootObject || rootObject["cells"] is not JsonArray cellArray)
        {
            throw new NotebookLoadException(path,
                $"Notebook '{path}' is not an nbformat notebook: the top level must be an object with a \"cells\" array.");
        }

        var format = rootObject["nbformat"];
        NotebookFile.CheckFormatVersion(path, format?.ToJsonString(),
            format is JsonValue formatValue && formatValue.TryGetValue<int>(out var version) ? version : null);
        var cells = new List<StoredCell>();
        foreach (var node in cellArray)
        {
            var number = cells.Count + 1;
            if (node is not JsonObject cell)
            {
                throw new NotebookLoadException(path, $"Notebook '{path}': cell {number} is not a JSON object.");
            }

            var cellType = StringOf(cell["cell_type"]) ?? "code";
            var outputs = new List<StoredOutput>();
            if (cell["outputs"] is { } outputsNode and not JsonArray)
            {
                throw new NotebookLoadException(path,
                    $"Notebook '{path}': the \"outputs\" of cell {number} must be a JSON array, not {outputsNode.ToJsonString()}.");
            }

            if (cell["outputs"] is JsonArray outputArray)
            {
                foreach (var output in outputArray)
                {
                    if (output is JsonObject outputObject)
                    {
                        outputs.Add(ReadOutput(outputObject));
                    }
                }
            }

            int? executionCount = cell["execution_count"] is JsonValue count && count.TryGetValue<int>(out var n) ? n : null;
            cells.Add(new StoredCell(number, cellType, StringOf(cell["id"]), IsVolatile(cell["metadata"]), executionCount, outputs));
        }

        return new StoredNotebook(path, cells);
    }

    /// <summary>Text of an nbformat "multiline string": a string, or an array of strings joined without separators.</summary>
    internal static string? MultilineText(JsonNode? node) => node switch
    {
        JsonValue value when value.TryGetValue<string>(out var text) => text,
        JsonArray array => string.Concat(array.Select(StringOf)),
        _ => null,
    };

    private static string? StringOf(JsonNode? node) =>
        node is JsonValue value && value.TryGetValue<string>(out var text) ? text : null;

    private static bool IsVolatile(JsonNode? metadata) =>
        metadata is JsonObject m && m[MetadataKey] is JsonObject settings
        && settings[VolatileKey] is JsonValue flag && flag.TryGetValue<bool>(out var isVolatile) && isVolatile;

    private static StoredOutput ReadOutput(JsonObject output)
    {
        var type = StringOf(output["output_type"]) ?? string.Empty;
        var data = new Dictionary<string, string>(StringComparer.Ordinal);
        if (output["data"] is JsonObject bundle)
        {
            foreach (var (mime, value) in bundle)
            {
                if (MultilineText(value) is { } text)
                {
                    data[mime] = text;
                }
            }
        }

        var traceback = output["traceback"] is JsonArray lines
            ? lines.Select(StringOf).Where(l => l is not null).Select(l => l!).ToArray()
            : Array.Empty<string>();
        return new StoredOutput(type, data, StringOf(output["name"]), MultilineText(output["text"]),
            StringOf(output["ename"]), StringOf(output["evalue"]), traceback);
    }
}
