using AlgebraNotebook.Exact.Polynomials;
using AlgebraNotebook.Exact.Scalars;
using AlgebraNotebook.Exact.Series;
using AlgebraNotebook.Exact.Symbols;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>
/// The Q-algebra axioms for <see cref="TruncatedSeries{T}"/> over the rationals, on random series in two parameters
/// with mixed orders (including exact series). a - a is zero only up to the order of a, so the additive inverse check
/// asks that a - a agrees with 0 below its order and has no known term.
/// </summary>
public class TruncatedSeriesAxiomTests
{
    private static readonly Symbol X = Symbol.Of("axiom_x");
    private static readonly Symbol Y = Symbol.Of("axiom_y");

    private readonly RationalAlgebraAxioms<TruncatedSeries<Rational>> _axioms =
        new(RandomSeries, value => value.Terms.Count == 0 && value.AgreesWith(TruncatedSeries<Rational>.Zero), baseIterations: 40);

    /// <summary>A random series: sometimes 0, 1 or a constant; otherwise random terms up to degree 6, order 1..6 or exact.</summary>
    internal static TruncatedSeries<Rational> RandomSeries(Random random)
    {
        switch (random.Next(12))
        {
            case 0:
                return TruncatedSeries<Rational>.Zero;
            case 1:
                return TruncatedSeries<Rational>.One;
            case 2:
                return TruncatedSeries<Rational>.Constant(RandomisedTesting.Rational(random));
        }

        var exact = random.Next(4) == 0;
        var order = exact ? TruncatedSeries<Rational>.ExactOrder : random.Next(1, 7);
        var maxDegree = exact ? 3 : 6;
        var terms = new List<(Monomial, Rational)>();
        var count = random.Next(0, 8);
        for (var k = 0; k < count; k++)
        {
            var degree = random.Next(0, maxDegree + 1);
            var ofX = random.Next(0, degree + 1);
            var monomial = Monomial.FromFactors([(X, ofX), (Y, degree - ofX)]);
            terms.Add((monomial, new Rational(random.Next(-9, 10), random.Next(1, 5))));
        }

        var parameters = random.Next(3) == 0 ? new[] { X } : new[] { X, Y };
        return TruncatedSeries<Rational>.FromTerms(terms, order, parameters);
    }

    [Fact]
    public void Addition_is_associative_and_commutative() => _axioms.CheckAdditionAssociativeAndCommutative();

    [Fact]
    public void Multiplication_is_associative_and_commutative() => _axioms.CheckMultiplicationAssociativeAndCommutative();

    [Fact]
    public void Multiplication_distributes_over_addition() => _axioms.CheckDistributivity();

    [Fact]
    public void Zero_and_one_are_exact_identities() => _axioms.CheckIdentities();

    [Fact]
    public void A_series_minus_itself_vanishes_up_to_its_order() => _axioms.CheckAdditiveInverses();

    [Fact]
    public void Equal_series_are_equal_and_hash_alike() => _axioms.CheckEqualityAndHashing();

    [Fact]
    public void Integers_embed_as_exact_constants() => _axioms.CheckIntegerEmbedding();

    [Fact]
    public void Conjugation_is_an_involutive_ring_map() => _axioms.CheckConjugation();

    [Fact]
    public void Rational_scaling_is_multiplication_by_a_constant() => _axioms.CheckRationalScaling();
}
