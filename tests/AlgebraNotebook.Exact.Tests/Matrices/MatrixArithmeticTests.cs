using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class MatrixArithmeticTests
{
    [Fact]
    public void Kronecker_product_satisfies_the_mixed_product_property()
    {
        // (A B) ⊗ (C D) = (A ⊗ C)(B ⊗ D): common practice.
        var random = new Random(20261201);
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var (m, n, p) = (random.Next(1, 4), random.Next(1, 4), random.Next(1, 4));
            var (q, r, s) = (random.Next(1, 4), random.Next(1, 4), random.Next(1, 4));
            var a = RandomIntegerMatrix(random, m, n, 5);
            var b = RandomIntegerMatrix(random, n, p, 5);
            var c = RandomIntegerMatrix(random, q, r, 5);
            var d = RandomIntegerMatrix(random, r, s, 5);
            var left = Matrix<Rational>.Kronecker(a * b, c * d);
            var right = Matrix<Rational>.Kronecker(a, c) * Matrix<Rational>.Kronecker(b, d);
            Assert.True(left == right, $"mixed product fails for A={a}, B={b}, C={c}, D={d}");
        }
    }

    [Fact]
    public void Kronecker_product_has_the_block_layout_and_trace_and_determinant_rules()
    {
        var a = R("[[1, 2], [3, 4]]");
        var b = R("[[0, 5], [6, 7]]");
        // Block (i, j) is a[i, j] * b: common practice.
        Assert.Equal(R("[[0, 5, 0, 10], [6, 7, 12, 14], [0, 15, 0, 20], [18, 21, 24, 28]]"), Matrix<Rational>.Kronecker(a, b));
        // tr(A ⊗ B) = tr A tr B and det(A ⊗ B) = det(A)^m det(B)^n for A n x n, B m x m: common practice.
        Assert.Equal(a.Trace() * b.Trace(), Matrix<Rational>.Kronecker(a, b).Trace());
        Assert.Equal(LinearAlgebra.Determinant(a).Pow(2) * LinearAlgebra.Determinant(b).Pow(2), LinearAlgebra.Determinant(Matrix<Rational>.Kronecker(a, b)));
    }

    [Fact]
    public void Matrix_product_is_associative_and_distributive_on_random_matrices()
    {
        // Ring axioms for matrices: common practice.
        var random = new Random(7);
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var (m, n, p, q) = (random.Next(1, 5), random.Next(1, 5), random.Next(1, 5), random.Next(1, 5));
            var a = RandomIntegerMatrix(random, m, n, 9);
            var b = RandomIntegerMatrix(random, n, p, 9);
            var b2 = RandomIntegerMatrix(random, n, p, 9);
            var c = RandomIntegerMatrix(random, p, q, 9);
            Assert.True((a * b) * c == a * (b * c), $"associativity fails for A={a}, B={b}, C={c}");
            Assert.True(a * (b + b2) == a * b + a * b2, $"distributivity fails for A={a}, B={b}, B'={b2}");
            Assert.True((a * b).Transpose() == b.Transpose() * a.Transpose(), $"(AB)^T fails for A={a}, B={b}");
        }
    }

    [Fact]
    public void Powers_agree_with_repeated_products()
    {
        var a = R("[[1, 1], [1, 0]]");
        // Fibonacci matrix: [[1,1],[1,0]]^n = [[F(n+1), F(n)], [F(n), F(n-1)]], OEIS A000045 (F(20) = 6765, F(21) = 10946).
        Assert.Equal(R("[[10946, 6765], [6765, 4181]]"), a.Pow(20));
        Assert.Equal(Matrix<Rational>.Identity(2), a.Pow(0));
        Assert.Equal(a * a * a, a.Pow(3));
    }

    [Fact]
    public void Direct_sum_places_blocks_on_the_diagonal()
    {
        var a = R("[[1, 2], [3, 4]]");
        var b = R("[[5]]");
        var c = R("[[6, 7]]");
        Assert.Equal(R("[[1, 2, 0, 0, 0], [3, 4, 0, 0, 0], [0, 0, 5, 0, 0], [0, 0, 0, 6, 7]]"), Matrix.DirectSum(a, b, c));
        // det(A ⊕ B) = det A det B: common practice.
        Assert.Equal(LinearAlgebra.Determinant(a) * 5, LinearAlgebra.Determinant(Matrix.DirectSum(a, b)));
    }

    [Fact]
    public void Rows_columns_and_constructors_are_consistent()
    {
        var a = R("[[1, 2, 3], [4, 5, 6]]");
        Assert.Equal(2, a.RowCount);
        Assert.Equal(3, a.ColumnCount);
        Assert.Equal(R("[[4, 5, 6]]"), a.Row(1));
        Assert.Equal(R("[[3], [6]]"), a.Column(2));
        Assert.Equal(a, Matrix.FromColumns<Rational>([1, 4], [2, 5], [3, 6]));
        Assert.Equal(a, Matrix.FromRows<Rational>([1, 2, 3], [4, 5, 6]));
        Assert.Equal(a, Matrix.FromRows(a.ToRowArrays()));
        Assert.Equal(a.Transpose().Transpose(), a);
        Assert.Equal(a.GetHashCode(), R("[[1, 2, 3], [4, 10/2, 6]]").GetHashCode());
        Assert.Equal(R("[[1, 3], [2, 4]]"), R("[[1, 2], [3, 4]]").Transpose());
        Assert.True(Matrix<Rational>.Zero(2, 3).IsZero);
        Assert.True(R("[[1, 2], [2, 5]]").IsSymmetric);
        Assert.True(R("[[0, 2], [-2, 0]]").IsAntisymmetric);
        Assert.Equal("[[1, 2, 3], [4, 5, 6]]", a.ToString());
        Assert.Equal(a.Map(x => (GaussianRational)x).Map(x => x.Real), a);
    }

    [Fact]
    public void Conjugate_transpose_conjugates_and_transposes()
    {
        var a = G("[[1 + i, 2], [3 i, 4 - 2 i]]");
        Assert.Equal(G("[[1 - i, -3 i], [2, 4 + 2 i]]"), a.ConjugateTranspose());
        // (A B)^† = B^† A^†: common practice.
        var b = G("[[i, 1/2], [0, 1 - i]]");
        Assert.Equal(b.ConjugateTranspose() * a.ConjugateTranspose(), (a * b).ConjugateTranspose());
    }

    [Fact]
    public void Multiplying_mismatched_shapes_names_both_shapes()
    {
        var a = Matrix<Rational>.Zero(2, 3);
        var b = Matrix<Rational>.Zero(2, 2);
        var error = Assert.Throws<ExactArgumentException>(() => a * b);
        Assert.Contains("cannot multiply a 2x3 matrix by a 2x2 matrix", error.Message, StringComparison.OrdinalIgnoreCase);
    }

    [Fact]
    public void Adding_and_subtracting_mismatched_shapes_name_both_shapes()
    {
        var a = Matrix<Rational>.Zero(2, 3);
        var b = Matrix<Rational>.Zero(3, 2);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => a + b).Message);
        Assert.Contains("3x2", Assert.Throws<ExactArgumentException>(() => a + b).Message);
        Assert.Contains("subtract a 3x2 matrix from a 2x3 matrix", Assert.Throws<ExactArgumentException>(() => a - b).Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => Matrix<Rational>.Commutator(a, a)).Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => a.Trace()).Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => a.Pow(2)).Message);
        Assert.Contains("-1", Assert.Throws<ExactArgumentException>(() => Matrix<Rational>.Identity(2).Pow(-1)).Message);
        Assert.Contains("(2, 0)", Assert.Throws<ExactArgumentException>(() => a[2, 0]).Message);
    }

    [Fact]
    public void Ragged_rows_are_rejected_naming_the_row()
    {
        var error = Assert.Throws<ExactArgumentException>(() => Matrix.FromRows<Rational>([1, 2], [3]));
        Assert.Contains("Row 1", error.Message);
        Assert.Contains("1 entries", error.Message);
    }
}
