using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Matrices;
using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.Groups.Elements;
using AlgebraNotebook.Groups.Exponential;

namespace AlgebraNotebook.Groups.Tests.Exponential;

public class WordExpansionTests
{
    private static readonly MatrixGroup<Rational> So3 = StandardGroups.SpecialOrthogonal(3);
    private static readonly MatrixGroup<Rational> Lorentz = StandardGroups.Lorentz();

    private static Monomial M(params (string Name, int Exponent)[] factors) =>
        Monomial.FromFactors(factors.Select(f => (Symbol.Of(f.Name), f.Exponent)));

    [Fact]
    public void Group_commutator_of_small_rotations_about_x_and_y_starts_with_s_t_L_z()
    {
        // exp(s L_x) exp(t L_y) exp(-s L_x) exp(-t L_y) = exp(s t [L_x, L_y] + O(3)) and [L_x, L_y] = L_z (common practice).
        var z = WordExpansion.GroupCommutator(So3.Generator("L_x"), "s", So3.Generator("L_y"), "t", 4, "L_x", "L_y");
        Assert.True(z.HomogeneousPart(1).IsZero);
        Assert.Equal(So3.Generator("L_z"), z.Coefficient(M(("s", 1), ("t", 1))));
        Assert.Equal(Matrix<Rational>.Zero(3, 3), z.Coefficient(M(("s", 2))));
        var inBasis = z.InBasis(So3.Generators);
        Assert.Equal(("L_z", Rational.One), inBasis[0].Combination.Single());
        // Third order: 1/2 s^2 t [L_x, [L_x, L_y]] + 1/2 s t^2 [L_y, [L_x, L_y]] (BCH of e^X e^Y e^-X e^-Y; common practice) = -1/2 s^2 t L_y + 1/2 s t^2 L_x.
        Assert.Equal(So3.Generator("L_y").Map(v => v * new Rational(-1, 2)), z.Coefficient(M(("s", 2), ("t", 1))));
        Assert.Equal(So3.Generator("L_x").Map(v => v * new Rational(1, 2)), z.Coefficient(M(("s", 1), ("t", 2))));
        Assert.Equal("log(exp(s L_x) exp(t L_y) exp(-s L_x) exp(-t L_y)) = order 2: s*t*L_z; order 3: -1/2*s^2*t*L_y + 1/2*s*t^2*L_x; + O(order 4)", z.Describe(So3.Generators));
    }

    [Fact]
    public void Collinear_boosts_have_exponential_coordinates_equal_to_the_sum_of_rapidities()
    {
        // Collinear boosts commute, so log(B(z1) B(z2)) = (z1 + z2) K_x exactly (common practice).
        var z = WordExpansion.Expand([new WordFactor<Rational>(Lorentz.Generator("K_x"), "z1", "K_x"), new WordFactor<Rational>(Lorentz.Generator("K_x"), "z2", "K_x")], 6);
        Assert.Equal(2, z.Terms.Count);
        Assert.All(z.Terms, t => Assert.Equal(Lorentz.Generator("K_x"), t.Coefficient));
    }

    [Fact]
    public void Perpendicular_boosts_give_a_thomas_wigner_rotation_of_half_the_product_of_rapidities()
    {
        // Jackson, Classical Electrodynamics, §11.8 (from memory): two perpendicular boosts compose to a boost times a rotation about
        // the normal of their plane, by an angle ζ1 ζ2 / 2 to second order. Here [K_x, K_y] = -J_z, so the rotation is exp(-ζ1 ζ2/2 J_z).
        var z = WordExpansion.Expand([new WordFactor<Rational>(Lorentz.Generator("K_x"), "z1", "K_x"), new WordFactor<Rational>(Lorentz.Generator("K_y"), "z2", "K_y")], 3);
        var second = z.InBasis(Lorentz.Generators).Where(t => t.Monomial.TotalDegree == 2).ToList();
        Assert.Single(second);
        Assert.Equal(M(("z1", 1), ("z2", 1)), second[0].Monomial);
        Assert.Equal(("J_z", new Rational(-1, 2)), second[0].Combination.Single());
    }

