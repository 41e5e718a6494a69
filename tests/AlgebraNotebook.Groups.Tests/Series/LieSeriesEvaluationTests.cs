using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.FreeLie;
using AlgebraNotebook.Groups.Series;
using AlgebraNotebook.Groups.Tests.FreeLie;
using DoubleMatrix = MathNet.Numerics.LinearAlgebra.Matrix<double>;

namespace AlgebraNotebook.Groups.Tests.Series;

public class LieSeriesEvaluationTests
{
    private static readonly FreeLieAlgebra XY = new("X", "Y");

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Truncated_series_error_shrinks_like_eps_to_the_power_N_plus_1_against_MathNet(int degree)
    {
        // Numeric oracle: MathNet.Numerics matrices in double. MathNet 5.0.0 has no matrix exponential or logarithm
        // (its Exp/Log are pointwise), so exp is a 40-term Taylor sum (norms here are below 1) and we compare
        // exp(Z_N(eps A, eps B)) with exp(eps A) exp(eps B): the difference is O(eps^(N+1)) (common practice).
        var z = BakerCampbellHausdorff.Series(degree);
        var random = new Random(FreeLieTestSupport.Seed + degree);
        for (var trial = 0; trial < FreeLieTestSupport.Iterations(3); trial++)
        {
            var a = RandomRationalMatrix(random, 3);
            var b = RandomRationalMatrix(random, 3);
            var errors = new List<double>();
            foreach (var eps in new[] { new Rational(1, 8), new Rational(1, 16), new Rational(1, 32), new Rational(1, 64) })
            {
                var value = LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>>
                {
                    ["X"] = eps * a,
                    ["Y"] = eps * b,
                }).Value;
                var expected = TaylorExp(ToDouble(eps * a)) * TaylorExp(ToDouble(eps * b));
                errors.Add((TaylorExp(ToDouble(value)) - expected).FrobeniusNorm());
            }

            for (var i = 0; i + 1 < errors.Count; i++)
            {
                var slope = Math.Log2(errors[i] / errors[i + 1]);
                Assert.True(slope > degree + 0.5 && slope < degree + 1.6, $"N = {degree}, A = {a}, B = {b}: errors {string.Join(", ", errors)}, slope {slope}");
            }
        }
    }

    [Fact]
    public void Nilpotent_matrices_make_the_degree_three_series_exact()
    {
        // For strictly upper triangular 4x4 matrices every product of four vanishes, so brackets of degree >= 4 vanish
        // and exp is a finite sum: exp(Z_3(A, B)) = exp(A) exp(B) exactly (common practice).
        var z = BakerCampbellHausdorff.Series(3);
        var random = new Random(FreeLieTestSupport.Seed + 10);
        for (var trial = 0; trial < FreeLieTestSupport.Iterations(5); trial++)
        {
            var a = Matrix<Rational>.FromFunction(4, 4, (i, j) => j > i ? FreeLieTestSupport.SmallRational(random) : Rational.Zero);
            var b = Matrix<Rational>.FromFunction(4, 4, (i, j) => j > i ? FreeLieTestSupport.SmallRational(random) : Rational.Zero);
            var value = LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>> { ["X"] = a, ["Y"] = b }).Value;
            Assert.True(ExactExp(value) == ExactExp(a) * ExactExp(b), $"A = {a}, B = {b}");
        }
    }

    [Fact]
    public void Gaussian_rational_matrices_are_evaluated_with_the_commutator()
    {
        // Same nilpotent argument over the Gaussian rationals, for the Zassenhaus factors:
        // exp(A + B) = exp(A) exp(B) exp(C2(A, B)) exp(C3(A, B)) exactly for strictly upper triangular 4x4 matrices.
        var zassenhaus = Zassenhaus.Compute(3);
        var i = GaussianRational.I;
        var a = Matrix<GaussianRational>.FromFunction(4, 4, (r, c) => c > r ? (r + c) * i + GaussianRational.One : GaussianRational.Zero);
        var b = Matrix<GaussianRational>.FromFunction(4, 4, (r, c) => c > r ? GaussianRational.FromInteger(r - (2 * c)) : GaussianRational.Zero);
        var map = new Dictionary<string, Matrix<GaussianRational>> { ["X"] = a, ["Y"] = b };
        var product = ExactExp(a) * ExactExp(b);
        foreach (var c in zassenhaus.Exponents)
        {
            product *= ExactExp(LieSeriesEvaluation.EvaluateMatrices(c, map).Value);
        }

        Assert.Equal(ExactExp(a + b), product);
    }

    [Fact]
    public void Small_parameters_grade_the_result_by_order()
    {
        // X -> s A, Y -> t B: the degree-d part is homogeneous of degree d in (s, t) (by construction; checked here).
        var z = BakerCampbellHausdorff.Series(3);
        var s = Symbol.Of("freelie_s");
        var t = Symbol.Of("freelie_t");
        var a = Matrix.ParseRational("[[0, 1], [0, 0]]");
        var b = Matrix.ParseRational("[[0, 0], [1, 0]]");
        var result = LieSeriesEvaluation.EvaluateWithParameters(z, new Dictionary<string, (Symbol, Matrix<Rational>)>
        {
            ["X"] = (s, a),
            ["Y"] = (t, b),
        });
        for (var d = 1; d <= 3; d++)
        {
            var part = result.DegreeValues[d - 1];
            for (var r = 0; r < 2; r++)
            {
                for (var c = 0; c < 2; c++)
                {
                    Assert.All(part[r, c].Terms, term => Assert.Equal(d, term.Monomial.TotalDegree));
                }
            }
        }

        // [A, B] = diag(1, -1) for these sl(2) matrices, so the degree-2 part is 1/2 s t diag(1, -1).
        Assert.Equal(Polynomial<Rational>.Parse("1/2*freelie_s*freelie_t"), result.DegreeValues[1][0, 0]);
        Assert.Equal(4, result.Order);
        Assert.Contains("through degree 3; degree 4 and higher omitted", result.ToString());
    }

    [Fact]
    public void Evaluating_in_the_free_Lie_algebra_itself_returns_the_series()
    {
        // Substituting X -> X, Y -> Y with the free Lie algebra's own operations must give the series back.
        var z = BakerCampbellHausdorff.Series(5);
        var operations = new DelegateLieOperations<LieSeries>(XY.Zero, (p, q) => p + q, (p, f) => f * p, LieSeries.Bracket);
        var value = LieSeriesEvaluation.Evaluate(z, new Dictionary<string, LieSeries> { ["X"] = XY.Generator("X"), ["Y"] = XY.Generator("Y") }, operations);
        Assert.Equal(z.Truncate(6), value.Value.Truncate(6));
        Assert.Equal(new[] { 2, 1, 2, 1, 6 }, value.DegreeValues.Select(v => v.Terms.Count).ToArray());
    }

    [Fact]
    public void Missing_or_foreign_generators_and_bad_shapes_are_rejected()
    {
        var z = BakerCampbellHausdorff.Series(2);
        var a = Matrix<Rational>.Identity(2);
        var e = Assert.Throws<ExactArgumentException>(() => LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>> { ["X"] = a }));
        Assert.Contains("\"Y\"", e.Message);
        Assert.Throws<ExactArgumentException>(() => LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>> { ["X"] = a, ["Y"] = a, ["W"] = a }));
        Assert.Throws<ExactArgumentException>(() => LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>> { ["X"] = a, ["Y"] = Matrix<Rational>.Identity(3) }));
        Assert.Throws<ExactArgumentException>(() => LieSeriesEvaluation.EvaluateMatrices(z, new Dictionary<string, Matrix<Rational>>()));
    }

    private static Matrix<Rational> RandomRationalMatrix(Random random, int size) =>
        Matrix<Rational>.FromFunction(size, size, (_, _) => new Rational(random.Next(-8, 9), 8));

    private static DoubleMatrix ToDouble(Matrix<Rational> m) =>
        DoubleMatrix.Build.Dense(m.RowCount, m.ColumnCount, (i, j) => m[i, j].ToDouble());

    private static DoubleMatrix TaylorExp(DoubleMatrix m)
    {
        var result = DoubleMatrix.Build.DenseIdentity(m.RowCount);
        var term = DoubleMatrix.Build.DenseIdentity(m.RowCount);
        for (var k = 1; k <= 40; k++)
        {
            term = term * m / k;
            result += term;
        }

        return result;
    }

    private static Matrix<T> ExactExp<T>(Matrix<T> nilpotent)
        where T : IRationalAlgebraElement<T>
    {
        var size = nilpotent.RowCount;
        var result = Matrix<T>.Identity(size);
        var term = Matrix<T>.Identity(size);
        for (var k = 1; k <= size; k++)
        {
            term = T.FromRational(new Rational(1, k)) * (term * nilpotent);
            result += term;
        }

        return result;
    }
}
