using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

public sealed partial class CartanType
{
    /// <summary>
    /// Recognises the finite type of a Cartan matrix given in any node order, in this library's convention
    /// A_ij = 2 (alpha_i, alpha_j) / (alpha_i, alpha_i) (pass the transpose of a matrix printed in Humphreys'
    /// convention). The matrix is split into connected components, simple root lengths are recovered from
    /// L_i A_ij = L_j A_ji, the shape is classified, and the answer is verified by finding a relabelling under which the
    /// matrix equals the Cartan matrix of the type exactly.
    /// </summary>
    /// <exception cref="ExactArgumentException">
    /// The matrix is not square, has a non-integer entry, a diagonal entry other than 2, a positive off-diagonal entry,
    /// A_ij = 0 without A_ji = 0, or is not of finite type (a cycle, a bond A_ij A_ji &gt; 3, a non-symmetrisable part, or
    /// a shape outside the classification); the message names the entry or the component.
    /// </exception>
    /// <exception cref="BeyondCapabilityException">The size exceeds <see cref="RootSystem.MaximumRank"/>.</exception>
    public static CartanMatrixIdentification Identify(Matrix<Rational> cartanMatrix)
    {
        ArgumentNullException.ThrowIfNull(cartanMatrix);
        var n = cartanMatrix.RowCount;
        if (!cartanMatrix.IsSquare || n == 0)
        {
            throw new ExactArgumentException(
                $"A Cartan matrix must be square and non-empty; the {cartanMatrix.Shape} matrix is not.", nameof(cartanMatrix));
        }

        if (n > RootSystem.MaximumRank)
        {
            throw new BeyondCapabilityException(
                $"The {cartanMatrix.Shape} matrix is larger than the supported rank {RootSystem.MaximumRank}.");
        }

        var a = ReadCartanEntries(cartanMatrix);
        var components = DiagramIdentification.Components((i, j) => a[i, j], Enumerable.Range(0, n).ToArray());
        var types = new List<SimpleCartanType>();
        var rows = new List<int>();
        foreach (var component in components)
        {
            var (type, order) = IdentifyComponent(a, component);
            types.Add(type);
            rows.AddRange(order);
        }

        return new CartanMatrixIdentification(new CartanType(types.ToArray()), rows.ToArray());
    }

