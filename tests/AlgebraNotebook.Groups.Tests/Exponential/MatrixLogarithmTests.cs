using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class MatrixLogarithmTests
{
    [Fact]
    public void Log_of_the_exponential_series_returns_the_generator()
    {
        // log(exp(t X)) = t X near t = 0 (common practice); X with eigenvalues ±√2 so the exponential is a series.
        var x = Matrix.ParseRational("[[0, 2], [1, 0]]");
        var series = MatrixExponential.Series(x, "t", 7);
        var log = MatrixLogarithm.OfSeries(series);
        var t = TruncatedSeries<Rational>.Parameter("t", 7);
        for (var i = 0; i < 2; i++)
        {
            for (var j = 0; j < 2; j++)
            {
                Assert.True(log[i, j].AgreesWith(t * x[i, j]), $"entry ({i},{j}) = {log[i, j]}");
            }
        }
    }

    [Fact]
    public void Log_of_one_plus_epsilon_times_a_nilpotent_matrix_terminates()
    {
        // log(I + εN) = εN - ε^2 N^2/2 for N^3 = 0 (common practice).
        var n = Matrix.ParseRational("[[0, 1, 0], [0, 0, 1], [0, 0, 0]]");
        var log = MatrixLogarithm.NearIdentity(n, "eps", 6);
        Assert.Equal("-1/2*eps^2 + O(eps^6)", log[0, 2].ToString());
    }

    [Fact]
    public void Partial_sum_near_the_identity_states_its_error_bound()
    {
        // log(diag(1/2, 3/2))'s series terms: log(1 + a) = a - a^2/2 + a^3/3 (common practice).
        var (sum, note) = MatrixLogarithm.PartialSum(Matrix.Diagonal<Rational>(new Rational(1, 2), new Rational(3, 2)), 3);
        Assert.Equal(new Rational(-1, 2) - new Rational(1, 8) - new Rational(1, 24), sum[0, 0]);
        Assert.Contains("converges", note);
    }

    [Fact]
    public void Log_series_far_from_the_identity_is_rejected_with_an_explanation()
    {
        var error = Assert.Throws<ExactArgumentException>(() => MatrixLogarithm.PartialSum(Matrix.Diagonal<Rational>(-2, new Rational(-1, 2)), 5));
        Assert.Contains("does not converge", error.Message);
        var constant = Matrix.Diagonal<Rational>(-2, new Rational(-1, 2)).Map(TruncatedSeries<Rational>.Constant);
        var notNear = Assert.Throws<ExactArgumentException>(() => MatrixLogarithm.OfSeries(constant, 4));
        Assert.Contains("not near the identity", notNear.Message);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(1000)]
    public void Order_out_of_range_is_rejected(int order)
    {
        Assert.Throws<ExactArgumentException>(() => MatrixLogarithm.NearIdentity(Matrix.ParseRational("[[0, 1], [0, 0]]"), "eps", order));
    }
}