    [Theory]
    [InlineData(0.02, 0.03)]
    [InlineData(0.01, 0.05)]
    public void Thomas_wigner_angle_from_a_numeric_polar_decomposition_matches_the_second_order_term(double z1, double z2)
    {
        // Numeric check of the same statement: Λ = B_x(z1) B_y(z2) evaluated from the exact closed form; the pure boost B with
        // Λ's time column is split off (Λ = B R) and R's angle about z compared with -z1 z2 / 2 (third-order error) and with the
        // exact perpendicular-boost formula tan θ = sinh z1 sinh z2 / (cosh z1 + cosh z2) (from memory).
        var g = Lorentz.Exponential("K_x", "z1") * Lorentz.Exponential("K_y", "z2");
        var lambda = g.Evaluate(new Dictionary<string, double> { ["z1"] = z1, ["z2"] = z2 });
        var u = Enumerable.Range(0, 4).Select(i => lambda[i, 3].Real).ToArray();
        var gamma = u[3];
        var boost = new double[4, 4];
        for (var i = 0; i < 3; i++)
        {
            for (var j = 0; j < 3; j++)
            {
                boost[i, j] = (i == j ? 1 : 0) + u[i] * u[j] / (1 + gamma);
            }

            boost[i, 3] = boost[3, i] = u[i];
        }

        boost[3, 3] = gamma;
        // B^-1 = η B η with η = diag(1, 1, 1, -1): flip the signs of the mixed space-time entries.
        var rotation = new double[4, 4];
        for (var i = 0; i < 4; i++)
        {
            for (var j = 0; j < 4; j++)
            {
                for (var k = 0; k < 4; k++)
                {
                    var inverse = (i == 3) != (k == 3) ? -boost[i, k] : boost[i, k];
                    rotation[i, j] += inverse * lambda[k, j].Real;
                }
            }
        }

        var angle = Math.Atan2(rotation[1, 0], rotation[0, 0]);
        Assert.True(Math.Abs(rotation[3, 3] - 1) < 1e-12, "R must fix the time axis");
        Assert.True(Math.Abs(angle + z1 * z2 / 2) < 5 * Math.Pow(Math.Max(z1, z2), 3), $"angle {angle} vs {-z1 * z2 / 2}");
        var exact = Math.Atan(Math.Sinh(z1) * Math.Sinh(z2) / (Math.Cosh(z1) + Math.Cosh(z2)));
        Assert.True(Math.Abs(Math.Abs(angle) - exact) < 1e-12, $"|angle| {Math.Abs(angle)} vs formula {exact}");
    }

    [Fact]
    public void Symmetric_splitting_has_no_even_order_terms_and_the_known_third_order_term()
    {
        // log(e^{tA/2} e^{tB} e^{tA/2}) = t(A + B) - t^3/24 [A, [A, B]] - t^3/12 [B, [A, B]] + O(t^5)
        // (symmetric BCH; Hairer, Lubich and Wanner, Geometric Numerical Integration, §III.4, from memory).
        var a = Matrix.ParseRational("[[1, 2, 0], [0, -1, 1], [3, 0, 0]]");
        var b = Matrix.ParseRational("[[0, 1, 1], [-1, 2, 0], [0, 1, 1]]");
        var z = WordExpansion.SymmetricSplitting(a, b, "t", 5);
        Assert.Equal(a + b, z.Coefficient(M(("t", 1))));
        Assert.True(z.HomogeneousPart(2).IsZero);
        Assert.True(z.HomogeneousPart(4).IsZero);
        var ab = Matrix<Rational>.Commutator(a, b);
        var expected = Matrix<Rational>.Commutator(a, ab).Map(v => v * new Rational(-1, 24)) + Matrix<Rational>.Commutator(b, ab).Map(v => v * new Rational(-1, 12));
        Assert.Equal(expected, z.Coefficient(M(("t", 3))));
    }

