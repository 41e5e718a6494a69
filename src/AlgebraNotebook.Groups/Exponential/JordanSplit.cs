using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Exponential;

/// <summary>Computes the Jordan split X = S + N exactly when the eigenvalues lie in Q(i) (see <see cref="JordanSplit{T}"/>).</summary>
public static class JordanSplit
{
    /// <summary>The Jordan split of a rational matrix; S and N are rational.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">Some eigenvalue is not in Q(i); the message names the remaining factor of the characteristic polynomial.</exception>
    public static JordanSplit<Rational> Of(Matrix<Rational> matrix) => OfCore(matrix, nameof(matrix));

    /// <summary>The Jordan split of a Gaussian-rational matrix.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    /// <exception cref="BeyondCapabilityException">Some eigenvalue is not in Q(i).</exception>
    public static JordanSplit<GaussianRational> Of(Matrix<GaussianRational> matrix) => OfCore(matrix, nameof(matrix));

    internal static JordanSplit<T> OfCore<T>(Matrix<T> matrix, string name)
        where T : IFieldElement<T>
    {
        ArgumentNullException.ThrowIfNull(matrix, name);
        RequireSquare(matrix, name, "split");
        var split = TrySplit(matrix, out var remaining);
        return split ?? throw new BeyondCapabilityException(
            $"The Jordan split of {matrix} needs its eigenvalues, but the factor {remaining} of the characteristic polynomial has no root in Q(i).");
    }

    internal static void RequireSquare<T>(Matrix<T> matrix, string name, string verb)
        where T : IRingElement<T>
    {
        if (!matrix.IsSquare)
        {
            throw new ExactArgumentException($"Cannot {verb} the {matrix.Shape} matrix {name}: it must be square.", name);
        }
    }

    /// <summary>Null when some eigenvalue is outside Q(i); <paramref name="remaining"/> then holds the factor without roots.</summary>
    internal static JordanSplit<T>? TrySplit<T>(Matrix<T> matrix, out string remaining)
        where T : IFieldElement<T>
    {
        var x = FieldBridge<T>.Widen(matrix);
        var decomposition = Eigenvalues.OverGaussianRationals(x);
        remaining = decomposition.RemainingFactor.ToString();
        if (!decomposition.IsComplete)
        {
            return null;
        }

        var n = x.RowCount;
        var identity = Matrix<GaussianRational>.Identity(n);
        var columns = new List<Matrix<GaussianRational>>();
        var ranges = new List<(GaussianRational Value, int Start, int Count)>();
        foreach (var e in decomposition.Eigenvalues)
        {
            var shifted = (x - e.Value * identity).Pow(e.AlgebraicMultiplicity);
            var space = LinearAlgebra.NullSpace(shifted);
            ranges.Add((e.Value, columns.Count, space.Count));
            columns.AddRange(space);
        }

        var parts = new List<JordanSplit<T>.SpectralPart>();
        var semisimple = Matrix<GaussianRational>.Zero(n, n);
        if (n > 0)
        {
            var q = Matrix.FromColumnVectors(columns);
            var qInverse = LinearAlgebra.Inverse(q);
            var all = Enumerable.Range(0, n).ToArray();
            foreach (var (value, start, count) in ranges)
            {
                var block = Enumerable.Range(start, count).ToArray();
                var projector = q.Submatrix(all, block) * qInverse.Submatrix(block, all);
                parts.Add(new JordanSplit<T>.SpectralPart(value, count, projector));
                semisimple += value * projector;
            }
        }

        var s = FieldBridge<T>.Narrow(semisimple);
        return new JordanSplit<T>(matrix, s, matrix - s, parts);
    }
}
