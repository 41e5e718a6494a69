using System.Numerics;
using AlgebraNotebook.Roots.Representations;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class BrauerKlimykVariantTests
{
    private static Dictionary<string, BigInteger> AsMap(List<(int[] Labels, BigInteger Multiplicity)> terms) =>
        terms.ToDictionary(t => string.Join(",", t.Labels), t => t.Multiplicity);

    private static int[] SmallDominant(Random random, int rank, int labelSum)
    {
        var labels = new int[rank];
        var total = random.Next(0, labelSum + 1);
        for (var k = 0; k < total; k++)
        {
            labels[random.Next(rank)]++;
        }

        return labels;
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Packed_Brauer_Klimyk_agrees_with_the_reference_variant(string type)
    {
        // Oracle: the reference variant; outside check: dimensions multiply (common practice).
        var system = RootSystem.Of(type);
        var random = RandomisedTesting.NewRandom(59);
        var labelSum = system.Rank >= 6 ? 1 : 3;
        for (var trial = 0; trial < RandomisedTesting.Iterations(3); trial++)
        {
            var a = IrreducibleRepresentation.Of(system, SmallDominant(random, system.Rank, labelSum + 1));
            var b = IrreducibleRepresentation.Of(system, SmallDominant(random, system.Rank, labelSum));
            var packed = TensorProduct.BrauerKlimykPacked(a, b, long.MaxValue, CancellationToken.None);
            Assert.NotNull(packed);
            var reference = TensorProduct.BrauerKlimykReference(a, b, long.MaxValue, CancellationToken.None);
            var context = $"{type} {a.HighestWeight} x {b.HighestWeight}";
            Assert.True(AsMap(reference).OrderBy(p => p.Key).SequenceEqual(AsMap(packed).OrderBy(p => p.Key)), context);
            Assert.Equal(a.Dimension * b.Dimension,
                packed.Aggregate(BigInteger.Zero, (s, t) => s + t.Multiplicity * IrreducibleRepresentation.Of(system, t.Labels).Dimension));
        }
    }

    [Fact]
    public void Packed_Brauer_Klimyk_agrees_with_multiplying_full_characters_on_a_semisimple_algebra()
    {
        // Oracle: the character-product variant (every pair of weights, then peeling); B2+A1 exercises several factors.
        var system = RootSystem.Of("B2+A1");
        var a = IrreducibleRepresentation.Of(system, 1, 1, 2);
        var b = IrreducibleRepresentation.Of(system, 0, 1, 1);
        var packed = TensorProduct.BrauerKlimykPacked(a, b, long.MaxValue, CancellationToken.None)!;
        var oracle = TensorProduct.DecomposeByCharacterProduct(a, b);
        Assert.Equal(oracle.Terms.Count, packed.Count);
        foreach (var (labels, multiplicity) in packed)
        {
            Assert.Equal(oracle.MultiplicityOf(labels), multiplicity);
        }
    }

    [Fact]
    public void E8_3875_squared_has_ten_irreducible_summands()
    {
        // 3875 x 3875 = 1 + 248 + 3875 + 27000 + 30380 + 147250 + 779247 + 2450240 + 4881384 + 6696000 (from memory; the
        // dimensions add up to 3875^2 = 15,015,625, and each is checked by Weyl's formula here).
        var v = IrreducibleRepresentation.Of("E8", 1, 0, 0, 0, 0, 0, 0, 0);
        var product = TensorProduct.Decompose(v, v);
        Assert.Equal(
            new BigInteger[] { 1, 248, 3875, 27000, 30380, 147250, 779247, 2450240, 4881384, 6696000 },
            product.Terms.Select(t => t.Irreducible.Dimension).ToArray());
        Assert.All(product.Terms, t => Assert.Equal(BigInteger.One, t.Multiplicity));
    }

    [Fact]
    public void E8_square_of_omega_1_plus_omega_8_has_forty_distinct_irreducibles()
    {
        // The count 40 is the one stated for this workload in the project's performance issue (from an earlier script, not a
        // published table); the packed and reference variants must agree, and the dimension must be 779247^2 (Weyl's formula).
        var v = IrreducibleRepresentation.Of("E8", 1, 0, 0, 0, 0, 0, 0, 1);
        Assert.Equal(new BigInteger(779_247), v.Dimension);
        var product = TensorProduct.Decompose(v, v);
        Assert.Equal(40, product.Terms.Count);
        Assert.Equal(v.Dimension * v.Dimension, product.Dimension);
        var reference = TensorProduct.BrauerKlimykReference(v, v, long.MaxValue, CancellationToken.None);
        Assert.Equal(40, reference.Count);
        foreach (var (labels, multiplicity) in reference)
        {
            Assert.Equal(multiplicity, product.MultiplicityOf(labels));
        }
    }
}
