using System.Numerics;
using AlgebraNotebook.Roots.Representations;
using Xunit.Abstractions;

namespace AlgebraNotebook.Roots.Tests.Representations;

public class FreudenthalVariantTests(ITestOutputHelper output)
{
    private static int[] SmallDominant(Random random, int rank, int labelSum)
    {
        var labels = new int[rank];
        var total = random.Next(1, labelSum + 1);
        for (var k = 0; k < total; k++)
        {
            labels[random.Next(rank)]++;
        }

        return labels;
    }

    private static void AssertSameCharacter(
        List<(int[] Weight, BigInteger Multiplicity)> expected, List<(int[] Weight, BigInteger Multiplicity)> actual, string context)
    {
        Assert.True(expected.Count == actual.Count, $"{context}: {expected.Count} vs {actual.Count} dominant weights");
        for (var j = 0; j < expected.Count; j++)
        {
            Assert.True(expected[j].Weight.AsSpan().SequenceEqual(actual[j].Weight), $"{context}: weight {j} differs");
            Assert.True(expected[j].Multiplicity == actual[j].Multiplicity,
                $"{context}: multiplicity at ({string.Join(", ", expected[j].Weight)}) {expected[j].Multiplicity} vs {actual[j].Multiplicity}");
        }
    }

    [Theory]
    [MemberData(nameof(TypeRange.Names), MemberType = typeof(TypeRange))]
    public void Packed_variant_in_every_integer_width_agrees_with_the_reference_variant(string type)
    {
        // Oracle: the reference variant (BigInteger, dictionaries of arrays); outside check: the character's dimension equals
        // Weyl's dimension formula (Humphreys 24.3).
        var system = RootSystem.Of(type);
        var random = RandomisedTesting.NewRandom(53);
        var labelSum = system.Rank >= 6 ? 2 : 4;
        for (var trial = 0; trial < RandomisedTesting.Iterations(4); trial++)
        {
            var labels = SmallDominant(random, system.Rank, labelSum);
            var rep = IrreducibleRepresentation.Of(system, labels);
            var geometry = rep.Geometry;
            var dominants = Freudenthal.DominantWeights(geometry, labels, long.MaxValue, CancellationToken.None);
            var reference = Freudenthal.DominantCharacterReference(geometry, labels, dominants, CancellationToken.None, null);
            Assert.True(WeightPacking.TryCreate(dominants, system.Rank, out var packing));
            var context = $"{type} {rep.HighestWeight}";
            AssertSameCharacter(reference, Freudenthal.DominantCharacterPacked<long>(geometry, dominants, packing, CancellationToken.None, null), context);
            AssertSameCharacter(reference, Freudenthal.DominantCharacterPacked<Int128>(geometry, dominants, packing, CancellationToken.None, null), context);
            AssertSameCharacter(reference, Freudenthal.DominantCharacterPacked<BigInteger>(geometry, dominants, packing, CancellationToken.None, null), context);
            Assert.Equal(rep.Dimension, reference.Aggregate(BigInteger.Zero, (s, p) => s + p.Multiplicity * geometry.OrbitSize(p.Weight)));
        }
    }

    [Fact]
    public void Packed_variant_uses_both_cores_on_a_wide_level_and_still_agrees()
    {
        // These have levels (equal height) with at least ParallelLevelThreshold dominant weights, so the parallel branch runs;
        // oracle: the reference variant.
        foreach (var (type, labels) in new[] { ("F4", new[] { 2, 1, 1, 2 }), ("A4", new[] { 3, 2, 2, 3 }) })
        {
            var rep = IrreducibleRepresentation.Of(type, labels);
            var geometry = rep.Geometry;
            var dominants = Freudenthal.DominantWeights(geometry, labels, long.MaxValue, CancellationToken.None);
            var widest = dominants.GroupBy(geometry.Level).Max(g => g.Count());
            output.WriteLine($"{type} {rep.HighestWeight}: {dominants.Count} dominant weights, widest level {widest}");
            Assert.True(widest >= Freudenthal.ParallelLevelThreshold);
            AssertSameCharacter(
                Freudenthal.DominantCharacterReference(geometry, labels, dominants, CancellationToken.None, null),
                Freudenthal.DominantCharacter(geometry, labels, long.MaxValue, CancellationToken.None),
                $"{type} {rep.HighestWeight}");
        }
    }

    [Fact]
    public void Overflow_of_64_bit_multiplicities_is_detected_and_the_dispatcher_widens()
    {
        // E8 V(3 omega_4) has dimension about 4.0e24 (Weyl's formula), spread over 1,465 dominant weights: the largest
        // multiplicities and Freudenthal numerators exceed 2^63, so 64-bit arithmetic must throw rather than wrap.
        var rep = IrreducibleRepresentation.Of("E8", 0, 0, 0, 3, 0, 0, 0, 0);
        var geometry = rep.Geometry;
        var labels = rep.DynkinLabels;
        var dominants = Freudenthal.DominantWeights(geometry, labels, long.MaxValue, CancellationToken.None);
        Assert.True(WeightPacking.TryCreate(dominants, 8, out var packing));
        Assert.Throws<OverflowException>(() => Freudenthal.DominantCharacterPacked<long>(geometry, dominants, packing, CancellationToken.None, null));
        var reference = Freudenthal.DominantCharacterReference(geometry, labels, dominants, CancellationToken.None, null);
        AssertSameCharacter(reference, Freudenthal.DominantCharacter(geometry, labels, long.MaxValue, CancellationToken.None), "E8 3 omega_4");
        Assert.True(reference.Max(p => p.Multiplicity) > long.MaxValue / 1000);
    }

    [Fact]
    public void Labels_too_large_to_pack_fall_back_to_the_reference_variant()
    {
        // A20 V(8 omega_1) = Sym^8 C^21 (common practice): its dominant weights need 4 bits per label, 80 > 63, so no packing;
        // dimension binomial(28, 8) = 3,108,105.
        var rep = IrreducibleRepresentation.Of("A20", [8, .. new int[19]]);
        var dominants = Freudenthal.DominantWeights(rep.Geometry, rep.DynkinLabels, long.MaxValue, CancellationToken.None);
        Assert.False(WeightPacking.TryCreate(dominants, 20, out _));
        Assert.Equal(new BigInteger(3_108_105), rep.Dimension);
        Assert.True(rep.VerifyCharacter());
    }
}
