using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Matrices.MatrixTestSupport;

namespace AlgebraNotebook.Exact.Tests.Matrices;

public class LinearSystemTests
{
    [Fact]
    public void Reduced_row_echelon_form_of_a_worked_example()
    {
        // Worked by hand (common practice): x + 2y + 3z = 0 has free unknowns y, z.
        var a = R("[[1, 2, 3], [2, 4, 6], [1, 0, 1]]");
        Assert.Equal(R("[[1, 0, 1], [0, 1, 1], [0, 0, 0]]"), LinearAlgebra.ReducedRowEchelonForm(a));
        Assert.Equal(2, LinearAlgebra.Rank(a));
        Assert.Equal(new[] { 0, 1 }, LinearAlgebra.PivotColumns(a));
        Assert.Equal(R("[[-1], [-1], [1]]"), LinearAlgebra.NullSpace(a).Single());
        Assert.Equal(new[] { R("[[1], [2], [1]]"), R("[[2], [4], [0]]") }, LinearAlgebra.ColumnSpace(a));
    }

    [Fact]
    public void Rank_and_null_space_agree_with_MathNet_and_the_rank_nullity_theorem()
    {
        // References: MathNet.Numerics 5.0.0 SVD rank; rank-nullity theorem (common practice).
        var random = new Random(31337);
        for (var iteration = 0; iteration < 30 * Iterations; iteration++)
        {
            var rows = random.Next(1, 7);
            var columns = random.Next(1, 7);
            var rank = random.Next(1, Math.Min(rows, columns) + 1);
            var a = RandomMatrixOfRank(random, rows, columns, rank);
            Assert.True(rank == LinearAlgebra.Rank(a), $"rank {LinearAlgebra.Rank(a)}, expected {rank}, for {a}");
            Assert.True(rank == ToMathNet(a).Rank(), $"MathNet rank {ToMathNet(a).Rank()}, expected {rank}, for {a}");
            var nullSpace = LinearAlgebra.NullSpace(a);
            Assert.True(columns - rank == nullSpace.Count, $"null space dimension {nullSpace.Count} for {a}");
            Assert.All(nullSpace, v => Assert.True((a * v).IsZero, $"A v != 0 for v = {v}, A = {a}"));
            Assert.Equal(rank, LinearAlgebra.ColumnSpace(a).Count);
            var rref = LinearAlgebra.ReducedRowEchelonForm(a);
            Assert.True(rref == LinearAlgebra.ReducedRowEchelonForm(rref), $"RREF not idempotent for {a}");
        }
    }

    [Fact]
    public void Inverse_matches_MathNet_and_multiplies_to_the_identity()
    {
        // Reference: MathNet.Numerics 5.0.0 LU inverse.
        var random = new Random(2718);
        for (var iteration = 0; iteration < 30 * Iterations; iteration++)
        {
            var n = random.Next(1, 7);
            var a = RandomIntegerMatrix(random, n, n, 6);
            if (LinearAlgebra.Determinant(a).IsZero)
            {
                continue;
            }

            var inverse = LinearAlgebra.Inverse(a);
            Assert.True(inverse * a == Matrix<Rational>.Identity(n), $"A^-1 A != I for {a}");
            Assert.True(a * inverse == Matrix<Rational>.Identity(n), $"A A^-1 != I for {a}");
            var numeric = ToMathNet(a).Inverse();
            var scale = numeric.Enumerate().Max(Math.Abs);
            var condition = ToMathNet(a).ConditionNumber();
            for (var i = 0; i < n; i++)
            {
                for (var j = 0; j < n; j++)
                {
                    Assert.True(
                        Math.Abs(inverse[i, j].ToDouble() - numeric[i, j]) <= 1e-12 * condition * Math.Max(1.0, scale),
                        $"inverse entry ({i}, {j}) {inverse[i, j]} vs MathNet {numeric[i, j]} for {a}");
                }
            }
        }
    }

    [Fact]
    public void Solve_finds_the_unique_solution_and_SolveAll_the_general_one()
    {
        var random = new Random(161);
        for (var iteration = 0; iteration < 20 * Iterations; iteration++)
        {
            var n = random.Next(1, 6);
            var a = RandomIntegerMatrix(random, n, n, 5);
            var x = RandomIntegerMatrix(random, n, 2, 5);
            var b = a * x;
            if (LinearAlgebra.Rank(a) == n)
            {
                Assert.True(x == LinearAlgebra.Solve(a, b), $"Solve fails for A = {a}, X = {x}");
            }

            var single = b.Column(0);
            var all = LinearAlgebra.SolveAll(a, single);
            Assert.True(all.HasSolution, $"SolveAll finds no solution for A = {a}, b = {single}");
            Assert.True(a * all.Particular! == single, $"particular solution wrong for A = {a}, b = {single}");
            Assert.Equal(n - LinearAlgebra.Rank(a), all.NullSpaceBasis.Count);
        }
    }

    [Fact]
    public void SolveAll_reports_an_inconsistent_system()
    {
        var a = R("[[1, 1], [1, 1]]");
        var all = LinearAlgebra.SolveAll(a, R("[[1], [2]]"));
        Assert.False(all.HasSolution);
        Assert.Equal("no solution", all.ToString());
        var general = LinearAlgebra.SolveAll(a, R("[[2], [2]]"));
        Assert.Equal("x = [[2], [0]] + t1*[[-1], [1]]", general.ToString());
    }

    [Fact]
    public void Solve_explains_missing_and_non_unique_solutions_with_the_ranks()
    {
        var a = R("[[1, 1], [1, 1]]");
        var none = Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Solve(a, R("[[1], [2]]")));
        Assert.Contains("no solution", none.Message);
        Assert.Contains("rank A = 1", none.Message);
        Assert.Contains("rank [A | B] = 2", none.Message);
        var many = Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Solve(a, R("[[2], [2]]")));
        Assert.Contains("infinitely many", many.Message);
        Assert.Contains("rank A = 1", many.Message);
        var shapes = Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Solve(a, R("[[1], [2], [3]]")));
        Assert.Contains("2x2", shapes.Message);
        Assert.Contains("3x1", shapes.Message);
    }

    [Fact]
    public void Inverse_of_a_singular_matrix_names_the_rank()
    {
        var error = Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Inverse(R("[[1, 2, 3], [4, 5, 6], [7, 8, 9]]")));
        Assert.Contains("singular", error.Message);
        Assert.Contains("rank 2", error.Message);
        Assert.Contains("3x3", error.Message);
        Assert.Contains("2x3", Assert.Throws<ExactArgumentException>(() => LinearAlgebra.Inverse(Matrix<Rational>.Zero(2, 3))).Message);
    }

    [Fact]
    public void Gaussian_rational_inverse_of_a_unitary_matrix_is_its_adjoint()
    {
        // A unitary matrix satisfies U^-1 = U^†: common practice. U = (1/2)[[1 + i, 1 - i], [1 - i, 1 + i]].
        var u = G("[[1/2 + 1/2 i, 1/2 - 1/2 i], [1/2 - 1/2 i, 1/2 + 1/2 i]]");
        Assert.Equal(u.ConjugateTranspose(), LinearAlgebra.Inverse(u));
    }
}
