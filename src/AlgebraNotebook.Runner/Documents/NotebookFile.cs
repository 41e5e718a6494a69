using System.Text;
using System.Text.Json;
using Microsoft.DotNet.Interactive.Documents;
using JupyterNotebook = Microsoft.DotNet.Interactive.Documents.Jupyter.Notebook;

namespace AlgebraNotebook.Runner.Documents;

/// <summary>
/// Reads .ipynb (nbformat 4 JSON) and .dib (polyglot text) notebooks into a flat list of <see cref="NotebookCell"/>.
/// Parsing is delegated to Microsoft.DotNet.Interactive.Documents; this class adds validation with clear messages and
/// fills in the language of cells that carry no kernel metadata (taken as C#).
/// </summary>
public static class NotebookFile
{
    /// <summary>Kernel name of C# cells.</summary>
    public const string CSharpKernelName = "csharp";

    /// <summary>Kernel name of Markdown cells.</summary>
    public const string MarkdownKernelName = "markdown";

    /// <summary>Reads and parses the notebook at <paramref name="path"/>; the format is chosen by extension (.ipynb or .dib).</summary>
    /// <param name="path">Path of the notebook file.</param>
    /// <returns>The cells in document order, numbered from 1.</returns>
    /// <exception cref="NotebookLoadException">The file is missing, unreadable, has another extension, or is malformed.</exception>
    public static IReadOnlyList<NotebookCell> Load(string path)
    {
        ArgumentNullException.ThrowIfNull(path);
        var extension = Path.GetExtension(path).ToLowerInvariant();
        if (extension != ".ipynb" && extension != ".dib")
        {
            throw new NotebookLoadException(path,
                $"Notebook '{path}': unsupported file extension '{extension}'; expected .ipynb or .dib.");
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

        return extension == ".ipynb" ? ParseIpynb(path, text) : ParseDib(path, text);
    }

    /// <summary>Parses nbformat 4 JSON text.</summary>
    /// <param name="path">Name used in error messages.</param>
    /// <param name="json">The notebook JSON.</param>
    /// <returns>The cells in document order, numbered from 1.</returns>
    /// <exception cref="NotebookLoadException">The text is not valid JSON or not an nbformat 4 notebook (an "nbformat"
    /// other than 4, a cell that is not an object or has no "cell_type" string).</exception>
    public static IReadOnlyList<NotebookCell> ParseIpynb(string path, string json)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(json);
        // Validate first with System.Text.Json: its errors carry a line and position, the Documents parser's do not.
        var cellTypes = new List<string?>();
        try
        {
            using var document = JsonDocument.Parse(json);
            if (document.RootElement.ValueKind != JsonValueKind.Object
                || !document.RootElement.TryGetProperty("cells", out var cells)
                || cells.ValueKind != JsonValueKind.Array)
            {
                throw new NotebookLoadException(path,
                    $"Notebook '{path}' is not an nbformat notebook: the top level must be an object with a \"cells\" array.");
            }

            CheckFormatVersion(path, document.RootElement.TryGetProperty("nbformat", out var format) ? format.GetRawText() : null,
                format.ValueKind == JsonValueKind.Number && format.TryGetInt32(out var version) ? version : null);
            foreach (var cell in cells.EnumerateArray())
            {
                var number = cellTypes.Count + 1;
                if (cell.ValueKind != JsonValueKind.Object)
                {
                    throw new NotebookLoadException(path, $"Notebook '{path}': cell {number} is not a JSON object but {cell.GetRawText()}.");
                }

                if (!cell.TryGetProperty("cell_type", out var type) || type.ValueKind != JsonValueKind.String)
                {
                    throw new NotebookLoadException(path,
                        $"Notebook '{path}': cell {number} has no \"cell_type\" string (nbformat 4 requires \"code\", \"markdown\" or \"raw\").");
                }

                cellTypes.Add(type.GetString());
            }
        }
        catch (JsonException e)
        {
            var line = e.LineNumber is long l ? (l + 1).ToString() : "?";
            var position = e.BytePositionInLine is long p ? (p + 1).ToString() : "?";
            throw new NotebookLoadException(path,
                $"Notebook '{path}' is not valid JSON (line {line}, position {position}): {FirstSentence(e.Message)}", e);
        }
        catch (ArgumentException e)
        {
            // A lone UTF-16 surrogate in the text (possible through this API, never from a file read as UTF-8).
            throw new NotebookLoadException(path, $"Notebook '{path}' is not valid JSON text: {e.Message}", e);
        }

        InteractiveDocument parsed;
        try
        {
            parsed = JupyterNotebook.Parse(json, KnownKernels());
        }
        catch (Exception e) when (e is not NotebookLoadException)
        {
            throw new NotebookLoadException(path, $"Notebook '{path}' could not be parsed as a notebook: {e.Message}", e);
        }

        return ToCells(parsed, cellTypes.Count == parsed.Elements.Count ? cellTypes : null);
    }

