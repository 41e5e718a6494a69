using AlgebraNotebook.Display.Diagrams;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class ChartLibraryTests
{
    [Fact]
    public void The_embedded_library_is_the_stated_plotly_version_and_cannot_close_its_script_element()
    {
        // The file's own header names its version (plotly.js distribution file, common practice).
        Assert.Contains($"plotly.js (gl3d - minified) v{ChartLibrary.Version}", ChartLibrary.JavaScript[..300]);
        Assert.DoesNotContain("</script", ChartLibrary.JavaScript, StringComparison.OrdinalIgnoreCase);
        Assert.Contains("MIT", ChartLibrary.License);
        Assert.True(ChartLibrary.JavaScript.Length > 1_000_000);
    }

    [Fact]
    public void Remove_copies_drops_every_library_element_and_keeps_the_rest()
    {
        var chart = RootDiagram.Of("A2").Chart;
        var withTwo = chart.ToHtml(true) + "<p>between</p>" + chart.ToHtml(true);
        var stripped = ChartLibrary.RemoveCopies(withTwo);
        Assert.DoesNotContain(ChartLibrary.MarkerAttribute, stripped);
        Assert.Equal(chart.ToHtml(false) + "<p>between</p>" + chart.ToHtml(false), stripped);
        Assert.Equal("<p>x</p>", ChartLibrary.RemoveCopies("<p>x</p>"));
    }
}
