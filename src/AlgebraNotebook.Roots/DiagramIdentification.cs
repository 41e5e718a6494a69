namespace AlgebraNotebook.Roots;

/// <summary>
/// Recognises the Cartan type of a sub-diagram of a finite-type Dynkin diagram (every sub-diagram of one is again of
/// finite type), from the Cartan matrix entries and the simple root lengths.
/// </summary>
internal static class DiagramIdentification
{
    /// <summary>The connected components of the nodes (zero-based), each identified; node lists are 1-based and increasing.</summary>
    public static List<(SimpleCartanType Type, int[] Nodes)> Identify(RootSystem system, IReadOnlyList<int> nodes)
    {
        var components = Components(system.CartanEntry, nodes);
        var lengths = system.SimpleRootLengthsSquared;
        return components.Select(c => (Classify(system.CartanEntry, c, lengths), c.Select(i => i + 1).ToArray())).ToList();
    }

    /// <summary>The connected components of the given nodes (zero-based), each sorted, ordered by their smallest node.</summary>
    public static List<List<int>> Components(Func<int, int, int> entry, IReadOnlyList<int> nodes)
    {
        var remaining = new SortedSet<int>(nodes);
        var result = new List<List<int>>();
        while (remaining.Count > 0)
        {
            var start = remaining.Min;
            var component = new List<int>();
            var stack = new Stack<int>();
            stack.Push(start);
            remaining.Remove(start);
            while (stack.Count > 0)
            {
                var i = stack.Pop();
                component.Add(i);
                foreach (var j in remaining.ToArray())
                {
                    if (entry(i, j) != 0)
                    {
                        remaining.Remove(j);
                        stack.Push(j);
                    }
                }
            }

            component.Sort();
            result.Add(component);
        }

        return result;
    }

    /// <summary>The type of a connected sub-diagram of a finite-type diagram (a candidate only, for other inputs).</summary>
    public static SimpleCartanType Classify(Func<int, int, int> entry, List<int> nodes, AlgebraNotebook.Exact.Scalars.Rational[] lengths)
    {
        var k = nodes.Count;
        if (k == 1)
        {
            return SimpleCartanType.Of(CartanFamily.A, 1);
        }

        var maxBond = 1;
        var degree = new Dictionary<int, int>();
        foreach (var i in nodes)
        {
            degree[i] = 0;
            foreach (var j in nodes)
            {
                if (i != j && entry(i, j) != 0)
                {
                    degree[i]++;
                    maxBond = Math.Max(maxBond, entry(i, j) * entry(j, i));
                }
            }
        }

        if (maxBond == 3)
        {
            return SimpleCartanType.Of(CartanFamily.G, 2);
        }

        if (maxBond == 2)
        {
            var longest = nodes.Max(i => lengths[i]);
            if (k == 2)
            {
                // Named after the numbering: long node first reads as B2, short node first as C2 (isomorphic).
                return SimpleCartanType.Of(lengths[nodes[0]] == longest ? CartanFamily.B : CartanFamily.C, 2);
            }

            var shortCount = nodes.Count(i => lengths[i] != longest);
            if (shortCount == 1)
            {
                return SimpleCartanType.Of(CartanFamily.B, k);
            }

            if (shortCount == k - 1)
            {
                return SimpleCartanType.Of(CartanFamily.C, k);
            }

            return SimpleCartanType.Of(CartanFamily.F, 4);
        }

        var branch = nodes.Where(i => degree[i] == 3).ToArray();
        if (branch.Length == 0)
        {
            return SimpleCartanType.Of(CartanFamily.A, k);
        }

        var centre = branch[0];
        var arms = nodes.Where(j => j != centre && entry(centre, j) != 0)
            .Select(j => ArmLength(entry, nodes, centre, j))
            .OrderBy(x => x)
            .ToArray();
        if (arms[0] == 1 && arms[1] == 1)
        {
            return SimpleCartanType.Of(CartanFamily.D, k);
        }

        return SimpleCartanType.Of(CartanFamily.E, k);
    }

    private static int ArmLength(Func<int, int, int> entry, List<int> nodes, int centre, int first)
    {
        var previous = centre;
        var current = first;
        var length = 1;
        while (true)
        {
            var next = nodes.Where(j => j != previous && j != current && entry(current, j) != 0).ToArray();
            if (next.Length == 0)
            {
                return length;
            }

            previous = current;
            current = next[0];
            length++;
        }
    }
}
