using System.Globalization;
using System.Text;
using AlgebraNotebook.Display.Rendering;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Parsing;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Display.Diagrams;

/// <summary>
/// A Dynkin diagram drawn as a standalone SVG image (no script): one circle per simple root with its Bourbaki number
/// beneath, filled for long roots and white for short roots; A_ij A_ji parallel lines between joined nodes; where the
/// two roots have different lengths a chevron on the bond points toward the short root. In an extended diagram the
/// extra node 0 (alpha_0 = -theta) is drawn as a double circle, and the marks (coefficients of the highest root) are
/// written above the nodes. Products of types are drawn one component per row. Each node carries a tooltip
/// (an SVG title) with its number and squared length.
/// </summary>
/// <example><c>DynkinDrawing.Of("F4").ToSvg()</c>, <c>DynkinDrawing.Extended("E8")</c></example>
public sealed class DynkinDrawing
{
    private const double Spacing = 56;
    private const double Radius = 8;
    private const double Margin = 28;
    private const double BondGap = 4;

    private const string FigureStart = "<div class=\"algebranotebook-dynkin-figure\" data-type=\"";

    private readonly IReadOnlyList<int>? _marks;

    private DynkinDrawing(DynkinDiagram diagram, IReadOnlyList<int>? marks, CartanType type)
    {
        Diagram = diagram;
        _marks = marks;
        Type = type;
    }

    /// <summary>The Cartan type drawn.</summary>
    public CartanType Type { get; }

    /// <summary>The diagram drawn (nodes, edges and layout from AlgebraNotebook.Roots).</summary>
    public DynkinDiagram Diagram { get; }

    /// <summary>True for an extended (affine) diagram.</summary>
    public bool IsExtended => _marks is not null;

    /// <summary>The Dynkin diagram of a Cartan type given as text, e.g. "E8", "B3", "G2+A1".</summary>
    /// <param name="cartanType">The type.</param>
    /// <exception cref="ExactArgumentException">The text is not a Cartan type.</exception>
    public static DynkinDrawing Of(string cartanType)
    {
        ArgumentNullException.ThrowIfNull(cartanType);
        return Of(RootSystem.Of(cartanType));
    }

    /// <summary>The Dynkin diagram of a root system.</summary>
    /// <param name="system">The root system.</param>
    public static DynkinDrawing Of(RootSystem system)
    {
        ArgumentNullException.ThrowIfNull(system);
        return new DynkinDrawing(system.Diagram, null, system.Type);
    }

    /// <summary>The extended (affine) Dynkin diagram of a simple type given as text, e.g. "E8" or "C3".</summary>
    /// <param name="cartanType">A simple type.</param>
    /// <exception cref="ExactArgumentException">The text is not a Cartan type, or the type is not simple.</exception>
    public static DynkinDrawing Extended(string cartanType)
    {
        ArgumentNullException.ThrowIfNull(cartanType);
        return Extended(RootSystem.Of(cartanType));
    }

    /// <summary>The extended (affine) Dynkin diagram of a simple root system.</summary>
    /// <param name="system">A simple root system.</param>
    /// <exception cref="ExactArgumentException">The system is not simple.</exception>
    public static DynkinDrawing Extended(RootSystem system)
    {
        ArgumentNullException.ThrowIfNull(system);
        var extended = system.ExtendedDiagram;
        return new DynkinDrawing(extended.Diagram, extended.Marks, system.Type);
    }

