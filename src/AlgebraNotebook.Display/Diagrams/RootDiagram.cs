using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// An interactive picture of a root system: rank 2 in the plane, rank 3 in space, simple types of rank 4 or more
/// projected to the Coxeter plane (see the caption of <see cref="Chart"/>). Long and short roots have their own colours,
/// the simple roots are larger diamonds labelled α₁, α₂, ...; hovering over a root shows it in simple-root
/// coordinates (up to rank 3 also written out as a combination) with its squared length (long roots 2) and height. Optionally (rank 2 only) the walls of the Weyl
/// chambers, the lines orthogonal to the simple roots, are drawn dashed, with the dominant chamber labelled.
/// </summary>
/// <example><c>RootDiagram.Of("G2", chamberWalls: true)</c></example>
public sealed class RootDiagram
{
    private RootDiagram(RootSystem system, ChartModel chart)
    {
        System = system;
        Chart = chart;
    }

    /// <summary>The root system drawn.</summary>
    public RootSystem System { get; }

    /// <summary>The chart data (points, labels, hover texts, colours), testable without a browser.</summary>
    public ChartModel Chart { get; }

    /// <summary>The diagram of a Cartan type given as text, e.g. "G2", "A3", "E8" (see <see cref="CartanType.Parse"/>).</summary>
    /// <param name="cartanType">The type, e.g. "B3" or "A1+A1".</param>
    /// <param name="chamberWalls">Draw the walls of the Weyl chambers (rank 2 only).</param>
    /// <exception cref="ExactArgumentException">The text is not a Cartan type, walls were asked for outside rank 2, or
    /// a type of rank 4 or more is not simple.</exception>
    public static RootDiagram Of(string cartanType, bool chamberWalls = false)
    {
        ArgumentNullException.ThrowIfNull(cartanType);
        return Of(RootSystem.Of(cartanType), chamberWalls);
    }

    /// <summary>The diagram of a root system.</summary>
    /// <param name="system">The root system.</param>
    /// <param name="chamberWalls">Draw the walls of the Weyl chambers (rank 2 only).</param>
    /// <exception cref="ExactArgumentException">Walls were asked for outside rank 2, or a system of rank 4 or more is
    /// not simple.</exception>
    public static RootDiagram Of(RootSystem system, bool chamberWalls = false)
    {
        ArgumentNullException.ThrowIfNull(system);
        if (chamberWalls && system.Rank != 2)
        {
            throw new ExactArgumentException(
                $"Chamber walls are drawn for rank 2 only; {system.Type} has rank {system.Rank}.", nameof(chamberWalls));
        }

        var geometry = DiagramGeometry.Of(system);
        var longRoots = new List<ChartPoint>();
        var shortRoots = new List<ChartPoint>();
        var simpleRoots = new List<ChartPoint>();
        foreach (var root in system.Roots)
        {
            var coordinates = root.SimpleRootCoordinates;
            var place = geometry.Place(coordinates.Select(c => (double)c).ToArray());
            var label = root.IsSimple ? DiagramText.SimpleRoot(Array.IndexOf(coordinates, 1) + 1) : string.Empty;
            // Up to rank 3 the root is also written out as a combination; beyond, the coordinates alone keep charts small.
            var lines = new List<string>();
            if (system.Rank <= 3)
            {
                lines.Add($"root {DiagramText.Combination(coordinates)}");
            }

            lines.Add($"simple-root coordinates [{string.Join(", ", coordinates)}]");
            lines.Add($"|β|² = {root.LengthSquared} ({(root.IsLong ? "long" : "short")}), height {root.Height}");
            var hover = string.Join("\n", lines);
            var point = new ChartPoint(place[0], place[1], place.Length > 2 ? place[2] : 0, label, hover);
            (root.IsSimple ? simpleRoots : root.IsLong ? longRoots : shortRoots).Add(point);
        }

        var traces = new List<ChartTrace>
        {
            new(system.IsSimplyLaced ? "roots" : "long roots", ChartTraceKind.Markers, DiagramColours.LongRoot, ChartMarkerShape.Disc, 9, longRoots),
        };
        if (shortRoots.Count > 0)
        {
            traces.Add(new ChartTrace("short roots", ChartTraceKind.Markers, DiagramColours.ShortRoot, ChartMarkerShape.Disc, 9, shortRoots));
        }

        traces.Add(new ChartTrace("simple roots", ChartTraceKind.Markers, DiagramColours.SimpleRoot, ChartMarkerShape.Diamond, 13, simpleRoots));
        if (chamberWalls)
        {
            traces.AddRange(Walls(system, geometry, longRoots.Concat(shortRoots).Concat(simpleRoots)));
        }

        var caption = $"{system.Type}: {system.Roots.Count} roots ({(system.IsSimplyLaced ? "all long" : "long blue, short rust")}, simple roots as diamonds; " +
            $"squared lengths with long roots 2, Bourbaki numbering). {geometry.Description}";
        var title = $"Roots of {system.Type}";
        return new RootDiagram(system, new ChartModel(title, caption, geometry.Dimensions, traces));
    }

    /// <summary>The HTML fragment that draws the diagram (see <see cref="ChartModel.ToHtml"/>).</summary>
    /// <param name="includeLibrary">Whether to put a copy of the chart library in front of the chart.</param>
    public string ToHtml(bool includeLibrary = true) => Chart.ToHtml(includeLibrary);

    /// <summary>For example "Root diagram of G2: 12 roots in the plane".</summary>
    public override string ToString() =>
        $"Root diagram of {System.Type}: {System.Roots.Count} roots " +
        (System.Rank >= 4 ? "projected to the Coxeter plane" : Chart.Dimensions == 3 ? "in space" : "in the plane");

    private static IEnumerable<ChartTrace> Walls(RootSystem system, DiagramGeometry geometry, IEnumerable<ChartPoint> roots)
    {
        var radius = 1.15 * roots.Max(p => Math.Sqrt(p.X * p.X + p.Y * p.Y));
        var segments = new List<ChartPoint>();
        for (var node = 1; node <= system.Rank; node++)
        {
            var unit = new double[system.Rank];
            unit[node - 1] = 1;
            var alpha = geometry.Place(unit);
            var length = Math.Sqrt(alpha[0] * alpha[0] + alpha[1] * alpha[1]);
            var (dx, dy) = (-alpha[1] / length * radius, alpha[0] / length * radius);
            var hover = $"wall orthogonal to {DiagramText.SimpleRoot(node)}";
            segments.Add(new ChartPoint(-dx, -dy, 0, string.Empty, hover));
            segments.Add(new ChartPoint(dx, dy, 0, string.Empty, hover));
        }

        yield return new ChartTrace("chamber walls", ChartTraceKind.Segments, DiagramColours.Wall, ChartMarkerShape.Disc, 1.5, segments);
        var rho = geometry.Place(system, system.Rho);
        var rhoLength = Math.Sqrt(rho[0] * rho[0] + rho[1] * rho[1]);
        var at = 0.6 * radius / rhoLength;
        yield return new ChartTrace("dominant chamber", ChartTraceKind.Labels, DiagramColours.Wall, ChartMarkerShape.Disc, 1,
            [new ChartPoint(rho[0] * at, rho[1] * at, 0, "dominant chamber",
                "the dominant Weyl chamber: (λ, α_i) ≥ 0 for every simple root; ρ points into it")]);
    }
}
