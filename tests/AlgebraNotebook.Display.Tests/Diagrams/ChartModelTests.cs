using System.Text.Json;
using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class ChartModelTests
{
    [Fact]
    public void Figure_json_has_one_trace_per_model_trace_with_one_coordinate_per_point()
    {
        // plotly.js figure format: {data: [traces with x, y (, z)], layout} (plotly.js reference, common practice).
        var chart = RootDiagram.Of("B2", chamberWalls: true).Chart;
        using var json = JsonDocument.Parse(chart.ToFigureJson());
        var data = json.RootElement.GetProperty("data");
        Assert.Equal(chart.Traces.Count, data.GetArrayLength());
        for (var i = 0; i < chart.Traces.Count; i++)
        {
            var trace = chart.Traces[i];
            var x = data[i].GetProperty("x");
            var expected = trace.Kind == ChartTraceKind.Segments ? trace.Points.Count * 3 / 2 : trace.Points.Count;
            Assert.Equal(expected, x.GetArrayLength());
            Assert.Equal("scatter", data[i].GetProperty("type").GetString());
        }

        Assert.Equal("x", json.RootElement.GetProperty("layout").GetProperty("yaxis").GetProperty("scaleanchor").GetString());
    }

    [Fact]
    public void Three_dimensional_charts_use_scatter3d_with_z_coordinates()
    {
        var chart = RootDiagram.Of("A3").Chart;
        using var json = JsonDocument.Parse(chart.ToFigureJson());
        var first = json.RootElement.GetProperty("data")[0];
        Assert.Equal("scatter3d", first.GetProperty("type").GetString());
        Assert.Equal(first.GetProperty("x").GetArrayLength(), first.GetProperty("z").GetArrayLength());
    }

    [Fact]
    public void Hover_text_survives_the_json_with_line_breaks()
    {
        var chart = RootDiagram.Of("G2").Chart;
        using var json = JsonDocument.Parse(chart.ToFigureJson());
        var hovers = json.RootElement.GetProperty("data").EnumerateArray()
            .SelectMany(t => t.GetProperty("hovertext").EnumerateArray()).Select(h => h.GetString()!).ToArray();
        Assert.Contains(hovers, h => h.Contains("root 3α₁ + 2α₂<br>simple-root coordinates [3, 2]<br>|β|² = 2 (long)"));
    }

    [Fact]
    public void Html_cannot_be_closed_early_by_text_in_the_data()
    {
        var trace = new ChartTrace("</script><b>", ChartTraceKind.Markers, "#123456", ChartMarkerShape.Disc, 5,
            [new ChartPoint(0, 0, 0, "</script>", "a & b < c")]);
        var html = new ChartModel("t</figure>", "caption <i>", 2, [trace]).ToHtml(includeLibrary: false);
        Assert.Equal(2, CountOf(html, "</script>")); // the data element and the drawing script, nothing from the data
        Assert.DoesNotContain("<i>", html);
        Assert.DoesNotContain("<b>", html);
        Assert.Contains("caption &lt;i&gt;", html);
    }

    [Fact]
    public void Html_carries_the_library_only_when_asked()
    {
        var chart = RootDiagram.Of("A2").Chart;
        Assert.DoesNotContain(ChartLibrary.MarkerAttribute, chart.ToHtml(includeLibrary: false));
        Assert.StartsWith("<script " + ChartLibrary.MarkerAttribute, chart.ToHtml(includeLibrary: true));
        Assert.True(ChartLibrary.ContainsChart(chart.ToHtml(includeLibrary: false)));
    }

    [Fact]
    public void E8_root_diagram_html_stays_under_fifty_kilobytes_without_the_library()
    {
        // Size budget of a chart beyond the shared library copy (project target, Diagrams/README.md).
        var bytes = System.Text.Encoding.UTF8.GetByteCount(RootDiagram.Of("E8").ToHtml(includeLibrary: false));
        Assert.True(bytes < 50_000, $"E8 root diagram fragment is {bytes} bytes.");
    }

    [Theory]
    [InlineData(1)]
    [InlineData(4)]
    public void Dimensions_other_than_two_or_three_are_refused(int dimensions)
    {
        var error = Assert.Throws<ExactArgumentException>(() => new ChartModel("t", "c", dimensions, []));
        Assert.Contains(dimensions.ToString(), error.Message);
    }

    [Fact]
    public void Bad_colours_and_infinite_coordinates_are_refused_naming_the_trace()
    {
        var colour = Assert.Throws<ExactArgumentException>(() => new ChartModel("t", "c", 2,
            [new ChartTrace("mine", ChartTraceKind.Markers, "red", ChartMarkerShape.Disc, 5, [])]));
        Assert.Contains("'red'", colour.Message);
        Assert.Contains("mine", colour.Message);
        var point = Assert.Throws<ExactArgumentException>(() => new ChartModel("t", "c", 2,
            [new ChartTrace("mine", ChartTraceKind.Markers, "#000000", ChartMarkerShape.Disc, 5, [new ChartPoint(double.NaN, 0, 0, "", "")])]));
        Assert.Contains("not finite", point.Message);
    }

    private static int CountOf(string text, string part)
    {
        var count = 0;
        for (var at = text.IndexOf(part, StringComparison.Ordinal); at >= 0; at = text.IndexOf(part, at + 1, StringComparison.Ordinal))
        {
            count++;
        }

        return count;
    }
}
