using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Internal;

/// <summary>
/// Names the type of a Cartan matrix of a finite root system (the classification of connected Dynkin diagrams) and
/// gives the Bourbaki numbering of its nodes. The caller checks the result against the roots layer's Cartan matrix.
/// </summary>
internal static class CartanIdentification
{
    /// <summary>The type and, for each Bourbaki position, the index of the node in the input.</summary>
    public static (CartanType Type, int[] Order) Identify(Rational[,] a)
    {
        var n = a.GetLength(0);
        var seen = new bool[n];
        var components = new List<SimpleCartanType>();
        var order = new List<int>();
        for (var start = 0; start < n; start++)
        {
            if (seen[start])
            {
                continue;
            }

            var nodes = new List<int>();
            var stack = new Stack<int>();
            stack.Push(start);
            seen[start] = true;
            while (stack.Count > 0)
            {
                var i = stack.Pop();
                nodes.Add(i);
                for (var j = 0; j < n; j++)
                {
                    if (!seen[j] && !a[i, j].IsZero)
                    {
                        seen[j] = true;
                        stack.Push(j);
                    }
                }
            }

            nodes.Sort();
            var (type, numbering) = Classify(a, nodes);
            components.Add(type);
            order.AddRange(numbering);
        }

        return (CartanType.Of(components.ToArray()), order.ToArray());
    }

    private static (SimpleCartanType, List<int>) Classify(Rational[,] a, List<int> nodes)
    {
        var k = nodes.Count;
        List<int> Neighbours(int i) => nodes.Where(j => j != i && !a[i, j].IsZero).ToList();
        if (k == 1)
        {
            return (SimpleCartanType.Of(CartanFamily.A, 1), nodes);
        }

        // Relative squared lengths: A_ij / A_ji = (α_j, α_j) / (α_i, α_i).
        var length = new Dictionary<int, Rational> { [nodes[0]] = Rational.One };
        var queue = new Queue<int>([nodes[0]]);
        while (queue.Count > 0)
        {
            var i = queue.Dequeue();
            foreach (var j in Neighbours(i).Where(j => !length.ContainsKey(j)))
            {
                length[j] = length[i] * a[i, j] / a[j, i];
                queue.Enqueue(j);
            }
        }

        var longest = nodes.Max(i => length[i]);
        bool IsLong(int i) => length[i] == longest;
        var maxBond = nodes.SelectMany(i => Neighbours(i).Select(j => a[i, j] * a[j, i])).Max();
        var branch = nodes.Where(i => Neighbours(i).Count == 3).ToList();

        List<int> PathFrom(int end)
        {
            var path = new List<int> { end };
            while (true)
            {
                var next = Neighbours(path[^1]).Where(j => !path.Contains(j)).ToList();
                if (next.Count == 0)
                {
                    return path;
                }

                path.Add(next[0]);
            }
        }

        var ends = nodes.Where(i => Neighbours(i).Count == 1).ToList();
        if (maxBond == 3)
        {
            // Bourbaki G2: α_1 short, α_2 long.
            return (SimpleCartanType.Of(CartanFamily.G, 2), PathFrom(ends.First(i => !IsLong(i))));
        }

        if (maxBond == 2)
        {
            var shortCount = nodes.Count(i => !IsLong(i));
            if (k == 4 && shortCount == 2)
            {
                // F4: α_1 - α_2 long, α_3 - α_4 short.
                return (SimpleCartanType.Of(CartanFamily.F, 4), PathFrom(ends.First(IsLong)));
            }

            if (shortCount == 1)
            {
                // B_r: α_r is the only short root; start at the other end.
                return (SimpleCartanType.Of(CartanFamily.B, k), PathFrom(ends.First(IsLong)));
            }

            // C_r: α_r is the only long root.
            return (SimpleCartanType.Of(CartanFamily.C, k), PathFrom(ends.First(i => !IsLong(i))));
        }

        if (branch.Count == 0)
        {
            return (SimpleCartanType.Of(CartanFamily.A, k), PathFrom(ends.Min()));
        }

        var b = branch[0];
        var legs = Neighbours(b).Select(first =>
        {
            var leg = new List<int> { first };
            while (true)
            {
                var next = Neighbours(leg[^1]).Where(j => j != b && !leg.Contains(j)).ToList();
                if (next.Count == 0)
                {
                    return leg;
                }

                leg.Add(next[0]);
            }
        }).OrderBy(l => l.Count).ToList();
        if (legs[0].Count == 1 && legs[1].Count == 1)
        {
            // D_r: α_1 ... α_{r-2} along the long leg ending at the branch node, then the two short legs.
            var longLeg = Enumerable.Reverse(legs[2]).ToList();
            return (SimpleCartanType.Of(CartanFamily.D, k), [.. longLeg, b, legs[0][0], legs[1][0]]);
        }

        // E_6, E_7, E_8: legs of lengths 1, 2, k - 4; α_1 - α_3 - α_4 - α_5 - ..., α_2 attached to α_4.
        var two = legs[1];
        var rest = legs[2];
        return (SimpleCartanType.Of(CartanFamily.E, k), [two[1], legs[0][0], two[0], b, .. rest]);
    }
}
