using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots.Representations;

/// <summary>
/// Restriction of representations of an algebra g to a semisimple subalgebra h, given by a projection matrix P of integers:
/// row r of P gives the r-th Dynkin label of the restricted weight, mu_h[r] = sum_j P[r, j] mu_g[j] (rows: subalgebra labels,
/// columns: algebra labels, both in Bourbaki numbering). Restricting V(lambda) projects every weight of V(lambda) with its
/// multiplicity, checks that the projected weight system is invariant under the Weyl group of h (otherwise P does not come
/// from an embedding and an <see cref="ExactArgumentException"/> names the offending weight), and peels off irreducibles of h
/// from the highest projected weight down. The result conserves dimension (checked). Sealed and immutable.
/// </summary>
public sealed class BranchingRule
{
    private readonly int[,] _projection;
    private int[]? _chargeNodes;

    private BranchingRule(RootSystem system, RootSystem subalgebra, int[,] projection, string description)
    {
        System = system;
        Subalgebra = subalgebra;
        _projection = projection;
        Description = description;
    }

    /// <summary>The algebra g whose representations are restricted.</summary>
    public RootSystem System { get; }

    /// <summary>The subalgebra h (its semisimple part for a Levi subalgebra).</summary>
    public RootSystem Subalgebra { get; }

    /// <summary>Plain description, e.g. "E6 > D5 (Levi, deleting node 1)".</summary>
    public string Description { get; }

    /// <summary>The projection matrix (a copy): rows subalgebra Dynkin labels, columns algebra Dynkin labels.</summary>
    public int[,] Projection => (int[,])_projection.Clone();

    /// <summary>
    /// The semisimple part of the Levi subalgebra obtained by deleting the given nodes (1-based, Bourbaki numbering) from
    /// the Dynkin diagram. A weight restricts by dropping the labels of the deleted nodes; the remaining nodes are matched
    /// to the Bourbaki numbering of each simple factor of the remaining diagram, factors ordered by their smallest original
    /// node. <see cref="RestrictWithCharges"/> also reports the charges under the centre of the Levi subalgebra.
    /// </summary>
    /// <param name="system">The algebra.</param>
    /// <param name="deletedNodes">Nodes to delete, 1-based; at least one node must remain.</param>
    public static BranchingRule ToLevi(RootSystem system, params int[] deletedNodes)
    {
        ArgumentNullException.ThrowIfNull(system);
        ArgumentNullException.ThrowIfNull(deletedNodes);
        foreach (var node in deletedNodes)
        {
            if (node < 1 || node > system.Rank)
            {
                throw new ExactArgumentException(
                    $"Node {node} in deletedNodes does not exist: {system.Type} has nodes 1 to {system.Rank}.", nameof(deletedNodes));
            }
        }

        var kept = Enumerable.Range(0, system.Rank).Where(i => !deletedNodes.Contains(i + 1)).ToArray();
        if (kept.Length == 0)
        {
            throw new ExactArgumentException(
                $"Deleting every node of {system.Type} leaves no semisimple part: every weight restricts to the trivial representation.",
                nameof(deletedNodes));
        }

        var geometry = GeometryCache.For(system);
        var components = DiagramIdentification.Identify(system, kept);
        var subalgebra = RootSystem.Of(CartanType.Of(components.Select(c => c.Type).ToArray()));
        var subGeometry = GeometryCache.For(subalgebra);
        var projection = new int[subalgebra.Rank, system.Rank];
        var offset = 0;
        foreach (var (type, oneBasedNodes) in components)
        {
            var nodes = oneBasedNodes.Select(n => n - 1).ToArray();
            var map = MatchNodes(subGeometry, offset, (i, j) => geometry.Cartan[i, j], nodes)
                ?? throw new InvalidOperationException($"No Cartan-matrix isomorphism between {type} and nodes {string.Join(", ", oneBasedNodes)}.");
            for (var p = 0; p < nodes.Length; p++)
            {
                projection[offset + p, map[p]] = 1;
            }

            offset += nodes.Length;
        }

        var deleted = string.Join(", ", deletedNodes.OrderBy(n => n));
        return new BranchingRule(system, subalgebra, projection,
            $"{system.Type} > {subalgebra.Type} (Levi, deleting node{(deletedNodes.Length == 1 ? "" : "s")} {deleted})")
        {
            _chargeNodes = deletedNodes.Distinct().OrderBy(n => n).Select(n => n - 1).ToArray(),
        };
    }

