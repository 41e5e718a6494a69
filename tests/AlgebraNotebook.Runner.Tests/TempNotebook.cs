using System.Text.Json;

namespace AlgebraNotebook.Runner.Tests;

/// <summary>Writes notebooks into a fresh temporary folder that is deleted on dispose.</summary>
internal sealed class TempNotebook : IDisposable
{
    public TempNotebook()
    {
        Folder = Path.Combine(Path.GetTempPath(), "an-runner-tests-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(Folder);
    }

    public string Folder { get; }

    public string WriteText(string fileName, string content)
    {
        var path = Path.Combine(Folder, fileName);
        File.WriteAllText(path, content);
        return path;
    }

    /// <summary>An nbformat 4 C# notebook; each cell is (cell_type, source, language or null for no metadata).</summary>
    public string WriteIpynb(string fileName, params (string Type, string Source, string? Language)[] cells)
    {
        var json = new
        {
            cells = cells.Select((c, i) => new Dictionary<string, object?>
            {
                ["cell_type"] = c.Type,
                ["id"] = $"cell-{i + 1}",
                ["metadata"] = c.Language is null
                    ? new Dictionary<string, object>()
                    : new Dictionary<string, object>
                    {
                        ["dotnet_interactive"] = new Dictionary<string, string> { ["language"] = c.Language },
                        ["polyglot_notebook"] = new Dictionary<string, string> { ["kernelName"] = c.Language },
                    },
                ["source"] = c.Source,
                ["outputs"] = c.Type == "code" ? Array.Empty<object>() : null,
                ["execution_count"] = null,
            }.Where(p => p.Value is not null || p.Key == "execution_count" && c.Type == "code")
             .ToDictionary(p => p.Key, p => p.Value)),
            metadata = new
            {
                kernelspec = new { display_name = ".NET (C#)", language = "C#", name = ".net-csharp" },
                language_info = new { name = "csharp" },
            },
            nbformat = 4,
            nbformat_minor = 5,
        };
        return WriteText(fileName, JsonSerializer.Serialize(json, new JsonSerializerOptions { WriteIndented = true }));
    }

    public string WriteJson(string fileName, System.Text.Json.Nodes.JsonNode json) =>
        WriteText(fileName, json.ToJsonString(new JsonSerializerOptions { WriteIndented = true }));

    public void Dispose()
    {
        try
        {
            Directory.Delete(Folder, recursive: true);
        }
        catch (IOException)
        {
            // A leftover temp folder is harmless.
        }
    }
}
