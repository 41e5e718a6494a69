using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using static AlgebraNotebook.Exact.Tests.Polynomials.PolynomialTestData;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

/// <summary>
/// Commutative-ring axioms (common practice) on random small elements. Kept local to the polynomial tests; a shared
/// harness for all ring types may replace it.
/// </summary>
public class PolynomialRingAxiomTests
{
    private static readonly Symbols.Symbol[] Names = [S("ra"), S("rb"), S("rc")];

    [Fact]
    public void Rational_polynomials_satisfy_the_ring_axioms()
    {
        CheckRing(r => RandomPolynomial(r, Names, RandomRational), seed: 101, baseCount: 150);
    }

    [Fact]
    public void Gaussian_rational_polynomials_satisfy_the_ring_axioms()
    {
        CheckRing(r => RandomPolynomial(r, Names, RandomGaussian), seed: 102, baseCount: 150);
    }

    [Fact]
    public void Quotient_ring_elements_satisfy_the_ring_axioms()
    {
        var ring = new QuotientRing<Rational>(["ra^2 + rb^2 = 1", "rc^2 = ra rb"]);
        CheckRing(
            r => r.Next(8) == 0
                ? QuotientElement<Rational>.FromRational(RandomRational(r))
                : ring.Element(RandomPolynomial(r, Names, RandomRational)),
            seed: 103,
            baseCount: 100);
    }

    [Fact]
    public void Gaussian_quotient_ring_elements_satisfy_the_ring_axioms()
    {
        var ring = new QuotientRing<GaussianRational>(["ra rb = 1", "rc^2 = -1"]);
        CheckRing(r => ring.Element(RandomPolynomial(r, Names, RandomGaussian)), seed: 104, baseCount: 100);
    }

    private static void CheckRing<TElement>(Func<Random, TElement> next, int seed, int baseCount)
        where TElement : IRationalAlgebraElement<TElement>
    {
        var random = new Random(seed);
        var zero = TElement.Zero;
        var one = TElement.One;
        Assert.True(zero.IsZero, "Zero is not zero");
        Assert.True(one.IsOne, "One is not one");
        Assert.Equal(one + one, TElement.FromInteger(2));
        Assert.Equal(TElement.FromRational(new Rational(1, 2)) + TElement.FromRational(new Rational(1, 2)), one);
        for (var k = 0; k < Iterations(baseCount); k++)
        {
            var a = next(random);
            var b = next(random);
            var c = next(random);
            var inputs = $"a = {a}, b = {b}, c = {c} (seed {seed}, iteration {k})";
            Check((a + b) + c, a + (b + c), "additive associativity", inputs);
            Check(a + b, b + a, "additive commutativity", inputs);
            Check((a * b) * c, a * (b * c), "multiplicative associativity", inputs);
            Check(a * b, b * a, "multiplicative commutativity", inputs);
            Check(a * (b + c), a * b + a * c, "distributivity", inputs);
            Check(a + zero, a, "additive identity", inputs);
            Check(a * one, a, "multiplicative identity", inputs);
            Assert.True((a * zero).IsZero, "a * 0 is not zero for " + inputs);
            Assert.True((a + -a).IsZero, "a + (-a) is not zero for " + inputs);
            Check(a - b, a + -b, "subtraction", inputs);
            Check(a.Scale(new Rational(3, 2)), a * TElement.FromRational(new Rational(3, 2)), "scaling", inputs);
            Check(a.Conjugate().Conjugate(), a, "conjugation is an involution", inputs);
            Check((a * b).Conjugate(), a.Conjugate() * b.Conjugate(), "conjugation is multiplicative", inputs);
            Assert.True(a.Equals(a + zero) && (a + b).GetHashCode() == (b + a).GetHashCode(), "Equals/GetHashCode inconsistent for " + inputs);
        }
    }

    private static void Check<TElement>(TElement actual, TElement expected, string axiom, string inputs)
        where TElement : IRingElement<TElement>
    {
        Assert.True(actual.Equals(expected), $"{axiom} fails: got {actual}, expected {expected}, for {inputs}");
        Assert.True(actual.GetHashCode() == expected.GetHashCode(), $"{axiom}: equal values with different hash codes, for {inputs}");
    }
}