    [Fact]
    public void Bad_words_are_rejected()
    {
        Assert.Throws<ExactArgumentException>(() => WordExpansion.Expand(Array.Empty<WordFactor<Rational>>(), 3));
        var error = Assert.Throws<ExactArgumentException>(() => WordExpansion.GroupCommutator(So3.Generator("L_x"), "s", Lorentz.Generator("K_x"), "t", 3));
        Assert.Contains("4x4", error.Message);
        Assert.Throws<ExactArgumentException>(() => WordExpansion.GroupCommutator(So3.Generator("L_x"), "s", So3.Generator("L_y"), "t", 0));
        Assert.Throws<ExactArgumentException>(() => WordExpansion.GroupCommutator(So3.Generator("L_x"), "s", So3.Generator("L_y"), "t", 30));
        Assert.Throws<ExactArgumentException>(() => new WordFactor<Rational>(Matrix.ParseRational("[[1, 2]]"), "s", "A"));
        var z = WordExpansion.GroupCommutator(So3.Generator("L_x"), "s", So3.Generator("L_y"), "t", 3);
        Assert.Throws<ExactArgumentException>(() => z.InBasis([("L_x", So3.Generator("L_x"))]));
    }
}

public class WordExpansionNestedCommutatorTests
{
    [Fact]
    public void Group_commutator_is_also_given_as_nested_commutators_of_the_generator_names()
    {
        // log(e^X e^Y e^-X e^-Y) = [X, Y] + 1/2 [X, [X, Y]] + 1/2 [Y, [X, Y]] + O(4) (BCH applied twice; common practice),
        // and 1/2 [Y, [X, Y]] = -1/2 [[X, Y], Y] in the Lyndon basis.
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var z = WordExpansion.GroupCommutator(so3.Generator("L_x"), "s", so3.Generator("L_y"), "t", 4, "L_x", "L_y");
        Assert.Equal("s*t [L_x, L_y] + 1/2*s^2*t [L_x, [L_x, L_y]] - 1/2*s*t^2 [[L_x, L_y], L_y] + O(order 4)", z.NestedCommutatorText);
        Assert.Contains("as nested commutators", z.ToString());
    }

    [Theory]
    [InlineData(false)]
    [InlineData(true)]
    public void Nested_commutator_form_evaluated_on_the_matrices_equals_the_matrix_series_logarithm(bool symmetric)
    {
        // Two independent routes: the free Lie algebra BCH (Lyndon projection) evaluated on the matrices, and the matrix
        // series logarithm of the product; they must agree term by term.
        var a = Matrix.ParseRational("[[1, 2, 0], [0, -1, 1], [3, 0, 0]]");
        var b = Matrix.ParseRational("[[0, 1, 1], [-1, 2, 0], [0, 1/2, 1]]");
        const int order = 5;
        var z = symmetric
            ? WordExpansion.SymmetricSplitting(a, b, "t", order)
            : WordExpansion.GroupCommutator(a, "s", b, "t", order);
        Assert.NotNull(z.NestedCommutators);
        var parameters = symmetric
            ? new Dictionary<string, (Symbol, Matrix<Rational>)> { ["A"] = (Symbol.Of("t"), a), ["B"] = (Symbol.Of("t"), b) }
            : new Dictionary<string, (Symbol, Matrix<Rational>)> { ["A"] = (Symbol.Of("s"), a), ["B"] = (Symbol.Of("t"), b) };
        var evaluated = AlgebraNotebook.Groups.Series.LieSeriesEvaluation.EvaluateWithParameters(z.NestedCommutators!, parameters).Value;
        var fromMatrices = Matrix<Polynomial<Rational>>.Zero(3, 3);
        for (var d = 0; d < order; d++)
        {
            fromMatrices += z.HomogeneousPart(d);
        }

        Assert.Equal(fromMatrices, evaluated);
    }

    [Fact]
    public void A_name_used_for_two_matrices_gives_no_nested_commutator_form_and_says_why()
    {
        var so3 = StandardGroups.SpecialOrthogonal(3);
        var z = WordExpansion.Expand([new WordFactor<Rational>(so3.Generator("L_x"), "s", "A"), new WordFactor<Rational>(so3.Generator("L_y"), "t", "A")], 3);
        Assert.Null(z.NestedCommutators);
        Assert.Contains("two different matrices", z.NestedCommutatorNote);
    }
}
