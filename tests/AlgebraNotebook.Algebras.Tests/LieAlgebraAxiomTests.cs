using AlgebraNotebook.Algebras;
using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Algebras.Tests;

public class LieAlgebraAxiomTests
{
    public static TheoryData<string> Names => new() { "sl(3)", "so(3,1)", "su(3)", "e(3)", "galilei", "h(5)", "sp(4)" };

    [Theory]
    [MemberData(nameof(Names))]
    public void Bracket_is_antisymmetric_bilinear_and_satisfies_Jacobi_on_random_elements(string name)
    {
        // Lie algebra axioms (definition; common practice), fixed seed, iterations from ALGEBRANOTEBOOK_TEST_ITERATIONS.
        var g = Build(name);
        var random = new Random(name.GetHashCode(StringComparison.Ordinal) & 0xffff);
        for (var trial = 0; trial < 10 * KillingFormTests.Iterations; trial++)
        {
            var x = KillingFormTests.RandomElement(g, random);
            var y = KillingFormTests.RandomElement(g, random);
            var z = KillingFormTests.RandomElement(g, random);
            var c = new Rational(random.Next(-7, 8), random.Next(1, 5));
            var message = $"{name}: x = {x}, y = {y}, z = {z}, c = {c}";
            Assert.True(x.Bracket(y) == -y.Bracket(x), message);
            Assert.True((c * x + y).Bracket(z) == c * x.Bracket(z) + y.Bracket(z), message);
            Assert.True((x.Bracket(y.Bracket(z)) + y.Bracket(z.Bracket(x)) + z.Bracket(x.Bracket(y))).IsZero, message);

            // ad is a representation: ad[x, y] = [ad x, ad y].
            Assert.True(g.AdjointMatrix(x.Bracket(y)) == Exact.Matrices.Matrix<Rational>.Commutator(g.AdjointMatrix(x), g.AdjointMatrix(y)), message);
        }
    }

    [Theory]
    [MemberData(nameof(Names))]
    public void Killing_form_is_symmetric_and_matches_the_trace_of_ad_products(string name)
    {
        var g = Build(name);
        var k = g.KillingForm();
        Assert.True(k.IsSymmetric);
        var random = new Random(99);
        var x = KillingFormTests.RandomElement(g, random);
        var y = KillingFormTests.RandomElement(g, random);
        Assert.Equal((g.AdjointMatrix(x) * g.AdjointMatrix(y)).Trace(), g.KillingForm(x, y));
    }

    private static LieAlgebra<Rational> Build(string name) => name switch
    {
        "sl(3)" => LieAlgebras.SpecialLinear<Rational>(3),
        "so(3,1)" => LieAlgebras.Orthogonal<Rational>(3, 1),
        "su(3)" => LieAlgebras.SpecialUnitary(3),
        "e(3)" => LieAlgebras.Euclidean<Rational>(3),
        "galilei" => LieAlgebras.Galilei<Rational>(),
        "h(5)" => LieAlgebras.Heisenberg<Rational>(2),
        _ => LieAlgebras.Symplectic<Rational>(2),
    };
}