    /// <summary>
    /// Refuses an "nbformat" entry other than the integer 4 (this reader implements nbformat 4 only); a file without
    /// the entry is read as nbformat 4.
    /// </summary>
    /// <param name="path">Name used in the message.</param>
    /// <param name="rawValue">The JSON text of the "nbformat" value, or null when there is none.</param>
    /// <param name="version">The value as an integer, or null when it is not one.</param>
    internal static void CheckFormatVersion(string path, string? rawValue, int? version)
    {
        if (rawValue is not null && version != 4)
        {
            throw new NotebookLoadException(path,
                $"Notebook '{path}' has \"nbformat\": {rawValue}; only nbformat 4 notebooks can be read (convert it with a current Jupyter first).");
        }
    }

    /// <summary>Parses .dib text (cells separated by lines such as <c>#!csharp</c> and <c>#!markdown</c>).</summary>
    /// <param name="path">Name used in error messages.</param>
    /// <param name="text">The .dib content.</param>
    /// <returns>The cells in document order, numbered from 1.</returns>
    /// <exception cref="NotebookLoadException">The text could not be parsed.</exception>
    public static IReadOnlyList<NotebookCell> ParseDib(string path, string text)
    {
        ArgumentNullException.ThrowIfNull(path);
        ArgumentNullException.ThrowIfNull(text);
        InteractiveDocument parsed;
        try
        {
            parsed = CodeSubmission.Parse(text, KnownKernels());
        }
        catch (Exception e)
        {
            throw new NotebookLoadException(path, $"Notebook '{path}' could not be parsed as a .dib file: {e.Message}", e);
        }

        return ToCells(parsed, null);
    }

    private static KernelInfoCollection KnownKernels()
    {
        var kernels = new KernelInfoCollection
        {
            new KernelInfo(CSharpKernelName, "C#", new[] { "c#", "C#" }),
            new KernelInfo(MarkdownKernelName, "Markdown", new[] { "md" }),
            new KernelInfo("fsharp", "F#", new[] { "f#", "F#" }),
            new KernelInfo("pwsh", "PowerShell", new[] { "powershell" }),
        };
        kernels.DefaultKernelName = CSharpKernelName;
        return kernels;
    }

    private static IReadOnlyList<NotebookCell> ToCells(InteractiveDocument document, IReadOnlyList<string?>? cellTypes)
    {
        var cells = new List<NotebookCell>();
        foreach (var element in document.Elements)
        {
            // The Documents parser turns nbformat raw cells into cells without a kernel name; keep them as text.
            if (cellTypes is not null && cellTypes[cells.Count] == "raw")
            {
                cells.Add(new NotebookCell(cells.Count + 1, CellKind.Raw, "raw", element.Contents ?? string.Empty));
                continue;
            }

            // Cells without metadata come back with a null kernel name: in a C# notebook they are C#.
            var language = string.IsNullOrWhiteSpace(element.KernelName) ? CSharpKernelName : element.KernelName!;
            var kind = language switch
            {
                CSharpKernelName => CellKind.Code,
                MarkdownKernelName => CellKind.Markdown,
                _ => CellKind.Unsupported,
            };
            cells.Add(new NotebookCell(cells.Count + 1, kind, language, element.Contents ?? string.Empty));
        }

        return cells;
    }

    private static string FirstSentence(string message)
    {
        var cut = message.IndexOf(" LineNumber:", StringComparison.Ordinal);
        return cut > 0 ? message[..cut].TrimEnd() : message;
    }
}
