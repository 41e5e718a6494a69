using AlgebraNotebook.Algebras.Enveloping;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests.Enveloping;

public class UniversalEnvelopingAlgebraTests
{
    [Fact]
    public void Reversed_product_F_E_is_normal_ordered_to_E_F_minus_H()
    {
        // Defining relation of U(g): F E = E F - [E, F] = E F - H (Humphreys, Introduction to Lie Algebras, §17.2; common practice).
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var fe = u.Generator("F") * u.Generator("E");
        Assert.Equal(u.Generator("E") * u.Generator("F") - u.Generator("H"), fe);
        Assert.Equal("E F - H", fe.ToString());
        Assert.Equal(2, fe.Degree);
    }

    [Fact]
    public void Commutator_of_embedded_Lie_elements_is_the_embedded_bracket()
    {
        // x y - y x = [x, y] in U(g) (definition of U(g); common practice), random elements, fixed seed.
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var random = new Random(31);
        for (var t = 0; t < 10 * EnvelopingSamples.Iterations; t++)
        {
            var x = g.Element(Enumerable.Range(0, g.Dimension).Select(_ => (Rational)random.Next(-3, 4)).ToArray());
            var y = g.Element(Enumerable.Range(0, g.Dimension).Select(_ => (Rational)random.Next(-3, 4)).ToArray());
            Assert.True(
                EnvelopingElement<Rational>.Commutator(u.Embed(x), u.Embed(y)) == u.Embed(g.Bracket(x, y)),
                $"x = {x}, y = {y}");
        }
    }

    [Fact]
    public void PBW_product_is_associative_on_random_elements()
    {
        // Associativity of U(g) (Humphreys, Introduction to Lie Algebras, §17.2; common practice), fixed seed.
        foreach (var g in new[] { Samples.Sl2(), LieAlgebras.SpecialLinear<Rational>(3) })
        {
            var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
            var random = new Random(17);
            for (var t = 0; t < 8 * EnvelopingSamples.Iterations; t++)
            {
                var a = EnvelopingSamples.RandomElement(u, random, 3, 3);
                var b = EnvelopingSamples.RandomElement(u, random, 2, 3);
                var c = EnvelopingSamples.RandomElement(u, random, 2, 3);
                Assert.True((a * b) * c == a * (b * c), $"{g.Label}: a = {a}, b = {b}, c = {c}");
                Assert.True(a * (b + c) == a * b + a * c, $"{g.Label}: a = {a}, b = {b}, c = {c}");
            }
        }
    }

    [Fact]
    public void Representation_of_a_product_is_the_product_of_the_matrices()
    {
        // U(g) -> End(V) is an algebra map (universal property; Humphreys §17.2), checked on C^3 for sl(3), fixed seed.
        var g = LieAlgebras.SpecialLinear<Rational>(3);
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var rho = EnvelopingSamples.Sl3Defining();
        var random = new Random(5);
        for (var t = 0; t < 8 * EnvelopingSamples.Iterations; t++)
        {
            var a = EnvelopingSamples.RandomElement(u, random, 3, 3);
            var b = EnvelopingSamples.RandomElement(u, random, 3, 3);
            Assert.True(u.Represent(a * b, rho) == u.Represent(a, rho) * u.Represent(b, rho), $"a = {a}, b = {b}");
        }
    }

    [Fact]
    public void Words_in_increasing_order_are_PBW_monomials_and_print_with_powers()
    {
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var w = u.Word(0, 0, 1, 2);
        Assert.Equal(u.Monomial(2, 1, 1), w);
        Assert.Equal("H^2 E F", w.ToString());
        Assert.Equal(Rational.One, w.Coefficient(2, 1, 1));
        Assert.Equal("0", u.Zero.ToString());
        Assert.Equal("1", u.One.ToString());
        Assert.Equal(-1, u.Zero.Degree);
    }

    [Fact]
    public void Filtration_degree_and_homogeneous_parts_follow_the_PBW_basis()
    {
        // E H = H E - [H, E] = H E - 2 E: degree 2 with a degree-1 part (common practice).
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var eh = u.Generator("E") * u.Generator("H");
        Assert.Equal(2, eh.Degree);
        Assert.Equal(u.Monomial(1, 1, 0), eh.HomogeneousPart(2));
        Assert.Equal((Rational)(-2) * u.Generator("E"), eh.HomogeneousPart(1));
    }

    [Fact]
    public void Monomial_with_the_wrong_number_of_exponents_is_rejected()
    {
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var error = Assert.Throws<ExactArgumentException>(() => u.Monomial(1, 2));
        Assert.Contains("needs 3 exponents", error.Message);
        Assert.Throws<ExactArgumentException>(() => u.Monomial(1, -1, 0));
    }

    [Fact]
    public void Elements_of_different_enveloping_algebras_do_not_combine()
    {
        var u = UniversalEnvelopingAlgebra<Rational>.Of(Samples.Sl2());
        var v = UniversalEnvelopingAlgebra<Rational>.Of(Samples.So3());
        var error = Assert.Throws<ExactArgumentException>(() => u.Generator(0) * v.Generator(0));
        Assert.Contains("different enveloping algebras", error.Message);
    }

    [Fact]
    public void Representation_matrices_of_the_wrong_count_or_size_are_rejected()
    {
        var g = Samples.Sl2();
        var u = UniversalEnvelopingAlgebra<Rational>.Of(g);
        var rho = EnvelopingSamples.Sl2Defining();
        var tooFew = Assert.Throws<ExactArgumentException>(() => u.Represent(u.One, rho.Take(2).ToArray()));
        Assert.Contains("needs 3 matrices", tooFew.Message);
        var mixed = new[] { rho[0], rho[1], EnvelopingSamples.Unit(3, 0, 1) };
        var wrongSize = Assert.Throws<ExactArgumentException>(() => u.Represent(u.One, mixed));
        Assert.Contains("Matrix 2", wrongSize.Message);
    }
}
