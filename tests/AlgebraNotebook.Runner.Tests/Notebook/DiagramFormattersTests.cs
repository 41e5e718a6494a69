using AlgebraNotebook.Display.Diagrams;
using AlgebraNotebook.Notebook;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Runner.Tests.Notebook;

[Collection(GlobalStateCollection.Name)]
public class DiagramFormattersTests
{
    public DiagramFormattersTests()
    {
        AlgebraNotebookFormatters.Register();
    }

    [Fact]
    public void The_first_chart_of_a_session_carries_the_library_and_later_ones_reuse_it()
    {
        DiagramFormatters.ResetLibrary();
        var first = RootDiagram.Of("G2").ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        var second = RootDiagram.Of("B2").ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType);
        Assert.StartsWith("<script " + ChartLibrary.MarkerAttribute, first);
        Assert.DoesNotContain(ChartLibrary.MarkerAttribute, second);
        Assert.Equal(RootDiagram.Of("B2").ToHtml(includeLibrary: false), second);
        DiagramFormatters.ResetLibrary();
        Assert.Contains(ChartLibrary.MarkerAttribute, RootDiagram.Of("A2").ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
    }

    [Fact]
    public void Diagrams_get_html_and_plain_text()
    {
        foreach (var type in DiagramFormatters.RegisteredTypes)
        {
            Assert.Equal(new[] { "text/html", "text/plain" }, Formatter.GetPreferredMimeTypesFor(type));
        }

        var drawing = DynkinDrawing.Of("F4");
        Assert.Equal(drawing.ToHtml(), drawing.ToDisplayString(AlgebraNotebookFormatters.HtmlMimeType));
        Assert.Equal("F4: 1-2, 2=>3, 3-4", drawing.ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType));
        Assert.Equal("Root diagram of G2: 12 roots in the plane", RootDiagram.Of("G2").ToDisplayString(AlgebraNotebookFormatters.PlainTextMimeType));
    }
}
