using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Matrices;

public sealed partial class Matrix<T>
{
    /// <summary>Entry-wise sum.</summary>
    /// <exception cref="ExactArgumentException">The shapes differ; the message names both shapes.</exception>
    public static Matrix<T> operator +(Matrix<T> left, Matrix<T> right)
    {
        CheckSameShape(left, right, "add");
        return Create(left.RowCount, left.ColumnCount, (i, j) => left.At(i, j) + right.At(i, j));
    }

    /// <summary>Entry-wise difference.</summary>
    /// <exception cref="ExactArgumentException">The shapes differ; the message names both shapes.</exception>
    public static Matrix<T> operator -(Matrix<T> left, Matrix<T> right)
    {
        CheckSameShape(left, right, "subtract");
        return Create(left.RowCount, left.ColumnCount, (i, j) => left.At(i, j) - right.At(i, j));
    }

    /// <summary>Entry-wise negation.</summary>
    public static Matrix<T> operator -(Matrix<T> value)
    {
        ArgumentNullException.ThrowIfNull(value);
        return Create(value.RowCount, value.ColumnCount, (i, j) => -value.At(i, j));
    }

    /// <summary>The matrix product; the left column count must equal the right row count.</summary>
    /// <exception cref="ExactArgumentException">The inner dimensions differ; the message names both shapes.</exception>
    public static Matrix<T> operator *(Matrix<T> left, Matrix<T> right)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.ColumnCount != right.RowCount)
        {
            throw new ExactArgumentException(
                $"Cannot multiply a {left.Shape} matrix by a {right.Shape} matrix: the left column count {left.ColumnCount} differs from the right row count {right.RowCount}.",
                nameof(right));
        }

        return MultiplyCore(left, right);
    }

    internal static Matrix<T> MultiplyCore(Matrix<T> left, Matrix<T> right)
    {
        var n = left.RowCount;
        var m = right.ColumnCount;
        var inner = left.ColumnCount;
        var entries = new T[n * m];
        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < m; j++)
            {
                var sum = T.Zero;
                for (var k = 0; k < inner; k++)
                {
                    var a = left.At(i, k);
                    if (!a.IsZero)
                    {
                        var b = right.At(k, j);
                        if (!b.IsZero)
                        {
                            sum += a * b;
                        }
                    }
                }

                entries[i * m + j] = sum;
            }
        }

        return new Matrix<T>(n, m, entries);
    }

    /// <summary>Every entry multiplied on the left by the scalar.</summary>
    public static Matrix<T> operator *(T scalar, Matrix<T> matrix)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return Create(matrix.RowCount, matrix.ColumnCount, (i, j) => scalar * matrix.At(i, j));
    }

    /// <summary>Every entry multiplied on the right by the scalar.</summary>
    public static Matrix<T> operator *(Matrix<T> matrix, T scalar)
    {
        ArgumentNullException.ThrowIfNull(matrix);
        return Create(matrix.RowCount, matrix.ColumnCount, (i, j) => matrix.At(i, j) * scalar);
    }

    /// <summary>
    /// The non-negative integer power by repeated squaring; the 0th power is the identity.
    /// Negative powers of invertible matrices: use <see cref="LinearAlgebra.Inverse{T}(Matrix{T})"/> first.
    /// </summary>
    /// <exception cref="ExactArgumentException">The matrix is not square, or the exponent is negative.</exception>
    public Matrix<T> Pow(int exponent)
    {
        RequireSquare("take a power of");
        if (exponent < 0)
        {
            throw new ExactArgumentException(
                $"Pow({exponent}) of a {Shape} matrix: the exponent must be non-negative; invert the matrix first (LinearAlgebra.Inverse) for negative powers.",
                nameof(exponent));
        }

        var result = Identity(RowCount);
        var power = this;
        while (exponent > 0)
        {
            if ((exponent & 1) != 0)
            {
                result = MultiplyCore(result, power);
            }

            exponent >>= 1;
            if (exponent > 0)
            {
                power = MultiplyCore(power, power);
            }
        }

        return result;
    }

    /// <summary>The commutator [a, b] = a b - b a of two square matrices of the same size.</summary>
    /// <exception cref="ExactArgumentException">The matrices are not square of the same size; the message names both shapes.</exception>
    public static Matrix<T> Commutator(Matrix<T> a, Matrix<T> b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        if (!a.IsSquare || !b.IsSquare || a.RowCount != b.RowCount)
        {
            throw new ExactArgumentException(
                $"Cannot form the commutator of a {a.Shape} matrix and a {b.Shape} matrix: both must be square of the same size.",
                nameof(b));
        }

        return MultiplyCore(a, b) - MultiplyCore(b, a);
    }

    /// <summary>
    /// The Kronecker (tensor) product: the block matrix whose block (i, j) is a[i, j] * b. Shape (ra*rb) x (ca*cb).
    /// </summary>
    public static Matrix<T> Kronecker(Matrix<T> a, Matrix<T> b)
    {
        ArgumentNullException.ThrowIfNull(a);
        ArgumentNullException.ThrowIfNull(b);
        return Create(
            a.RowCount * b.RowCount,
            a.ColumnCount * b.ColumnCount,
            (i, j) => a.At(i / b.RowCount, j / b.ColumnCount) * b.At(i % b.RowCount, j % b.ColumnCount));
    }

    /// <summary>
    /// The direct sum (block diagonal matrix) diag(m1, m2, ...): the blocks sit along the diagonal in the given order,
    /// zeros elsewhere. Blocks need not be square.
    /// </summary>
    public static Matrix<T> DirectSum(params Matrix<T>[] blocks)
    {
        ArgumentNullException.ThrowIfNull(blocks);
        var rows = 0;
        var columns = 0;
        foreach (var block in blocks)
        {
            ArgumentNullException.ThrowIfNull(block, nameof(blocks));
            rows += block.RowCount;
            columns += block.ColumnCount;
        }

        var entries = new T[rows * columns];
        Array.Fill(entries, T.Zero);
        var rowOffset = 0;
        var columnOffset = 0;
        foreach (var block in blocks)
        {
            for (var i = 0; i < block.RowCount; i++)
            {
                for (var j = 0; j < block.ColumnCount; j++)
                {
                    entries[(rowOffset + i) * columns + columnOffset + j] = block.At(i, j);
                }
            }

            rowOffset += block.RowCount;
            columnOffset += block.ColumnCount;
        }

        return new Matrix<T>(rows, columns, entries);
    }

    /// <summary>The transpose.</summary>
    public Matrix<T> Transpose() => Create(ColumnCount, RowCount, (i, j) => At(j, i));

    /// <summary>The conjugate transpose (Hermitian adjoint), using <see cref="IRingElement{T}.Conjugate"/> entry-wise.</summary>
    public Matrix<T> ConjugateTranspose() => Create(ColumnCount, RowCount, (i, j) => At(j, i).Conjugate());

    /// <summary>The entry-wise complex conjugate (no transpose).</summary>
    public Matrix<T> Conjugate() => Create(RowCount, ColumnCount, (i, j) => At(i, j).Conjugate());

    /// <summary>The sum of the diagonal entries.</summary>
    /// <exception cref="ExactArgumentException">The matrix is not square.</exception>
    public T Trace()
    {
        RequireSquare("take the trace of");
        var sum = T.Zero;
        for (var i = 0; i < RowCount; i++)
        {
            sum += At(i, i);
        }

        return sum;
    }

    /// <summary>Throws an <see cref="ExactArgumentException"/> naming the shape unless the matrix is square.</summary>
    internal void RequireSquare(string action)
    {
        if (!IsSquare)
        {
            throw new ExactArgumentException($"Cannot {action} a {Shape} matrix: it is not square.");
        }
    }

    private static void CheckSameShape(Matrix<T> left, Matrix<T> right, string action)
    {
        ArgumentNullException.ThrowIfNull(left);
        ArgumentNullException.ThrowIfNull(right);
        if (left.RowCount != right.RowCount || left.ColumnCount != right.ColumnCount)
        {
            var message = action == "add"
                ? $"Cannot add a {left.Shape} matrix and a {right.Shape} matrix: the shapes differ."
                : $"Cannot subtract a {right.Shape} matrix from a {left.Shape} matrix: the shapes differ.";
            throw new ExactArgumentException(
                message,
                nameof(right));
        }
    }
}
