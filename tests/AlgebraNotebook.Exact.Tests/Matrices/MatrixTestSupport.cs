using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

/// <summary>Shared helpers for the randomised matrix tests.</summary>
internal static class MatrixTestSupport
{
    /// <summary>The iteration multiplier from ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1).</summary>
    public static int Iterations => TestIterations.Multiplier;

    public static Matrix<Rational> RandomIntegerMatrix(Random random, int rows, int columns, int magnitude) =>
        Matrix<Rational>.FromFunction(rows, columns, (_, _) => random.Next(-magnitude, magnitude + 1));

    /// <summary>A random matrix of given rank: a random rows x rank matrix times a random rank x columns matrix.</summary>
    public static Matrix<Rational> RandomMatrixOfRank(Random random, int rows, int columns, int rank)
    {
        while (true)
        {
            var left = RandomIntegerMatrix(random, rows, rank, 3);
            var right = RandomIntegerMatrix(random, rank, columns, 3);
            var product = left * right;
            if (LinearAlgebra.Rank(left) == rank && LinearAlgebra.Rank(right) == rank)
            {
                return product;
            }
        }
    }

    /// <summary>A random integer matrix with determinant ±1 (product of elementary integer row operations).</summary>
    public static Matrix<Rational> RandomUnimodular(Random random, int size)
    {
        var result = Matrix<Rational>.Identity(size);
        for (var step = 0; step < 3 * size; step++)
        {
            var i = random.Next(size);
            var j = random.Next(size - 1);
            if (j >= i)
            {
                j++;
            }

            var factor = random.Next(-2, 3);
            var elementary = Matrix<Rational>.FromFunction(size, size, (r, c) => r == c ? 1 : r == i && c == j ? factor : 0);
            result = elementary * result;
        }

        return result;
    }

    public static double[,] ToDoubles(Matrix<Rational> matrix)
    {
        var values = new double[matrix.RowCount, matrix.ColumnCount];
        for (var i = 0; i < matrix.RowCount; i++)
        {
            for (var j = 0; j < matrix.ColumnCount; j++)
            {
                values[i, j] = matrix[i, j].ToDouble();
            }
        }

        return values;
    }

    public static MathNet.Numerics.LinearAlgebra.Matrix<double> ToMathNet(Matrix<Rational> matrix) =>
        MathNet.Numerics.LinearAlgebra.Matrix<double>.Build.DenseOfArray(ToDoubles(matrix));

    public static Matrix<Rational> R(string text) => Matrix.ParseRational(text);

    public static Matrix<GaussianRational> G(string text) => Matrix.ParseGaussianRational(text);
}
