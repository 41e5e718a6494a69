using System.Text;
using System.Text.Encodings.Web;
using System.Text.Json;
using System.Text.Unicode;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// The data of one interactive chart, computed by our code and independent of any browser: a title, a caption that
/// states the conventions (projection, colours), the dimension (2 or 3) and the traces. <see cref="ToFigureJson"/>
/// turns it into a plotly.js figure (JSON text) and <see cref="ToHtml"/> into an HTML fragment that draws it.
/// Immutable.
/// </summary>
public sealed class ChartModel
{
    /// <summary>Creates a chart model.</summary>
    /// <param name="title">The title drawn above the chart.</param>
    /// <param name="caption">A sentence or two under the chart stating conventions (escaped in HTML).</param>
    /// <param name="dimensions">2 for a plane chart, 3 for a chart in space.</param>
    /// <param name="traces">The traces, drawn in order.</param>
    /// <exception cref="ExactArgumentException">The dimension is not 2 or 3, a colour is not #rrggbb, or a coordinate
    /// is not finite.</exception>
    public ChartModel(string title, string caption, int dimensions, IReadOnlyList<ChartTrace> traces)
    {
        ArgumentNullException.ThrowIfNull(title);
        ArgumentNullException.ThrowIfNull(caption);
        ArgumentNullException.ThrowIfNull(traces);
        if (dimensions is not (2 or 3))
        {
            throw new ExactArgumentException($"A chart has 2 or 3 dimensions, not {dimensions}.", nameof(dimensions));
        }

        foreach (var trace in traces)
        {
            if (trace.Colour.Length != 7 || trace.Colour[0] != '#' || !trace.Colour.Skip(1).All(Uri.IsHexDigit))
            {
                throw new ExactArgumentException($"The colour '{trace.Colour}' of trace '{trace.Name}' is not of the form #rrggbb.", nameof(traces));
            }

            var bad = trace.Points.FirstOrDefault(p => !double.IsFinite(p.X) || !double.IsFinite(p.Y) || !double.IsFinite(p.Z));
            if (bad is not null)
            {
                throw new ExactArgumentException($"Trace '{trace.Name}' has a point with a coordinate that is not finite: ({bad.X}, {bad.Y}, {bad.Z}).", nameof(traces));
            }
        }

        Title = title;
        Caption = caption;
        Dimensions = dimensions;
        Traces = traces.ToArray();
    }

    // Non-ASCII text (Greek letters, subscripts) stays as UTF-8; HTML-sensitive characters (<, >, &, quotes) are still escaped.
    internal static readonly JsonWriterOptions WriterOptions = new() { Encoder = JavaScriptEncoder.Create(UnicodeRanges.All) };

    /// <summary>The title.</summary>
    public string Title { get; }

    /// <summary>The caption stating conventions.</summary>
    public string Caption { get; }

    /// <summary>2 or 3.</summary>
    public int Dimensions { get; }

    /// <summary>The traces in drawing order.</summary>
    public IReadOnlyList<ChartTrace> Traces { get; }

    /// <summary>
    /// The plotly.js figure as JSON text: {"data": [...], "layout": {...}, "algebranotebook": {title, caption,
    /// dimensions}, "config": {...}} (plotly.js reads data, layout and config; the middle object is ours). Coordinates are rounded to
    /// 5 decimals; 2D charts keep equal scales on both axes, 3D charts use the data's own aspect. Characters that could
    /// end a script element or an attribute (&lt;, &gt;, &amp;, quotes) are escaped as \uXXXX; other text stays UTF-8.
    /// </summary>
    public string ToFigureJson()
    {
        using var stream = new MemoryStream();
        using (var json = new Utf8JsonWriter(stream, WriterOptions))
        {
            json.WriteStartObject();
            json.WriteStartArray("data");
            foreach (var trace in Traces)
            {
                WriteTrace(json, trace);
            }

            json.WriteEndArray();
            WriteLayout(json);
            json.WriteStartObject(ChartFragment.MetadataProperty);
            json.WriteString("title", Title);
            json.WriteString("caption", Caption);
            json.WriteNumber("dimensions", Dimensions);
            json.WriteEndObject();
            json.WriteStartObject("config");
            json.WriteBoolean("displaylogo", false);
            json.WriteBoolean("responsive", true);
            json.WriteEndObject();
            json.WriteEndObject();
        }

        return Encoding.UTF8.GetString(stream.ToArray());
    }

    /// <summary>
    /// An HTML fragment that draws the chart (see <see cref="ChartFragment"/>): a &lt;figure&gt; holding the chart
    /// element (class <see cref="ChartLibrary.ChartClass"/>, with a short text shown until the chart is drawn), the
    /// caption, the figure JSON as data, and an inline script that draws it at once when window.Plotly exists and
    /// otherwise waits for <see cref="ChartLibrary.ScriptElement"/>. With <paramref name="includeLibrary"/> the library
    /// element comes first.
    /// </summary>
    /// <param name="includeLibrary">Whether to put a copy of the chart library in front of the chart.</param>
    public string ToHtml(bool includeLibrary)
    {
        var fragment = ChartFragment.Write(ToFigureJson(), Title, Caption, Dimensions);
        return includeLibrary ? ChartLibrary.ScriptElement + "\n" + fragment : fragment;
    }

