using AlgebraNotebook.Display.Diagrams;

namespace AlgebraNotebook.Display.Tests.Diagrams;

/// <summary>Helpers that read a chart model back for the checks.</summary>
internal static class ChartPoints
{
    public static ChartTrace Trace(ChartModel chart, string name) => chart.Traces.Single(t => t.Name == name);

    public static IEnumerable<ChartPoint> Markers(ChartModel chart) =>
        chart.Traces.Where(t => t.Kind == ChartTraceKind.Markers).SelectMany(t => t.Points);

    public static double Radius(ChartPoint p) => Math.Sqrt(p.X * p.X + p.Y * p.Y + p.Z * p.Z);

    /// <summary>Groups values that agree to within 1e-6, returning the group sizes in increasing order of value.</summary>
    public static int[] Clusters(IEnumerable<double> values)
    {
        var sorted = values.Order().ToArray();
        var sizes = new List<int>();
        for (var i = 0; i < sorted.Length; i++)
        {
            if (i == 0 || sorted[i] - sorted[i - 1] > 1e-6)
            {
                sizes.Add(0);
            }

            sizes[^1]++;
        }

        return sizes.ToArray();
    }
}