    /// <summary>
    /// The semisimple subalgebra of maximal rank obtained by deleting one node from the extended Dynkin diagram of a simple
    /// algebra (Borel-de Siebenthal; Humphreys' and Kac's tables of extended diagrams): its simple roots are the remaining
    /// simple roots together with alpha_0 = -theta (theta the highest root). Node 0 is the extended node, nodes 1..rank are
    /// Bourbaki's. A weight restricts to its labels at the remaining simple roots and, at alpha_0, to -&lt;lambda, theta^vee&gt;.
    /// The factors of the remaining diagram are ordered by their smallest extended node (0 first) and matched to Bourbaki
    /// numbering. The subalgebra is maximal among semisimple subalgebras when the mark of the deleted node is a prime;
    /// deleting a node of mark 1 gives a subalgebra isomorphic to the algebra itself.
    /// </summary>
    /// <param name="system">A simple algebra.</param>
    /// <param name="deletedNode">The node of the extended diagram to delete, 1..rank.</param>
    public static BranchingRule ToMaximalRank(RootSystem system, int deletedNode)
    {
        ArgumentNullException.ThrowIfNull(system);
        if (!system.IsSimple)
        {
            throw new ExactArgumentException(
                $"{system.Type} is not simple; the extended diagram is taken per simple factor, so pass a simple algebra.", nameof(system));
        }

        if (deletedNode < 1 || deletedNode > system.Rank)
        {
            throw new ExactArgumentException(
                $"Node {deletedNode} cannot be deleted from the extended diagram of {system.Type}: choose a node 1 to {system.Rank} " +
                "(deleting the extended node 0 gives the algebra itself).", nameof(deletedNode));
        }

        var geometry = GeometryCache.For(system);
        var rank = system.Rank;
        var theta = geometry.HighestRootCoordinates(0);
        var thetaIndex = Array.FindIndex(geometry.PositiveRootCoordinates, r => r.AsSpan().SequenceEqual(theta));
        var thetaCoroot = geometry.PositiveCorootCoordinates[thetaIndex];
        var thetaLabels = geometry.RootLabels(theta);

        // Extended roots in labels and their coroots in simple-coroot coordinates: index 0 is -theta, index i is alpha_i.
        var rootLabels = new int[rank + 1][];
        var corootCoordinates = new int[rank + 1][];
        rootLabels[0] = thetaLabels.Select(x => -x).ToArray();
        corootCoordinates[0] = thetaCoroot.Select(x => -x).ToArray();
        for (var i = 1; i <= rank; i++)
        {
            rootLabels[i] = geometry.SimpleRootLabels[i - 1];
            corootCoordinates[i] = new int[rank];
            corootCoordinates[i][i - 1] = 1;
        }

        int Extended(int a, int b)
        {
            var sum = 0;
            for (var k = 0; k < rank; k++)
            {
                sum += corootCoordinates[a][k] * rootLabels[b][k];
            }

            return sum;
        }

        var kept = Enumerable.Range(0, rank + 1).Where(n => n != deletedNode).ToArray();
        var components = ExtendedComponents(kept, Extended);
        var types = components.Select(c => ClassifyComponent(c, Extended)).ToArray();
        var subalgebra = RootSystem.Of(CartanType.Of(types));
        var subGeometry = GeometryCache.For(subalgebra);
        var projection = new int[subalgebra.Rank, rank];
        var offset = 0;
        foreach (var nodes in components)
        {
            var map = MatchNodes(subGeometry, offset, Extended, nodes)
                ?? throw new InvalidOperationException($"No Cartan-matrix isomorphism for extended nodes {string.Join(", ", nodes)}.");
            for (var p = 0; p < nodes.Length; p++)
            {
                if (map[p] == 0)
                {
                    for (var k = 0; k < rank; k++)
                    {
                        projection[offset + p, k] = -thetaCoroot[k];
                    }
                }
                else
                {
                    projection[offset + p, map[p] - 1] = 1;
                }
            }

            offset += nodes.Length;
        }

        return new BranchingRule(system, subalgebra, projection,
            $"{system.Type} > {subalgebra.Type} (maximal rank, deleting node {deletedNode} of the extended diagram)");
    }

