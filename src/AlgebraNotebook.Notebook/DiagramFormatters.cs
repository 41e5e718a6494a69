using AlgebraNotebook.Display.Diagrams;
using Microsoft.DotNet.Interactive.Formatting;

namespace AlgebraNotebook.Notebook;

/// <summary>
/// Formatters for the diagrams of AlgebraNotebook.Display.Diagrams: <see cref="RootDiagram"/>, <see cref="WeightDiagram"/>
/// and <see cref="ChartModel"/> become interactive charts (text/html) and <see cref="DynkinDrawing"/> an SVG image; each
/// also gets a one-line text/plain summary.
/// </summary>
/// <remarks>
/// The chart library (<see cref="ChartLibrary"/>, about 1.7 MB) travels with the FIRST chart output of the process
/// (one kernel session or one runner execution); later charts reuse window.Plotly. A saved notebook therefore still
/// draws offline as long as that first chart output is kept; the runner's HTML report always carries exactly one copy
/// of its own. <see cref="ResetLibrary"/> makes the next chart carry the library again (for a new document in the same
/// process).
/// </remarks>
public static class DiagramFormatters
{
    private static int _libraryWritten;

    /// <summary>The types that get diagram formatters.</summary>
    public static IReadOnlyList<Type> RegisteredTypes { get; } =
        [typeof(ChartModel), typeof(DynkinDrawing), typeof(RootDiagram), typeof(WeightDiagram)];

    /// <summary>Registers text/html and text/plain formatters (both preferred) for <see cref="RegisteredTypes"/>.</summary>
    public static void Register()
    {
        Formatter.Register<ChartModel>((chart, context) => WriteChart(chart, context), AlgebraNotebookFormatters.HtmlMimeType);
        Formatter.Register<RootDiagram>((diagram, context) => WriteChart(diagram.Chart, context), AlgebraNotebookFormatters.HtmlMimeType);
        Formatter.Register<WeightDiagram>((diagram, context) => WriteChart(diagram.Chart, context), AlgebraNotebookFormatters.HtmlMimeType);
        Formatter.Register<DynkinDrawing>((drawing, context) =>
        {
            context.Writer.Write(drawing.ToHtml());
            return true;
        }, AlgebraNotebookFormatters.HtmlMimeType);
        foreach (var type in RegisteredTypes)
        {
            Formatter.Register(type, (FormatDelegate<object>)WritePlainText, AlgebraNotebookFormatters.PlainTextMimeType);
            Formatter.SetPreferredMimeTypesFor(type, AlgebraNotebookFormatters.HtmlMimeType, AlgebraNotebookFormatters.PlainTextMimeType);
        }
    }

    /// <summary>Makes the next chart output carry a copy of the chart library again.</summary>
    public static void ResetLibrary() => Interlocked.Exchange(ref _libraryWritten, 0);

    private static bool WriteChart(ChartModel chart, FormatContext context)
    {
        var first = Interlocked.Exchange(ref _libraryWritten, 1) == 0;
        context.Writer.Write(chart.ToHtml(includeLibrary: first));
        return true;
    }

    private static bool WritePlainText(object value, FormatContext context)
    {
        context.Writer.Write(value.ToString());
        return true;
    }
}
