using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Roots;

/// <summary>
/// A simple Cartan type such as A3, B2 or E8: a family and a rank. Immutable and equatable by (family, rank).
/// The family given is kept even when a low-rank coincidence makes it isomorphic to another type
/// (B1 = C1 = A1, D2 = A1+A1, D3 = A3, C2 = B2); <see cref="Coincidence"/> states it.
/// </summary>
/// <remarks>Nodes are numbered as in Bourbaki, Lie Groups and Lie Algebras, ch. 4-6, Plates I-IX (1-based).</remarks>
public sealed class SimpleCartanType : IEquatable<SimpleCartanType>
{
    private SimpleCartanType(CartanFamily family, int rank)
    {
        Family = family;
        Rank = rank;
    }

    /// <summary>The family letter.</summary>
    public CartanFamily Family { get; }

    /// <summary>The rank (number of simple roots, nodes of the Dynkin diagram).</summary>
    public int Rank { get; }

    /// <summary>The name, family letter followed by the rank, e.g. "E8".</summary>
    public string Name => $"{Family}{Rank}";

    /// <summary>
    /// A sentence stating a low-rank coincidence (e.g. "C2 is isomorphic to B2 ..."), or null when the type has none.
    /// The type itself keeps the family it was given.
    /// </summary>
    public string? Coincidence => (Family, Rank) switch
    {
        (CartanFamily.B, 1) => "B1 is isomorphic to A1 (so(3) and sl(2) have the same root system: one pair of roots).",
        (CartanFamily.C, 1) => "C1 is isomorphic to A1 (sp(2) = sl(2)).",
        (CartanFamily.D, 2) => "D2 is isomorphic to A1+A1 (so(4) = sl(2) + sl(2)): two orthogonal simple roots, no edge in the diagram.",
        (CartanFamily.D, 3) => "D3 is isomorphic to A3 (so(6) = sl(4)); in Bourbaki's D numbering node 1 is the middle node of the chain 2-1-3.",
        (CartanFamily.C, 2) => "C2 is isomorphic to B2 (same root system up to relabelling: C2's node 1 is short, B2's node 1 is long).",
        _ => null,
    };

    /// <summary>The simple type with the given family and rank.</summary>
    /// <exception cref="ExactArgumentException">The rank is not allowed for the family; the message says which ranks exist.</exception>
    public static SimpleCartanType Of(CartanFamily family, int rank)
    {
        var problem = RankProblem(family, rank);
        if (problem is not null)
        {
            throw new ExactArgumentException(problem, nameof(rank));
        }

        return new SimpleCartanType(family, rank);
    }

    /// <summary>Why (family, rank) is not a finite simple type, or null when it is one.</summary>
    internal static string? RankProblem(CartanFamily family, int rank)
    {
        var name = $"{family}{rank}";
        return family switch
        {
            CartanFamily.A when rank < 1 => $"{name} is not a type: A needs rank at least 1 (A1 = sl(2)).",
            CartanFamily.B when rank < 1 => $"{name} is not a type: B needs rank at least 2 (B1 is accepted as A1).",
            CartanFamily.C when rank < 1 => $"{name} is not a type: C needs rank at least 2 (C1 is accepted as A1).",
            CartanFamily.D when rank < 2 => $"{name} is not semisimple: D1 = so(2) is abelian and D0 is empty; D needs rank at least 3 (D2 = A1+A1 and D3 = A3 are accepted).",
            CartanFamily.E when rank is < 6 or > 8 => $"{name} is not a finite type: E exists for ranks 6, 7, 8.",
            CartanFamily.F when rank != 4 => $"{name} is not a finite type: F exists only for rank 4.",
            CartanFamily.G when rank != 2 => $"{name} is not a finite type: G exists only for rank 2.",
            _ when !Enum.IsDefined(family) => $"Unknown Cartan family value {(int)family}.",
            _ => null,
        };
    }

    /// <summary>
    /// Squared lengths of the simple roots in Bourbaki order, normalised so that long roots have squared length 2.
    /// </summary>
    internal Rational[] SimpleRootLengthsSquared()
    {
        var lengths = new Rational[Rank];
        for (var i = 0; i < Rank; i++)
        {
            lengths[i] = 2;
        }

        switch (Family)
        {
            case CartanFamily.B when Rank >= 2:
                lengths[Rank - 1] = 1;
                break;
            case CartanFamily.C when Rank >= 2:
                for (var i = 0; i < Rank - 1; i++)
                {
                    lengths[i] = 1;
                }

                break;
            case CartanFamily.F:
                lengths[2] = 1;
                lengths[3] = 1;
                break;
            case CartanFamily.G:
                lengths[0] = new Rational(2, 3);
                break;
        }

        return lengths;
    }

    /// <summary>The edges of the Dynkin diagram as pairs of zero-based node indices (Bourbaki numbering minus one).</summary>
    internal IReadOnlyList<(int, int)> Edges()
    {
        var edges = new List<(int, int)>();
        switch (Family)
        {
            case CartanFamily.A:
            case CartanFamily.B:
            case CartanFamily.C:
            case CartanFamily.F:
            case CartanFamily.G:
                for (var i = 0; i + 1 < Rank; i++)
                {
                    edges.Add((i, i + 1));
                }

                break;
            case CartanFamily.D:
                if (Rank >= 3)
                {
                    for (var i = 0; i + 2 < Rank; i++)
                    {
                        edges.Add((i, i + 1));
                    }

                    edges.Add((Rank - 3, Rank - 1));
                }

                break;
            case CartanFamily.E:
                // Bourbaki: chain 1-3-4-5-...-n, node 2 attached to node 4.
                edges.Add((0, 2));
                for (var i = 2; i + 1 < Rank; i++)
                {
                    edges.Add((i, i + 1));
                }

                edges.Add((1, 3));
                break;
        }

        return edges;
    }

    /// <summary>Equality of family and rank (C2 and B2 are different types, though isomorphic).</summary>
    public bool Equals(SimpleCartanType? other) => other is not null && other.Family == Family && other.Rank == Rank;

    /// <inheritdoc/>
    public override bool Equals(object? obj) => Equals(obj as SimpleCartanType);

    /// <inheritdoc/>
    public override int GetHashCode() => HashCode.Combine(Family, Rank);

    /// <summary>Equality of family and rank.</summary>
    public static bool operator ==(SimpleCartanType? left, SimpleCartanType? right) => left is null ? right is null : left.Equals(right);

    /// <summary>Inequality of family and rank.</summary>
    public static bool operator !=(SimpleCartanType? left, SimpleCartanType? right) => !(left == right);

    /// <summary>The name, e.g. "E8".</summary>
    public override string ToString() => Name;
}
