using System.Numerics;

namespace AlgebraNotebook.Roots;

/// <summary>
/// The finite abelian group P/Q (weight lattice modulo root lattice). It is the centre of the simply connected group
/// and the fundamental group of the adjoint group; its order is the determinant of the Cartan matrix
/// (Bourbaki Plates I-IX, item (VIII); Humphreys, Introduction to Lie Algebras, ch. 13).
/// The cyclic factors are the invariant factors (greater than 1) of the Smith normal form of the Cartan matrix.
/// </summary>
public sealed class WeightLatticeQuotient
{
    internal WeightLatticeQuotient(CartanType type, IReadOnlyList<int> invariantFactors)
    {
        Type = type;
        InvariantFactors = invariantFactors;
        Order = invariantFactors.Aggregate(BigInteger.One, (p, d) => p * d);
    }

    /// <summary>The Cartan type.</summary>
    public CartanType Type { get; }

    /// <summary>The orders d_1 | d_2 | ... of the cyclic factors, all greater than 1 (empty when P = Q, e.g. E8, F4, G2).</summary>
    public IReadOnlyList<int> InvariantFactors { get; }

    /// <summary>The order |P/Q| = det A.</summary>
    public BigInteger Order { get; }

    /// <summary>True when P = Q.</summary>
    public bool IsTrivial => InvariantFactors.Count == 0;

    /// <summary>True when the group is cyclic (at most one invariant factor).</summary>
    public bool IsCyclic => InvariantFactors.Count <= 1;

    /// <summary>The structure as text, e.g. "Z2 x Z2" for D4, "Z4" for D5, "1" for the trivial group.</summary>
    public string Structure => IsTrivial ? "1" : string.Join(" x ", InvariantFactors.Select(d => $"Z{d}"));

    /// <summary>For example "P/Q for D4: Z2 x Z2 (order 4)".</summary>
    public override string ToString() => $"P/Q for {Type}: {Structure} (order {Order})";
}
