namespace AlgebraNotebook.Display.Diagrams;

/// <summary>How a trace's points are drawn.</summary>
public enum ChartTraceKind
{
    /// <summary>One marker per point, with its label (if any) beside it.</summary>
    Markers,

    /// <summary>Straight segments between consecutive pairs of points (points 0-1, 2-3, ...), dashed; no markers.</summary>
    Segments,

    /// <summary>Only the labels, written at the points; no markers.</summary>
    Labels,
}
