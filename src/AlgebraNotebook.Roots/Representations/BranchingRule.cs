using System.Numerics;
using AlgebraNotebook.Exact;

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
    /// node. The U(1) charges carried by the deleted nodes are not reported.
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
            var map = MatchNodes(subGeometry, offset, geometry, nodes)
                ?? throw new InvalidOperationException($"No Cartan-matrix isomorphism between {type} and nodes {string.Join(", ", oneBasedNodes)}.");
            for (var p = 0; p < nodes.Length; p++)
            {
                projection[offset + p, map[p]] = 1;
            }

            offset += nodes.Length;
        }

        var deleted = string.Join(", ", deletedNodes.OrderBy(n => n));
        return new BranchingRule(system, subalgebra, projection,
            $"{system.Type} > {subalgebra.Type} (Levi, deleting node{(deletedNodes.Length == 1 ? "" : "s")} {deleted})");
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
    /// <param name="maximumWeights">Cap on the number of distinct weights of the representation.</param>
    public RepresentationSum Restrict(
        IrreducibleRepresentation representation,
        CancellationToken cancellationToken = default,
        long maximumWeights = IrreducibleRepresentation.DefaultMaximumWeights)
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
        foreach (var (weight, multiplicity) in representation.AllWeightsRaw(maximumWeights, cancellationToken))
        {
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

        var terms = CharacterPeeling.Peel(Subalgebra, CharacterPeeling.DominantPart(projected), cancellationToken);
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

    /// <summary>The description.</summary>
    public override string ToString() => Description;

    private static int[]? MatchNodes(WeightGeometry sub, int offset, WeightGeometry full, int[] nodes)
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
                    ok = sub.Cartan[offset + p, offset + q] == full.Cartan[nodes[c], map[q]]
                        && sub.Cartan[offset + q, offset + p] == full.Cartan[map[q], nodes[c]];
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
