using AlgebraNotebook.Roots;

namespace AlgebraNotebook.Algebras.Enveloping;

/// <summary>
/// The number and degrees of the independent Casimir elements of a semisimple Lie algebra (over C, after complexification
/// for a real algebra), from <see cref="CasimirElements.BasicInvariantDegrees{T}"/>.
/// </summary>
/// <param name="Type">The Cartan type of the (complexified) algebra, from its root decomposition.</param>
/// <param name="Degrees">The degrees of the basic invariants (exponents + 1), ascending; their count is the rank.</param>
/// <param name="Statement">Where the numbers come from, in words.</param>
public sealed record CasimirDegrees(CartanType Type, IReadOnlyList<int> Degrees, string Statement)
{
    /// <summary>The number of algebraically independent Casimir elements generating the centre of U(g): the rank.</summary>
    public int Count => Degrees.Count;

    /// <summary>Plain text, e.g. "A2: 2 independent Casimirs of degrees 2, 3 (...)".</summary>
    public override string ToString() => $"{Type}: {Count} independent Casimirs of degrees {string.Join(", ", Degrees)} ({Statement})";
}
