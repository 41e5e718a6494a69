using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Algebras.Tests;

public class KillingFormTests
{
    [Fact]
    public void Killing_form_of_sl2_in_the_basis_H_E_F_matches_the_textbook_values()
    {
        var sl2 = Samples.Sl2();
        var k = sl2.KillingForm();

        // Humphreys, Introduction to Lie Algebras and Representation Theory, §5.1 example (from memory; basis x, h, y there):
        // K(H,H) = 8, K(E,F) = 4, all other pairs 0.
        Assert.Equal(Samples.Q([8, 0, 0], [0, 0, 4], [0, 4, 0]), k);
        Assert.Equal(new Rational(4), sl2.KillingForm(sl2.Basis("F"), sl2.Basis("E")));
    }

    [Fact]
    public void Killing_form_of_so3_is_minus_twice_the_identity()
    {
        // Common practice: with [L_x, L_y] = L_z cyclic, K = -2 I.
        Assert.Equal(Samples.Q([-2, 0, 0], [0, -2, 0], [0, 0, -2]), Samples.So3().KillingForm());
    }

    [Theory]
    [InlineData(2)]
    [InlineData(3)]
    [InlineData(4)]
    public void Killing_form_of_gl_n_equals_2n_tr_xy_minus_2_tr_x_tr_y(int n)
    {
        // Common practice (Humphreys §6 exercises): K(x, y) = 2n tr(xy) - 2 tr(x) tr(y) on gl(n).
        var gl = LieAlgebras.GeneralLinear<Rational>(n);
        var k = gl.KillingForm();
        var units = Enumerable.Range(0, n * n)
            .Select(a => Matrix<Rational>.FromFunction(n, n, (r, c) => r * n + c == a ? Rational.One : Rational.Zero))
            .ToArray();
        for (var a = 0; a < n * n; a++)
        {
            for (var b = 0; b < n * n; b++)
            {
                var expected = 2 * n * (units[a] * units[b]).Trace() - 2 * units[a].Trace() * units[b].Trace();
                Assert.True(expected == k[a, b], $"gl({n}): K({gl.BasisNames[a]}, {gl.BasisNames[b]}) = {k[a, b]}, expected {expected}");
            }
        }
    }

    [Fact]
    public void Killing_form_of_sl_n_is_2n_times_the_trace_form_of_the_defining_representation()
    {
        // Common practice: on sl(n), K(x, y) = 2n tr(xy).
        for (var n = 2; n <= 4; n++)
        {
            var sl = LieAlgebras.SpecialLinear<Rational>(n);
            var defining = DefiningMatrices(sl, n);
            var trace = sl.TraceForm(defining);
            Assert.Equal(trace.Map(x => x * (2 * n)), sl.KillingForm());
        }
    }

    [Fact]
    public void Killing_form_is_invariant_under_ad()
    {
        // K([x, y], z) = -K(y, [x, z]) (Humphreys §5.1, associativity of the Killing form).
        var g = LieAlgebras.Galilei<Rational>();
        var random = new Random(7);
        for (var trial = 0; trial < 5 * Iterations; trial++)
        {
            var x = RandomElement(g, random);
            var y = RandomElement(g, random);
            var z = RandomElement(g, random);
            Assert.True(g.KillingForm(x.Bracket(y), z) == -g.KillingForm(y, x.Bracket(z)), $"x = {x}, y = {y}, z = {z}");
        }
    }

    [Fact]
    public void Trace_form_rejects_matrices_that_are_not_a_representation()
    {
        var sl2 = Samples.Sl2();
        var wrong = new[] { Samples.Q([1, 0], [0, -1]), Samples.Q([0, 1], [0, 0]), Samples.Q([0, 0], [2, 0]) };
        var error = Assert.Throws<Exact.ExactArgumentException>(() => sl2.TraceForm(wrong));
        Assert.Contains("[E, F]", error.Message);
    }

    internal static int Iterations => TestIterations.Multiplier;

    internal static LieElement<Rational> RandomElement(LieAlgebra<Rational> g, Random random) =>
        g.Element(Enumerable.Range(0, g.Dimension).Select(_ => new Rational(random.Next(-5, 6), random.Next(1, 4))).ToArray());

    private static Matrix<Rational>[] DefiningMatrices(LieAlgebra<Rational> sl, int n)
    {
        // Rebuild the documented basis: H_i = E_ii - E_(i+1)(i+1), then E_ij (i != j) row-major.
        var result = new List<Matrix<Rational>>();
        for (var i = 0; i + 1 < n; i++)
        {
            result.Add(Matrix<Rational>.FromFunction(n, n, (r, c) => r == c && r == i ? 1 : r == c && r == i + 1 ? -1 : 0));
        }

        for (var i = 0; i < n; i++)
        {
            for (var j = 0; j < n; j++)
            {
                if (i != j)
                {
                    result.Add(Matrix<Rational>.FromFunction(n, n, (r, c) => r == i && c == j ? 1 : 0));
                }
            }
        }

        Assert.Equal(sl.Dimension, result.Count);
        return result.ToArray();
    }

    // The sparse sum must equal the definition K_ij = tr(ad e_i ad e_j) computed from dense matrix products
    // (Humphreys 5.1, from memory), on algebras with dense and sparse tables.
    [Fact]
    public void Sparse_Killing_form_equals_the_trace_of_matrix_products()
    {
        var algebras = new[]
        {
            LieAlgebras.SpecialLinear<Rational>(3),
            LieAlgebras.Orthogonal<Rational>(4, 3),
            LieAlgebras.Galilei<Rational>(),
            Chevalley.RandomBasisChange.Disguised("G2", 2),
            Samples.So3(),
        };
        foreach (var g in algebras)
        {
            Assert.Equal(g.KillingFormByMatrixProducts(), g.KillingForm());
        }
    }
}