    /// <summary>The title, dimension and trace summary, e.g. "Roots of G2 (2D): long roots: 6 points; short roots: 6 points".</summary>
    public override string ToString() =>
        $"{Title} ({Dimensions}D): {string.Join("; ", Traces.Select(t => t.ToString()))}";

    private void WriteTrace(Utf8JsonWriter json, ChartTrace trace)
    {
        json.WriteStartObject();
        json.WriteString("type", Dimensions == 3 ? "scatter3d" : "scatter");
        json.WriteString("name", trace.Name);
        json.WriteString("mode", trace.Kind switch
        {
            ChartTraceKind.Segments => "lines",
            ChartTraceKind.Labels => "text",
            _ => trace.Points.Any(p => p.Label.Length > 0) ? "markers+text" : "markers",
        });
        var segments = trace.Kind == ChartTraceKind.Segments;
        WriteCoordinates(json, "x", trace, p => p.X, segments);
        WriteCoordinates(json, "y", trace, p => p.Y, segments);
        if (Dimensions == 3)
        {
            WriteCoordinates(json, "z", trace, p => p.Z, segments);
        }

        if (segments)
        {
            json.WriteString("hoverinfo", "skip");
            json.WriteStartObject("line");
            json.WriteString("color", trace.Colour);
            json.WriteNumber("width", trace.Size);
            json.WriteString("dash", "dash");
            json.WriteEndObject();
        }
        else
        {
            if (trace.Points.Any(p => p.Label.Length > 0))
            {
                json.WriteStartArray("text");
                foreach (var point in trace.Points)
                {
                    json.WriteStringValue(point.Label);
                }

                json.WriteEndArray();
                json.WriteString("textposition", trace.Kind == ChartTraceKind.Labels ? "middle center" : "top right");
                json.WriteStartObject("textfont");
                json.WriteString("color", trace.Colour);
                json.WriteNumber("size", 12);
                json.WriteEndObject();
            }

            json.WriteStartArray("hovertext");
            foreach (var point in trace.Points)
            {
                json.WriteStringValue(point.Hover.Replace("\n", "<br>", StringComparison.Ordinal));
            }

            json.WriteEndArray();
            json.WriteString("hoverinfo", "text");
            if (trace.Kind == ChartTraceKind.Markers)
            {
                json.WriteStartObject("marker");
                var ring = trace.Shape == ChartMarkerShape.Ring;
                json.WriteString("symbol", ShapeName(trace.Shape));
                json.WriteNumber("size", trace.Size);
                json.WriteString("color", trace.Colour);
                json.WriteStartObject("line");
                json.WriteString("color", ring ? trace.Colour : "#ffffff");
                json.WriteNumber("width", ring ? 2 : 1);
                json.WriteEndObject();
                json.WriteEndObject();
            }
        }

        json.WriteEndObject();
    }

    private static void WriteCoordinates(Utf8JsonWriter json, string name, ChartTrace trace, Func<ChartPoint, double> pick, bool segments)
    {
        json.WriteStartArray(name);
        for (var i = 0; i < trace.Points.Count; i++)
        {
            json.WriteNumberValue(Math.Round(pick(trace.Points[i]), 5));
            if (segments && i % 2 == 1)
            {
                json.WriteNullValue();
            }
        }

        json.WriteEndArray();
    }

    private void WriteLayout(Utf8JsonWriter json)
    {
        json.WriteStartObject("layout");
        json.WriteStartObject("title");
        json.WriteString("text", Title);
        json.WriteEndObject();
        json.WriteString("hovermode", "closest");
        json.WriteString("paper_bgcolor", "#ffffff");
        json.WriteString("plot_bgcolor", "#ffffff");
        json.WriteStartObject("legend");
        json.WriteString("orientation", "h");
        json.WriteEndObject();
        json.WriteStartObject("margin");
        json.WriteNumber("l", 30);
        json.WriteNumber("r", 30);
        json.WriteNumber("t", 50);
        json.WriteNumber("b", 30);
        json.WriteEndObject();
        if (Dimensions == 2)
        {
            WriteAxis(json, "xaxis", null);
            WriteAxis(json, "yaxis", "x");
        }
        else
        {
            json.WriteStartObject("scene");
            json.WriteString("aspectmode", "data");
            foreach (var axis in new[] { "xaxis", "yaxis", "zaxis" })
            {
                json.WriteStartObject(axis);
                json.WriteBoolean("showticklabels", false);
                json.WriteString("title", string.Empty);
                json.WriteString("gridcolor", "#e6e3da");
                json.WriteEndObject();
            }

            json.WriteEndObject();
        }

        json.WriteEndObject();
    }

    private static void WriteAxis(Utf8JsonWriter json, string name, string? anchor)
    {
        json.WriteStartObject(name);
        json.WriteBoolean("showticklabels", false);
        json.WriteBoolean("showgrid", false);
        json.WriteBoolean("zeroline", true);
        json.WriteString("zerolinecolor", "#e6e3da");
        if (anchor is not null)
        {
            json.WriteString("scaleanchor", anchor);
            json.WriteNumber("scaleratio", 1);
        }

        json.WriteEndObject();
    }

    private static string ShapeName(ChartMarkerShape shape) => shape switch
    {
        ChartMarkerShape.Ring => "circle-open",
        ChartMarkerShape.Diamond => "diamond",
        ChartMarkerShape.Square => "square",
        ChartMarkerShape.Cross => "cross",
        _ => "circle",
    };
}
