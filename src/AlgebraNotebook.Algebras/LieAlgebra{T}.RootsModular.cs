using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    private (int K, T C)[][]? _sparse;

    /// <summary>
    /// The root decomposition by the modular variant: candidates are found modulo the prime 2^61 - 1 and every one is
    /// proved over the field before it is used. Steps: (1) basis elements whose ad has a minimal polynomial with distinct
    /// roots in the prime field are kept as toral candidates, and a maximal commuting set of them is chosen greedily in
    /// basis order, as in <see cref="RootDecompositionReference"/>; (2) for a random element x of their span, the
    /// eigenvectors of ad x on its image are built from one Krylov sequence and the roots of its minimal polynomial
    /// (equal-degree splitting), then lifted to rationals by rational reconstruction; (3) every lifted vector is checked
    /// exactly to be a common eigenvector of the span, with pairwise distinct non-zero characters, which proves the root
    /// decomposition and that the span is a split Cartan subalgebra; (4) semisimplicity is proved from the decomposition
    /// (the Killing form on h, the sum of α(h_i) α(h_j) over the roots, is non-degenerate, the roots are symmetric, and
    /// [x_α, x_-α] ≠ 0); (5) roots are ordered, the Cartan matrix built from exact inner products and the type checked
    /// exactly as in the reference variant. The output equals the reference variant's whenever both succeed (same
    /// Cartan subalgebra basis, same random element for the order, same normalisation of root vectors: last non-zero
    /// coordinate 1). Cost: about n^2 (number of roots) prime-field operations plus sparse exact checks; E8 takes seconds.
    /// </summary>
    /// <exception cref="BeyondCapabilityException">The variant cannot prove a decomposition (no split toral basis elements,
    /// their span is not a Cartan subalgebra, a non-rational structure constant, a coordinate beyond the reconstruction
    /// bound, or the algebra is not semisimple); the message says which. <see cref="RootDecomposition"/> then uses the
    /// reference variant.</exception>
    public RootDecomposition<T> RootDecompositionModular() =>
        TryRootDecompositionModular(out var reason)
        ?? throw new BeyondCapabilityException($"The modular root decomposition of {Label} did not apply: {reason}.");

    internal RootDecomposition<T>? TryRootDecompositionModular(out string reason)
    {
        var n = Dimension;
        var sparse = SparseConstants();
        var residues = new ulong[sparse.Length][];
        for (var pair = 0; pair < sparse.Length; pair++)
        {
            var list = sparse[pair];
            if (list.Length == 0)
            {
                continue;
            }

            residues[pair] = new ulong[list.Length];
            for (var t = 0; t < list.Length; t++)
            {
                if (RationalPart<T>.TryToRational(list[t].C) is not { } q)
                {
                    reason = $"the structure constant [{_names[pair / n]}, {_names[pair % n]}] has the non-rational coefficient {list[t].C}";
                    return null;
                }

                if (PrimeField.FromRational(q) is not { } u)
                {
                    reason = $"the structure constant {q} has a denominator divisible by 2^61 - 1";
                    return null;
                }

                residues[pair][t] = u;
            }
        }

        // ad(x) v modulo p for x, v given by residues.
        ulong[] Apply(ulong[] x, ulong[] v)
        {
            var result = new ulong[n];
            for (var a = 0; a < n; a++)
            {
                if (x[a] == 0)
                {
                    continue;
                }

                for (var b = 0; b < n; b++)
                {
                    if (v[b] == 0)
                    {
                        continue;
                    }

                    var list = sparse[a * n + b];
                    if (list.Length == 0)
                    {
                        continue;
                    }

                    var s = PrimeField.Mul(x[a], v[b]);
                    var values = residues[a * n + b];
                    for (var t = 0; t < list.Length; t++)
                    {
                        var k = list[t].K;
                        result[k] = PrimeField.Add(result[k], PrimeField.Mul(s, values[t]));
                    }
                }
            }

            return result;
        }

        var random = new Random(977);
        ulong[] RandomVector() => Enumerable.Range(0, n).Select(_ => (ulong)random.NextInt64(1, (long)PrimeField.P)).ToArray();

        // (1) Toral candidates and a maximal commuting set, in basis order. A toral element with rational eigenvalues has
        // K(x, x) = sum of squares of its eigenvalues, zero only when ad x = 0; so ad-nilpotent basis elements (K(x, x) = 0,
        // ad x != 0) are skipped before the Krylov test.
        var commuting = new List<int>();
        for (var j = 0; j < n; j++)
        {
            var central = true;
            var killing = 0UL;
            for (var b = 0; b < n; b++)
            {
                var list = sparse[j * n + b];
                var values = residues[j * n + b];
                for (var t = 0; t < list.Length; t++)
                {
                    central = false;
                    var k = list[t].K;
                    var back = sparse[j * n + k];
                    for (var s = 0; s < back.Length; s++)
                    {
                        if (back[s].K == b)
                        {
                            killing = PrimeField.Add(killing, PrimeField.Mul(values[t], residues[j * n + k][s]));
                        }
                    }
                }
            }

            if (killing == 0 && !central)
            {
                continue;
            }

            var unit = new ulong[n];
            unit[j] = 1;
            var (minimal, _) = KrylovMinimalPolynomial(v => Apply(unit, v), RandomVector(), n);
            if (!PrimeFieldPolynomials.SplitsWithDistinctRoots(minimal))
            {
                continue;
            }

            if (commuting.All(c => sparse[c * n + j].Length == 0))
            {
                commuting.Add(j);
            }
        }

        if (commuting.Count > 0)
        {
            var fromBasis = FromCartan(Echelon(commuting.Select(j => Vectors<T>.Unit(n, j))), out reason);
            if (fromBasis is not null)
            {
                return fromBasis;
            }

            reason = $"the span of the {commuting.Count} commuting toral basis elements ({string.Join(", ", commuting.Select(j => _names[j]))}): {reason}";
        }
        else
        {
            reason = "no basis element has an adjoint action that is diagonalisable over the field";
        }

        // (1') No split Cartan subalgebra among the basis elements (a dense basis): the verified Cartan subalgebra of
        // CartanSubalgebra, the one the reference variant uses, so both variants again give the same output.
        T[][] cartan;
        try
        {
            cartan = CartanCore();
        }
        catch (BeyondCapabilityException e)
        {
            reason += $"; no Cartan subalgebra: {e.Message}";
            return null;
        }

        var fromCartan = FromCartan(cartan, out var cartanReason);
        if (fromCartan is null)
        {
            reason += $"; with the Cartan subalgebra of CartanSubalgebra: {cartanReason}";
        }

        return fromCartan;

        RootDecomposition<T>? FromCartan(T[][] h, out string reason)
        {
        var r = h.Length;
        var m = n - r;
        var hResidues = new ulong[r][];
        for (var i = 0; i < r; i++)
        {
            hResidues[i] = new ulong[n];
            for (var a = 0; a < n; a++)
            {
                if (RationalPart<T>.TryToRational(h[i][a]) is not { } q || PrimeField.FromRational(q) is not { } u)
                {
                    reason = "a Cartan subalgebra basis vector has a coordinate that is not rational or not reducible modulo the prime";
                    return null;
                }

                hResidues[i][a] = u;
            }
        }

        // (2) Eigenvectors of ad x on its image for a random x in span(h), modulo p.
        List<ulong[]>? eigenvectors = null;
        for (var attempt = 0; attempt < 3 && eigenvectors is null; attempt++)
        {
            var x = new ulong[n];
            foreach (var v in hResidues)
            {
                var c = (ulong)random.NextInt64(1, (long)PrimeField.P);
                for (var a = 0; a < n; a++)
                {
                    x[a] = PrimeField.Add(x[a], PrimeField.Mul(c, v[a]));
                }
            }

            var start = Apply(x, RandomVector());
            var (f, krylov) = KrylovMinimalPolynomial(v => Apply(x, v), start, m);
            if (f.Length - 1 != m || f[0] == 0 || !PrimeFieldPolynomials.SplitsWithDistinctRoots(f))
            {
                continue;
            }

            eigenvectors = [];
            foreach (var lambda in EigenvalueResidues(f, random))
            {
                // u = q(ad x) start with q = f / (t - λ): the component of start in the λ-eigenspace, up to a factor.
                var q = new ulong[m];
                var carry = 0UL;
                for (var k = m; k >= 1; k--)
                {
                    carry = PrimeField.Add(f[k], PrimeField.Mul(carry, lambda));
                    q[k - 1] = carry;
                }

                var u = new ulong[n];
                for (var k = 0; k < m; k++)
                {
                    if (q[k] == 0)
                    {
                        continue;
                    }

                    for (var a = 0; a < n; a++)
                    {
                        u[a] = PrimeField.Add(u[a], PrimeField.Mul(q[k], krylov[k][a]));
                    }
                }

                eigenvectors.Add(u);
            }
        }

        if (eigenvectors is null)
        {
            reason = "it is not a split Cartan subalgebra modulo the prime";
            return null;
        }

        // (3) Lift and prove: [h_i, u] = α_i u exactly, characters distinct and non-zero.
        for (var i = 0; i < r; i++)
        {
            for (var j = i + 1; j < r; j++)
            {
                if (!Vectors<T>.IsZero(SparseBracket(h[i], h[j])))
                {
                    reason = "the toral candidates do not commute";
                    return null;
                }
            }
        }

        var roots = new List<(T[] Values, T[] Vector)>();
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var residue in eigenvectors)
        {
            var last = Array.FindLastIndex(residue, c => c != 0);
            var scale = PrimeField.Inverse(residue[last]);
            var vector = new T[n];
            for (var a = 0; a < n; a++)
            {
                if (residue[a] == 0)
                {
                    vector[a] = T.Zero;
                    continue;
                }

                if (PrimeField.Reconstruct(PrimeField.Mul(residue[a], scale)) is not { } coordinate)
                {
                    reason = $"a root vector has a coordinate beyond the reconstruction bound {PrimeField.ReconstructionBound}";
                    return null;
                }

                vector[a] = T.FromRational(coordinate);
            }

            var values = new T[r];
            for (var i = 0; i < r; i++)
            {
                var image = SparseBracket(h[i], vector);
                values[i] = image[last];
                if (!Vectors<T>.Equal(image, Vectors<T>.Scale(values[i], vector)))
                {
                    reason = "a lifted vector is not a common eigenvector of the Cartan subalgebra";
                    return null;
                }
            }

            if (values.All(v => v.IsZero) || !seen.Add(string.Join(",", values)))
            {
                reason = "two lifted eigenvectors share a character, or a character is zero";
                return null;
            }

            roots.Add((values, vector));
        }

        // (4) Semisimplicity from the decomposition: K is non-degenerate on h and pairs each root space with its negative.
        var kappa = Matrix<T>.FromFunction(r, r, (i, j) =>
        {
            var s = T.Zero;
            foreach (var (values, _) in roots)
            {
                s += values[i] * values[j];
            }

            return s;
        });
        if (LinearAlgebra.Rank(kappa) != r)
        {
            reason = "the Killing form is degenerate on the Cartan subalgebra (the algebra is not semisimple)";
            return null;
        }

        var byCharacter = roots.ToDictionary(root => string.Join(",", root.Values), root => root.Vector, StringComparer.Ordinal);
        foreach (var (values, vector) in roots)
        {
            if (!byCharacter.TryGetValue(string.Join(",", values.Select(v => -v)), out var opposite)
                || Vectors<T>.IsZero(SparseBracket(vector, opposite)))
            {
                reason = "a root space is not paired with the root space of the negative root (the algebra is not semisimple)";
                return null;
            }
        }

        // (5) Order as the reference variant does: by α(x) for its random element x of the Cartan subalgebra.
        var order = new Random(4242);
        for (var attempt = 0; attempt < RandomAttempts; attempt++)
        {
            var coefficients = h.Select(_ => T.FromInteger(order.Next(-RandomCoefficientBound, RandomCoefficientBound + 1))).ToArray();
            var atX = roots.Select(root =>
            {
                var s = T.Zero;
                for (var i = 0; i < r; i++)
                {
                    s += coefficients[i] * root.Values[i];
                }

                return RationalPart<T>.TryToRational(s)!.Value;
            }).ToArray();
            if (atX.Any(v => v.IsZero) || atX.Distinct().Count() != atX.Length)
            {
                continue;
            }

            var sorted = Enumerable.Range(0, roots.Count).OrderBy(i => atX[i]).Select(i => roots[i]).ToList();
            reason = "";
            return BuildRootData(ToElements(h), h, sorted, kappa);
        }

        reason = "no random element of the Cartan subalgebra separated the roots";
        return null;
        }
    }

    /// <summary>
    /// The roots of f (split, distinct roots). For a semisimple algebra the eigenvalues of ad x on its image come in pairs
    /// ±α(x), so f(t) = g(t^2): then the roots of g are found and their square roots taken (p = 3 mod 4, so a square root
    /// of a square s is s^((p+1)/4)), which halves the degree of the splitting.
    /// </summary>
    private static List<ulong> EigenvalueResidues(ulong[] f, Random random)
    {
        if (f.Length % 2 == 0 || Enumerable.Range(0, f.Length).Any(k => k % 2 == 1 && f[k] != 0))
        {
            return PrimeFieldPolynomials.Roots(f, random);
        }

        var g = Enumerable.Range(0, f.Length).Where(k => k % 2 == 0).Select(k => f[k]).ToArray();
        var roots = new List<ulong>();
        foreach (var s in PrimeFieldPolynomials.Roots(g, random))
        {
            var root = PrimeField.Pow(s, (PrimeField.P + 1) / 4);
            if (PrimeField.Mul(root, root) != s)
            {
                return PrimeFieldPolynomials.Roots(f, random);
            }

            roots.Add(root);
            roots.Add(PrimeField.Neg(root));
        }

        return roots;
    }

    /// <summary>The minimal polynomial (monic, residues) of start under the map, and the Krylov vectors start, A start, ...</summary>
    private static (ulong[] Minimal, List<ulong[]> Krylov) KrylovMinimalPolynomial(Func<ulong[], ulong[]> map, ulong[] start, int maximumDegree)
    {
        var n = start.Length;
        var krylov = new List<ulong[]>();
        var reduced = new List<(ulong[] Vector, int Pivot, ulong[] Combination)>();
        var current = start;
        for (var k = 0; k <= maximumDegree; k++)
        {
            krylov.Add(current);
            var w = (ulong[])current.Clone();
            var combination = new ulong[k + 1];
            combination[k] = 1;
            foreach (var (vector, pivot, comb) in reduced)
            {
                var factor = w[pivot];
                if (factor == 0)
                {
                    continue;
                }

                for (var a = 0; a < n; a++)
                {
                    if (vector[a] != 0)
                    {
                        w[a] = PrimeField.Sub(w[a], PrimeField.Mul(factor, vector[a]));
                    }
                }

                for (var c = 0; c < comb.Length; c++)
                {
                    combination[c] = PrimeField.Sub(combination[c], PrimeField.Mul(factor, comb[c]));
                }
            }

            var p = Array.FindIndex(w, c => c != 0);
            if (p < 0)
            {
                // combination is a polynomial q with q(A) start = 0, monic of degree k.
                return (PrimeFieldPolynomials.Trim(combination), krylov);
            }

            var inv = PrimeField.Inverse(w[p]);
            for (var a = 0; a < n; a++)
            {
                w[a] = PrimeField.Mul(w[a], inv);
            }

            for (var c = 0; c < combination.Length; c++)
            {
                combination[c] = PrimeField.Mul(combination[c], inv);
            }

            reduced.Add((w, p, combination));
            if (k < maximumDegree)
            {
                current = map(current);
            }
        }

        return ([], krylov);
    }

    /// <summary>The non-zero structure constants: entry a n + b lists (k, c_ab^k).</summary>
    internal (int K, T C)[][] SparseConstants()
    {
        if (_sparse is { } ready)
        {
            return ready;
        }

        var n = Dimension;
        var sparse = new (int K, T C)[n * n][];
        var buffer = new List<(int, T)>();
        for (var pair = 0; pair < n * n; pair++)
        {
            buffer.Clear();
            var offset = pair * n;
            for (var k = 0; k < n; k++)
            {
                var c = _constants[offset + k];
                if (!c.IsZero)
                {
                    buffer.Add((k, c));
                }
            }

            sparse[pair] = buffer.Count == 0 ? [] : buffer.ToArray();
        }

        return _sparse = sparse;
    }

    /// <summary>[x, y] from the sparse constants (cost: |supp x| |supp y| times the bracket length).</summary>
    internal T[] SparseBracket(T[] x, T[] y)
    {
        var n = Dimension;
        var sparse = SparseConstants();
        var r = Vectors<T>.Zero(n);
        var ys = Enumerable.Range(0, n).Where(b => !y[b].IsZero).ToArray();
        for (var a = 0; a < n; a++)
        {
            if (x[a].IsZero)
            {
                continue;
            }

            foreach (var b in ys)
            {
                var list = sparse[a * n + b];
                if (list.Length == 0)
                {
                    continue;
                }

                var s = x[a] * y[b];
                foreach (var (k, c) in list)
                {
                    r[k] += s * c;
                }
            }
        }

        return r;
    }
}
