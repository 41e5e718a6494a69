using AlgebraNotebook.Algebras;
using AlgebraNotebook.Algebras.Chevalley;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Benchmarks.Algebras;

/// <summary>
/// The workload of the identification benchmarks: a Chevalley algebra rewritten in a random unimodular integer basis
/// (fixed seed): coroots mixed by integer transvections, each root vector plus or minus a later one of the same sign in
/// a random order, the basis shuffled. Only the structure constants reach the identification.
/// </summary>
public static class RandomBasis
{
    /// <summary>The undisguised algebra and the new basis, so a benchmark can rebuild a fresh algebra per iteration.</summary>
    public static (LieAlgebra<Rational> Algebra, List<LieElement<Rational>> Basis) Prepare(string type, int seed)
    {
        var chevalley = ChevalleyBasis.Of(type);
        var algebra = chevalley.ToLieAlgebra(maximumDimension: chevalley.Dimension);
        var rank = chevalley.System.Rank;
        var random = new Random(seed);
        var n = algebra.Dimension;
        var positives = (n - rank) / 2;
        var vectors = new List<Rational[]>();
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

        return (algebra, vectors.OrderBy(_ => random.Next()).Select(v => algebra.Element(v)).ToList());
    }
}
