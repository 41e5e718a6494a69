using System.Reflection;
using System.Text;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// The chart library that draws <see cref="ChartModel"/> figures in a browser: plotly.js, the "gl3d" distribution
/// (scatter and scatter3d traces among others), version <see cref="Version"/>, from the npm package
/// plotly.js-gl3d-dist-min under the MIT licence (<see cref="License"/>). It is embedded in this assembly, so nothing
/// is ever fetched from a network.
/// </summary>
/// <remarks>
/// A document needs the library once. <see cref="ScriptElement"/> is an inline script that defines window.Plotly
/// (unless a copy already did) and then draws every chart that was waiting for it; chart fragments
/// (<see cref="ChartModel.ToHtml"/>) draw at once when window.Plotly exists and otherwise queue themselves. A document
/// writer that collects outputs (an HTML report) removes the copies found in its outputs with
/// <see cref="RemoveCopies"/> and puts one copy before the first chart.
/// Measured: the library draws under the Content-Security-Policy
/// <c>default-src 'none'; script-src 'unsafe-inline'; style-src 'unsafe-inline'; img-src data:; font-src data:</c>,
/// 2D charts as SVG and 3D charts on a WebGL canvas.
/// </remarks>
public static class ChartLibrary
{
    /// <summary>The plotly.js version embedded.</summary>
    public const string Version = "4.1.1";

    /// <summary>Where the embedded file comes from.</summary>
    public const string Origin = "npm package plotly.js-gl3d-dist-min 4.1.1 (file plotly-gl3d.min.js), MIT licence";

    /// <summary>The attribute that marks the library's script element: data-algebranotebook-library="plotly.js VERSION".</summary>
    public const string MarkerAttribute = "data-algebranotebook-library";

    /// <summary>The class of the element that holds a chart (see <see cref="ChartModel.ToHtml"/>).</summary>
    public const string ChartClass = "algebranotebook-chart";

    private const string DrainPending =
        "(window.algebraNotebookPending||[]).splice(0).forEach(function(draw){draw();});";

    private static readonly Lazy<string> Script = new(() => Read("AlgebraNotebook.Display.Diagrams.plotly-gl3d.min.js"));

    private static readonly Lazy<string> LicenseText = new(() => Read("AlgebraNotebook.Display.Diagrams.plotly-LICENSE.txt"));

    private static readonly Lazy<string> Element = new(() =>
    {
        // The file contains no "</script" (checked by a test); a defensive rewrite keeps the element closed anyway.
        var body = Script.Value.Replace("</script", "<\\/script", StringComparison.OrdinalIgnoreCase);
        return new StringBuilder(body.Length + 256)
            .Append("<script ").Append(MarkerAttribute).Append("=\"plotly.js ").Append(Version).Append("\">\n")
            .Append("if (!window.Plotly) {\n").Append(body).Append("\n}\n")
            .Append(DrainPending).Append("\n</script>")
            .ToString();
    });

    /// <summary>The minified plotly.js source.</summary>
    public static string JavaScript => Script.Value;

    /// <summary>The MIT licence text of plotly.js.</summary>
    public static string License => LicenseText.Value;

    /// <summary>
    /// The library as one inline &lt;script&gt; element carrying <see cref="MarkerAttribute"/>; loading it twice in a
    /// page is harmless (the second copy is skipped).
    /// </summary>
    public static string ScriptElement => Element.Value;

    /// <summary>True when the HTML contains a chart fragment (an element of class <see cref="ChartClass"/>).</summary>
    /// <exception cref="ArgumentNullException">The html is null.</exception>
    public static bool ContainsChart(string html)
    {
        ArgumentNullException.ThrowIfNull(html);
        return html.Contains("class=\"" + ChartClass + "\"", StringComparison.Ordinal);
    }

    /// <summary>
    /// Removes every library script element (one that starts with &lt;script data-algebranotebook-library=), with the
    /// line break that follows it, from the HTML, leaving everything else as it was; used by document writers that place a single copy themselves.
    /// </summary>
    /// <exception cref="ArgumentNullException">The html is null.</exception>
    public static string RemoveCopies(string html)
    {
        ArgumentNullException.ThrowIfNull(html);
        const string start = "<script " + MarkerAttribute + "=";
        const string end = "</script>";
        var at = html.IndexOf(start, StringComparison.Ordinal);
        if (at < 0)
        {
            return html;
        }

        var result = new StringBuilder(html.Length);
        var from = 0;
        while (at >= 0)
        {
            var close = html.IndexOf(end, at, StringComparison.OrdinalIgnoreCase);
            if (close < 0)
            {
                break;
            }

            result.Append(html, from, at - from);
            from = close + end.Length;
            if (from < html.Length && html[from] == '\n')
            {
                from++;
            }

            at = html.IndexOf(start, from, StringComparison.Ordinal);
        }

        result.Append(html, from, html.Length - from);
        return result.ToString();
    }

    private static string Read(string name)
    {
        using var stream = typeof(ChartLibrary).Assembly.GetManifestResourceStream(name)
            ?? throw new InvalidOperationException($"The resource {name} is missing from {typeof(ChartLibrary).Assembly.GetName().Name}.");
        using var reader = new StreamReader(stream, Encoding.UTF8);
        return reader.ReadToEnd();
    }
}
