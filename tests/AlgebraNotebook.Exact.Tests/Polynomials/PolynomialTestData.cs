using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Symbols;
using AlgebraNotebook.TestSupport;

namespace AlgebraNotebook.Exact.Tests.Polynomials;

/// <summary>Shorthands and random generators for the polynomial tests (fixed seeds are chosen by each test).</summary>
internal static class PolynomialTestData
{
    public static Polynomial<Rational> Q(string text) => Polynomial<Rational>.Parse(text);

    public static Polynomial<GaussianRational> G(string text) => Polynomial<GaussianRational>.Parse(text);

    public static Symbol S(string name) => Symbol.Of(name);

    /// <summary>Iteration multiplier from ALGEBRANOTEBOOK_TEST_ITERATIONS (default 1).</summary>
    public static int Iterations(int baseCount) => TestIterations.Times(baseCount);

    public static Rational RandomRational(Random random) => new(random.Next(-4, 5), random.Next(1, 4));

    public static GaussianRational RandomGaussian(Random random) => new(RandomRational(random), random.Next(2) == 0 ? Rational.Zero : RandomRational(random));

    public static Monomial RandomMonomial(Random random, IReadOnlyList<Symbol> symbols, int maxExponent) =>
        Monomial.FromFactors(symbols.Select(s => (s, random.Next(maxExponent + 1))));

    public static Polynomial<T> RandomPolynomial<T>(Random random, IReadOnlyList<Symbol> symbols, Func<Random, T> coefficient, int maxTerms = 4, int maxExponent = 2)
        where T : IFieldElement<T>
    {
        var count = random.Next(maxTerms + 1);
        var terms = new List<(Monomial, T)>();
        for (var k = 0; k < count; k++)
        {
            terms.Add((RandomMonomial(random, symbols, maxExponent), coefficient(random)));
        }

        return Polynomial<T>.FromTerms(terms);
    }
}
