namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// A group of chart points drawn alike and listed once in the legend: name, kind, colour (#rrggbb), marker shape and
/// size (in pixels), and the points.
/// </summary>
/// <param name="Name">The legend entry.</param>
/// <param name="Kind">Markers, segments or labels only.</param>
/// <param name="Colour">A colour "#rrggbb".</param>
/// <param name="Shape">The marker shape (ignored for segments and labels).</param>
/// <param name="Size">The marker size in pixels (the line width for segments).</param>
/// <param name="Points">The points in drawing order.</param>
public sealed record ChartTrace(
    string Name,
    ChartTraceKind Kind,
    string Colour,
    ChartMarkerShape Shape,
    double Size,
    IReadOnlyList<ChartPoint> Points)
{
    /// <summary>The "Name: N points" summary.</summary>
    public override string ToString() => $"{Name}: {Points.Count} points";
}
