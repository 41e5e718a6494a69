using System.Text.Json;
using AlgebraNotebook.Display.Diagrams;

namespace AlgebraNotebook.Display.Tests.Diagrams;

public class ChartFragmentTests
{
    [Fact]
    public void A_stored_chart_is_rebuilt_to_the_same_fragment()
    {
        var chart = WeightDiagram.Of(AlgebraNotebook.Roots.Representations.IrreducibleRepresentation.Of("A2", 1, 1)).Chart;
        var stored = chart.ToHtml(includeLibrary: true);
        Assert.Equal(chart.ToHtml(includeLibrary: false), ChartFragment.Rebuild(stored));
    }

    [Fact]
    public void Markup_hidden_in_stored_figure_data_does_not_survive_a_rebuild()
    {
        // A hand-made stored output: extra script outside the data element, markup inside a JSON string.
        const string stored = "<script>alert(1)</script><script type=\"application/json\" class=\"algebranotebook-figure-data\">" +
            "{\"data\":[{\"type\":\"scatter\",\"x\":[0],\"y\":[0],\"hovertext\":[\"<img src=x onerror=alert(2)>\"]}],\"layout\":{}," +
            "\"algebranotebook\":{\"title\":\"<b>t</b>\",\"caption\":\"c\",\"dimensions\":2}}</script>";
        var rebuilt = ChartFragment.Rebuild(stored)!;
        Assert.DoesNotContain("alert(1)", rebuilt);
        Assert.DoesNotContain("<img", rebuilt);
        Assert.DoesNotContain("<b>", rebuilt);
        var data = rebuilt[(rebuilt.IndexOf("algebranotebook-figure-data\">", StringComparison.Ordinal) + 29)..];
        using var json = JsonDocument.Parse(data[..data.IndexOf("</script>", StringComparison.Ordinal)]);
        Assert.Equal("<img src=x onerror=alert(2)>", json.RootElement.GetProperty("data")[0].GetProperty("hovertext")[0].GetString());
    }

    [Theory]
    [InlineData("<p>no chart</p>")]
    [InlineData("<script type=\"application/json\" class=\"algebranotebook-figure-data\">not json</script>")]
    [InlineData("<script type=\"application/json\" class=\"algebranotebook-figure-data\">{\"data\":1,\"layout\":{}}</script>")]
    [InlineData("<script type=\"application/json\" class=\"algebranotebook-figure-data\">{\"data\":[]")]
    public void Html_without_a_valid_figure_gives_null(string stored)
    {
        Assert.Null(ChartFragment.Rebuild(stored));
    }
}
