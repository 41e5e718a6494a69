using AlgebraNotebook.Exact.Scalars;

namespace AlgebraNotebook.Exact.Tests.Axioms;

/// <summary>The field axioms for <see cref="GaussianRational"/> on random small and huge values (seed 20261201).</summary>
public class GaussianRationalAxiomTests
{
    private readonly FieldAxioms<GaussianRational> _axioms = new(RandomisedTesting.GaussianRational, baseIterations: 200);

    [Fact]
    public void Addition_is_associative_and_commutative() => _axioms.CheckAdditionAssociativeAndCommutative();

    [Fact]
    public void Multiplication_is_associative_and_commutative() => _axioms.CheckMultiplicationAssociativeAndCommutative();

    [Fact]
    public void Multiplication_distributes_over_addition() => _axioms.CheckDistributivity();

    [Fact]
    public void Zero_and_one_are_identities_and_default_is_zero() => _axioms.CheckIdentities();

    [Fact]
    public void Every_value_has_an_additive_inverse() => _axioms.CheckAdditiveInverses();

    [Fact]
    public void Equal_values_are_equal_and_hash_alike() => _axioms.CheckEqualityAndHashing();

    [Fact]
    public void Integers_embed_as_a_ring_map() => _axioms.CheckIntegerEmbedding();

    [Fact]
    public void Conjugation_is_an_involutive_ring_map() => _axioms.CheckConjugation();

    [Fact]
    public void Rational_scaling_is_multiplication() => _axioms.CheckRationalScaling();

    [Fact]
    public void Non_zero_values_have_inverses_and_zero_does_not() => _axioms.CheckInverses();
}