    /// <summary>
    /// The SVG image: an &lt;svg&gt; element with explicit width, height and viewBox; all text escaped. Coordinates in
    /// pixels, rounded to one decimal.
    /// </summary>
    public string ToSvg()
    {
        var nodes = Diagram.Nodes;
        var minColumn = nodes.Min(n => n.Column);
        var maxColumn = nodes.Max(n => n.Column);
        var top = Margin + 22;
        var titleText = Diagram.Title + " (Bourbaki numbering" + (IsExtended ? "; marks above the nodes" : string.Empty) + ")";
        var width = Math.Max((maxColumn - minColumn) * Spacing + 2 * Margin + 40, Margin + 8.5 * titleText.Length + 8);
        // Components are stacked one row apart, each keeping its own layout.
        var rowOffset = new Dictionary<int, double>();
        var stacked = 0.0;
        foreach (var component in nodes.GroupBy(n => n.Component).OrderBy(g => g.Key))
        {
            var highest = component.Max(n => n.Row);
            rowOffset[component.Key] = stacked + highest;
            stacked += highest - component.Min(n => n.Row) + 1;
        }

        var height = (stacked - 1) * Spacing + top + Margin + 8;
        var positions = nodes.ToDictionary(n => n.Number, n => (X: Margin + 20 + (n.Column - minColumn) * Spacing, Y: top + (rowOffset[n.Component] - n.Row) * Spacing));

        var svg = new StringBuilder();
        svg.Append("<svg xmlns=\"http://www.w3.org/2000/svg\" class=\"algebranotebook-dynkin\" width=\"").Append(F(width))
            .Append("\" height=\"").Append(F(height)).Append("\" viewBox=\"0 0 ").Append(F(width)).Append(' ').Append(F(height))
            .Append("\" role=\"img\" aria-label=\"");
        XmlText.Append(svg, Description);
        svg.Append("\" font-family=\"system-ui, sans-serif\">\n<title>");
        XmlText.Append(svg, Description);
        svg.Append("</title>\n<text x=\"").Append(F(Margin)).Append("\" y=\"18\" font-size=\"13\" font-weight=\"600\" fill=\"#22252b\">");
        XmlText.Append(svg, titleText);
        svg.Append("</text>\n");

        foreach (var edge in Diagram.Edges)
        {
            DrawEdge(svg, edge, positions[edge.First], positions[edge.Second]);
        }

        foreach (var node in nodes)
        {
            // Where a bond leaves straight down (up), the number (mark) moves beside the node so no line crosses it.
            var neighbours = Diagram.Edges.Where(e => e.First == node.Number || e.Second == node.Number)
                .Select(e => positions[e.First == node.Number ? e.Second : e.First]).ToArray();
            var at = positions[node.Number];
            var bondBelow = neighbours.Any(p => Math.Abs(p.X - at.X) < 1 && p.Y > at.Y);
            var bondAbove = neighbours.Any(p => Math.Abs(p.X - at.X) < 1 && p.Y < at.Y);
            DrawNode(svg, node, at, bondBelow, bondAbove);
        }

        svg.Append("</svg>");
        return svg.ToString();
    }

    /// <summary>
    /// The SVG inside a &lt;div class="algebranotebook-dynkin-figure" data-type="B3" data-extended="false"&gt;, for HTML
    /// outputs; the attributes let <see cref="Rebuild"/> draw it again from a stored notebook.
    /// </summary>
    public string ToHtml() =>
        FigureStart + Type + "\" data-extended=\"" + (IsExtended ? "true" : "false") + "\">" + ToSvg() + "</div>";

    /// <summary>
    /// Draws again a diagram stored by <see cref="ToHtml"/> (for example in a notebook written by someone else): only the
    /// data-type and data-extended attributes at the start are read, the type is parsed, and a fresh drawing is made;
    /// the stored markup itself is never reused. Returns null when the text does not start like a stored drawing or the
    /// type does not parse.
    /// </summary>
    /// <param name="storedHtml">The stored text/html output.</param>
    public static DynkinDrawing? Rebuild(string storedHtml)
    {
        ArgumentNullException.ThrowIfNull(storedHtml);
        var text = storedHtml.TrimStart();
        if (!text.StartsWith(FigureStart, StringComparison.Ordinal))
        {
            return null;
        }

        var end = text.IndexOf('"', FigureStart.Length);
        const string extendedTrue = "\" data-extended=\"true\"";
        if (end < 0 || end - FigureStart.Length > 60)
        {
            return null;
        }

        try
        {
            var type = CartanType.Parse(text[FigureStart.Length..end]);
            var system = RootSystem.Of(type);
            return string.CompareOrdinal(text, end, extendedTrue, 0, extendedTrue.Length) == 0 ? Extended(system) : Of(system);
        }
        catch (Exception e) when (e is ExactArgumentException or ExactParseException or BeyondCapabilityException)
        {
            return null;
        }
    }

    /// <summary>The plain-text diagram, e.g. "B3: 1-2, 2=&gt;3" (see <see cref="DynkinDiagram.ToString"/>).</summary>
    public override string ToString() => IsExtended ? $"{Diagram}; marks {string.Join(", ", _marks!)}" : Diagram.ToString();

    private string Description =>
        $"{(IsExtended ? "Extended Dynkin diagram" : "Dynkin diagram")} {Diagram.Title}: " +
        (Diagram.Edges.Count == 0 ? "no bonds" : string.Join(", ", Diagram.Edges.Select(e => e.ToString())));

