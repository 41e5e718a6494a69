using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

/// <summary>
/// A dense random unimodular integer change of basis (fixed seed): the identity matrix changed by random integer
/// transvections (row i += ±row j) until every row is mixed, then rows shuffled. Determinant ±1, so the new basis is a
/// basis over Z of the same lattice, and no basis element keeps any structure of the old basis.
/// </summary>
internal static class DenseBasisChange
{
    public static LieAlgebra<Rational> Disguise(LieAlgebra<Rational> algebra, int seed) =>
        algebra.InBasis(Basis(algebra, seed), label: $"{algebra.Label} in a dense random basis (seed {seed})");

    /// <summary>The new basis itself (the benchmarks link this file and rebuild a fresh algebra from it per iteration).</summary>
    public static List<LieElement<Rational>> Basis(LieAlgebra<Rational> algebra, int seed)
    {
        var random = new Random(seed);
        var n = algebra.Dimension;
        var rows = Enumerable.Range(0, n).Select(i =>
        {
            var v = new long[n];
            v[i] = 1;
            return v;
        }).ToArray();

        // Two sweeps: every row gets ± a random other row added (so each row is mixed with about four others per sweep,
        // then the mixing spreads), entries stay small.
        for (var sweep = 0; sweep < 2; sweep++)
        {
            for (var i = 0; i < n && n > 1; i++)
            {
                var j = (i + 1 + random.Next(n - 1)) % n;
                var c = random.Next(2) == 0 ? -1 : 1;
                for (var k = 0; k < n; k++)
                {
                    rows[i][k] += c * rows[j][k];
                }
            }
        }

        return rows.OrderBy(_ => random.Next()).Select(v => algebra.Element(v.Select(c => (Rational)c).ToArray())).ToList();
    }
}