    private static List<int[]> ExtendedComponents(int[] kept, Func<int, int, int> cartan)
    {
        var remaining = new SortedSet<int>(kept);
        var result = new List<int[]>();
        while (remaining.Count > 0)
        {
            var start = remaining.Min;
            remaining.Remove(start);
            var component = new List<int> { start };
            for (var index = 0; index < component.Count; index++)
            {
                foreach (var j in remaining.ToArray())
                {
                    if (cartan(component[index], j) != 0)
                    {
                        remaining.Remove(j);
                        component.Add(j);
                    }
                }
            }

            component.Sort();
            result.Add(component.ToArray());
        }

        return result;
    }

    private static SimpleCartanType ClassifyComponent(int[] nodes, Func<int, int, int> cartan)
    {
        // Rank, number of positive roots and root lengths determine a connected finite type (the E6/B6/C6 trap is
        // settled by the lengths; B and C by which length is in the majority).
        var n = nodes.Length;
        var matrix = new int[n, n];
        for (var a = 0; a < n; a++)
        {
            for (var b = 0; b < n; b++)
            {
                matrix[a, b] = cartan(nodes[a], nodes[b]);
            }
        }

        var geometry = new WeightGeometry(matrix);
        var positive = geometry.PositiveRootCoordinates.Length;
        var longCount = geometry.HalfLengths.Count(d => d.IsOne);
        var simplyLaced = longCount == n;
        CartanFamily family;
        if (simplyLaced)
        {
            family = positive == n * (n + 1) / 2 ? CartanFamily.A
                : positive == n * (n - 1) ? CartanFamily.D
                : CartanFamily.E;
        }
        else if (n == 2 && positive == 6)
        {
            family = CartanFamily.G;
        }
        else if (n == 4 && positive == 24)
        {
            family = CartanFamily.F;
        }
        else
        {
            family = longCount >= n - longCount ? CartanFamily.B : CartanFamily.C;
        }

        return SimpleCartanType.Of(family, n);
    }

    /// <summary>
    /// A branching rule from a user-supplied projection matrix (rows: Dynkin labels of the subalgebra, columns: Dynkin labels
    /// of the algebra). The shape is checked here; whether P comes from an embedding is checked when a representation is
    /// restricted (Weyl invariance of the projected weights and conservation of dimension).
    /// </summary>
    /// <param name="system">The algebra g.</param>
    /// <param name="subalgebra">The subalgebra h.</param>
    /// <param name="projection">Integer matrix of shape rank(h) x rank(g).</param>
    public static BranchingRule FromProjection(RootSystem system, RootSystem subalgebra, int[,] projection)
    {
        ArgumentNullException.ThrowIfNull(system);
        ArgumentNullException.ThrowIfNull(subalgebra);
        ArgumentNullException.ThrowIfNull(projection);
        if (projection.GetLength(0) != subalgebra.Rank || projection.GetLength(1) != system.Rank)
        {
            throw new ExactArgumentException(
                $"The projection matrix is {projection.GetLength(0)}x{projection.GetLength(1)}, but restricting from {system.Type} " +
                $"(rank {system.Rank}) to {subalgebra.Type} (rank {subalgebra.Rank}) needs {subalgebra.Rank}x{system.Rank}.",
                nameof(projection));
        }

        return new BranchingRule(system, subalgebra, (int[,])projection.Clone(), $"{system.Type} > {subalgebra.Type} (projection)");
    }