    private static int[,] ReadCartanEntries(Matrix<Rational> matrix)
    {
        var n = matrix.RowCount;
        var a = new int[n, n];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                var x = matrix[i, j];
                if (!x.IsInteger || x.Numerator > 1000 || x.Numerator < -1000)
                {
                    throw new ExactArgumentException(
                        $"Entry ({i}, {j}) = {x} of the Cartan matrix is not an integer of finite type (2 on the diagonal, 0 to -3 off it).",
                        nameof(matrix));
                }

                a[i, j] = (int)x.Numerator;
            }
        }

        for (var i = 0; i < n; i++)
        {
            if (a[i, i] != 2)
            {
                throw new ExactArgumentException($"Diagonal entry ({i}, {i}) = {a[i, i]} of the Cartan matrix is not 2.", nameof(matrix));
            }

            for (var j = 0; j < n; j++)
            {
                if (i != j && a[i, j] > 0)
                {
                    throw new ExactArgumentException($"Off-diagonal entry ({i}, {j}) = {a[i, j]} of the Cartan matrix is positive.", nameof(matrix));
                }

                if (i != j && (a[i, j] == 0) != (a[j, i] == 0))
                {
                    throw new ExactArgumentException(
                        $"Entries ({i}, {j}) = {a[i, j]} and ({j}, {i}) = {a[j, i]} of the Cartan matrix must be zero together.", nameof(matrix));
                }
            }
        }

        return a;
    }

    private static (SimpleCartanType Type, int[] Rows) IdentifyComponent(int[,] a, List<int> nodes)
    {
        var where = $"the component on rows {{{string.Join(", ", nodes)}}}";
        var edges = 0;
        foreach (var i in nodes)
        {
            foreach (var j in nodes)
            {
                if (i < j && a[i, j] != 0)
                {
                    edges++;
                    if (a[i, j] * a[j, i] > 3)
                    {
                        throw new ExactArgumentException(
                            $"The Cartan matrix is not of finite type: rows {i} and {j} are joined by A_ij A_ji = {a[i, j] * a[j, i]} > 3 lines.",
                            "cartanMatrix");
                    }
                }
            }
        }

        if (edges != nodes.Count - 1)
        {
            throw new ExactArgumentException(
                $"The Cartan matrix is not of finite type: {where} contains a cycle ({edges} edges on {nodes.Count} nodes).", "cartanMatrix");
        }

        // Root lengths from L_i A_ij = L_j A_ji along the tree (a tree is always symmetrisable), scaled so the longest is 2.
        var lengths = new Rational[a.GetLength(0)];
        var seen = new HashSet<int> { nodes[0] };
        lengths[nodes[0]] = 1;
        var queue = new Queue<int>();
        queue.Enqueue(nodes[0]);
        while (queue.Count > 0)
        {
            var i = queue.Dequeue();
            foreach (var j in nodes)
            {
                if (a[i, j] != 0 && seen.Add(j))
                {
                    lengths[j] = lengths[i] * a[i, j] / a[j, i];
                    queue.Enqueue(j);
                }
            }
        }

        var longest = nodes.Max(i => lengths[i]);
        foreach (var i in nodes)
        {
            lengths[i] = lengths[i] * 2 / longest;
        }

        SimpleCartanType candidate;
        try
        {
            candidate = DiagramIdentification.Classify((i, j) => a[i, j], nodes, lengths);
        }
        catch (ExactArgumentException)
        {
            throw new ExactArgumentException(
                $"The Cartan matrix is not of finite type: the diagram of {where} is not in the classification.", "cartanMatrix");
        }

        var reference = RootSystem.Of(Of(candidate));
        var rows = MatchNodes(a, nodes, reference)
            ?? throw new ExactArgumentException(
                $"The Cartan matrix is not of finite type: {where} has the shape of {candidate} but not its Cartan matrix.",
                "cartanMatrix");
        return (candidate, rows);
    }

    /// <summary>A bijection from the reference nodes to the given rows preserving every entry, by backtracking.</summary>
    private static int[]? MatchNodes(int[,] a, List<int> nodes, RootSystem reference)
    {
        var k = nodes.Count;

        // Visit reference nodes in breadth-first order so each new node is adjacent to an assigned one (strong pruning).
        var order = new List<int> { 0 };
        var parent = new int[k];
        var visited = new bool[k];
        visited[0] = true;
        for (var head = 0; head < order.Count; head++)
        {
            for (var q = 0; q < k; q++)
            {
                if (!visited[q] && reference.CartanEntry(order[head], q) != 0)
                {
                    visited[q] = true;
                    parent[q] = order[head];
                    order.Add(q);
                }
            }
        }

        var image = new int[k];
        var used = new HashSet<int>();
        return Assign(0) ? image : null;

        bool Assign(int position)
        {
            if (position == k)
            {
                return true;
            }

            var p = order[position];

            // Past the first node, the image must be joined to the image of p's breadth-first parent.
            var candidates = position == 0 ? nodes : nodes.Where(r => a[image[parent[p]], r] != 0).ToList();
            foreach (var row in candidates)
            {
                if (used.Contains(row))
                {
                    continue;
                }

                var fits = true;
                for (var earlier = 0; earlier < position && fits; earlier++)
                {
                    var q = order[earlier];
                    fits = a[row, image[q]] == reference.CartanEntry(p, q) && a[image[q], row] == reference.CartanEntry(q, p);
                }

                if (!fits)
                {
                    continue;
                }

                image[p] = row;
                used.Add(row);
                if (Assign(position + 1))
                {
                    return true;
                }

                used.Remove(row);
            }

            return false;
        }
    }
}
