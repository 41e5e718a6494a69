using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// The Dynkin diagram of a root system (or its extended diagram): nodes with Bourbaki numbering and edges with
/// multiplicity and arrow toward the short root, plus a grid layout hint for drawing. Immutable.
/// </summary>
public sealed class DynkinDiagram
{
    internal DynkinDiagram(string title, IReadOnlyList<DynkinNode> nodes, IReadOnlyList<DynkinEdge> edges)
    {
        Title = title;
        Nodes = nodes;
        Edges = edges;
    }

    /// <summary>The type name, e.g. "E8" or "E8 extended".</summary>
    public string Title { get; }

    /// <summary>The nodes, in order of number (the affine node 0 first in an extended diagram).</summary>
    public IReadOnlyList<DynkinNode> Nodes { get; }

    /// <summary>The edges, ordered by (first, second) node number.</summary>
    public IReadOnlyList<DynkinEdge> Edges { get; }

    /// <summary>
    /// Builds the diagram of a generalised Cartan matrix (row i: coroot i) whose nodes carry the given numbers, components,
    /// squared lengths and layout.
    /// </summary>
    internal static DynkinDiagram FromCartan(string title, int[,] cartan, IReadOnlyList<DynkinNode> nodes)
    {
        var edges = new List<DynkinEdge>();
        for (var i = 0; i < nodes.Count; i++)
        {
            for (var j = i + 1; j < nodes.Count; j++)
            {
                if (cartan[i, j] == 0)
                {
                    continue;
                }

                var multiplicity = cartan[i, j] * cartan[j, i];
                int? arrow = null;
                if (nodes[i].LengthSquared != nodes[j].LengthSquared)
                {
                    arrow = nodes[i].LengthSquared < nodes[j].LengthSquared ? nodes[i].Number : nodes[j].Number;
                }

                var (a, b) = nodes[i].Number < nodes[j].Number ? (nodes[i].Number, nodes[j].Number) : (nodes[j].Number, nodes[i].Number);
                edges.Add(new DynkinEdge(a, b, multiplicity, arrow));
            }
        }

        return new DynkinDiagram(
            title,
            nodes.OrderBy(n => n.Number).ToArray(),
            edges.OrderBy(e => e.First).ThenBy(e => e.Second).ToArray());
    }

    /// <summary>The layout hint of the finite diagram of a simple type: (column, row) per node in Bourbaki order.</summary>
    internal static (double Column, double Row)[] Layout(SimpleCartanType type)
    {
        var n = type.Rank;
        var positions = new (double, double)[n];
        switch (type.Family)
        {
            case CartanFamily.D when n >= 3:
                for (var i = 0; i < n - 2; i++)
                {
                    positions[i] = (i, 0);
                }

                positions[n - 2] = (n - 2, 0.5);
                positions[n - 1] = (n - 2, -0.5);
                if (n == 3)
                {
                    // D3: chain 2-1-3 drawn with node 1 in the middle.
                    positions[0] = (1, 0);
                    positions[1] = (0, 0);
                    positions[2] = (2, 0);
                }

                break;
            case CartanFamily.D:
                positions[0] = (0, 0);
                positions[1] = (1, 0);
                break;
            case CartanFamily.E:
                positions[0] = (0, 0);
                positions[1] = (2, 1);
                for (var i = 2; i < n; i++)
                {
                    positions[i] = (i - 1, 0);
                }

                break;
            default:
                for (var i = 0; i < n; i++)
                {
                    positions[i] = (i, 0);
                }

                break;
        }

        return positions;
    }

    /// <summary>The title and edge list, e.g. "B3: 1-2, 2=>3"; isolated nodes are listed by number.</summary>
    public override string ToString()
    {
        var parts = new List<string>(Edges.Select(e => e.ToString()));
        var joined = new HashSet<int>(Edges.SelectMany(e => new[] { e.First, e.Second }));
        parts.AddRange(Nodes.Where(n => !joined.Contains(n.Number)).Select(n => n.Number.ToString(System.Globalization.CultureInfo.InvariantCulture)));
        return $"{Title}: {string.Join(", ", parts)}";
    }

    internal static Rational[] LengthsOf(IEnumerable<DynkinNode> nodes) => nodes.Select(n => n.LengthSquared).ToArray();
}
