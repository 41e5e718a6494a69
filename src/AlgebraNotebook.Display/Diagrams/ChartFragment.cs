using System.Text;
using System.Text.Json;
using AlgebraNotebook.Display.Rendering;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// The HTML of a chart: &lt;figure class="algebranotebook-figure"&gt; with the chart element, the caption, the
/// figure JSON in a &lt;script type="application/json"&gt; data element and a fixed drawing script. Because the
/// figure is plain data, a chart stored in a notebook can be drawn again safely: <see cref="Rebuild"/> parses the data
/// element of stored HTML as JSON and writes a fresh fragment, discarding any other markup.
/// </summary>
public static class ChartFragment
{
    /// <summary>The class of the figure element.</summary>
    public const string FigureClass = "algebranotebook-figure";

    /// <summary>The class of the data element holding the figure JSON.</summary>
    public const string DataClass = "algebranotebook-figure-data";

    /// <summary>The property of the figure JSON that holds our own metadata (title, caption, dimensions).</summary>
    public const string MetadataProperty = "algebranotebook";

    // Finds its own figure through document.currentScript, so several charts in one page need no ids.
    private const string DrawScript =
        "<script>(function(s){var box=s.parentNode,el=box.querySelector('." + ChartLibrary.ChartClass + "');" +
        "var fig=JSON.parse(box.querySelector('." + DataClass + "').textContent);" +
        "function draw(){el.textContent='';Plotly.newPlot(el,fig.data,fig.layout,fig.config);}" +
        "if(window.Plotly){draw();}else{(window.algebraNotebookPending=window.algebraNotebookPending||[]).push(draw);}" +
        "})(document.currentScript);</script>";

    /// <summary>Writes the fragment for a figure JSON text.</summary>
    internal static string Write(string figureJson, string title, string caption, int dimensions)
    {
        // In JSON text these characters occur only inside strings, where \uXXXX means the same; escaped, the data
        // element cannot be closed or turned into markup.
        figureJson = figureJson.Replace("<", "\\u003C", StringComparison.Ordinal)
            .Replace(">", "\\u003E", StringComparison.Ordinal)
            .Replace("&", "\\u0026", StringComparison.Ordinal);
        var html = new StringBuilder(figureJson.Length + 1024);
        html.Append("<figure class=\"").Append(FigureClass).Append("\" style=\"margin:.5rem 0\">")
            .Append("<div class=\"").Append(ChartLibrary.ChartClass).Append("\" style=\"width:100%;max-width:720px;height:")
            .Append(dimensions == 3 ? "560" : "520").Append("px\">");
        XmlText.Append(html, $"Chart \"{title}\": drawn by the chart library bundled with AlgebraNotebook once scripts run in this page. " +
            "If this text stays, scripts are off here (an untrusted notebook, for example) or the page holds no copy of the library yet: " +
            "running any chart cell in a new session adds one, and every waiting chart is then drawn.");
        html.Append("</div><figcaption style=\"font-size:.85em;color:#4a4f55\">");
        XmlText.Append(html, caption);
        html.Append("</figcaption><script type=\"application/json\" class=\"").Append(DataClass).Append("\">")
            .Append(figureJson).Append("</script>").Append(DrawScript).Append("</figure>");
        return html.ToString();
    }

    /// <summary>
    /// Rebuilds a chart fragment from stored HTML (for example a notebook output written by someone else): the text of
    /// the first data element (class <see cref="DataClass"/>) must parse as a JSON object with a "data" array and a
    /// "layout" object; it is re-serialised (so no markup can survive in it) and wrapped in a fresh fragment. Everything
    /// else in the stored HTML is ignored. Returns null when the HTML holds no such figure.
    /// </summary>
    /// <param name="storedHtml">The stored text/html output.</param>
    /// <exception cref="ArgumentNullException">The text is null.</exception>
    public static string? Rebuild(string storedHtml)
    {
        ArgumentNullException.ThrowIfNull(storedHtml);
        var open = "<script type=\"application/json\" class=\"" + DataClass + "\">";
        var start = storedHtml.IndexOf(open, StringComparison.Ordinal);
        if (start < 0)
        {
            return null;
        }

        start += open.Length;
        var end = storedHtml.IndexOf("</script>", start, StringComparison.OrdinalIgnoreCase);
        if (end < 0)
        {
            return null;
        }

        try
        {
            using var document = JsonDocument.Parse(storedHtml.AsMemory(start, end - start));
            var root = document.RootElement;
            if (root.ValueKind != JsonValueKind.Object
                || !root.TryGetProperty("data", out var data) || data.ValueKind != JsonValueKind.Array
                || !root.TryGetProperty("layout", out var layout) || layout.ValueKind != JsonValueKind.Object)
            {
                return null;
            }

            var title = "chart";
            var caption = string.Empty;
            var dimensions = 2;
            if (root.TryGetProperty(MetadataProperty, out var meta) && meta.ValueKind == JsonValueKind.Object)
            {
                title = meta.TryGetProperty("title", out var t) && t.ValueKind == JsonValueKind.String ? t.GetString()! : title;
                caption = meta.TryGetProperty("caption", out var c) && c.ValueKind == JsonValueKind.String ? c.GetString()! : caption;
                dimensions = meta.TryGetProperty("dimensions", out var d) && d.TryGetInt32(out var n) && n == 3 ? 3 : 2;
            }

            using var stream = new MemoryStream();
            using (var writer = new Utf8JsonWriter(stream, ChartModel.WriterOptions))
            {
                root.WriteTo(writer);
            }

            return Write(Encoding.UTF8.GetString(stream.ToArray()), title, caption, dimensions);
        }
        catch (JsonException)
        {
            return null;
        }
    }
}
