using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Algebras.Tests.Chevalley;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Benchmarks.Algebras;

/// <summary>
/// The workload of the identification benchmarks: a Chevalley algebra rewritten in a random unimodular integer basis
/// (fixed seed), the same change of basis as the Algebras tests' round trips (RandomBasisChange, linked into this
/// project). Only the structure constants reach the identification.
/// </summary>
public static class RandomBasis
{
    /// <summary>The undisguised algebra and the new basis, so a benchmark can rebuild a fresh algebra per iteration.</summary>
    public static (LieAlgebra<Rational> Algebra, List<LieElement<Rational>> Basis) Prepare(string type, int seed)
    {
        var algebra = RandomBasisChange.Chevalley(type);
        return (algebra, RandomBasisChange.Basis(algebra, ChevalleyBasis.Of(type).System.Rank, seed));
    }
}
