using System.Numerics;
using AlgebraNotebook.Exact;
using AlgebraNotebook.Roots.Representations;
using static AlgebraNotebook.Roots.Tests.Representations.RepresentationTestData;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class WeightMultiplicityTests
{
    // Fulton-Harris, Lecture 13: the sl(3) representation Gamma_{2,2} (dimension 27) has multiplicity 3 at weight zero,
    // 2 on the middle hexagon and 1 on the outer hexagon.
    [Fact]
    public void Su3_27_has_multiplicity_3_at_zero_as_in_Fulton_Harris_lecture_13()
    {
        var irrep = Irrep("A2", 2, 2);
        Assert.Equal(new BigInteger(3), irrep.Multiplicity(new Weight(0, 0)));
        Assert.Equal(new BigInteger(2), irrep.Multiplicity(new Weight(1, 1)));
        Assert.Equal(BigInteger.One, irrep.Multiplicity(new Weight(2, 2)));
        Assert.Equal(new BigInteger(2), irrep.Multiplicity(new Weight(-1, -1)));
        Assert.Equal(BigInteger.Zero, irrep.Multiplicity(new Weight(3, 3)));
        var all = irrep.AllWeights();
        Assert.Equal(19, all.Count);
        Assert.Equal(new BigInteger(27), all.Aggregate(BigInteger.Zero, (s, w) => s + w.Multiplicity));
    }

    // The zero weight of the adjoint representation has multiplicity equal to the rank (the Cartan subalgebra; common practice).
    [Theory]
    [InlineData("A1")]
    [InlineData("A5")]
    [InlineData("B4")]
    [InlineData("C3")]
    [InlineData("D6")]
    [InlineData("E6")]
    [InlineData("E7")]
    [InlineData("E8")]
    [InlineData("F4")]
    [InlineData("G2")]
    public void Adjoint_zero_weight_multiplicity_is_the_rank(string type)
    {
        var system = RootSystem.Of(type);
        var adjoint = IrreducibleRepresentation.Of(system, system.HighestRoot.AsWeight);
        Assert.Equal(new BigInteger(system.Rank), adjoint.Multiplicity(system.ZeroWeight));
        Assert.True(adjoint.VerifyCharacter());
    }

    // G2 seven-dimensional representation: the six short roots and zero, each once (common practice).
    [Fact]
    public void G2_7_has_zero_weight_multiplicity_1()
    {
        var seven = Irrep("G2", 1, 0);
        Assert.Equal(BigInteger.One, seven.Multiplicity(new Weight(0, 0)));
        Assert.Equal(7, seven.AllWeights().Count);
    }

    // Orbit-symmetric Freudenthal against the reference variant that evaluates the formula at every weight.
    [Theory]
    [InlineData("A3", new[] { 1, 2, 1 })]
    [InlineData("B3", new[] { 1, 1, 1 })]
    [InlineData("C3", new[] { 2, 0, 1 })]
    [InlineData("D4", new[] { 1, 0, 1, 1 })]
    [InlineData("G2", new[] { 2, 1 })]
    [InlineData("F4", new[] { 1, 0, 0, 1 })]
    [InlineData("A2+A1", new[] { 1, 1, 2 })]
    public void Orbit_Freudenthal_agrees_with_the_reference_at_every_weight(string type, int[] labels)
    {
        var irrep = Irrep(type, labels);
        var reference = Freudenthal.ReferenceCharacter(irrep.Geometry, labels);
        var all = irrep.AllWeights();
        Assert.Equal(reference.Count, all.Count);
        foreach (var (weight, multiplicity) in all)
        {
            Assert.Equal(reference[new WeightKey(weight.Labels)], multiplicity);
        }
    }

    // Characters are Weyl invariant: every simple reflection of a weight has the same multiplicity (common practice).
    [Theory]
    [InlineData("B3", new[] { 1, 0, 1 })]
    [InlineData("E6", new[] { 1, 0, 0, 0, 0, 1 })]
    [InlineData("G2", new[] { 1, 1 })]
    public void Characters_are_Weyl_invariant(string type, int[] labels)
    {
        var irrep = Irrep(type, labels);
        var weyl = irrep.System.WeylGroup;
        var weights = irrep.AllWeights().ToDictionary(w => w.Weight, w => w.Multiplicity);
        foreach (var (weight, multiplicity) in weights)
        {
            for (var node = 1; node <= irrep.System.Rank; node++)
            {
                Assert.Equal(multiplicity, weights[weyl.Reflect(weight, node)]);
            }
        }
    }

    // Property: the multiplicities add up to Weyl's dimension, and the orbit sizes agree with the Weyl group's own count.
    [Fact]
    public void Random_highest_weights_have_multiplicities_summing_to_the_Weyl_dimension()
    {
        var random = new Random(20261201);
        string[] types = ["A3", "B3", "C3", "D4", "G2", "F4", "A1+A2", "B2"];
        for (var iteration = 0; iteration < 12 * Iterations; iteration++)
        {
            var type = types[random.Next(types.Length)];
            var system = RootSystem.Of(type);
            var labels = Enumerable.Range(0, system.Rank).Select(_ => random.Next(system.Rank > 3 ? 2 : 3)).ToArray();
            var irrep = IrreducibleRepresentation.Of(system, labels);
            Assert.True(irrep.VerifyCharacter(), $"{type} {irrep.HighestWeight}");
            foreach (var (weight, _) in irrep.DominantWeights)
            {
                Assert.Equal(system.WeylGroup.OrbitSize(weight), irrep.Geometry.OrbitSize(weight.Labels));
            }
        }
    }

    // Weight listing refuses with the count when over the cap; the dimension is still available.
    [Fact]
    public void All_weights_over_the_cap_throws_with_the_count()
    {
        var irrep = Irrep("E8", 1, 0, 0, 0, 0, 0, 0, 0);
        Assert.Equal(new BigInteger(3875), irrep.Dimension);
        var error = Assert.Throws<BeyondCapabilityException>(() => irrep.AllWeights(maximumWeights: 1000));
        // 2401 = 2160 (orbit of omega_1, |W(E8)| / |W(D7)|) + 240 (roots) + 1 (zero), Humphreys Reflection Groups Table 2.2 orders.
        Assert.Contains("2401 distinct weights", error.Message);
        Assert.Equal(2401, irrep.AllWeights(maximumWeights: 2401).Count);
    }

    [Fact]
    public void Dominant_weight_computation_can_be_cancelled()
    {
        using var source = new CancellationTokenSource();
        source.Cancel();
        var irrep = Irrep("E8", 2, 0, 0, 0, 0, 0, 0, 1);
        Assert.ThrowsAny<OperationCanceledException>(() => irrep.ComputeDominantWeights(cancellationToken: source.Token));
    }
}
