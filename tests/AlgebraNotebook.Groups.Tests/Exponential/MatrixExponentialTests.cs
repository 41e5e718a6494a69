using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class MatrixExponentialTests
{
    private static Matrix<QuotientElement<Rational>> InRing(MatrixExponential<Rational> e, Matrix<Polynomial<Rational>> m) =>
        m.Map(e.Legend.Ring<Rational>().Element);

    private static Polynomial<Rational> P(string text) => Polynomial<Rational>.Parse(text);

    private static Matrix<Rational> CrossMatrix(Rational x, Rational y, Rational z) =>
        Matrix.FromRows<Rational>([0, -z, y], [z, 0, -x], [-y, x, 0]);

    [Theory]
    [InlineData("1", "0", "0")]
    [InlineData("3/5", "4/5", "0")]
    [InlineData("2/7", "3/7", "6/7")]
    public void Rodrigues_formula_comes_out_of_the_general_method_for_a_rational_unit_axis(string x, string y, string z)
    {
        // Rodrigues: exp(t K) = I + sin t K + (1 - cos t) K^2 for K the cross-product matrix of a unit axis (common practice; any mechanics text).
        var k = CrossMatrix(Rational.Parse(x), Rational.Parse(y), Rational.Parse(z));
        var e = MatrixExponential.Of(k, "t");
        Assert.Equal(ExponentialForm.ClosedForm, e.Form);
        var kp = k.Map(Polynomial<Rational>.Constant);
        var expected = Matrix<Polynomial<Rational>>.Identity(3) + P("s_t") * kp + (P("1 - c_t") * (kp * kp));
        Assert.Equal(InRing(e, expected), e.ClosedForm);
        Assert.Contains("c_t = cos(t)", e.ToString());
        Assert.Contains("s_t = sin(t)", e.ToString());
    }

    [Fact]
    public void Exponential_of_a_nilpotent_heisenberg_element_is_the_finite_polynomial_sum()
    {
        // Heisenberg algebra: exp(t(a X + b Y + c Z)) = [[1, a t, c t + a b t^2/2], [0, 1, b t], [0, 0, 1]] (common practice).
        var x = Matrix.ParseRational("[[0, 2, 5], [0, 0, 3], [0, 0, 0]]");
        var e = MatrixExponential.Of(x, "t");
        Assert.Equal(ExponentialForm.Polynomial, e.Form);
        var expected = Matrix.FromRows(
            [P("1"), P("2 t"), P("5 t + 3 t^2")],
            [P("0"), P("1"), P("3 t")],
            [P("0"), P("0"), P("1")]);
        Assert.Equal(expected, e.PolynomialForm);
    }

    [Fact]
    public void Exponential_of_the_symmetric_swap_generator_is_the_cosh_sinh_form()
    {
        // exp(t [[0,1],[1,0]]) = [[cosh t, sinh t], [sinh t, cosh t]] (common practice).
        var e = MatrixExponential.Of(Matrix.ParseRational("[[0, 1], [1, 0]]"), "t");
        Assert.Equal(ExponentialForm.ClosedForm, e.Form);
        var expected = Matrix.FromRows([P("ch_t"), P("sh_t")], [P("sh_t"), P("ch_t")]);
        Assert.Equal(InRing(e, expected), e.ClosedForm);
        Assert.Contains("ch_t = cosh(t)", e.Legend.ToString());
        Assert.Contains("ch_t^2 - sh_t^2 = 1", e.Legend.ToString());
    }

    [Theory]
    [InlineData(2, 3)]
    [InlineData(-1, 1)]
    [InlineData(1, -2)]
    public void Exponential_of_a_scaled_rotation_generator_is_e_to_the_at_times_a_rotation(int a, int b)
    {
        // exp(t [[a, -b], [b, a]]) = e^{a t} [[cos bt, -sin bt], [sin bt, cos bt]] (common practice).
        var x = Matrix.FromRows<Rational>([a, -b], [b, a]);
        var e = MatrixExponential.Of(x, "t");
        var ring = e.Legend.Ring<Rational>();
        var exp = P(Name(a > 0 ? "e" : "einv", Math.Abs(a)));
        var w = Math.Abs(b);
        var cos = P(Name("c", w));
        var sin = P(Name("s", w));
        if (b < 0)
        {
            sin = -sin;
        }

        var expected = Matrix.FromRows([exp * cos, -exp * sin], [exp * sin, exp * cos]);
        Assert.Equal(expected.Map(ring.Element), e.ClosedForm);
    }

    private static string Name(string prefix, int multiple) => multiple == 1 ? $"{prefix}_t" : $"{prefix}_{multiple}t";

    [Fact]
    public void Multiple_frequencies_are_expressed_through_the_base_symbols_by_chebyshev_polynomials()
    {
        // Block diagonal rotations with frequencies 1 and 2: cos 2t = 2 cos^2 t - 1 = c^2 - s^2, sin 2t = 2 sin t cos t (common practice).
        var x = Matrix.ParseRational("[[0, -1, 0, 0], [1, 0, 0, 0], [0, 0, 0, -2], [0, 0, 2, 0]]");
        var e = MatrixExponential.Of(x, "t");
        var ring = e.Legend.Ring<Rational>();
        Assert.Equal(2, e.Legend.Entries.Count);
        Assert.True(ring.AreEqual(e.ClosedForm![2, 2].Representative, P("2 c_t^2 - 1")));
        Assert.True(ring.AreEqual(e.ClosedForm![3, 2].Representative, P("2 s_t c_t")));
    }

    [Fact]
    public void A_non_diagonalisable_matrix_uses_the_jordan_split()
    {
        // exp(t [[a, 1], [0, a]]) = e^{a t} [[1, t], [0, 1]] (common practice).
        var e = MatrixExponential.Of(Matrix.ParseRational("[[2, 1], [0, 2]]"), "t");
        Assert.Equal(ExponentialForm.ClosedForm, e.Form);
        Assert.False(e.Split!.IsSemisimple);
        var expected = Matrix.FromRows([P("e_2t"), P("t e_2t")], [P("0"), P("e_2t")]);
        Assert.Equal(InRing(e, expected), e.ClosedForm);
    }

    [Fact]
    public void Eigenvalues_outside_gaussian_rationals_give_a_labelled_truncated_series()
    {
        // [[0, 2], [1, 0]] has eigenvalues ±√2; its exponential is cosh/sinh of √2 t, not exact in Q(i) symbols.
        var e = MatrixExponential.Of(Matrix.ParseRational("[[0, 2], [1, 0]]"), "t", seriesOrder: 5);
        Assert.Equal(ExponentialForm.TruncatedSeries, e.Form);
        Assert.Contains("truncated series", e.Explanation);
        Assert.Contains("λ^2 - 2", e.Explanation);
        // cosh(√2 t) = 1 + t^2 + t^4/6 + ... (common practice)
        Assert.Equal("1 + t^2 + 1/6*t^4 + O(t^5)", e.Series![0, 0].ToString());
    }

    [Fact]
    public void Non_square_generator_is_rejected_with_its_shape()
    {
        var error = Assert.Throws<ExactArgumentException>(() => MatrixExponential.Of(Matrix.ParseRational("[[1, 2, 3], [4, 5, 6]]")));
        Assert.Contains("2x3", error.Message);
    }

    [Theory]
    [InlineData(0)]
    [InlineData(25)]
    public void Series_order_outside_the_range_is_rejected(int order)
    {
        var error = Assert.Throws<ExactArgumentException>(() => MatrixExponential.Of(Matrix.ParseRational("[[0, 2], [1, 0]]"), "t", order));
        Assert.Contains(order.ToString(), error.Message);
    }

    [Fact]
    public void Invalid_parameter_name_is_rejected()
    {
        var error = Assert.Throws<ExactArgumentException>(() => MatrixExponential.Of(Matrix.ParseRational("[[0, 1], [0, 0]]"), "2t"));
        Assert.Contains("2t", error.Message);
    }
}
