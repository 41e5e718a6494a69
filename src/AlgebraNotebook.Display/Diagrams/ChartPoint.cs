namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// One point of a chart: drawing coordinates (double precision, approximate by nature; <see cref="Z"/> is 0 in a 2D
/// chart), the short label written beside it on the chart (empty for none) and the hover text (lines separated by
/// "\n").
/// </summary>
/// <param name="X">Horizontal drawing coordinate.</param>
/// <param name="Y">Vertical drawing coordinate.</param>
/// <param name="Z">Depth coordinate of a 3D chart; 0 in a 2D chart.</param>
/// <param name="Label">Text drawn beside the point (empty for none).</param>
/// <param name="Hover">Text shown when the pointer rests on the point; lines separated by "\n".</param>
public sealed record ChartPoint(double X, double Y, double Z, string Label, string Hover);