    /// <summary>
    /// Restricts V(lambda) to the subalgebra and decomposes it into irreducibles of the subalgebra with multiplicities.
    /// Throws <see cref="ExactArgumentException"/> when the projected weights are not a character of the subalgebra
    /// (naming the weight where invariance fails), and <see cref="BeyondCapabilityException"/> when V(lambda) has more than
    /// <paramref name="maximumWeights"/> distinct weights.
    /// </summary>
    /// <param name="representation">An irreducible representation of <see cref="System"/>.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    /// <param name="maximumWeights">Cap on the number of distinct weights of the representation (checked from the dimension
    /// and the Weyl orbit sizes of the dominant weights before any weight is listed).</param>
    /// <param name="progress">Receives progress reports (optional): "Freudenthal multiplicities" and "Weyl orbits" of
    /// <see cref="IrreducibleRepresentation.AllWeights"/>, then "projecting weights" (one unit per weight) and
    /// "peeling irreducibles" (one unit per dominant weight of the restricted character used up).</param>
    public RepresentationSum Restrict(
        IrreducibleRepresentation representation,
        CancellationToken cancellationToken = default,
        long maximumWeights = IrreducibleRepresentation.DefaultMaximumWeights,
        IProgress<RepresentationProgress>? progress = null)
    {
        ArgumentNullException.ThrowIfNull(representation);
        if (!representation.System.Type.Equals(System.Type))
        {
            throw new ExactArgumentException(
                $"The representation {representation.HighestWeight} is one of {representation.System.Type}, but this rule restricts from {System.Type}.",
                nameof(representation));
        }

        var subGeometry = GeometryCache.For(Subalgebra);
        var subRank = Subalgebra.Rank;
        var rank = System.Rank;
        var projected = new Dictionary<WeightKey, BigInteger>();
        var weights = representation.AllWeightsRaw(maximumWeights, cancellationToken, progress);
        var meter = new ProgressMeter(progress, cancellationToken, "projecting weights", weights.Count);
        foreach (var (weight, multiplicity) in weights)
        {
            meter.Advance();
            var image = new int[subRank];
            for (var r = 0; r < subRank; r++)
            {
                long sum = 0;
                for (var j = 0; j < rank; j++)
                {
                    sum += (long)_projection[r, j] * weight[j];
                }

                image[r] = checked((int)sum);
            }

            var key = new WeightKey(image);
            projected[key] = projected.GetValueOrDefault(key) + multiplicity;
        }

        foreach (var (key, multiplicity) in projected)
        {
            var dominant = subGeometry.Dominant(key.Labels);
            var dominantMultiplicity = projected.GetValueOrDefault(new WeightKey(dominant));
            if (dominantMultiplicity != multiplicity)
            {
                throw new ExactArgumentException(
                    $"{Description}: the projection does not define a branching rule: restricting {representation.HighestWeight} gives " +
                    $"weight {key} with multiplicity {multiplicity} but its Weyl image {new WeightKey(dominant)} with multiplicity " +
                    $"{dominantMultiplicity} (projected weights must be invariant under the Weyl group of {Subalgebra.Type}).",
                    "projection");
            }
        }

        meter.Finish();
        var terms = CharacterPeeling.Peel(Subalgebra, CharacterPeeling.DominantPart(projected), cancellationToken, progress);
        CharacterPeeling.RequireNonNegative(terms, Description);
        var result = new RepresentationSum(Subalgebra, terms);
        if (result.Dimension != representation.Dimension)
        {
            throw new ExactArgumentException(
                $"{Description}: restricting {representation.HighestWeight} (dimension {representation.Dimension}) gave dimension " +
                $"{result.Dimension}; the projection does not define a branching rule.",
                "projection");
        }

        return result;
    }

    /// <summary>True for rules made by <see cref="ToLevi"/>, which can report U(1) charges.</summary>
    public bool HasCharges => _chargeNodes is not null;