    private void DrawNode(StringBuilder svg, DynkinNode node, (double X, double Y) at, bool bondBelow, bool bondAbove)
    {
        var fill = node.IsLong ? "#1f6f8b" : "#ffffff";
        svg.Append("<g class=\"node\" data-node=\"").Append(node.Number.ToString(CultureInfo.InvariantCulture)).Append("\"><title>");
        XmlText.Append(svg, $"node {node.Number}{(node.IsAffine ? " (extra node, −θ)" : string.Empty)}: |α|² = {node.LengthSquared} ({(node.IsLong ? "long" : "short")})"
            + (_marks is null ? string.Empty : $", mark {_marks[node.Number]}"));
        svg.Append("</title>");
        if (node.IsAffine)
        {
            svg.Append("<circle cx=\"").Append(F(at.X)).Append("\" cy=\"").Append(F(at.Y)).Append("\" r=\"").Append(F(Radius + 3))
                .Append("\" fill=\"#ffffff\" stroke=\"#22252b\" stroke-width=\"1.5\"/>");
        }

        svg.Append("<circle cx=\"").Append(F(at.X)).Append("\" cy=\"").Append(F(at.Y)).Append("\" r=\"").Append(F(Radius))
            .Append("\" fill=\"").Append(fill).Append("\" stroke=\"#22252b\" stroke-width=\"1.5\"/>");
        svg.Append("<text x=\"").Append(F(bondBelow ? at.X + Radius + 5 : at.X)).Append("\" y=\"").Append(F(bondBelow ? at.Y + 4 : at.Y + Radius + 15))
            .Append("\" font-size=\"12\" text-anchor=\"").Append(bondBelow ? "start" : "middle").Append("\" fill=\"#22252b\">")
            .Append(node.Number.ToString(CultureInfo.InvariantCulture)).Append("</text>");
        if (_marks is not null)
        {
            svg.Append("<text class=\"mark\" x=\"").Append(F(bondAbove ? at.X - Radius - 5 : at.X)).Append("\" y=\"").Append(F(bondAbove ? at.Y - 4 : at.Y - Radius - 7))
                .Append("\" font-size=\"11\" text-anchor=\"").Append(bondAbove ? "end" : "middle").Append("\" fill=\"#6b7077\">")
                .Append(_marks[node.Number].ToString(CultureInfo.InvariantCulture)).Append("</text>");
        }

        svg.Append("</g>\n");
    }

    private static void DrawEdge(StringBuilder svg, DynkinEdge edge, (double X, double Y) a, (double X, double Y) b)
    {
        var dx = b.X - a.X;
        var dy = b.Y - a.Y;
        var length = Math.Sqrt(dx * dx + dy * dy);
        var (ux, uy) = (dx / length, dy / length);
        var (px, py) = (-uy, ux);
        // Lines start and end on the circles' rims.
        var start = (X: a.X + ux * Radius, Y: a.Y + uy * Radius);
        var end = (X: b.X - ux * Radius, Y: b.Y - uy * Radius);
        svg.Append("<g class=\"bond\" data-bond=\"").Append(edge.First.ToString(CultureInfo.InvariantCulture)).Append('-')
            .Append(edge.Second.ToString(CultureInfo.InvariantCulture)).Append("\" data-lines=\"")
            .Append(edge.Multiplicity.ToString(CultureInfo.InvariantCulture)).Append("\" stroke=\"#22252b\" stroke-width=\"1.5\" fill=\"none\">");
        for (var k = 0; k < edge.Multiplicity; k++)
        {
            var offset = (k - (edge.Multiplicity - 1) / 2.0) * BondGap;
            svg.Append("<line x1=\"").Append(F(start.X + px * offset)).Append("\" y1=\"").Append(F(start.Y + py * offset))
                .Append("\" x2=\"").Append(F(end.X + px * offset)).Append("\" y2=\"").Append(F(end.Y + py * offset)).Append("\"/>");
        }

        if (edge.ArrowTowards is int shortNode)
        {
            // A chevron across the bond, its point toward the short root.
            var sign = shortNode == edge.Second ? 1 : -1;
            var mid = (X: (a.X + b.X) / 2, Y: (a.Y + b.Y) / 2);
            var tip = (X: mid.X + sign * ux * 6, Y: mid.Y + sign * uy * 6);
            var spread = BondGap * edge.Multiplicity / 2.0 + 5;
            var back1 = (X: mid.X - sign * ux * 6 + px * spread, Y: mid.Y - sign * uy * 6 + py * spread);
            var back2 = (X: mid.X - sign * ux * 6 - px * spread, Y: mid.Y - sign * uy * 6 - py * spread);
            svg.Append("<polyline class=\"toward-short\" points=\"").Append(F(back1.X)).Append(',').Append(F(back1.Y)).Append(' ')
                .Append(F(tip.X)).Append(',').Append(F(tip.Y)).Append(' ').Append(F(back2.X)).Append(',').Append(F(back2.Y))
                .Append("\" stroke-width=\"2\" stroke-linejoin=\"miter\"/>");
        }

        svg.Append("</g>\n");
    }

    private static string F(double value) => Math.Round(value, 1).ToString("0.#", CultureInfo.InvariantCulture);
}
