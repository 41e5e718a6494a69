using AlgebraNotebook.Algebras.Internal;
using AlgebraNotebook.Exact;

namespace AlgebraNotebook.Algebras;

public sealed partial class LieAlgebra<T>
{
    /// <summary>
    /// The same algebra written in another basis: the given elements b_1, ..., b_n (which must form a basis) become the
    /// basis elements of the result, and its structure constants are the coordinates of [b_i, b_j] in the new basis.
    /// The result is isomorphic to this algebra by construction (no Jacobi check is needed). Names default to
    /// b_1, ..., b_n. Cost: one exact inversion of the change-of-basis matrix plus one sparse bracket and one sparse
    /// coordinate change per pair.
    /// </summary>
    /// <param name="basis">Exactly <see cref="Dimension"/> linearly independent elements of this algebra.</param>
    /// <param name="names">Optional distinct, non-empty names, one per element.</param>
    /// <param name="label">Optional description for display.</param>
    /// <exception cref="ExactArgumentException">The number of elements differs from the dimension, an element belongs to
    /// another algebra, the elements are linearly dependent, or the names are wrong (count, empty or repeated).</exception>
    public LieAlgebra<T> InBasis(IReadOnlyList<LieElement<T>> basis, IReadOnlyList<string>? names = null, string? label = null)
    {
        ArgumentNullException.ThrowIfNull(basis);
        var n = Dimension;
        if (basis.Count != n)
        {
            throw new ExactArgumentException(
                $"A basis of {Label} needs {n} elements, but {basis.Count} were given.", nameof(basis));
        }

        foreach (var b in basis)
        {
            Own(b, nameof(basis));
        }

        var newNames = names is null
            ? Enumerable.Range(1, n).Select(i => $"b_{i}").ToArray()
            : CheckNames(names, nameof(names));
        if (newNames.Length != n)
        {
            throw new ExactArgumentException(
                $"{newNames.Length} names were given for a basis of {n} elements.", nameof(names));
        }

        // Inverse of the matrix whose columns are the new basis vectors, from the echelon form of [B^T | I]: row i of
        // B^T (the vector b_i) is combined into unit rows, and the combinations give (B^T)^{-1} = (B^{-1})^T.
        var augmented = new T[n][];
        for (var i = 0; i < n; i++)
        {
            augmented[i] = Vectors<T>.Zero(2 * n);
            Array.Copy(basis[i].CoefficientArray, augmented[i], n);
            augmented[i][n + i] = T.One;
        }

        var reduced = Vectors<T>.EchelonBasis(augmented, 2 * n);
        if (reduced.Length < n || Enumerable.Range(0, n).Any(i => reduced[i][i].IsZero || !Vectors<T>.IsZero(reduced[i][..n].Where((_, j) => j != i).ToArray())))
        {
            var first = Enumerable.Range(1, n).First(k => Echelon(basis.Take(k).Select(b => b.CoefficientArray)).Length < k);
            throw new ExactArgumentException(
                $"The elements are linearly dependent: element {first} ({basis[first - 1]}) lies in the span of the ones before it, so they are not a basis of {Label}.",
                nameof(basis));
        }

        // Column l of B^{-1} is (B^T)^{-1} row l read as a column: inverse[k][l] = reduced[l][n + k].
        var columns = new (int K, T C)[n][];
        for (var l = 0; l < n; l++)
        {
            columns[l] = Enumerable.Range(0, n).Where(k => !reduced[l][n + k].IsZero).Select(k => (k, reduced[l][n + k])).ToArray();
        }

        var constants = new T[n * n * n];
        Array.Fill(constants, T.Zero);
        for (var i = 0; i < n; i++)
        {
            for (var j = i + 1; j < n; j++)
            {
                var old = SparseBracket(basis[i].CoefficientArray, basis[j].CoefficientArray);
                for (var l = 0; l < n; l++)
                {
                    if (old[l].IsZero)
                    {
                        continue;
                    }

                    foreach (var (k, c) in columns[l])
                    {
                        var value = c * old[l];
                        constants[(i * n + j) * n + k] += value;
                        constants[(j * n + i) * n + k] -= value;
                    }
                }
            }
        }

        return CreateTrusted(newNames, constants, [], label ?? $"{Label} in another basis");
    }
}