    /// <summary>
    /// For a Levi rule: restricts V(lambda) to the Levi subalgebra including its centre. The charge of a weight mu under the
    /// deleted node j is &lt;mu, omega_j^vee&gt;, the coefficient of alpha_j when mu is written in simple roots (the
    /// fundamental coweight of node j generates one U(1) of the centre); one charge per deleted node, in increasing node
    /// order. Physics normalisations (hypercharge etc.) are rational multiples of these. Terms are ordered by charges, then
    /// as in <see cref="RepresentationSum"/>. Throws <see cref="ExactArgumentException"/> for rules not made by
    /// <see cref="ToLevi"/>.
    /// </summary>
    /// <param name="representation">An irreducible representation of <see cref="System"/>.</param>
    /// <param name="cancellationToken">Cancels the computation.</param>
    /// <param name="maximumWeights">Cap on the number of distinct weights of the representation.</param>
    public IReadOnlyList<ChargedTerm> RestrictWithCharges(
        IrreducibleRepresentation representation,
        CancellationToken cancellationToken = default,
        long maximumWeights = IrreducibleRepresentation.DefaultMaximumWeights)
    {
        if (_chargeNodes is null)
        {
            throw new ExactArgumentException($"{Description}: charges are defined for Levi subalgebras (BranchingRule.ToLevi) only.", nameof(representation));
        }

        // Validates the projection and the representation, and checks dimension, before the sectors are split.
        Restrict(representation, cancellationToken, maximumWeights, null);
        var geometry = representation.Geometry;
        var subRank = Subalgebra.Rank;
        var rank = System.Rank;
        var sectors = new Dictionary<string, (Rational[] Charges, Dictionary<WeightKey, BigInteger> Weights)>();
        foreach (var (weight, multiplicity) in representation.AllWeightsRaw(maximumWeights, cancellationToken))
        {
            var charges = new Rational[_chargeNodes.Length];
            for (var c = 0; c < charges.Length; c++)
            {
                var sum = Rational.Zero;
                for (var i = 0; i < rank; i++)
                {
                    if (weight[i] != 0)
                    {
                        sum += geometry.InverseCartan[_chargeNodes[c], i] * weight[i];
                    }
                }

                charges[c] = sum;
            }

            var chargeKey = string.Join(",", charges);
            if (!sectors.TryGetValue(chargeKey, out var sector))
            {
                sector = (charges, new Dictionary<WeightKey, BigInteger>());
                sectors[chargeKey] = sector;
            }

            var image = new int[subRank];
            for (var r = 0; r < subRank; r++)
            {
                for (var j = 0; j < rank; j++)
                {
                    image[r] += _projection[r, j] * weight[j];
                }
            }

            var key = new WeightKey(image);
            sector.Weights[key] = sector.Weights.GetValueOrDefault(key) + multiplicity;
        }

        var result = new List<ChargedTerm>();
        foreach (var (charges, weights) in sectors.Values.OrderBy(s => s.Charges, Comparer<Rational[]>.Create(CompareCharges)))
        {
            var terms = CharacterPeeling.Peel(Subalgebra, CharacterPeeling.DominantPart(weights), cancellationToken);
            CharacterPeeling.RequireNonNegative(terms, Description);
            foreach (var term in new RepresentationSum(Subalgebra, terms).Terms)
            {
                result.Add(new ChargedTerm(term.Irreducible, charges, term.Multiplicity));
            }
        }

        return result;
    }

    private static int CompareCharges(Rational[] a, Rational[] b)
    {
        for (var i = 0; i < a.Length; i++)
        {
            var c = a[i].CompareTo(b[i]);
            if (c != 0)
            {
                return c;
            }
        }

        return 0;
    }

    /// <summary>The description.</summary>
    public override string ToString() => Description;

    private static int[]? MatchNodes(WeightGeometry sub, int offset, Func<int, int, int> fullCartan, int[] nodes)
    {
        // Backtracking search for a bijection p -> nodes[...] preserving every Cartan matrix entry (diagrams have <= 8 nodes
        // in exceptional factors and are paths or forks otherwise, so this is quick).
        var n = nodes.Length;
        var map = new int[n];
        var used = new bool[n];
        bool Place(int p)
        {
            if (p == n)
            {
                return true;
            }

            for (var c = 0; c < n; c++)
            {
                if (used[c])
                {
                    continue;
                }

                var ok = true;
                for (var q = 0; q < p && ok; q++)
                {
                    ok = sub.Cartan[offset + p, offset + q] == fullCartan(nodes[c], map[q])
                        && sub.Cartan[offset + q, offset + p] == fullCartan(map[q], nodes[c]);
                }

                if (!ok)
                {
                    continue;
                }

                used[c] = true;
                map[p] = nodes[c];
                if (Place(p + 1))
                {
                    return true;
                }

                used[c] = false;
            }

            return false;
        }

        return Place(0) ? map : null;
    }
}
