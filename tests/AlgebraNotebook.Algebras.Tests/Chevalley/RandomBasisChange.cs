using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Chevalley;

/// <summary>
/// A random unimodular integer change of basis of a Chevalley algebra (fixed seed), so identification cannot read the
/// type off the basis: the coroots h_i are mixed by a product of integer transvections, each positive root vector gets
/// plus or minus another positive root vector that comes later in a random order (likewise for the negative ones), and
/// the resulting basis is shuffled. The change of basis preserves h, n+ and n- and has determinant +-1.
/// </summary>
internal static class RandomBasisChange
{
    public static LieAlgebra<Rational> Disguised(string type, int seed) =>
        Disguise(Chevalley(type), ChevalleyBasis.Of(type).System.Rank, seed);

    /// <summary>The algebra of the given Cartan type in its Chevalley basis (structure constants over Q).</summary>
    public static LieAlgebra<Rational> Chevalley(string type)
    {
        var chevalley = ChevalleyBasis.Of(type);
        return chevalley.ToLieAlgebra(maximumDimension: chevalley.Dimension);
    }

    public static LieAlgebra<Rational> Disguise(LieAlgebra<Rational> algebra, int rank, int seed) =>
        algebra.InBasis(Basis(algebra, rank, seed), label: $"{algebra.Label} in a random basis (seed {seed})");

    /// <summary>The new basis itself (the benchmarks link this file and rebuild a fresh algebra from it per iteration).</summary>
    public static List<LieElement<Rational>> Basis(LieAlgebra<Rational> algebra, int rank, int seed)
    {
        var random = new Random(seed);
        var n = algebra.Dimension;
        var positives = (n - rank) / 2;
        var vectors = new List<Rational[]>();

        // Torus: U = product of 3r transvections row_i += c row_j.
        var u = new Rational[rank, rank];
        for (var i = 0; i < rank; i++)
        {
            u[i, i] = 1;
        }

        for (var t = 0; t < 3 * rank && rank > 1; t++)
        {
            var i = random.Next(rank);
            var j = (i + 1 + random.Next(rank - 1)) % rank;
            var c = random.Next(2) == 0 ? -1 : 1;
            for (var k = 0; k < rank; k++)
            {
                u[i, k] += c * u[j, k];
            }
        }

        for (var i = 0; i < rank; i++)
        {
            var v = new Rational[n];
            for (var k = 0; k < rank; k++)
            {
                v[k] = u[i, k];
            }

            vectors.Add(v);
        }

        foreach (var offset in new[] { rank, rank + positives })
        {
            var order = Enumerable.Range(offset, positives).OrderBy(_ => random.Next()).ToArray();
            for (var t = 0; t < positives; t++)
            {
                var v = new Rational[n];
                v[order[t]] = 1;
                if (t + 1 < positives)
                {
                    v[order[t + 1 + random.Next(positives - t - 1)]] = random.Next(2) == 0 ? -1 : 1;
                }

                vectors.Add(v);
            }
        }

        return vectors.OrderBy(_ => random.Next()).Select(v => algebra.Element(v)).ToList();
    }
}
