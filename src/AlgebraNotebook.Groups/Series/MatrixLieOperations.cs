using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Groups.Series;

/// <summary>
/// Square matrices of one size over a Q-algebra (Rational, GaussianRational, Polynomial&lt;Rational&gt;, ...) as a Lie
/// algebra with the commutator [a, b] = ab - ba.
/// </summary>
/// <typeparam name="T">The entry type.</typeparam>
public sealed class MatrixLieOperations<T> : ILieOperations<Matrix<T>>
    where T : IRationalAlgebraElement<T>
{
    /// <summary>Creates the operations for size x size matrices.</summary>
    /// <exception cref="ExactArgumentException">Size below 1.</exception>
    public MatrixLieOperations(int size)
    {
        if (size < 1)
        {
            throw new ExactArgumentException($"Matrix size {size} must be at least 1.", nameof(size));
        }

        Zero = Matrix<T>.Zero(size, size);
    }

    /// <inheritdoc />
    public Matrix<T> Zero { get; }

    /// <inheritdoc />
    public Matrix<T> Add(Matrix<T> a, Matrix<T> b) => a + b;

    /// <inheritdoc />
    public Matrix<T> Scale(Matrix<T> a, Rational factor) => T.FromRational(factor) * a;

    /// <inheritdoc />
    public Matrix<T> Bracket(Matrix<T> a, Matrix<T> b) => Matrix<T>.Commutator(a, b);
}
