using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

public sealed partial class RootSystem
{
    /// <summary>
    /// The Dynkin diagram: nodes in Bourbaki numbering (components one after another, laid out in separate rows),
    /// edges with multiplicity A_ij A_ji and the arrow toward the short root.
    /// </summary>
    public DynkinDiagram Diagram
    {
        get
        {
            var nodes = new List<DynkinNode>();
            for (var c = 0; c < Type.Components.Count; c++)
            {
                var layout = DynkinDiagram.Layout(Type.Components[c]);
                for (var i = 0; i < layout.Length; i++)
                {
                    var node = _componentOffsets[c] + i;
                    nodes.Add(new DynkinNode(node + 1, c, _lengths[node], layout[i].Column, layout[i].Row - 3 * c));
                }
            }

            return DynkinDiagram.FromCartan(Type.ToString(), _cartan, nodes);
        }
    }

    /// <summary>
    /// The extended (affine) Dynkin diagram of a simple system: the node 0 for alpha_0 = -theta joined to the others by
    /// A_0j = -(theta, alpha_j) and A_j0 = -2 (alpha_j, theta) / (alpha_j, alpha_j), with the marks of the highest root.
    /// </summary>
    /// <exception cref="AlgebraNotebook.Exact.ExactArgumentException">The system is not simple.</exception>
    public ExtendedDiagram ExtendedDiagram
    {
        get
        {
            RequireSimple("the extended diagram");
            var theta = HighestRoot;
            var thetaLabels = theta.AsWeight.Raw; // <theta, alpha_j^vee>
            var n = Rank + 1;
            var cartan = new int[n, n];
            cartan[0, 0] = 2;
            for (var j = 0; j < Rank; j++)
            {
                // (theta, alpha_j) = <theta, alpha_j^vee> |alpha_j|^2 / 2; A_0j = 2 (-theta, alpha_j) / (theta, theta) = -(theta, alpha_j).
                var product = thetaLabels[j] * _lengths[j] / 2;
                cartan[0, j + 1] = -(int)product.Numerator;
                cartan[j + 1, 0] = -thetaLabels[j];
                for (var k = 0; k < Rank; k++)
                {
                    cartan[j + 1, k + 1] = _cartan[j, k];
                }
            }

            var marks = new[] { 1 }.Concat(Marks).ToArray();
            var comarks = new[] { 1 }.Concat(Comarks).ToArray();
            var finite = Diagram.Nodes;
            var neighbours = Enumerable.Range(1, Rank).Where(j => cartan[0, j] != 0).ToArray();
            var place = AffinePlacement(finite, neighbours);
            var nodes = new List<DynkinNode> { new(0, 0, 2, place.Column, place.Row) };
            nodes.AddRange(finite);
            var matrix = Matrix<Rational>.FromFunction(n, n, (i, j) => cartan[i, j]);
            return new ExtendedDiagram(matrix, marks, comarks, DynkinDiagram.FromCartan($"{Type} extended", cartan, nodes));
        }
    }

    private static (double Column, double Row) AffinePlacement(IReadOnlyList<DynkinNode> finite, int[] neighbours)
    {
        if (neighbours.Length >= 2)
        {
            // A_n: the extra node closes the cycle; put it above the middle of the chain.
            return ((finite.Min(n => n.Column) + finite.Max(n => n.Column)) / 2, 1);
        }

        var anchor = finite.First(n => n.Number == neighbours[0]);
        var occupied = finite.Select(n => (n.Column, n.Row)).ToHashSet();
        foreach (var candidate in new[]
                 {
                     (anchor.Column - 1, anchor.Row), (anchor.Column + 1, anchor.Row),
                     (anchor.Column, anchor.Row + 1), (anchor.Column, anchor.Row - 1),
                 })
        {
            if (!occupied.Contains(candidate))
            {
                return candidate;
            }
        }

        return (anchor.Column, anchor.Row + 2);
    }
}
